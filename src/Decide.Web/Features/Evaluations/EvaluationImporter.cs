using System.Text.Json;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Interchange;

namespace Decide.Web.Features.Evaluations;

/// <summary>
/// Stores a portable evaluation file as a new evaluation: the plan, the panel (each assessor code mapped to an
/// account), the bids and every input. Shared by the import endpoint and the demo seed.
/// </summary>
public static class EvaluationImporter
{
    /// <summary>The plan part of a file: everything but the panel, the bids and the inputs.</summary>
    public static string PlanJson(EvaluationFile file) => EvaluationFileWriter.ToJson(file.PlanOnly());

    /// <summary>Adds the evaluation to <paramref name="db"/> (not saved).</summary>
    /// <param name="db">Unit of work.</param>
    /// <param name="file">A valid evaluation file.</param>
    /// <param name="accounts">Account id for each assessor code of the file.</param>
    /// <param name="facilitatorId">The facilitator's account.</param>
    /// <param name="createdBy">Who imports.</param>
    /// <param name="now">Import time.</param>
    public static StoredEvaluation Add(
        DecideDbContext db, EvaluationFile file, IReadOnlyDictionary<string, string> accounts, string facilitatorId, string createdBy, DateTimeOffset now)
    {
        var e = file.Evaluation;
        var stored = new StoredEvaluation
        {
            Id = Guid.NewGuid(),
            Reference = file.Metadata.Reference ?? "",
            Title = e.Title,
            Organisation = file.Metadata.Organisation,
            PlanJson = PlanJson(file),
            IsRound = file.Evaluation.Reviews is not null,
            CreatedAt = now,
            CreatedBy = createdBy,
        };
        stored.Panel.Add(new PanelMember { UserId = facilitatorId, Role = PanelRole.Facilitator });
        foreach (var assessor in e.Assessors)
        {
            stored.Panel.Add(new PanelMember
            {
                UserId = accounts[assessor.Id],
                Role = PanelRole.Assessor,
                AssessorCode = assessor.Id,
                Weight = assessor.Weight,
                AssignedCriteriaJson = assessor.Criteria is null ? null : JsonSerializer.Serialize(assessor.Criteria),
                TopicsJson = assessor.Topics is { Count: > 0 } topics ? JsonSerializer.Serialize(topics) : null,
            });
        }

        stored.Alternatives.AddRange(e.Alternatives.Select((a, i) => new StoredAlternative
        {
            Code = a.Id, Name = a.Name, Position = i, AddedAt = now, RequestedAmount = a.Requested, Topic = a.Topic,
        }));
        if (e.Reviews is { } design)
        {
            db.ReviewAssignments.AddRange(design.Assigned.SelectMany(r => r.Alternatives.Select(alt => new ReviewAssignmentEntry
            {
                EvaluationId = stored.Id, AssessorCode = r.Assessor, AlternativeCode = alt, Source = "imported", AssignedBy = createdBy, AssignedAt = now,
            })));
        }

        db.Evaluations.Add(stored);
        db.WeightJudgements.AddRange(e.Importance.Select(r => new WeightJudgement
        {
            EvaluationId = stored.Id, AssessorCode = r.Assessor, Kind = WeightJudgement.ImportanceKind, Node = r.Node, Term = r.Term, UpdatedAt = now,
        }));
        db.WeightJudgements.AddRange(e.Pairwise.Select(p => new WeightJudgement
        {
            EvaluationId = stored.Id, AssessorCode = p.Assessor, Kind = WeightJudgement.PairwiseKind, Node = p.Row, Column = p.Col, Term = p.Term,
            Lower = p.Term is null ? p.Value.Lower : null, Middle = p.Term is null ? p.Value.Middle : null, Upper = p.Term is null ? p.Value.Upper : null,
            UpdatedAt = now,
        }));
        db.Ratings.AddRange(e.Ratings.Select(r => new RatingEntry
        {
            EvaluationId = stored.Id, AssessorCode = r.Assessor, AlternativeCode = r.Alternative, CriterionId = r.Criterion,
            Term = r.Term, Rationale = r.Rationale, DeclinedReason = r.Declined, UpdatedAt = now,
        }));
        db.NumericValues.AddRange(e.Values.Select(v => new NumericEntry
        {
            EvaluationId = stored.Id, AlternativeCode = v.Alternative, CriterionId = v.Criterion, Value = v.Value, EnteredBy = createdBy, UpdatedAt = now,
        }));
        db.GateResults.AddRange(e.Gates.Select(g => new GateEntry
        {
            EvaluationId = stored.Id, AlternativeCode = g.Alternative, CriterionId = g.Criterion, Passed = g.Passed, Note = g.Note, EnteredBy = createdBy, UpdatedAt = now,
        }));
        db.Moderation.AddRange(e.Moderated.Select(m => new ModerationEntry
        {
            EvaluationId = stored.Id, AlternativeCode = m.Alternative, CriterionId = m.Criterion, Term = m.Term, Reason = m.Reason,
            AgreedByJson = JsonSerializer.Serialize(m.AgreedBy ?? []), RecordedBy = createdBy, RecordedAt = now,
        }));
        db.LowPriceReviews.AddRange(e.LowPriceReviews.Select(r => new LowPriceReviewEntry
        {
            EvaluationId = stored.Id, AlternativeCode = r.Alternative, Asked = r.Asked, AskedBy = createdBy, AskedAt = now,
            Answer = r.Answer, AnsweredAt = r.Answer is null ? null : now,
            Decision = r.Decision is { } d ? FormatWords.Of(d) : null, Reasons = r.Reasons,
            DecidedBy = r.Decision is null ? null : createdBy, DecidedAt = r.Decision is null ? null : now, Version = 1,
        }));
        if (e.Award is { TwoStage: true } award && e.Values.Any(v => v.Criterion == award.PriceCriterion))
        {
            stored.MarkPricesOpenedByImport(now, createdBy, twoStage: true);
        }

        return stored;
    }

    /// <summary>True when importing <paramref name="file"/> counts as opening its sealed prices (a two-stage plan whose file holds prices).</summary>
    public static bool OpensPrices(EvaluationFile file) =>
        file.Evaluation.Award is { TwoStage: true } award && file.Evaluation.Values.Any(v => v.Criterion == award.PriceCriterion);
}
