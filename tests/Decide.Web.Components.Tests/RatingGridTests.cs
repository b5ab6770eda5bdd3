using AngleSharp.Dom;
using Decide.Core.Scales;
using Decide.Data.Entities;
using Decide.Web.Components.Pages.Inputs;
using Decide.Web.Components.Shared;
using Decide.Web.Components.Tests.Support;
using Decide.Web.Features.Inputs;
using Microsoft.AspNetCore.Components.Web;

namespace Decide.Web.Components.Tests;

public sealed class RatingGridTests : MudComponentTest
{
    private const string Rationale = "Section 3.2 of the bid describes weekly audits with photos.";
    private readonly List<(SheetCell Cell, RatingRequest Request)> _saves = [];
    private int _submits;

    /// <summary>What the fake service answers to the next save; by default it stores what was sent.</summary>
    private Func<SheetCell, RatingRequest, CellSaveResult> _answer = (cell, request) => CellSaveResult.Ok(cell with
    {
        Term = request.Term, Rationale = request.Rationale, Declined = request.Declined, Version = (cell.Version ?? 0) + 1,
        Done = request.Declined is not null || (request.Rationale?.Length ?? 0) >= 20,
    });

    [Fact]
    public void Arrow_keys_move_the_focused_cell_and_skip_a_bid_the_assessor_is_recused_from()
    {
        var cut = RenderGrid(Sheet(recused: "westmere"));
        Assert.Equal("northgate/quality", Focused(cut));

        Cell(cut, "northgate/quality").KeyDown(new KeyboardEventArgs { Key = "ArrowRight" });
        Assert.Equal("northgate/staffing", Focused(cut));

        // westmere (the second row) cannot be rated: down goes straight to eastfold.
        Cell(cut, "northgate/staffing").KeyDown(new KeyboardEventArgs { Key = "ArrowDown" });
        Assert.Equal("eastfold/staffing", Focused(cut));

        Cell(cut, "eastfold/staffing").KeyDown(new KeyboardEventArgs { Key = "ArrowLeft" });
        Assert.Equal("eastfold/quality", Focused(cut));
        Cell(cut, "eastfold/quality").KeyDown(new KeyboardEventArgs { Key = "ArrowUp" });
        Assert.Equal("northgate/quality", Focused(cut));

        // Only one cell is in the tab order at a time.
        Assert.Single(cut.FindAll("td[role=gridcell][tabindex='0']"));
        Assert.Contains("conflict of interest", cut.Find("tr[data-bid=westmere] [data-testid=not-rateable]").TextContent);
        Assert.Empty(_saves);
    }

    [Fact]
    public void Typing_a_terms_code_letter_by_letter_sets_it_and_saves_that_cell_with_its_version()
    {
        var sheet = Sheet(rated: ("eastfold", "staffing", "F", Rationale, 3));
        var cut = RenderGrid(sheet);
        var cell = Cell(cut, "eastfold/staffing");
        cell.Focus();

        cell.KeyDown(new KeyboardEventArgs { Key = "m" });
        Assert.Empty(_saves);
        Cell(cut, "eastfold/staffing").KeyDown(new KeyboardEventArgs { Key = "g" });

        var (saved, request) = Assert.Single(_saves);
        Assert.Equal(("eastfold", "staffing"), (saved.Alternative, saved.Criterion));
        Assert.Equal(new RatingRequest("MG", Rationale, null, 3), request);
        Assert.Contains("MG", Cell(cut, "eastfold/staffing").TextContent);
        Assert.Equal("saved", Cell(cut, "eastfold/staffing").GetAttribute("data-state"));
    }

    [Fact]
    public void A_digit_chooses_the_nth_term_and_a_cell_without_a_rationale_waits_instead_of_saving()
    {
        var cut = RenderGrid(Sheet());
        var cell = Cell(cut, "northgate/quality");

        cell.KeyDown(new KeyboardEventArgs { Key = "6" });

        Assert.Contains(ChenCodes[5], Cell(cut, "northgate/quality").TextContent);
        Assert.Equal("draft", Cell(cut, "northgate/quality").GetAttribute("data-state"));
        Assert.Empty(_saves);
    }

