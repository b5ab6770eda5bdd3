using System.Globalization;
using System.Net;
using System.Net.Sockets;
using System.Threading.RateLimiting;
using Decide.Web.Components.Account;
using Decide.Web.Features.Accounts;

namespace Decide.Web.Infrastructure;

/// <summary>
/// Counts sign-in attempts per client address and account (<see cref="SignInLimitOptions.PerAccountPermits"/>) and
/// refuses those over a limit, per account here and per address through ASP.NET Core's rate limiter (policy
/// <see cref="SecuritySetup.SignInPolicy"/>). The account is known only once the body is read, so its count is kept in
/// an endpoint filter rather than the rate-limiting middleware; both use the same fixed-window limiters.
/// Refusals never log the account name typed: people sometimes type their password there.
/// </summary>
public sealed class SignInAttempts : IDisposable
{
    private readonly SignInLimitOptions _limits;
    private readonly ILogger<SignInAttempts> _log;
    private readonly PartitionedRateLimiter<string> _perAccount;

    public SignInAttempts(SecurityOptions options, ILogger<SignInAttempts> log)
    {
        _limits = options.SignIn;
        _log = log;
        _perAccount = PartitionedRateLimiter.Create<string, string>(key => RateLimitPartition.GetFixedWindowLimiter(key, _ =>
            new FixedWindowRateLimiterOptions { PermitLimit = _limits.PerAccountPermits, Window = _limits.Window, QueueLimit = 0 }));
    }

    /// <summary>
    /// The client's address as the limits count it: IPv4 as is, IPv6 by its /64 network (one household or server
    /// holds a whole /64), "unknown" when the server does not know it.
    /// </summary>
    public static string AddressOf(HttpContext context)
    {
        var address = context.Connection.RemoteIpAddress;
        if (address is null)
        {
            return "unknown";
        }

        if (address.IsIPv4MappedToIPv6)
        {
            address = address.MapToIPv4();
        }

        if (address.AddressFamily != AddressFamily.InterNetworkV6)
        {
            return address.ToString();
        }

        var bytes = address.GetAddressBytes();
        Array.Clear(bytes, 8, 8);
        return $"{new IPAddress(bytes)}/64";
    }

    /// <summary>The endpoint filter: lets an attempt through, or refuses it when this address has used up this account's attempts.</summary>
    public async ValueTask<object?> FilterAsync(EndpointFilterInvocationContext invocation, EndpointFilterDelegate next)
    {
        var (account, returnUrl) = AccountOf(invocation.Arguments);
        if (string.IsNullOrWhiteSpace(account))
        {
            // A refresh, or an attempt without an account name: only the per-address limit applies.
            return await next(invocation);
        }

        var context = invocation.HttpContext;
        var key = AddressOf(context) + "\n" + account.Trim().ToUpperInvariant();
        using var lease = _perAccount.AttemptAcquire(key);
        if (lease.IsAcquired)
        {
            return await next(invocation);
        }

        return Refuse(context, RetryAfter(lease), perAccount: true, returnUrl);
    }

    /// <summary>Answers a request the rate limiter refused (too many attempts from one address).</summary>
    public Task RefuseAddressAsync(HttpContext context, RateLimitLease lease) =>
        Refuse(context, RetryAfter(lease), perAccount: false, null).ExecuteAsync(context);

    private IResult Refuse(HttpContext context, TimeSpan retryAfter, bool perAccount, string? returnUrl)
    {
        var seconds = Math.Max(1, (int)Math.Ceiling(retryAfter.TotalSeconds));
        var permits = perAccount ? _limits.PerAccountPermits : _limits.PerAddressPermits;
        var scope = perAccount ? "for this account from your address" : "from your address";
        _log.LogWarning("Sign-in attempt from {Address} refused: more than {Permits} attempts in {Window} s {Limit}; retry in {Seconds} s",
            AddressOf(context), permits, _limits.WindowSeconds, perAccount ? "for one account" : "in all", seconds);
        context.Response.Headers.RetryAfter = seconds.ToString(CultureInfo.InvariantCulture);

        if (context.GetEndpoint()?.Metadata.GetMetadata<SignInEndpoint>() is { ReturnsToForm: true })
        {
            var back = string.IsNullOrEmpty(returnUrl) ? "" : $"&returnUrl={Uri.EscapeDataString(returnUrl)}";
            return TypedResults.LocalRedirect($"{IdentitySetup.SignInPath}?problem=throttled&retryAfter={seconds}{back}");
        }

        return TypedResults.Problem(statusCode: StatusCodes.Status429TooManyRequests, title: "Too many sign-in attempts",
            type: "https://www.rfc-editor.org/rfc/rfc6585#section-4",
            detail: $"Too many sign-in attempts {scope}: at most {permits} in {_limits.WindowSeconds} seconds. Try again in {seconds} seconds.",
            extensions: new Dictionary<string, object?> { ["retryAfterSeconds"] = seconds });
    }

    /// <summary>When the refused client may try again: as the limiter says, else at the latest when a new window opens.</summary>
    private TimeSpan RetryAfter(RateLimitLease lease) =>
        lease.TryGetMetadata(MetadataName.RetryAfter, out var retryAfter) && retryAfter > TimeSpan.Zero ? retryAfter : _limits.Window;

    private static (string? Account, string? ReturnUrl) AccountOf(IList<object?> arguments)
    {
        foreach (var argument in arguments)
        {
            switch (argument)
            {
                case SignInRequest api:
                    return (api.Email, null);
                case SignInEndpoints.SignInForm form:
                    return (form.Email, form.ReturnUrl);
            }
        }

        return (null, null);
    }

    public void Dispose() => _perAccount.Dispose();
}
