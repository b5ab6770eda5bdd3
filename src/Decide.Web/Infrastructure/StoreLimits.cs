using Decide.Data;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Infrastructure;

/// <summary>
/// Refuses, before anything is saved, text longer than its column holds. PostgreSQL enforces column lengths (SQLite
/// does not), so without this an over-long text in an imported file became a failed save and a 500 there.
/// </summary>
public static class StoreLimits
{
    /// <summary>Throws a 400 naming every added or changed text that is longer than its column.</summary>
    public static void RequireWithin(DecideDbContext db)
    {
        var errors = new Dictionary<string, string[]>(StringComparer.Ordinal);
        foreach (var entry in db.ChangeTracker.Entries().Where(e => e.State is EntityState.Added or EntityState.Modified))
        {
            foreach (var property in entry.Properties.Where(p => p.Metadata.ClrType == typeof(string)))
            {
                if (property.Metadata.GetMaxLength() is { } max && property.CurrentValue is string { Length: var length } && length > max)
                {
                    var owner = entry.Metadata.GetTableName() ?? entry.Metadata.ClrType.Name;
                    errors[$"{owner}.{property.Metadata.Name}"] =
                        [string.Create(System.Globalization.CultureInfo.InvariantCulture,
                            $"a {property.Metadata.Name.ToLowerInvariant()} of {length:N0} characters is longer than the {max:N0} kept{Where(entry)}")];
                }
            }
        }

        if (errors.Count > 0)
        {
            throw DomainProblem.Invalid(errors);
        }
    }

    private static string Where(Microsoft.EntityFrameworkCore.ChangeTracking.EntityEntry entry) => entry.Entity switch
    {
        Decide.Data.Entities.RatingEntry r => $" (assessor {r.AssessorCode}, bid {r.AlternativeCode}, criterion {r.CriterionId})",
        _ => "",
    };
}
