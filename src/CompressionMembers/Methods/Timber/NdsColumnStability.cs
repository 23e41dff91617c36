using System;
using System.Runtime.CompilerServices;
using System.Collections.Generic;
using System.Diagnostics;
using System.Diagnostics.CodeAnalysis;
using CompressionMembers.Actions;
using CompressionMembers.Internal;
using CompressionMembers.Materials;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Methods.Common;
using CompressionMembers.Resolution;
using CompressionMembers.Results;
using CompressionMembers.Sections;

namespace CompressionMembers.Methods.Timber;

/// <summary>
/// Wood columns to the ANSI/AWC National Design Specification (NDS 2018, US practice): column stability factor Cp of
/// 3.7.1 (the Ylinen form) with FcE = 0.822 E′min / (le/d)², the slenderness limit le/d ≤ 50 of 3.7.1.4, the adjustment
/// factors of Table 4.3.1 (ASD: CD, CM, Ct, CF, Ci; LRFD: KF, φ, λ) and combined bending and axial compression about
/// one or both axes: the interaction of 3.9.2 (3.9-3) in the form of 15.4.1 (15.4-1) for an eccentric axial load, with the
/// beam stability factor CL of 3.3.3 for edgewise bending.
/// </summary>
/// <remarks>
/// <para>Cp = (1 + FcE/Fc*)/(2c) − √[((1 + FcE/Fc*)/(2c))² − (FcE/Fc*)/c] (3.7-1), c = 0.8 sawn lumber, 0.85 round timber
/// poles and piles, 0.9 glulam and structural composite lumber. Fc* is Fc times every factor but Cp. A round column is
/// designed as the square of equal area (3.7.3), d = D √π / 2. The constants c are from memory (common practice).</para>
/// <para>ASD load duration from the action's load-duration class unless given (common practice, NDS Table 2.3.2 / B1):
/// permanent 0.9, long-term 1.0 (ten years), medium-term 1.15 (two months, snow), short-term 1.25 (seven days,
/// construction), instantaneous 1.6 (ten minutes, wind and earthquake). LRFD time effect λ (NDS Table N3): permanent 0.6,
/// long-term 0.7, medium-term 0.8, short-term 0.8, instantaneous 1.0. KF = 2.40 (Fc), 2.54 (Fb), 1.76 (Emin); φ = 0.90
/// (compression), 0.85 (bending, stability). All recalled from memory of NDS 2018; verify against your edition.</para>
/// <para>The actions carry only end effects (eccentricity, end moments), so the bending stress is the eccentric term of
/// (15.4-1): fc (6e/d) = (|P e| + max |M,end|) / S, amplified by [1 + 0.234 fc/FcE] in the numerator and by the
/// 3.9-3 denominators [1 − fc/FcE1] and [1 − fc/FcE2 − (fbe1/FbE)²]; end moments are taken as equivalent end
/// eccentricities e = M/P (conservative for double curvature). (15.4-1) recalled from memory; verify.
/// Edgewise bending is about y (depth d1 = h), flatwise about z (d2 = b). The effective length for
/// CL is the Table 3.3.3 entry for any loading (2.06 lu, 1.63 lu + 3d, 1.84 lu), lu being the member's length free to twist.
/// Thread safety: immutable.</para>
/// </remarks>
[Immutable]
public sealed class NdsColumnStability : IResistanceMethod
{
    private const string Name = "NDS wood column";
    private const string NdsRef = "NDS 2018";
    private readonly double? _cd;
    private readonly double? _lambda;
    private readonly double _fcFactors, _eminFactors, _fbFactors;

