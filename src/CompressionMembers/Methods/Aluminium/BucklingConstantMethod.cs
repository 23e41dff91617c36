using System;
using System.Runtime.CompilerServices;
using CompressionMembers.Internal;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Methods.Common;
using CompressionMembers.Resolution;
using CompressionMembers.Results;

namespace CompressionMembers.Methods.Aluminium;

/// <summary>
/// The buckling-constant method of US aluminium practice for a column in concentric compression: the yielding limit
/// Fcy up to S1 = (Bc − Fcy)/Dc, the straight inelastic line Fc = Bc − Dc λ up to Cc, and the Euler hyperbola
/// Fc = π² E / λ² beyond, with λ = Lcr / r; design strength φc Fc A (LRFD) or allowable strength Fc A / Ωc (ASD).
/// </summary>
/// <remarks>
/// <para>Buckling constants (Aluminum Association, Specification for Aluminum Structures, buckling constants for
/// compression in columns; all from memory): artificially aged tempers Bc = Fcy [1 + (Fcy / 2250 ksi)^½],
/// Dc = (Bc / 10)(Bc / E)^½, Cc = 0.41 Bc / Dc; other tempers Bc = Fcy [1 + (Fcy / 1000 ksi)^½],
/// Dc = (Bc / 20)(6 Bc / E)^½, Cc = 2 Bc / (3 Dc). φc = 0.90 and Ωc = 1.65 (from memory; overridable). Checked against
/// published copies (tests in Published/): the split into tempers T5–T9 and the others (Kissell &amp; Ferry, Aluminum
/// Structures, 2nd ed., §5). The formulas themselves, the constants for the other tempers and φc, Ωc were not found in a
/// stored copy of the specification: from memory.</para>
/// <para>Fcy is taken as the alloy's f0 (the EN 0.2 % proof strength); the US specification tabulates its own
/// compressive yield strengths. Local buckling of the parts is not checked here. Thread safety: immutable.</para>
/// </remarks>
[Immutable]
public sealed class BucklingConstantMethod : IResistanceMethod
{
    /// <summary>φc = 0.90 (from memory).</summary>
    public const double DefaultResistanceFactor = 0.90;
    /// <summary>Ωc = 1.65 (from memory).</summary>
    public const double DefaultSafetyFactor = 1.65;

    private const string Ref = "Aluminum Association, Specification for Aluminum Structures, columns (from memory)";
    private const double Ksi = 6.894757293168361e6;
    private const string CheckYield = "buckling-constant method: yielding (λ ≤ S1)";
    private const string CheckInelastic = "buckling-constant method: inelastic line (S1 < λ < Cc)";
    private const string CheckElastic = "buckling-constant method: Euler (λ ≥ Cc)";

    /// <summary>Creates the method.</summary>
    /// <param name="basis">LRFD or ASD.</param>
    /// <param name="temperGroup">Which constants to use; from the alloy's temper by default.</param>
    /// <param name="resistanceFactor">φc for LRFD, in (0, 1].</param>
    /// <param name="safetyFactor">Ωc for ASD, from 1 to 3.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is undefined, not finite or out of range.</exception>
    public BucklingConstantMethod(DesignBasis basis = DesignBasis.Lrfd, TemperGroup temperGroup = TemperGroup.FromAlloy,
        double resistanceFactor = DefaultResistanceFactor, double safetyFactor = DefaultSafetyFactor)
    {
        if (!Enum.IsDefined(basis)) throw new ArgumentOutOfRangeException(nameof(basis), basis, $"Unknown design basis {(int)basis}.");
        if (!Enum.IsDefined(temperGroup)) throw new ArgumentOutOfRangeException(nameof(temperGroup), temperGroup, $"Unknown temper group {(int)temperGroup}.");
        Guard.Positive(resistanceFactor, nameof(resistanceFactor), "", "Resistance factor φc");
        if (resistanceFactor > 1) throw new ArgumentOutOfRangeException(nameof(resistanceFactor), resistanceFactor, $"Resistance factor φc must be between 0 and 1; got {Guard.Show(resistanceFactor)}.");
        Guard.InRange(safetyFactor, 1, 3, nameof(safetyFactor), "", "Safety factor Ωc");
        Basis = basis;
        Group = temperGroup;
        ResistanceFactor = resistanceFactor;
        SafetyFactor = safetyFactor;
        Identity = new MethodIdentity("Buckling-constant column method (" + (basis == DesignBasis.Lrfd ? "LRFD" : "ASD") + ")",
            "Aluminum Association, Specification for Aluminum Structures", "", "columns, buckling constants Bc, Dc, Cc",
            basis == DesignBasis.Lrfd
                ? new MethodSetting("φc", "resistance factor for columns", resistanceFactor, StepUnit.None, resistanceFactor == DefaultResistanceFactor, "from memory of the specification; check your edition")
                : new MethodSetting("Ωc", "safety factor for columns", safetyFactor, StepUnit.None, safetyFactor == DefaultSafetyFactor, "from memory of the specification; check your edition"));
    }

