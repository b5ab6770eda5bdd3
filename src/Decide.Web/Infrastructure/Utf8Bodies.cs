using Microsoft.Net.Http.Headers;

namespace Decide.Web.Infrastructure;

/// <summary>
/// The API reads request bodies as UTF-8 only (JSON between systems must be UTF-8: RFC 8259, section 8.1). A body
/// declared in another charset is refused with 415 before an endpoint reads it: the framework's JSON binding would
/// otherwise fail on a charset it does not know with an error that is not a bad request (500).
/// </summary>
public static class Utf8Bodies
{
    public static IApplicationBuilder UseUtf8RequestBodies(this IApplicationBuilder app) => app.Use(async (context, next) =>
    {
        if (context.Request.Path.StartsWithSegments("/api")
            && MediaTypeHeaderValue.TryParse(context.Request.ContentType, out var type)
            && type.Charset.HasValue
            && !IsUtf8(type.Charset.Value.Trim('"')))
        {
            throw new DomainProblem(StatusCodes.Status415UnsupportedMediaType, "Unsupported charset",
                $"Request bodies are read as UTF-8 only; the Content-Type names the charset \"{type.Charset.Value.Trim('"')}\". Send UTF-8 (charset=utf-8, or no charset).");
        }

        await next();
    });

    private static bool IsUtf8(string charset) =>
        charset.Equals("utf-8", StringComparison.OrdinalIgnoreCase) || charset.Equals("utf8", StringComparison.OrdinalIgnoreCase);
}
