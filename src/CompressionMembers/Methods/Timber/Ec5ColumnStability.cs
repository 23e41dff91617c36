using System;
using System.Collections.Generic;
using System.Runtime.CompilerServices;
using CompressionMembers.Actions;
using CompressionMembers.Internal;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods.Common;
using CompressionMembers.Resolution;
using CompressionMembers.Results;
using CompressionMembers.Sections;

namespace CompressionMembers.Methods.Timber;

/// <summary>
/// Timber columns to EN 1995-1-1:2004+A2:2014 (Eurocode 5): column stability (6.3.2) with compression and bending
/// (6.19/6.20 when λrel ≤ 0.3 about both axes, 6.23/6.24 otherwise) and lateral torsional stability of a member bent
/// about its strong axis (6.3.3, 6.35).
/// </summary>
/// <remarks>
/// <para>Design strengths fc,0,d = kmod fc,0,k / γM and fm,d = kmod kh fm,k / γM (2.14), with kmod from Table 3.1 by service
/// class and the load-duration class of the actions, γM from Table 2.3 (recommended values: 1.3 solid, 1.25 glulam,
/// 1.2 LVL) and kh from 3.2 (3.1), 3.3 (3.2) or 3.4 (3.3) on the depth in bending. γM and kmod can be overridden for a
/// national annex; the identity's settings and the trace say which values were used.</para>
/// <para>Design moments are first order at the governing section: σm,d = (|NEd e| + max |M,end|) / W; the column effect
/// is covered by kc. Lateral torsional buckling uses the member's twist restraint as Lef (EN 1995-1-1 Table 6.1: 1.0 ×
/// span for a constant moment), (6.32) for solid softwood rectangles and (6.31) otherwise with G0,05 = Gmean E0,05/E0,mean.</para>
/// <para>Applies to <see cref="TimberMaterial"/> on solid rectangular or circular sections (lateral torsional buckling on
/// rectangles only). System strength ksys is not applied. Thread safety: immutable.</para>
/// </remarks>
[Immutable]
public sealed class Ec5ColumnStability : IResistanceMethod
{
    private const string Name = "EN 1995-1-1 timber column";
    private readonly double? _gammaM;
    private readonly double? _kmod;

    /// <summary>Creates the method.</summary>
    /// <param name="serviceClass">The service class (sets kmod).</param>
    /// <param name="materialFactor">γM for every product, or null for the recommended values of Table 2.3 by product.
    /// Between 1 and 2.</param>
    /// <param name="modificationFactor">kmod, or null for Table 3.1 by service class and load duration. Greater than 0
    /// and at most 1.5.</param>
    /// <param name="applySizeFactor">Whether to raise fm,k by kh for depths below the reference depth (3.2(3), 3.3(3), 3.4(3));
    /// the reduction of LVL deeper than 300 mm (3.4(3)) applies either way.</param>
    /// <param name="checkLateralTorsionalBuckling">Whether to check 6.3.3 (6.35) when there is bending about y.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is undefined, not finite or out of range.</exception>
    public Ec5ColumnStability(ServiceClass serviceClass = ServiceClass.Class1, double? materialFactor = null, double? modificationFactor = null,
        bool applySizeFactor = true, bool checkLateralTorsionalBuckling = true)
    {
        if (!Enum.IsDefined(serviceClass)) throw new ArgumentOutOfRangeException(nameof(serviceClass), serviceClass, $"Unknown service class {(int)serviceClass}.");
        if (materialFactor is { } g) Guard.InRange(g, 1.0, 2.0, nameof(materialFactor), "", "Partial factor γM");
        if (modificationFactor is { } k)
        {
            Guard.Positive(k, nameof(modificationFactor), "", "Modification factor kmod");
            Guard.InRange(k, 0, 1.5, nameof(modificationFactor), "", "Modification factor kmod");
        }
        ServiceClass = serviceClass;
        _gammaM = materialFactor;
        _kmod = modificationFactor;
        ApplySizeFactor = applySizeFactor;
        ChecksLateralTorsionalBuckling = checkLateralTorsionalBuckling;
        Identity = new MethodIdentity(Name, "EN 1995-1-1", "2004+A2:2014", "6.3.2, 6.3.3, 6.2.4", Settings(serviceClass, materialFactor, modificationFactor, applySizeFactor, checkLateralTorsionalBuckling));
    }

