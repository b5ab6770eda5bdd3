using Decide.Reports.Layout;
using PdfSharp.Drawing;

namespace Decide.Reports;

internal sealed partial class RecordWriter
{
    private void Cover()
    {
        _flow.NewPage();
        var identity = _content.Identity;
        var gfx = _flow.Gfx;
        gfx.DrawRectangle(new XSolidBrush(ReportStyle.Accent), 0, 0, _flow.PageWidth, 8);
        _flow.Y = 90;
        _flow.Paragraph("EVALUATION RECORD", _style.BodyBold, _style.AccentBrush, after: 10);
        _flow.Paragraph(identity.Title, _style.Title, after: 16);
        _flow.Facts(
        [
            ("Organisation", identity.Organisation),
            ("Reference", identity.Reference),
            ("Status", identity.Status),
            .. identity.Dates.Select(d => (d.Label, RecordText.Day(d.When))),
            ("Record produced", RecordText.When(_content.GeneratedAt)),
            ("Software", $"Decide {_content.SoftwareVersion}"),
            ("Fingerprint", $"{_content.Fingerprint}\n(SHA-256 of the evaluation file embedded in this PDF as {EvaluationRecordDocument.AttachmentName})"),
        ], labelWidth: 100);
        _flow.Space(10);
        _flow.Caution("Read this first", RecordText.Cautions);
        if (_content.CertificateNote is { } note)
        {
            _flow.Paragraph(note, _style.Body, _style.MutedBrush);
        }

        _flow.Paragraph(
            "Contents: 1 Summary · 2 Method · 3 The locked plan · 4 Panel and consistency · 5 Decision matrix and ranking · "
            + "6 Robustness · 7 Moderation · 8 Audit trail · 9 Sign-off · Appendix: every assessor's ratings and rationales.",
            _style.Cell, _style.MutedBrush);
    }

    private void Summary()
    {
        _flow.Section("1 Summary");
        var ranking = _content.Analysis.Ranking;
        if (ranking.Count == 0)
        {
            _flow.Paragraph("No alternative passed every gate, so there is no ranking and no recommendation from the analysis.");
        }
        else
        {
            var top = ranking[0];
            var tied = ranking.Where(r => r.Rank == 1).Select(r => _names.Alternative(r.Alternative)).ToArray();
            if (tied.Length > 1)
            {
                _flow.Paragraph($"The analysis does not separate {string.Join(" and ", tied)}: they share first place with closeness {RecordText.Closeness(top.Closeness)}. The panel must break the tie by the rule in its plan.", _style.BodyBold);
            }
            else
            {
                _flow.Paragraph($"Highest-ranked alternative: {_names.Alternative(top.Alternative)}", _style.Heading2, after: 4);
                var text = $"It has the highest closeness coefficient, {RecordText.Closeness(top.Closeness)}, on a scale where 1 would mean it matched the best possible value on every criterion and 0 the worst.";
                if (ranking.Count > 1)
                {
                    var second = ranking[1];
                    text += $" The next, {_names.Alternative(second.Alternative)}, has {RecordText.Closeness(second.Closeness)}: a margin of {RecordText.Closeness(top.Closeness - second.Closeness)}.";
                }

                _flow.Paragraph(text);
            }

            _flow.Paragraph($"{ranking.Count} of {Evaluation.Alternatives.Count} alternatives were ranked"
                + (_content.Analysis.Excluded.Count > 0 ? $"; {_content.Analysis.Excluded.Count} failed a pass/fail gate and took no further part (section 5)." : "."));
        }

        _flow.Heading("How firm is the ranking?");
        _flow.Bullets(_content.Robustness.Summary);
        _flow.Paragraph("Each statement is computed from the figures in section 6. The ranking is a guide for the panel's reasoned judgement; the written rationales in the appendix are the reasons for each score.", _style.Cell, _style.MutedBrush);
    }
}
