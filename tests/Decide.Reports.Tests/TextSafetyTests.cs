using Decide.Reports.Signing;

namespace Decide.Reports.Tests;

public sealed class TextSafetyTests
{
    private const string Markup = "<b>Acme</b> & \"Sons\" <script>alert(1)</script>";
    private const string Hebrew = "מערכות שלט בע\"מ";
    private const string Arabic = "شركة النور للأنظمة";

    // Spreadsheet formulas (prefixes from OWASP's "CSV Injection" page): a PDF has no formulas, but the record must
    // print such names as written, not drop or alter the leading character.
    private const string Hyperlink = "=HYPERLINK(\"http://example.invalid\",\"Click\")";
    private const string Command = "+cmd|' /C calc'!A0";
    private const string Sums = "@SUM(1+1) -2+3";

    private static readonly Lazy<PdfText> Text = new(() =>
    {
        var file = SampleRecords.BusStopFile();
        var ids = file.Evaluation.Alternatives.Select(a => a.Id).ToArray();
        var renamed = SampleRecords.Renamed(file, new Dictionary<string, string>
        {
            [ids[0]] = Markup, [ids[1]] = Hebrew, [ids[2]] = Arabic, [ids[3]] = Hyperlink, [ids[4]] = Command, [ids[5]] = Sums,
        });
        return PdfText.Of(RecordSigner.Sign(SampleRecords.Build(renamed, draws: 200), SampleRecords.Certificate));
    });

    [Fact]
    public void A_name_with_markup_is_printed_literally()
    {
        Assert.Contains(PdfText.Squeeze(Markup), Text.Value.Squeezed);
    }

    [Theory]
    [InlineData(Hyperlink)]
    [InlineData(Command)]
    [InlineData(Sums)]
    public void A_name_that_is_a_spreadsheet_formula_is_printed_literally(string name)
    {
        Assert.Contains(PdfText.Squeeze(name), Text.Value.Squeezed);
    }

    [Fact]
    public void A_hebrew_name_is_drawn_as_text_in_reading_order()
    {
        Assert.Contains(PdfText.Squeeze(Hebrew), Text.Value.Squeezed);
    }

    [Fact]
    public void An_arabic_name_is_drawn_as_text_in_reading_order()
    {
        Assert.Contains(PdfText.Squeeze(Arabic), Text.Value.Squeezed);
    }
}
