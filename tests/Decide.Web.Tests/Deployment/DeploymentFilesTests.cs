using System.Text.RegularExpressions;
using YamlDotNet.RepresentationModel;

namespace Decide.Web.Tests.Deployment;

/// <summary>
/// Docker does not run on the development machines: the deployment files are parsed and cross-checked instead
/// (the compose file as YAML, the proxy configuration's structure, the Dockerfile's stages and settings).
/// </summary>
public sealed partial class DeploymentFilesTests
{
    private static YamlMappingNode Compose()
    {
        var yaml = new YamlStream();
        using var reader = new StreamReader(RepositoryFiles.PathOf("deploy/compose.yaml"));
        yaml.Load(reader);
        return (YamlMappingNode)yaml.Documents[0].RootNode;
    }

    private static YamlMappingNode Map(YamlMappingNode node, string key) => (YamlMappingNode)node.Children[new YamlScalarNode(key)];

    [Fact]
    public void The_compose_file_parses_and_runs_a_proxy_two_instances_and_postgres_with_volumes()
    {
        var services = Map(Compose(), "services");
        var names = services.Children.Keys.Select(k => ((YamlScalarNode)k).Value ?? "").ToArray();
        Assert.Equal(new[] { "proxy", "app1", "app2", "db" }, names);

        // The two instances are the same definition (a YAML anchor), on PostgreSQL, without the demo.
        foreach (var app in new[] { "app1", "app2" })
        {
            var environment = Map(Map(services, app), "environment");
            Assert.Equal("Postgres", environment.Children[new YamlScalarNode("Database__Provider")].ToString());
            Assert.Equal("false", environment.Children[new YamlScalarNode("Database__SeedDemo")].ToString());
            Assert.Equal("decide.env", Map(services, app).Children[new YamlScalarNode("env_file")].ToString());
        }

        var proxy = Map(services, "proxy");
        var mounted = ((YamlSequenceNode)proxy.Children[new YamlScalarNode("volumes")]).Children.Select(c => c.ToString()).ToArray();
        Assert.Contains(mounted, m => m.StartsWith("./nginx/decide.conf:", StringComparison.Ordinal));
        Assert.True(File.Exists(RepositoryFiles.PathOf("deploy/nginx/decide.conf")));
        Assert.True(Map(services, "db").Children.ContainsKey(new YamlScalarNode("healthcheck")));
        Assert.True(Map(Compose(), "volumes").Children.ContainsKey(new YamlScalarNode("pgdata")));
    }

    [Fact]
    public void The_proxy_configuration_is_balanced_sticky_passes_websockets_and_targets_both_instances_on_the_container_port()
    {
        var conf = File.ReadAllText(RepositoryFiles.PathOf("deploy/nginx/decide.conf"));
        var code = string.Join("\n", conf.Split('\n').Select(l => l.Split('#')[0]));
        Assert.Equal(code.Count(c => c == '{'), code.Count(c => c == '}'));
        foreach (var statement in code.Split('\n').Select(l => l.Trim()).Where(l => l.Length > 0 && !l.EndsWith('{') && l != "}"))
        {
            Assert.True(statement.EndsWith(';'), $"nginx statement without ';': {statement}");
        }

        Assert.Contains("ip_hash;", code);
        Assert.Contains("proxy_set_header Upgrade $http_upgrade;", code);
        Assert.Contains("proxy_set_header Connection $connection_upgrade;", code);
        var port = PortOf(File.ReadAllText(RepositoryFiles.PathOf("Dockerfile")));
        Assert.Contains($"server app1:{port}", code);
        Assert.Contains($"server app2:{port}", code);
    }

