using System.Text.Json;
using System.Text.Json.Nodes;
using Decide.Core.Analysis;
using Decide.Core.Robustness;

namespace Decide.Interchange.Tests;

/// <summary>The <c>sensitivity</c>, <c>agreement</c> and <c>summary</c> sections: fixed member names, values as computed, reproducibility.</summary>
public sealed class RobustnessResultsTests
{
    private static readonly Lazy<Analysed> BusStop = new(() => Analyse(BusStopText));

    private static string BusStopText => File.ReadAllText(RepositoryFiles.PathOf("samples", "bus-stop-displays-importance.json"));

    private sealed record Analysed(EvaluationFile File, AnalysisResult Result, RobustnessResult Robustness, string Text)
    {
        public JsonElement Json => JsonDocument.Parse(Text).RootElement;
    }

    private static Analysed Analyse(string json, int draws = 500, ulong seed = 3, int threads = 1)
    {
        var file = EvaluationFileReader.Read(json);
        var prepared = DecisionEngine.Prepare(file.Evaluation);
        var result = prepared.Analyse();
        var robustness = RobustnessAnalysis.Run(prepared, result, new RobustnessOptions(draws, seed, threads));
        return new Analysed(file, result, robustness, ResultsWriter.ToJson(result, file.Evaluation, robustness));
    }

    /// <summary>Follows a dotted path with [i] indices ("sensitivity.sweeps[0].reversals"); fails naming the path when a step is missing.</summary>
    private static JsonElement At(JsonElement root, string path)
    {
        var here = root;
        foreach (var step in path.Replace("[", ".[", StringComparison.Ordinal).Split('.'))
        {
            if (step.StartsWith('['))
            {
                here = here[int.Parse(step[1..^1], System.Globalization.CultureInfo.InvariantCulture)];
            }
            else if (!here.TryGetProperty(step, out here))
            {
                Assert.Fail($"no member \"{step}\" on the way to {path}");
            }
        }

        return here;
    }

