using Decide.Web.Components.Pages.Panel;
using Decide.Web.Components.Shared;
using Decide.Web.Components.Tests.Support;
using Decide.Web.Features.Inputs;
using Decide.Web.Features.Moderation;

namespace Decide.Web.Components.Tests.Panel;

public sealed class ModerationTests : MudComponentTest
{
    private static readonly TermChoice[] Scale =
        [new("P", "Poor"), new("F", "Fair"), new("G", "Good"), new("VG", "Very good")];

    [Fact]
    public void Flagged_cells_come_first_widest_spread_first_and_the_rest_keep_their_order()
    {
        // Arrive in bid and criterion order on purpose: the filter must lift the flagged ones.
        ModerationCell[] cells =
        [
            Cell("north", "display", spread: 1, flagged: false),
            Cell("north", "power", spread: 3, flagged: true),
            Cell("east", "display", spread: 0, flagged: false),
            Cell("east", "power", spread: 4, flagged: true),
            Cell("west", "display", spread: 2, flagged: false),
        ];

        var shown = new ModerationFilter().Apply(cells);

        Assert.Equal(["east/power", "north/power", "north/display", "east/display", "west/display"], shown.Select(Key));
    }

    [Fact]
    public void Filters_narrow_by_flag_criterion_and_bid_and_keep_flagged_first()
    {
        ModerationCell[] cells =
        [
            Cell("north", "display", 1, false), Cell("north", "power", 3, true), Cell("east", "power", 2, false), Cell("east", "display", 4, true),
        ];

        Assert.Equal(["east/display", "north/power"], new ModerationFilter(FlaggedOnly: true).Apply(cells).Select(Key));
        Assert.Equal(["north/power", "east/power"], new ModerationFilter(Criterion: "power").Apply(cells).Select(Key));
        Assert.Equal(["east/display", "east/power"], new ModerationFilter(Alternative: "east").Apply(cells).Select(Key));
        Assert.Empty(new ModerationFilter(FlaggedOnly: true, Criterion: "power", Alternative: "east").Apply(cells));
    }

