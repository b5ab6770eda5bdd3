using Decide.Core.Model;
using Decide.Core.Robustness;
using Decide.Core.Rounds;
using Google.OrTools.Graph;

namespace Decide.Assignment;

/// <summary>
/// Proposes who reads which application: every application gets k reviewers, nobody reads an application they
/// declared a conflict with, nobody reads more than the plan allows, loads are as even as the conflicts permit, a
/// reviewer who knows an application's field is preferred, pairs of reviewers are spread (no two read many
/// applications together) and the design is joined, so every application can be compared with every other.
/// </summary>
/// <remarks>
/// <para>The cover, the conflicts, the load cap, the balance and the fields are one min-cost flow, solved exactly by
/// Google OR-Tools: source → application (capacity k) → reviewer (capacity 1, no arc where a conflict is declared;
/// a cost where the reviewer does not know the application's field) → sink through one unit arc per place of the
/// reviewer's load, cheap up to the even share ⌈n·k ∕ r⌉ and dear above it, so the flow fills everyone's even share
/// before anyone goes over. A small seeded jitter on the application arcs breaks ties differently per seed.</para>
/// <para>Pairs are then spread by a seeded local search over swaps of two reviewers between two applications (which
/// keeps every load and the cover): a swap is kept when it lowers Σ over reviewer pairs of C(c, 2), c being how many
/// applications the pair reads together, and does not lose a field match. Last, a disconnected design is joined by
/// swaps that give a reviewer of one part an application of another. The flow is optimal for what it models; the
/// pair spreading is a local optimum, which is why the proposal reports its figures and can be edited.</para>
/// </remarks>
public static class ReviewerAssignment
{
    private const long FieldMismatchCost = 100;
    private const long OverShareCost = 1000;
    private const int Jitter = 20;
    private const int MaxJoinTries = 5000;

    /// <summary>Proposes an assignment.</summary>
    /// <exception cref="AssignmentInfeasibleException">No assignment can meet the plan; the reasons say what is missing.</exception>
    public static AssignmentProposal Propose(AssignmentRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        Feasible(request);
        var state = new State(request);
        state.Flow();
        state.SpreadPairs();
        state.Join();
        return state.Proposal();
    }

    /// <summary>Throws with every reason the plan cannot be met, counting what is missing.</summary>
    private static void Feasible(AssignmentRequest r)
    {
        var reasons = new List<string>();
        int n = r.Applications.Count, reviewers = r.Reviewers.Count, k = r.ReviewersPerApplication, load = r.MaxLoad;
        if (k < 1)
        {
            reasons.Add($"Each application needs at least one reviewer; the plan asks for {k}.");
        }

        if (load < 1)
        {
            reasons.Add($"The most applications one reviewer may read must be 1 or more; the plan says {load}.");
        }

        if (reasons.Count > 0)
        {
            throw new AssignmentInfeasibleException(reasons);
        }

        if (reviewers < k)
        {
            reasons.Add($"Each application needs {k} different reviewers but the panel has {reviewers}: {k - reviewers} more {(k - reviewers == 1 ? "reviewer is" : "reviewers are")} missing.");
        }

        long total = (long)n * k, capacity = (long)reviewers * load;
        if (capacity < total)
        {
            var missing = (int)Math.Ceiling((total - capacity) / (double)load);
            var even = reviewers == 0 ? 0 : (int)Math.Ceiling(total / (double)reviewers);
            reasons.Add($"The plan asks for {n} applications × {k} reviewers = {total} reviews, but {reviewers} reviewers reading at most {load} each give {capacity}: {missing} more {(missing == 1 ? "reviewer is" : "reviewers are")} missing{(reviewers > 0 ? $", or raise the most each may read to {even}" : "")}.");
        }

        foreach (var application in r.Applications)
        {
            var free = r.Reviewers.Count(x => !r.Conflicts.Contains((x.Id, application.Id)));
            if (free < k && reviewers >= k)
            {
                reasons.Add($"\"{application.Name}\" has {free} {(free == 1 ? "reviewer" : "reviewers")} without a declared conflict of interest and needs {k}: {k - free} more {(k - free == 1 ? "reviewer is" : "reviewers are")} missing.");
            }
        }

        if (reasons.Count > 0)
        {
            throw new AssignmentInfeasibleException(reasons);
        }
    }

    private sealed class State
    {
        private readonly AssignmentRequest _r;
        private readonly int _n;
        private readonly int _m;
        private readonly int _k;
        private readonly bool[] _conflict;
        private readonly bool[] _knows;
        private readonly bool[] _hasTopic;
        private readonly int[] _reviewersOf; // application-major, k slots
        private readonly bool[] _reads; // reviewer-major: does reviewer x read application a
        private readonly int[] _load;
        private readonly int[] _together; // reviewer pairs, how many applications they read together
        private SeededRandom _random;