    [Theory]
    [InlineData("sensitivity.sweeps[0].criterion", JsonValueKind.String)]
    [InlineData("sensitivity.sweeps[0].name", JsonValueKind.String)]
    [InlineData("sensitivity.sweeps[0].current", JsonValueKind.Number)]
    [InlineData("sensitivity.sweeps[0].reversals", JsonValueKind.Array)]
    [InlineData("sensitivity.sweeps[0].samples", JsonValueKind.Array)]
    [InlineData("sensitivity.sweeps[0].series[0].alternative", JsonValueKind.String)]
    [InlineData("sensitivity.sweeps[0].series[0].closeness", JsonValueKind.Array)]
    [InlineData("sensitivity.criticalChanges.changes[0].criterion", JsonValueKind.String)]
    [InlineData("sensitivity.criticalChanges.changes[0].pair", JsonValueKind.Array)]
    [InlineData("sensitivity.criticalChanges.changes[0].current", JsonValueKind.Number)]
    [InlineData("sensitivity.criticalChanges.changes[0].reverses", JsonValueKind.False)]
    [InlineData("sensitivity.criticalChanges.changes[0].note", JsonValueKind.String)]
    [InlineData("sensitivity.criticalChanges.mostCritical.topShare.criterion", JsonValueKind.String)]
    [InlineData("sensitivity.criticalChanges.mostCritical.topShare.weight", JsonValueKind.Number)]
    [InlineData("sensitivity.criticalChanges.mostCritical.topAbsolute.pair", JsonValueKind.Array)]
    [InlineData("sensitivity.criticalChanges.mostCritical.topRelative.delta", JsonValueKind.Number)]
    [InlineData("sensitivity.criticalChanges.mostCritical.anyRelative.pair", JsonValueKind.Array)]
    [InlineData("sensitivity.criticalChanges.mostCritical.anyAbsolute.absolute", JsonValueKind.Number)]
    [InlineData("sensitivity.criticalChanges.mostCritical.anyRelative.relative", JsonValueKind.Number)]
    [InlineData("sensitivity.criticalChanges.mostCritical.anyAbsolute.delta", JsonValueKind.Number)]
    [InlineData("sensitivity.criticalChanges.mostCritical.anyRelative.deltaRelative", JsonValueKind.Number)]
    [InlineData("sensitivity.criticalChanges.mostCritical.anyShare.absolute", JsonValueKind.Number)]
    [InlineData("sensitivity.acceptability[0].alternative", JsonValueKind.String)]
    [InlineData("sensitivity.acceptability[0].ranks", JsonValueKind.Array)]
    [InlineData("sensitivity.acceptability[0].intervals[0]", JsonValueKind.Array)]
    [InlineData("sensitivity.draws", JsonValueKind.Number)]
    [InlineData("sensitivity.seed", JsonValueKind.Number)]
    [InlineData("sensitivity.acceptabilityWeights", JsonValueKind.String)]
    [InlineData("sensitivity.centralWeights[0].alternative", JsonValueKind.String)]
    [InlineData("sensitivity.centralWeights[0].weights.price", JsonValueKind.Number)]
    [InlineData("sensitivity.leaveOneOut[0].assessor", JsonValueKind.String)]
    [InlineData("sensitivity.leaveOneOut[0].winner", JsonValueKind.String)]
    [InlineData("sensitivity.leaveOneOut[0].ranking", JsonValueKind.Array)]
    [InlineData("sensitivity.leaveOneOut[0].winnerChanged", JsonValueKind.False)]
    [InlineData("sensitivity.withoutAlternative[0].alternative", JsonValueKind.String)]
    [InlineData("sensitivity.withoutAlternative[0].ranking", JsonValueKind.Array)]
    [InlineData("sensitivity.withoutAlternative[0].reversals", JsonValueKind.Array)]
    [InlineData("sensitivity.methods[0].method", JsonValueKind.String)]
    [InlineData("sensitivity.methods[0].description", JsonValueKind.String)]
    [InlineData("sensitivity.methods[0].ranking", JsonValueKind.Array)]
    [InlineData("sensitivity.methods[0].scores", JsonValueKind.Array)]
    [InlineData("sensitivity.methods[0].note", JsonValueKind.String)] // geometric: not applicable on Chen's scales
    [InlineData("sensitivity.methods[1].kendallTau", JsonValueKind.Number)]
    [InlineData("sensitivity.methods[1].sameWinner", JsonValueKind.True)]
    [InlineData("agreement.kendallW", JsonValueKind.Number)]
    [InlineData("agreement.chiSquare", JsonValueKind.Number)]
    [InlineData("agreement.pValue", JsonValueKind.Number)]
    [InlineData("agreement.degreesOfFreedom", JsonValueKind.Number)]
    [InlineData("agreement.tolerance", JsonValueKind.Number)]
    [InlineData("agreement.cells[0].alternative", JsonValueKind.String)]
    [InlineData("agreement.cells[0].criterion", JsonValueKind.String)]
    [InlineData("agreement.cells[0].spread", JsonValueKind.Number)]
    [InlineData("agreement.cells[0].terms", JsonValueKind.Object)]
    [InlineData("agreement.assessors[0].assessor", JsonValueKind.String)]
    [InlineData("agreement.assessors[0].ranking", JsonValueKind.Array)]
    [InlineData("agreement.assessors[0].closeness", JsonValueKind.Object)]
    [InlineData("agreement.assessors[0].cellsRated", JsonValueKind.Number)]
    [InlineData("agreement.assessors[0].meanDistance", JsonValueKind.Number)]
    [InlineData("agreement.assessors[0].tauWithPanel", JsonValueKind.Number)]
    [InlineData("summary[0]", JsonValueKind.String)]
    public void The_fixed_member_names_scripts_rely_on_are_present(string path, JsonValueKind kind)
    {
        // The bus-stop sample has reversals, flagged cells, several assessors and five ranked suppliers, so every path exists.
        Assert.Equal(kind, At(BusStop.Value.Json, path).ValueKind);
    }

