using Decide.Core.Model;
using Decide.Reports.Content;
using Decide.Reports.Layout;
using PdfSharp.Pdf;

namespace Decide.Reports;

/// <summary>Writes the sections of the evaluation record in order; each section lives in its own file.</summary>
internal sealed partial class RecordWriter
{
    private readonly RecordContent _content;
    private readonly PageFlow _flow;
    private readonly ReportStyle _style = new();
    private readonly RecordNames _names;

    public RecordWriter(PdfDocument document, RecordContent content)
    {
        _content = content;
        _flow = new PageFlow(document, _style);
        _names = new RecordNames(content.Evaluation);
    }

    private Evaluation Evaluation => _content.Evaluation;

    public void Write()
    {
        using (_flow)
        {
            Cover();
            Summary();
            Method();
            Plan();
            Panel();
            Results();
            Robustness();
            Moderation();
            Audit();
            SignOff();
            Appendix();
            _flow.FinishPages(
                $"Evaluation record {_content.Identity.Reference} · {_content.Identity.Organisation}",
                $"Fingerprint (SHA-256 of the embedded {EvaluationRecordDocument.AttachmentName}): {_content.Fingerprint}");
        }
    }
}
