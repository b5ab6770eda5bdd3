using Decide.Core;
using Decide.Interchange;

namespace Decide.Cli;

/// <summary>
/// Runs a command's work and turns failures into exit codes and one-line messages: never a stack trace for bad
/// input.
/// </summary>
public static class CommandGuard
{
    /// <summary>
    /// Runs <paramref name="body"/>. Invalid input (every problem as <c>PATH: reason</c>) gives
    /// <see cref="ExitCodes.InvalidInput"/>; anything unexpected gives <see cref="ExitCodes.InternalError"/> with one
    /// line <c>internal error: …</c>.
    /// </summary>
    public static int Run(TextWriter stderr, Func<int> body)
    {
        ArgumentNullException.ThrowIfNull(stderr);
        ArgumentNullException.ThrowIfNull(body);
        try
        {
            return body();
        }
        catch (InvalidEvaluationException ex)
        {
            foreach (var error in ex.Errors)
            {
                stderr.WriteLine(OneLine($"{error.Path}: {error.Reason}"));
            }

            return ExitCodes.InvalidInput;
        }
        catch (InputFileException ex)
        {
            stderr.WriteLine(OneLine(ex.Message));
            return ExitCodes.InvalidInput;
        }
        catch (Exception ex)
        {
            stderr.WriteLine(OneLine($"internal error: {ex.Message}"));
            return ExitCodes.InternalError;
        }
    }

    /// <summary>
    /// Reads an evaluation file; a file that cannot be read becomes an <see cref="InputFileException"/> whose
    /// message is <c>FILE: reason</c>.
    /// </summary>
    /// <exception cref="InvalidEvaluationException">The file is read but is not a valid evaluation.</exception>
    /// <exception cref="InputFileException">The file cannot be read.</exception>
    public static EvaluationFile ReadEvaluation(string file) => Read(file, EvaluationFileReader.ReadFile);

    /// <summary>Reads a plan (an evaluation file whose bids, panel and inputs may be absent), as <see cref="ReadEvaluation"/> does.</summary>
    /// <exception cref="InvalidEvaluationException">The plan is read but is not valid.</exception>
    /// <exception cref="InputFileException">The file cannot be read.</exception>
    public static EvaluationFile ReadPlan(string file) => Read(file, path => EvaluationFileReader.ReadPlan(File.ReadAllBytes(path)));

    private static EvaluationFile Read(string file, Func<string, EvaluationFile> read)
    {
        try
        {
            return read(file);
        }
        catch (FileNotFoundException)
        {
            throw new InputFileException(file, "no such file");
        }
        catch (DirectoryNotFoundException)
        {
            throw new InputFileException(file, "no such file (a folder on the path does not exist)");
        }
        catch (UnauthorizedAccessException)
        {
            throw new InputFileException(file, Directory.Exists(file) ? "is a folder, not a file" : "permission denied");
        }
        catch (IOException ex)
        {
            throw new InputFileException(file, $"cannot be read: {ex.Message}");
        }
    }

    private static string OneLine(string text) => text.ReplaceLineEndings(" ");
}
