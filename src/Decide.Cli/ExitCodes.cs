namespace Decide.Cli;

/// <summary>What <c>decide</c> returns to the shell.</summary>
public static class ExitCodes
{
    /// <summary>The command did what was asked.</summary>
    public const int Success = 0;

    /// <summary>Something went wrong inside Decide (a bug); one line "internal error: …" on stderr.</summary>
    public const int InternalError = 1;

    /// <summary>The input was wrong: a bad option, a file that cannot be read, or an invalid evaluation (every problem on stderr).</summary>
    public const int InvalidInput = 2;

    /// <summary><c>decide verify</c>: the record was read but at least one check failed (each failing check is named on stderr).</summary>
    public const int VerificationFailed = 3;
}
