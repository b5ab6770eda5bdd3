using System.Text;
using Decide.Core;
using Decide.Core.Analysis;
using Decide.Interchange;
using Decide.Reports;
using Decide.Reports.Verification;

namespace Decide.Recordkeeping;

/// <summary>
/// The re-analysis check of <c>decide verify</c>: reads the embedded evaluation file, analyses it again, and looks for
/// the resulting ranking rows (rank, name, closeness, d⁺, d⁻, formatted as the record prints them) in the record's
/// text, in ranking order, and for the file's fingerprint in the footer.
/// </summary>
public static class PrintedFigures
{
    /// <summary>Runs the check.</summary>
    public static VerificationCheck Check(EmbeddedRecord record)
    {
        ArgumentNullException.ThrowIfNull(record);
        const string name = RecordVerifier.ReanalysisCheck;
        AnalysisResult analysis;
        EvaluationFile file;
        try
        {
            file = EvaluationFileReader.Read(record.Snapshot);
            analysis = DecisionRun.Of(file.Evaluation).Analysis;
        }
        catch (InvalidEvaluationException ex)
        {
            var first = ex.Errors.FirstOrDefault();
            return new VerificationCheck(name, false, $"The embedded file is not a valid evaluation ({ex.Errors.Count} problems; first: {first?.Path}: {first?.Reason}).");
        }

        string text;
        try
        {
            text = PageText(record.Pdf);
        }
        catch (Exception ex) when (ex is not OutOfMemoryException)
        {
            return new VerificationCheck(name, false, $"The record's pages cannot be read as text ({ex.Message.TrimEnd('.')}).");
        }

        var rows = RecordText.RankingRows(file.Evaluation, analysis);
        var at = 0;
        foreach (var row in rows)
        {
            var expected = Squeeze(string.Concat(row));
            var found = text.IndexOf(expected, at, StringComparison.Ordinal);
            if (found < 0)
            {
                return new VerificationCheck(name, false,
                    $"Re-analysis ranks {row[1]} {row[0]} with closeness {row[2]}, d⁺ {row[3]}, d⁻ {row[4]}, but the record does not print that row in that place of the ranking.");
            }

            at = found + expected.Length;
        }

        var fingerprint = Reports.Content.RecordFingerprint.Of(record.Snapshot.Span);
        if (!text.Contains(fingerprint, StringComparison.Ordinal))
        {
            return new VerificationCheck(name, false, $"The pages do not print the embedded file's fingerprint {fingerprint}.");
        }

        return new VerificationCheck(name, true,
            $"Re-analysing the embedded file gives the printed ranking of {rows.Count} alternatives ({string.Join(", ", rows.Select(r => $"{r[1]} {r[2]}"))}), and the pages print its fingerprint.");
    }

    private static string PageText(ReadOnlyMemory<byte> pdf)
    {
        using var document = UglyToad.PdfPig.PdfDocument.Open(pdf.ToArray());
        var builder = new StringBuilder();
        foreach (var page in document.GetPages())
        {
            builder.Append(page.Text);
        }

        return Squeeze(builder.ToString());
    }

    private static string Squeeze(string text)
    {
        var builder = new StringBuilder(text.Length);
        foreach (var c in text)
        {
            if (!char.IsWhiteSpace(c))
            {
                builder.Append(c);
            }
        }

        return builder.ToString();
    }
}
