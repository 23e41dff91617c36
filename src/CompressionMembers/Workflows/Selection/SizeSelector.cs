using System;
using System.Collections.Concurrent;
using System.Collections.Generic;
using CompressionMembers.Actions;
using CompressionMembers.Internal;
using CompressionMembers.Materials;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Aluminium;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Methods.Timber;
using CompressionMembers.Resolution;
using CompressionMembers.Results;
using CompressionMembers.Workflows.Batch;
using CompressionMembers.Workflows.Catalogues;

namespace CompressionMembers.Workflows.Selection;

/// <summary>Chooses the lightest section of a catalogue that passes a method for every action case of a member, and
/// ranks the lightest passing candidates with their utilisations. Works with any <see cref="IResistanceMethod"/>.</summary>
/// <remarks>
/// <para><see cref="Select"/> prunes. Within a shape family the sections are split into chains in which each section
/// dominates the one before it: area, both second moments, both radii of gyration, the elastic section moduli to all four extreme fibres
/// and, where both are known, the torsion and warping constants are all at least as large. Along such a chain every
/// method of this library (and any method whose resistance does not fall when every section property grows) passes
/// from some point on, so a binary search finds the first passing section with O(log n) evaluations, and chains whose
/// lightest section is heavier than the best found so far are skipped. Capacity is not assumed to be monotone across
/// families.</para>
/// <para>Every candidate returned is verified by the real check for every case. If a section the search took to pass
/// fails the real check (a method that is not monotone in size), the search for that member is repeated exhaustively
/// and <see cref="SizeSelection.FellBackToExhaustive"/> says so. <see cref="SelectExhaustively"/> evaluates every
/// section (the reference the pruned search is tested against).</para>
/// <para>Ties of the objective go to the entry listed first in the catalogue. Sections the method does not apply to are
/// never chosen. A section for which the method throws (a defect of the method) is not chosen either: it is counted in
/// <see cref="SizeSelection.MethodFailures"/> with the first message in <see cref="SizeSelection.FirstMethodFailure"/>.
/// Thread safety: immutable; safe from many threads.</para>
/// </remarks>
[Immutable]
public sealed class SizeSelector
{
    private readonly ConcurrentDictionary<Material, Plan> _plans = new(ReferenceEqualityComparer.Instance);

    /// <summary>Creates a selector.</summary>
    /// <param name="catalogue">The sections to choose from.</param>
    /// <param name="method">The resistance method every case must pass.</param>
    /// <param name="objective">What "lightest" means; <see cref="SelectionObjective.Area"/> if null.</param>
    /// <param name="candidateCount">How many of the lightest passing sections to rank and return (at least 1).</param>
    /// <exception cref="ArgumentNullException">The catalogue or method is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The candidate count is less than 1.</exception>
    public SizeSelector(SectionCatalogue catalogue, IResistanceMethod method, SelectionObjective? objective = null, int candidateCount = 5)
    {
        ArgumentNullException.ThrowIfNull(catalogue);
        ArgumentNullException.ThrowIfNull(method);
        if (candidateCount < 1)
            throw new ArgumentOutOfRangeException(nameof(candidateCount), candidateCount, $"The candidate count must be at least 1; got {candidateCount}.");
        Catalogue = catalogue;
        Method = method;
        _withoutMember = ResolvesWithoutMember(method);
        Objective = objective ?? SelectionObjective.Area;
        CandidateCount = candidateCount;
    }

    /// <summary>The catalogue.</summary>
    public SectionCatalogue Catalogue { get; }
    /// <summary>The method.</summary>
    public IResistanceMethod Method { get; }
    /// <summary>The objective.</summary>
    public SelectionObjective Objective { get; }
    /// <summary>How many passing candidates are ranked.</summary>
    public int CandidateCount { get; }

    /// <summary>Sizes one member with the pruned search.</summary>
    /// <param name="request">The member and its cases.</param>
    /// <returns>The selection.</returns>
    /// <exception cref="ArgumentNullException">The request is null.</exception>
    public SizeSelection Select(SizingRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        var run = new Run(this, request);
        SizingCandidate[]? found;
        try { found = run.Pruned(); }
        finally { run.Release(); }
        if (found is null)
        {
            var again = new Run(this, request) { Evaluations = run.Evaluations };
            try
            {
                var all = again.Exhaustive();
                return new SizeSelection(request, all, again.Evaluations, again.NotApplicableCount, true, Objective.Name, again.MethodFailures, again.FirstFailure);
            }
            finally { again.Release(); }
        }
        return new SizeSelection(request, found, run.Evaluations, run.NotApplicableCount, false, Objective.Name, run.MethodFailures, run.FirstFailure);
    }