    /// <summary>Creates the method.</summary>
    /// <param name="format">ASD or LRFD.</param>
    /// <param name="adjustments">The use-dependent factors (null for none).</param>
    /// <param name="loadDurationFactor">ASD only: CD, or null to map it from the load-duration class. Between 0.5 and 2.</param>
    /// <param name="timeEffectFactor">LRFD only: λ, or null to map it from the load-duration class. Between 0.5 and 1.25.</param>
    /// <param name="allowConstructionSlenderness">Whether to allow le/d up to 75, which NDS 3.7.1.4 permits during construction only.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is undefined or out of range.</exception>
    /// <exception cref="ArgumentException">CD is given for LRFD, or λ for ASD.</exception>
    public NdsColumnStability(NdsDesignFormat format = NdsDesignFormat.Asd, NdsAdjustments? adjustments = null, double? loadDurationFactor = null,
        double? timeEffectFactor = null, bool allowConstructionSlenderness = false)
    {
        if (!Enum.IsDefined(format)) throw new ArgumentOutOfRangeException(nameof(format), format, $"Unknown NDS design format {(int)format}.");
        if (loadDurationFactor is { } cd)
        {
            if (format != NdsDesignFormat.Asd) throw new ArgumentException("The load duration factor CD belongs to ASD; for LRFD give the time effect factor λ.", nameof(loadDurationFactor));
            Guard.InRange(cd, 0.5, 2.0, nameof(loadDurationFactor), "", "Load duration factor CD");
        }
        if (timeEffectFactor is { } la)
        {
            if (format != NdsDesignFormat.Lrfd) throw new ArgumentException("The time effect factor λ belongs to LRFD; for ASD give the load duration factor CD.", nameof(timeEffectFactor));
            Guard.InRange(la, 0.5, 1.25, nameof(timeEffectFactor), "", "Time effect factor λ");
        }
        Format = format;
        Adjustments = adjustments ?? NdsAdjustments.None;
        _cd = loadDurationFactor;
        _lambda = timeEffectFactor;
        AllowsConstructionSlenderness = allowConstructionSlenderness;
        // The products of the use factors and the LRFD format factors, formed once here rather than in every check.
        var adj = Adjustments;
        bool asdFormat = format == NdsDesignFormat.Asd;
        _fcFactors = adj.WetServiceFc * adj.TemperatureFc * adj.SizeFc * adj.IncisingFc * (asdFormat ? 1 : 2.40) * (asdFormat ? 1 : 0.90);
        _eminFactors = adj.WetServiceEmin * adj.TemperatureEmin * adj.IncisingEmin * (asdFormat ? 1 : 1.76) * (asdFormat ? 1 : 0.85);
        _fbFactors = adj.WetServiceFb * adj.TemperatureFb * adj.SizeFb * adj.IncisingFb * adj.Repetitive * (asdFormat ? 1 : 2.54) * (asdFormat ? 1 : 0.85);
        Identity = new MethodIdentity(format == NdsDesignFormat.Asd ? Name + " (ASD)" : Name + " (LRFD)", "ANSI/AWC NDS", "2018", "3.7.1, 3.9.2, 15.4.1, 3.3.3, Table 4.3.1",
            Settings(format, Adjustments, loadDurationFactor, timeEffectFactor, allowConstructionSlenderness));
    }

    private static MethodSetting[] Settings(NdsDesignFormat f, NdsAdjustments a, double? cd, double? la, bool construction)
    {
        var s = new List<MethodSetting>
        {
            new("format", f == NdsDesignFormat.Asd ? "design format ASD (0 = ASD, 1 = LRFD)" : "design format LRFD (0 = ASD, 1 = LRFD)", (int)f, StepUnit.None, false, "NDS 2018 (chosen by the designer)"),
        };
        if (f == NdsDesignFormat.Asd)
            s.Add(cd is { } c
                ? new("CD", "load duration factor (user value)", c, StepUnit.None, false, "user value replacing the mapping from the load-duration class")
                : new("CD", "load duration factor from the load-duration class", double.NaN, StepUnit.None, true, "NDS Table 2.3.2 mapped by common practice"));
        else
        {
            s.Add(la is { } l
                ? new("λ", "time effect factor (user value)", l, StepUnit.None, false, "user value replacing the mapping from the load-duration class")
                : new("λ", "time effect factor from the load-duration class", double.NaN, StepUnit.None, true, "NDS Table N3 mapped by common practice"));
            s.Add(new("KF,c", "format conversion factor, compression", 2.40, StepUnit.None, true, "NDS Table 4.3.1 / N1"));
            s.Add(new("KF,b", "format conversion factor, bending", 2.54, StepUnit.None, true, "NDS Table 4.3.1 / N1"));
            s.Add(new("KF,E", "format conversion factor, Emin", 1.76, StepUnit.None, true, "NDS Table 4.3.1 / N1"));
            s.Add(new("φc", "resistance factor, compression", 0.90, StepUnit.None, true, "NDS Table N2"));
            s.Add(new("φb", "resistance factor, bending", 0.85, StepUnit.None, true, "NDS Table N2"));
            s.Add(new("φs", "resistance factor, stability", 0.85, StepUnit.None, true, "NDS Table N2"));
        }
        Adj(s, "CM,c", "wet service factor on Fc", a.WetServiceFc, "NDS 4.3.3");
        Adj(s, "CM,b", "wet service factor on Fb", a.WetServiceFb, "NDS 4.3.3");
        Adj(s, "CM,E", "wet service factor on Emin", a.WetServiceEmin, "NDS 4.3.3");
        Adj(s, "Ct,c", "temperature factor on Fc", a.TemperatureFc, "NDS 2.3.3");
        Adj(s, "Ct,b", "temperature factor on Fb", a.TemperatureFb, "NDS 2.3.3");
        Adj(s, "Ct,E", "temperature factor on Emin", a.TemperatureEmin, "NDS 2.3.3");
        Adj(s, "CF,c", "size factor on Fc", a.SizeFc, "NDS 4.3.6");
        Adj(s, "CF,b", "size factor on Fb", a.SizeFb, "NDS 4.3.6");
        Adj(s, "Ci,c", "incising factor on Fc", a.IncisingFc, "NDS 4.3.8");
        Adj(s, "Ci,b", "incising factor on Fb", a.IncisingFb, "NDS 4.3.8");
        Adj(s, "Ci,E", "incising factor on Emin", a.IncisingEmin, "NDS 4.3.8");
        Adj(s, "Cfu", "flat use factor on Fb about z", a.FlatUse, "NDS 4.3.7");
        Adj(s, "Cr", "repetitive member factor on Fb", a.Repetitive, "NDS 4.3.9");
        s.Add(new("(le/d)max", "slenderness limit", construction ? 75 : 50, StepUnit.None, !construction,
            construction ? "NDS 3.7.1.4: 75 allowed during construction only" : "NDS 3.7.1.4"));
        return [.. s];
    }

