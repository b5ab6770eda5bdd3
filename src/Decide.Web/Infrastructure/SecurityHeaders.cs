using System.Buffers.Text;
using System.Security.Cryptography;

namespace Decide.Web.Infrastructure;

/// <summary>
/// The headers every response carries (screens, API, static files, errors), among them a Content-Security-Policy
/// the screens work under. What the screens load, and so what the policy allows (ADR 16):
/// <list type="bullet">
/// <item>scripts from this site only: the Blazor script, MudBlazor's script and Decide's own modules; the one inline
/// script, the import map the framework writes into the page, carries a nonce made for the response;</item>
/// <item>styles from this site and inline: MudBlazor writes the theme into a <c>style</c> element and positions and
/// sizes many components with <c>style</c> attributes, as Decide's SVG charts do;</item>
/// <item>images from this site and <c>data:</c> (MudBlazor's stylesheet embeds one);</item>
/// <item>connections to this site only: the interactive screens' WebSocket (CSP level 3 counts ws/wss to the same
/// host as <c>'self'</c>) and fetches.</item>
/// </list>
/// Adding a script, stylesheet or font from anywhere else, or another inline script, means changing this policy.
/// </summary>
public static class SecurityHeaders
{
    private const string NonceKey = "Decide.ContentSecurityPolicy.Nonce";

    /// <summary>The policy without a nonce; <see cref="ContentSecurityPolicy"/> adds one when the page asked for it.</summary>
    public const string BasePolicy =
        "default-src 'self'; script-src 'self'; style-src 'self' 'unsafe-inline'; img-src 'self' data:; font-src 'self'; " +
        "connect-src 'self'; object-src 'none'; base-uri 'self'; form-action 'self'; frame-ancestors 'none'";

    /// <summary>Referrers are never sent: addresses carry evaluation ids, which links to other sites need not learn.</summary>
    public const string ReferrerPolicy = "no-referrer";

    /// <summary>Powerful browser features Decide never uses, switched off for the page and anything it embeds.</summary>
    public const string PermissionsPolicy = "camera=(), microphone=(), geolocation=(), payment=(), usb=()";

    /// <summary>
    /// The nonce for inline scripts of this response (made on first use): the document shell puts it on the import
    /// map, and the policy sent with the response names it.
    /// </summary>
    public static string NonceOf(HttpContext context)
    {
        if (context.Items[NonceKey] is not string nonce)
        {
            // 144 random bits in base64url: characters the policy's grammar allows and HTML needs no escape for.
            nonce = Base64Url.EncodeToString(RandomNumberGenerator.GetBytes(18));
            context.Items[NonceKey] = nonce;
        }

        return nonce;
    }

    /// <summary>The policy for this response: the base policy, plus the nonce if the page used one.</summary>
    public static string ContentSecurityPolicy(HttpContext context) =>
        context.Items[NonceKey] is string nonce
            ? BasePolicy.Replace("script-src 'self'", $"script-src 'self' 'nonce-{nonce}'", StringComparison.Ordinal)
            : BasePolicy;

    /// <summary>Sets the headers on <paramref name="context"/>'s response (replacing any earlier value).</summary>
    public static void Apply(HttpContext context)
    {
        var headers = context.Response.Headers;
        headers.ContentSecurityPolicy = ContentSecurityPolicy(context);
        headers.XContentTypeOptions = "nosniff";
        headers.XFrameOptions = "DENY";
        headers["Referrer-Policy"] = ReferrerPolicy;
        headers["Permissions-Policy"] = PermissionsPolicy;
    }
}