    private static MethodSetting[] Settings(ServiceClass sc, double? g, double? k, bool kh, bool ltb)
    {
        var list = new List<MethodSetting>
        {
            new("SC", "service class (1, 2 or 3)", (int)sc + 1, StepUnit.None, false, "EN 1995-1-1 2.3.1.3 (chosen by the designer)"),
        };
        if (g is { } gv)
            list.Add(new("γM", "partial factor for material (all products)", gv, StepUnit.None, false, "national-annex or user value, replacing EN 1995-1-1 Table 2.3"));
        else
        {
            list.Add(new("γM,solid", "partial factor, solid timber", 1.3, StepUnit.None, true, "recommended value of EN 1995-1-1 Table 2.3; a national annex may change it"));
            list.Add(new("γM,glulam", "partial factor, glued laminated timber", 1.25, StepUnit.None, true, "recommended value of EN 1995-1-1 Table 2.3; a national annex may change it"));
            list.Add(new("γM,LVL", "partial factor, LVL", 1.2, StepUnit.None, true, "recommended value of EN 1995-1-1 Table 2.3; a national annex may change it"));
        }
        if (k is { } kv)
            list.Add(new("kmod", "modification factor (fixed)", kv, StepUnit.None, false, "user value, replacing EN 1995-1-1 Table 3.1"));
        list.Add(new("kh", "size factor applied", kh ? 1 : 0, StepUnit.Boolean, kh, "EN 1995-1-1 3.2(3), 3.3(3), 3.4(3) permit it"));
        list.Add(new("6.3.3", "lateral torsional buckling checked", ltb ? 1 : 0, StepUnit.Boolean, ltb, "EN 1995-1-1 6.3.3"));
        return [.. list];
    }

    /// <inheritdoc/>
    public MethodIdentity Identity { get; }
    /// <summary>The method in words: <see cref="MethodIdentity.ToString"/> of its <see cref="Identity"/>.</summary>
    /// <returns>The name, standard, edition and clause in one line.</returns>
    public override string ToString() => Identity.ToString();

    /// <summary>The service class.</summary>
    public ServiceClass ServiceClass { get; }

    /// <summary>The γM override, or null for Table 2.3.</summary>
    public double? MaterialFactor => _gammaM;

    /// <summary>The kmod override, or null for Table 3.1.</summary>
    public double? ModificationFactor => _kmod;

    /// <summary>Whether kh is applied.</summary>
    public bool ApplySizeFactor { get; }

    /// <summary>Whether 6.3.3 is checked.</summary>
    public bool ChecksLateralTorsionalBuckling { get; }