    [Fact]
    public void The_proxy_terminates_tls_and_redirects_plain_http_and_the_instances_require_https_from_it()
    {
        var code = string.Join("\n", File.ReadAllLines(RepositoryFiles.PathOf("deploy/nginx/decide.conf")).Select(l => l.Split('#')[0]));
        var servers = code.Split("server {").Skip(1).ToArray();
        var plain = Assert.Single(servers, s => s.Contains("listen 80;", StringComparison.Ordinal));
        var tls = Assert.Single(servers, s => s.Contains("listen 443 ssl;", StringComparison.Ordinal));

        // Port 80 forwards nothing to the instances: it only sends browsers to HTTPS.
        Assert.DoesNotContain("proxy_pass", plain);
        Assert.Contains("return 301 https://$host$request_uri;", plain);
        Assert.Contains("proxy_pass http://decide;", tls);
        Assert.Contains("ssl_certificate /etc/nginx/tls/decide.crt;", tls);
        Assert.Contains("ssl_certificate_key /etc/nginx/tls/decide.key;", tls);
        Assert.Contains("proxy_set_header X-Forwarded-Proto $scheme;", tls);
        Assert.Contains("proxy_set_header X-Forwarded-For $proxy_add_x_forwarded_for;", tls);

        var proxy = Map(Map(Compose(), "services"), "proxy");
        var ports = ((YamlSequenceNode)proxy.Children[new YamlScalarNode("ports")]).Children.Select(c => c.ToString()).ToArray();
        Assert.Contains("443:443", ports);
        var mounted = ((YamlSequenceNode)proxy.Children[new YamlScalarNode("volumes")]).Children.Select(c => c.ToString()).ToArray();
        Assert.Contains("./tls:/etc/nginx/tls:ro", mounted);

        // The instances require HTTPS and trust the proxy's X-Forwarded-Proto; the container's own health check asks
        // over plain HTTP, which the service never redirects (Security/HttpsTests).
        var settings = File.ReadAllLines(RepositoryFiles.PathOf("deploy/decide.env.example")).Where(l => l.Length > 0 && !l.StartsWith('#')).ToArray();
        Assert.Contains("Security__RequireHttps=true", settings);
        Assert.Contains(settings, l => l.StartsWith("Proxy__KnownNetworks__0=", StringComparison.Ordinal) && l.Length > "Proxy__KnownNetworks__0=".Length);
        Assert.Contains("GET /health/live HTTP/1.0", File.ReadAllText(RepositoryFiles.PathOf("deploy/healthcheck.sh")));
    }

    [Fact]
    public void The_dockerfile_builds_in_one_stage_and_runs_as_a_non_root_user_with_a_volume_and_a_health_check()
    {
        var docker = File.ReadAllText(RepositoryFiles.PathOf("Dockerfile"));
        Assert.Equal(2, Regex.Matches(docker, "^FROM ", RegexOptions.Multiline).Count);
        Assert.Matches(new Regex("^USER \\$APP_UID$", RegexOptions.Multiline), docker);
        Assert.Matches(new Regex("^VOLUME \\[\"/data\"\\]$", RegexOptions.Multiline), docker);
        Assert.Matches(new Regex("^HEALTHCHECK .*decide-healthcheck", RegexOptions.Multiline), docker);
        Assert.Contains("COPY deploy/healthcheck.sh", docker);
        Assert.True(File.Exists(RepositoryFiles.PathOf("deploy/healthcheck.sh")));
    }

    [Fact]
    public void The_environment_example_names_every_secret_to_change_and_no_real_one()
    {
        var lines = File.ReadAllLines(RepositoryFiles.PathOf("deploy/decide.env.example"))
            .Where(l => l.Length > 0 && !l.StartsWith('#')).ToArray();
        Assert.All(lines, l => Assert.Matches("^[A-Za-z_0-9]+=", l));
        Assert.Contains(lines, l => l.StartsWith("POSTGRES_PASSWORD=CHANGE-ME", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.StartsWith("ConnectionStrings__Decide=", StringComparison.Ordinal) && l.Contains("Password=CHANGE-ME"));
    }

    private static int PortOf(string dockerfile) => int.Parse(HttpPorts().Match(dockerfile).Groups[1].Value);

    [GeneratedRegex("ASPNETCORE_HTTP_PORTS=(\\d+)")]
    private static partial Regex HttpPorts();
}