        public State(AssignmentRequest r)
        {
            _r = r;
            _n = r.Applications.Count;
            _m = r.Reviewers.Count;
            _k = r.ReviewersPerApplication;
            _random = new SeededRandom(r.Seed, 0x5EED);
            _conflict = new bool[_m * _n];
            _knows = new bool[_m * _n];
            _hasTopic = new bool[_n];
            var appIndex = r.Applications.Select((a, i) => (a.Id, i)).ToDictionary(x => x.Id, x => x.i, StringComparer.Ordinal);
            var reviewerIndex = r.Reviewers.Select((x, i) => (x.Id, i)).ToDictionary(x => x.Id, x => x.i, StringComparer.Ordinal);
            foreach (var (reviewer, application) in r.Conflicts)
            {
                if (reviewerIndex.TryGetValue(reviewer, out var x) && appIndex.TryGetValue(application, out var a))
                {
                    _conflict[(x * _n) + a] = true;
                }
            }

            for (var a = 0; a < _n; a++)
            {
                var topic = r.Applications[a].Topic;
                _hasTopic[a] = !string.IsNullOrWhiteSpace(topic);
                for (var x = 0; x < _m && _hasTopic[a]; x++)
                {
                    _knows[(x * _n) + a] = r.Reviewers[x].Topics?.Contains(topic!, StringComparer.OrdinalIgnoreCase) == true;
                }
            }

            _reviewersOf = new int[_n * _k];
            _reads = new bool[_m * _n];
            _load = new int[_m];
            _together = new int[_m * _m];
        }

        private bool Mismatch(int x, int a) => _hasTopic[a] && !_knows[(x * _n) + a];

        public void Flow()
        {
            var flow = new MinCostFlow();
            int source = 0, sink = _n + _m + 1;
            long total = (long)_n * _k;
            var share = (int)Math.Ceiling(total / (double)_m);
            var arcs = new List<(int Arc, int Application, int Reviewer)>(_n * _m);
            for (var a = 0; a < _n; a++)
            {
                flow.AddArcWithCapacityAndUnitCost(source, 1 + a, _k, 0);
                for (var x = 0; x < _m; x++)
                {
                    if (_conflict[(x * _n) + a])
                    {
                        continue;
                    }

                    var cost = (Mismatch(x, a) ? FieldMismatchCost : 0) + (long)(_random.NextDouble() * Jitter);
                    arcs.Add((flow.AddArcWithCapacityAndUnitCost(1 + a, 1 + _n + x, 1, cost), a, x));
                }
            }

            for (var x = 0; x < _m; x++)
            {
                for (var place = 1; place <= _r.MaxLoad; place++)
                {
                    // Convex in the load: every reviewer's even share fills before anyone goes beyond it.
                    var cost = place <= share ? place : OverShareCost * (place - share);
                    flow.AddArcWithCapacityAndUnitCost(1 + _n + x, sink, 1, cost);
                }
            }

            flow.SetNodeSupply(source, total);
            flow.SetNodeSupply(sink, -total);
            var status = flow.Solve();
            if (status != MinCostFlowBase.Status.OPTIMAL || flow.MaximumFlow() < total)
            {
                throw new AssignmentInfeasibleException(
                    [$"The declared conflicts of interest leave no way to give every application {_k} reviewers with at most {_r.MaxLoad} applications each; add reviewers or raise the most each may read."]);
            }

            var filled = new int[_n];
            foreach (var (arc, a, x) in arcs)
            {
                if (flow.Flow(arc) > 0)
                {
                    _reviewersOf[(a * _k) + filled[a]++] = x;
                    _reads[(x * _n) + a] = true;
                    _load[x]++;
                }
            }

            for (var a = 0; a < _n; a++)
            {
                for (var p = 0; p < _k; p++)
                {
                    for (var q = p + 1; q < _k; q++)
                    {
                        Pair(_reviewersOf[(a * _k) + p], _reviewersOf[(a * _k) + q], +1);
                    }
                }
            }
        }

        private void Pair(int x, int y, int change)
        {
            _together[(x * _m) + y] += change;
            _together[(y * _m) + x] += change;
        }

        /// <summary>Puts reviewer <paramref name="y"/> in slot <paramref name="p"/> of application <paramref name="a"/> and returns the change of Σ C(c, 2).</summary>
        private long Replace(int a, int p, int y)
        {
            var x = _reviewersOf[(a * _k) + p];
            long delta = 0;
            for (var q = 0; q < _k; q++)
            {
                if (q == p)
                {
                    continue;
                }

                var other = _reviewersOf[(a * _k) + q];
                delta -= _together[(x * _m) + other] - 1; // C(c, 2) − C(c − 1, 2) = c − 1
                Pair(x, other, -1);
                delta += _together[(y * _m) + other]; // C(c + 1, 2) − C(c, 2) = c
                Pair(y, other, +1);
            }

            _reviewersOf[(a * _k) + p] = y;
            _reads[(x * _n) + a] = false;
            _reads[(y * _n) + a] = true;
            return delta;
        }

        private bool CanSwap(int a, int p, int b, int q)
        {
            if (a == b)
            {
                return false;
            }

            int x = _reviewersOf[(a * _k) + p], y = _reviewersOf[(b * _k) + q];
            return x != y && !_reads[(x * _n) + b] && !_reads[(y * _n) + a]
                && !_conflict[(x * _n) + b] && !_conflict[(y * _n) + a];
        }

