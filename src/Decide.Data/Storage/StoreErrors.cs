using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Npgsql;

namespace Decide.Data.Storage;

/// <summary>What a failed save means, the same way on SQLite and PostgreSQL: the providers' error codes live here only.</summary>
public static class StoreErrors
{
    /// <summary>SQLite's result code for a broken constraint (SQLITE_CONSTRAINT).</summary>
    private const int SqliteConstraint = 19;

    /// <summary>True when the save broke a unique index (someone else created the same row first).</summary>
    public static bool IsUniqueViolation(DbUpdateException e) => e.InnerException switch
    {
        SqliteException s => s.SqliteErrorCode == SqliteConstraint,
        PostgresException p => p.SqlState == PostgresErrorCodes.UniqueViolation,
        _ => false,
    };

    /// <summary>
    /// True when the unique index broken is the audit chain's: another writer took the same position (which the
    /// chain's lock prevents; seeing one means a writer bypassed it).
    /// </summary>
    public static bool IsAuditCollision(DbUpdateException e) =>
        e is not DbUpdateConcurrencyException && IsUniqueViolation(e)
        && (e.InnerException?.Message.Contains("audit_entries", StringComparison.OrdinalIgnoreCase) == true
            || (e.InnerException as PostgresException)?.TableName == "audit_entries");
}