    // Only the factors that differ from 1.0 are listed; the trace shows every factor used.
    private static void Adj(List<MethodSetting> s, string symbol, string meaning, double value, string clause)
    {
        if (value != 1.0) s.Add(new(symbol, meaning, value, StepUnit.None, false, clause + " (given by the user)"));
    }

    /// <inheritdoc/>
    public MethodIdentity Identity { get; }
    /// <summary>The method in words: <see cref="MethodIdentity.ToString"/> of its <see cref="Identity"/>.</summary>
    /// <returns>The name, standard, edition and clause in one line.</returns>
    public override string ToString() => Identity.ToString();

    /// <summary>ASD or LRFD.</summary>
    public NdsDesignFormat Format { get; }

    /// <summary>The use-dependent adjustment factors.</summary>
    public NdsAdjustments Adjustments { get; }

    /// <summary>The CD override (ASD), or null.</summary>
    public double? LoadDurationFactor => _cd;

    /// <summary>The λ override (LRFD), or null.</summary>
    public double? TimeEffectFactor => _lambda;

    /// <summary>Whether le/d up to 75 is allowed (construction only).</summary>
    public bool AllowsConstructionSlenderness { get; }

    /// <summary>The slenderness limit applied: 50, or 75 during construction.</summary>
    public double SlendernessLimit => AllowsConstructionSlenderness ? 75 : 50;

    /// <summary>The ASD load duration factor CD mapped from a load-duration class (common practice; NDS Table 2.3.2).</summary>
    /// <param name="duration">The class.</param>
    /// <returns>CD.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The class is unspecified or undefined.</exception>
    public static double LoadDurationFactorFor(LoadDurationClass duration)
    {
        if (duration == LoadDurationClass.Unspecified || !Enum.IsDefined(duration))
            throw new ArgumentOutOfRangeException(nameof(duration), duration, "CD needs a load-duration class (permanent, long-term, medium-term, short-term or instantaneous).");
        return CdFor(duration);
    }

    /// <summary>The LRFD time effect factor λ mapped from a load-duration class (common practice; NDS Table N3).</summary>
    /// <param name="duration">The class.</param>
    /// <returns>λ.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The class is unspecified or undefined.</exception>
    public static double TimeEffectFactorFor(LoadDurationClass duration)
    {
        if (duration == LoadDurationClass.Unspecified || !Enum.IsDefined(duration))
            throw new ArgumentOutOfRangeException(nameof(duration), duration, "λ needs a load-duration class (permanent, long-term, medium-term, short-term or instantaneous).");
        return LambdaFor(duration);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double CdFor(LoadDurationClass d) => d switch
    {
        LoadDurationClass.Permanent => 0.9,
        LoadDurationClass.LongTerm => 1.0,
        LoadDurationClass.MediumTerm => 1.15,
        LoadDurationClass.ShortTerm => 1.25,
        _ => 1.6,
    };

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double LambdaFor(LoadDurationClass d) => d switch
    {
        LoadDurationClass.Permanent => 0.6,
        LoadDurationClass.LongTerm => 0.7,
        LoadDurationClass.MediumTerm => 0.8,
        LoadDurationClass.ShortTerm => 0.8,
        _ => 1.0,
    };

    /// <summary>Column stability factor Cp of NDS (3.7-1).</summary>
    /// <param name="ratio">FcE / Fc*.</param>
    /// <param name="c">0.8, 0.85 or 0.9.</param>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static double Cp(double ratio, double c)
    {
        double a = (1 + ratio) / (2 * c);
        return a - Math.Sqrt(a * a - ratio / c);
    }

    /// <summary>Beam stability factor CL of NDS (3.3-6).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static double Cl(double ratio)
    {
        double a = (1 + ratio) / 1.9;
        return a - Math.Sqrt(a * a - ratio / 0.95);
    }

    /// <summary>Effective length for bending of NDS Table 3.3.3, "single span or cantilever when no other condition applies".</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static double BendingEffectiveLength(double luM, double dM)
    {
        double r = luM / dM;
        return r < 7 ? 2.06 * luM : r <= 14.3 ? 1.63 * luM + 3 * dM : 1.84 * luM;
    }

    private static void Slenderness(in ResolvedMember m, out double d1, out double d2, out double r1, out double r2)
    {
        if (m.SectionKind == SectionKind.SolidCircle)
            d1 = d2 = 2 * m.FibrePositiveYM * Math.Sqrt(Math.PI) / 2;   // 3.7.3: the square of equal area
        else
            TimberRules.Dimensions(m, out d2, out d1);               // d1 = depth h (buckling about y), d2 = width b
        r1 = m.EffectiveLengthYM / d1;
        r2 = m.EffectiveLengthZM / d2;
    }

    /// <inheritdoc/>
    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions)
    {
        Slenderness(member, out _, out _, out double r1, out double r2);
        return Covers(member, actions, r1, r2, out _) ? Applicability.Applicable : Refusal(member, actions);
    }

