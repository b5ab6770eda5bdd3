using Decide.Data.Entities;
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
    public DbSet<StoredEvaluation> Evaluations => Set<StoredEvaluation>();

    public DbSet<PanelMember> PanelMembers => Set<PanelMember>();

    public DbSet<StoredAlternative> Alternatives => Set<StoredAlternative>();

    public DbSet<ConflictDeclaration> Conflicts => Set<ConflictDeclaration>();

    public DbSet<WeightJudgement> WeightJudgements => Set<WeightJudgement>();

    public DbSet<RatingEntry> Ratings => Set<RatingEntry>();

    public DbSet<NumericEntry> NumericValues => Set<NumericEntry>();

    public DbSet<GateEntry> GateResults => Set<GateEntry>();

    public DbSet<ModerationEntry> Moderation => Set<ModerationEntry>();

    public DbSet<Approval> Approvals => Set<Approval>();

    public DbSet<AuditEntry> Audit => Set<AuditEntry>();

    public DbSet<ArchivedRecord> Archive => Set<ArchivedRecord>();

    /// <summary>ASP.NET Core Data Protection keys (cookies, antiforgery), shared by every instance.</summary>
    public DbSet<DataProtectionKey> DataProtectionKeys => Set<DataProtectionKey>();

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
