using System.Globalization;
using Decide.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.ChangeTracking;

namespace Decide.Data.Storage;

/// <summary>
/// Refuses, before anything is saved, text longer than its column holds. PostgreSQL enforces column lengths and
/// SQLite does not, so without this check an over-long text was a failed save (a 500) on one engine and silently kept
/// on the other. <see cref="DecideDbContext"/> runs it at the start of every save.
/// </summary>
public static class TextLimits
{
    /// <summary>Throws <see cref="TextTooLongException"/> naming every added or changed text longer than its column.</summary>
    public static void RequireWithin(DbContext db)
    {
        Dictionary<string, string[]>? errors = null;
        foreach (var entry in db.ChangeTracker.Entries())
        {
            if (entry.State is not (EntityState.Added or EntityState.Modified))
            {
                continue;
            }

            foreach (var property in entry.Properties)
            {
                if (property.Metadata.ClrType == typeof(string) && property.Metadata.GetMaxLength() is { } max
                    && property.CurrentValue is string { Length: var length } && length > max)
                {
                    var owner = entry.Metadata.GetTableName() ?? entry.Metadata.ClrType.Name;
                    (errors ??= new(StringComparer.Ordinal))[$"{owner}.{property.Metadata.Name}"] =
                        [string.Create(CultureInfo.InvariantCulture,
                            $"a {property.Metadata.Name.ToLowerInvariant()} of {length:N0} characters is longer than the {max:N0} kept{Where(entry)}")];
                }
            }
        }

        if (errors is not null)
        {
            throw new TextTooLongException(errors);
        }
    }

    private static string Where(EntityEntry entry) => entry.Entity switch
    {
        RatingEntry r => $" (assessor {r.AssessorCode}, bid {r.AlternativeCode}, criterion {r.CriterionId})",
        _ => "",
    };
}

/// <summary>A save refused because a text is longer than its column; nothing was saved.</summary>
/// <param name="errors">Column (table.property) → reasons, in words a user can act on.</param>
public sealed class TextTooLongException(IReadOnlyDictionary<string, string[]> errors)
    : Exception($"{errors.Count} text(s) are longer than the database keeps; nothing was saved.")
{
    /// <summary>Column (table.property) → reasons.</summary>
    public IReadOnlyDictionary<string, string[]> Errors { get; } = errors;
}