    /// <summary>What <see cref="AppliesTo"/> admits, as one test without sentences: US reference design values, a solid
    /// rectangle or circle, no initial bow, a load duration where the factor needs one, le/d within the limit (3.7.1.4)
    /// and, for a deep rectangle in bending about y, RB within 50 (3.3.3.7). <paramref name="r1"/> and <paramref name="r2"/>
    /// are the slenderness ratios of <see cref="Slenderness"/>, which the kernel needs too and forms once.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private bool Covers(in ResolvedMember member, in ResolvedActions actions, double r1, double r2, [NotNullWhen(true)] out NdsTimberMaterial? mat)
    {
        mat = member.Material as NdsTimberMaterial;
        var kind = member.SectionKind;
        if (mat is null || (kind != SectionKind.SolidRectangle && kind != SectionKind.SolidCircle) || actions.HasInitialBowY || actions.HasInitialBowZ
            || ((Format == NdsDesignFormat.Asd ? _cd : _lambda) is null && actions.LoadDuration == LoadDurationClass.Unspecified))
            return false;
        // A relative 1e-9 allowance absorbs unit-conversion rounding (75 in / 1.5 in in SI gives 50.000000000001).
        if (Math.Max(r1, r2) > SlendernessLimit * (1 + 1e-9)) return false;
        return !(kind == SectionKind.SolidRectangle && TimberRules.MomentY(actions) > 0 && BendingSlenderness(member) > 50);
    }

    // RB of 3.3.3.7 for a rectangle deeper than wide (0 otherwise: no lateral torsional buckling to limit).
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double BendingSlenderness(in ResolvedMember member)
    {
        TimberRules.Dimensions(member, out double b, out double h);
        return h > b ? Math.Sqrt(BendingEffectiveLength(member.EffectiveLengthTorsionalM, h) * h / (b * b)) : 0;
    }

    // The sentence for what Covers refused, rule by rule in the order a user fixes them; formed only when refused.
    [MethodImpl(MethodImplOptions.NoInlining)]
    private Applicability Refusal(in ResolvedMember member, in ResolvedActions actions)
    {
        if (member.Material is not NdsTimberMaterial) return NotNds(member.Material);
        var v = TimberRules.SolidSection(member, Name, allowCircle: true);
        if (!v.IsApplicable) return v;
        v = TimberRules.NoInitialBow(actions, Name);
        if (!v.IsApplicable) return v;
        if ((Format == NdsDesignFormat.Asd ? _cd : _lambda) is null)
        {
            v = TimberRules.Duration(actions, Name, Format == NdsDesignFormat.Asd ? "the load duration factor CD" : "the time effect factor λ");
            if (!v.IsApplicable) return v;
        }
        Slenderness(member, out _, out _, out double r1, out double r2);
        double r = Math.Max(r1, r2);
        if (r > SlendernessLimit * (1 + 1e-9)) return TooSlender(r);
        if (member.SectionKind == SectionKind.SolidRectangle && TimberRules.MomentY(actions) > 0)
        {
            double rb = BendingSlenderness(member);
            if (rb > 50) return TooSlenderInBending(rb);
        }
        throw new UnreachableException("Covers refused what every rule admits.");   // the two lists must agree
    }

    // The refusals' sentences, built only when refused and kept out of the code of every check.
    [MethodImpl(MethodImplOptions.NoInlining)]
    private static Applicability NotNds(Material m) => m is TimberMaterial
        ? Applicability.NotApplicable($"{Name} needs US reference design values (NdsTimberMaterial: Fc, Fb, E, Emin); \"{m.Name}\" is a European strength class: use the EN 1995-1-1 column method.")
        : Applicability.NotApplicable($"{Name} covers wood only; \"{m.Name}\" is a {m.Kind} material. Use an NdsTimberMaterial (NdsGrades.…) or another method.");

    [MethodImpl(MethodImplOptions.NoInlining)]
    private Applicability TooSlender(double r) => Applicability.NotApplicable(AllowsConstructionSlenderness
        ? $"le/d = {Guard.Show(r)} exceeds 75, the most NDS 3.7.1.4 allows even during construction; brace the column or enlarge the section."
        : $"le/d = {Guard.Show(r)} exceeds 50 (NDS 3.7.1.4); brace the column or enlarge the section (75 is allowed during construction only: create the method with allowConstructionSlenderness: true).");

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static Applicability TooSlenderInBending(double rb) =>
        Applicability.NotApplicable($"the slenderness ratio for bending RB = {Guard.Show(rb)} exceeds 50 (NDS 3.3.3.7); brace the compression edge against twist or widen the section.");

