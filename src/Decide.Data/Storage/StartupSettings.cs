using Microsoft.Extensions.Configuration;

namespace Decide.Data.Storage;

/// <summary>
/// Reads a settings section once, as the service starts, and refuses it with every problem named: a value the binder
/// cannot convert ("Database:Provider", "Security:HttpsPort") or a value out of range. Used for the database, security
/// and signing sections, so a wrong setting stops the start with a sentence that names it, never later in a request.
/// </summary>
public static class StartupSettings
{
    /// <summary>Binds <paramref name="section"/> to a new <typeparamref name="T"/> (defaults where a key is absent) and checks it.</summary>
    /// <param name="configuration">The service's configuration.</param>
    /// <param name="section">The section name, e.g. "Security".</param>
    /// <param name="problems">Every out-of-range setting of the bound value, each a sentence naming its key.</param>
    /// <param name="hint">Added to a conversion failure, e.g. the values a key takes.</param>
    /// <exception cref="InvalidOperationException">A value cannot be converted, or <paramref name="problems"/> names any.</exception>
    public static T Read<T>(IConfiguration configuration, string section, Func<T, IEnumerable<string>> problems, string? hint = null)
        where T : new()
    {
        T value;
        try
        {
            value = configuration.GetSection(section).Get<T>() ?? new T();
        }
        catch (InvalidOperationException e)
        {
            // The binder's message names the key and the value it could not convert.
            throw new InvalidOperationException($"The {section} settings cannot be used: {e.Message}{(hint is null ? "" : $" ({hint})")}", e);
        }

        var found = problems(value).ToArray();
        if (found.Length > 0)
        {
            throw new InvalidOperationException(string.Join(" ", found));
        }

        return value;
    }
}
