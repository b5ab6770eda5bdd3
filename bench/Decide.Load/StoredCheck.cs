using System.Text.Json;

namespace Decide.Load;

/// <summary>
/// After the run: is every acknowledged save stored exactly once? Each cell must hold the version and rationale of
/// its last acknowledged save, its version must equal the number of saves acknowledged for it (each save adds one),
/// the audit trail must hold one "rating.saved" entry per acknowledged save, and the chain must verify. Cells with a
/// save that went unanswered are reported apart: that save may have been stored.
/// </summary>
public static class StoredCheck
{
    public sealed record Outcome(int CellsChecked, int Acknowledged, IReadOnlyList<string> Problems, int UncertainCells, bool ChainValid, long AuditEntries);

    public static async Task<Outcome> RunAsync(LoadPanel panel, IReadOnlyList<AssessorSession> sessions, CancellationToken ct)
    {
        var problems = new List<string>();
        var audit = await Api.GetAsync(panel.Facilitator, panel.Url("/audit"), "reading the audit trail", ct);
        var auditedSaves = audit.EnumerateArray()
            .Where(e => e.GetProperty("action").GetString() == "rating.saved")
            .GroupBy(e => e.GetProperty("target").GetString()!, StringComparer.Ordinal)
            .ToDictionary(g => g.Key, g => g.Count(), StringComparer.Ordinal);

        var cellsChecked = 0;
        var uncertain = 0;
        foreach (var session in sessions)
        {
            if (session.Client is null)
            {
                problems.Add($"{session.Code}: never signed in");
                continue;
            }

            var sheet = await Api.GetAsync(session.Client, panel.Url("/my/sheet"), $"{session.Code} reading the sheet", ct);
            var stored = sheet.GetProperty("cells").EnumerateArray().ToDictionary(
                c => $"{c.GetProperty("alternative").GetString()}/{c.GetProperty("criterion").GetString()}",
                c => (Version: c.GetProperty("version").ValueKind == JsonValueKind.Number ? c.GetProperty("version").GetInt64() : 0L,
                      Rationale: c.GetProperty("rationale").ValueKind == JsonValueKind.String ? c.GetProperty("rationale").GetString() : null),
                StringComparer.Ordinal);

            foreach (var cell in session.Acknowledged.GroupBy(a => a.Cell, StringComparer.Ordinal))
            {
                cellsChecked++;
                if (session.Unacknowledged.Contains(cell.Key))
                {
                    uncertain++;
                    continue;
                }

                var last = cell.MaxBy(a => a.Version);
                var (version, rationale) = stored[cell.Key];
                var audited = auditedSaves.GetValueOrDefault($"ratings/{session.Code}/{cell.Key}");
                var versions = cell.Select(a => a.Version).ToArray();
                if (versions.Distinct().Count() != versions.Length)
                {
                    problems.Add($"{session.Code} {cell.Key}: two acknowledged saves share a version");
                }

                if (version != last.Version || rationale != last.Rationale)
                {
                    problems.Add($"{session.Code} {cell.Key}: stored version {version} is not the last acknowledged ({last.Version})");
                }

                if (version != cell.Count())
                {
                    problems.Add($"{session.Code} {cell.Key}: {cell.Count()} saves acknowledged, version {version} stored");
                }

                if (audited != cell.Count())
                {
                    problems.Add($"{session.Code} {cell.Key}: {cell.Count()} saves acknowledged, {audited} audit entries");
                }
            }
        }

        var verification = await Api.GetAsync(panel.Facilitator, panel.Url("/audit/verification"), "verifying the audit chain", ct);
        return new Outcome(cellsChecked, sessions.Sum(s => s.Acknowledged.Count), problems, uncertain,
            verification.GetProperty("valid").GetBoolean(), verification.GetProperty("entries").GetInt64());
    }
}
