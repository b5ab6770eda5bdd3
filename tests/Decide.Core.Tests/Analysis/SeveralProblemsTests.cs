using Decide.Core.Model;
using Decide.Core.Tests.Support;
using static Decide.Core.Tests.Support.ErrorAssert;

namespace Decide.Core.Tests.Analysis;

public sealed class SeveralProblemsTests
{
    [Fact]
    public void Every_problem_is_reported_in_one_pass()
    {
        var sample = SampleEvaluation.WithImportance();
        var evaluation = sample with
        {
            Ratings = UnknownReferenceTests.Replace(sample.Ratings, "D2", "S2", "STAFF", "Superb"),
            Values = sample.Values.Select(v => v.Alternative == "S1" ? v with { Value = double.NaN } : v).ToArray(),
            Gates = sample.Gates.Where(g => g.Alternative != "S3").ToArray(),
        };

        var exception = Assert.Throws<InvalidEvaluationException>(() => Core.Analysis.DecisionEngine.Analyse(evaluation));
        var errors = exception.Errors;
        HasError(errors, "$.ratings.D2.S2.STAFF", "unknown term \"Superb\"");
        HasError(errors, "$.values.S1.PRICE", "finite number");
        HasError(errors, "$.gates.S3.INSURED", "no pass/fail result");
        Assert.Equal(3, errors.Count);
        Assert.StartsWith("3 problems, the first: $.", exception.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_single_problem_is_the_message()
    {
        var sample = SampleEvaluation.WithImportance();
        var errors = Refused(sample with { Title = " " });
        var error = HasError(errors, "$.title", "needs a title");
        Assert.Equal($"$.title: {error.Reason}", error.ToString());
    }
}
