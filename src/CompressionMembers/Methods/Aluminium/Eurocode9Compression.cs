using System;
using System.Runtime.CompilerServices;
using CompressionMembers.Internal;
using CompressionMembers.Materials;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Methods.Common;
using CompressionMembers.Resolution;
using CompressionMembers.Results;
using CompressionMembers.Sections;

namespace CompressionMembers.Methods.Aluminium;

/// <summary>
/// An aluminium member in compression (and compression with bending) by EN 1999-1-1 (Eurocode 9): classification of
/// every part (6.1.4), local buckling and the effective section (6.1.5), heat-affected zones (6.1.6), flexural buckling
/// about both principal axes with κ for welded members (6.3.1), torsional and flexural-torsional buckling of open
/// sections (6.3.1.4, elastic critical loads after Timoshenko &amp; Gere), the welded cross-section (6.2.4) and the
/// interaction with bending (6.3.3).
/// </summary>
/// <remarks>
/// <para>N_b,Rd = κ χ Aeff f0 / γM1 with χ from α and λ̄0 of the alloy's buckling class, λ̄ = √(Aeff f0 / Ncr) and Ncr from
/// the gross section. Torsional modes use the standard's torsional α and λ̄0 (radiating outstands or general) and
/// Aeff with the HAZ but, for angles and tees, without the local-buckling reduction (ρc = 1), as 6.3.1.4 directs.</para>
/// <para>Bending: the first-order moment at the governing section is N·e + max |M_end| about each axis; M_Rd = W_el f0 / γM1
/// (the elastic modulus, conservative for class 1 and 2). Class 4 sections, welded members in bending, and bending about y of
/// open sections (where lateral-torsional buckling, not checked here, may govern) are refused.</para>
/// <para>Source: EN 1999-1-1:2007+A1:2009; the tables and formulas were recalled (from memory) and every step says which
/// clause it applies. Partial factors γM1 = 1.10 and γM2 = 1.25 are the recommended values of 6.1.3; a national annex may
/// change them. Thread safety: immutable.</para>
/// </remarks>
[Immutable]
public sealed class Eurocode9Compression : IResistanceMethod
{
    /// <summary>Recommended γM1 of EN 1999-1-1 6.1.3.</summary>
    public const double RecommendedPartialFactorM1 = 1.10;
    /// <summary>Recommended γM2 of EN 1999-1-1 6.1.3.</summary>
    public const double RecommendedPartialFactorM2 = 1.25;

    private const string Std = "EN 1999-1-1";
    private const string RefTable32 = "EN 1999-1-1 Table 3.2";
    private const string RefClass = "EN 1999-1-1 6.1.4.4, Table 6.2";
    private const string RefBeta = "EN 1999-1-1 6.1.4.3";
    private const string RefRho = "EN 1999-1-1 6.1.5, Table 6.3";
    private const string RefHaz = "EN 1999-1-1 6.1.6.2";
    private const string RefFlex = "EN 1999-1-1 6.3.1.2";
    private const string RefCurve = "EN 1999-1-1 6.3.1.2, Table 6.6";
    private const string RefKappa = "EN 1999-1-1 6.3.1.1, Table 6.5";
    private const string RefNRd = "EN 1999-1-1 6.3.1.1";
    private const string RefTors = "EN 1999-1-1 6.3.1.4; Timoshenko & Gere, Theory of Elastic Stability §5.3";
    private const string RefSection = "EN 1999-1-1 6.2.4";
    private const string RefInter = "EN 1999-1-1 6.3.3 (exponents from memory)";

    private const string CheckFlexY = "EN 1999-1-1 6.3.1 flexural buckling about y";
    private const string CheckFlexZ = "EN 1999-1-1 6.3.1 flexural buckling about z";
    private const string CheckLocal = "EN 1999-1-1 6.1.5 local buckling (χ = 1, Aeff < A)";
    private const string CheckTors = "EN 1999-1-1 6.3.1.4 torsional buckling";
    private const string CheckFt = "EN 1999-1-1 6.3.1.4 flexural-torsional buckling";
    private const string CheckEnd = "EN 1999-1-1 6.2.4 welded end section (HAZ)";
    private const string CheckHaz = "EN 1999-1-1 6.2.4 cross-section with longitudinal HAZ";
    private const string CheckBendY = "EN 1999-1-1 6.3.3 compression and bending about y";
    private const string CheckBendZ = "EN 1999-1-1 6.3.3 compression and bending about z";
    private const string CheckBendYz = "EN 1999-1-1 6.3.3 compression and biaxial bending";

    /// <summary>Exponent ξyc on the axial term for bending about y (6.3.3, 0.8; from memory).</summary>
    internal const double XiYc = 0.8;
    /// <summary>Exponent ηc on the axial term for bending about z (6.3.3, 0.8; from memory).</summary>
    internal const double EtaC = 0.8;
    /// <summary>Exponent ξzc on the moment term about z (6.3.3, 0.6; from memory).</summary>
    internal const double XiZc = 0.6;

