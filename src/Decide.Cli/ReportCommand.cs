using Decide.Recordkeeping;
using System.CommandLine;
using System.Security.Cryptography;
using System.Security.Cryptography.X509Certificates;
using Decide.Core.Robustness;
using Decide.Reports.Signing;

namespace Decide.Cli;

/// <summary>
/// <c>decide report FILE -o OUT.pdf [--sign CERT.pfx --password-env VAR] [--draws N] [--seed S]</c>: analyses an
/// evaluation file and writes the signed evaluation record. Without <c>--sign</c> a self-signed certificate is made
/// for the run, and the record says what that does and does not prove.
/// </summary>
public sealed class ReportCommand
{
    private readonly TextWriter _stdout;
    private readonly TextWriter _stderr;
    private readonly TimeProvider _clock;

    private readonly Argument<string> _file = new("file") { Description = "The evaluation file (decide-evaluation/1)." };

    private readonly Option<string> _output = new("--output", "-o")
    {
        Description = "Where to write the PDF.",
        Required = true,
        HelpName = "OUT.pdf",
    };

    private readonly Option<string?> _sign = new("--sign")
    {
        Description = "A PKCS#12 (.pfx) certificate with its private key to sign with. Without it a self-signed certificate is made for this run.",
        HelpName = "CERT.pfx",
    };

    private readonly Option<string?> _passwordEnv = new("--password-env")
    {
        Description = "The environment variable holding the .pfx password (never pass a password on the command line).",
        HelpName = "VAR",
    };

    private readonly Option<int> _draws = new("--draws")
    {
        Description = "Monte Carlo draws for rank acceptability; 0 skips it.",
        DefaultValueFactory = _ => RobustnessOptions.DefaultDraws,
        CustomParser = OptionParsers.WholeNumber(0, "0 skips rank acceptability"),
        HelpName = "N",
    };

    private readonly Option<ulong> _seed = new("--seed")
    {
        Description = "Seed of the draws; the same seed gives the same figures.",
        DefaultValueFactory = _ => RobustnessOptions.DefaultSeed,
        CustomParser = OptionParsers.WholeNumber(0UL, null),
        HelpName = "S",
    };

    /// <summary>Creates the command.</summary>
    public ReportCommand(TextWriter stdout, TextWriter stderr, TimeProvider? clock = null)
    {
        _stdout = stdout;
        _stderr = stderr;
        _clock = clock ?? TimeProvider.System;
        Command = new Command("report", "Write the signed evaluation record (PDF) of an evaluation file, with the file embedded.");
        Command.Arguments.Add(_file);
        Command.Options.Add(_output);
        Command.Options.Add(_sign);
        Command.Options.Add(_passwordEnv);
        Command.Options.Add(_draws);
        Command.Options.Add(_seed);
        Command.SetAction(parse => Execute(
            parse.GetValue(_file)!, parse.GetValue(_output)!, parse.GetValue(_sign), parse.GetValue(_passwordEnv),
            new RobustnessOptions(parse.GetValue(_draws), parse.GetValue(_seed), Environment.ProcessorCount)));
    }

    /// <summary>The command to add to the tree.</summary>
    public Command Command { get; }

    /// <summary>Reads, analyses, renders, signs and writes; returns an <see cref="ExitCodes"/> value.</summary>
    public int Execute(string file, string output, string? certificateFile, string? passwordVariable, RobustnessOptions robustness) => CommandGuard.Run(_stderr, () =>
    {
        if (passwordVariable is not null && certificateFile is null)
        {
            throw new InputFileException("--password-env", "only makes sense with --sign CERT.pfx");
        }

        var input = CommandGuard.ReadEvaluation(file);
        var now = _clock.GetUtcNow();
        using var certificate = certificateFile is null
            ? SelfSignedCertificate.Create("Decide evaluation record (self-signed)", now.AddMinutes(-5), TimeSpan.FromDays(3650))
            : LoadCertificate(certificateFile, passwordVariable);
        var selfSigned = SelfSignedCertificate.IsSelfSigned(certificate);
        var content = RecordContentBuilder.Build(input, robustness, now, selfSigned ? SelfSignedCertificate.Note : null);
        var pdf = RecordSigner.Sign(content, certificate);
        try
        {
            File.WriteAllBytes(output, pdf);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            throw new InputFileException(output, $"cannot be written: {ex.Message}");
        }

        _stdout.WriteLine($"Wrote {output} ({pdf.Length / 1024.0:F0} KB), signed by {certificate.Subject}{(selfSigned ? " (self-signed: proves the file is unchanged, not who signed it)" : "")}.");
        _stdout.WriteLine($"Fingerprint (SHA-256 of the embedded evaluation.json): {content.Fingerprint}");
        return ExitCodes.Success;
    });

    private static X509Certificate2 LoadCertificate(string path, string? passwordVariable)
    {
        string? password = null;
        if (passwordVariable is not null)
        {
            password = Environment.GetEnvironmentVariable(passwordVariable)
                ?? throw new InputFileException(path, $"the password variable {passwordVariable} named by --password-env is not set");
        }

        X509Certificate2 certificate;
        try
        {
            certificate = X509CertificateLoader.LoadPkcs12FromFile(path, password, X509KeyStorageFlags.Exportable);
        }
        catch (FileNotFoundException)
        {
            throw new InputFileException(path, "no such file");
        }
        catch (DirectoryNotFoundException)
        {
            throw new InputFileException(path, "no such file (a folder on the path does not exist)");
        }
        catch (CryptographicException ex)
        {
            throw new InputFileException(path, $"cannot be read as a PKCS#12 certificate (wrong password, or not a .pfx file): {ex.Message.TrimEnd('.')}");
        }

        if (!certificate.HasPrivateKey)
        {
            certificate.Dispose();
            throw new InputFileException(path, "holds no private key, so it cannot sign");
        }

        return certificate;
    }
}
