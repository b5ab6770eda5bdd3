using Decide.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace Decide.Data;

internal sealed class StoredEvaluationConfiguration : IEntityTypeConfiguration<StoredEvaluation>
{
    public void Configure(EntityTypeBuilder<StoredEvaluation> e)
    {
        e.ToTable("evaluations");
        e.HasKey(x => x.Id);
        e.Property(x => x.Reference).HasMaxLength(100);
        e.Property(x => x.Title).HasMaxLength(300);
        e.Property(x => x.PlanJson).HasMaxLength(1_000_000);
        e.Property(x => x.Stage).HasConversion<string>().HasMaxLength(20);
        e.Property(x => x.Version).IsConcurrencyToken();
        e.HasMany(x => x.Panel).WithOne().HasForeignKey(x => x.EvaluationId);
        e.HasMany(x => x.Alternatives).WithOne().HasForeignKey(x => x.EvaluationId);
        e.HasIndex(x => x.Reference);
    }
}

internal sealed class PanelMemberConfiguration : IEntityTypeConfiguration<PanelMember>
{
    public void Configure(EntityTypeBuilder<PanelMember> e)
    {
        e.ToTable("panel_members");
        e.Property(x => x.Role).HasConversion<string>().HasMaxLength(20);
        e.Property(x => x.Version).IsConcurrencyToken();
        e.HasOne(x => x.User).WithMany().HasForeignKey(x => x.UserId);
        e.Property(x => x.TopicsJson).HasMaxLength(4_000);
        e.HasIndex(x => new { x.EvaluationId, x.UserId, x.Role }).IsUnique();
        e.HasIndex(x => new { x.EvaluationId, x.AssessorCode });
    }
}

internal sealed class StoredAlternativeConfiguration : IEntityTypeConfiguration<StoredAlternative>
{
    public void Configure(EntityTypeBuilder<StoredAlternative> e)
    {
        e.ToTable("alternatives");
        e.Property(x => x.Topic).HasMaxLength(200);
        e.HasIndex(x => new { x.EvaluationId, x.Code }).IsUnique();
    }
}

internal sealed class ConflictConfiguration : IEntityTypeConfiguration<ConflictDeclaration>
{
    public void Configure(EntityTypeBuilder<ConflictDeclaration> e)
    {
        e.ToTable("conflicts");
        e.HasIndex(x => new { x.EvaluationId, x.UserId, x.AlternativeCode }).IsUnique();
    }
}

internal sealed class WeightJudgementConfiguration : IEntityTypeConfiguration<WeightJudgement>
{
    public void Configure(EntityTypeBuilder<WeightJudgement> e)
    {
        e.ToTable("weight_judgements");
        e.Property(x => x.Version).IsConcurrencyToken();
        e.HasIndex(x => new { x.EvaluationId, x.AssessorCode, x.Kind, x.Node, x.Column }).IsUnique();
    }
}

internal sealed class RatingConfiguration : IEntityTypeConfiguration<RatingEntry>
{
    public void Configure(EntityTypeBuilder<RatingEntry> e)
    {
        e.ToTable("ratings");
        e.Property(x => x.Version).IsConcurrencyToken();
        e.HasIndex(x => new { x.EvaluationId, x.AssessorCode, x.AlternativeCode, x.CriterionId }).IsUnique();
    }
}

internal sealed class NumericConfiguration : IEntityTypeConfiguration<NumericEntry>
{
    public void Configure(EntityTypeBuilder<NumericEntry> e)
    {
        e.ToTable("numeric_values");
        e.Property(x => x.Version).IsConcurrencyToken();
        e.HasIndex(x => new { x.EvaluationId, x.AlternativeCode, x.CriterionId }).IsUnique();
    }
}

internal sealed class GateConfiguration : IEntityTypeConfiguration<GateEntry>
{
    public void Configure(EntityTypeBuilder<GateEntry> e)
    {
        e.ToTable("gate_results");
        e.Property(x => x.Version).IsConcurrencyToken();
        e.HasIndex(x => new { x.EvaluationId, x.AlternativeCode, x.CriterionId }).IsUnique();
    }
}