    /// <summary>Sizes one member by evaluating every section for every case (the brute-force reference).</summary>
    /// <param name="request">The member and its cases.</param>
    /// <returns>The selection.</returns>
    /// <exception cref="ArgumentNullException">The request is null.</exception>
    public SizeSelection SelectExhaustively(SizingRequest request)
    {
        ArgumentNullException.ThrowIfNull(request);
        var run = new Run(this, request);
        try
        {
            var all = run.Exhaustive();
            return new SizeSelection(request, all, run.Evaluations, run.NotApplicableCount, false, Objective.Name, run.MethodFailures, run.FirstFailure);
        }
        finally { run.Release(); }
    }

    /// <summary>Sizes many members across cores (pruned search), results in input order.</summary>
    /// <param name="requests">The members.</param>
    /// <param name="options">Cores, progress, cancellation.</param>
    /// <returns>One selection per request, in order.</returns>
    /// <exception cref="ArgumentNullException">The list is null.</exception>
    public IReadOnlyList<SizeSelection> SelectAll(IReadOnlyList<SizingRequest> requests, BatchOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(requests);
        return BatchEvaluator.Run(requests, (r, _) => Select(r), options);
    }

    /// <summary>Sizes many members exhaustively across cores, results in input order.</summary>
    /// <param name="requests">The members.</param>
    /// <param name="options">Cores, progress, cancellation.</param>
    /// <returns>One selection per request, in order.</returns>
    /// <exception cref="ArgumentNullException">The list is null.</exception>
    public IReadOnlyList<SizeSelection> SelectAllExhaustively(IReadOnlyList<SizingRequest> requests, BatchOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(requests);
        return BatchEvaluator.Run(requests, (r, _) => SelectExhaustively(r), options);
    }

    /// <summary>Whether the selector resolves candidate sections for <paramref name="method"/> without building a member
    /// each (<see cref="ResolvedMember.WithSection"/>: the same bits as <c>From(member.WithSection(section))</c>, no
    /// allocation): the built-in methods whose untraced checks read the member's material and section from the resolved
    /// member and nothing else from the member object. Any other method — a user's, a wrapper around a built-in one, or a
    /// numerical method, which reads the restraint — gets a real member for every candidate.</summary>
    internal static bool ResolvesWithoutMember(IResistanceMethod method) =>
        method is EulerBuckling or JohnsonParabola or SecantFormula or PerryRobertson or Ec5ColumnStability or Ec5FireReducedSection
            or NdsColumnStability or Eurocode9Compression or BucklingConstantMethod or TangentModulusColumn;

    private readonly bool _withoutMember;   // ResolvesWithoutMember(Method), decided once

    private Plan PlanFor(Material material) => _plans.GetOrAdd(material, m => new Plan(Catalogue, Objective, m));

    /// <summary>The entries ordered by objective and split into dominance chains, for one material.</summary>
    private sealed class Plan
    {
        internal readonly int[] Order;            // catalogue indices by (objective, index)
        internal readonly double[] Key;           // objective by catalogue index
        internal readonly List<int[]> Chains = []; // each ascending in key and in every property

        internal Plan(SectionCatalogue catalogue, SelectionObjective objective, Material material)
        {
            var entries = catalogue.Entries;
            int n = entries.Count;
            Key = new double[n];
            Order = new int[n];
            for (int i = 0; i < n; i++) { Key[i] = objective.Measure(entries[i], material); Order[i] = i; }
            var key = Key;
            Array.Sort(Order, (a, b) => key[a] != key[b] ? key[a].CompareTo(key[b]) : a.CompareTo(b));
            var byFamily = new Dictionary<string, List<List<int>>>(StringComparer.OrdinalIgnoreCase);
            foreach (int i in Order)
            {
                var e = entries[i];
                string fam = e.Section.Kind + "|" + e.Family;
                if (!byFamily.TryGetValue(fam, out var chains)) byFamily[fam] = chains = [];
                List<int>? home = null;
                foreach (var c in chains)
                    if (Dominates(entries[i], entries[c[^1]])) { home = c; break; }
                if (home is null) chains.Add(home = []);
                home.Add(i);
            }
            foreach (var chains in byFamily.Values) foreach (var c in chains) Chains.Add(c.ToArray());
            // Lightest chains first, so that the bound tightens early.
            Chains.Sort((a, b) => key[a[0]] != key[b[0]] ? key[a[0]].CompareTo(key[b[0]]) : a[0].CompareTo(b[0]));
        }

