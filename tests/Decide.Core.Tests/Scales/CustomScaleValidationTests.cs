using Decide.Core.Fuzzy;
using Decide.Core.Scales;
using Decide.Core.Tests.Support;

namespace Decide.Core.Tests.Scales;

public sealed class CustomScaleValidationTests
{
    private const string At = "$.ratingScale";

    [Fact]
    public void A_valid_custom_scale_is_created_in_the_given_order()
    {
        var scale = Create(Term("LOW", 0, 1, 4), Term("MID", 3, 5, 7), Term("HIGH", 6, 9, 10));
        Assert.Equal("LOW, MID, HIGH", scale.CodeList);
        Assert.True(scale.TryFind("HIGH", out var step));
        Assert.Equal(2, step);
        Assert.False(scale.TryFind("high", out _)); // lookup is by exact code
    }

    [Fact]
    public void A_code_used_twice_ignoring_case_names_both_terms()
    {
        var errors = Errors(Term("LOW", 0, 1, 4), Term("MID", 3, 5, 7), Term("low", 6, 9, 10));
        ErrorAssert.HasError(errors, $"{At}.terms[2].code", "\"low\"", "term 0", "unique, ignoring case");
    }

    [Fact]
    public void A_term_whose_middle_is_not_above_the_previous_one_is_out_of_order()
    {
        var errors = Errors(Term("LOW", 0, 1, 4), Term("HIGH", 6, 9, 10), Term("MID", 3, 5, 7));
        ErrorAssert.HasError(errors, $"{At}.terms[2].tfn", "\"MID\"", "larger middle value than \"HIGH\"", "least to most favourable");
    }

    [Fact]
    public void Equal_middles_are_out_of_order_too()
    {
        var errors = Errors(Term("A", 0, 5, 6), Term("B", 4, 5, 10));
        ErrorAssert.HasError(errors, $"{At}.terms[1].tfn", "larger middle value");
    }

    [Fact]
    public void A_term_outside_the_range_is_refused_with_the_range()
    {
        var errors = Errors(Term("LOW", 0, 1, 4), Term("HIGH", 6, 9, 12));
        ErrorAssert.HasError(errors, $"{At}.terms[1].tfn", "\"HIGH\"", "(6, 9, 12)", "outside the scale's range [0, 10]");
    }

    [Fact]
    public void A_term_without_a_label_is_refused()
    {
        var errors = Errors(new LinguisticTerm("LOW", " ", new Tfn(0, 1, 4)), Term("HIGH", 6, 9, 10));
        ErrorAssert.HasError(errors, $"{At}.terms[0].label", "\"LOW\" needs a label");
    }

    [Theory]
    [InlineData("")]
    [InlineData("V G")]
    public void A_code_that_is_empty_or_has_spaces_is_refused(string code)
    {
        var errors = Errors(Term("LOW", 0, 1, 4), new LinguisticTerm(code, "Very good", new Tfn(6, 9, 10)));
        ErrorAssert.HasError(errors, $"{At}.terms[1].code", "non-empty and contain no spaces");
    }

    [Fact]
    public void A_scale_of_fewer_than_two_terms_is_refused()
    {
        var errors = Errors(Term("ONLY", 0, 5, 10));
        ErrorAssert.HasError(errors, $"{At}.terms", "at least two terms; got 1");
    }

    [Fact]
    public void A_range_that_is_empty_is_refused()
    {
        var error = Assert.Throws<InvalidEvaluationException>(() =>
            LinguisticScale.Create("custom", 10, 0, [Term("LOW", 0, 1, 4), Term("HIGH", 6, 9, 10)], At));
        ErrorAssert.HasError(error.Errors, $"{At}.range", "the first below the second", "[10, 0]");
    }

    [Fact]
    public void Every_broken_rule_is_reported_at_once()
    {
        var errors = Errors(new LinguisticTerm("A", "", new Tfn(0, 2, 4)), Term("a", 1, 1, 11));
        ErrorAssert.HasError(errors, $"{At}.terms[0].label", "needs a label");
        ErrorAssert.HasError(errors, $"{At}.terms[1].code", "already used");
        Assert.Equal(2, errors.Count(e => e.Path == $"{At}.terms[1].tfn")); // out of range and out of order
        Assert.Equal(4, errors.Count);
    }

    private static LinguisticTerm Term(string code, double l, double m, double u) => new(code, $"Label {code}", new Tfn(l, m, u));

    private static LinguisticScale Create(params LinguisticTerm[] terms) => LinguisticScale.Create("custom", 0, 10, terms, At);

    private static IReadOnlyList<EvaluationError> Errors(params LinguisticTerm[] terms) =>
        Assert.Throws<InvalidEvaluationException>(() => Create(terms)).Errors;
}