    [Fact]
    public void The_form_refuses_to_send_a_moderated_value_without_a_reason_and_says_so_beside_the_field()
    {
        ModerateRequest? sent = null;
        var cut = Form(r => sent = r);

        cut.Find("input[type=radio][value=G]").Change(true);
        cut.Find("form").Submit();

        Assert.Null(sent);
        Assert.Equal("true", cut.Find("textarea").GetAttribute("aria-invalid"));
        Assert.Contains("Give the reason the panel agreed on this value", cut.Find(".decide-field-error").TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public void A_term_a_reason_and_the_assessors_ticked_are_sent_with_the_value_it_replaces()
    {
        ModerateRequest? sent = null;
        var cut = Form(r => sent = r, replaces: 41);

        cut.Find("input[type=radio][value=G]").Change(true);
        cut.Find("textarea").Input("  Q1.4 makes the audio button optional; the panel agreed Good.  ");
        cut.Find("#c-agreed-abernathy").Change(false);
        cut.Find("form").Submit();

        Assert.NotNull(sent);
        Assert.Equal("G", sent.Term);
        Assert.Equal("Q1.4 makes the audio button optional; the panel agreed Good.", sent.Reason);
        Assert.Equal(["ravelle", "fenwright"], sent.AgreedBy);
        Assert.Equal(41, sent.Replaces);
    }

    [Fact]
    public void A_term_and_at_least_one_assessor_are_required_too()
    {
        ModerateRequest? sent = null;
        var cut = Form(r => sent = r);

        cut.Find("textarea").Input("A reason long enough to be a minute.");
        foreach (var code in new[] { "ravelle", "fenwright", "abernathy" })
        {
            cut.Find($"#c-agreed-{code}").Change(false);
        }

        cut.Find("form").Submit();

        Assert.Null(sent);
        var errors = cut.FindAll(".decide-field-error").Select(e => e.TextContent).ToArray();
        Assert.Contains(errors, e => e.StartsWith("Choose the term", StringComparison.Ordinal));
        Assert.Contains(errors, e => e.StartsWith("Tick at least one assessor", StringComparison.Ordinal));
    }

    [Fact]
    public void The_services_refusal_of_a_field_is_shown_by_that_field()
    {
        var problem = new ProblemText("Invalid input", "1 problem(s)", new Dictionary<string, string[]> { ["agreedBy[1]"] = ["\"fenwright\" declared a conflict of interest"] });
        var cut = Render<ModerationForm>(p => p.Add(x => x.IdPrefix, "c").Add(x => x.Terms, Scale).Add(x => x.Assessors, ["ravelle", "fenwright"])
            .Add(x => x.Problem, problem));

        Assert.Contains("declared a conflict of interest", cut.Find("fieldset.decide-agreed .decide-field-error").TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public void An_open_cell_shows_each_rationale_and_a_declined_rating_with_its_reason_and_the_moderated_value_against_the_originals()
    {
        var moderated = new ModeratedValue(7, "G", "Agreed after discussing Q1.4.", ["ravelle", "fenwright"], "Ione Castellane",
            new DateTimeOffset(2026, 12, 1, 10, 30, 0, TimeSpan.Zero),
            [new OriginalRating("ravelle", "VG", "Big screen.", null, 1, DateTimeOffset.UnixEpoch), new OriginalRating("fenwright", "P", "No audio.", null, 1, DateTimeOffset.UnixEpoch)]);
        var cell = Cell("north", "display", 3, true) with
        {
            Ratings =
            [
                new CellRating("ravelle", "VG", 3, "Big screen.", null),
                new CellRating("fenwright", "P", 0, "No audio.", null),
                new CellRating("abernathy", null, null, null, "recused: a relative works for the bidder"),
            ],
            InForce = moderated,
        };

        var cut = Render<ModerationCellCard>(p => p.Add(x => x.Cell, cell).Add(x => x.Terms, Scale).Add(x => x.Expanded, true).Add(x => x.CanModerate, true));

        Assert.Contains("Big screen.", cut.Find("tr[data-assessor=ravelle]").TextContent, StringComparison.Ordinal);
        Assert.Contains("Declined: recused: a relative works for the bidder", cut.Find("tr[data-assessor=abernathy]").TextContent, StringComparison.Ordinal);
        var record = cut.Find("[data-testid=cell-record]").TextContent;
        Assert.Contains("ravelle VG, fenwright P", record, StringComparison.Ordinal);
        Assert.Equal("G", cut.Find("[data-testid=moderated-term]").TextContent);
        Assert.Contains("Ione Castellane", record, StringComparison.Ordinal);

        // The recused assessor cannot be named as agreeing.
        cut.FindAll("button").Single(b => b.TextContent.Contains("Replace the moderated value", StringComparison.Ordinal)).Click();
        Assert.Empty(cut.FindAll("#cell-north-display-agreed-abernathy"));
        Assert.Single(cut.FindAll("#cell-north-display-agreed-ravelle"));
    }

    [Fact]
    public void A_failed_gate_is_not_sent_without_a_note()
    {
        GateRequest? sent = null;
        var cut = Render<GateEditor>(p => p.Add(x => x.Cell, new GateCell("north", "ingress", null, null, null, null, null))
            .Add(x => x.Label, "Ingress certificate of Northgate").Add(x => x.Editable, true)
            .Add(x => x.OnSave, ((GateCell Cell, GateRequest Request) e) => sent = e.Request));

        cut.Find("#gate-north-ingress-fail").Change(true);
        cut.FindAll("button").Single().Click();
        Assert.Null(sent);
        Assert.Contains("A fail needs a note", cut.Find(".decide-field-error").TextContent, StringComparison.Ordinal);

        cut.Find("textarea").Input("Certificate is the bidder's own test report, not from an accredited laboratory.");
        cut.FindAll("button").Single().Click();
        Assert.NotNull(sent);
        Assert.False(sent.Passed);
        Assert.StartsWith("Certificate is the bidder's own", sent.Note, StringComparison.Ordinal);
        Assert.Null(sent.Version);
    }

    [Fact]
    public void A_read_only_gate_shows_its_result_and_note_without_inputs()
    {
        var cut = Render<GateEditor>(p => p.Add(x => x.Cell, new GateCell("north", "ingress", false, "Self-certified only.", 3, "Ione", DateTimeOffset.UnixEpoch))
            .Add(x => x.Label, "Ingress of Northgate").Add(x => x.Editable, false));

        Assert.Empty(cut.FindAll("input"));
        Assert.Empty(cut.FindAll("button"));
        Assert.Contains("Fail", cut.Markup, StringComparison.Ordinal);
        Assert.Contains("Self-certified only.", cut.Markup, StringComparison.Ordinal);
    }

    private IRenderedComponent<ModerationForm> Form(Action<ModerateRequest> sent, long? replaces = null) =>
        Render<ModerationForm>(p => p.Add(x => x.IdPrefix, "c").Add(x => x.Terms, Scale)
            .Add(x => x.Assessors, ["ravelle", "fenwright", "abernathy"]).Add(x => x.Agreed, ["ravelle", "fenwright", "abernathy"])
            .Add(x => x.Replaces, replaces).Add(x => x.OnSubmit, sent));

    private static ModerationCell Cell(string alternative, string criterion, int spread, bool flagged) =>
        new(alternative, $"Bid {alternative}", criterion, $"Criterion {criterion}", spread, flagged, [], null, []);

    private static string Key(ModerationCell c) => $"{c.Alternative}/{c.Criterion}";
}
