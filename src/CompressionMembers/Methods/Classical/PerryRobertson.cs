using System;
using System.Runtime.CompilerServices;
using CompressionMembers.Internal;
using CompressionMembers.Methods.Common;
using CompressionMembers.Resolution;
using CompressionMembers.Results;

namespace CompressionMembers.Methods.Classical;

/// <summary>
/// The Perry–Robertson formula: the mean stress at which the extreme fibre of a column with an initial bow reaches
/// the compressive strength, σc = ½[f + (1 + η) σE] − √(¼[f + (1 + η) σE]² − f σE), σE = π² E / λ².
/// With η = 0 it gives min(f, σE); the European column curves are this formula in normalised form with
/// η = α (λ̄ − 0.2). The capacity is nominal (no partial factor).
/// </summary>
/// <remarks>
/// Source: J. Perry (1886), A. Robertson (1925); the derivation in Timoshenko &amp; Gere §1.12 (initially curved bars)
/// and Trahair &amp; Bradford, The Behaviour and Design of Steel Structures, chapter on compression members.
/// Concentric compression (with imperfection) only. Thread safety: immutable.
/// </remarks>
[Immutable]
public sealed class PerryRobertson : IResistanceMethod
{
    private const string Ref = "Perry–Robertson (Timoshenko & Gere §1.12)";

    /// <summary>Creates the method with an imperfection model.</summary>
    /// <param name="imperfection">How η is set.</param>
    /// <exception cref="ArgumentNullException"><paramref name="imperfection"/> is null.</exception>
    public PerryRobertson(PerryImperfection imperfection)
    {
        Imperfection = Guard.NotNull(imperfection, nameof(imperfection));
        // The fingerprint keeps 0.1.0's line for the setting (η = the model's value, noted with the model's name), so that a
        // report made with 0.1.0 keeps its fingerprint; reports show the setting under its own symbol (Setting).
        var released = new MethodSetting("η", "imperfection model: " + imperfection.Description, imperfection.Value, StepUnit.None, false, imperfection.Kind.ToString());
        Identity = new MethodIdentity("Perry–Robertson formula", "Perry–Robertson (Timoshenko & Gere; Trahair & Bradford)", "", "initially curved struts",
            [released], Setting(imperfection));
    }

    /// <summary>The imperfection model.</summary>
    public PerryImperfection Imperfection { get; }

    // The setting under its own symbol: η only where η itself is given; the Robertson constant a, the bow ratio Lcr / e0,
    // or e0 from the actions (no single value: "—") otherwise.
    private static MethodSetting Setting(PerryImperfection m) => m.Kind switch
    {
        PerryImperfection.Model.Constant => new("η", "imperfection parameter, the same about both axes", m.Value, StepUnit.None, false, ""),
        PerryImperfection.Model.Robertson => new("a", "Robertson's constant: η = a λ about each axis", m.Value, StepUnit.None, m.Value == PerryImperfection.RobertsonDefault,
            m.Value == PerryImperfection.RobertsonDefault ? "the constant adopted for steel struts in BS 449 (from memory)" : ""),
        PerryImperfection.Model.BowRatio => new("Lcr / e0", "initial bow e0 = Lcr / ratio about each axis; η = e0 c / i²", m.Value, StepUnit.None, false, ""),
        _ => new("e0", "initial bow about each axis from the design actions (straight where none is given); η = e0 c / i²", double.NaN, StepUnit.None, false, ""),
    };

    /// <inheritdoc/>
    public MethodIdentity Identity { get; }
    /// <summary>The method in words: <see cref="MethodIdentity.ToString"/> of its <see cref="Identity"/>.</summary>
    /// <returns>The name, standard, edition and clause in one line.</returns>
    public override string ToString() => Identity.ToString();