    [Fact]
    public void Every_sweep_reversal_pair_is_the_one_ahead_below_then_the_one_ahead_above()
    {
        var (_, _, robustness, _) = BusStop.Value;
        var sweeps = At(BusStop.Value.Json, "sensitivity.sweeps").EnumerateArray().ToArray();

        Assert.Equal(robustness.Sensitivity.Sweeps.Select(s => s.Criterion), sweeps.Select(s => s.GetProperty("criterion").GetString()));
        var reversals = 0;
        for (var k = 0; k < sweeps.Length; k++)
        {
            var expected = robustness.Sensitivity.Sweeps[k].Reversals;
            var written = sweeps[k].GetProperty("reversals").EnumerateArray().ToArray();
            Assert.Equal(expected.Count, written.Length);
            for (var r = 0; r < written.Length; r++)
            {
                Assert.Equal(expected[r].Weight, written[r].GetProperty("weight").GetDouble());
                Assert.Equal([expected[r].Below, expected[r].Above], written[r].GetProperty("pair").EnumerateArray().Select(p => p.GetString()));
                Assert.Equal(expected[r].Confirmed, written[r].GetProperty("confirmed").GetBoolean());
                reversals++;
            }
        }

        Assert.True(reversals > 0, "the sample should have at least one reversal, or this test checks nothing");
    }

    [Fact]
    public void Sweep_names_are_the_criterion_names_and_series_follow_the_samples()
    {
        var json = BusStop.Value.Json;
        var names = BusStop.Value.File.Evaluation.Criteria.ToDictionary(c => c.Id, c => c.Name);

        foreach (var sweep in At(json, "sensitivity.sweeps").EnumerateArray())
        {
            Assert.Equal(names[sweep.GetProperty("criterion").GetString()!], sweep.GetProperty("name").GetString());
            var samples = sweep.GetProperty("samples").GetArrayLength();
            Assert.All(sweep.GetProperty("series").EnumerateArray(), s => Assert.Equal(samples, s.GetProperty("closeness").GetArrayLength()));
        }
    }

    [Fact]
    public void A_pair_no_weight_reverses_has_the_note_and_no_weight_and_a_reversing_pair_has_its_numbers()
    {
        var changes = At(BusStop.Value.Json, "sensitivity.criticalChanges.changes").EnumerateArray().ToArray();

        Assert.Equal(BusStop.Value.Robustness.Sensitivity.CriticalChanges.Changes.Count, changes.Length);
        var fixedPairs = changes.Where(c => !c.GetProperty("reverses").GetBoolean()).ToArray();
        var reversing = changes.Where(c => c.GetProperty("reverses").GetBoolean()).ToArray();
        Assert.NotEmpty(fixedPairs);
        Assert.NotEmpty(reversing);
        Assert.All(fixedPairs, c =>
        {
            Assert.Equal("no change in [0,1] reverses this pair", c.GetProperty("note").GetString());
            Assert.False(c.TryGetProperty("weight", out _));
            Assert.False(c.TryGetProperty("absolute", out _));
        });
        Assert.All(reversing, c =>
        {
            var delta = Math.Abs(c.GetProperty("weight").GetDouble() - c.GetProperty("current").GetDouble());
            Assert.Equal(delta, c.GetProperty("absolute").GetDouble(), 12);
            Assert.Equal(delta / c.GetProperty("current").GetDouble() * 100, c.GetProperty("relative").GetDouble(), 9);
            if (c.TryGetProperty("delta", out var tsDelta))
            {
                Assert.False(c.TryGetProperty("note", out _));
                // Triantaphyllou & Sánchez: the weight alone w − δ, renormalised by 1 − δ, is the share at which the pair swaps.
                var w = c.GetProperty("current").GetDouble();
                var share = c.GetProperty("deltaShare").GetDouble();
                Assert.Equal(share, (w - tsDelta.GetDouble()) / (1 - tsDelta.GetDouble()), 9);
                Assert.True(w - tsDelta.GetDouble() >= 0, "the changed weight must not be negative");
                Assert.Equal(tsDelta.GetDouble() / w * 100, c.GetProperty("deltaRelative").GetDouble(), 9);
            }
            else
            {
                Assert.Equal("reverses only when this criterion takes the whole weight", c.GetProperty("note").GetString());
            }
        });
    }

