using System.Security.Cryptography;
using System.Text;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Interchange;
using Decide.Web.Features.Evaluations;
using Decide.Web.Infrastructure;
using Microsoft.AspNetCore.Identity;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Accounts;

/// <summary>
/// On an empty database: the administrator role, demo accounts for every role and the invented demo evaluation
/// from <c>samples/</c>, at the moderation stage with every rating in. Prints the demo logins. Switch off with
/// <c>Database:SeedDemo=false</c>.
/// </summary>
public sealed class DemoSeeder(
    UserManager<DecideUser> users,
    RoleManager<IdentityRole> roles,
    IDbContextFactory<DecideDbContext> factory,
    IWebHostEnvironment environment,
    TimeProvider clock,
    ILogger<DemoSeeder> logger)
{
    /// <summary>The demo password (every demo account). Demo data only; never use in production.</summary>
    public const string DemoPassword = "Decide-demo-2026";

    /// <summary>The demo file seeded.</summary>
    public const string DemoFile = "bus-stop-displays-importance.json";

    public const string Domain = "kestrel-vale.example";

    /// <summary>The second demo: a published points award in two stages, seeded with its prices still sealed.</summary>
    public const string PointsDemoFile = "park-grounds-points.json";

    /// <summary>The second demo's organisation's mail domain.</summary>
    public const string PointsDomain = "harrowmere.example";

    /// <summary>The third demo: a grant round in which each reviewer reads only the applications assigned to them.</summary>
    public const string RoundDemoFile = "community-grants-round.json";

    /// <summary>The invented domain of the grant round's accounts.</summary>
    public const string RoundDomain = "millbrook.example";

    public async Task SeedIfEmptyAsync(CancellationToken ct = default)
    {
        if (!await roles.RoleExistsAsync(IdentitySetup.AdministratorRole))
        {
            await roles.CreateAsync(new IdentityRole(IdentitySetup.AdministratorRole));
        }

        if (await users.Users.AnyAsync(ct))
        {
            return;
        }

        var file = EvaluationFileReader.ReadFile(SamplePath(DemoFile));
        var admin = await Account("admin@decide.example", "Site Administrator", administrator: true);
        var facilitator = await Account($"facilitator@{Domain}", "Ione Castellane (Procurement Officer, facilitator)");
        var observer = await Account($"probity@{Domain}", "Wendell Saxby (Probity Observer)");
        var approver = await Account($"director@{Domain}", "Priya Marchetti (Director of Operations, approver)");
        var accounts = await PanelAccountsAsync(file, Domain);

        var now = clock.GetUtcNow();
        await using var db = await factory.CreateDbContextAsync(ct);
        var stored = EvaluationImporter.Add(db, file, accounts, facilitator.Id, admin.Id, now);
        stored.CreatedAt = now.AddDays(-30);
        LockPlanAt(stored, now.AddDays(-20));
        stored.OpenScoring(now.AddDays(-12));
        stored.StartModeration(now.AddDays(-1));
        stored.Panel.Add(new PanelMember { UserId = observer.Id, Role = PanelRole.Observer });
        stored.Panel.Add(new PanelMember { UserId = approver.Id, Role = PanelRole.Approver });
        var commercial = file.Evaluation.Assessors.LastOrDefault();
        if (commercial is not null)
        {
            stored.Panel.Add(new PanelMember { UserId = accounts[commercial.Id], Role = PanelRole.PriceEvaluator, AssessorCode = commercial.Id });
        }

        foreach (var seat in stored.Panel.Where(p => p.Role is PanelRole.Assessor or PanelRole.PriceEvaluator))
        {
            seat.DeclarationSignedAt = now.AddDays(-19);
            seat.DeclarationVersion = "2026-1";
            seat.NamesConfirmedAt = now.AddDays(-12);
            seat.WeightsSubmittedAt = now.AddDays(-19);
            seat.SubmittedAt = now.AddDays(-2);
        }

        AuditChain.Append(db, stored.Id.ToString(), new AuditEvent("evaluation.seeded", $"evaluations/{stored.Id}", null,
            $"demo evaluation imported from samples/{DemoFile}"), admin.Id, admin.Email, now);
        await db.SaveChangesAsync(ct);
        var points = await SeedPointsDemoAsync(admin, now, ct);
        var round = await SeedRoundDemoAsync(admin, now, ct);

        logger.LogInformation(
            "Seeded the demo evaluation {Reference}. Demo logins: administrator admin@decide.example; facilitator facilitator@{Domain}; assessors {Assessors}; price evaluator {Commercial}; observer probity@{Domain}; approver director@{Domain}.",
            stored.Reference, Domain, string.Join(", ", file.Evaluation.Assessors.Select(a => $"{a.Id}@{Domain}")), commercial is null ? "-" : $"{commercial.Id}@{Domain}", Domain, Domain);
        // Logs never carry a password, not even the demo's: the banner with it goes to the developer's console only.
        if (!environment.IsDevelopment())
        {
            return;
        }

        Console.WriteLine();
        Console.WriteLine($"Demo data seeded. Every demo account's password: {DemoPassword}");
        Console.WriteLine($"  administrator    admin@decide.example");
        Console.WriteLine($"  facilitator      facilitator@{Domain}");
        Console.WriteLine($"  assessors        {string.Join(", ", file.Evaluation.Assessors.Select(a => $"{a.Id}@{Domain}"))}");
        Console.WriteLine($"  price evaluator  {commercial?.Id}@{Domain}");
        Console.WriteLine($"  observer         probity@{Domain}");
        Console.WriteLine($"  approver         director@{Domain}");
        Console.WriteLine($"Second demo ({points}, a points award in two stages, prices still sealed):");
        Console.WriteLine($"  facilitator      procurement@{PointsDomain}; price evaluator commercial@{PointsDomain}; assessors ashcroft, wren, lindqvist @{PointsDomain}");
        Console.WriteLine($"Third demo ({round}, a grant round: three reviewers per application, a funding line):");
        Console.WriteLine($"  facilitator      grants@{RoundDomain}; observer trustees@{RoundDomain}; reviewers okafor, lindgren, marsh, ferreira, quayle, haddad @{RoundDomain}");
        Console.WriteLine();
    }

    /// <summary>
    /// The points demo at moderation with every rating and both moderated values in, its prices sealed: the
    /// facilitator opens them, the price evaluator enters them (samples/README.md lists them), and the flagged price
    /// is reviewed on the Award screen. Its own facilitator, so the first demo stays the demo facilitator's only one.
    /// </summary>
    private async Task<string> SeedPointsDemoAsync(DecideUser admin, DateTimeOffset now, CancellationToken ct)
    {
        var file = EvaluationFileReader.ReadFile(SamplePath(PointsDemoFile));
        file = file with { Evaluation = file.Evaluation with { Values = [], LowPriceReviews = [] } };
        var facilitator = await Account($"procurement@{PointsDomain}", "Odile Fairweather (Procurement Lead, facilitator)");
        var commercial = await Account($"commercial@{PointsDomain}", "Bram Ellery (Commercial Officer, price evaluator)");
        var observer = await Account($"audit@{PointsDomain}", "Nia Trevelyan (Internal Audit, observer)");
        var approver = await Account($"head.parks@{PointsDomain}", "Caspar Holm (Head of Parks, approver)");
        var accounts = await PanelAccountsAsync(file, PointsDomain);

        await using var db = await factory.CreateDbContextAsync(ct);
        var stored = EvaluationImporter.Add(db, file, accounts, facilitator.Id, admin.Id, now);
        stored.CreatedAt = now.AddDays(-40);
        LockPlanAt(stored, now.AddDays(-30), pointsAward: true, twoStage: true);
        stored.OpenScoring(now.AddDays(-14));
        stored.StartModeration(now.AddDays(-2));
        stored.Panel.Add(new PanelMember { UserId = commercial.Id, Role = PanelRole.PriceEvaluator, AssessorCode = "commercial" });
        stored.Panel.Add(new PanelMember { UserId = observer.Id, Role = PanelRole.Observer });
        stored.Panel.Add(new PanelMember { UserId = approver.Id, Role = PanelRole.Approver });
        foreach (var seat in stored.Panel.Where(p => p.Role is PanelRole.Assessor or PanelRole.PriceEvaluator))
        {
            seat.DeclarationSignedAt = now.AddDays(-29);
            seat.DeclarationVersion = "2026-1";
            seat.NamesConfirmedAt = now.AddDays(-14);
            seat.SubmittedAt = seat.Role == PanelRole.Assessor ? now.AddDays(-3) : null;
        }

        AuditChain.Append(db, stored.Id.ToString(), new AuditEvent("evaluation.seeded", $"evaluations/{stored.Id}", null,
            $"demo evaluation imported from samples/{PointsDemoFile}, its prices left sealed"), admin.Id, admin.Email, now);
        await db.SaveChangesAsync(ct);
        return stored.Reference;
    }

    /// <summary>
    /// The grant round at moderation with every reviewer's sheet submitted: the results show the bands and the
    /// funding line, the assignment screen who read what. Its own facilitator and observer.
    /// </summary>
    private async Task<string> SeedRoundDemoAsync(DecideUser admin, DateTimeOffset now, CancellationToken ct)
    {
        var file = EvaluationFileReader.ReadFile(SamplePath(RoundDemoFile));
        var facilitator = await Account($"grants@{RoundDomain}", "Hollis Brightwater (Grants Manager, facilitator)");
        var observer = await Account($"trustees@{RoundDomain}", "Maud Penhallow (Chair of Trustees, observer)");
        var accounts = await PanelAccountsAsync(file, RoundDomain);

        await using var db = await factory.CreateDbContextAsync(ct);
        var stored = EvaluationImporter.Add(db, file, accounts, facilitator.Id, admin.Id, now);
        stored.CreatedAt = now.AddDays(-35);
        LockPlanAt(stored, now.AddDays(-28));
        stored.OpenScoring(now.AddDays(-21));
        stored.StartModeration(now.AddDays(-1));
        stored.Panel.Add(new PanelMember { UserId = observer.Id, Role = PanelRole.Observer });
        foreach (var seat in stored.Panel.Where(p => p.Role == PanelRole.Assessor))
        {
            seat.DeclarationSignedAt = now.AddDays(-27);
            seat.DeclarationVersion = "2026-1";
            seat.NamesConfirmedAt = now.AddDays(-25);
            seat.WeightsSubmittedAt = now.AddDays(-29);
            seat.SubmittedAt = now.AddDays(-2);
        }

        AuditChain.Append(db, stored.Id.ToString(), new AuditEvent("evaluation.seeded", $"evaluations/{stored.Id}", null,
            $"demo grant round imported from samples/{RoundDemoFile}, its assignment frozen as the file gives it"), admin.Id, admin.Email, now);
        await db.SaveChangesAsync(ct);
        return stored.Reference;
    }

    /// <summary>An account per assessor of the file, at the demo's domain: assessor code → account id.</summary>
    private async Task<Dictionary<string, string>> PanelAccountsAsync(EvaluationFile file, string domain)
    {
        var accounts = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var assessor in file.Evaluation.Assessors)
        {
            accounts[assessor.Id] = (await Account($"{assessor.Id}@{domain}", assessor.Name)).Id;
        }

        return accounts;
    }

    /// <summary>Locks a seeded plan as the lifecycle would: its SHA-256 and the fingerprint of its methodology.</summary>
    private static void LockPlanAt(StoredEvaluation stored, DateTimeOffset at, bool pointsAward = false, bool twoStage = false) =>
        stored.LockPlan(at, Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(stored.PlanJson))), pointsAward, twoStage,
            Reports.Methodology.MethodologyDocument.Fingerprint(Recordkeeping.MethodologyInputs.From(EvaluationComposer.ReadPlan(stored))));

    private string SamplePath(string name)
    {
        var path = Path.Combine(AppContext.BaseDirectory, "samples", name);
        return File.Exists(path) ? path : Path.Combine(environment.ContentRootPath, "..", "..", "samples", name);
    }

    private async Task<DecideUser> Account(string email, string name, bool administrator = false)
    {
        var user = new DecideUser { UserName = email, Email = email, EmailConfirmed = true, DisplayName = name, CreatedAt = clock.GetUtcNow() };
        var result = await users.CreateAsync(user, DemoPassword);
        if (!result.Succeeded)
        {
            throw new InvalidOperationException($"Could not create demo account {email}: {string.Join(" ", result.Errors.Select(e => e.Description))}");
        }

        if (administrator)
        {
            await users.AddToRoleAsync(user, IdentitySetup.AdministratorRole);
        }

        return user;
    }
}