    /// <inheritdoc/>
    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions) => ClassicalRules.Concentric(actions, "Perry");

    /// <summary>The Perry–Robertson mean stress at failure.</summary>
    internal static double CriticalStress(double fPa, double sigmaEPa, double eta)
    {
        // The smaller root of (f − σ)(σE − σ) = η σ σE, written as f / (q + √(q² − r)) with r = f/σE and
        // q = ½ (r + 1 + η): the product of the roots over the larger one. This form stays finite for a very stocky
        // strut (σE → ∞ gives f / (1 + η)) where ½[f + (1 + η)σE] − √(…) would subtract two infinities.
        if (!(sigmaEPa > 0)) return 0;
        double r = fPa / sigmaEPa;
        double q = 0.5 * (r + 1 + eta);
        double disc = q * q - r;
        // disc ≥ ((r − 1)/2)² ≥ 0 for η ≥ 0; the max guards a rounding just below zero.
        return fPa / (q + Math.Sqrt(Math.Max(disc, 0)));
    }

    // η about one axis from the member's scalars for that axis (the kernel reads them without AxisData, see Kernel).
    private double Eta(in ResolvedMember m, in ResolvedActions actions, BucklingAxis axis)
    {
        bool y = axis == BucklingAxis.Y;
        return Imperfection.Kind switch
        {
            PerryImperfection.Model.Constant => Imperfection.Value,
            PerryImperfection.Model.Robertson => Imperfection.Value * (y ? m.SlendernessY : m.SlendernessZ),
            PerryImperfection.Model.BowRatio => (y ? m.EffectiveLengthYM : m.EffectiveLengthZM) / Imperfection.Value * AxisData.FibreMaxAbout(m, axis) / Radius2(m, y),
            _ => (y ? actions.InitialBowYM : actions.InitialBowZM) * AxisData.FibreMaxAbout(m, axis) / Radius2(m, y),
        };

        static double Radius2(in ResolvedMember m, bool y) => y ? m.RadiusYM * m.RadiusYM : m.RadiusZM * m.RadiusZM;
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

    private const string Governing = "Perry–Robertson: extreme fibre of the bowed strut reaches f";

    // One source compiled twice (KernelEntry): for Check's untraced entry the step writers and the throw fold away. The
    // member's values are read as scalars, not through AxisData, which the JIT kept in memory (as in EulerBuckling).
    [MethodImpl(MethodImplOptions.NoInlining)]
    private string? Kernel<TEntry>(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace, ref CheckNumbers numbers)
        where TEntry : struct
    {
        // η first: Eta is a call, and values loaded before it would be saved to the stack around it.
        double etaY = Eta(member, actions, BucklingAxis.Y), etaZ = Eta(member, actions, BucklingAxis.Z);
        double e = member.ElasticModulusPa, f = member.StrengthPa, a = member.AreaM2;
        double lamY = member.SlendernessY, lamZ = member.SlendernessZ;
        double seY = Math.PI * Math.PI * e / (lamY * lamY);
        double seZ = Math.PI * Math.PI * e / (lamZ * lamZ);
        double sY = CriticalStress(f, seY, etaY), sZ = CriticalStress(f, seZ, etaZ);
        bool traced = typeof(TEntry) == typeof(MethodEntry) && trace is not null;
        if (traced) TraceAxes(trace!, member, etaY, etaZ, seY, seZ, sY, sZ);
        bool govY = sY <= sZ;
        double capacity = Math.Min(sY, sZ) * a;
        double u = actions.AxialForceN / capacity;
        if (traced) TraceVerdict(trace!, actions.AxialForceN, capacity, u);
        numbers.DesignResistanceN = capacity;
        numbers.Utilisation = u;
        numbers.GoverningAxis = govY ? BucklingAxis.Y : BucklingAxis.Z;
        numbers.GoverningMode = FailureMode.FlexuralBuckling;
        numbers.AboutY = new AxisOutcome(member.EffectiveLengthYM, lamY, Math.Sqrt(f / seY), member.CriticalForceYN, sY / f, sY * a);
        numbers.AboutZ = new AxisOutcome(member.EffectiveLengthZM, lamZ, Math.Sqrt(f / seZ), member.CriticalForceZN, sZ / f, sZ * a);
        numbers.Torsional = default;
        return numbers.Accepted<TEntry>(this, member) ? Governing : null;
    }

    // The steps are written in separate, non-inlined methods, so that the untraced check carries none of their string
    // building (Performance/ColdPathTests).
    [MethodImpl(MethodImplOptions.NoInlining)]
    private void TraceAxes(CalculationTrace trace, in ResolvedMember member,
        double etaY, double etaZ, double seY, double seZ, double sY, double sZ)
    {
        var y = new AxisData(member, BucklingAxis.Y);
        var z = new AxisData(member, BucklingAxis.Z);
        trace.Add("E", "elastic modulus", TraceCommon.Input, member.ElasticModulusPa, StepUnit.Stress, member.Material.Source);
        trace.Add("f", "compressive strength (yield)", TraceCommon.Input, member.StrengthPa, StepUnit.Stress, member.Material.Source);
        TraceCommon.SectionAndLengths(trace, member);
        trace.Note("Imperfection: " + Imperfection.Description + ".", Ref);
        AxisSteps(trace, y, etaY, seY, sY, member.AreaM2);
        AxisSteps(trace, z, etaZ, seZ, sZ, member.AreaM2);
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static void TraceVerdict(CalculationTrace trace, double demandN, double capacityN, double u)
    {
        trace.Add("N", "nominal capacity", "min(Ny, Nz)", capacityN, StepUnit.Force, Ref);
        ClassicalRules.Verdict(trace, demandN, capacityN, u);
    }

    private static void AxisSteps(CalculationTrace t, in AxisData ax, double eta, double sigmaE, double sigma, double a)
    {
        string s = ax.Sub;
        TraceCommon.Slenderness(t, ax, Ref);
        t.Add("σE," + s, "Euler stress about " + s, $"π² E / λ{s}²", sigmaE, StepUnit.Stress, Ref);
        t.Add("η" + s, "imperfection parameter about " + s, "e0 c / i²", eta, StepUnit.None, Ref);
        t.Add("σc," + s, "Perry–Robertson failure stress about " + s,
            $"½[f + (1 + η{s}) σE,{s}] − √(¼[f + (1 + η{s}) σE,{s}]² − f σE,{s})", sigma, StepUnit.Stress, Ref);
        t.Add("N" + s, "nominal capacity about " + s, $"σc,{s} A", sigma * a, StepUnit.Force, Ref);
    }
}