    [Fact]
    public void The_most_critical_criterion_for_the_top_rank_is_led_by_the_winner()
    {
        var top = At(BusStop.Value.Json, "sensitivity.criticalChanges.mostCritical.topShare");
        var expected = BusStop.Value.Robustness.Sensitivity.CriticalChanges.TopShare!;

        Assert.Equal([BusStop.Value.Result.Ranking[0].Alternative, expected.Challenger], top.GetProperty("pair").EnumerateArray().Select(p => p.GetString()));
        Assert.Equal(expected.Criterion, top.GetProperty("criterion").GetString());
        Assert.Equal(expected.Weight, top.GetProperty("weight").GetDouble());
    }

    [Fact]
    public void In_the_sample_every_change_that_dethrones_the_winner_has_the_papers_delta()
    {
        // Every share below 100% that dethrones the winner is a feasible change of the weight alone (δ ≤ w, Triantaphyllou &
        // Sánchez), even where that weight rises above 1 before renormalising, so topAbsolute and topRelative are written.
        var winner = BusStop.Value.Result.Ranking[0].Alternative;
        var led = At(BusStop.Value.Json, "sensitivity.criticalChanges.changes").EnumerateArray()
            .Where(c => c.GetProperty("pair")[0].GetString() == winner && c.GetProperty("reverses").GetBoolean()).ToArray();
        Assert.NotEmpty(led);
        Assert.All(led, c =>
        {
            var (w, t) = (c.GetProperty("current").GetDouble(), c.GetProperty("deltaShare").GetDouble());
            Assert.Equal((w - t) / (1 - t), c.GetProperty("delta").GetDouble(), 9);
        });
        Assert.Equal(JsonValueKind.Object, At(BusStop.Value.Json, "sensitivity.criticalChanges.mostCritical.topAbsolute").ValueKind);
    }

    [Fact]
    public void Acceptability_shares_sum_to_one_and_lie_within_their_intervals()
    {
        var json = BusStop.Value.Json;
        var entries = At(json, "sensitivity.acceptability").EnumerateArray().ToArray();

        Assert.Equal(500, At(json, "sensitivity.draws").GetInt32());
        Assert.Equal(3UL, At(json, "sensitivity.seed").GetUInt64());
        Assert.Equal("fuzzy", At(json, "sensitivity.acceptabilityWeights").GetString());
        Assert.Equal(BusStop.Value.Result.Ranking.Count, entries.Length);
        foreach (var entry in entries)
        {
            var ranks = entry.GetProperty("ranks").EnumerateArray().Select(r => r.GetDouble()).ToArray();
            var intervals = entry.GetProperty("intervals").EnumerateArray().ToArray();
            Assert.Equal(entries.Length, ranks.Length);
            Assert.Equal(1, ranks.Sum(), 12);
            for (var r = 0; r < ranks.Length; r++)
            {
                Assert.Equal(2, intervals[r].GetArrayLength());
                Assert.InRange(ranks[r], intervals[r][0].GetDouble(), intervals[r][1].GetDouble());
            }
        }

        var firsts = entries.Sum(e => e.GetProperty("ranks")[0].GetDouble());
        Assert.Equal(1, firsts, 12); // each draw has exactly one winner
    }

