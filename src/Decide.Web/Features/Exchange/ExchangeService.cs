using System.Runtime.InteropServices;
using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using System.Text.RegularExpressions;
using Decide.Core;
using Decide.Core.Award;
using Decide.Core.Analysis;
using Decide.Core.Rounds;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Interchange;
using Decide.Web.Features.Audit;
using Decide.Web.Features.Evaluations;
using Decide.Web.Features.Results;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Exchange;

/// <summary>
/// The evaluation in and out: the portable file (<c>decide-evaluation/1</c>) for export and import, and spreadsheet
/// extracts of the ratings and the results. Every export is audited with the SHA-256 of what left the service.
/// </summary>
public sealed partial class ExchangeService(
    IDbContextFactory<DecideDbContext> factory,
    EvaluationAccess access,
    EvaluationComposer composer,
    CurrentUser user,
    AuditWriter audit,
    TimeProvider clock)
{
    private const string CsvType = "text/csv; charset=utf-8";

    /// <summary>The whole evaluation as a portable file (facilitator, observer, approver; any stage).</summary>
    public Task<DownloadFile> ExportAsync(Guid id, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver);
            var bytes = Encoding.UTF8.GetBytes(EvaluationFileWriter.ToJson(await composer.ComposeAsync(db, m.Evaluation, ct)));
            return await Download(db, m.Evaluation, "evaluation.exported", "export", FileName(m.Evaluation, ".decide.json"), "application/json", bytes, ct);
        }, ct);

    /// <summary>Every rating with its rationale, declined reason and the moderated value in force (facilitator, observer, approver).</summary>
    public Task<DownloadFile> RatingsCsvAsync(Guid id, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver);
            var e = (await composer.ComposeAsync(db, m.Evaluation, ct)).Evaluation;
            var moderated = e.Moderated.ToDictionary(x => (x.Alternative, x.Criterion), x => x.Term);
            var csv = new SpreadsheetCsv().Header("assessor", "bidder", "criterion", "term", "rationale", "declined_reason", "moderated_term");
            foreach (var r in e.Ratings)
            {
                csv.Row(SpreadsheetCsv.Text(r.Assessor), SpreadsheetCsv.Text(r.Alternative), SpreadsheetCsv.Text(r.Criterion),
                    SpreadsheetCsv.Text(r.Term), SpreadsheetCsv.Text(r.Rationale), SpreadsheetCsv.Text(r.Declined),
                    SpreadsheetCsv.Text(moderated.GetValueOrDefault((r.Alternative, r.Criterion))));
            }

            return await Download(db, m.Evaluation, "ratings.exported", "export/ratings.csv", FileName(m.Evaluation, "-ratings.csv"), CsvType, csv.ToUtf8(), ct);
        }, ct);

    /// <summary>Every rating, as <see cref="RatingsCsvAsync"/>, as an .xlsx workbook (facilitator, observer, approver).</summary>
    public Task<DownloadFile> RatingsXlsxAsync(Guid id, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver);
            var e = (await composer.ComposeAsync(db, m.Evaluation, ct)).Evaluation;
            var moderated = e.Moderated.ToDictionary(x => (x.Alternative, x.Criterion), x => x.Term);
            var book = new XlsxWorkbook().Sheet("Ratings", "Assessor", "Bidder", "Criterion", "Term", "Rationale", "Declined because", "Moderated term");
            foreach (var r in e.Ratings)
            {
                book.Row(e.Assessors.FirstOrDefault(a => a.Id == r.Assessor)?.Name ?? r.Assessor, e.AlternativeName(r.Alternative),
                    e.Criteria.FirstOrDefault(c => c.Id == r.Criterion)?.Name ?? r.Criterion, r.Term, r.Rationale, r.Declined,
                    moderated.GetValueOrDefault((r.Alternative, r.Criterion)));
            }

            return await Download(db, m.Evaluation, "ratings.exported", "export/ratings.xlsx", FileName(m.Evaluation, "-ratings.xlsx"), XlsxType, book.ToBytes(), ct);
        }, ct);

    /// <summary>
    /// Who reads which application in a round, as an .xlsx workbook: one sheet per reviewer's list, one per
    /// application's readers (facilitator, observer, approver).
    /// </summary>
    public Task<DownloadFile> AssignmentXlsxAsync(Guid id, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver);
            var e = (await composer.ComposeAsync(db, m.Evaluation, ct)).Evaluation;
            if (e.Reviews is not { } design)
            {
                throw DomainProblem.Stage($"Evaluation {m.Evaluation.Reference} is not a round: its plan has every assessor rate every bid.");
            }

            var book = new XlsxWorkbook().Sheet("Reviewers", "Code", "Reviewer", "Fields", "Reads", "Applications");
            foreach (var a in e.Assessors)
            {
                var mine = design.ApplicationsOf(a.Id);
                book.Row(a.Id, a.Name, string.Join(", ", a.Topics ?? []), mine.Count, string.Join(", ", mine.Select(e.AlternativeName)));
            }

            book.Sheet("Applications", "Code", "Application", "Field", "Requested", "Read by");
            foreach (var alt in e.Alternatives)
            {
                book.Row(alt.Id, alt.Name, alt.Topic, alt.Requested, string.Join(", ", design.ReviewersOf(alt.Id).Select(r => e.Assessors.FirstOrDefault(x => x.Id == r)?.Name ?? r)));
            }

            return await Download(db, m.Evaluation, "assignment.exported", "export/assignment.xlsx", FileName(m.Evaluation, "-assignment.xlsx"), XlsxType, book.ToBytes(), ct);
        }, ct);

    /// <summary>
    /// The ranking as an .xlsx workbook: rank, bidder, closeness, d+ and d−, and in a round the bands and the funding
    /// line on a second sheet (the results' roles and stages).
    /// </summary>
    public Task<DownloadFile> ResultsXlsxAsync(Guid id, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var (m, e) = await RankableAsync(db, id, ct);
            var run = e.Reviews is not null || e.Funding is not null ? DecisionRun.Of(e, new Core.Robustness.RobustnessOptions(2000)) : DecisionRun.Of(e);
            var book = new XlsxWorkbook().Sheet("Ranking", "Rank", "Code", "Bidder", "Closeness", "d+", "d−", "Not ranked because");
            foreach (var r in run.Analysis.Ranking)
            {
                book.Row(r.Rank, r.Alternative, e.AlternativeName(r.Alternative), r.Closeness, r.DPlus, r.DMinus, null);
            }

            foreach (var x in run.Analysis.Excluded)
            {
                book.Row(null, x.Alternative, e.AlternativeName(x.Alternative), null, null, null, x.Gates.Count > 0 ? "failed " + string.Join(", ", x.Gates) : x.Reason);
            }

            if (run.Round is { } round)
            {
                book.Sheet("Bands and funding", "Place", "Code", "Application", "Band", "Best likely place", "Worst likely place", "Requested", "Funded");
                foreach (var row in round.Rows())
                {
                    book.Row(row.Place, row.Alternative, e.AlternativeName(row.Alternative), row.Band, row.Interval?.Best, row.Interval?.Worst,
                        row.Funding?.Requested, row.Funding is { } d ? RoundText.Decision(d) : null);
                }
            }

            return await Download(db, m.Evaluation, "results.exported", "export/results.xlsx", FileName(m.Evaluation, "-results.xlsx"), XlsxType, book.ToBytes(), ct);
        }, ct);

    /// <summary>
    /// The ranking (rank, bidder, closeness, d+, d−), then the bidders excluded by a gate; with the results' roles and
    /// stages (from moderation on).
    /// </summary>
    public Task<DownloadFile> ResultsCsvAsync(Guid id, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var (m, e) = await RankableAsync(db, id, ct);
            var result = DecisionRun.Of(e).Analysis;
            var names = e.Alternatives.ToDictionary(a => a.Id, a => a.Name, StringComparer.Ordinal);
            var csv = new SpreadsheetCsv().Header("rank", "bidder", "name", "closeness", "d_plus", "d_minus", "failed_gates");
            foreach (var r in result.Ranking)
            {
                csv.Row(SpreadsheetCsv.Number(r.Rank), SpreadsheetCsv.Text(r.Alternative), SpreadsheetCsv.Text(names.GetValueOrDefault(r.Alternative)),
                    SpreadsheetCsv.Number(r.Closeness), SpreadsheetCsv.Number(r.DPlus), SpreadsheetCsv.Number(r.DMinus), "");
            }

            foreach (var x in result.Excluded)
            {
                csv.Row("", SpreadsheetCsv.Text(x.Alternative), SpreadsheetCsv.Text(names.GetValueOrDefault(x.Alternative)), "", "", "",
                    SpreadsheetCsv.Text(x.Gates.Count > 0 ? string.Join(" ", x.Gates) : x.Reason));
            }

            return await Download(db, m.Evaluation, "results.exported", "export/results.csv", FileName(m.Evaluation, "-results.csv"), CsvType, csv.ToUtf8(), ct);
        }, ct);

    /// <summary>
    /// The evaluation methodology for the tender pack, made from the plan (anyone on the panel; any stage, a draft
    /// before the plan is locked): PDF or plain text. Its fingerprint (SHA-256 of the text) is the one stored when
    /// the plan was locked; a download is audited with it.
    /// </summary>
    public Task<DownloadFile> MethodologyAsync(Guid id, bool pdf, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver, PanelRole.Assessor, PanelRole.PriceEvaluator);
            var input = Recordkeeping.MethodologyInputs.From(EvaluationComposer.ReadPlan(m.Evaluation));
            var content = pdf
                ? Reports.Methodology.MethodologyDocument.Pdf(input, clock.GetUtcNow())
                : Encoding.UTF8.GetBytes(Reports.Methodology.MethodologyDocument.Text(input));
            return await Download(db, m.Evaluation, "methodology.downloaded", pdf ? "methodology.pdf" : "methodology.txt",
                FileName(m.Evaluation, pdf ? "-methodology.pdf" : "-methodology.txt"), pdf ? "application/pdf" : "text/plain; charset=utf-8", content, ct);
        }, ct);

    /// <summary>
    /// The points award as a spreadsheet a bidder's figures can be checked against: one row per bid with, per
    /// quality criterion, the panel's score and the quality points, then quality, price, price points (or the
    /// figure), total, rank and any exclusion or flag. While prices are sealed, the quality stage alone.
    /// </summary>
    public Task<DownloadFile> AwardCsvAsync(Guid id, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            ResultsService.RequireResultsVisible(m, "export the award");
            var e = (await composer.ComposeAsync(db, m.Evaluation, ct)).Evaluation;
            if (e.Award is null)
            {
                throw DomainProblem.Stage($"Evaluation {m.Evaluation.Reference} publishes no points award: its plan ranks the bids by closeness alone.");
            }

            var (award, _) = Award.AwardService.AwardOf(m.Evaluation, e);
            var names = e.Alternatives.ToDictionary(a => a.Id, a => a.Name, StringComparer.Ordinal);
            var header = new List<string> { "rank", "bidder", "name" };
            foreach (var c in award.QualityCriteria)
            {
                header.Add($"{c}_score");
                header.Add($"{c}_points");
            }

            header.AddRange(["quality_points", "quality_share", "price", award.Formula.GivesPoints ? "price_points" : "figure", "total", "excluded", "abnormally_low", "low_price_decision"]);
            var csv = new SpreadsheetCsv().Header([.. header]);
            foreach (var line in award.Lines)
            {
                var b = line.Award;
                var row = new List<string> { b.Rank is { } rank ? SpreadsheetCsv.Number(rank) : "", SpreadsheetCsv.Text(b.Id), SpreadsheetCsv.Text(names.GetValueOrDefault(b.Id)) };
                for (var j = 0; j < line.Cells.Count; j++)
                {
                    row.Add(SpreadsheetCsv.Number(line.Cells[j].Score));
                    row.Add(SpreadsheetCsv.Number(b.CriterionPoints[j]));
                }

                var priceScore = award.Formula.GivesPoints ? b.PricePoints : b.Figure;
                row.AddRange([
                    SpreadsheetCsv.Number(b.QualityPoints), SpreadsheetCsv.Number(b.QualityShare),
                    b.Price is { } price ? SpreadsheetCsv.Number(price) : "",
                    priceScore is { } score ? SpreadsheetCsv.Number(score) : "",
                    b.Total is { } total ? SpreadsheetCsv.Number(total) : "",
                    SpreadsheetCsv.Text(b.Excluded is { } why ? $"{AwardText.Exclusion(why)}: {b.ExclusionDetail}" : null),
                    SpreadsheetCsv.Text(b.AbnormallyLowFlag),
                    SpreadsheetCsv.Text(line.Review?.Decision is { } d ? FormatWords.Of(d) : null),
                ]);
                csv.Row([.. row]);
            }

            return await Download(db, m.Evaluation, "award.exported", "export/award.csv", FileName(m.Evaluation, "-award.csv"), CsvType, csv.ToUtf8(), ct);
        }, ct);

    /// <summary>
    /// Stores a portable file as a new evaluation at stage Setup (administrator), with every input of the file.
    /// Refused, naming each problem, when the file is not valid, the facilitator or an assessor's account is
    /// unknown, or the accounts do not match the file's assessor codes.
    /// </summary>
    public async Task<EvaluationSummary> ImportAsync(ImportRequest request, CancellationToken ct = default)
    {
        if (!user.IsAdministrator)
        {
            throw DomainProblem.Forbidden("Only an administrator imports evaluations.");
        }

        if (request.File.ValueKind != JsonValueKind.Object)
        {
            throw DomainProblem.Invalid("file", "give the decide-evaluation/1 file as a JSON object");
        }

        // The body's own bytes: they may hold text that is not UTF-8, which the reader refuses by its path
        // (GetRawText would throw on it instead).
        var raw = JsonMarshal.GetRawUtf8Value(request.File).ToArray();
        EvaluationFile file;
        try
        {
            file = EvaluationFileReader.Read(raw);
        }
        catch (InvalidEvaluationException e)
        {
            throw new InvalidEvaluationException(e.Errors.Select(x => x with { Path = "file" + x.Path[1..] }).ToArray());
        }

        var errors = new Dictionary<string, string[]>();
        if ((file.Metadata.Reference?.Length ?? 0) > 100)
        {
            errors["file.reference"] = ["the reference is longer than 100 characters"];
        }

        if (file.Evaluation.Title.Length > 300)
        {
            errors["file.title"] = ["the title is longer than 300 characters"];
        }

        return await UnitOfWork.RunAsync(factory, async db =>
        {
            var facilitator = string.IsNullOrWhiteSpace(request.FacilitatorEmail)
                ? null
                : await db.Users.AsNoTracking().FirstOrDefaultAsync(u => u.NormalizedEmail == request.FacilitatorEmail.Trim().ToUpperInvariant(), ct);
            if (facilitator is null)
            {
                errors["facilitatorEmail"] = [string.IsNullOrWhiteSpace(request.FacilitatorEmail)
                    ? "name the facilitator by the e-mail address of their account"
                    : $"no account has the e-mail address {request.FacilitatorEmail}"];
            }

            var given = request.Accounts ?? new Dictionary<string, string>();
            var codes = file.Evaluation.Assessors.Select(a => a.Id).ToHashSet(StringComparer.Ordinal);
            var emails = given.Values.Where(v => !string.IsNullOrWhiteSpace(v)).Select(v => v.Trim().ToUpperInvariant()).Distinct().ToArray();
            var found = await db.Users.AsNoTracking().Where(u => emails.Contains(u.NormalizedEmail!)).ToDictionaryAsync(u => u.NormalizedEmail!, ct);
            var accounts = new Dictionary<string, string>(StringComparer.Ordinal);
            foreach (var code in codes.Where(c => !given.ContainsKey(c)))
            {
                errors[$"accounts.{code}"] = [$"the file's assessor \"{code}\" needs an account: give the e-mail address of the person who holds the seat"];
            }

            foreach (var (code, email) in given)
            {
                if (!codes.Contains(code))
                {
                    errors[$"accounts.{code}"] = [$"the file has no assessor \"{code}\" (it has {string.Join(", ", codes)})"];
                }
                else if (string.IsNullOrWhiteSpace(email) || !found.TryGetValue(email.Trim().ToUpperInvariant(), out var account))
                {
                    errors[$"accounts.{code}"] = [$"no account has the e-mail address {email}"];
                }
                else if (account.Id == facilitator?.Id)
                {
                    errors[$"accounts.{code}"] = ["the facilitator runs the evaluation and never scores; give another account"];
                }
                else
                {
                    accounts[code] = account.Id;
                }
            }

            if (errors.Count > 0)
            {
                throw DomainProblem.Invalid(errors);
            }

            var stored = EvaluationImporter.Add(db, file, accounts, facilitator!.Id, user.Id, clock.GetUtcNow());
            audit.Record(db, stored.Id, new AuditEvent("evaluation.imported", $"evaluations/{stored.Id}", null,
                $"{stored.Reference} · {stored.Title}; facilitator {facilitator.Email}; assessors {string.Join(", ", given.Select(x => $"{x.Key}={x.Value.Trim()}"))}; file sha256 {Sha256(raw)}"));
            if (EvaluationImporter.OpensPrices(file))
            {
                audit.Record(db, stored.Id, new AuditEvent("prices.opened", $"evaluations/{stored.Id}", null,
                    "the imported file of a two-stage evaluation holds its prices, so quality counts as closed and the prices as opened by the import"));
            }

            await db.SaveChangesAsync(ct);
            return EvaluationStore.Summarise(stored, [.. stored.Panel.Where(p => p.UserId == user.Id).Select(p => p.Role)]);
        }, ct);
    }

    /// <summary>The evaluation whose ranking may be exported: results visible to the caller, prices open and every one entered.</summary>
    private async Task<(Membership Membership, Core.Model.Evaluation Evaluation)> RankableAsync(DecideDbContext db, Guid id, CancellationToken ct)
    {
        var m = await access.LoadAsync(db, id, ct);
        ResultsService.RequireResultsVisible(m, "export the results");
        ResultsService.RequirePricesOpen(m, "export the ranking");
        var e = (await composer.ComposeAsync(db, m.Evaluation, ct)).Evaluation;
        ResultsService.RequireEveryPrice(m.Evaluation, e, "export the ranking");
        return (m, e);
    }

    private const string XlsxType = "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet";

    private async Task<DownloadFile> Download(
        DecideDbContext db, StoredEvaluation e, string action, string target, string fileName, string contentType, byte[] content, CancellationToken ct)
    {
        audit.Record(db, e.Id, new AuditEvent(action, $"evaluations/{e.Id}/{target}", null, $"{fileName}; sha256 {Sha256(content)}"));
        await db.SaveChangesAsync(ct);
        return new DownloadFile(fileName, contentType, content);
    }

    /// <summary>The reference made safe for a file name, with the revision ("KVTA-2026-017-r1.decide.json").</summary>
    private static string FileName(StoredEvaluation e, string suffix)
    {
        var reference = UnsafeFileNameCharacters().Replace(e.Reference, "-").Trim('-', '.');
        return $"{(reference.Length == 0 ? "evaluation" : reference)}-r{e.Revision}{suffix}";
    }

    private static string Sha256(byte[] content) => Convert.ToHexStringLower(SHA256.HashData(content));

    [GeneratedRegex("[^A-Za-z0-9._-]+")]
    private static partial Regex UnsafeFileNameCharacters();
}
