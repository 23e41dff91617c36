using System;
using System.Collections.Generic;
using System.Runtime.CompilerServices;
using CompressionMembers.Internal;
using CompressionMembers.Materials.Timber;
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
    internal static double SizeFactor(TimberMaterial m, bool rectangular, double depthM, out string rule, bool trace, string dim = "h")
    {
        rule = "";
        if (!rectangular) { if (trace) rule = "1 (the size factor is given for rectangular sections)"; return 1.0; }
        switch (m.Product)
        {
            case TimberProduct.SolidSoftwood or TimberProduct.SolidHardwood:
                if (m.RhokKgM3 > 700) { if (trace) rule = "1 (ρk > 700 kg/m³)"; return 1.0; }
                if (depthM >= 0.150) { if (trace) rule = $"1 ({dim} ≥ 150 mm)"; return 1.0; }
                if (trace) rule = $"min((150 / {dim})^0.2, 1.3)";
                return Math.Min(Math.Pow(0.150 / depthM, 0.2), 1.3);
            case TimberProduct.GlulamHomogeneous or TimberProduct.GlulamCombined:
                if (depthM >= 0.600) { if (trace) rule = $"1 ({dim} ≥ 600 mm)"; return 1.0; }
                if (trace) rule = $"min((600 / {dim})^0.1, 1.1)";
                return Math.Min(Math.Pow(0.600 / depthM, 0.1), 1.1);
            default:
                // LVL: 3.4(3) applies to every depth other than 300 mm, so deeper sections are reduced (kh < 1).
                if (trace) rule = $"min((300 / {dim})^s, 1.2)";
                return Math.Min(Math.Pow(0.300 / depthM, m.SizeEffectExponent), 1.2);
        }
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
        i.Fc0kPa = member.StrengthPa;
        i.FmkPa = mat.FmkPa;
        i.E005Pa = member.ElasticModulusPa;
        i.G005Pa = mat.GMeanPa * member.ElasticModulusPa / mat.E0MeanPa;
        i.BetaC = En1995Factors.BetaCUnchecked(mat.Product);
        i.Km = i.Rectangular ? 0.7 : 1.0;
        i.UseSoftwoodLtbFormula = mat.Product == TimberProduct.SolidSoftwood;
    }

    /// <inheritdoc/>
    public CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace)
    {
        var mat = (TimberMaterial)member.Member.Material;
        var i = default(Ec5Input);
        Geometry(member, mat, ref i);
        bool tr = trace is not null;
        i.Kmod = _kmod ?? En1995Factors.KmodUnchecked(ServiceClass, actions.LoadDuration);
        i.GammaM = _gammaM ?? En1995Factors.GammaMUnchecked(mat.Product);
        string ruleY = "", ruleZ = "";
        i.NEdN = actions.AxialForceN;
        i.MyEdNm = TimberRules.MomentY(actions);
        i.MzEdNm = TimberRules.MomentZ(actions);
        i.KhY = i.KhZ = 1.0;
        if (i.MyEdNm != 0 || i.MzEdNm != 0)   // kh only matters with bending (and costs two powers)
        {
            // Without the size factor, increases are skipped but a reduction (LVL deeper than 300 mm) still applies.
            i.KhY = SizeFactor(mat, i.Rectangular, i.HM, out ruleY, tr);
            i.KhZ = SizeFactor(mat, i.Rectangular, i.BM, out ruleZ, tr, "b");
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
        if (trace is not null) WriteTrace(trace, member, actions, mat, i, o, ruleY, ruleZ);

        double ncrY = Math.PI * Math.PI * i.E005Pa * i.IyM4 / (i.LefYM * i.LefYM);
        double ncrZ = Math.PI * Math.PI * i.E005Pa * i.IzM4 / (i.LefZM * i.LefZM);
        return new CheckResult(member, actions, this, o.ResistanceN, o.Utilisation, Ec5Kernel.Axis(o), Ec5Kernel.Mode(o), Ec5Kernel.CheckName(o),
            new AxisOutcome(i.LefYM, o.LambdaY, o.LambdaRelY, ncrY, o.KcY, o.KcY * o.Fc0dPa * i.AreaM2),
            new AxisOutcome(i.LefZM, o.LambdaZ, o.LambdaRelZ, ncrZ, o.KcZ, o.KcZ * o.Fc0dPa * i.AreaM2),
            o.LtbChecked ? new AxisOutcome(i.LefLtbM, double.NaN, o.LambdaRelM, double.NaN, o.KCrit, double.NaN) : default,
            trace);
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private void WriteTrace(CalculationTrace trace, in ResolvedMember member, in ResolvedActions actions, TimberMaterial mat,
        in Ec5Input i, in Ec5Output o, string ruleY, string ruleZ)
    {
        string src = mat.Source;
        trace.Note($"{mat.Name}: {TimberRules.ProductText(mat.Product)}; values from {src}.", src);
        trace.Add("fc,0,k", "characteristic compression strength parallel to grain", TimberRules.Input, i.Fc0kPa, StepUnit.Stress, src);
        trace.Add("fm,k", "characteristic bending strength", TimberRules.Input, i.FmkPa, StepUnit.Stress, src);
        trace.Add("E0,05", "fifth-percentile modulus parallel to grain (stability)", TimberRules.Input, i.E005Pa, StepUnit.Stress, src);
        TraceCommon.SectionAndLengths(trace, member);
        if (_kmod is { } k)
            trace.Add("kmod", "modification factor (user value)", TimberRules.Input, k, StepUnit.None, "user value replacing EN 1995-1-1 Table 3.1");
        else
            trace.Add("kmod", "modification factor", $"Table 3.1: {TimberRules.ProductText(mat.Product)}, {TimberRules.ServiceClassText(ServiceClass)}, {TimberRules.DurationText(actions.LoadDuration)} action", i.Kmod, StepUnit.None, En1995Factors.KmodRef);
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
