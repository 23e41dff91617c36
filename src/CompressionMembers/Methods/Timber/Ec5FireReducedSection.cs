using System;
using System.Runtime.CompilerServices;
using System.Collections.Generic;
using System.Diagnostics;
using System.Diagnostics.CodeAnalysis;
using CompressionMembers.Actions;
using CompressionMembers.Internal;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods.Common;
using CompressionMembers.Resolution;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using MathNet.Numerics.RootFinding;
using UnitsNet;

namespace CompressionMembers.Methods.Timber;

/// <summary>
/// Fire resistance of a rectangular timber column by the reduced cross-section method of EN 1995-1-2:2004 §4.2.2: the
/// section after a required fire duration loses def = dchar,n + k0 d0 from each exposed face, and the EN 1995-1-1 column
/// and interaction checks (6.3.2, 6.2.4, 6.3.3) are made on the residual section with fire design values.
/// </summary>
/// <remarks>
/// <para>Charring (EN 1995-1-2 3.4.2): dchar,n = βn t (3.2), with the notional charring rate βn of Table 3.1 (softwood solid
/// 0.8, glulam 0.7, LVL 0.7, hardwood 0.7 to 0.55 mm/min by density); the one-dimensional rate β0 is reported for
/// reference. Zero-strength layer k0 d0 with d0 = 7 mm and k0 = t/20 min below 20 min, 1 beyond (4.2.2, Table 4.1,
/// unprotected surfaces).</para>
/// <para>Fire design strength fd,fi = kmod,fi kfi fk / γM,fi (2.1) with kmod,fi = 1.0 (4.2.2(5)), kfi of Table 2.1 (1.25 solid,
/// 1.15 glulam, 1.1 LVL) and γM,fi = 1.0 (2.3(1), recommended; a national annex may change it). The relative slenderness
/// is unchanged by kfi (it scales both strength and stiffness); kh does not raise strengths in fire (the LVL reduction above 300 mm stays).</para>
/// <para>With three sides exposed the residual section's centroid moves by def/2 away from the protected face; the axial
/// load, still on the original axis, then bends the residual section, and this moment is added (conservatively, in
/// absolute value) to the design moment. The actions are the design actions of the fire situation, given by the user.
/// The fire duration at which the utilisation reaches 1 is found by Brent's method (MathNet) when tracing is on, and by
/// <see cref="TimeToFailure"/>. Thread safety: immutable.</para>
/// </remarks>
[Immutable]
public sealed class Ec5FireReducedSection : IResistanceMethod
{
    private const string Name = "EN 1995-1-2 timber column in fire (reduced cross-section)";
    internal const double D0M = 0.007;
    private const string ResRef = "EN 1995-1-2 4.2.2 (4.1)";
    private readonly double _tReqS;
    private readonly double _k0d0;   // k0 d0 at the required time, the constant part of def (4.1)
    private readonly double? _betaNMs;
    private readonly double? _kfi;

