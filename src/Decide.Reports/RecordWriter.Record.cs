using Decide.Core.Model;
using Decide.Reports.Layout;

namespace Decide.Reports;

internal sealed partial class RecordWriter
{
    private void Moderation()
    {
        _flow.Section("7 Moderation");
        if (_content.Moderation.Count == 0)
        {
            _flow.Paragraph("No cell was moderated: every cell of the decision matrix is the aggregate of the assessors' own terms.");
            return;
        }

        _flow.Paragraph("Each cell the panel agreed on after discussion. The individual terms are kept unchanged in the appendix; the agreed term replaced their aggregate in the decision matrix.");
        _flow.Table(
            [new("Alternative", 2), new("Criterion", 2.2), new("Original terms", 2.2), new("Agreed", 1.2), new("Reason", 4.5), new("Recorded by, when", 2.2)],
            _content.Moderation.Select(m => (IReadOnlyList<string>)
            [
                _names.Alternative(m.Alternative), _names.Criterion(m.Criterion), string.Join(", ", m.OriginalTerms), m.ModeratedTerm, m.Reason,
                m.At is { } at ? $"{m.By}, {RecordText.When(at)}" : m.By,
            ]));
    }

    private void Audit()
    {
        _flow.Section("8 Audit trail", newPage: _content.Moderation.Count > 8);
        if (_content.Audit is not { } audit)
        {
            _flow.Paragraph("No audit trail accompanies this record: it was produced from an evaluation file outside the service, so there is no log of who did what and when. The embedded evaluation file and the signature below still show that the figures and the file belong together.");
            return;
        }

        _flow.Facts(
        [
            ("Entries", audit.Entries.ToString(System.Globalization.CultureInfo.InvariantCulture)),
            ("First entry", audit.First is { } first ? RecordText.When(first) : "—"),
            ("Last entry", audit.Last is { } last ? RecordText.When(last) : "—"),
            ("Chain head", audit.ChainHead),
            ("Verification", (audit.Verified ? "PASSED. " : "FAILED. ") + audit.VerificationResult),
        ]);
        _flow.Paragraph("Every action on the evaluation is an entry that carries the hash of the entry before it; changing, removing or inserting an entry breaks the chain from that point on. The chain head above fixes the whole trail as it stood when this record was made.", _style.Cell, _style.MutedBrush);
    }

    private void SignOff()
    {
        _flow.Section("9 Sign-off");
        _flow.Caution("Before signing", RecordText.Cautions);
        if (_content.Approvals.Count == 0)
        {
            _flow.Paragraph("No sign-off has been recorded in the service for this record.");
        }
        else
        {
            _flow.Table(
                [new("Name", 2.4), new("Role", 2), new("Signed off", 1.8), new("Statement", 5.5)],
                _content.Approvals.Select(a => (IReadOnlyList<string>)[a.Name, a.Role, RecordText.When(a.At), a.Statement]));
        }

        _flow.Heading("Digital signature");
        _flow.Paragraph($"This PDF carries a digital signature over all of its bytes. Any change after signing, even to one character, makes the signature fail; the command 'decide verify' and common PDF readers check it. The evaluation file the figures were computed from is attached as {EvaluationRecordDocument.AttachmentName}; its SHA-256 is the fingerprint in every footer.");
        if (_content.CertificateNote is { } note)
        {
            _flow.Paragraph(note, _style.BodyBold);
        }
    }

    private void Appendix()
    {
        _flow.Section("Appendix: every assessor's ratings and rationales");
        _flow.Paragraph("The individual ratings exactly as each assessor gave them, before any moderation, with their written rationale or their reason for declining.");
        var scale = Evaluation.RatingScale;
        var labels = scale.Terms.ToDictionary(t => t.Code, t => t.Label, StringComparer.Ordinal);
        var criterionOrder = Evaluation.Criteria.Select((c, i) => (c.Id, i)).ToDictionary(p => p.Id, p => p.i, StringComparer.Ordinal);
        var alternativeOrder = Evaluation.Alternatives.Select((a, i) => (a.Id, i)).ToDictionary(p => p.Id, p => p.i, StringComparer.Ordinal);
        var first = true;
        foreach (var assessor in Evaluation.Assessors)
        {
            var ratings = Evaluation.Ratings.Where(r => r.Assessor == assessor.Id)
                .OrderBy(r => alternativeOrder.GetValueOrDefault(r.Alternative)).ThenBy(r => criterionOrder.GetValueOrDefault(r.Criterion)).ToArray();
            if (!first)
            {
                _flow.Space(6);
            }

            first = false;
            _flow.Heading($"{assessor.Name} ({ratings.Length} ratings)", keepWith: 40);
            if (ratings.Length == 0)
            {
                _flow.Paragraph("No ratings.");
                continue;
            }

            _flow.Table(
                [new("Alternative", 1.8), new("Criterion", 2), new("Term", 1.3), new("Rationale", 7)],
                ratings.Select(r => (IReadOnlyList<string>)
                [
                    _names.Alternative(r.Alternative), _names.Criterion(r.Criterion),
                    r.Term is { } t ? $"{t} {labels.GetValueOrDefault(t, "")}".Trim() : "declined",
                    r.Term is null ? $"Declined: {r.Declined}" : string.IsNullOrWhiteSpace(r.Rationale) ? "(no rationale written)" : r.Rationale!,
                ]));
        }

        if (Evaluation.Values.Count > 0)
        {
            _flow.Heading("Measured values", keepWith: 40);
            var units = Evaluation.Criteria.ToDictionary(c => c.Id, c => c.Unit, StringComparer.Ordinal);
            _flow.Table(
                [new("Alternative", 3), new("Criterion", 3), new("Value", 2, CellAlign.Right)],
                Evaluation.Values.Select(v => (IReadOnlyList<string>)
                [
                    _names.Alternative(v.Alternative), _names.Criterion(v.Criterion),
                    RecordText.Measured(v.Value) + (units.GetValueOrDefault(v.Criterion) is { } u ? " " + u : ""),
                ]));
        }
    }
}