        private int FieldChange(int a, int p, int b, int q)
        {
            int x = _reviewersOf[(a * _k) + p], y = _reviewersOf[(b * _k) + q];
            int before = (Mismatch(x, a) ? 1 : 0) + (Mismatch(y, b) ? 1 : 0);
            int after = (Mismatch(y, a) ? 1 : 0) + (Mismatch(x, b) ? 1 : 0);
            return after - before;
        }

        private long Swap(int a, int p, int b, int q)
        {
            int x = _reviewersOf[(a * _k) + p], y = _reviewersOf[(b * _k) + q];
            return Replace(a, p, y) + Replace(b, q, x);
        }

        public void SpreadPairs()
        {
            if (_k < 2 || _n < 2)
            {
                return; // with one reviewer per application nobody reads with anybody
            }

            var attempts = Math.Min(40L * _n * _k, 400_000);
            for (var t = 0; t < attempts; t++)
            {
                int a = Next(_n), b = Next(_n), p = Next(_k), q = Next(_k);
                if (!CanSwap(a, p, b, q) || FieldChange(a, p, b, q) > 0)
                {
                    continue;
                }

                if (Swap(a, p, b, q) > 0)
                {
                    Swap(a, p, b, q); // the same swap again puts both reviewers back
                }
            }
        }

        public void Join()
        {
            for (var round = 0; round < _n; round++)
            {
                var parts = Parts();
                if (parts.Count <= 1)
                {
                    return;
                }

                if (!JoinOnce(parts))
                {
                    return; // no swap joins two parts: the proposal reports how many remain
                }
            }
        }

        private bool JoinOnce(IReadOnlyList<IReadOnlyList<string>> parts)
        {
            var tries = 0;
            var partOf = new int[_n];
            var index = _r.Applications.Select((x, i) => (x.Id, i)).ToDictionary(x => x.Id, x => x.i, StringComparer.Ordinal);
            for (var part = 0; part < parts.Count; part++)
            {
                foreach (var id in parts[part])
                {
                    partOf[index[id]] = part;
                }
            }

            for (var a = 0; a < _n; a++)
            {
                for (var p = 0; p < _k; p++)
                {
                    // A reviewer who reads something else in this part links it to wherever this application goes.
                    if (_load[_reviewersOf[(a * _k) + p]] < 2)
                    {
                        continue;
                    }

                    for (var b = 0; b < _n; b++)
                    {
                        if (partOf[b] == partOf[a])
                        {
                            continue;
                        }

                        for (var q = 0; q < _k; q++)
                        {
                            if (!CanSwap(a, p, b, q) || ++tries > MaxJoinTries)
                            {
                                continue;
                            }

                            // The swap links b to this part but may cut a off: kept only when there are fewer parts.
                            Swap(a, p, b, q);
                            if (Parts().Count < parts.Count)
                            {
                                return true;
                            }

                            Swap(a, p, b, q);
                        }
                    }
                }
            }

            // No swap joins two parts (every reviewer reads one application, say): hand one review of another part
            // to a reviewer of this one who has room, so that one reviewer reads in both. Loads move by one.
            for (var x = 0; x < _m; x++)
            {
                if (_load[x] == 0 || _load[x] >= _r.MaxLoad)
                {
                    continue;
                }

                var home = -1;
                for (var a = 0; a < _n && home < 0; a++)
                {
                    home = _reads[(x * _n) + a] ? partOf[a] : -1;
                }

                for (var b = 0; b < _n; b++)
                {
                    if (partOf[b] == home || _reads[(x * _n) + b] || _conflict[(x * _n) + b])
                    {
                        continue;
                    }

                    // Any of b's reviewers may give the review up; the one who reads least elsewhere first.
                    foreach (var q in Enumerable.Range(0, _k).OrderBy(slot => _load[_reviewersOf[(b * _k) + slot]]))
                    {
                        var y = _reviewersOf[(b * _k) + q];
                        if (++tries > MaxJoinTries)
                        {
                            return false;
                        }

                        Replace(b, q, x);
                        if (Parts().Count < parts.Count)
                        {
                            _load[y]--;
                            _load[x]++;
                            return true;
                        }

                        Replace(b, q, y);
                    }
                }
            }

            return false;
        }

        private int Next(int bound) => (int)(_random.NextDouble() * bound);

        private IReadOnlyList<ReviewAssignment> Assigned() => _r.Reviewers.Select((reviewer, x) => new ReviewAssignment(
            reviewer.Id,
            Enumerable.Range(0, _n).Where(a => _reads[(x * _n) + a]).Select(a => _r.Applications[a].Id).ToArray())).ToArray();

        private IReadOnlyList<IReadOnlyList<string>> Parts() =>
            DesignConnectivity.Parts(_r.Applications.Select(a => a.Id).ToArray(), Assigned());

        public AssignmentProposal Proposal() =>
            AssignmentFigures.Of(new ReviewDesign(_k, _r.MaxLoad, Assigned()), _r.Applications, _r.Reviewers);
    }
}