    /// <summary>Creates the method.</summary>
    /// <param name="welding">How the member is welded; unwelded if null.</param>
    /// <param name="partialFactorM1">γM1 for instability and the cross-section, from 1 to 2; 1.10 recommended.</param>
    /// <param name="partialFactorM2">γM2 for the net (ultimate) section at welds, from 1 to 2; 1.25 recommended.</param>
    /// <exception cref="ArgumentOutOfRangeException">A partial factor is not finite or outside [1, 2].</exception>
    public Eurocode9Compression(AluminiumWelding? welding = null, double partialFactorM1 = RecommendedPartialFactorM1, double partialFactorM2 = RecommendedPartialFactorM2)
    {
        Guard.InRange(partialFactorM1, 1, 2, nameof(partialFactorM1), "", "Partial factor γM1");
        Guard.InRange(partialFactorM2, 1, 2, nameof(partialFactorM2), "", "Partial factor γM2");
        Welding = welding ?? AluminiumWelding.None;
        PartialFactorM1 = partialFactorM1;
        PartialFactorM2 = partialFactorM2;
        var m1 = new MethodSetting("γM1", "partial factor for resistance to instability", partialFactorM1, StepUnit.None,
                partialFactorM1 == RecommendedPartialFactorM1, "recommended value of EN 1999-1-1 6.1.3; a national annex may change it");
        var m2 = new MethodSetting("γM2", "partial factor for the net section at welds", partialFactorM2, StepUnit.None,
                partialFactorM2 == RecommendedPartialFactorM2, "recommended value of EN 1999-1-1 6.1.3; a national annex may change it");
        const string name = "EN 1999-1-1 aluminium member in compression", clause = "6.1.4–6.1.6, 6.2.4, 6.3.1, 6.3.3";
        if (!Welding.IsWelded)
        {
            Identity = new MethodIdentity(name, Std, "2007+A1:2009", clause, m1, m2);
            return;
        }
        // Reports show the area under its own symbol (0.1.0 printed "weld : 0 mm²" for welds at the ends, which reads as
        // "no weld"); the fingerprint keeps 0.1.0's line, so that earlier reports keep their fingerprints.
        var released = new MethodSetting("weld", "welding of the member (" + Welding.Description + ")", Welding.HeatAffectedAreaM2, StepUnit.Area, false,
            "member-specific; Ahaz of longitudinal welds (0 for welds at the ends only)");
        var shown = new MethodSetting("Ahaz", "heat-affected area of longitudinal welds (0: none, the welds are at the ends); welding: " + Welding.Description,
            Welding.HeatAffectedAreaM2, StepUnit.Area, false, "member-specific");
        Identity = new MethodIdentity(name, Std, "2007+A1:2009", clause, [m1, m2, released], m1, m2, shown);
    }

    /// <summary>How the member is welded.</summary>
    public AluminiumWelding Welding { get; }
    /// <summary>γM1.</summary>
    public double PartialFactorM1 { get; }
    /// <summary>γM2.</summary>
    public double PartialFactorM2 { get; }

    /// <summary>A copy for a member welded another way.</summary>
    /// <param name="welding">The welding.</param>
    /// <returns>The copy.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="welding"/> is null.</exception>
    public Eurocode9Compression WithWelding(AluminiumWelding welding) =>
        new(Guard.NotNull(welding, nameof(welding)), PartialFactorM1, PartialFactorM2);

    /// <inheritdoc/>
    public MethodIdentity Identity { get; }
    /// <summary>The method in words: <see cref="MethodIdentity.ToString"/> of its <see cref="Identity"/>.</summary>
    /// <returns>The name, standard, edition and clause in one line.</returns>
    public override string ToString() => Identity.ToString();

    internal static bool IsOpenForTorsion(SectionKind k) => k is SectionKind.Angle or SectionKind.Tee or SectionKind.Channel or SectionKind.DoublySymmetricI;

