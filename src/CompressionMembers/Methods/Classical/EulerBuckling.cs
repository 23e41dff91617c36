using System;
using System.Runtime.CompilerServices;
using CompressionMembers.Internal;
using CompressionMembers.Methods.Common;
using CompressionMembers.Resolution;
using CompressionMembers.Results;

namespace CompressionMembers.Methods.Classical;

/// <summary>
/// Euler elastic buckling of an ideal, straight, concentrically loaded column: Ncr = π² E I / Lcr² about each
/// principal axis, with the squash load A·f as a cut-off so that a stocky member is never credited with more than
/// its cross-section can carry. The capacity is nominal (no partial factor).
/// </summary>
/// <remarks>
/// Source: L. Euler (1744); Timoshenko &amp; Gere, Theory of Elastic Stability, 2nd ed., §2.1–2.2. Valid for elastic
/// buckling, i.e. where the critical stress π²E/λ² is below the proportional limit; use <see cref="JohnsonParabola"/>
/// or <see cref="PerryRobertson"/> for intermediate columns. Applies to concentric compression only.
/// Thread safety: immutable; safe from many threads.
/// </remarks>
[Immutable]
public sealed class EulerBuckling : IResistanceMethod
{
    private const string Ref = "Euler; Timoshenko & Gere §2.2";

    /// <inheritdoc/>
    public MethodIdentity Identity { get; } = new("Euler elastic buckling with squash-load cut-off", "Euler critical load (Timoshenko & Gere)", "2nd ed.", "§2.1–2.2");
    /// <summary>The method in words: <see cref="MethodIdentity.ToString"/> of its <see cref="Identity"/>.</summary>
    /// <returns>The name, standard, edition and clause in one line.</returns>
    public override string ToString() => Identity.ToString();

    /// <inheritdoc/>
    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions) => ClassicalRules.Concentric(actions, "Euler");

    /// <inheritdoc/>
    public CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace)
    {
        Unsafe.SkipInit(out CheckNumbers numbers);
        string check = Numbers(member, actions, trace, ref numbers);
        return numbers.ToResult(member, actions, this, check, trace);
    }

    /// <summary>The check's numbers (validated), traced or not; returns the governing check's words. The method's own
    /// <see cref="Evaluate"/> and Check's traced checks take it.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal string Numbers(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace, ref CheckNumbers numbers) =>
        Kernel<MethodEntry>(member, actions, trace, ref numbers)!;

    /// <summary>Check's entry for an untraced check: the numbers, compiled without the steps; null for numbers a result
    /// refuses (Check then takes <see cref="Evaluate"/>, which throws for them).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal string? UntracedNumbers(in ResolvedMember member, in ResolvedActions actions, ref CheckNumbers numbers) =>
        Kernel<CheckEntry>(member, actions, null, ref numbers);

    // One source compiled twice (KernelEntry): for Check's untraced entry the step writers and the throw fold away. The
    // member's values are read as scalars, not through AxisData: the JIT kept those two eight-field structs in memory
    // (sixteen stack stores a check, docs/performance.md, ninth round); the steps build them in their own method.
    [MethodImpl(MethodImplOptions.NoInlining)]
    private string? Kernel<TEntry>(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace, ref CheckNumbers numbers)
        where TEntry : struct
    {
        double ncrY = member.CriticalForceYN, ncrZ = member.CriticalForceZN;
        double squash = member.AreaM2 * member.StrengthPa;
        bool traced = typeof(TEntry) == typeof(MethodEntry) && trace is not null;
        if (traced) TraceAxes(trace!, member, squash);
        bool govY = ncrY <= ncrZ;
        double ncr = govY ? ncrY : ncrZ;
        double capacity = Math.Min(ncr, squash);
        bool yields = squash < ncr;
        double u = actions.AxialForceN / capacity;
        if (traced) TraceVerdict(trace!, actions.AxialForceN, capacity, u, yields);
        double lambda1 = AxisData.Lambda1(member.ElasticModulusPa, member.StrengthPa);
        numbers.DesignResistanceN = capacity;
        numbers.Utilisation = u;
        numbers.GoverningAxis = yields ? BucklingAxis.None : govY ? BucklingAxis.Y : BucklingAxis.Z;
        numbers.GoverningMode = yields ? FailureMode.Yielding : FailureMode.FlexuralBuckling;
        numbers.AboutY = new AxisOutcome(member.EffectiveLengthYM, member.SlendernessY, member.SlendernessY / lambda1, ncrY, double.NaN, Math.Min(ncrY, squash));
        numbers.AboutZ = new AxisOutcome(member.EffectiveLengthZM, member.SlendernessZ, member.SlendernessZ / lambda1, ncrZ, double.NaN, Math.Min(ncrZ, squash));
        numbers.Torsional = default;
        if (!numbers.Accepted<TEntry>(this, member)) return null;
        return yields ? "squash load A·f (below the Euler load)" : "Euler critical load";
    }

    // The steps, in methods of their own so that the untraced kernel carries none of their string building.
    [MethodImpl(MethodImplOptions.NoInlining)]
    private static void TraceAxes(CalculationTrace trace, in ResolvedMember member, double squash)
    {
        var y = new AxisData(member, BucklingAxis.Y);
        var z = new AxisData(member, BucklingAxis.Z);
        trace.Add("E", "elastic modulus", TraceCommon.Input, member.ElasticModulusPa, StepUnit.Stress, member.Material.Source);
        trace.Add("f", "compressive strength (yield)", TraceCommon.Input, member.StrengthPa, StepUnit.Stress, member.Material.Source);
        TraceCommon.SectionAndLengths(trace, member);
        TraceCommon.Slenderness(trace, y, Ref);
        TraceCommon.Slenderness(trace, z, Ref);
        trace.Add("Npl", "squash load", "A f", squash, StepUnit.Force, "common practice");
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static void TraceVerdict(CalculationTrace trace, double demandN, double capacityN, double u, bool yields)
    {
        trace.Add("N", "nominal capacity", "min(Ncr,y, Ncr,z, Npl)", capacityN, StepUnit.Force, Ref);
        if (yields) trace.Note("The squash load is below the Euler load: the member yields before it buckles elastically; Euler alone would overestimate it.", "common practice");
        ClassicalRules.Verdict(trace, demandN, capacityN, u);
    }
}
