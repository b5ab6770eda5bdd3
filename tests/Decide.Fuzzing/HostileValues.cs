namespace Decide.Fuzzing;

/// <summary>The hostile material the mutators draw from.</summary>
public static class HostileValues
{
    /// <summary>
    /// Numbers and would-be numbers: beyond double's range (1e309 reads as infinity), at its edges, negative zero,
    /// integers past 2^31 and 2^63, and tokens that are not JSON at all (NaN, Infinity, leading zeros, hex).
    /// </summary>
    public static readonly string[] Numbers =
    [
        "1e308", "-1e308", "1e309", "-1e400", "1.7976931348623157e308", "5e-324", "4e-325", "-0", "0", "-1", "-1e-300",
        "2147483648", "-2147483649", "9223372036854775808", "123456789012345678901234567890", "1E400", "0.1e1",
        "1.0000000000000002", "0.5", "7", "1000000", "NaN", "Infinity", "-Infinity", "01", "1e", ".5", "+1", "0x10",
        "1_000", "\"NaN\"", "\"Infinity\"", "\"1e400\"", "\"-0\"", "\"7\"", "\"\"",
    ];

    /// <summary>
    /// Text a bidder, an assessor or an attacker might put in a name or an id: markup and script, spreadsheet
    /// formula prefixes (OWASP "CSV Injection"), control and invisible characters, right-to-left text, unpaired
    /// surrogates, characters that mean something in JSON paths and format strings, and the empty string.
    /// </summary>
    public static readonly string[] Texts =
    [
        "<script>alert(1)</script>", "<img src=x onerror=alert(1)>", "\"><svg onload=alert(1)>", "=HYPERLINK(\"http://example.invalid\",\"x\")",
        "+cmd|' /C calc'!A0", "-2+3", "@SUM(1+1)", "\t=1+1", "\r=1+1", "=1+1", "", " ", "\u0000", "a\u0000b", "\u001b[31mred",
        "\u202Egnp.exe", "\u200B", "\uFEFF", "\uD800", "x\uDC00y", "\uDBFF\uDFFF", "𝕯𝖊𝖈𝖎𝖉𝖊", "e\u0301\u0301\u0301", "מערכות שלט", "شركة النور",
        "$.ratings['x']", "a.b[0]", "'", "\\", "%s%n{0}", "../../etc/passwd", "x-extension", "null", "true", "format",
        "decide-evaluation/1", "decide-results/1", new string('\n', 3), "\r\n", "\u2028\u2029", "\uFFFF", "\uFFFE",
    ];

    /// <summary>
    /// String contents that are not valid JSON or not valid UTF-8, written between quotes as they are: raw control
    /// characters, an unpaired surrogate encoded as UTF-8, an overlong encoding, stray and truncated bytes.
    /// </summary>
    public static readonly byte[][] RawStrings =
    [
        [0x01], [(byte)'\t'], [(byte)'\n'], [0x00], [0xED, 0xA0, 0x80], [0xC0, 0xAF], [0xFF], [0xFE, 0xFF], [0xE2, 0x82],
        [0xC3, 0x28], [0xF4, 0x90, 0x80, 0x80], [(byte)'\\'], [(byte)'\\', (byte)'u', (byte)'1'], [(byte)'\\', (byte)'x', (byte)'4', (byte)'1'],
    ];

    /// <summary>Bytes inserted into or appended to a file.</summary>
    public static readonly byte[][] Garbage =
    [
        [0xFF], [0xC3, 0x28], [0xED, 0xA0, 0x80], [0x00], [0xEF, 0xBB, 0xBF], [(byte)'}'], [(byte)']'], [(byte)','], [(byte)'"'],
        [(byte)'{', (byte)'}'], [(byte)'/', (byte)'/', (byte)'x'], [(byte)'/', (byte)'*'], "\u2028"u8.ToArray(), [0x1A],
    ];

    /// <summary>
    /// The most a mutated document may weigh (12 MiB): past the service's 10 MiB body limit, so that refusals for
    /// size are exercised too, but far from what would exhaust the test's memory. A mutation that would make the
    /// document heavier is undone (a 2 MB id copied into 200 new criteria once made 400 MB).
    /// </summary>
    public const long MaxDocumentBytes = 12 * 1024 * 1024;

    /// <summary>Lengths of long strings: past the service's field limits, past 64 KiB, and a million characters.</summary>
    public static readonly int[] Lengths = [301, 4001, 65_537, 1_000_000];

    /// <summary>What long strings are made of: one byte, two, four (a surrogate pair), escapes, a control character.</summary>
    public static readonly string[] Fillers = ["x", "é", "😀", "\"", "\\", "\u0001", "<"];

    /// <summary>Depths of nesting around either side of the readers' limits (32 for the service, 64 for the file reader).</summary>
    public static readonly int[] Depths = [2, 31, 33, 63, 64, 65, 200, 5000];

    /// <summary>How many copies a list is grown to.</summary>
    public static readonly int[] Copies = [2, 10, 200, 2000];

    /// <summary>
    /// How many criteria an evaluation is widened by, keeping it valid. Robustness costs grow faster than the square
    /// of the number of criteria (docs/performance.md): 200 keeps a case within seconds.
    /// </summary>
    public static readonly int[] Widths = [20, 60, 200];

    /// <summary>
    /// Content types a client might send with the body. Most cases send JSON properly; the rest are wrong, missing or
    /// claim another encoding.
    /// </summary>
    public static readonly string?[] ContentTypes =
    [
        "application/json", "application/json; charset=utf-8", "text/plain", null, "application/x-www-form-urlencoded",
        "multipart/form-data; boundary=x", "application/json; charset=utf-16", "application/xml", "application/json; charset=\"bogus\"",
        "application/problem+json", "application/pdf", "*/*", "application/json; charset=latin1",
    ];
}