    /// <inheritdoc/>
    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions) => AppliesTo(member, actions, out _);

    /// <summary><see cref="AppliesTo(in ResolvedMember, in ResolvedActions)"/>, with the classification entry it read (null
    /// when it refused before reading one), so that <see cref="ApplicableNumbers"/> looks it up once per check.</summary>
    private Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions, out Ec9SectionEntry? found)
    {
        found = null;
        if (member.Material is not AluminiumAlloy alloy) return NotAluminium(member);
        var section = member.Section;
        if (!Ec9Section.Supports(member.SectionKind)) return NoFlatParts(section);
        bool welded = Welding.Location == WeldLocation.Longitudinal;
        var entry = found = Ec9ClassificationCache.Get(section, alloy, welded);   // classified once per section, alloy and welding
        ref readonly var c = ref entry.Result;
        if (!entry.ThicknessCovered) return ThicknessNotCovered(c, alloy);
        if (IsOpenForTorsion(member.SectionKind) && !member.HasTorsionalProperties)
            return Applicability.NotApplicable("torsional and flexural-torsional buckling need the torsion constant, warping constant and shear centre, which this section does not give.");
        if (welded && Welding.HeatAffectedAreaM2 >= member.AreaM2) return HeatAffectedAreaTooLarge(member.AreaM2);
        if (welded && Welding.Process == WeldingProcess.Tig && c.MaxThicknessM > 0.006)
            return Applicability.NotApplicable("EN 1999-1-1 covers TIG-welded HAZ only up to 6 mm thickness (from memory); the section is thicker.");
        if (actions.HasInitialBowY || actions.HasInitialBowZ)
            return Applicability.NotApplicable("the EN 1999-1-1 column curves already include the imperfections; remove the initial bow, or use the Perry–Robertson method to check a measured bow.");
        if (actions.HasEccentricity || actions.HasEndMoments)
        {
            if (Welding.IsWelded)
                return Applicability.NotApplicable("compression with bending of a welded member (the HAZ in the section modulus and ωx of localised welds) is not covered by this method; check the member unwelded with your own HAZ-reduced properties.");
            if (IsOpenForTorsion(member.SectionKind) && (actions.EccentricityYM != 0 || actions.EndMomentYTopNm != 0 || actions.EndMomentYBottomNm != 0))
                return Applicability.NotApplicable("bending about the major axis y of an open section can fail by lateral-torsional buckling, which this method does not check; only bending about z is covered for angles, tees, channels and I sections.");
            if (c.Class == 4)
                return Applicability.NotApplicable("compression with bending of a class 4 section needs the effective section modulus and the shift of the neutral axis, which this method does not compute; choose a section of class 1 to 3.");
        }
        return Applicability.Applicable;
    }

    // The refusals' sentences, built only when refused and kept out of the code of every check.
    [MethodImpl(MethodImplOptions.NoInlining)]
    private static Applicability NotAluminium(in ResolvedMember member) => Applicability.NotApplicable(
        $"EN 1999-1-1 needs an aluminium alloy with its f0, fu, buckling class and HAZ factors; \"{member.Material.Name}\" is a {member.MaterialKind} material. Use a preset of AluminiumAlloys or AluminiumAlloy.Create.");

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static Applicability NoFlatParts(Section section) => Applicability.NotApplicable(
        $"EN 1999-1-1 classification needs the flat parts of the section, which a {section.Kind} section does not give; use an I, channel, angle, tee, box or round tube, or a solid bar.");

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static Applicability ThicknessNotCovered(in Ec9Classified c, AluminiumAlloy alloy) => Applicability.NotApplicable(
        $"the section's thickness ({Guard.Show(c.MinThicknessM * 1e3)}–{Guard.Show(c.MaxThicknessM * 1e3)} mm) is outside the range {Guard.Show(alloy.MinimumThickness.Millimeters)}–{Guard.Show(alloy.MaximumThickness.Millimeters)} mm for which the values of {alloy.Name} hold; use the alloy values for that thickness.");

    [MethodImpl(MethodImplOptions.NoInlining)]
    private Applicability HeatAffectedAreaTooLarge(double areaM2) => Applicability.NotApplicable(
        $"the heat-affected area of the longitudinal welds ({Guard.Show(Welding.HeatAffectedAreaM2 * 1e6)} mm²) is not less than the section's area ({Guard.Show(areaM2 * 1e6)} mm²); check the weld layout.");

    /// <inheritdoc/>
    public CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace)
    {
        Unsafe.SkipInit(out CheckNumbers numbers);
        string? check = Numbers(member, actions, trace, ref numbers);
        return check is null ? EvaluateGeneral(member, actions, trace) : numbers.ToResult(member, actions, this, check, trace);
    }

    /// <summary>Whether the straight-line path applies (an unwelded closed or solid section in compression);
    /// <see cref="Numbers"/> then takes <see cref="FlexuralNumbers"/>.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal bool IsFlexuralOnly(in ResolvedMember member, in ResolvedActions actions) =>
        Welding.Location == WeldLocation.None && !IsOpenForTorsion(member.SectionKind) && !(actions.HasEccentricity || actions.HasEndMoments);

    /// <summary>The straight-line path's numbers (validated), traced or not, or null for welds, open sections and bending
    /// (then <see cref="EvaluateGeneral"/>). The method's own <see cref="Evaluate"/> and Check's traced checks take it.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal string? Numbers(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace, ref CheckNumbers numbers) =>
        IsFlexuralOnly(member, actions)
            ? FlexuralNumbers<MethodEntry>(member, actions, Ec9ClassificationCache.Get(member.Section, (AluminiumAlloy)member.Material, false), trace, ref numbers)
            : null;

    /// <summary>Check's entry for an untraced check: the applicability test (<paramref name="verdict"/> is what
    /// <see cref="AppliesTo(in ResolvedMember, in ResolvedActions)"/> returns), then, for a member the method applies to,
    /// the straight-line path's numbers, or null for welds, open sections, bending and numbers a result refuses (then
    /// <see cref="EvaluateGeneral"/>, which computes the same and throws for those). The classification entry the test
    /// read is handed to the kernel, instead of being looked up a second time (docs/performance.md, twelfth round).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal string? ApplicableNumbers(in ResolvedMember member, in ResolvedActions actions, ref CheckNumbers numbers, out Applicability verdict)
    {
        verdict = AppliesTo(member, actions, out Ec9SectionEntry? entry);
        // An applicable verdict has read the entry; without welds (IsFlexuralOnly) it is the unwelded one the path needs.
        return verdict.IsApplicable && IsFlexuralOnly(member, actions) ? FlexuralNumbers<CheckEntry>(member, actions, entry!, null, ref numbers) : null;
    }

    /// <summary>The straight-line path's numbers; returns the governing check's words.</summary>
    // An unwelded closed or solid section in compression: flexural buckling about both axes only (6.3.1.1, 6.3.1.2), straight
    // on the member's resolved values — the path of sweeps. It writes the same steps in the same order as the general path,
    // and a test holds the two bit for bit; the traced and untraced checks both take it. One source compiled twice
    // (KernelEntry): for Check's untraced entry the step-writing branches and the throw fold away, so that no value is
    // live across a call (docs/performance.md, fourth round).
    [MethodImpl(MethodImplOptions.NoInlining)]
    internal string? FlexuralNumbers<TEntry>(in ResolvedMember member, in ResolvedActions actions, Ec9SectionEntry entry, CalculationTrace? trace,
        ref CheckNumbers numbers)
        where TEntry : struct
    {
        bool traced = typeof(TEntry) == typeof(MethodEntry) && trace is not null;
        var alloy = entry.Alloy;   // the member's alloy: the entry was looked up for it, unwelded
        ref readonly var c = ref entry.Result;
        double f0 = member.StrengthPa, aEff = c.AreaEffM2, gm1 = PartialFactorM1;
        var cls = alloy.BucklingClass;
        if (traced)
            TraceInputs(trace!, member, alloy, c, entry.Plates, f0, entry.UltimateStrengthPa, member.ElasticModulusPa, member.ShearModulusPa, cls, false);
        Ec9Rules.FlexuralCurve(cls, out double alpha, out double lam0);
        if (traced) TraceCurve(trace!, cls, alpha, lam0);
        // λ̄ = √(Aeff f0 / Ncr) with Ncr of the gross section, χ of the alloy's curve, N b,Rd = κ χ Aeff f0 / γM1 with κ = 1.
        double lamY = Math.Sqrt(aEff * f0 / member.CriticalForceYN), lamZ = Math.Sqrt(aEff * f0 / member.CriticalForceZN);
        double chiY = Ec9Rules.Chi(lamY, alpha, lam0), chiZ = Ec9Rules.Chi(lamZ, alpha, lam0);
        double nRdY = 1.0 * chiY * aEff * f0 / gm1, nRdZ = 1.0 * chiZ * aEff * f0 / gm1;
        if (traced) TraceFlexural(trace!, member, alpha, lam0, cls, lamY, chiY, nRdY, lamZ, chiZ, nRdZ);

        double nRd = nRdY; var axis = BucklingAxis.Y; var mode = FailureMode.FlexuralBuckling; string check = CheckFlexY;
        if (nRdZ < nRd) { nRd = nRdZ; axis = BucklingAxis.Z; check = CheckFlexZ; }
        if (c.Class == 4 && (axis == BucklingAxis.Y ? chiY : chiZ) >= 1) { mode = FailureMode.LocalBuckling; check = CheckLocal; }
        double nEd = actions.AxialForceN;
        double u = nEd / nRd;
        if (traced)
        {
            TraceAxial(trace!, nRd, check, nEd, u);
            trace!.Add("u", "utilisation", "governing value", u, StepUnit.None, Std);
        }
        numbers.DesignResistanceN = nRd;
        numbers.Utilisation = u;
        numbers.GoverningAxis = axis;
        numbers.GoverningMode = mode;
        numbers.AboutY = new AxisOutcome(member.EffectiveLengthYM, member.SlendernessY, lamY, member.CriticalForceYN, chiY * 1.0, nRdY);
        numbers.AboutZ = new AxisOutcome(member.EffectiveLengthZM, member.SlendernessZ, lamZ, member.CriticalForceZN, chiZ * 1.0, nRdZ);
        numbers.Torsional = default;
        if (!numbers.Accepted<TEntry>(this, member)) return null;
        return check;
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static void TraceFlexural(CalculationTrace trace, in ResolvedMember member, double alpha, double lam0, BucklingClass cls,
        double lamY, double chiY, double nRdY, double lamZ, double chiZ, double nRdZ)
    {
        FlexuralSteps(trace, new AxisData(member, BucklingAxis.Y), alpha, lam0, cls, false, lamY, chiY, 1.0, nRdY);
        FlexuralSteps(trace, new AxisData(member, BucklingAxis.Z), alpha, lam0, cls, false, lamZ, chiZ, 1.0, nRdZ);
        trace.Note("Closed and solid sections are not susceptible to torsional buckling; only flexural modes are checked.", "EN 1999-1-1 6.3.1.4");
    }

    /// <summary>Every mode: flexural, torsional and flexural-torsional buckling, welds (HAZ), the welded cross-section, and
    /// compression with bending.</summary>
    // Not inlined, for the reason given at Ec5ColumnStability.BendingNumbers (a large path pulled into a caller's loop
    // spends the caller's inlining budget).
    [MethodImpl(MethodImplOptions.NoInlining)]
    internal CheckResult EvaluateGeneral(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace)
    {
        var alloy = (AluminiumAlloy)member.Material;
        var section = member.Section;
        var cls = alloy.BucklingClass;
        var loc = Welding.Location;
        bool longitudinal = loc == WeldLocation.Longitudinal;
        // The classification (and fu in Pa) comes from the per-section cache, the same entry AppliesTo read.
        var entry = Ec9ClassificationCache.Get(section, alloy, longitudinal);
        ref readonly var c = ref entry.Result;
        var plates = entry.Plates;
        double f0 = member.StrengthPa, fu = entry.UltimateStrengthPa, e = member.ElasticModulusPa, g = member.ShearModulusPa, a = member.AreaM2;
        double gm1 = PartialFactorM1, gm2 = PartialFactorM2;
        // The process was checked when the welding was described, so the factors are read without a second check.
        double rhoOHaz = alloy.HazProofFactorFor(Welding.Process), rhoUHaz = alloy.HazUltimateFactorFor(Welding.Process);
        double aEff = c.AreaEffM2;

        // Steps are written by separate methods (cold code) so that the untraced frame stays small; they get the values computed here.
        if (trace is not null) TraceInputs(trace, member, alloy, c, plates, f0, fu, e, g, cls, longitudinal);

        // Longitudinal welds: heat-affected area and the area A1 of κ.
        double aHaz = longitudinal ? Welding.HeatAffectedAreaM2 : 0;
        double a1 = a - aHaz * (1 - rhoOHaz);
        double aEffHaz = aEff - aHaz * (1 - rhoOHaz); // local and HAZ reductions together (a conservative overlap)
        if (trace is not null && longitudinal) TraceLongitudinal(trace, rhoOHaz, aHaz, a1, aEffHaz);

        // Flexural buckling about y and z.
        Ec9Rules.FlexuralCurve(cls, out double alphaF, out double lam0F);
        if (trace is not null) TraceCurve(trace, cls, alphaF, lam0F);
        var y = new AxisData(member, BucklingAxis.Y);
        var z = new AxisData(member, BucklingAxis.Z);
        double nRdY = Flexural(trace, y, aEff, f0, alphaF, lam0F, cls, longitudinal, a1 / a, gm1, out double lamY, out double chiY, out double kapY);
        double nRdZ = Flexural(trace, z, aEff, f0, alphaF, lam0F, cls, longitudinal, a1 / a, gm1, out double lamZ, out double chiZ, out double kapZ);

        // Torsional and flexural-torsional buckling of open sections.
        bool torsion = IsOpenForTorsion(member.SectionKind);
        double nRdT = double.PositiveInfinity, nCrT = double.NaN, lamT = double.NaN, chiT = double.NaN;
        bool coupled = false;
        if (torsion)
            nRdT = Torsional(trace, member, c, y, z, aEff, aEffHaz, a, aHaz, rhoOHaz, f0, gm1, out nCrT, out lamT, out chiT, out coupled);
        else if (trace is not null)
            trace.Note("Closed and solid sections are not susceptible to torsional buckling; only flexural modes are checked.", "EN 1999-1-1 6.3.1.4");

        // The cross-section where the welds are.
        double nRdSec = double.PositiveInfinity;
        if (loc == WeldLocation.EndsOnly)
        {
            double nu = rhoUHaz * a * fu / gm2, no = rhoOHaz * aEff * f0 / gm1;
            nRdSec = Math.Min(nu, no);
            if (trace is not null) TraceEndSection(trace, rhoOHaz, rhoUHaz, nu, no, nRdSec);
        }
        else if (longitudinal)
        {
            nRdSec = aEffHaz * f0 / gm1;
            trace?.Add("Nc,Rd", "cross-section resistance with HAZ", "Aeff,haz f0 / γM1", nRdSec, StepUnit.Force, RefSection);
        }

        // The governing axial resistance.
        double nRd = nRdY; var axis = BucklingAxis.Y; var mode = FailureMode.FlexuralBuckling; string check = CheckFlexY;
        if (nRdZ < nRd) { nRd = nRdZ; axis = BucklingAxis.Z; check = CheckFlexZ; }
        if (nRdT < nRd) { nRd = nRdT; axis = BucklingAxis.None; mode = coupled ? FailureMode.FlexuralTorsionalBuckling : FailureMode.TorsionalBuckling; check = coupled ? CheckFt : CheckTors; }
        if (nRdSec < nRd) { nRd = nRdSec; axis = BucklingAxis.None; mode = FailureMode.Yielding; check = longitudinal ? CheckHaz : CheckEnd; }
        if (mode == FailureMode.FlexuralBuckling && c.Class == 4 && (axis == BucklingAxis.Y ? chiY : chiZ) >= 1)
        { mode = FailureMode.LocalBuckling; check = CheckLocal; }

        double nEd = actions.AxialForceN;
        double u = nEd / nRd;
        if (trace is not null) TraceAxial(trace, nRd, check, nEd, u);

        // Compression with bending (cold for pure compression: its own method).
        if (actions.HasEccentricity || actions.HasEndMoments)
            Bending(trace, member, actions, nEd, nRdY, nRdZ, nRdT, f0, gm1, ref u, ref axis, ref mode, ref check);
        trace?.Add("u", "utilisation", "governing value", u, StepUnit.None, Std);

        var tOut = torsion ? new AxisOutcome(member.EffectiveLengthTorsionalM, double.NaN, lamT, nCrT, chiT, nRdT) : default;
        return new CheckResult(member, actions, this, nRd, u, axis, mode, check,
            new AxisOutcome(y.EffectiveLengthM, y.Slenderness, lamY, y.CriticalForceN, chiY * kapY, nRdY),
            new AxisOutcome(z.EffectiveLengthM, z.Slenderness, lamZ, z.CriticalForceN, chiZ * kapZ, nRdZ),
            tOut, trace);
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private void TraceInputs(CalculationTrace trace, in ResolvedMember member, AluminiumAlloy alloy, in Ec9Classified c, ReadOnlySpan<Ec9Plate> plates,
        double f0, double fu, double e, double g, BucklingClass cls, bool longitudinal)
    {
        trace.Add("f0", "0.2 % proof strength", TraceCommon.Input, f0, StepUnit.Stress, alloy.Source);
        trace.Add("fu", "ultimate strength", TraceCommon.Input, fu, StepUnit.Stress, alloy.Source);
        trace.Add("E", "elastic modulus", TraceCommon.Input, e, StepUnit.Stress, "EN 1999-1-1 3.2.5");
        trace.Add("G", "shear modulus", TraceCommon.Input, g, StepUnit.Stress, "EN 1999-1-1 3.2.5");
        trace.Note(cls == BucklingClass.A ? "Buckling class A (heat-treated alloy)." : "Buckling class B.", RefTable32);
        trace.Note("Welding: " + Welding.Description + ".", RefHaz);
        TraceCommon.SectionAndLengths(trace, member);
        double eps = Ec9Rules.Epsilon(f0);
        trace.Add("ε", "material factor", "√(250 MPa / f0)", eps, StepUnit.None, RefClass);
        ClassificationSteps(trace, c, plates, eps, cls, longitudinal);
        }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private void TraceLongitudinal(CalculationTrace trace, double rhoOHaz, double aHaz, double a1, double aEffHaz)
    {
        trace.Add("ρo,haz", "HAZ factor on f0 (" + (Welding.Process == WeldingProcess.Tig ? "TIG" : "MIG") + ")", "fo,haz / f0", rhoOHaz, StepUnit.None, RefTable32);
        trace.Add("Ahaz", "heat-affected area of the longitudinal welds", Welding.Description, aHaz, StepUnit.Area, "EN 1999-1-1 6.1.6.3");
        trace.Add("A1", "area for κ", "A − Ahaz (1 − ρo,haz)", a1, StepUnit.Area, RefKappa);
        trace.Add("Aeff,haz", "effective area with local buckling and HAZ", "Aeff − Ahaz (1 − ρo,haz)", aEffHaz, StepUnit.Area, RefHaz);
        }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static void TraceCurve(CalculationTrace trace, BucklingClass cls, double alphaF, double lam0F)
    {
        trace.Add("α", "imperfection factor, flexural buckling (class " + (cls == BucklingClass.A ? "A" : "B") + ")", "Table 6.6", alphaF, StepUnit.None, RefCurve);
        trace.Add("λ̄0", "limit of the plateau, flexural buckling", "Table 6.6", lam0F, StepUnit.None, RefCurve);
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static void TraceEndSection(CalculationTrace trace, double rhoOHaz, double rhoUHaz, double nu, double no, double nRdSec)
    {
            trace.Note("Transverse welds at the ends: the whole end section is heat-affected; buckling uses the unwelded member (κ = 1).", RefSection);
            trace.Add("ρo,haz", "HAZ factor on f0", "fo,haz / f0", rhoOHaz, StepUnit.None, RefTable32);
            trace.Add("ρu,haz", "HAZ factor on fu", "fu,haz / fu", rhoUHaz, StepUnit.None, RefTable32);
            trace.Add("Nu,Rd", "ultimate resistance of the welded end section", "ρu,haz A fu / γM2", nu, StepUnit.Force, RefSection);
            trace.Add("No,Rd", "proof resistance of the welded end section", "ρo,haz Aeff f0 / γM1", no, StepUnit.Force, RefSection);
            trace.Add("Nc,Rd,haz", "resistance of the welded end section", "min(Nu,Rd, No,Rd)", nRdSec, StepUnit.Force, RefSection);
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static void TraceAxial(CalculationTrace trace, double nRd, string check, double nEd, double u)
    {
        trace.Add("NRd", "design buckling resistance (governing mode)", "min of the modes above", nRd, StepUnit.Force, RefNRd);
        trace.Note("Governing: " + check + ".", RefNRd);
        trace.Add("NEd", "design axial compression", TraceCommon.Input, nEd, StepUnit.Force, "actions");
        trace.Add("NEd / NRd", "axial utilisation", "NEd / NRd", u, StepUnit.None, RefNRd);
    }

    private static void Bending(CalculationTrace? trace, in ResolvedMember member, in ResolvedActions actions, double nEd, double nRdY, double nRdZ,
        double nRdT, double f0, double gm1, ref double u, ref BucklingAxis axis, ref FailureMode mode, ref string check)
    {
        double my = nEd * Math.Abs(actions.EccentricityYM) + Math.Max(Math.Abs(actions.EndMomentYTopNm), Math.Abs(actions.EndMomentYBottomNm));
        double mz = nEd * Math.Abs(actions.EccentricityZM) + Math.Max(Math.Abs(actions.EndMomentZTopNm), Math.Abs(actions.EndMomentZBottomNm));
        double wy = member.SecondMomentYM4 / Math.Max(member.FibrePositiveZM, member.FibreNegativeZM);
        double wz = member.SecondMomentZM4 / Math.Max(member.FibrePositiveYM, member.FibreNegativeYM);
        double mRdY = wy * f0 / gm1, mRdZ = wz * f0 / gm1;
        double nbZ = Math.Min(nRdZ, nRdT), nbMin = Math.Min(nRdY, nbZ);
        double uy = Math.Pow(nEd / nRdY, XiYc) + my / mRdY;
        double uz = Math.Pow(nEd / nbZ, EtaC) + Math.Pow(mz / mRdZ, XiZc);
        bool both = my > 0 && mz > 0;
        double uyz = both ? Math.Pow(nEd / nbMin, EtaC) + my / mRdY + Math.Pow(mz / mRdZ, XiZc) : 0;
        if (trace is not null)
        {
            trace.Note("First-order moment at the governing section: N·e + max |M_end| about each axis; ω0 = ωx = 1 (no localised welds or holes).", RefInter);
            trace.Add("My,Ed", "design moment about y", "NEd |ey| + max |My,end|", my, StepUnit.Moment, RefInter);
            trace.Add("Mz,Ed", "design moment about z", "NEd |ez| + max |Mz,end|", mz, StepUnit.Moment, RefInter);
            trace.Add("Wel,y", "elastic section modulus about y", "Iy / max(z+, z−)", wy, StepUnit.SectionModulus, "section");
            trace.Add("Wel,z", "elastic section modulus about z", "Iz / max(y+, y−)", wz, StepUnit.SectionModulus, "section");
            trace.Add("My,Rd", "bending resistance about y", "Wel,y f0 / γM1", mRdY, StepUnit.Moment, "EN 1999-1-1 6.2.5");
            trace.Add("Mz,Rd", "bending resistance about z", "Wel,z f0 / γM1", mRdZ, StepUnit.Moment, "EN 1999-1-1 6.2.5");
            trace.Add("ξyc", "exponent of the axial term, bending about y", "6.3.3", XiYc, StepUnit.None, RefInter);
            trace.Add("ηc", "exponent of the axial term, bending about z", "6.3.3", EtaC, StepUnit.None, RefInter);
            trace.Add("ξzc", "exponent of the moment term about z", "6.3.3", XiZc, StepUnit.None, RefInter);
            trace.Add("uy", "interaction, bending about y", "(NEd / Nb,y,Rd)^ξyc + My,Ed / My,Rd", uy, StepUnit.None, RefInter);
            trace.Add("uz", "interaction, bending about z", "(NEd / min(Nb,z,Rd, NT,Rd))^ηc + (Mz,Ed / Mz,Rd)^ξzc", uz, StepUnit.None, RefInter);
            if (both)
                trace.Add("uyz", "interaction, biaxial bending", "(NEd / Nb,min,Rd)^ηc + My,Ed / My,Rd + (Mz,Ed / Mz,Rd)^ξzc", uyz, StepUnit.None, RefInter);
        }
        double ub = uy; var axisB = BucklingAxis.Y; string checkB = CheckBendY;
        if (uz > ub) { ub = uz; axisB = BucklingAxis.Z; checkB = CheckBendZ; }
        if (uyz > ub) { ub = uyz; axisB = BucklingAxis.Both; checkB = CheckBendYz; }
        if (ub > u) { u = ub; axis = axisB; mode = FailureMode.CombinedCompressionAndBending; check = checkB; }
        trace?.Note("Governing: " + check + ".", RefInter);
    }

    private static double Flexural(CalculationTrace? t, in AxisData ax, double aEff, double f0, double alpha, double lam0, BucklingClass cls,
        bool longitudinal, double a1OverA, double gm1, out double lam, out double chi, out double kappa)
    {
        lam = Math.Sqrt(aEff * f0 / ax.CriticalForceN);
        chi = Ec9Rules.Chi(lam, alpha, lam0);
        kappa = longitudinal ? Ec9Rules.KappaLongitudinalWeld(cls, lam, a1OverA) : 1;
        double nRd = kappa * chi * aEff * f0 / gm1;
        if (t is not null) FlexuralSteps(t, ax, alpha, lam0, cls, longitudinal, lam, chi, kappa, nRd);
        return nRd;
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static void FlexuralSteps(CalculationTrace t, in AxisData ax, double alpha, double lam0, BucklingClass cls, bool longitudinal,
        double lam, double chi, double kappa, double nRd)
    {
        bool y = ax.Axis == BucklingAxis.Y;
        string s = ax.Sub;
        TraceCommon.Slenderness(t, ax, RefFlex);
        t.Add("λ̄" + s, "relative slenderness about " + s, "√(Aeff f0 / Ncr," + s + ")", lam, StepUnit.None, RefFlex);
        t.Add("φ" + s, "value for the reduction factor about " + s, "0.5 [1 + α (λ̄ − λ̄0) + λ̄²]", Ec9Rules.Phi(lam, alpha, lam0), StepUnit.None, RefFlex);
        t.Add("χ" + s, "reduction factor for flexural buckling about " + s, lam <= lam0 ? "1 (λ̄ ≤ λ̄0)" : "1 / (φ + √(φ² − λ̄²)) ≤ 1", chi, StepUnit.None, RefFlex);
        t.Add("κ" + s, "factor for the weakening of welding", longitudinal
            ? (cls == BucklingClass.A ? "1 − (1 − A1/A) 10^(−λ̄) − (0.05 + 0.1 A1/A) λ̄^(1.3(1 − λ̄))" : "1 + 0.04 (4λ̄)^(0.5 − λ̄) − 0.22 λ̄^(1.4(1 − λ̄)) (1 for λ̄ ≤ 0.2)")
            : "1 (no longitudinal welds)", kappa, StepUnit.None, RefKappa);
        t.Add(y ? "Nb,y,Rd" : "Nb,z,Rd", "flexural buckling resistance about " + s, "κ χ Aeff f0 / γM1", nRd, StepUnit.Force, RefNRd);
    }

    private static double Torsional(CalculationTrace? t, in ResolvedMember m, in Ec9Classified c, in AxisData y, in AxisData z,
        double aEff, double aEffHaz, double a, double aHaz, double rhoOHaz, double f0, double gm1,
        out double nCr, out double lam, out double chi, out bool coupled)
    {
        bool radiating = Ec9Section.IsRadiatingOutstands(m.SectionKind);
        double e = m.ElasticModulusPa, g = m.ShearModulusPa, lt = m.EffectiveLengthTorsionalM;
        double y0 = m.ShearCentreYM, z0 = m.ShearCentreZM;
        double i02 = (m.SecondMomentYM4 + m.SecondMomentZM4) / a + y0 * y0 + z0 * z0;
        double nT = (g * m.TorsionConstantM4 + Math.PI * Math.PI * e * m.WarpingConstantM6 / (lt * lt)) / i02;
        // Ny, Nz with their own effective lengths (Lcr,y, Lcr,z) and NT with the torsional one: common practice.
        nCr = Ec9Rules.TorsionalCritical(y.CriticalForceN, z.CriticalForceN, nT, i02, y0, z0, out coupled);
        // 6.3.1.4: radiating outstands — ρc = 1 but the HAZ counts; general sections — local buckling and HAZ.
        double aT = radiating ? a - aHaz * (1 - rhoOHaz) : aEffHaz;
        Ec9Rules.TorsionalCurve(radiating, out double alpha, out double lam0);
        lam = Math.Sqrt(aT * f0 / nCr);
        chi = Ec9Rules.Chi(lam, alpha, lam0);
        double nRd = chi * aT * f0 / gm1;
        if (t is not null) TorsionalSteps(t, m, radiating, lt, y0, z0, i02, nT, nCr, coupled, aT, lam, lam0, chi, nRd);
        return nRd;
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static void TorsionalSteps(CalculationTrace t, in ResolvedMember m, bool radiating, double lt, double y0, double z0, double i02, double nT,
        double nCr, bool coupled, double aT, double lam, double lam0, double chi, double nRd)
    {
        t.Add("It", "St Venant torsion constant", TraceCommon.Input, m.TorsionConstantM4, StepUnit.SecondMoment, "section");
        t.Add("Iw", "warping constant", TraceCommon.Input, m.WarpingConstantM6, StepUnit.WarpingConstant, "section");
        t.Add("y0", "shear-centre offset along y from the centroid", TraceCommon.Input, y0, StepUnit.Length, "section");
        t.Add("z0", "shear-centre offset along z from the centroid", TraceCommon.Input, z0, StepUnit.Length, "section");
        t.Add("LT", "effective length for twisting", TraceCommon.Input, lt, StepUnit.Length, "restraint");
        t.Add("i0²", "polar radius of gyration about the shear centre, squared", "(Iy + Iz) / A + y0² + z0²", i02, StepUnit.Area, RefTors);
        t.Add("Ncr,T", "elastic torsional critical force", "(G It + π² E Iw / LT²) / i0²", nT, StepUnit.Force, RefTors);
        if (coupled)
        {
            t.Note("The shear centre is off the centroid: twist couples with bending; smallest root of i0² (N − Ny)(N − Nz)(N − NT) − N² y0² (N − Nz) − N² z0² (N − Ny) = 0.", RefTors);
            t.Add("Ncr,TF", "elastic flexural-torsional critical force", "smallest coupled root", nCr, StepUnit.Force, RefTors);
        }
        else
            t.Note("The shear centre is at the centroid: the torsional mode is uncoupled (Ncr = Ncr,T).", RefTors);
        t.Note(radiating ? "Section of radiating outstands: α = 0.20, λ̄0 = 0.60; Aeff without local-buckling reduction (ρc = 1), with HAZ."
            : "General section: α = 0.35, λ̄0 = 0.40; Aeff with local buckling and HAZ.", "EN 1999-1-1 6.3.1.4, Table 6.6");
        t.Add("Aeff,T", "effective area for torsional buckling", radiating ? "A − Ahaz (1 − ρo,haz)" : "Aeff − Ahaz (1 − ρo,haz)", aT, StepUnit.Area, "EN 1999-1-1 6.3.1.4");
        t.Add("λ̄T", "relative slenderness, torsional mode", coupled ? "√(Aeff,T f0 / Ncr,TF)" : "√(Aeff,T f0 / Ncr,T)", lam, StepUnit.None, "EN 1999-1-1 6.3.1.4");
        t.Add("χT", "reduction factor, torsional mode", lam <= lam0 ? "1 (λ̄ ≤ λ̄0)" : "1 / (φ + √(φ² − λ̄²)) ≤ 1", chi, StepUnit.None, RefFlex);
        t.Add("NT,Rd", coupled ? "flexural-torsional buckling resistance" : "torsional buckling resistance", "χT Aeff,T f0 / γM1", nRd, StepUnit.Force, RefNRd);
    }

    private static void ClassificationSteps(CalculationTrace t, in Ec9Classified c, ReadOnlySpan<Ec9Plate> p, double eps, BucklingClass cls, bool welded)
    {
        if (c.IsSolid)
        {
            t.Note("Solid section: no thin parts, class 1, no local buckling.", RefClass);
            return;
        }
        if (c.IsTube)
        {
            Ec9Rules.ClassLimits(cls, welded, false, out double b1, out double b2, out double b3);
            t.Add("β", "slenderness of the round tube", "3 √(D / t)", c.TubeBeta, StepUnit.None, RefBeta);
            t.Add("β3", "class 3 limit (internal part" + (welded ? ", welded)" : ")"), Show(b3) + " ε", b3 * eps, StepUnit.None, RefClass);
            _ = b1; _ = b2;
            t.Add("class", "section class", "β against β1, β2, β3", c.Class, StepUnit.None, RefClass);
            t.Add("ρc", "local buckling factor", c.Class == 4 ? "C1 / (β/ε) − C2 / (β/ε)²" : "1 (not class 4)", c.TubeRho, StepUnit.None, RefRho);
            t.Add("Aeff", "effective area", "ρc A", c.AreaEffM2, StepUnit.Area, RefRho);
            return;
        }
        for (int i = 0; i < c.Count; i++)
        {
            ref readonly var pl = ref p[i];
            string name = Ec9Section.PartName(pl.Part) + " " + (i + 1).ToString(System.Globalization.CultureInfo.InvariantCulture);
            Ec9Rules.ClassLimits(cls, welded, pl.Outstand, out double b1, out double b2, out double b3);
            t.Add("b/t", name + (pl.Outstand ? " (outstand)" : " (internal)") + ", β = b / t under uniform compression",
                $"{Show(pl.WidthM * 1e3)} mm / {Show(pl.ThicknessM * 1e3)} mm", pl.Beta, StepUnit.None, RefBeta);
            t.Add("class", name + $": limits β1, β2, β3 = {Show(b1)}ε, {Show(b2)}ε, {Show(b3)}ε" + (welded ? " (welded)" : ""), "Table 6.2", pl.Class, StepUnit.None, RefClass);
            if (pl.Class == 4)
                t.Add("ρc", name + ": local buckling factor", "C1 / (β/ε) − C2 / (β/ε)², at most 1", pl.Rho, StepUnit.None, RefRho);
        }
        t.Add("class", "section class (the highest of its parts)", "max", c.Class, StepUnit.None, RefClass);
        if (c.Class == 4)
        {
            t.Note("Class 4: each class 4 part keeps its width and takes the thickness ρc t.", RefRho);
            t.Add("Aeff", "effective area", "A − Σ (1 − ρc) b t", c.AreaEffM2, StepUnit.Area, RefRho);
            t.Add("Ieff,y", "effective second moment about y", "effective section", c.IyEffM4, StepUnit.SecondMoment, RefRho);
            t.Add("Ieff,z", "effective second moment about z", "effective section", c.IzEffM4, StepUnit.SecondMoment, RefRho);
        }
        else
            t.Add("Aeff", "effective area (no class 4 part)", "A", c.AreaEffM2, StepUnit.Area, RefRho);
    }

    private static string Show(double v) => Guard.Show(Math.Round(v, 3));
}
