using System.Globalization;
using System.Text.Json;

namespace Decide.Cli.Tests;

/// <summary>The table's most critical criteria give both measures, and the cross-check names the weighted total.</summary>
public sealed class CriticalChangesTableTests
{
    [Fact]
    public void Each_most_critical_criterion_is_shown_by_share_and_by_the_change_of_the_weight_alone()
    {
        var table = CliRun.Of("analyse", RepositoryFiles.BusStopSample, "--format", "table", "--draws", "0");
        using var json = JsonDocument.Parse(CliRun.Of("analyse", RepositoryFiles.BusStopSample, "--draws", "0").Stdout);
        var most = json.RootElement.GetProperty("sensitivity").GetProperty("criticalChanges").GetProperty("mostCritical");

        var lines = table.Stdout.Split('\n');
        var any = most.GetProperty("anyAbsolute");
        var row = Assert.Single(lines, l => l.StartsWith("any    weight alone ", StringComparison.Ordinal));
        Assert.Contains(any.GetProperty("criterion").GetString()!, row, StringComparison.Ordinal);
        // The weight alone changes by −δ, in percentage points.
        Assert.Contains((-any.GetProperty("delta").GetDouble() * 100).ToString("+0.0;-0.0", CultureInfo.InvariantCulture) + " pp", row, StringComparison.Ordinal);

        var share = Assert.Single(lines, l => l.StartsWith("first  change of share ", StringComparison.Ordinal));
        Assert.Contains(most.GetProperty("topShare").GetProperty("criterion").GetString()!, share, StringComparison.Ordinal);
        Assert.Contains(lines, l => l.StartsWith("weighted-total ", StringComparison.Ordinal) && l.Contains("weighted total of scores on the rating scale", StringComparison.Ordinal));
    }
}
