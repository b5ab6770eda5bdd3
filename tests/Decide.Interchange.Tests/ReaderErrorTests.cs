using Decide.Core;

namespace Decide.Interchange.Tests;

/// <summary>Each class of bad input is reported at its exact place, with a reason a person can act on.</summary>
public sealed class ReaderErrorTests
{
    [Theory]
    [InlineData("ratings/E1/B9", """{"quality": "G"}""", "$.ratings.E1.B9", "unknown alternative \"B9\"")]
    [InlineData("ratings/E1/B1/colour", "\"G\"", "$.ratings.E1.B1.colour", "unknown criterion \"colour\"")]
    [InlineData("ratings/E9", """{"B1": {"quality": "G"}}""", "$.ratings.E9", "unknown assessor \"E9\"")]
    [InlineData("importance/E9", """{"quality": "H"}""", "$.importance.E9", "unknown assessor \"E9\"")]
    [InlineData("importance/E1/colour", "\"H\"", "$.importance.E1.colour", "unknown criterion or group \"colour\"")]
    [InlineData("values/B9", """{"price": 100}""", "$.values.B9", "unknown alternative \"B9\"")]
    [InlineData("values/B1/colour", "100", "$.values.B1.colour", "unknown criterion \"colour\"")]
    [InlineData("gates/B9", """{"insurance": true}""", "$.gates.B9", "unknown alternative \"B9\"")]
    [InlineData("gates/B1/colour", "true", "$.gates.B1.colour", "unknown criterion \"colour\"")]
    public void An_unknown_id_is_reported_where_it_is_used(string at, string json, string path, string reason)
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set(at, json));

        Assert.Contains(reason, errors.At(path).Reason);
    }

    [Fact]
    public void An_unknown_rating_term_names_the_terms_of_the_scale()
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set("ratings/E1/B2/quality", "\"Great\""));

        var reason = errors.At("$.ratings.E1.B2.quality").Reason;
        Assert.Contains("unknown term \"Great\"", reason);
        Assert.Contains("VP, P, MP, F, MG, G, VG", reason);
    }

    [Fact]
    public void An_unknown_importance_term_is_reported_at_the_rating()
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set("importance/E2/price", "\"Huge\""));

        Assert.Contains("unknown term \"Huge\"", errors.At("$.importance.E2.price").Reason);
    }

    [Fact]
    public void An_unknown_pairwise_term_is_reported_at_the_term()
    {
        var errors = Files.ErrorsOf(Files.Pairwise().Set("pairwise/E1/0/term", "\"10\""));

        var reason = errors.At("$.pairwise.E1[0].term").Reason;
        Assert.Contains("unknown term \"10\"", reason);
        Assert.Contains("1/9", reason);
    }

    [Fact]
    public void A_tfn_out_of_order_in_a_scale_is_reported_at_that_terms_tfn()
    {
        var errors = Files.ErrorsOf(Files.Pairwise().Set("ratingScale/terms/1/tfn", "[5, 3, 6]"));

        Assert.Contains("lower ≤ middle ≤ upper", errors.At("$.ratingScale.terms[1].tfn").Reason);
    }

    [Fact]
    public void A_tfn_out_of_order_in_a_judgement_is_reported_at_that_judgements_tfn()
    {
        var errors = Files.ErrorsOf(Files.Pairwise().Set("pairwise/E2/0/tfn", "[3, 2, 4]"));

        Assert.Contains("(3, 2, 4)", errors.At("$.pairwise.E2[0].tfn").Reason);
    }

    [Fact]
    public void A_tfn_of_two_numbers_is_reported()
    {
        var errors = Files.ErrorsOf(Files.Pairwise().Set("pairwise/E1/2/tfn", "[1, 2]"));

        Assert.Contains("three numbers", errors.At("$.pairwise.E1[2].tfn").Reason);
    }

    [Fact]
    public void A_judgement_with_both_tfn_and_term_is_reported()
    {
        var errors = Files.ErrorsOf(Files.Pairwise().Set("pairwise/E1/0/tfn", "[2, 3, 4]"));

        Assert.Contains("not both", errors.At("$.pairwise.E1[0]").Reason);
    }

    [Theory]
    [InlineData("alternatives/1/id", "\"B1\"", "$.alternatives[1].id", "alternative id \"B1\" is used twice")]
    [InlineData("criteria/2/id", "\"price\"", "$.criteria[2].id", "criterion id \"price\" is used twice")]
    [InlineData("assessors/1/id", "\"E1\"", "$.assessors[1].id", "assessor id \"E1\" is used twice")]
    public void A_duplicate_id_is_reported_at_the_second_one(string at, string json, string path, string reason)
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set(at, json));

        Assert.Contains(reason, errors.At(path).Reason);
    }

    [Fact]
    public void A_json_member_given_twice_is_reported_even_though_json_parsers_accept_it()
    {
        var text = Files.MinimalText
            .Replace("\"title\": \"Office cleaning contract 2027\",", "\"title\": \"Office cleaning contract 2027\", \"title\": \"Other\",", StringComparison.Ordinal)
            .Replace("\"B2\": { \"quality\": \"MG\" }", "\"B2\": { \"quality\": \"MG\", \"quality\": \"VG\" }", StringComparison.Ordinal);

        var errors = Files.ErrorsOf(text);

        Assert.Contains("given twice", errors.At("$.title").Reason);
        Assert.Contains("given twice", errors.At("$.ratings.E1.B2.quality").Reason);
    }

    [Fact]
    public void An_evaluation_without_assessors_is_reported()
    {
        var node = Files.Minimal().Set("assessors", "[]");
        node.Remove("ratings");
        node.Remove("importance");

        var errors = Files.ErrorsOf(node);

        Assert.Contains("at least one assessor", errors.At("$.assessors").Reason);
    }

    [Fact]
    public void An_evaluation_with_only_gates_is_reported()
    {
        var node = Files.Minimal()
            .Set("criteria", """[{"id": "insurance", "name": "Insurance", "kind": "gate"}]""");
        node.Remove("ratings");
        node.Remove("values");
        node.Remove("importance");

        var errors = Files.ErrorsOf(node);

        Assert.Contains("every criterion is a pass/fail gate", errors.At("$.criteria").Reason);
    }

    [Fact]
    public void NaN_as_a_string_is_a_type_error()
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set("values/B1/price", "\"NaN\""));

        Assert.Equal("expected a number, got a string (\"NaN\")", errors.At("$.values.B1.price").Reason);
    }

    [Theory]
    [InlineData("1e400")]
    [InlineData("-1e400")]
    public void A_number_too_large_for_a_double_is_not_finite(string number)
    {
        var errors = Files.ErrorsOf(Files.MinimalText.Replace("184000", number, StringComparison.Ordinal));

        Assert.Contains("not a finite number", errors.At("$.values.B1.price").Reason);
    }

    [Fact]
    public void A_cell_every_assessor_declined_is_reported_because_nothing_is_imputed()
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set("ratings/E1/B2/quality", """{"declined": "Recused."}"""));

        var reason = errors.At("$.ratings.*.B2.quality").Reason;
        Assert.Contains("nobody rated alternative \"B2\"", reason);
        Assert.Contains("E1: Recused.", reason);
    }

    [Theory]
    [InlineData("""{"row": "tech", "col": "service", "term": "2"}""")]
    [InlineData("""{"row": "service", "col": "tech", "term": "1/3"}""")]
    public void A_pair_judged_twice_is_reported_in_either_order(string judgement)
    {
        var node = Files.Pairwise();
        node["pairwise"]!["E1"]!.AsArray().Add(System.Text.Json.Nodes.JsonNode.Parse(judgement));

        var errors = Files.ErrorsOf(node);

        Assert.Contains("already judged at index 0", errors.At("$.pairwise.E1[7]").Reason);
    }

    [Fact]
    public void A_wrong_format_string_names_the_supported_version()
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set("format", "\"decide-evaluation/2\""));

        var reason = errors.At("$.format").Reason;
        Assert.Contains("decide-evaluation/2", reason);
        Assert.Contains("decide-evaluation/1", reason);
    }

    [Fact]
    public void A_results_document_is_recognised_as_not_an_evaluation()
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set("format", "\"decide-results/1\""));

        Assert.Contains("results document", errors.At("$.format").Reason);
    }

    [Fact]
    public void A_missing_format_is_required()
    {
        var node = Files.Minimal();
        node.Remove("format");

        Assert.StartsWith("required", Files.ErrorsOf(node).At("$.format").Reason);
    }

    [Theory]
    [InlineData("title", "5", "$.title", "expected a string, got a number (5)")]
    [InlineData("criteria", "{}", "$.criteria", "expected an array, got an object")]
    [InlineData("assessors/0/weight", "\"2\"", "$.assessors[0].weight", "expected a number, got a string (\"2\")")]
    [InlineData("gates/B1/insurance", "\"yes\"", "$.gates.B1.insurance", "expected true, false or")]
    [InlineData("ratings/E1/B2/quality", "7", "$.ratings.E1.B2.quality", "expected a term (string)")]
    [InlineData("alternatives/0", "\"B1\"", "$.alternatives[0]", "expected an object, got a string")]
    public void A_value_of_the_wrong_json_type_says_what_was_expected(string at, string json, string path, string reason)
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set(at, json));

        Assert.StartsWith(reason, errors.At(path).Reason);
    }

    [Fact]
    public void A_root_that_is_not_an_object_is_reported_at_the_root()
    {
        Assert.Contains("expected an object", Files.ErrorsOf("[1, 2]").At("$").Reason);
    }

    [Fact]
    public void Malformed_json_is_reported_with_its_line_and_column()
    {
        const string text = "{\n  \"format\": \"decide-evaluation/1\",\n  \"title\": \"x\",\n}";

        var error = Assert.Single(Files.ErrorsOf(text));

        Assert.Equal("$", error.Path);
        Assert.Contains("line 4, column 1", error.Reason);
        Assert.DoesNotContain("LineNumber", error.Reason);
    }

    [Fact]
    public void An_empty_file_is_malformed_json_at_line_one()
    {
        var error = Assert.Single(Files.ErrorsOf(""));

        Assert.Contains("line 1, column 1", error.Reason);
    }

    [Fact]
    public void An_unknown_top_level_member_is_reported_so_that_typos_are_not_ignored()
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set("titel", "\"typo\""));

        Assert.Contains("unknown member \"titel\"", errors.At("$.titel").Reason);
    }

    [Fact]
    public void An_unknown_member_inside_a_criterion_is_reported()
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set("criteria/1/drection", "\"cost\""));

        Assert.Contains("unknown member \"drection\"", errors.At("$.criteria[1].drection").Reason);
    }

    [Theory]
    [InlineData("criteria/1/kind", "\"Numeric\"", "$.criteria[1].kind", "\"linguistic\", \"numeric\", \"gate\"")]
    [InlineData("criteria/1/direction", "\"lower\"", "$.criteria[1].direction", "\"benefit\", \"cost\"")]
    [InlineData("weighting", "\"ahp\"", "$.weighting", "\"importance\", \"pairwise\"")]
    [InlineData("options/aggregation", "\"median\"", "$.options.aggregation", "\"mean\", \"geometric\"")]
    [InlineData("options/ideal", "\"best\"", "$.options.ideal", "\"unit\", \"extreme\"")]
    public void An_unknown_choice_names_the_allowed_values(string at, string json, string path, string allowed)
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set(at, json));

        Assert.Contains(allowed, errors.At(path).Reason);
    }

    [Fact]
    public void Several_problems_in_one_file_are_all_reported()
    {
        var node = Files.Minimal()
            .Set("titel", "\"typo\"")
            .Set("noun", "3")
            .Set("ratings/E1/B9", """{"quality": "G"}""")
            .Set("ratings/E2/B3/quality", "\"Splendid\"")
            .Set("values/B2/price", "\"cheap\"")
            .Set("assessors/1/weight", "-1");

        var paths = Files.ErrorsOf(node).Select(e => e.Path).ToHashSet();

        Assert.Superset(
            new HashSet<string>
            {
                "$.titel", "$.noun", "$.ratings.E1.B9", "$.ratings.E2.B3.quality", "$.values.B2.price", "$.assessors[1].weight",
            },
            paths);
    }

    [Fact]
    public void A_problem_is_reported_once_not_again_by_the_engines_checks()
    {
        // The cell cannot be read; the engine would also say it is neither rated nor declined.
        var errors = Files.ErrorsOf(Files.Minimal().Set("ratings/E1/B2/quality", "7"));

        Assert.Single(errors);
        Assert.Equal("$.ratings.E1.B2.quality", errors[0].Path);
    }

    [Fact]
    public void Engine_paths_point_into_the_file_when_an_unreadable_element_was_left_out()
    {
        // criteria[0] is not an object, so the engine sees the file's criteria[4] as its criteria[3].
        var node = Files.Minimal();
        node["criteria"]!.AsArray().Insert(0, "oops");
        node["criteria"]!.AsArray().Add(System.Text.Json.Nodes.JsonNode.Parse("""{"id": "price", "name": "Again", "kind": "numeric", "direction": "cost"}"""));

        var errors = Files.ErrorsOf(node);

        Assert.Contains("expected an object", errors.At("$.criteria[0]").Reason);
        Assert.Contains("criterion id \"price\" is used twice", errors.At("$.criteria[4].id").Reason);
        Assert.DoesNotContain(errors, e => e.Path == "$.criteria[3].id");
    }

    [Fact]
    public void Ratings_are_not_blamed_for_a_scale_that_could_not_be_read()
    {
        var node = Files.Pairwise()
            .Set("ratingScale/terms/0/tfn", "[2, 1, 4]")
            .Set("ratings/E1/S9", """{"service": "S"}""");

        var errors = Files.ErrorsOf(node);

        Assert.Contains(errors, e => e.Path == "$.ratingScale.terms[0].tfn");
        Assert.Contains("unknown alternative", errors.At("$.ratings.E1.S9").Reason);
        Assert.DoesNotContain(errors, e => e.Reason.Contains("unknown term", StringComparison.Ordinal));
    }

    [Fact]
    public void A_criterion_whose_kind_cannot_be_read_does_not_flood_the_report()
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set("criteria/1/kind", "\"number\""));

        Assert.Equal(["$.criteria[1].kind"], errors.Select(e => e.Path));
    }

    [Fact]
    public void Every_error_message_reads_path_colon_reason()
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set("title", "5"));

        Assert.Equal("$.title: expected a string, got a number (5)", errors.At("$.title").ToString());
        Assert.IsType<InvalidEvaluationException>(Record.Exception(() => EvaluationFileReader.Read("{")));
    }
}
