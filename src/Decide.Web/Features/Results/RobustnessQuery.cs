using System.Globalization;
using Decide.Core.Robustness;
using Decide.Web.Infrastructure;

namespace Decide.Web.Features.Results;

/// <summary>The robustness settings a caller may choose in the query string (<c>?draws=N&amp;seed=S</c>).</summary>
public static class RobustnessQuery
{
    /// <summary>Most Monte Carlo draws one request may ask for.</summary>
    public const int MaxDraws = 100_000;

    /// <summary>
    /// The options for <paramref name="draws"/> (0 to <see cref="MaxDraws"/>; 0 skips rank acceptability) and
    /// <paramref name="seed"/> (a whole number from 0); the engine's defaults for what is not given.
    /// </summary>
    /// <exception cref="DomainProblem">400 naming the parameter.</exception>
    public static RobustnessOptions Parse(string? draws, string? seed)
    {
        var defaults = new RobustnessOptions();
        var errors = new Dictionary<string, string[]>();
        var n = defaults.Draws;
        if (draws is not null && (!int.TryParse(draws, NumberStyles.None, CultureInfo.InvariantCulture, out n) || n > MaxDraws))
        {
            errors["draws"] = [$"give a whole number of Monte Carlo draws from 0 to {MaxDraws:N0} (0 skips rank acceptability; default {defaults.Draws:N0})"];
        }

        var s = defaults.Seed;
        if (seed is not null && !ulong.TryParse(seed, NumberStyles.None, CultureInfo.InvariantCulture, out s))
        {
            errors["seed"] = [$"give the seed as a whole number from 0 to {ulong.MaxValue} (default {defaults.Seed})"];
        }

        if (errors.Count > 0)
        {
            throw DomainProblem.Invalid(errors);
        }

        return defaults with { Draws = n, Seed = s };
    }
}
