using Decide.Data.Entities;
using Decide.Data.Storage;
using Microsoft.AspNetCore.DataProtection.EntityFrameworkCore;
using Microsoft.AspNetCore.Identity.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore;

namespace Decide.Data;

/// <summary>
/// The database of the service: accounts (ASP.NET Core Identity), evaluations with their panels, bids and inputs,
/// the audit chains, the archived records, and the Data Protection keys that every instance of the service shares.
/// Use one short-lived context per operation (from <c>IDbContextFactory</c>).
/// </summary>
public sealed class DecideDbContext(DbContextOptions<DecideDbContext> options)
    : IdentityDbContext<DecideUser>(options), IDataProtectionKeyContext
{
    // Audit entries added through AuditChain.Append, in the order added; they are chained when the context saves.
    private readonly List<AuditEntry> appended = [];

    // Rows whose children changed, to be given the next version at the next save (MarkChanged).
    private readonly HashSet<IVersioned> marked = new(ReferenceEqualityComparer.Instance);

    public DbSet<StoredEvaluation> Evaluations => Set<StoredEvaluation>();

    public DbSet<PanelMember> PanelMembers => Set<PanelMember>();

    public DbSet<StoredAlternative> Alternatives => Set<StoredAlternative>();

    public DbSet<ConflictDeclaration> Conflicts => Set<ConflictDeclaration>();

    public DbSet<WeightJudgement> WeightJudgements => Set<WeightJudgement>();

    public DbSet<RatingEntry> Ratings => Set<RatingEntry>();

    public DbSet<NumericEntry> NumericValues => Set<NumericEntry>();

    public DbSet<GateEntry> GateResults => Set<GateEntry>();

    public DbSet<ModerationEntry> Moderation => Set<ModerationEntry>();

    /// <summary>Reviews of prices flagged as abnormally low.</summary>
    public DbSet<LowPriceReviewEntry> LowPriceReviews => Set<LowPriceReviewEntry>();

    public DbSet<ReviewAssignmentEntry> ReviewAssignments => Set<ReviewAssignmentEntry>();

    public DbSet<Approval> Approvals => Set<Approval>();

    public DbSet<AuditEntry> Audit => Set<AuditEntry>();

    public DbSet<ArchivedRecord> Archive => Set<ArchivedRecord>();

    /// <summary>ASP.NET Core Data Protection keys (cookies, antiforgery), shared by every instance.</summary>
    public DbSet<DataProtectionKey> DataProtectionKeys => Set<DataProtectionKey>();

    /// <summary>
    /// Saves, after refusing any text longer than its column (<see cref="TextLimits"/>) and moving the version of every
    /// changed row (<see cref="IVersioned"/>), chaining any new audit entries
    /// after the last entry of their chain under the chain's lock (see <see cref="ChainedSave"/>).
    /// </summary>
    public override Task<int> SaveChangesAsync(bool acceptAllChangesOnSuccess, CancellationToken cancellationToken = default)
    {
        TextLimits.RequireWithin(this);
        NextVersions();
        var added = appended.Where(e => Entry(e).State == EntityState.Added).ToList();
        return ChainedSave.SaveAsync(this, added, base.SaveChangesAsync, acceptAllChangesOnSuccess, cancellationToken);
    }

    /// <summary>Synchronous saves cannot take the chain's lock; audit entries must be saved with <see cref="SaveChangesAsync(bool, CancellationToken)"/>.</summary>
    public override int SaveChanges(bool acceptAllChangesOnSuccess)
    {
        TextLimits.RequireWithin(this);
        NextVersions();
        if (appended.Any(e => Entry(e).State == EntityState.Added))
        {
            throw new InvalidOperationException("Audit entries are chained under a lock and must be saved with SaveChangesAsync.");
        }

        return base.SaveChanges(acceptAllChangesOnSuccess);
    }

    /// <summary>
    /// Marks a row as changed although none of its own columns did (its panel, bids or approvals did), so that the
    /// save gives it the next version and a client holding the old one is refused.
    /// </summary>
    public void MarkChanged(IVersioned row) => marked.Add(row);

    /// <summary>
    /// Gives every changed versioned row the next version, unless the caller set one itself. The version read stays the
    /// concurrency token, so a row changed elsewhere meanwhile fails the save instead of being overwritten.
    /// </summary>
    private void NextVersions()
    {
        foreach (var entry in ChangeTracker.Entries<IVersioned>())
        {
            var changed = entry.State == EntityState.Modified || (entry.State == EntityState.Unchanged && marked.Contains(entry.Entity));
            if (changed && !entry.Property(e => e.Version).IsModified)
            {
                entry.Entity.Version++;
            }
        }

        marked.Clear();
    }

    /// <summary>Adds an entry to be chained at the next save (see <see cref="AuditChain.Append"/>).</summary>
    internal void AppendToChain(AuditEntry entry)
    {
        Audit.Add(entry);
        appended.Add(entry);
    }

    protected override void OnModelCreating(ModelBuilder builder)
    {
        base.OnModelCreating(builder);
        builder.ApplyConfigurationsFromAssembly(typeof(DecideDbContext).Assembly);
    }

    protected override void ConfigureConventions(ModelConfigurationBuilder configurationBuilder)
    {
        // A bound on every text column unless configured otherwise; rationales and notes fit, abuse does not.
        configurationBuilder.Properties<string>().HaveMaxLength(4000);
    }
}
