using System.CommandLine.Parsing;
using System.Globalization;
using System.Numerics;

namespace Decide.Cli;

/// <summary>Parsers shared by the commands' options.</summary>
public static class OptionParsers
{
    /// <summary>
    /// Parses a whole number of at least <paramref name="minimum"/>; anything else is a parse error naming the option,
    /// what it accepts and what was given.
    /// </summary>
    public static Func<ArgumentResult, T> WholeNumber<T>(T minimum, string? note)
        where T : struct, IBinaryInteger<T>
    {
        return result =>
        {
            var text = result.Tokens.Count > 0 ? result.Tokens[^1].Value : "";
            var parsed = T.TryParse(text, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var value);
            if (parsed && value >= minimum)
            {
                return value;
            }

            var option = result.Parent is OptionResult o ? o.Option.Name : "the value";
            var tooLarge = !parsed && text.TrimStart('+').Length > 0 && text.TrimStart('+').All(char.IsAsciiDigit) ? ", which is too large" : "";
            result.AddError($"{option} must be a whole number, {minimum} or more{(note is null ? "" : $" ({note})")}; got '{text}'{tooLarge}.");
            return default;
        };
    }
}