    [Fact]
    public void Enter_opens_the_rationale_for_the_focused_cell_and_leaving_it_saves_term_and_rationale()
    {
        var cut = RenderGrid(Sheet());
        Cell(cut, "northgate/quality").KeyDown(new KeyboardEventArgs { Key = "ArrowDown" });
        Cell(cut, "westmere/quality").KeyDown(new KeyboardEventArgs { Key = "G" });
        Cell(cut, "westmere/quality").KeyDown(new KeyboardEventArgs { Key = "Enter" });

        var editor = cut.Find("[data-testid=cell-editor]");
        Assert.Contains("Westmere Cleaning Co-operative", editor.QuerySelector("h3")!.TextContent);
        Assert.Contains("Cleaning method", editor.QuerySelector("h3")!.TextContent);
        Assert.Contains("photo evidence", cut.Find("[data-testid=descriptor]").TextContent); // G's descriptor for quality

        cut.Find("textarea").Input(Rationale);
        cut.Find("textarea").Blur();

        var (saved, request) = Assert.Single(_saves);
        Assert.Equal(("westmere", "quality"), (saved.Alternative, saved.Criterion));
        Assert.Equal(new RatingRequest("G", Rationale, null, null), request);

        cut.Find("textarea").KeyDown(new KeyboardEventArgs { Key = "Escape" });
        Assert.Empty(cut.FindAll("[data-testid=cell-editor]"));
        Assert.Single(_saves); // nothing changed since: Escape sends nothing more
    }

    [Fact]
    public void Declining_a_cell_sends_the_reason_and_no_term()
    {
        var cut = RenderGrid(Sheet(rated: ("northgate", "staffing", "P", Rationale, 2)));
        Cell(cut, "northgate/staffing").Focus();
        Cell(cut, "northgate/staffing").KeyDown(new KeyboardEventArgs { Key = "Enter" });
        Button(cut, "Decline this cell instead").Click();
        cut.Find("#decline-reason").Input("Staffing plans are outside my expertise.");
        Button(cut, "Decline with this reason").Click();

        var (saved, request) = Assert.Single(_saves);
        Assert.Equal(("northgate", "staffing"), (saved.Alternative, saved.Criterion));
        Assert.Equal(new RatingRequest(null, null, "Staffing plans are outside my expertise.", 2), request);
        Assert.Contains("Declined", Cell(cut, "northgate/staffing").TextContent);
    }

    [Fact]
    public void The_rationale_and_the_reason_for_declining_stop_at_the_length_the_service_accepts()
    {
        // The browser enforces maxlength, so a long paste is cut there instead of sending a message larger than the
        // circuit accepts (RequestLimits.MaxCircuitMessageBytes), which would drop the connection.
        var cut = RenderGrid(Sheet());
        Cell(cut, "northgate/quality").KeyDown(new KeyboardEventArgs { Key = "G" });
        Cell(cut, "northgate/quality").KeyDown(new KeyboardEventArgs { Key = "Enter" });
        Assert.Equal(RatingSheetService.MaxTextLength.ToString(System.Globalization.CultureInfo.InvariantCulture), cut.Find("textarea").GetAttribute("maxlength"));

        Button(cut, "Decline this cell instead").Click();

        Assert.Equal(RatingSheetService.MaxTextLength.ToString(System.Globalization.CultureInfo.InvariantCulture), cut.Find("#decline-reason").GetAttribute("maxlength"));
    }

    [Fact]
    public void A_cell_saved_elsewhere_shows_the_stored_rating_and_keeps_the_assessors_change_aside()
    {
        var stored = new SheetCell("northgate", "quality", "VG", "Seen elsewhere: section 2 sets out audits.", null, 5, true, true);
        _answer = (_, _) => CellSaveResult.Stale(stored);
        var cut = RenderGrid(Sheet(rated: ("northgate", "quality", "F", Rationale, 4)));

        Cell(cut, "northgate/quality").KeyDown(new KeyboardEventArgs { Key = "P" });

        Assert.Equal("stale", Cell(cut, "northgate/quality").GetAttribute("data-state"));
        Assert.Contains("VG", Cell(cut, "northgate/quality").TextContent);
        _answer = (cell, request) => CellSaveResult.Ok(cell with { Term = request.Term, Rationale = request.Rationale, Version = 6 });
        Cell(cut, "northgate/quality").KeyDown(new KeyboardEventArgs { Key = "Enter" });
        Button(cut, "Save my change over it").Click();

        // The change goes again only when asked, against the version now stored.
        Assert.Equal(2, _saves.Count);
        Assert.Equal(new RatingRequest("P", Rationale, null, 5), _saves[1].Request);
    }