    [Fact]
    public void Central_weights_are_keyed_by_criterion_in_criterion_order_and_sum_to_one()
    {
        var criteria = BusStop.Value.Result.Weights.Select(w => w.Criterion).ToArray();

        foreach (var entry in At(BusStop.Value.Json, "sensitivity.centralWeights").EnumerateArray())
        {
            var weights = entry.GetProperty("weights").EnumerateObject().ToArray();
            Assert.Equal(criteria, weights.Select(w => w.Name));
            Assert.Equal(1, weights.Sum(w => w.Value.GetDouble()), 9);
        }
    }

    [Fact]
    public void The_holistic_index_and_the_confidence_factors_are_carried_as_computed()
    {
        var json = BusStop.Value.Json;
        var acceptability = BusStop.Value.Robustness.Sensitivity.Acceptability;
        var entries = At(json, "sensitivity.acceptability").EnumerateArray().ToArray();
        for (var i = 0; i < entries.Length; i++)
        {
            Assert.Equal(acceptability.Alternatives[i].Alternative, entries[i].GetProperty("alternative").GetString());
            Assert.Equal(acceptability.Alternatives[i].Holistic, entries[i].GetProperty("holistic").GetDouble());
        }

        var central = At(json, "sensitivity.centralWeights").EnumerateArray().ToArray();
        Assert.Equal(acceptability.CentralWeights.Count, central.Length);
        for (var i = 0; i < central.Length; i++)
        {
            Assert.Equal(acceptability.CentralWeights[i].Alternative, central[i].GetProperty("alternative").GetString());
            Assert.Equal(acceptability.CentralWeights[i].Confidence, central[i].GetProperty("confidence").GetDouble());
        }
    }

    [Fact]
    public void Agreement_carries_the_concordance_and_each_flagged_cells_terms_by_assessor()
    {
        var json = BusStop.Value.Json;
        var agreement = BusStop.Value.Robustness.Agreement;

        Assert.Equal(agreement.Concordance!.W, At(json, "agreement.kendallW").GetDouble());
        Assert.Equal(agreement.Concordance.PValue, At(json, "agreement.pValue").GetDouble());
        Assert.Equal(agreement.Concordance.DegreesOfFreedom, At(json, "agreement.degreesOfFreedom").GetInt32());
        Assert.Equal(2, At(json, "agreement.tolerance").GetInt32());
        var cells = At(json, "agreement.cells").EnumerateArray().ToArray();
        Assert.Equal(agreement.ForDiscussion.Count, cells.Length); // only the cells for discussion, not every cell
        Assert.True(agreement.Cells.Count > cells.Length);
        for (var i = 0; i < cells.Length; i++)
        {
            Assert.True(cells[i].GetProperty("spread").GetInt32() > 2);
            Assert.Equal(agreement.ForDiscussion[i].Terms.Select(t => (t.Assessor, t.Term)),
                cells[i].GetProperty("terms").EnumerateObject().Select(t => (t.Name, t.Value.GetString()!)));
        }

        Assert.False(At(json, "agreement").TryGetProperty("allCells", out _));
    }

    [Fact]
    public void Each_assessors_closeness_is_keyed_by_alternative()
    {
        var assessors = At(BusStop.Value.Json, "agreement.assessors").EnumerateArray().ToArray();
        var expected = BusStop.Value.Robustness.Agreement.Assessors;

        Assert.Equal(expected.Select(a => a.Assessor), assessors.Select(a => a.GetProperty("assessor").GetString()));
        for (var i = 0; i < assessors.Length; i++)
        {
            Assert.Equal(expected[i].Closeness.Select(c => (c.Alternative, c.Closeness)),
                assessors[i].GetProperty("closeness").EnumerateObject().Select(c => (c.Name, c.Value.GetDouble())));
        }
    }

    [Fact]
    public void The_summary_is_the_engines_sentences()
    {
        Assert.Equal(BusStop.Value.Robustness.Summary, At(BusStop.Value.Json, "summary").EnumerateArray().Select(s => s.GetString()));
    }