    /// <summary>Creates the method.</summary>
    /// <param name="requiredDuration">The required fire resistance time, such as 60 min for R60. Greater than 0 and at most 240 min.</param>
    /// <param name="exposure">Which faces are exposed.</param>
    /// <param name="fireMaterialFactor">γM,fi, between 1 and 2 (recommended 1.0).</param>
    /// <param name="notionalCharringRate">βn, or null for EN 1995-1-2 Table 3.1 by product and density. Greater than 0, at most 2 mm/min.</param>
    /// <param name="kfi">kfi, or null for EN 1995-1-2 Table 2.1 by product. Between 1 and 1.5.</param>
    /// <param name="includeCentroidShift">Whether to add the moment from the shift of the residual centroid when three sides are exposed.</param>
    /// <param name="checkLateralTorsionalBuckling">Whether to check EN 1995-1-1 6.3.3 (6.35) on the residual section.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is undefined, not finite or out of range.</exception>
    public Ec5FireReducedSection(Duration requiredDuration, FireExposure exposure = FireExposure.FourSides, double fireMaterialFactor = 1.0,
        Speed? notionalCharringRate = null, double? kfi = null, bool includeCentroidShift = true, bool checkLateralTorsionalBuckling = true)
    {
        double t = Si.Seconds(requiredDuration, nameof(requiredDuration), "Required fire duration", Si.Sign.Positive);
        if (t > 240 * 60)
            throw new ArgumentOutOfRangeException(nameof(requiredDuration), (double)requiredDuration.Value,
                $"Required fire duration must be at most 240 min; got {Si.Given(requiredDuration)}.");
        if (!Enum.IsDefined(exposure)) throw new ArgumentOutOfRangeException(nameof(exposure), exposure, $"Unknown fire exposure {(int)exposure}.");
        Guard.InRange(fireMaterialFactor, 1.0, 2.0, nameof(fireMaterialFactor), "", "Partial factor in fire γM,fi");
        if (notionalCharringRate is { } s)
        {
            double mmMin = s.MillimetersPerMinutes;
            Guard.Positive(mmMin, nameof(notionalCharringRate), "mm/min", "Notional charring rate βn");
            Guard.InRange(mmMin, 0, 2, nameof(notionalCharringRate), "mm/min", "Notional charring rate βn");
            _betaNMs = s.MetersPerSecond;
        }
        if (kfi is { } k) Guard.InRange(k, 1.0, 1.5, nameof(kfi), "", "Factor kfi");
        _tReqS = t;
        _k0d0 = K0(t) * D0M;
        _kfi = kfi;
        RequiredDuration = requiredDuration;
        Exposure = exposure;
        FireMaterialFactor = fireMaterialFactor;
        IncludesCentroidShift = includeCentroidShift;
        ChecksLateralTorsionalBuckling = checkLateralTorsionalBuckling;
        var settings = new List<MethodSetting>
        {
            new("treq", "required fire resistance time", t, StepUnit.Time, false, "chosen by the designer (R30, R60, R90, …)"),
            new("sides", "faces exposed to fire", exposure == FireExposure.FourSides ? 4 : 3, StepUnit.None, false, "EN 1995-1-2 4.2.2 (chosen by the designer)"),
            new("γM,fi", "partial factor in fire", fireMaterialFactor, StepUnit.None, fireMaterialFactor == 1.0,
                fireMaterialFactor == 1.0 ? "recommended value of EN 1995-1-2 2.3(1); a national annex may change it" : "national-annex or user value replacing EN 1995-1-2 2.3(1)"),
            new("kmod,fi", "modification factor in fire", 1.0, StepUnit.None, true, "EN 1995-1-2 4.2.2(5)"),
            new("d0", "depth of the zero-strength layer", D0M, StepUnit.Length, true, "EN 1995-1-2 4.2.2(1)"),
        };
        if (_betaNMs is { } b) settings.Add(new("βn", "notional charring rate (user value)", b, StepUnit.CharringRate, false, "user value replacing EN 1995-1-2 Table 3.1"));
        if (kfi is { } kv) settings.Add(new("kfi", "20 % fractile factor (user value)", kv, StepUnit.None, false, "user value replacing EN 1995-1-2 Table 2.1"));
        settings.Add(new("shift", "moment from the residual centroid shift (3 sides)", includeCentroidShift ? 1 : 0, StepUnit.Boolean, includeCentroidShift, "common practice (conservative)"));
        Identity = new MethodIdentity(Name, "EN 1995-1-2", "2004", "4.2.2, 3.4.2; EN 1995-1-1 6.3.2", [.. settings]);
    }

    /// <inheritdoc/>
    public MethodIdentity Identity { get; }
    /// <summary>The method in words: <see cref="MethodIdentity.ToString"/> of its <see cref="Identity"/>.</summary>
    /// <returns>The name, standard, edition and clause in one line.</returns>
    public override string ToString() => Identity.ToString();
    /// <summary>The required fire resistance time.</summary>
    public Duration RequiredDuration { get; }
    /// <summary>Which faces are exposed.</summary>
    public FireExposure Exposure { get; }
    /// <summary>γM,fi.</summary>
    public double FireMaterialFactor { get; }
    /// <summary>Whether the moment from the residual centroid shift is added (three sides exposed).</summary>
    public bool IncludesCentroidShift { get; }
    /// <summary>Whether 6.3.3 is checked on the residual section.</summary>
    public bool ChecksLateralTorsionalBuckling { get; }

