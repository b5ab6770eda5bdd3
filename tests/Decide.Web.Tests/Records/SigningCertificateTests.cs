using Decide.Data.Storage;
using Decide.Web.Features.Records;
using Decide.Web.Infrastructure;
using Microsoft.AspNetCore.DataProtection;
using Microsoft.AspNetCore.Hosting;
using Microsoft.Extensions.FileProviders;
using Microsoft.Extensions.Logging.Abstractions;

namespace Decide.Web.Tests.Records;

/// <summary>The service's own record certificate when its protected file cannot be read with the database's keys.</summary>
public sealed class SigningCertificateTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "decide-certificate", Guid.NewGuid().ToString("N"));

    [Fact]
    public void A_certificate_file_protected_with_lost_keys_is_kept_aside_and_a_new_certificate_is_made()
    {
        Directory.CreateDirectory(_folder);
        var file = Path.Combine(_folder, "signing-certificate.protected");
        // Made by another installation: protected with a key ring this one does not have.
        File.WriteAllBytes(file, new EphemeralDataProtectionProvider().CreateProtector("Decide.SelfSignedRecordCertificate").Protect([1, 2, 3]));
        var keys = new EphemeralDataProtectionProvider();

        var first = Certificate(keys);
        Assert.True(first.Certificate.HasPrivateKey);
        Assert.True(first.SelfSigned);
        var aside = Assert.Single(Directory.GetFiles(_folder, "signing-certificate.protected.unreadable-*"));
        Assert.True(new FileInfo(aside).Length > 0);

        // The new file is readable with this installation's keys: the next start signs with the same certificate.
        Assert.Equal(first.Certificate.Thumbprint, Certificate(keys).Certificate.Thumbprint);
    }

    private SigningCertificate Certificate(IDataProtectionProvider keys) => new(
        new SigningOptions(), new DatabaseOptions { DataFolder = _folder }, new Environment(_folder), keys, TimeProvider.System,
        NullLogger<SigningCertificate>.Instance);

    public void Dispose()
    {
        try
        {
            Directory.Delete(_folder, recursive: true);
        }
        catch (IOException)
        {
            // Left for the temp folder's cleaner.
        }
    }

    private sealed class Environment(string root) : IWebHostEnvironment
    {
        public string WebRootPath { get; set; } = root;

        public IFileProvider WebRootFileProvider { get; set; } = new NullFileProvider();

        public string ApplicationName { get; set; } = "Decide.Web";

        public IFileProvider ContentRootFileProvider { get; set; } = new NullFileProvider();

        public string ContentRootPath { get; set; } = root;

        public string EnvironmentName { get; set; } = "Testing";
    }
}
