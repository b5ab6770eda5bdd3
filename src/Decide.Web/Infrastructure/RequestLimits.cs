namespace Decide.Web.Infrastructure;

/// <summary>
/// Every size limit on what a client sends, in one place, each with the reason for its value. Kestrel enforces the
/// body limits and answers 413 with a problem document naming the limit (<see cref="ProblemHandler"/>); the stateless
/// analysis also counts what it reads (it reads the raw body), and the screens check a file's size before reading it.
/// </summary>
public static class RequestLimits
{
    /// <summary>
    /// The largest request body of the API and the screens' posts (10 MiB). The biggest body is an evaluation file to
    /// import or analyse: a large tender of 30 bids, 20 criteria and 7 assessors with 1,000-character rationales is
    /// about 5 MB; the demo (6 bids, 9 criteria, 5 assessors) is 34 KB.
    /// </summary>
    public const long MaxRequestBodyBytes = 10 * 1024 * 1024;

    /// <summary>
    /// The largest signed record accepted for checking (20 MiB), on the screen and through
    /// <c>POST /api/records/verification</c>. A record embeds the evaluation file (up to
    /// <see cref="MaxRequestBodyBytes"/>) besides its pages; the demo's record is 174 KB (docs/performance.md).
    /// </summary>
    public const long MaxRecordBytes = 20 * 1024 * 1024;

    /// <summary>
    /// The largest form post (64 KiB). The only forms are the sign-in and sign-out posts: an e-mail address, a password,
    /// a return address and the antiforgery token, well under 4 KB. Every other request is JSON.
    /// </summary>
    public const int MaxFormBytes = 64 * 1024;

    /// <summary>
    /// The largest message a screen's circuit accepts from the browser (32 KiB, SignalR's own default, stated here so
    /// that it is a decision). The longest text a screen sends in one message is a 4,000-character field (a rationale,
    /// a minute, a statement; each input says so with <c>maxlength</c>): at most 12 KB as UTF-8, 24 KB if every
    /// character were escaped. Files are streamed in chunks that fit (Blazor's <c>InputFile</c>).
    /// </summary>
    public const long MaxCircuitMessageBytes = 32 * 1024;

    /// <summary>A size in words for messages ("10 MB", "64 KB", "21.3 MB"; a megabyte here is 1,048,576 bytes).</summary>
    public static string Describe(long bytes) => bytes switch
    {
        >= 1024 * 1024 => (bytes % (1024 * 1024) == 0 ? $"{bytes / (1024 * 1024)}" : (bytes / (1024.0 * 1024)).ToString("0.0", System.Globalization.CultureInfo.InvariantCulture)) + " MB",
        >= 1024 => (bytes % 1024 == 0 ? $"{bytes / 1024}" : (bytes / 1024.0).ToString("0.0", System.Globalization.CultureInfo.InvariantCulture)) + " KB",
        _ => $"{bytes} bytes",
    };

    /// <summary>
    /// True when the server refused to read more of a body than its limit, perhaps wrapped by whoever was reading
    /// (the antiforgery check reads a form first and reports any failure as its own).
    /// </summary>
    public static bool IsOverLimit(Exception? exception)
    {
        for (; exception is not null; exception = exception.InnerException)
        {
            if (exception is BadHttpRequestException { StatusCode: StatusCodes.Status413PayloadTooLarge })
            {
                return true;
            }
        }

        return false;
    }
}