    [Fact]
    public void The_same_seed_gives_the_same_json_on_any_number_of_threads()
    {
        var one = Analyse(BusStopText, draws: 700, seed: 11, threads: 1).Text;
        var four = Analyse(BusStopText, draws: 700, seed: 11, threads: 4).Text;

        Assert.Equal(one, four);
    }

    [Fact]
    public void Another_seed_gives_other_acceptability_shares()
    {
        var a = At(Analyse(BusStopText, draws: 700, seed: 11).Json, "sensitivity.acceptability").GetRawText();
        var b = At(Analyse(BusStopText, draws: 700, seed: 12).Json, "sensitivity.acceptability").GetRawText();

        Assert.NotEqual(a, b); // the seed is really used
    }

    [Fact]
    public void Without_robustness_the_three_sections_are_left_out()
    {
        var file = EvaluationFileReader.Read(Files.MinimalText);
        var json = JsonDocument.Parse(ResultsWriter.ToJson(DecisionEngine.Analyse(file.Evaluation), file.Evaluation)).RootElement;

        Assert.False(json.TryGetProperty("sensitivity", out _));
        Assert.False(json.TryGetProperty("agreement", out _));
        Assert.False(json.TryGetProperty("summary", out _));
    }

    [Fact]
    public void Zero_draws_leaves_acceptability_empty_and_still_matches_the_schema()
    {
        var analysed = Analyse(BusStopText, draws: 0);

        Assert.Equal(0, At(analysed.Json, "sensitivity.draws").GetInt32());
        Assert.Equal(0, At(analysed.Json, "sensitivity.acceptability").GetArrayLength());
        Assert.Equal(0, At(analysed.Json, "sensitivity.centralWeights").GetArrayLength());
        Schemas.AssertValid(Schemas.Results, analysed.Text);
    }

    [Fact]
    public void Undefined_concordance_and_tau_are_written_as_null_not_left_out()
    {
        // One assessor: Kendall's W needs at least two rankings.
        var node = Files.Minimal();
        node["assessors"]!.AsArray().RemoveAt(1);
        node["importance"]!.AsObject().Remove("E2");
        node["ratings"]!.AsObject().Remove("E2");

        var analysed = Analyse(node.ToJsonString());
        var agreement = At(analysed.Json, "agreement");

        foreach (var name in new[] { "kendallW", "chiSquare", "pValue", "degreesOfFreedom" })
        {
            Assert.True(agreement.TryGetProperty(name, out var value), $"{name} is left out");
            Assert.Equal(JsonValueKind.Null, value.ValueKind);
        }

        Schemas.AssertValid(Schemas.Results, analysed.Text);
    }

    [Fact]
    public void When_no_weight_change_moves_anyone_the_most_critical_criteria_are_written_as_null()
    {
        // B1 is rated higher by both assessors and is also cheaper: it leads on every criterion, so no share reverses it.
        var node = Files.Minimal().Set("values/B1/price", "100000");

        var analysed = Analyse(node.ToJsonString());
        var most = At(analysed.Json, "sensitivity.criticalChanges.mostCritical");

        Assert.Null(analysed.Robustness.Sensitivity.CriticalChanges.AnyAbsolute);
        Assert.Equal(["topAbsolute", "topRelative", "anyAbsolute", "anyRelative", "topShare", "anyShare"], most.EnumerateObject().Select(p => p.Name));
        Assert.All(most.EnumerateObject(), p => Assert.Equal(JsonValueKind.Null, p.Value.ValueKind));
        Schemas.AssertValid(Schemas.Results, analysed.Text);
    }

    [Fact]
    public void A_document_with_robustness_can_still_be_changed_section_by_section()
    {
        var (file, result, robustness, _) = BusStop.Value;
        var document = ResultsWriter.CreateDocument(result, file.Evaluation, robustness);

        var withoutSummary = JsonNode.Parse(ResultsWriter.ToJson(document with { Summary = null }))!.AsObject();

        Assert.False(withoutSummary.ContainsKey("summary"));
        Assert.True(withoutSummary.ContainsKey("sensitivity"));
    }
}