    /// <inheritdoc/>
    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions)
    {
        var v = TimberRules.EuropeanMaterial(member, Name);
        if (!v.IsApplicable) return v;
        v = TimberRules.SolidSection(member, Name, allowCircle: true);
        if (!v.IsApplicable) return v;
        v = TimberRules.NoInitialBow(actions, Name);
        if (!v.IsApplicable) return v;
        return _kmod is null ? TimberRules.Duration(actions, Name, "kmod (EN 1995-1-1 Table 3.1)") : Applicability.Applicable;
    }

    /// <summary>The size factor kh of EN 1995-1-1 3.2 (3.1), 3.3 (3.2) or 3.4 (3.3) for a depth in bending.</summary>
    internal static double SizeFactor(TimberMaterial m, bool rectangular, double depthM)
    {
        if (!rectangular) return 1.0;
        switch (m.Product)
        {
            case TimberProduct.SolidSoftwood or TimberProduct.SolidHardwood:
                if (m.RhokKgM3 > 700 || depthM >= 0.150) return 1.0;
                return Math.Min(Math.Pow(0.150 / depthM, 0.2), 1.3);
            case TimberProduct.GlulamHomogeneous or TimberProduct.GlulamCombined:
                if (depthM >= 0.600) return 1.0;
                return Math.Min(Math.Pow(0.600 / depthM, 0.1), 1.1);
            default:
                // LVL: 3.4(3) applies to every depth other than 300 mm, so deeper sections are reduced (kh < 1).
                return Math.Min(Math.Pow(0.300 / depthM, m.SizeEffectExponent), 1.2);
        }
    }

    // kh of a member about y (on its depth h) or z (on its width b): the same operations as SizeFactor on Geometry's values.
    private static readonly Func<Member, bool, double> MemberSizeFactor = static (m, aboutY) => ResolvedSizeFactor(m.Resolved, aboutY);

    private static double ResolvedSizeFactor(in ResolvedMember r, bool aboutY)
    {
        TimberRules.Dimensions(r, out double b, out double h);
        return SizeFactor((TimberMaterial)r.Material, r.SectionKind == SectionKind.SolidRectangle, aboutY ? h : b);
    }

    /// <summary>The rule <see cref="SizeFactor"/> applied, in words for the trace (the same branches).</summary>
    internal static string SizeFactorRule(TimberMaterial m, bool rectangular, double depthM, string dim)
    {
        if (!rectangular) return "1 (the size factor is given for rectangular sections)";
        return m.Product switch
        {
            TimberProduct.SolidSoftwood or TimberProduct.SolidHardwood => m.RhokKgM3 > 700 ? "1 (ρk > 700 kg/m³)"
                : depthM >= 0.150 ? $"1 ({dim} ≥ 150 mm)" : $"min((150 / {dim})^0.2, 1.3)",
            TimberProduct.GlulamHomogeneous or TimberProduct.GlulamCombined => depthM >= 0.600 ? $"1 ({dim} ≥ 600 mm)" : $"min((600 / {dim})^0.1, 1.1)",
            _ => $"min((300 / {dim})^s, 1.2)",
        };
    }

    internal static string SizeFactorRef(TimberProduct p) => p switch
    {
        TimberProduct.SolidSoftwood or TimberProduct.SolidHardwood => "EN 1995-1-1 3.2(3) (3.1)",
        TimberProduct.GlulamHomogeneous or TimberProduct.GlulamCombined => "EN 1995-1-1 3.3(3) (3.2)",
        _ => "EN 1995-1-1 3.4(3) (3.3)",
    };

    /// <summary>Fills the geometry and material part of the kernel input shared with the fire method.</summary>
    internal static void Geometry(in ResolvedMember member, TimberMaterial mat, ref Ec5Input i)
    {
        i.Rectangular = member.SectionKind == SectionKind.SolidRectangle;
        TimberRules.Dimensions(member, out i.BM, out i.HM);
        i.AreaM2 = member.AreaM2;
        i.IyM4 = member.SecondMomentYM4;
        i.IzM4 = member.SecondMomentZM4;
        i.WyM3 = TimberRules.ModulusY(member);
        i.WzM3 = TimberRules.ModulusZ(member);
        i.TorsionM4 = member.TorsionConstantM4;
        i.LefYM = member.EffectiveLengthYM;
        i.LefZM = member.EffectiveLengthZM;
        i.LefLtbM = member.EffectiveLengthTorsionalM;
        i.LambdaY = member.SlendernessY;
        i.LambdaZ = member.SlendernessZ;
        i.LambdaRelY = member.RelativeSlendernessY;   // λ/π √(fc,0,k / E0,05), resolved with the member
        i.LambdaRelZ = member.RelativeSlendernessZ;
        i.Fc0kPa = member.StrengthPa;
        i.FmkPa = mat.FmkPa;
        i.E005Pa = member.ElasticModulusPa;
        i.GMeanPa = mat.GMeanPa;
        i.E0MeanPa = mat.E0MeanPa;
        i.BetaC = mat.StraightnessFactor;
        i.Km = i.Rectangular ? 0.7 : 1.0;
        i.UseSoftwoodLtbFormula = mat.Product == TimberProduct.SolidSoftwood;
    }

    /// <inheritdoc/>
    public CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace)
    {
        Unsafe.SkipInit(out CheckNumbers numbers);
        string check = Numbers(member, actions, trace, ref numbers);
        return numbers.ToResult(member, actions, this, check, trace);
    }

    /// <summary>Whether the straight-line compression path applies (no eccentricity, no end moments); <see cref="Numbers"/>
    /// then takes <see cref="CompressionNumbers"/>.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static bool IsPureCompression(in ResolvedActions actions) => !(actions.HasEccentricity || actions.HasEndMoments);

    /// <summary>The check's numbers (validated), traced or not, by the straight-line compression path or with bending;
    /// returns the governing check's words. The method's own <see cref="Evaluate"/> and Check's traced checks take it.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal string Numbers(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace, ref CheckNumbers numbers) =>
        IsPureCompression(actions) ? CompressionNumbers<MethodEntry>(member, actions, trace, ref numbers)! : BendingNumbers(member, actions, trace, ref numbers);

    /// <summary>Check's entry for an untraced check: as <see cref="Numbers"/>, but the compression path compiled without its
    /// steps, and null for numbers a result refuses (Check then takes <see cref="Evaluate"/>, which throws for them).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal string? UntracedNumbers(in ResolvedMember member, in ResolvedActions actions, ref CheckNumbers numbers) =>
        IsPureCompression(actions) ? CompressionNumbers<CheckEntry>(member, actions, null, ref numbers) : BendingNumbers(member, actions, null, ref numbers);

    /// <summary>The compression path's numbers (validated); returns the governing check's words.</summary>
    // Pure compression (6.2 in the stocky range, 6.23/6.24 without moments), straight on the member's resolved values: the
    // path of parametric sweeps, so it marshals nothing through the kernel records. The traced and untraced checks both
    // take it (tracing never changes the path), and a test holds it bit for bit to Ec5Kernel.Run on the same member. One
    // source compiled twice (KernelEntry): for Check's untraced entry the step writer and the throw fold away, so that no
    // value is live across a call (docs/performance.md, fourth round).
    [MethodImpl(MethodImplOptions.NoInlining)]
    internal string? CompressionNumbers<TEntry>(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace, ref CheckNumbers numbers)
        where TEntry : struct
    {
        var mat = (TimberMaterial)member.Material;
        double kmod = _kmod ?? En1995Factors.KmodUnchecked(ServiceClass, actions.LoadDuration);
        double gammaM = _gammaM ?? En1995Factors.GammaMUnchecked(mat.Product);
        double betaC = mat.StraightnessFactor;
        double lrY = member.RelativeSlendernessY, lrZ = member.RelativeSlendernessZ;   // (6.21), (6.22)
        double fc0d = kmod * member.StrengthPa / gammaM;                              // (2.14)
        double sigma = actions.AxialForceN / member.AreaM2;
        Ec5Kernel.Compression(lrY, lrZ, betaC, fc0d, sigma, member.AreaM2,            // (6.25)–(6.28)
            out double kY, out double kZ, out double kcY, out double kcZ, out double uY, out double uZ, out double resistance);
        bool aboutY = uY >= uZ;
        double u = Math.Max(uY, uZ);
        if (typeof(TEntry) == typeof(MethodEntry) && trace is not null)
            TraceCompression(trace, member, actions, mat, kmod, gammaM, lrY, lrZ, kY, kZ, kcY, kcZ, fc0d, sigma, uY, uZ, aboutY, u, resistance);
        double kcGov = aboutY ? kcY : kcZ;
        numbers.DesignResistanceN = resistance;
        numbers.Utilisation = u;
        numbers.GoverningAxis = aboutY ? BucklingAxis.Y : BucklingAxis.Z;
        numbers.GoverningMode = kcGov >= 1.0 ? FailureMode.Yielding : FailureMode.FlexuralBuckling;
        numbers.AboutY = new AxisOutcome(member.EffectiveLengthYM, member.SlendernessY, lrY, member.CriticalForceYN, kcY, kcY * fc0d * member.AreaM2);
        numbers.AboutZ = new AxisOutcome(member.EffectiveLengthZM, member.SlendernessZ, lrZ, member.CriticalForceZN, kcZ, kcZ * fc0d * member.AreaM2);
        numbers.Torsional = default;
        if (!numbers.Accepted<TEntry>(this, member)) return null;
        return Ec5Kernel.CompressionCheckName(aboutY, aboutY ? lrY : lrZ);
    }

    // The kernel records of the compression path, rebuilt from the values it computed, for the shared trace writer.
    [MethodImpl(MethodImplOptions.NoInlining)]
    private void TraceCompression(CalculationTrace trace, in ResolvedMember member, in ResolvedActions actions, TimberMaterial mat,
        double kmod, double gammaM, double lrY, double lrZ, double kY, double kZ, double kcY, double kcZ, double fc0d, double sigma,
        double uY, double uZ, bool aboutY, double u, double resistance)
    {
        var i = default(Ec5Input);
        Geometry(member, mat, ref i);
        i.Kmod = kmod;
        i.GammaM = gammaM;
        i.NEdN = actions.AxialForceN;
        i.KhY = i.KhZ = 1.0;
        i.CheckLtb = ChecksLateralTorsionalBuckling;
        var o = default(Ec5Output);
        o.LambdaY = member.SlendernessY; o.LambdaZ = member.SlendernessZ;
        o.LambdaRelY = lrY; o.LambdaRelZ = lrZ; o.KY = kY; o.KZ = kZ; o.KcY = kcY; o.KcZ = kcZ;
        o.Fc0dPa = fc0d; o.SigmaCPa = sigma; o.Stocky = lrY <= 0.3 && lrZ <= 0.3;
        o.UY = uY; o.UZ = uZ; o.Governs = aboutY ? Governing.AboutY : Governing.AboutZ; o.Utilisation = u; o.ResistanceN = resistance;
        WriteTrace(trace, member, actions, mat, i, o);
    }

    // Compression with bending: the shared kernel (6.19/6.20 or 6.23/6.24, and 6.35), also used by the fire method.
    internal CheckResult EvaluateWithBending(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace)
    {
        Unsafe.SkipInit(out CheckNumbers numbers);
        string check = BendingNumbers(member, actions, trace, ref numbers);
        return numbers.ToResult(member, actions, this, check, trace);
    }

    /// <summary>The numbers of compression with bending (validated); returns the governing check's words.</summary>
    // Not inlined: a large path (the general kernel and its records). Inlined into a caller's loop by profile-guided
    // inlining, it used up the caller's inlining budget, so that the result's constructors and the caller's own code were
    // left as calls with 240-byte copies (measured: EN 1995-1-1 with bending went from 1.1x to 1.8-2.2x the hand-written
    // loop; docs/performance.md).
    [MethodImpl(MethodImplOptions.NoInlining)]
    internal string BendingNumbers(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace, ref CheckNumbers numbers)
    {
        var mat = (TimberMaterial)member.Material;
        var i = default(Ec5Input);
        Geometry(member, mat, ref i);
        i.Kmod = _kmod ?? En1995Factors.KmodUnchecked(ServiceClass, actions.LoadDuration);
        i.GammaM = _gammaM ?? En1995Factors.GammaMUnchecked(mat.Product);
        i.NEdN = actions.AxialForceN;
        i.MyEdNm = TimberRules.MomentY(actions);
        i.MzEdNm = TimberRules.MomentZ(actions);
        i.KhY = i.KhZ = 1.0;
        if (i.MyEdNm != 0 || i.MzEdNm != 0)   // kh only matters with bending (and costs two powers)
        {
            // Without the size factor, increases are skipped but a reduction (LVL deeper than 300 mm) still applies.
            // kh depends only on the member's section and material: computed on the member's first bending check, then kept.
            // A size selector's candidate section has no member to keep them with (ResolvedMember.WithSection).
            if (member.Member is { } owner)
            {
                i.KhY = owner.SizeFactor(aboutY: true, MemberSizeFactor);
                i.KhZ = owner.SizeFactor(aboutY: false, MemberSizeFactor);
            }
            else
            {
                i.KhY = ResolvedSizeFactor(member, aboutY: true);
                i.KhZ = ResolvedSizeFactor(member, aboutY: false);
            }
            if (!ApplySizeFactor)
            {
                i.KhY = Math.Min(i.KhY, 1.0);
                i.KhZ = Math.Min(i.KhZ, 1.0);
            }
        }
        i.CheckLtb = ChecksLateralTorsionalBuckling;
        Ec5Kernel.Run(i, out var o);

        // The steps are written by a separate method so that the untraced path keeps a small frame (no string temporaries
        // to zero on entry); it receives the very values the kernel computed.
        if (trace is not null) WriteTrace(trace, member, actions, mat, i, o);

        double ncrY = member.CriticalForceYN, ncrZ = member.CriticalForceZN;   // π² E0,05 I / Lef², resolved with the member
        numbers.DesignResistanceN = o.ResistanceN;
        numbers.Utilisation = o.Utilisation;
        numbers.GoverningAxis = Ec5Kernel.Axis(o);
        numbers.GoverningMode = Ec5Kernel.Mode(o);
        numbers.AboutY = new AxisOutcome(i.LefYM, o.LambdaY, o.LambdaRelY, ncrY, o.KcY, o.KcY * o.Fc0dPa * i.AreaM2);
        numbers.AboutZ = new AxisOutcome(i.LefZM, o.LambdaZ, o.LambdaRelZ, ncrZ, o.KcZ, o.KcZ * o.Fc0dPa * i.AreaM2);
        numbers.Torsional = o.LtbChecked ? new AxisOutcome(i.LefLtbM, double.NaN, o.LambdaRelM, double.NaN, o.KCrit, double.NaN) : default;
        numbers.Validate(this, member);
        return Ec5Kernel.CheckName(o);
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private void WriteTrace(CalculationTrace trace, in ResolvedMember member, in ResolvedActions actions, TimberMaterial mat,
        in Ec5Input i, in Ec5Output o)
    {
        string ruleY = SizeFactorRule(mat, i.Rectangular, i.HM, "h"), ruleZ = SizeFactorRule(mat, i.Rectangular, i.BM, "b");
        string src = mat.Source;
        trace.Note($"{mat.Name}: {TimberRules.ProductText(mat.Product)}; characteristic values from the source cited.", src);
        trace.Add("fc,0,k", "characteristic compression strength parallel to grain", TimberRules.Input, i.Fc0kPa, StepUnit.Stress, src);
        trace.Add("fm,k", "characteristic bending strength", TimberRules.Input, i.FmkPa, StepUnit.Stress, src);
        trace.Add("E0,05", "fifth-percentile modulus parallel to grain (stability)", TimberRules.Input, i.E005Pa, StepUnit.Stress, src);
        TraceCommon.SectionAndLengths(trace, member);
        if (_kmod is { } k)
            trace.Add("kmod", "modification factor (user value)", TimberRules.Input, k, StepUnit.None, "user value replacing EN 1995-1-1 Table 3.1");
        else
            trace.Add("kmod", "modification factor", $"Table 3.1: {TimberRules.ProductText(mat.Product)}, {TimberRules.ServiceClassText(ServiceClass)}, {DesignActions.DurationText(actions.LoadDuration)} action", i.Kmod, StepUnit.None, En1995Factors.KmodRef);
        if (_gammaM is { } g)
            trace.Add("γM", "partial factor for material (national-annex or user value)", TimberRules.Input, g, StepUnit.None, "user value replacing EN 1995-1-1 Table 2.3");
        else
            trace.Add("γM", "partial factor for material", $"recommended value for {TimberRules.ProductText(mat.Product)}", i.GammaM, StepUnit.None, En1995Factors.GammaMRef);
        TimberRules.Actions(trace, actions, i.MyEdNm, i.MzEdNm);
        if (i.MyEdNm != 0 || i.MzEdNm != 0)
        {
            string khRef = SizeFactorRef(mat.Product);
            trace.Add("kh,y", "size factor for bending about y (depth h)", ApplySizeFactor ? ruleY : "min(" + ruleY + ", 1) (increase not applied)", i.KhY, StepUnit.None, khRef);
            trace.Add("kh,z", "size factor for bending about z (depth b)", ApplySizeFactor ? ruleZ : "min(" + ruleZ + ", 1) (increase not applied)", i.KhZ, StepUnit.None, khRef);
        }
        Ec5Trace.Write(trace, i, o, "");
        if (ChecksLateralTorsionalBuckling && i.MyEdNm != 0 && !i.Rectangular)
            trace.Note("Lateral torsional buckling is not checked: a circular section has no strong axis.", "EN 1995-1-1 6.3.3");
    }
}
