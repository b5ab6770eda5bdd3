namespace Decide.Cli;

/// <summary>A file named on the command line cannot be read; the message is <c>FILE: reason</c>.</summary>
public sealed class InputFileException : Exception
{
    /// <summary>Creates the exception for <paramref name="file"/>.</summary>
    public InputFileException(string file, string reason)
        : base($"{file}: {reason}")
    {
        File = file;
        Reason = reason;
    }

    /// <summary>The file as given on the command line.</summary>
    public string File { get; }

    /// <summary>Why it cannot be read.</summary>
    public string Reason { get; }
}
