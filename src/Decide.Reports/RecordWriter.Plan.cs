using Decide.Core.Model;
using Decide.Reports.Layout;

namespace Decide.Reports;

internal sealed partial class RecordWriter
{
    private void Plan()
    {
        _flow.Section("3 The locked plan");
        _flow.Paragraph("The criteria, their descriptors, the weights, the gates and the divergence tolerance below were fixed before the bids were scored.");

        _flow.Heading("Criteria");
        var groups = Evaluation.Groups.ToDictionary(g => g.Id, g => g.Name, StringComparer.Ordinal);
        _flow.Table(
            [new("Criterion", 3.2), new("Group", 2), new("Kind", 1.4), new("Direction", 1.4), new("Unit", 1)],
            Evaluation.Criteria.Select(c => (IReadOnlyList<string>)
            [
                c.Name,
                c.Group is null ? "—" : groups.GetValueOrDefault(c.Group, c.Group),
                c.Kind switch { CriterionKind.Numeric => "numeric", CriterionKind.Gate => "pass/fail gate", _ => "linguistic" },
                c.Kind == CriterionKind.Gate ? "—" : c.Direction == Direction.Cost ? "cost (less is better)" : "benefit",
                c.Unit ?? "",
            ]));

        _flow.Heading("Weights");
        var weights = _content.Analysis.Weights;
        _flow.Table(
            [new("Criterion", 3), new("Group weight", 2.2), new("Weight within group", 2.2), new("Fuzzy weight", 2.2), new("Share", 1, CellAlign.Right)],
            weights.Select(w => (IReadOnlyList<string>)
            [
                _names.Criterion(w.Criterion),
                w.GroupWeight is { } g ? $"{_names.Node(w.Group!)} {RecordText.Tfn(g)}" : "—",
                w.Local is { } l ? RecordText.Tfn(l) : "—",
                RecordText.Tfn(w.Fuzzy),
                RecordText.Percent(w.Crisp),
            ]));

        var rated = Evaluation.Criteria.Where(c => c.Kind == CriterionKind.Linguistic && c.Descriptors is { Count: > 0 }).ToArray();
        if (rated.Length > 0)
        {
            _flow.Heading("Descriptors: what each rating term means, per criterion");
            foreach (var criterion in rated)
            {
                _flow.Paragraph(criterion.Name, _style.BodyBold, after: 2);
                _flow.Table(
                    [new("Term", 1.4), new("Descriptor", 8)],
                    Evaluation.RatingScale.Terms
                        .Where(t => criterion.Descriptors!.ContainsKey(t.Code))
                        .Select(t => (IReadOnlyList<string>)[$"{t.Code} {t.Label}", criterion.Descriptors![t.Code]]));
            }
        }

        var gates = Evaluation.Criteria.Where(c => c.Kind == CriterionKind.Gate).ToArray();
        _flow.Heading("Pass/fail gates");
        if (gates.Length == 0)
        {
            _flow.Paragraph("The plan has no pass/fail gates.");
        }
        else
        {
            _flow.Paragraph($"Gates are checked before scoring; an alternative that fails one takes no further part. Gates: {string.Join("; ", gates.Select(g => g.Name))}.");
            _flow.Table(
                [new("Alternative", 2.5), new("Gate", 2.5), new("Result", 1), new("Note", 5)],
                Evaluation.Gates.Select(g => (IReadOnlyList<string>)
                    [_names.Alternative(g.Alternative), _names.Criterion(g.Criterion), g.Passed ? "passed" : "FAILED", g.Note ?? ""]));
        }

        _flow.Heading("Divergence tolerance");
        _flow.Paragraph($"Cells whose assessors' terms are more than {Evaluation.Options.DivergenceTolerance} scale steps apart are listed for discussion at moderation (section 6, panel agreement).");

        WeightJudgements();
    }

    private void WeightJudgements()
    {
        var assessors = Evaluation.Assessors;
        if (Evaluation.Weighting == WeightingMethod.Importance && Evaluation.Importance.Count > 0)
        {
            _flow.Heading("Importance ratings given by each assessor");
            var nodes = Evaluation.Importance.Select(i => i.Node).Distinct(StringComparer.Ordinal).ToArray();
            var terms = Evaluation.Importance.ToDictionary(i => (i.Assessor, i.Node), i => i.Term);
            foreach (var chunk in assessors.Chunk(6))
            {
                _flow.Table(
                    [new("Criterion or group", 3), .. chunk.Select(a => new TableColumn(a.Name, 1.3, CellAlign.Center))],
                    nodes.Select(n => (IReadOnlyList<string>)
                        [_names.Node(n), .. chunk.Select(a => terms.GetValueOrDefault((a.Id, n), "—"))]));
            }
        }
        else if (Evaluation.Pairwise.Count > 0)
        {
            _flow.Heading("Pairwise judgements given by each assessor");
            _flow.Table(
                [new("Assessor", 2), new("More important", 3), new("than", 3), new("Judgement", 2)],
                Evaluation.Pairwise.Select(p => (IReadOnlyList<string>)
                    [_names.Assessor(p.Assessor), _names.Node(p.Row), _names.Node(p.Col), p.Term ?? RecordText.Tfn(p.Value)]));
        }
    }
}