        private static bool Dominates(CatalogueEntry big, CatalogueEntry small)
        {
            var p = big.Section.Props;
            var q = small.Section.Props;
            if (big.Section.Kind != small.Section.Kind) return false;
            if (p.AreaM2 < q.AreaM2 || p.IyM4 < q.IyM4 || p.IzM4 < q.IzM4) return false;
            if (p.IyM4 / p.AreaM2 < q.IyM4 / q.AreaM2 || p.IzM4 / p.AreaM2 < q.IzM4 / q.AreaM2) return false;
            // Elastic section modulus to each of the four extreme fibres (an eccentricity may point to either side).
            if (p.IyM4 / p.FibrePositiveZM < q.IyM4 / q.FibrePositiveZM || p.IyM4 / p.FibreNegativeZM < q.IyM4 / q.FibreNegativeZM) return false;
            if (p.IzM4 / p.FibrePositiveYM < q.IzM4 / q.FibrePositiveYM || p.IzM4 / p.FibreNegativeYM < q.IzM4 / q.FibreNegativeYM) return false;
            if (double.IsFinite(p.TorsionConstantM4) && double.IsFinite(q.TorsionConstantM4) && p.TorsionConstantM4 < q.TorsionConstantM4) return false;
            if (double.IsFinite(p.WarpingConstantM6) && double.IsFinite(q.WarpingConstantM6) && p.WarpingConstantM6 < q.WarpingConstantM6) return false;
            return true;
        }
    }

    /// <summary>One member's search: evaluation counting and a cache of what was learnt about each entry.</summary>
    private sealed class Run
    {
        private const sbyte Unknown = 0, Pass = 1, Fail = 2, NotApplicable = 3;
        private readonly SizeSelector _s;
        private readonly SizingRequest _request;
        private readonly Plan _plan;
        private readonly DesignActions[] _cases;   // the request's own array; each case's resolved values are read in place
        private readonly sbyte[] _state;
        private readonly SizingCandidate?[] _verified;
        internal int Evaluations;
        internal int NotApplicableCount;

        internal Run(SizeSelector s, SizingRequest request)
        {
            _s = s;
            _request = request;
            _plan = s.PlanFor(request.Member.Material);
            _cases = request.CaseArray;
            // The per-entry state lives in arrays kept per thread and cleared for each search, so that sizing thousands of
            // members does not allocate (and collect) two catalogue-sized arrays per member; a search nested in another on
            // the same thread (a method that sizes something itself) gets arrays of its own.
            int n = s.Catalogue.Count;
            if (t_inUse || t_state is null || t_state.Length < n)
            {
                _state = new sbyte[n];
                _verified = new SizingCandidate?[n];
                if (!t_inUse) { t_state = _state; t_verified = _verified; }
            }
            else
            {
                _state = t_state;
                _verified = t_verified!;
                Array.Clear(_state, 0, n);
                Array.Clear(_verified, 0, n);
            }
            _ownsScratch = !t_inUse && ReferenceEquals(_state, t_state);
            if (_ownsScratch) t_inUse = true;
        }

        private ResolvedMember Candidate(Sections.Section section) =>
            _s._withoutMember ? ResolvedMember.WithSection(_request.Member.Resolved, section) : ResolvedMember.From(_request.Member.WithSection(section));

        [ThreadStatic] private static sbyte[]? t_state;
        [ThreadStatic] private static SizingCandidate?[]? t_verified;
        [ThreadStatic] private static bool t_inUse;
        private readonly bool _ownsScratch;

        /// <summary>Hands the per-thread arrays back for the next search on this thread.</summary>
        internal void Release()
        {
            if (_ownsScratch) t_inUse = false;
        }

        private bool Less(int a, int b) => _plan.Key[a] < _plan.Key[b] || (_plan.Key[a] == _plan.Key[b] && a < b);

        /// <summary>Whether entry i passes every case; stops at the first failing case.</summary>
        private sbyte Probe(int i)
        {
            if (_state[i] != Unknown) return _state[i];
            var rm = Candidate(_s.Catalogue.Entries[i].Section);
            sbyte st = Pass;
            for (int c = 0; c < _cases.Length; c++)
            {
                if (!_s.Method.AppliesTo(rm, _cases[c].Resolved).IsApplicable) { st = NotApplicable; break; }
                Evaluations++;
                if (!TryEvaluate(rm, c, i, out double u, out _)) { st = NotApplicable; break; }
                if (!(u <= 1.0)) { st = Fail; break; }   // CheckResult.Passed
            }
            if (st == NotApplicable) NotApplicableCount++;
            return _state[i] = st;
        }

        /// <summary>The real check of entry i on every case: the candidate, or null if it fails or does not apply.</summary>
        private SizingCandidate? Verify(int i)
        {
            if (_verified[i] is { } v) return v;
            var entry = _s.Catalogue.Entries[i];
            var rm = Candidate(entry.Section);
            double worst = double.NegativeInfinity, resistance = 0;
            string governing = "";
            for (int c = 0; c < _cases.Length; c++)
            {
                if (!_s.Method.AppliesTo(rm, _cases[c].Resolved).IsApplicable) { _state[i] = NotApplicable; return null; }
                Evaluations++;
                if (!TryEvaluate(rm, c, i, out double u, out double nRd)) { _state[i] = NotApplicable; return null; }
                if (u > worst) { worst = u; governing = _cases[c].Name; resistance = nRd; }
            }
            if (!(worst <= 1.0)) { _state[i] = Fail; return null; }
            _state[i] = Pass;
            return _verified[i] = new SizingCandidate(entry, i, _plan.Key[i], worst, governing, resistance);
        }

