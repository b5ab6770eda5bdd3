using Decide.Data;
using Decide.Data.Entities;
using Decide.Web.Features.Evaluations;
using Decide.Web.Infrastructure;

namespace Decide.Web.Features.Inputs;

/// <summary>Loads an evaluation for an input use case (see <see cref="InputContext"/>).</summary>
public sealed class InputAccess(EvaluationAccess access, CurrentUser user)
{
    /// <summary>The evaluation with the caller's roles and seats; 404 for strangers.</summary>
    public async Task<InputContext> LoadAsync(DecideDbContext db, Guid id, CancellationToken ct)
    {
        var m = await access.LoadAsync(db, id, ct);
        var userId = user.Id;
        var seats = m.Evaluation.Panel
            .Where(p => p.UserId == userId && p.Role is PanelRole.Assessor or PanelRole.PriceEvaluator)
            .OrderBy(p => p.Role)
            .ToArray();
        return new InputContext(m, seats);
    }
}