    /// <inheritdoc/>
    // Inlined into Check's loop: the test in line, the sentences in Refusal. (Moving the test into the kernel, with the
    // material type-tested once, was measured and rejected: a loop that had checked another method first ran at twice the
    // hand-written loop; docs/performance.md, fourth round.)
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions) =>
        Covers(member, actions, out _) ? Applicability.Applicable : Refusal(member, actions);

    /// <summary>What <see cref="AppliesTo"/> admits, as one test without sentences: a European timber material, a solid
    /// rectangle, no initial bow, and a charring rate (given, or from Table 3.1 for the product and density).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private bool Covers(in ResolvedMember member, in ResolvedActions actions, [NotNullWhen(true)] out TimberMaterial? mat)
    {
        mat = member.Material as TimberMaterial;
        // The material holds NaN for βn where Table 3.1 does not cover its product and density.
        return mat is not null && member.SectionKind == SectionKind.SolidRectangle && !actions.HasInitialBowY && !actions.HasInitialBowZ
            && (_betaNMs is not null || !double.IsNaN(mat.NotionalCharringRateMs));
    }

    // The sentence for what Covers refused, rule by rule in the order a user fixes them; formed only when refused.
    [MethodImpl(MethodImplOptions.NoInlining)]
    private Applicability Refusal(in ResolvedMember member, in ResolvedActions actions)
    {
        var v = TimberRules.EuropeanMaterial(member, Name);
        if (!v.IsApplicable) return v;
        v = TimberRules.SolidSection(member, Name, allowCircle: false);
        if (!v.IsApplicable) return v;
        v = TimberRules.NoInitialBow(actions, Name);
        if (!v.IsApplicable) return v;
        var mat = (TimberMaterial)member.Material;
        if (_betaNMs is null && En1995Factors.CharringCoverage(mat.Product, mat.RhokKgM3) is { } why) return Applicability.NotApplicable(why);
        throw new UnreachableException("Covers refused what every rule admits.");   // the two lists must agree
    }

    /// <summary>k0 of EN 1995-1-2 Table 4.1 for unprotected surfaces: t/20 min below 20 min, 1 beyond.</summary>
    internal static double K0(double tS) => tS < 1200 ? tS / 1200 : 1.0;

    /// <summary>Effective charring depth def = βn t + k0 d0 (4.1).</summary>
    internal static double EffectiveDepth(double tS, double betaNMs) => betaNMs * tS + K0(tS) * D0M;

    // βn of Table 3.1 was read once with the material (the same operations); AppliesTo refused a material it does not cover.
    private double BetaN(TimberMaterial m) => _betaNMs ?? m.NotionalCharringRateMs;

    private double Kfi(TimberMaterial m) => _kfi ?? m.FireFractileFactor;   // Table 2.1, read once with the material

    /// <summary>Residual width and depth, and the centroid shifts along z and y, after the effective depth def.</summary>
    internal static void Residual(FireExposure e, double bM, double hM, double defM, out double bFi, out double hFi, out double shiftZ, out double shiftY)
    {
        shiftZ = shiftY = 0;
        switch (e)
        {
            case FireExposure.ThreeSidesWidthFaceProtected:
                bFi = bM - 2 * defM; hFi = hM - defM; shiftZ = defM / 2; break;
            case FireExposure.ThreeSidesDepthFaceProtected:
                bFi = bM - defM; hFi = hM - 2 * defM; shiftY = defM / 2; break;
            default:
                bFi = bM - 2 * defM; hFi = hM - 2 * defM; break;
        }
    }

    /// <summary>Fills the kernel input for fire time t; returns false when the section has burnt away.</summary>
    private bool Input(in ResolvedMember member, in ResolvedActions actions, TimberMaterial mat, double tS, ref Ec5Input i,
        out double defM, out double bFi, out double hFi, out double shiftZ, out double shiftY)
    {
        Ec5ColumnStability.Geometry(member, mat, ref i);
        double b = i.BM, h = i.HM;
        defM = EffectiveDepth(tS, BetaN(mat));
        Residual(Exposure, b, h, defM, out bFi, out hFi, out shiftZ, out shiftY);
        i.Kmod = Kfi(mat);      // kmod,fi (= 1.0) × kfi: fd,fi = kmod,fi kfi fk / γM,fi (2.1)
        i.GammaM = FireMaterialFactor;
        i.NEdN = actions.AxialForceN;
        double n = actions.AxialForceN;
        i.MyEdNm = TimberRules.MomentY(actions) + (IncludesCentroidShift ? n * shiftZ : 0);
        i.MzEdNm = TimberRules.MomentZ(actions) + (IncludesCentroidShift ? n * shiftY : 0);
        i.CheckLtb = ChecksLateralTorsionalBuckling;
        if (!(bFi > 0) || !(hFi > 0)) return false;
        i.BM = bFi; i.HM = hFi;
        i.AreaM2 = bFi * hFi;
        i.IyM4 = bFi * hFi * hFi * hFi / 12;
        i.IzM4 = hFi * bFi * bFi * bFi / 12;
        i.WyM3 = bFi * hFi * hFi / 6;
        i.WzM3 = hFi * bFi * bFi / 6;
        i.KhY = i.KhZ = 1.0;
        if (i.MyEdNm != 0 || i.MzEdNm != 0)
        {
            // kh is not used to raise strengths in fire; a reduction (LVL deeper than 300 mm) is kept, on the residual
            // depth. Only bending reads kh and the torsion constant (lateral torsional buckling), so pure compression skips
            // their powers and series.
            i.KhY = Math.Min(Ec5ColumnStability.SizeFactor(mat, true, hFi), 1.0);
            i.KhZ = Math.Min(Ec5ColumnStability.SizeFactor(mat, true, bFi), 1.0);
            i.TorsionM4 = RectangleSection.TorsionConstantOf(bFi, hFi);
        }
        i.LambdaY = ResidualSlenderness(i.LefYM, hFi);   // the residual section's radius of gyration
        i.LambdaZ = ResidualSlenderness(i.LefZM, bFi);
        i.LambdaRelY = i.LambdaY * mat.SlendernessRootOverPi;   // (6.21) on the residual section
        i.LambdaRelZ = i.LambdaZ * mat.SlendernessRootOverPi;
        return true;
    }

    private static readonly double Sqrt12 = Math.Sqrt(12);

    /// <summary>Slenderness Lef / i of the residual rectangle across the side <paramref name="sideM"/>: i = √(I / A) =
    /// side / √12, formed as Lef √12 / side — one division where √(I / A) takes two and a square root, on the chain of
    /// dependent operations that every fire check waits for.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static double ResidualSlenderness(double lefM, double sideM) => lefM * Sqrt12 / sideM;

    /// <summary>Elastic critical force of the residual section with the 20 % fractile modulus, Ncr = π² E20 A / λ² (= π² E20 I / Lef²,
    /// as λ² = Lef² A / I): one division where π² E I / Lef² with I = b h³ / 12 takes two.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static double CriticalForce(double e20Pa, double areaM2, double slenderness) =>
        Math.PI * Math.PI * e20Pa * areaM2 / (slenderness * slenderness);

    /// <summary>Utilisation at fire time t (+∞ once the section has burnt away).</summary>
    private double UtilisationAt(in ResolvedMember member, in ResolvedActions actions, TimberMaterial mat, double tS)
    {
        var i = default(Ec5Input);
        if (!Input(member, actions, mat, tS, ref i, out _, out _, out _, out _, out _)) return double.PositiveInfinity;
        Ec5Kernel.Run(i, out var o);
        return o.Utilisation;
    }

    /// <inheritdoc/>
    public CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace)
    {
        Unsafe.SkipInit(out CheckNumbers numbers);
        string? check = Numbers(member, actions, (TimberMaterial)member.Material, ref numbers);
        if (check is null) return EvaluateGeneral(member, actions, trace);
        if (trace is not null) TraceCompression(trace, member, actions);
        return numbers.ToResult(member, actions, this, check, trace);
    }

    /// <summary>Whether the straight-line compression path applies (no eccentricity, no end moments, no moment from a
    /// centroid shift); <see cref="Numbers"/> then takes <see cref="CompressionNumbers"/>.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal bool IsPureCompression(in ResolvedActions actions) =>
        !(actions.HasEccentricity || actions.HasEndMoments || (IncludesCentroidShift && Exposure != FireExposure.FourSides));

    /// <summary>The straight-line path's numbers, or null with moments, once the section has burnt away, or for numbers a
    /// result refuses (then <see cref="EvaluateGeneral"/>, which reports either). For a member the method applies to;
    /// <see cref="Check"/> calls it for untraced checks (through <see cref="ApplicableNumbers"/>) and builds the result
    /// itself.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal string? Numbers(in ResolvedMember member, in ResolvedActions actions, TimberMaterial mat, ref CheckNumbers numbers) =>
        IsPureCompression(actions) ? CompressionNumbers(member, actions, mat, ref numbers) : null;

    /// <summary>The applicability test and <see cref="Numbers"/> in one pass, for <see cref="Check"/>'s untraced checks: the
    /// material that <see cref="Covers"/> type-tested is handed to the kernel as it is, instead of being read from the member
    /// and type-tested a second time. <paramref name="verdict"/> is what <see cref="AppliesTo"/> returns.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal string? ApplicableNumbers(in ResolvedMember member, in ResolvedActions actions, ref CheckNumbers numbers, out Applicability verdict)
    {
        if (!Covers(member, actions, out TimberMaterial? mat))
        {
            verdict = Refusal(member, actions);
            return null;
        }
        verdict = Applicability.Applicable;
        return Numbers(member, actions, mat, ref numbers);
    }

    /// <summary>The compression path's numbers; returns the governing check's words, or null when the residual section has
    /// burnt away or the numbers are ones a result refuses (the general path reports either).</summary>
    // Pure compression of the residual section (no eccentricity, no end moments, no centroid shift): straight on scalars
    // with the kernel's compression core, the same operations as the general path (a test holds them bit for bit). The
    // traced and untraced checks both take it. It calls nothing: the steps are written after it (TraceCompression, in
    // Evaluate) and broken numbers go to the general path, which throws; so no value here is live across a call (every
    // vector register is the caller's to save on x64 Unix: such values were stored to the stack on every check, traced or
    // not) and no callee-saved register is saved and restored (docs/performance.md, fourth round).
    [MethodImpl(MethodImplOptions.NoInlining)]
    internal string? CompressionNumbers(in ResolvedMember member, in ResolvedActions actions, TimberMaterial mat, ref CheckNumbers numbers)
    {
        TimberRules.Dimensions(member, out double b, out double h);
        double def = BetaN(mat) * _tReqS + _k0d0;   // (4.1): def = βn t + k0 d0, with k0 d0 formed once with the method
        Residual(Exposure, b, h, def, out double bFi, out double hFi, out _, out _);
        if (!(bFi > 0) || !(hFi > 0)) return null;
        double a = bFi * hFi;
        double lefY = member.EffectiveLengthYM, lefZ = member.EffectiveLengthZM;
        double lamY = ResidualSlenderness(lefY, hFi), lamZ = ResidualSlenderness(lefZ, bFi);   // the residual section's slenderness
        // (6.21), (6.22): λ × (√(fc,0,k / E0,05) / π), the material's factor formed once — one multiplication after λ on the
        // chain every fire check waits for, where λ / π × √(…) put a division there (docs/performance.md, thirteenth round).
        double lrY = lamY * mat.SlendernessRootOverPi, lrZ = lamZ * mat.SlendernessRootOverPi;
        double kfi = Kfi(mat);
        // EN 1995-1-2 (2.1) with kmod,fi = 1: fd,fi = kfi fk / γM,fi, and the 20 % fractile modulus kfi E0,05 / γM,fi. Division
        // by the recommended γM,fi = 1 is exact (x / 1 = x), so it is skipped: the same bits, two divisions fewer per check.
        double gammaFi = FireMaterialFactor, fd = kfi * member.StrengthPa, e20 = kfi * member.ElasticModulusPa;
        if (gammaFi != 1.0) { fd /= gammaFi; e20 /= gammaFi; }
        double sigma = actions.AxialForceN / a;
        Ec5Kernel.Compression(lrY, lrZ, mat.StraightnessFactor, fd, sigma, a,
            out _, out _, out double kcY, out double kcZ, out double uY, out double uZ, out double resistance);
        bool aboutY = uY >= uZ;
        double u = Math.Max(uY, uZ);
        if (CheckResult.IsBroken(resistance, u)) return null;   // the general path computes the same and refuses them
        double kcGov = aboutY ? kcY : kcZ;
        numbers.DesignResistanceN = resistance;
        numbers.Utilisation = u;
        numbers.GoverningAxis = aboutY ? BucklingAxis.Y : BucklingAxis.Z;
        numbers.GoverningMode = kcGov >= 1.0 ? FailureMode.Yielding : FailureMode.FlexuralBuckling;
        numbers.AboutY = new AxisOutcome(lefY, lamY, lrY, CriticalForce(e20, a, lamY), kcY, kcY * fd * a);
        numbers.AboutZ = new AxisOutcome(lefZ, lamZ, lrZ, CriticalForce(e20, a, lamZ), kcZ, kcZ * fd * a);
        numbers.Torsional = default;
        return aboutY ? CheckCompressionY : CheckCompressionZ;
    }

    /// <summary>The steps of the compression path, written after its numbers: the general path's records for the same
    /// member and actions (Input and the kernel, the same operations as <see cref="CompressionNumbers"/>;
    /// FastPathEquivalenceTests holds the two paths bit for bit, steps included).</summary>
    [MethodImpl(MethodImplOptions.NoInlining)]
    private void TraceCompression(CalculationTrace trace, in ResolvedMember member, in ResolvedActions actions)
    {
        var mat = (TimberMaterial)member.Material;
        var i = default(Ec5Input);
        Input(member, actions, mat, _tReqS, ref i, out double def, out double bFi, out double hFi, out _, out _);
        Ec5Kernel.Run(i, out var o);
        WriteTrace(trace, member, actions, mat, i, o, true, def, bFi, hFi, 0, 0);
    }

    private const string CheckCompressionY = "EN 1995-1-2 4.2.2 with EN 1995-1-1 6.3.2: residual section, buckling about y";
    private const string CheckCompressionZ = "EN 1995-1-2 4.2.2 with EN 1995-1-1 6.3.2: residual section, buckling about z";

    // Not inlined, for the reason given at Ec5ColumnStability.BendingNumbers (a large path pulled into a caller's loop
    // spends the caller's inlining budget).
    [MethodImpl(MethodImplOptions.NoInlining)]
    internal CheckResult EvaluateGeneral(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace)
    {
        var mat = (TimberMaterial)member.Material;
        var i = default(Ec5Input);
        bool alive = Input(member, actions, mat, _tReqS, ref i, out double def, out double bFi, out double hFi, out double shZ, out double shY);
        var o = default(Ec5Output);
        if (alive) Ec5Kernel.Run(i, out o);

        // The steps are written by a separate method (cold code) that receives the values computed above, so that the
        // untraced frame stays small.
        if (trace is not null) WriteTrace(trace, member, actions, mat, i, o, alive, def, bFi, hFi, shZ, shY);

        if (!alive)
            return new CheckResult(member, actions, this, 0, double.PositiveInfinity, BucklingAxis.None, FailureMode.Yielding,
                "EN 1995-1-2 4.2.2: no residual cross-section at the required time", default, default, default, trace);
        double e20 = Kfi(mat) * i.E005Pa / FireMaterialFactor;
        return new CheckResult(member, actions, this, o.ResistanceN, o.Utilisation, Ec5Kernel.Axis(o), Ec5Kernel.Mode(o), FireCheckName(o),
            new AxisOutcome(i.LefYM, o.LambdaY, o.LambdaRelY, CriticalForce(e20, i.AreaM2, o.LambdaY), o.KcY, o.KcY * o.Fc0dPa * i.AreaM2),
            new AxisOutcome(i.LefZM, o.LambdaZ, o.LambdaRelZ, CriticalForce(e20, i.AreaM2, o.LambdaZ), o.KcZ, o.KcZ * o.Fc0dPa * i.AreaM2),
            o.LtbChecked ? new AxisOutcome(i.LefLtbM, double.NaN, o.LambdaRelM, double.NaN, o.KCrit, double.NaN) : default, trace);
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private void WriteTrace(CalculationTrace trace, in ResolvedMember member, in ResolvedActions actions, TimberMaterial mat,
        in Ec5Input i, in Ec5Output o, bool alive, double def, double bFi, double hFi, double shZ, double shY)
    {
        string src = mat.Source;
        TimberRules.Dimensions(member, out double b, out double h);
        trace.Note($"{mat.Name}: {TimberRules.ProductText(mat.Product)}; characteristic values from the source cited.", src);
        trace.Add("fc,0,k", "characteristic compression strength parallel to grain", TimberRules.Input, member.StrengthPa, StepUnit.Stress, src);
        trace.Add("fm,k", "characteristic bending strength", TimberRules.Input, mat.BendingStrength.Pascals, StepUnit.Stress, src);
        trace.Add("E0,05", "fifth-percentile modulus parallel to grain", TimberRules.Input, member.ElasticModulusPa, StepUnit.Stress, src);
        TraceCommon.SectionAndLengths(trace, member);
        trace.Add("b", "width (along y)", TimberRules.Input, b, StepUnit.Length, "section");
        trace.Add("h", "depth (along z)", TimberRules.Input, h, StepUnit.Length, "section");
        trace.Add("treq", "required fire resistance time", TimberRules.Input, _tReqS, StepUnit.Time, "fire requirement");
        trace.Note(Exposure switch
        {
            FireExposure.FourSides => "Four faces exposed to fire.",
            FireExposure.ThreeSidesWidthFaceProtected => "Three faces exposed; one width face (normal to z) protected.",
            _ => "Three faces exposed; one depth face (normal to y) protected.",
        }, "EN 1995-1-2 4.2.2");
        double rhok = mat.CharacteristicDensity.KilogramsPerCubicMeter;
        if (En1995Factors.CharringCoverage(mat.Product, rhok) is null)
            trace.Add("β0", "one-dimensional design charring rate (for reference)", "Table 3.1", En1995Factors.CharringRateMmPerMin(mat.Product, rhok, false) / 60000.0, StepUnit.CharringRate, En1995Factors.CharringRef);
        trace.Add("βn", "notional design charring rate (includes corner rounding)", _betaNMs is null ? "Table 3.1: " + TimberRules.ProductText(mat.Product) : "user value", BetaN(mat), StepUnit.CharringRate, _betaNMs is null ? En1995Factors.CharringRef : "user value");
        trace.Add("dchar,n", "notional charring depth", "βn t", BetaN(mat) * _tReqS, StepUnit.Length, "EN 1995-1-2 3.4.2 (3.2)");
        trace.Add("k0", "zero-strength layer factor", _tReqS < 1200 ? "t / 20 min" : "1 (t ≥ 20 min)", K0(_tReqS), StepUnit.None, "EN 1995-1-2 4.2.2, Table 4.1");
        trace.Add("d0", "depth of the zero-strength layer", "7 mm", D0M, StepUnit.Length, "EN 1995-1-2 4.2.2(1)");
        trace.Add("def", "effective charring depth", "dchar,n + k0 d0", def, StepUnit.Length, ResRef);
        trace.Add("b,fi", "residual width", Exposure == FireExposure.ThreeSidesDepthFaceProtected ? "b − def" : "b − 2 def", bFi, StepUnit.Length, ResRef);
        trace.Add("h,fi", "residual depth", Exposure == FireExposure.ThreeSidesWidthFaceProtected ? "h − def" : "h − 2 def", hFi, StepUnit.Length, ResRef);
        trace.Add("kfi", "20 % fractile factor", _kfi is null ? "Table 2.1: " + TimberRules.ProductText(mat.Product) : "user value", Kfi(mat), StepUnit.None, _kfi is null ? En1995Factors.KfiRef : "user value");
        trace.Add("kmod,fi", "modification factor in fire", "1.0", 1.0, StepUnit.None, "EN 1995-1-2 4.2.2(5)");
        trace.Add("γM,fi", "partial factor in fire", FireMaterialFactor == 1.0 ? "recommended value" : "national-annex or user value", FireMaterialFactor, StepUnit.None, "EN 1995-1-2 2.3(1)");
        TimberRules.Actions(trace, actions, TimberRules.MomentY(actions), TimberRules.MomentZ(actions));
        if (IncludesCentroidShift && (shZ != 0 || shY != 0))
        {
            trace.Add("Δz", "shift of the residual centroid along z", "def / 2", shZ, StepUnit.Length, "common practice (three sides exposed)");
            trace.Add("Δy", "shift of the residual centroid along y", "def / 2", shY, StepUnit.Length, "common practice (three sides exposed)");
            trace.Add("My,Ed,fi", "design moment about y on the residual section", "My,Ed + NEd Δz", i.MyEdNm, StepUnit.Moment, "common practice (conservative)");
            trace.Add("Mz,Ed,fi", "design moment about z on the residual section", "Mz,Ed + NEd Δy", i.MzEdNm, StepUnit.Moment, "common practice (conservative)");
        }
        if (alive)
        {
            trace.Add("A,fi", "residual area", "b,fi h,fi", i.AreaM2, StepUnit.Area, ResRef);
            trace.Add("Iy,fi", "residual second moment about y", "b,fi h,fi³ / 12", i.IyM4, StepUnit.SecondMoment, ResRef);
            trace.Add("Iz,fi", "residual second moment about z", "h,fi b,fi³ / 12", i.IzM4, StepUnit.SecondMoment, ResRef);
            // The slenderness below is of the residual section; its radii of gyration are printed so that a checker sees
            // that the gross iy, iz listed above are not the ones used.
            trace.Add("iy,fi", "residual radius of gyration about y", "√(Iy,fi / A,fi)", Math.Sqrt(i.IyM4 / i.AreaM2), StepUnit.Length, ResRef);
            trace.Add("iz,fi", "residual radius of gyration about z", "√(Iz,fi / A,fi)", Math.Sqrt(i.IzM4 / i.AreaM2), StepUnit.Length, ResRef);
            trace.Note("The EN 1995-1-1 checks follow on the residual section with fire design values (no kh increase).", "EN 1995-1-2 4.2.2(2)");
            Ec5Trace.Write(trace, i, o, ",fi");
        }
        else
        {
            trace.Note("The residual section has burnt away before the required time: the member fails.", ResRef);
            trace.Add("u", "utilisation", "no residual section", double.PositiveInfinity, StepUnit.None, ResRef);
        }
        double tFail = TimeToFailureS(member, actions, mat);
        trace.Add("t(u=1)", "fire duration at which the utilisation reaches 1", "root of u(t) = 1 (Brent's method)", tFail, StepUnit.Time, "EN 1995-1-2 4.2.2; MathNet.Numerics Brent");
    }

    private static string FireCheckName(in Ec5Output o) => o.Governs switch
    {
        Governing.Ltb => "EN 1995-1-2 4.2.2 with EN 1995-1-1 (6.35): residual section, lateral torsional buckling",
        Governing.AboutY when !o.Bending => CheckCompressionY,
        Governing.AboutZ when !o.Bending => CheckCompressionZ,
        Governing.AboutY => o.Stocky ? "EN 1995-1-2 4.2.2 with EN 1995-1-1 (6.19): residual section" : "EN 1995-1-2 4.2.2 with EN 1995-1-1 (6.23): residual section",
        _ => o.Stocky ? "EN 1995-1-2 4.2.2 with EN 1995-1-1 (6.20): residual section" : "EN 1995-1-2 4.2.2 with EN 1995-1-1 (6.24): residual section",
    };

    /// <summary>The fire duration at which the utilisation reaches 1 for this exposure and these fire-situation actions.</summary>
    /// <param name="member">The member.</param>
    /// <param name="actions">The design actions in the fire situation.</param>
    /// <returns>The duration (zero if the member fails at the start of the fire).</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="MethodNotApplicableException">The method does not cover the member or actions.</exception>
    public Duration TimeToFailure(Member member, DesignActions actions)
    {
        ArgumentNullException.ThrowIfNull(member);
        ArgumentNullException.ThrowIfNull(actions);
        var rm = ResolvedMember.From(member);
        var ra = ResolvedActions.From(actions);
        var verdict = AppliesTo(rm, ra);
        if (!verdict.IsApplicable) throw new MethodNotApplicableException(this, member, verdict.Reason!);
        return Duration.FromMinutes(TimeToFailureS(rm, ra, (TimberMaterial)member.Material) / 60);
    }

    private double TimeToFailureS(in ResolvedMember member, in ResolvedActions actions, TimberMaterial mat)
    {
        double u0 = UtilisationAt(member, actions, mat, 0);
        if (u0 >= 1) return 0;
        // The section vanishes when def reaches the smaller of the limits below; just before it the utilisation is unbounded.
        TimberRules.Dimensions(member, out double b, out double h);
        double defMax = Exposure switch
        {
            FireExposure.ThreeSidesWidthFaceProtected => Math.Min(b / 2, h),
            FireExposure.ThreeSidesDepthFaceProtected => Math.Min(b, h / 2),
            _ => Math.Min(b, h) / 2,
        };
        double beta = BetaN(mat);
        double tMax = defMax >= beta * 1200 + D0M ? (defMax - D0M) / beta : defMax / (beta + D0M / 1200);
        var s = t_state ??= new FireState();
        s.Set(this, member, actions, mat);
        var f = t_function ??= s.Residual;
        try
        {
            // MathNet stops when |f| or the bracket falls below the accuracy: 1e-9 on u − 1 is far below any design need.
            return Brent.FindRoot(f, 0, tMax * (1 - 1e-9), 1e-9, 200);
        }
        finally
        {
            s.Clear();
        }
    }

    // MathNet's Brent takes a delegate: one cached delegate per thread reads its inputs from a per-thread state object.
    [ThreadStatic] private static FireState? t_state;
    [ThreadStatic] private static Func<double, double>? t_function;

    private sealed class FireState
    {
        private Ec5FireReducedSection? _method;
        private ResolvedMember _member;
        private ResolvedActions _actions;
        private TimberMaterial? _mat;

        internal void Set(Ec5FireReducedSection method, in ResolvedMember m, in ResolvedActions a, TimberMaterial mat)
        {
            _method = method; _member = m; _actions = a; _mat = mat;
        }

        internal void Clear() { _method = null; _member = default; _actions = default; _mat = null; }

        internal double Residual(double tS)
        {
            double u = _method!.UtilisationAt(_member, _actions, _mat!, tS);
            return double.IsPositiveInfinity(u) ? 1e6 : u - 1;
        }
    }
}
