using System;
using System.Runtime.CompilerServices;
using CompressionMembers.Internal;
using CompressionMembers.Methods.Common;
using CompressionMembers.Resolution;
using CompressionMembers.Results;

namespace CompressionMembers.Methods.Classical;

/// <summary>
/// The Johnson parabola for intermediate columns with the Euler hyperbola beyond the transition slenderness:
/// σcr = f − (f / 2π)² λ² / E for λ &lt; Cc = √(2π² E / f), σcr = π² E / λ² for λ ≥ Cc. The two curves meet at
/// λ = Cc with equal value (f/2) and equal slope. The capacity is nominal (no partial factor).
/// </summary>
/// <remarks>
/// Source: J. B. Johnson (1893); Shigley's Mechanical Engineering Design, section on columns (the parabolic
/// formula), and the same formula in the classical aluminium and steel column literature. Concentric compression only.
/// Thread safety: immutable.
/// </remarks>
[Immutable]
public sealed class JohnsonParabola : IResistanceMethod
{
    private const string Ref = "Johnson parabola (Shigley, columns)";

    /// <inheritdoc/>
    public MethodIdentity Identity { get; } = new("Johnson parabola with Euler hyperbola", "Johnson column formula (Shigley's Mechanical Engineering Design)", "", "columns, parabolic formula");
    /// <summary>The method in words: <see cref="MethodIdentity.ToString"/> of its <see cref="Identity"/>.</summary>
    /// <returns>The name, standard, edition and clause in one line.</returns>
    public override string ToString() => Identity.ToString();

    /// <inheritdoc/>
    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions) => ClassicalRules.Concentric(actions, "Johnson");

    /// <summary>Transition slenderness Cc = √(2π² E / f).</summary>
    internal static double TransitionSlenderness(double ePa, double fPa) => Math.Sqrt(2 * Math.PI * Math.PI * ePa / fPa);

    /// <summary>Critical stress by Johnson below Cc and Euler above.</summary>
    internal static double CriticalStress(double lambda, double ePa, double fPa, out bool johnson)
    {
        double cc = TransitionSlenderness(ePa, fPa);
        johnson = lambda < cc;
        if (johnson)
        {
            double k = fPa * lambda / (2 * Math.PI);
            return fPa - k * k / ePa;
        }
        return Math.PI * Math.PI * ePa / (lambda * lambda);
    }

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
    // member's values are read as scalars, not through AxisData, which the JIT kept in memory (as in EulerBuckling).
    [MethodImpl(MethodImplOptions.NoInlining)]
    private string? Kernel<TEntry>(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace, ref CheckNumbers numbers)
        where TEntry : struct
    {
        double e = member.ElasticModulusPa, f = member.StrengthPa, a = member.AreaM2;
        double lamY = member.SlendernessY, lamZ = member.SlendernessZ;
        double sy = CriticalStress(lamY, e, f, out bool jy);
        double sz = CriticalStress(lamZ, e, f, out bool jz);
        bool traced = typeof(TEntry) == typeof(MethodEntry) && trace is not null;
        if (traced) TraceAxes(trace!, member, jy, jz, sy, sz);
        bool govY = sy <= sz;
        double capacity = Math.Min(sy, sz) * a;
        bool johnson = govY ? jy : jz;
        double u = actions.AxialForceN / capacity;
        if (traced) TraceVerdict(trace!, actions.AxialForceN, capacity, u);
        numbers.DesignResistanceN = capacity;
        numbers.Utilisation = u;
        numbers.GoverningAxis = govY ? BucklingAxis.Y : BucklingAxis.Z;
        numbers.GoverningMode = FailureMode.FlexuralBuckling;
        double lambda1 = AxisData.Lambda1(e, f);
        numbers.AboutY = new AxisOutcome(member.EffectiveLengthYM, lamY, lamY / lambda1, member.CriticalForceYN, sy / f, sy * a);
        numbers.AboutZ = new AxisOutcome(member.EffectiveLengthZM, lamZ, lamZ / lambda1, member.CriticalForceZN, sz / f, sz * a);
        numbers.Torsional = default;
        if (!numbers.Accepted<TEntry>(this, member)) return null;
        return johnson ? "Johnson parabola (λ < Cc)" : "Euler hyperbola (λ ≥ Cc)";
    }

    // The steps, in methods of their own so that the untraced kernel carries none of their string building.
    [MethodImpl(MethodImplOptions.NoInlining)]
    private static void TraceAxes(CalculationTrace trace, in ResolvedMember member, bool jy, bool jz, double sy, double sz)
    {
        var y = new AxisData(member, BucklingAxis.Y);
        var z = new AxisData(member, BucklingAxis.Z);
        double e = member.ElasticModulusPa, f = member.StrengthPa;
        trace.Add("E", "elastic modulus", TraceCommon.Input, e, StepUnit.Stress, member.Material.Source);
        trace.Add("f", "compressive strength (yield)", TraceCommon.Input, f, StepUnit.Stress, member.Material.Source);
        TraceCommon.SectionAndLengths(trace, member);
        trace.Add("Cc", "transition slenderness", "√(2 π² E / f)", TransitionSlenderness(e, f), StepUnit.None, Ref);
        AxisSteps(trace, y, jy, sy, member.AreaM2);
        AxisSteps(trace, z, jz, sz, member.AreaM2);
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static void TraceVerdict(CalculationTrace trace, double demandN, double capacityN, double u)
    {
        trace.Add("N", "nominal capacity", "min(Ny, Nz)", capacityN, StepUnit.Force, Ref);
        ClassicalRules.Verdict(trace, demandN, capacityN, u);
    }

    private static void AxisSteps(CalculationTrace t, in AxisData ax, bool johnson, double sigma, double a)
    {
        TraceCommon.Slenderness(t, ax, Ref);
        string s = ax.Sub;
        if (johnson)
        {
            t.Note($"λ{s} < Cc: the Johnson parabola governs about {s}.", Ref);
            t.Add("σcr," + s, "critical stress about " + s, $"f − (f λ{s} / 2π)² / E", sigma, StepUnit.Stress, Ref);
        }
        else
        {
            t.Note($"λ{s} ≥ Cc: the Euler hyperbola governs about {s}.", Ref);
            t.Add("σcr," + s, "critical stress about " + s, $"π² E / λ{s}²", sigma, StepUnit.Stress, Ref);
        }
        t.Add("N" + s, "nominal capacity about " + s, $"σcr,{s} A", sigma * a, StepUnit.Force, Ref);
    }
}
