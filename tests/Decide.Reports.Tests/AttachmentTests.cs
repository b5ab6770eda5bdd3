using Decide.Core.Analysis;
using Decide.Interchange;
using Decide.Reports.Verification;

namespace Decide.Reports.Tests;

public sealed class AttachmentTests
{
    [Fact]
    public void The_embedded_evaluation_file_comes_back_byte_for_byte()
    {
        var (snapshot, fingerprint) = RecordAttachment.Read(SampleRecords.SignedBusStop);

        Assert.Equal(SampleRecords.BusStop.Snapshot.ToArray(), snapshot);
        Assert.Equal(SampleRecords.BusStop.Fingerprint, fingerprint);
    }

    [Fact]
    public void The_embedded_file_re_analyses_to_the_printed_ranking()
    {
        var (snapshot, _) = RecordAttachment.Read(SampleRecords.SignedBusStop);
        var file = EvaluationFileReader.Read(snapshot);
        var again = DecisionEngine.Analyse(file.Evaluation);
        var text = PdfText.Of(SampleRecords.SignedBusStop).Squeezed;

        var at = 0;
        foreach (var row in RecordText.RankingRows(file.Evaluation, again))
        {
            var found = text.IndexOf(PdfText.Squeeze(string.Concat(row)), at, StringComparison.Ordinal);
            Assert.True(found >= 0, $"row {string.Join(" | ", row)} is printed after the previous row");
            at = found;
        }

        Assert.Equal(SampleRecords.BusStop.Analysis.Ranking.Select(r => r.Alternative), again.Ranking.Select(r => r.Alternative));
    }

    [Fact]
    public void A_record_whose_attachment_does_not_match_its_fingerprint_fails_the_attachment_check()
    {
        var other = SampleRecords.BusStop with { Snapshot = "{\"format\":\"decide-evaluation/1\"}"u8.ToArray() };
        using var document = EvaluationRecordDocument.Create(other);
        // State the real record's fingerprint over a different attachment.
        document.Info.Keywords = $"decide-evaluation-record {EvaluationRecordDocument.FingerprintKeyword}{SampleRecords.BusStop.Fingerprint}";
        var pdf = Signing.RecordSigner.Sign(document, SampleRecords.Certificate, "test", "0");

        var report = RecordVerifier.Verify(pdf);

        var failed = Assert.Single(report.Failed);
        Assert.Equal(RecordVerifier.AttachmentCheck, failed.Name);
    }

    [Fact]
    public void The_re_analysis_delegate_receives_the_embedded_file_and_its_verdict_is_reported()
    {
        EmbeddedRecord? seen = null;
        var report = RecordVerifier.Verify(SampleRecords.SignedBusStop, record =>
        {
            seen = record;
            return new VerificationCheck(RecordVerifier.ReanalysisCheck, false, "stub says no");
        });

        Assert.NotNull(seen);
        Assert.Equal(SampleRecords.BusStop.Snapshot.ToArray(), seen.Snapshot.ToArray());
        Assert.Equal(RecordVerifier.ReanalysisCheck, Assert.Single(report.Failed).Name);
    }
}