        internal int MethodFailures;
        internal string? FirstFailure;

        /// <summary>The real check: its utilisation and design resistance. A method that throws for a section (a defect of
        /// the method, not of the input) makes that section ineligible and is counted and reported, rather than aborting
        /// the whole selection.</summary>
        // Only the two numbers leave: the result stays a local, read in place. Handing the 240-byte result (it holds
        // references) out through an out parameter copied it with the runtime's write-barrier helper on every evaluation,
        // which a profile of the 10,000 x 1,000 selection put under most of the evaluation's samples (docs/performance.md).
        private bool TryEvaluate(in ResolvedMember rm, int c, int i, out double utilisation, out double resistanceN)
        {
            try
            {
                // The caller has just asked AppliesTo for this case, so the method is evaluated directly (Check.Evaluate
                // would ask again); the result validates itself when it is built.
                var result = _s.Method.Evaluate(rm, _cases[c].Resolved, null);
                utilisation = result.Utilisation;
                resistanceN = result.DesignResistanceN;
                return true;
            }
            catch (Exception ex) when (ex is not OperationCanceledException)
            {
                if (MethodFailures++ == 0)
                    FirstFailure = $"{_s.Method.Identity.Name} failed for \"{_s.Catalogue.Entries[i].Designation}\" ({_request.Cases[c].Name}): {ex.GetType().Name}: {ex.Message}";
                utilisation = resistanceN = 0;
                return false;
            }
        }

        internal SizingCandidate[] Exhaustive()
        {
            var list = new List<SizingCandidate>();
            foreach (int i in _plan.Order)
            {
                if (Verify(i) is { } c) list.Add(c);
                else if (_state[i] == NotApplicable) NotApplicableCount++;
            }
            int k = Math.Min(_s.CandidateCount, list.Count);
            return list.GetRange(0, k).ToArray();
        }

        /// <summary>The pruned search; null when verification shows the method is not monotone here.</summary>
        internal SizingCandidate[]? Pruned()
        {
            int want = _s.CandidateCount;
            var best = new List<int>(want + 1); // catalogue indices of passing entries, ascending by (key, index)
            foreach (var chain in _plan.Chains)
            {
                // Only the part of the chain lighter than the current k-th best can improve the ranking.
                int limit = chain.Length;
                if (best.Count == want)
                {
                    int bound = best[^1];
                    int lo0 = 0, hi0 = chain.Length;
                    while (lo0 < hi0) { int mid = (lo0 + hi0) >>> 1; if (Less(chain[mid], bound)) lo0 = mid + 1; else hi0 = mid; }
                    limit = lo0;
                }
                if (limit == 0) continue;
                int first = FirstPassing(chain, limit);
                if (first < 0) continue;
                for (int j = first; j < limit; j++)
                {
                    if (_state[chain[j]] == Fail || _state[chain[j]] == NotApplicable) continue;
                    Insert(best, chain[j], want);
                }
            }
            var result = best.Count == 0 ? [] : new SizingCandidate[best.Count];
            for (int k = 0; k < result.Length; k++)
            {
                var c = Verify(best[k]);
                if (c is null) return null; // inferred to pass but fails the real check: not monotone
                result[k] = c;
            }
            return result;
        }

        /// <summary>The first position in chain[0..limit) whose entry passes, or -1. Binary search on a monotone chain;
        /// a linear scan of the range if the method does not apply to a probed section.</summary>
        private int FirstPassing(int[] chain, int limit)
        {
            int lo = 0, hi = limit, found = -1;
            while (lo < hi)
            {
                int mid = (lo + hi) >>> 1;
                var st = Probe(chain[mid]);
                if (st == NotApplicable) return Linear(chain, lo, limit);
                if (st == Pass) { found = mid; hi = mid; }
                else lo = mid + 1;
            }
            return found;
        }

        private int Linear(int[] chain, int from, int limit)
        {
            for (int j = from; j < limit; j++) if (Probe(chain[j]) == Pass) return j;
            return -1;
        }

        private void Insert(List<int> best, int i, int want)
        {
            int pos = best.Count;
            while (pos > 0 && Less(i, best[pos - 1])) pos--;
            if (pos >= want) return;
            best.Insert(pos, i);
            if (best.Count > want) best.RemoveAt(best.Count - 1);
        }
    }
}
