using System;
using System.Runtime.CompilerServices;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Resolution;
using CompressionMembers.Results;
using CompressionMembers.Sections;

namespace CompressionMembers.Methods.Timber;

/// <summary>What the timber methods share: applicability sentences, the design moments from the actions, and trace helpers.</summary>
internal static class TimberRules
{
    internal const string Input = "input";
    internal const string MomentRule = "first order: |NEd e| + max |M,end| (common practice; kc covers the column effect)";

    // Each rule tests inline and builds its sentence in a separate, non-inlined method: the sentences are formed only when
    // a method is refused, and kept out of the code of every check (where the JIT would otherwise inline the string
    // building into the caller's loop, with its spills and its share of the inlining budget).

    internal static Applicability EuropeanMaterial(in ResolvedMember m, string method) =>
        m.Material is TimberMaterial ? Applicability.Applicable : NotEuropean(m.Material, method);

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static Applicability NotEuropean(Material mat, string method) => mat is NdsTimberMaterial
        ? Applicability.NotApplicable($"{method} needs a European strength class (TimberMaterial, EN 338 / EN 14080 / LVL) with characteristic values; \"{mat.Name}\" holds US reference design values: use the NDS column method.")
        : Applicability.NotApplicable($"{method} covers timber only; \"{mat.Name}\" is a {mat.Kind} material. Use a TimberMaterial (TimberGrades.C24, GL28h, …) or another method.");

    internal static Applicability SolidSection(in ResolvedMember m, string method, bool allowCircle)
    {
        var k = m.SectionKind;
        if (k == SectionKind.SolidRectangle || (allowCircle && k == SectionKind.SolidCircle)) return Applicability.Applicable;
        return NotSolid(m.Section.Designation, k, method, allowCircle);
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static Applicability NotSolid(string designation, SectionKind k, string method, bool allowCircle) =>
        Applicability.NotApplicable(allowCircle
            ? $"{method} addresses solid rectangular and circular timber sections; \"{designation}\" is a {k} section. Model it as a RectangleSection or CircleSection, or use another method."
            : $"{method} addresses solid rectangular timber sections (RectangleSection); \"{designation}\" is a {k} section.");

    internal static Applicability NoInitialBow(in ResolvedActions a, string method) =>
        a.HasInitialBowY || a.HasInitialBowZ ? HasBow(method) : Applicability.Applicable;

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static Applicability HasBow(string method) =>
        Applicability.NotApplicable($"{method} allows for initial bow through its column curve (βc, within the straightness limits of EN 1995-1-1 10.2: L/300 solid timber, L/500 glulam and LVL); remove the initial bow from the actions, or use a second-order method that takes it.");

    internal static Applicability Duration(in ResolvedActions a, string method, string what) =>
        a.LoadDuration == LoadDurationClass.Unspecified ? NoDuration(method, what) : Applicability.Applicable;

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static Applicability NoDuration(string method, string what) =>
        Applicability.NotApplicable($"{method} needs the load-duration class of the action case to set {what}; give it with DesignActions.WithLoadDuration (permanent, long-term, medium-term, short-term or instantaneous), or give {what} explicitly when creating the method.");

    /// <summary>First-order design moment about y at the governing section: |N ey| + max(|My,top|, |My,bottom|).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static double MomentY(in ResolvedActions a) =>
        Math.Abs(a.AxialForceN * a.EccentricityYM) + Math.Max(Math.Abs(a.EndMomentYTopNm), Math.Abs(a.EndMomentYBottomNm));

    /// <summary>First-order design moment about z at the governing section.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static double MomentZ(in ResolvedActions a) =>
        Math.Abs(a.AxialForceN * a.EccentricityZM) + Math.Max(Math.Abs(a.EndMomentZTopNm), Math.Abs(a.EndMomentZBottomNm));

    /// <summary>Width b (along y) and depth h (along z) of a rectangle; the diameter twice for a circle.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static void Dimensions(in ResolvedMember m, out double bM, out double hM)
    {
        // From the resolved fibre distances (doubles): a rectangle spans them exactly, a circle has radius d/2 both ways.
        bM = m.FibrePositiveYM + m.FibreNegativeYM;
        hM = m.FibrePositiveZM + m.FibreNegativeZM;
    }

    internal static double ModulusY(in ResolvedMember m) => m.SectionModulusYM3;
    internal static double ModulusZ(in ResolvedMember m) => m.SectionModulusZM3;

    internal static void Actions(CalculationTrace t, in ResolvedActions a, double myNm, double mzNm)
    {
        t.Add("NEd", "design axial compression", Input, a.AxialForceN, StepUnit.Force, "actions");
        if (a.EccentricityYM != 0) t.Add("ey", "load eccentricity bending about y", Input, a.EccentricityYM, StepUnit.Length, "actions");
        if (a.EccentricityZM != 0) t.Add("ez", "load eccentricity bending about z", Input, a.EccentricityZM, StepUnit.Length, "actions");
        if (a.EndMomentYTopNm != 0 || a.EndMomentYBottomNm != 0)
        {
            t.Add("My,top", "end moment about y, top", Input, a.EndMomentYTopNm, StepUnit.Moment, "actions");
            t.Add("My,bot", "end moment about y, bottom", Input, a.EndMomentYBottomNm, StepUnit.Moment, "actions");
        }
        if (a.EndMomentZTopNm != 0 || a.EndMomentZBottomNm != 0)
        {
            t.Add("Mz,top", "end moment about z, top", Input, a.EndMomentZTopNm, StepUnit.Moment, "actions");
            t.Add("Mz,bot", "end moment about z, bottom", Input, a.EndMomentZBottomNm, StepUnit.Moment, "actions");
        }
        if (myNm != 0 || mzNm != 0)
        {
            t.Add("My,Ed", "design moment about y at the governing section", "|NEd ey| + max |My,end|", myNm, StepUnit.Moment, MomentRule);
            t.Add("Mz,Ed", "design moment about z at the governing section", "|NEd ez| + max |Mz,end|", mzNm, StepUnit.Moment, MomentRule);
        }
    }


    internal static string ServiceClassText(ServiceClass s) => s switch
    {
        ServiceClass.Class1 => "service class 1",
        ServiceClass.Class2 => "service class 2",
        _ => "service class 3",
    };

    internal static string ProductText(TimberProduct p) => p switch
    {
        TimberProduct.SolidSoftwood => "solid softwood",
        TimberProduct.SolidHardwood => "solid hardwood",
        TimberProduct.GlulamHomogeneous => "homogeneous glulam",
        TimberProduct.GlulamCombined => "combined glulam",
        _ => "LVL",
    };
}