    [Fact]
    public void Submitting_lists_the_cells_still_missing_or_with_a_short_rationale_and_sends_nothing()
    {
        var cut = RenderGrid(Sheet(rated: ("northgate", "quality", "G", Rationale, 1)));
        Cell(cut, "northgate/quality").KeyDown(new KeyboardEventArgs { Key = "ArrowRight" });
        Cell(cut, "northgate/staffing").KeyDown(new KeyboardEventArgs { Key = "G" }); // a term but no rationale yet

        Button(cut, "Check and submit").Click();

        var issues = cut.Find("[data-testid=sheet-issues]");
        var items = issues.QuerySelectorAll("li").Select(li => li.TextContent).ToArray();
        Assert.Equal(5, items.Length); // six cells, one done
        Assert.Contains(items, i => i.Contains("Northgate Facility Care — Staffing and supervision") && i.Contains("shorter than 20 characters"));
        Assert.Contains(items, i => i.Contains("Eastfold Property Services — Cleaning method") && i.Contains("not rated yet"));
        Assert.DoesNotContain(items, i => i.Contains("Northgate Facility Care — Cleaning method"));
        Assert.Empty(cut.FindAll("[data-testid=submit-confirmation]"));
        Assert.Equal(0, _submits);

        // Each listed cell leads to its rationale.
        issues.QuerySelectorAll("button").First(b => b.TextContent.Contains("Eastfold")).Click();
        Assert.Contains("Eastfold Property Services", cut.Find("[data-testid=cell-editor] h3").TextContent);
    }

    [Fact]
    public void A_complete_sheet_asks_for_confirmation_saying_it_locks_the_sheet_before_submitting()
    {
        var sheet = Sheet();
        sheet = sheet with { Cells = sheet.Cells.Select(c => c with { Term = "G", Rationale = Rationale, Version = 1, Done = true }).ToArray() };
        var cut = RenderGrid(sheet);
        Assert.Equal("6 of 6", cut.Find("[data-testid=progress] .decide-strong").TextContent);

        Button(cut, "Check and submit").Click();
        Assert.Contains("locks your sheet", cut.Find("[data-testid=submit-confirmation]").TextContent);
        Assert.Equal(0, _submits);
        Button(cut, "Submit and lock my sheet").Click();

        Assert.Equal(1, _submits);
    }

    [Fact]
    public void A_submitted_sheet_is_read_only_with_no_inputs_no_keys_and_no_saves()
    {
        var sheet = Sheet(rated: ("northgate", "quality", "G", Rationale, 1)) with
        {
            Submitted = true, SubmittedAt = new DateTimeOffset(2026, 11, 30, 9, 0, 0, TimeSpan.Zero), Editable = false, Stage = EvaluationStage.Moderation,
        };
        var cut = RenderGrid(sheet);

        // The only control left is the choice to show rationales in full; nothing in the grid can be changed.
        Assert.Empty(cut.FindAll("table textarea, table input, table select, table button"));
        Assert.Empty(cut.FindAll("td[tabindex]"));
        Assert.DoesNotContain(cut.FindAll("button"), b => b.TextContent.Contains("submit", StringComparison.OrdinalIgnoreCase));
        Assert.Contains(Rationale, Cell(cut, "northgate/quality").TextContent);
        Assert.Throws<MissingEventHandlerException>(() => Cell(cut, "northgate/quality").KeyDown(new KeyboardEventArgs { Key = "P" }));
        Assert.Empty(_saves);
        Assert.Equal(0, _submits);
    }