internal sealed class ModerationConfiguration : IEntityTypeConfiguration<ModerationEntry>
{
    public void Configure(EntityTypeBuilder<ModerationEntry> e)
    {
        e.ToTable("moderation");
        e.Property(x => x.OriginalsJson).HasMaxLength(100_000);
        e.HasIndex(x => new { x.EvaluationId, x.AlternativeCode, x.CriterionId });
    }
}

internal sealed class LowPriceReviewConfiguration : IEntityTypeConfiguration<LowPriceReviewEntry>
{
    public void Configure(EntityTypeBuilder<LowPriceReviewEntry> e)
    {
        e.ToTable("low_price_reviews");
        e.Property(x => x.Version).IsConcurrencyToken();
        e.Property(x => x.Asked).HasMaxLength(8_000);
        e.Property(x => x.Answer).HasMaxLength(20_000);
        e.Property(x => x.Reasons).HasMaxLength(8_000);
        e.Property(x => x.Decision).HasMaxLength(16);
        e.HasIndex(x => new { x.EvaluationId, x.AlternativeCode }).IsUnique();
    }
}

internal sealed class ReviewAssignmentConfiguration : IEntityTypeConfiguration<ReviewAssignmentEntry>
{
    public void Configure(EntityTypeBuilder<ReviewAssignmentEntry> e)
    {
        e.ToTable("review_assignments");
        e.Property(x => x.Source).HasMaxLength(16);
        e.HasIndex(x => new { x.EvaluationId, x.AssessorCode, x.AlternativeCode }).IsUnique();
        e.HasIndex(x => new { x.EvaluationId, x.AlternativeCode });
    }
}

internal sealed class ApprovalConfiguration : IEntityTypeConfiguration<Approval>
{
    public void Configure(EntityTypeBuilder<Approval> e)
    {
        e.ToTable("approvals");
        e.HasIndex(x => new { x.EvaluationId, x.UserId }).IsUnique();
    }
}

internal sealed class ArchivedRecordConfiguration : IEntityTypeConfiguration<ArchivedRecord>
{
    public void Configure(EntityTypeBuilder<ArchivedRecord> e)
    {
        e.ToTable("archived_records");
        e.HasKey(x => x.Id);
        e.Property(x => x.Kind).HasMaxLength(20);
        e.Property(x => x.AlternativeCode).HasMaxLength(100);
        e.Property(x => x.FileName).HasMaxLength(300);
        e.Property(x => x.Content).HasMaxLength(50_000_000);
        e.Property(x => x.SnapshotJson).HasMaxLength(10_000_000);
        e.Property(x => x.Sha256).HasMaxLength(64);
        e.Property(x => x.SnapshotSha256).HasMaxLength(64);
        e.Property(x => x.CertificateThumbprint).HasMaxLength(128);
        e.Property(x => x.AuditHead).HasMaxLength(64);
        e.HasIndex(x => new { x.EvaluationId, x.Kind, x.AlternativeCode }).IsUnique();
        e.HasIndex(x => x.Sha256);
    }
}

internal sealed class AuditEntryConfiguration : IEntityTypeConfiguration<AuditEntry>
{
    public void Configure(EntityTypeBuilder<AuditEntry> e)
    {
        e.ToTable("audit_entries");
        e.Property(x => x.Chain).HasMaxLength(64);
        e.Property(x => x.Action).HasMaxLength(100);
        e.Property(x => x.OldValue).HasMaxLength(100_000);
        e.Property(x => x.NewValue).HasMaxLength(100_000);
        e.Property(x => x.PreviousHash).HasMaxLength(64);
        e.Property(x => x.Hash).HasMaxLength(64);

        // Two writers racing for the same position collide here instead of forking the chain.
        e.HasIndex(x => new { x.Chain, x.Index }).IsUnique();
    }
}
