using System.Net.Http.Json;
using System.Text.Json;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;

namespace Decide.Web.Tests.Checks;

/// <summary>
/// Tampering with the audit trail directly in the database file (as someone with access to the file, not the API,
/// would): the verification endpoint names each edited, deleted or inserted entry and its position.
/// </summary>
public sealed class AuditTamperTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task An_untouched_chain_verifies()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync();
        var verification = await VerifyAsync(s);
        Assert.True(verification.GetProperty("valid").GetBoolean(), verification.ToString());
        Assert.Empty(verification.GetProperty("breaks").EnumerateArray());
        Assert.Equal((await s.AuditAsync()).GetArrayLength(), verification.GetProperty("entries").GetInt64());
    }

    [Fact]
    public async Task An_edited_new_value_is_reported_as_edited_at_its_position()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync();
        const long position = 3;
        await TamperAsync(s, async db =>
        {
            var entry = await db.Audit.SingleAsync(a => a.Chain == s.Id.ToString() && a.Index == position);
            entry.NewValue = (entry.NewValue ?? "") + " (altered)";
        });

        var only = SingleBreak(await VerifyAsync(s));
        Assert.Equal("edited", only.GetProperty("kind").GetString());
        Assert.Equal(position, only.GetProperty("index").GetInt64());
    }

    [Fact]
    public async Task A_deleted_entry_is_reported_as_deleted_at_its_position()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync();
        const long position = 2;
        await TamperAsync(s, async db => db.Audit.Remove(await db.Audit.SingleAsync(a => a.Chain == s.Id.ToString() && a.Index == position)));

        // The gap is named at the missing position; the entry after it no longer follows its predecessor either.
        var verification = await VerifyAsync(s);
        Assert.False(verification.GetProperty("valid").GetBoolean());
        var breaks = verification.GetProperty("breaks").EnumerateArray().ToArray();
        Assert.Equal("deleted", breaks[0].GetProperty("kind").GetString());
        Assert.Equal(position, breaks[0].GetProperty("index").GetInt64());
        Assert.All(breaks, b => Assert.Equal("deleted", b.GetProperty("kind").GetString()));
    }

    [Fact]
    public async Task An_inserted_entry_is_reported_as_inserted_at_its_position()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync();
        long position = 0;
        await TamperAsync(s, async db =>
        {
            // The unique (chain, index) index leaves a forger only the next free position. The forged entry is hashed
            // correctly over its own content but claims to follow entry 1, as if slipped in early in the record.
            var chain = s.Id.ToString();
            var first = await db.Audit.SingleAsync(a => a.Chain == chain && a.Index == 1);
            position = await db.Audit.Where(a => a.Chain == chain).MaxAsync(a => a.Index) + 1;
            var forged = new AuditEntry
            {
                Chain = chain, Index = position, At = first.At, UserName = DecideWebFactory.Facilitator,
                Action = "plan.updated", Target = "plan", NewValue = "{\"forged\":true}", PreviousHash = first.Hash,
            };
            forged.Hash = AuditChain.HashOf(forged);
            db.Audit.Add(forged);
        });

        var only = SingleBreak(await VerifyAsync(s));
        Assert.Equal("inserted", only.GetProperty("kind").GetString());
        Assert.Equal(position, only.GetProperty("index").GetInt64());
    }

    /// <summary>Changes the audit table through a context of the service's own, bypassing the API.</summary>
    private async Task TamperAsync(Scenario s, Func<DecideDbContext, Task> change)
    {
        Assert.True((await VerifyAsync(s)).GetProperty("valid").GetBoolean(), "the chain must be intact before tampering");
        using var scope = factory.Services.CreateScope();
        var contexts = scope.ServiceProvider.GetRequiredService<IDbContextFactory<DecideDbContext>>();
        await using var db = await contexts.CreateDbContextAsync();
        await change(db);
        await db.SaveChangesAsync();
    }

    private static async Task<JsonElement> VerifyAsync(Scenario s) =>
        await s.Facilitator.GetFromJsonAsync<JsonElement>(s.Url("/audit/verification"));

    private static JsonElement SingleBreak(JsonElement verification)
    {
        Assert.False(verification.GetProperty("valid").GetBoolean(), verification.ToString());
        return Assert.Single(verification.GetProperty("breaks").EnumerateArray());
    }
}