    [Fact]
    public void A_change_made_while_the_cell_is_saving_is_sent_once_after_it_with_the_new_version()
    {
        // The first save stays on its way until released; two more changes arrive meanwhile.
        var release = new TaskCompletionSource();
        var sends = new List<RatingRequest>();
        var cut = Render<RatingGrid>(p => p
            .Add(x => x.Sheet, Sheet(rated: ("eastfold", "staffing", "F", Rationale, 3)))
            .Add(x => x.OnSave, async (cell, request) =>
            {
                sends.Add(request);
                if (sends.Count == 1)
                {
                    await release.Task;
                }

                return _answer(cell, request);
            })
            .Add(x => x.OnSubmit, () => Task.FromResult<ProblemText?>(null))
            .Add(x => x.AutosaveDelay, TimeSpan.Zero));

        Cell(cut, "eastfold/staffing").Focus();
        Cell(cut, "eastfold/staffing").KeyDown(new KeyboardEventArgs { Key = "G" });
        Assert.Equal("saving", Cell(cut, "eastfold/staffing").GetAttribute("data-state"));
        Cell(cut, "eastfold/staffing").KeyDown(new KeyboardEventArgs { Key = "V" });
        Cell(cut, "eastfold/staffing").KeyDown(new KeyboardEventArgs { Key = "G" });
        Assert.Single(sends);

        cut.InvokeAsync(release.SetResult);
        cut.WaitForAssertion(() => Assert.Equal("saved", Cell(cut, "eastfold/staffing").GetAttribute("data-state")));

        // Two saves in all: the first as typed, the second with the latest term against the version the first stored.
        Assert.Equal([new RatingRequest("G", Rationale, null, 3), new RatingRequest("VG", Rationale, null, 4)], sends);
        Assert.Contains("VG", Cell(cut, "eastfold/staffing").TextContent);
    }

    private static readonly string[] ChenCodes = BuiltInScales.ChenRating7.Terms.Select(t => t.Code).ToArray();

    private IRenderedComponent<RatingGrid> RenderGrid(RatingSheetView sheet) =>
        Render<RatingGrid>(p => p
            .Add(x => x.Sheet, sheet)
            .Add(x => x.OnSave, (cell, request) =>
            {
                _saves.Add((cell, request));
                return Task.FromResult(_answer(cell, request));
            })
            .Add(x => x.OnSubmit, () =>
            {
                _submits++;
                return Task.FromResult<ProblemText?>(null);
            })
            .Add(x => x.AutosaveDelay, TimeSpan.Zero));

    private static IElement Cell(IRenderedComponent<RatingGrid> cut, string cell) => cut.Find($"td[data-cell='{cell}']");

    private static string? Focused(IRenderedComponent<RatingGrid> cut) => cut.Find("td[role=gridcell][tabindex='0']").GetAttribute("data-cell");

    private static IElement Button(IRenderedComponent<RatingGrid> cut, string text) =>
        cut.FindAll("button").First(b => b.TextContent.Contains(text, StringComparison.Ordinal));

    /// <summary>Three bids × two criteria on Chen's seven-term scale, nothing rated unless asked.</summary>
    private static RatingSheetView Sheet(string? recused = null, (string Bid, string Criterion, string Term, string Rationale, long Version)? rated = null)
    {
        SheetBidder[] bidders =
        [
            new("northgate", "Northgate Facility Care", recused == "northgate", []),
            new("westmere", "Westmere Cleaning Co-operative", recused == "westmere", []),
            new("eastfold", "Eastfold Property Services", recused == "eastfold", []),
        ];
        SheetCriterion[] criteria =
        [
            new("quality", "Cleaning method and quality control", "How the method keeps the depots clean.", null,
                new Dictionary<string, string> { ["G"] = "A depot-specific method with weekly checks and photo evidence." }),
            new("staffing", "Staffing and supervision", null, "service", new Dictionary<string, string>()),
        ];
        var cells = bidders.SelectMany(b => criteria.Select(c =>
            b.Recused ? new SheetCell(b.Code, c.Id, null, null, Declaration.RecusalReason, 1, true, true)
            : rated is { } r && r.Bid == b.Code && r.Criterion == c.Id ? new SheetCell(b.Code, c.Id, r.Term, r.Rationale, null, r.Version, r.Rationale.Length >= 20, true)
            : new SheetCell(b.Code, c.Id, null, null, null, null, false, true))).ToArray();
        var scale = BuiltInScales.ChenRating7.Terms.Select(t => new ScaleTermView(t.Code, t.Label, t.Value.ToArray())).ToArray();
        return new RatingSheetView("ashby", EvaluationStage.Scoring, bidders, criteria, scale, cells,
            new SheetProgress(cells.Count(c => c.Done), cells.Length), null, false, true, 20);
    }
}