    /// <inheritdoc/>
    public CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace)
    {
        Unsafe.SkipInit(out CheckNumbers numbers);
        string check = Numbers(member, actions, trace, ref numbers);
        return numbers.ToResult(member, actions, this, check, trace);
    }

    /// <summary>The check's numbers (validated), traced or not; returns the governing check's words. The method's own
    /// <see cref="Evaluate"/> takes it, and so do Check's traced checks (through Evaluate).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal string Numbers(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace, ref CheckNumbers numbers) =>
        Kernel<MethodEntry>(member, actions, trace, ref numbers)!;

    /// <summary>Check's entry for an untraced check: the numbers when the method applies (<see cref="Covers"/>) and a
    /// result would accept them; null for everything else, which Check takes to <see cref="AppliesTo"/> and
    /// <see cref="Evaluate"/> (where the refusal or the broken-method exception comes from).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal string? ApplicableNumbers(in ResolvedMember member, in ResolvedActions actions, ref CheckNumbers numbers) =>
        Kernel<CheckEntry>(member, actions, null, ref numbers);

    // The check itself, one source compiled twice (KernelEntry): for Check's entry it tests applicability, writes no
    // steps and returns null for numbers a result would refuse, and then calls nothing, so its values stay in registers
    // and it saves none; for the method's entry it writes the steps when traced and throws for a broken result.
    [MethodImpl(MethodImplOptions.NoInlining)]
    private string? Kernel<TEntry>(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace, ref CheckNumbers numbers)
        where TEntry : struct
    {
        // le/d first: the applicability test reads it too (pure arithmetic on the resolved values, whatever the section).
        Slenderness(member, out double d1, out double d2, out double r1, out double r2);
        NdsTimberMaterial? mat;
        if (typeof(TEntry) == typeof(CheckEntry)) { if (!Covers(member, actions, r1, r2, out mat)) return null; }
        else mat = (NdsTimberMaterial)member.Material;
        var adj = Adjustments;
        bool asd = Format == NdsDesignFormat.Asd;
        double cd = asd ? _cd ?? CdFor(actions.LoadDuration) : 1.0;
        double lam = asd ? 1.0 : _lambda ?? LambdaFor(actions.LoadDuration);
        double kfC = asd ? 1 : 2.40, kfB = asd ? 1 : 2.54, kfE = asd ? 1 : 1.76;
        double phiC = asd ? 1 : 0.90, phiB = asd ? 1 : 0.85, phiS = asd ? 1 : 0.85;

        double fcRef = member.StrengthPa, fbRef = mat.FbPa, eminRef = member.ElasticModulusPa;
        double fcStar = fcRef * cd * _fcFactors * lam;     // Fc CD CM Ct CF Ci (KF φc λ)
        double eminP = eminRef * _eminFactors;             // Emin CM Ct Ci (KF φs)

        bool govY = r1 >= r2;
        double r = govY ? r1 : r2;
        double c = mat.ColumnConstant;
        // FcE and Cp about each axis once; the governing ones are the same numbers (same operations on r1 or r2).
        double fcE1 = 0.822 * eminP / (r1 * r1), fcE2 = 0.822 * eminP / (r2 * r2);
        double cpY = Cp(fcE1 / fcStar, c), cpZ = Cp(fcE2 / fcStar, c);
        double fcE = govY ? fcE1 : fcE2;
        double cp = govY ? cpY : cpZ;
        double fcP = fcStar * cp;
        double area = member.AreaM2;
        double fc = actions.AxialForceN / area;

        double m1 = 0, m2 = 0, fb1 = 0, fb2 = 0;
        if (actions.HasEccentricity || actions.HasEndMoments)   // pure compression skips the bending stresses
        {
            m1 = TimberRules.MomentY(actions); m2 = TimberRules.MomentZ(actions);
            fb1 = m1 / TimberRules.ModulusY(member); fb2 = m2 / TimberRules.ModulusZ(member);
        }
        bool bending = fb1 > 0 || fb2 > 0;
        double fbStar = bending ? fbRef * cd * _fbFactors * lam : double.NaN;   // Fb CD CM Ct CF Ci Cr (KF φb λ), bending only

        bool ltb = false;
        double le = double.NaN, rb = double.NaN, fbE = double.PositiveInfinity, cl = 1.0;
        double bM = 0, hM = 0;
        if (fb1 > 0) TimberRules.Dimensions(member, out bM, out hM);
        if (member.SectionKind == SectionKind.SolidRectangle && fb1 > 0 && hM > bM)
        {
            ltb = true;
            le = BendingEffectiveLength(member.EffectiveLengthTorsionalM, hM);
            rb = Math.Sqrt(le * hM / (bM * bM));
            fbE = 1.20 * eminP / (rb * rb);
            cl = Cl(fbE / fbStar);
        }
        double fb1P = fbStar * cl, fb2P = fbStar * adj.FlatUse;

        double u, t1 = 0, t2 = 0, den1 = 1, den2 = 1;
        bool unbounded = false;
        if (!bending) u = fc / fcP;
        else
        {
            double a = fc / fcP;
            den1 = 1 - fc / fcE1;
            double q = fb1 / fbE;
            den2 = 1 - fc / fcE2 - q * q;
            if ((fb1 > 0 && den1 <= 0) || (fb2 > 0 && den2 <= 0) || (fb1 > 0 && q >= 1)) unbounded = true;
            // (15.4-1) with no side loads: eccentric terms fc(6e/d) = M/S with the 0.234 end-eccentricity terms.
            t1 = fb1 > 0 ? fb1 * (1 + 0.234 * fc / fcE1) / (fb1P * den1) : 0;
            t2 = fb2 > 0 ? fb2 * (1 + 0.234 * fc / fcE2 + 0.234 * q * q) / (fb2P * den2) : 0;
            u = unbounded ? double.PositiveInfinity : a * a + t1 + t2;
        }

        // The steps are written by a separate method (cold code) that receives the values computed above, so that the
        // untraced frame stays small.
        if (typeof(TEntry) == typeof(MethodEntry) && trace is not null)
            WriteTrace(trace, member, actions, mat, adj, asd, cd, lam, kfC, kfB, kfE, phiC, phiB, phiS, fcRef, fbRef, eminRef, fcStar, eminP, fbStar,
                d1, d2, r1, r2, r, c, fcE, cp, fcP, fc, m1, m2, fb1, fb2, bending, ltb, le, rb, fbE, cl, fb1P, fb2P, fcE1, fcE2, u, den1, den2, unbounded);

        var axis = bending ? (fb1 > 0 && fb2 > 0 ? BucklingAxis.Both : fb1 > 0 ? BucklingAxis.Y : BucklingAxis.Z) : (govY ? BucklingAxis.Y : BucklingAxis.Z);
        var mode = bending ? FailureMode.CombinedCompressionAndBending : FailureMode.FlexuralBuckling;
        numbers.DesignResistanceN = fcP * area;
        numbers.Utilisation = u;
        numbers.GoverningAxis = axis;
        numbers.GoverningMode = mode;
        numbers.AboutY = new AxisOutcome(member.EffectiveLengthYM, member.SlendernessY, double.NaN, fcE1 * area, cpY, fcStar * cpY * area);
        numbers.AboutZ = new AxisOutcome(member.EffectiveLengthZM, member.SlendernessZ, double.NaN, fcE2 * area, cpZ, fcStar * cpZ * area);
        numbers.Torsional = ltb ? new AxisOutcome(le, rb, double.NaN, double.NaN, cl, double.NaN) : default;
        if (!numbers.Accepted<TEntry>(this, member)) return null;
        return bending ? "NDS 2018 15.4.1 (15.4-1): eccentric axial compression, 3.9.2 interaction" : "NDS 2018 3.7.1: column stability, F′c = Fc* Cp";
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private void WriteTrace(CalculationTrace trace, in ResolvedMember member, in ResolvedActions actions, NdsTimberMaterial mat, NdsAdjustments adj,
        bool asd, double cd, double lam, double kfC, double kfB, double kfE, double phiC, double phiB, double phiS,
        double fcRef, double fbRef, double eminRef, double fcStar, double eminP, double fbStar, double d1, double d2, double r1, double r2, double r,
        double c, double fcE, double cp, double fcP, double fc, double m1, double m2, double fb1, double fb2, bool bending,
        bool ltb, double le, double rb, double fbE, double cl, double fb1P, double fb2P, double fcE1, double fcE2, double u, double den1, double den2, bool unbounded)
    {
        string src = mat.Source;
        trace.Note($"{mat.Name}: {ProductText(mat.Product)} reference design values from the source cited; {(asd ? "ASD" : "LRFD")}.", src);
        trace.Add("Fc", "reference compression design value parallel to grain", TimberRules.Input, fcRef, StepUnit.Stress, src);
        trace.Add("Fb", "reference bending design value", TimberRules.Input, fbRef, StepUnit.Stress, src);
        trace.Add("Emin", "reference modulus for beam and column stability", TimberRules.Input, eminRef, StepUnit.Stress, src);
        TraceCommon.SectionAndLengths(trace, member);
        if (asd)
            trace.Add("CD", "load duration factor", _cd is null ? $"{DesignActions.DurationText(actions.LoadDuration)} action (common-practice mapping)" : "user value", cd, StepUnit.None, "NDS 2018 2.3.2, Table 2.3.2");
        else
        {
            trace.Add("λ", "time effect factor", _lambda is null ? $"{DesignActions.DurationText(actions.LoadDuration)} action (common-practice mapping)" : "user value", lam, StepUnit.None, "NDS 2018 N.3.3, Table N3");
            trace.Add("KF", "format conversion factor for Fc", "2.40", kfC, StepUnit.None, "NDS 2018 Table 4.3.1, N.3.1");
            trace.Add("φc", "resistance factor for compression", "0.90", phiC, StepUnit.None, "NDS 2018 Table 4.3.1, N.3.2");
            trace.Add("KF", "format conversion factor for Emin", "1.76", kfE, StepUnit.None, "NDS 2018 Table 4.3.1, N.3.1");
            trace.Add("φs", "resistance factor for stability", "0.85", phiS, StepUnit.None, "NDS 2018 Table 4.3.1, N.3.2");
        }
        trace.Add("CM", "wet service factor on Fc", TimberRules.Input, adj.WetServiceFc, StepUnit.None, "NDS 2018 4.3.3");
        trace.Add("Ct", "temperature factor on Fc", TimberRules.Input, adj.TemperatureFc, StepUnit.None, "NDS 2018 2.3.3");
        trace.Add("CF", "size factor on Fc", TimberRules.Input, adj.SizeFc, StepUnit.None, "NDS 2018 4.3.6");
        trace.Add("Ci", "incising factor on Fc", TimberRules.Input, adj.IncisingFc, StepUnit.None, "NDS 2018 4.3.8");
        trace.Add("Fc*", "compression design value with all factors but Cp", asd ? "Fc CD CM Ct CF Ci" : "Fc CM Ct CF Ci KF φc λ", fcStar, StepUnit.Stress, "NDS 2018 3.7.1.5, Table 4.3.1");
        trace.Add("CM", "wet service factor on Emin", TimberRules.Input, adj.WetServiceEmin, StepUnit.None, "NDS 2018 4.3.3");
        trace.Add("Ct", "temperature factor on Emin", TimberRules.Input, adj.TemperatureEmin, StepUnit.None, "NDS 2018 2.3.3");
        trace.Add("Ci", "incising factor on Emin", TimberRules.Input, adj.IncisingEmin, StepUnit.None, "NDS 2018 4.3.8");
        trace.Add("E′min", "adjusted stability modulus", asd ? "Emin CM Ct Ci" : "Emin CM Ct Ci KF φs", eminP, StepUnit.Stress, "NDS 2018 Table 4.3.1");
        if (member.SectionKind == SectionKind.SolidCircle)
            trace.Note("Round column: designed as the square of equal area, d = D √π / 2.", "NDS 2018 3.7.3");
        trace.Add("d1", "dimension for buckling about y", member.SectionKind == SectionKind.SolidCircle ? "D √π / 2" : "depth h", d1, StepUnit.Length, "NDS 2018 3.7.1.3");
        trace.Add("d2", "dimension for buckling about z", member.SectionKind == SectionKind.SolidCircle ? "D √π / 2" : "width b", d2, StepUnit.Length, "NDS 2018 3.7.1.3");
        trace.Add("le1/d1", "slenderness ratio about y", "Lcr,y / d1", r1, StepUnit.None, "NDS 2018 3.7.1.3");
        trace.Add("le2/d2", "slenderness ratio about z", "Lcr,z / d2", r2, StepUnit.None, "NDS 2018 3.7.1.3");
        trace.Add("le/d", "governing slenderness ratio", "max(le1/d1, le2/d2)", r, StepUnit.None, "NDS 2018 3.7.1.3");
        trace.Add("(le/d)max", "slenderness limit", AllowsConstructionSlenderness ? "75 (during construction only)" : "50", SlendernessLimit, StepUnit.None, "NDS 2018 3.7.1.4");
        trace.Add("FcE", "critical buckling design value", "0.822 E′min / (le/d)²", fcE, StepUnit.Stress, "NDS 2018 3.7.1.5 (3.7-1)");
        trace.Add("c", "column constant", ProductText(mat.Product) + ": " + (c == 0.8 ? "0.8" : c == 0.85 ? "0.85" : "0.9"), c, StepUnit.None, "NDS 2018 3.7.1.5");
        trace.Add("Cp", "column stability factor", "(1 + FcE/Fc*)/(2c) − √[((1 + FcE/Fc*)/(2c))² − (FcE/Fc*)/c]", cp, StepUnit.None, "NDS 2018 3.7.1.5 (3.7-1)");
        trace.Add("F′c", "adjusted compression design value", "Fc* Cp", fcP, StepUnit.Stress, "NDS 2018 3.7.1");
        TimberRules.Actions(trace, actions, m1, m2);
        trace.Add("fc", "actual compression stress", "P / A", fc, StepUnit.Stress, "NDS 2018 3.6.3");
        if (bending)
        {
            trace.Add("CM", "wet service factor on Fb", TimberRules.Input, adj.WetServiceFb, StepUnit.None, "NDS 2018 4.3.3");
            trace.Add("Ct", "temperature factor on Fb", TimberRules.Input, adj.TemperatureFb, StepUnit.None, "NDS 2018 2.3.3");
            trace.Add("CF", "size factor on Fb", TimberRules.Input, adj.SizeFb, StepUnit.None, "NDS 2018 4.3.6");
            trace.Add("Ci", "incising factor on Fb", TimberRules.Input, adj.IncisingFb, StepUnit.None, "NDS 2018 4.3.8");
            trace.Add("Cr", "repetitive member factor on Fb", TimberRules.Input, adj.Repetitive, StepUnit.None, "NDS 2018 4.3.9");
            trace.Add("Cfu", "flat use factor on Fb about z", TimberRules.Input, adj.FlatUse, StepUnit.None, "NDS 2018 4.3.7");
            if (!asd)
            {
                trace.Add("KF", "format conversion factor for Fb", "2.54", kfB, StepUnit.None, "NDS 2018 Table 4.3.1, N.3.1");
                trace.Add("φb", "resistance factor for bending", "0.85", phiB, StepUnit.None, "NDS 2018 Table 4.3.1, N.3.2");
            }
            trace.Add("Fb*", "bending design value with all factors but CL and Cfu", asd ? "Fb CD CM Ct CF Ci Cr" : "Fb CM Ct CF Ci Cr KF φb λ", fbStar, StepUnit.Stress, "NDS 2018 Table 4.3.1");
            if (ltb)
            {
                trace.Add("lu", "laterally unsupported length (free to twist)", "K,twist × longest segment", member.EffectiveLengthTorsionalM, StepUnit.Length, "NDS 2018 3.3.3.4");
                trace.Add("le", "effective length for bending", "Table 3.3.3, any loading: 2.06 lu, 1.63 lu + 3d or 1.84 lu", le, StepUnit.Length, "NDS 2018 3.3.3.5, Table 3.3.3");
                trace.Add("RB", "slenderness ratio for bending", "√(le d / b²)", rb, StepUnit.None, "NDS 2018 3.3.3.6 (3.3-5)");
                trace.Add("FbE", "critical buckling design value for bending", "1.20 E′min / RB²", fbE, StepUnit.Stress, "NDS 2018 3.3.3.8");
                trace.Add("CL", "beam stability factor", "(1 + FbE/Fb*)/1.9 − √[((1 + FbE/Fb*)/1.9)² − (FbE/Fb*)/0.95]", cl, StepUnit.None, "NDS 2018 3.3.3.8 (3.3-6)");
            }
            else if (fb1 > 0)
                trace.Note("Edgewise bending with depth not above breadth (or a round section): CL = 1.", "NDS 2018 3.3.3.1");
            trace.Add("F′b1", "adjusted bending design value about y", "Fb* CL", fb1P, StepUnit.Stress, "NDS 2018 3.9.2");
            trace.Add("F′b2", "adjusted bending design value about z", "Fb* Cfu", fb2P, StepUnit.Stress, "NDS 2018 3.9.2, 4.3.7");
            trace.Add("fc(6e1/d1)", "edgewise bending stress from the end eccentricity (about y)", "My,Ed / Sy", fb1, StepUnit.Stress, "NDS 2018 15.4.1");
            trace.Add("fc(6e2/d2)", "flatwise bending stress from the end eccentricity (about z)", "Mz,Ed / Sz", fb2, StepUnit.Stress, "NDS 2018 15.4.1");
            trace.Add("FcE1", "critical buckling design value about y", "0.822 E′min / (le1/d1)²", fcE1, StepUnit.Stress, "NDS 2018 3.9.2");
            trace.Add("FcE2", "critical buckling design value about z", "0.822 E′min / (le2/d2)²", fcE2, StepUnit.Stress, "NDS 2018 3.9.2");
            trace.Add("1 − fc/FcE1", "amplification denominator about y", "1 − fc / FcE1", den1, StepUnit.None, "NDS 2018 3.9.2 (3.9-3), 15.4.1");
            trace.Add("1 − fc/FcE2 − (fbe1/FbE)²", "amplification denominator about z", "1 − fc / FcE2 − (fc(6e1/d1) / FbE)²", den2, StepUnit.None, "NDS 2018 3.9.2 (3.9-4), 15.4.1");
            if (unbounded)
                trace.Note("An amplification denominator is not positive (fc ≥ FcE1, fc/FcE2 + (fbe1/FbE)² ≥ 1 or fbe1 ≥ FbE): the member is unstable and fails.", "NDS 2018 3.9.2");
            trace.Add("u", "eccentric axial compression (no side loads)",
                "(fc/F′c)² + fbe1 [1 + 0.234 fc/FcE1] / [F′b1 (1 − fc/FcE1)] + fbe2 [1 + 0.234 fc/FcE2 + 0.234 (fbe1/FbE)²] / [F′b2 (1 − fc/FcE2 − (fbe1/FbE)²)], fbe = fc 6e/d",
                u, StepUnit.None, "NDS 2018 15.4.1 (15.4-1), with 3.9.2");
        }
        else
            trace.Add("u", "utilisation in compression", "fc / F′c", u, StepUnit.None, "NDS 2018 3.6.3, 3.7.1");
    }

    private static string ProductText(NdsProduct p) => p switch
    {
        NdsProduct.SawnLumber => "sawn lumber",
        NdsProduct.RoundTimberPole => "round timber pole",
        NdsProduct.Glulam => "glulam",
        _ => "structural composite lumber",
    };
}
