using System.Text.RegularExpressions;
using Decide.Web.Tests.Deployment;

namespace Decide.Web.Tests.Checks;

/// <summary>
/// Every screen loads all of Decide's stylesheets, so a class given its own rule in two of them is styled by whichever
/// loads last. Each class gets its rule in one sheet; another sheet may only narrow it by context
/// (".decide-filter .decide-select").
/// </summary>
public sealed partial class StylesheetTests
{
    private static readonly string Folder = Path.Combine(RepositoryFiles.Root, "wwwroot", "css");

    [Fact]
    public void No_class_has_its_own_rule_in_two_stylesheets()
    {
        var owners = new Dictionary<string, HashSet<string>>(StringComparer.Ordinal);
        foreach (var file in Directory.GetFiles(Folder, "*.css"))
        {
            foreach (var selector in Selectors(File.ReadAllText(file)))
            {
                // A selector that is one compound (".decide-cell", ".decide-cell.focused:hover") styles the class itself.
                var match = LoneClass().Match(selector);
                if (match.Success)
                {
                    (owners.TryGetValue(match.Groups[1].Value, out var set) ? set : owners[match.Groups[1].Value] = []).Add(Path.GetFileName(file));
                }
            }
        }

        var shared = owners.Where(o => o.Value.Count > 1).Select(o => $"{o.Key}: {string.Join(", ", o.Value.Order())}").ToArray();
        Assert.True(owners.Count > 50, $"only {owners.Count} classes found in {Folder}: is the reader still parsing the sheets?");
        Assert.True(shared.Length == 0, "Classes with a rule of their own in more than one stylesheet:\n" + string.Join("\n", shared));
    }

    [Fact]
    public void Every_class_a_stylesheet_defines_is_used_by_a_screen()
    {
        var markup = string.Concat(Directory.GetFiles(Path.Combine(RepositoryFiles.Root, "src", "Decide.Web"), "*.*", SearchOption.AllDirectories)
            .Where(f => f.EndsWith(".razor", StringComparison.Ordinal) || f.EndsWith(".cs", StringComparison.Ordinal))
            .Where(f => !f.Contains($"{Path.DirectorySeparatorChar}obj{Path.DirectorySeparatorChar}", StringComparison.Ordinal))
            .Concat(Directory.GetFiles(Path.Combine(RepositoryFiles.Root, "wwwroot", "js"), "*.js"))
            .Select(File.ReadAllText));
        var unused = Directory.GetFiles(Folder, "*.css")
            .SelectMany(f => Selectors(File.ReadAllText(f)).SelectMany(s => AnyClass().Matches(s).Select(m => (Class: m.Groups[1].Value, File: Path.GetFileName(f)))))
            .Distinct()
            .Where(x => !Regex.IsMatch(markup, $@"(?<![\w-]){Regex.Escape(x.Class)}(?![\w-])"))
            .Select(x => $"{x.Class} ({x.File})")
            .ToArray();
        Assert.True(unused.Length == 0, "Stylesheet classes no screen uses:\n" + string.Join("\n", unused));
    }

    /// <summary>The selectors of every rule, media queries opened, comments removed.</summary>
    private static IEnumerable<string> Selectors(string css)
    {
        var text = Comment().Replace(css, "");
        foreach (Match rule in RulePrelude().Matches(text))
        {
            var prelude = rule.Groups[1].Value.Trim();
            if (prelude.StartsWith('@'))
            {
                continue;
            }

            foreach (var selector in prelude.Split(','))
            {
                yield return selector.Trim();
            }
        }
    }

    [GeneratedRegex(@"/\*.*?\*/", RegexOptions.Singleline)]
    private static partial Regex Comment();

    [GeneratedRegex(@"([^{}]+)\{")]
    private static partial Regex RulePrelude();

    [GeneratedRegex(@"^\.(decide-[\w-]+)(?:[.:\[][^\s>+~]*)?$")]
    private static partial Regex LoneClass();

    [GeneratedRegex(@"\.(decide-[\w-]+)")]
    private static partial Regex AnyClass();
}