    /// <summary>LRFD or ASD.</summary>
    public DesignBasis Basis { get; }
    /// <summary>The temper group setting.</summary>
    public TemperGroup Group { get; }
    /// <summary>φc.</summary>
    public double ResistanceFactor { get; }
    /// <summary>Ωc.</summary>
    public double SafetyFactor { get; }

    /// <inheritdoc/>
    public MethodIdentity Identity { get; }
    /// <summary>The method in words: <see cref="MethodIdentity.ToString"/> of its <see cref="Identity"/>.</summary>
    /// <returns>The name, standard, edition and clause in one line.</returns>
    public override string ToString() => Identity.ToString();

    /// <inheritdoc/>
    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions)
    {
        if (member.Material is not AluminiumAlloy) return NotAluminium(member);
        if (actions.HasEccentricity || actions.HasEndMoments)
            return Applicability.NotApplicable("this buckling-constant check covers concentric compression only; use EN 1999-1-1 for compression with bending.");
        if (actions.HasInitialBowY || actions.HasInitialBowZ)
            return Applicability.NotApplicable("the buckling constants already allow for out-of-straightness; remove the initial bow.");
        return Applicability.Applicable;
    }

    // The refusal's sentence, built only when refused and kept out of the code of every check.
    [MethodImpl(MethodImplOptions.NoInlining)]
    private static Applicability NotAluminium(in ResolvedMember member) =>
        Applicability.NotApplicable($"the buckling-constant method is for aluminium alloys; \"{member.Material.Name}\" is a {member.MaterialKind} material.");

    /// <summary>Whether a temper is artificially aged (T5 to T9).</summary>
    internal static bool IsArtificiallyAged(string temper) =>
        temper.Length >= 2 && (temper[0] == 'T' || temper[0] == 't') && temper[1] >= '5' && temper[1] <= '9';

    /// <summary>The buckling constants Bc, Dc (Pa) and Cc for a compressive yield strength and modulus.</summary>
    internal static void Constants(bool aged, double fcyPa, double ePa, out double bc, out double dc, out double cc)
    {
        if (aged)
        {
            bc = fcyPa * (1 + Math.Sqrt(fcyPa / (2250 * Ksi)));
            dc = bc / 10 * Math.Sqrt(bc / ePa);
            cc = 0.41 * bc / dc;
        }
        else
        {
            bc = fcyPa * (1 + Math.Sqrt(fcyPa / (1000 * Ksi)));
            dc = bc / 20 * Math.Sqrt(6 * bc / ePa);
            cc = 2 * bc / (3 * dc);
        }
    }

    /// <summary>Nominal column stress Fc for slenderness λ: 0 yielding, 1 inelastic, 2 elastic.</summary>
    internal static double NominalStress(double lambda, double fcy, double e, double bc, double dc, double cc, out int branch)
    {
        if (lambda >= cc) { branch = 2; return Math.PI * Math.PI * e / (lambda * lambda); }
        double s = bc - dc * lambda;
        if (s >= fcy) { branch = 0; return fcy; }
        branch = 1;
        return s;
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

    // One source compiled twice (KernelEntry): for Check's untraced entry the step writer and the throw fold away, so that
    // no value is live across a call (docs/performance.md, fourth round).
    [MethodImpl(MethodImplOptions.NoInlining)]
    private string? Kernel<TEntry>(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace, ref CheckNumbers numbers)
        where TEntry : struct
    {
        var alloy = (AluminiumAlloy)member.Material;
        bool aged = Group == TemperGroup.ArtificiallyAged || (Group == TemperGroup.FromAlloy && alloy.IsArtificiallyAged);
        double fcy = member.StrengthPa, e = member.ElasticModulusPa, a = member.AreaM2;
        // Bc, Dc, Cc follow from the alloy's f0 and E alone: computed once with the alloy (Constants, the same operations).
        double bc = aged ? alloy.AgedBc : alloy.OtherBc, dc = aged ? alloy.AgedDc : alloy.OtherDc, cc = aged ? alloy.AgedCc : alloy.OtherCc;
        var y = new AxisData(member, BucklingAxis.Y);
        var z = new AxisData(member, BucklingAxis.Z);
        double fy = NominalStress(y.Slenderness, fcy, e, bc, dc, cc, out int by);
        double fz = NominalStress(z.Slenderness, fcy, e, bc, dc, cc, out int bz);
        double factor = Basis == DesignBasis.Lrfd ? ResistanceFactor : 1 / SafetyFactor;
        bool govY = fy <= fz;
        double fc = govY ? fy : fz;
        int branch = govY ? by : bz;
        double capacity = factor * fc * a;
        double u = actions.AxialForceN / capacity;
        if (typeof(TEntry) == typeof(MethodEntry) && trace is not null) TraceSteps(trace, member, actions, alloy, aged, bc, dc, cc, y, z, by, bz, fy, fz, capacity, u);
        numbers.DesignResistanceN = capacity;
        numbers.Utilisation = u;
        numbers.GoverningAxis = govY ? BucklingAxis.Y : BucklingAxis.Z;
        numbers.GoverningMode = branch == 0 ? FailureMode.Yielding : FailureMode.FlexuralBuckling;
        numbers.AboutY = new AxisOutcome(y.EffectiveLengthM, y.Slenderness, y.Slenderness / cc, y.CriticalForceN, fy / fcy, factor * fy * a);
        numbers.AboutZ = new AxisOutcome(z.EffectiveLengthM, z.Slenderness, z.Slenderness / cc, z.CriticalForceN, fz / fcy, factor * fz * a);
        numbers.Torsional = default;
        if (!numbers.Accepted<TEntry>(this, member)) return null;
        return branch == 0 ? CheckYield : branch == 1 ? CheckInelastic : CheckElastic;
    }

    // The steps, written by a separate, non-inlined method from the values computed, so that the untraced check carries
    // none of this code (Performance/ColdPathTests).
    [MethodImpl(MethodImplOptions.NoInlining)]
    private void TraceSteps(CalculationTrace trace, in ResolvedMember member, in ResolvedActions actions, AluminiumAlloy alloy, bool aged,
        double bc, double dc, double cc, in AxisData y, in AxisData z, int by, int bz, double fy, double fz, double capacity, double u)
    {
        double fcy = member.StrengthPa, e = member.ElasticModulusPa;
        trace.Add("Fcy", "compressive yield strength (the alloy's f0)", TraceCommon.Input, fcy, StepUnit.Stress, alloy.Source);
        trace.Add("E", "elastic modulus", TraceCommon.Input, e, StepUnit.Stress, alloy.Source);
        TraceCommon.SectionAndLengths(trace, member);
        trace.Note(aged ? "Artificially aged temper (T5–T9): constants for artificially aged tempers." : "Temper not artificially aged: constants for O, H, T1–T4 tempers.", Ref);
        trace.Add("Bc", "buckling constant (intercept)", aged ? "Fcy [1 + (Fcy / 2250 ksi)^½]" : "Fcy [1 + (Fcy / 1000 ksi)^½]", bc, StepUnit.Stress, Ref);
        trace.Add("Dc", "buckling constant (slope)", aged ? "(Bc / 10)(Bc / E)^½" : "(Bc / 20)(6 Bc / E)^½", dc, StepUnit.Stress, Ref);
        trace.Add("Cc", "slenderness limit of the inelastic line", aged ? "0.41 Bc / Dc" : "2 Bc / (3 Dc)", cc, StepUnit.None, Ref);
        trace.Add("S1", "slenderness limit of yielding", "(Bc − Fcy) / Dc", (bc - fcy) / dc, StepUnit.None, Ref);
        Axis(trace, y, by, fy);
        Axis(trace, z, bz, fz);
        if (Basis == DesignBasis.Lrfd)
            trace.Add("φc Pn", "design strength (LRFD)", "φc min(Fc,y, Fc,z) A", capacity, StepUnit.Force, Ref);
        else
            trace.Add("Pn / Ωc", "allowable strength (ASD)", "min(Fc,y, Fc,z) A / Ωc", capacity, StepUnit.Force, Ref);
        trace.Add("P", "required strength", TraceCommon.Input, actions.AxialForceN, StepUnit.Force, "actions");
        trace.Add("u", "utilisation", "P / strength", u, StepUnit.None, Ref);
    }

    private static void Axis(CalculationTrace t, in AxisData ax, int branch, double fc)
    {
        TraceCommon.Slenderness(t, ax, Ref);
        string s = ax.Sub;
        t.Add("Fc," + s, "nominal column stress about " + s,
            branch == 0 ? $"Fcy (λ{s} ≤ S1)" : branch == 1 ? $"Bc − Dc λ{s} (S1 < λ{s} < Cc)" : $"π² E / λ{s}² (λ{s} ≥ Cc)", fc, StepUnit.Stress, Ref);
    }
}
