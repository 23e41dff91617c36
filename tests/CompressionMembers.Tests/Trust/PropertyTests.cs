using System;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CsCheck;
using UnitsNet;
using CompressionMembers.Tests.Support;
using Xunit.Abstractions;

namespace CompressionMembers.Tests.Trust;

/// <summary>
/// Properties every method family must keep, sampled with CsCheck generators from the recorded seed (<see cref="Seed"/>)
/// through <see cref="DeterministicSampling"/>, so every iteration repeats on every run; a failure names the seed that
/// replays it.
/// Bounds: 0 &lt; resistance ≤ a squash-type bound. Monotonicity: resistance falls with length and rises with section
/// size. Unit invariance: the same member typed in mm/MPa and in inch/psi. Symmetry: swapping the axes of a doubly
/// symmetric section changes nothing but the governing axis. Scale invariance at equal slenderness.
/// </summary>
public class PropertyTests(ITestOutputHelper output)
{
    /// <summary>The recorded seed of every property here (CsCheck seed format); iteration k draws from seed + k.</summary>
    public const string Seed = "0N0XIzNsQ0O2";

    private const int Iterations = 60;

    private void Run<T>(Gen<T> gen, Action<T> property) =>
        gen.Sample(property, writeLine: output.WriteLine, seed: Seed, iter: Iterations, threads: 1);

    private static Length Mm(double v) => Length.FromMillimeters(v);

    private static DesignActions Load => DesignActions.Compression(Force.FromKilonewtons(1)).WithLoadDuration(LoadDurationClass.MediumTerm);

    private static Member Rect(double b, double h, double l, Material m) =>
        Member.Create(new RectangleSection(Mm(b), Mm(h)), m, Mm(l), Restraint.PinnedBothAxes, "property member");

    private static Member Rhs(double b, double t, double l, Material m) =>
        Member.Create(new RectangularHollowSection(Mm(b), Mm(b), Mm(t)), m, Mm(l), Restraint.PinnedBothAxes, "property tube");

    private static double N(Member m, IResistanceMethod method) => Check.Evaluate(m, Load, method).DesignResistanceN;

    /// <summary>The families, each with a member maker (size, length in mm) and the squash-type bound in N.</summary>
    private static readonly (string Name, IResistanceMethod Method, Func<double, double, Member> Make, Func<Member, double> Bound)[] Families =
    [
        // EN 1995-1-1 6.3.2: N ≤ A kmod fc,0,k / γM (kmod 0.8 medium-term service class 1, γM 1.3 solid timber; Tables 3.1, 2.3).
        ("EC5 column", ResistanceMethods.Ec5Column, (s, l) => Rect(s, 1.5 * s, l, TimberGrades.C24),
            m => m.Section.Area.SquareMeters * 21e6 * 0.8 / 1.3 * (1 + 1e-12)),
        // EN 1995-1-2 4.2.2: in fire N ≤ A_ef kfi fc,0,k / γM,fi ≤ A 1.25 fc,0,k (kfi 1.25 solid timber, γM,fi 1.0, Table 2.1).
        ("EC5 fire R30", ResistanceMethods.Ec5FireR30, (s, l) => Rect(s + 80, 1.5 * s + 80, l, TimberGrades.C24),
            m => m.Section.Area.SquareMeters * 21e6 * 1.25 * (1 + 1e-12)),
        // NDS 2018 3.7.1: P ≤ A Fc* = A Fc CD (CD as the method maps the medium-term class, NDS Table 2.3.2).
        ("NDS column ASD", ResistanceMethods.NdsColumnAsd, (s, l) => Rect(s, 1.5 * s, Math.Min(l, 50 * s), NdsGrades.DouglasFirLarchNo2),
            m => m.Section.Area.SquareMeters * Pressure.FromPoundsForcePerSquareInch(1350).Pascals
                * CompressionMembers.Methods.Timber.NdsColumnStability.LoadDurationFactorFor(LoadDurationClass.MediumTerm) * (1 + 1e-12)),
        // EN 1999-1-1 6.3.1: NRd ≤ A f0 / γM1 (6082-T6 extrusion f0 250 MPa, γM1 1.1).
        ("EC9 column", ResistanceMethods.Eurocode9, (s, l) => Rhs(2 * s, 4, l, AluminiumAlloys.EnAw6082T6Extrusion),
            m => m.Section.Area.SquareMeters * 250e6 / 1.1 * (1 + 1e-12)),
        // Buckling constants: φ Pn ≤ A f0 (the compressive yield, common practice); LRFD φ 0.9.
        ("buckling constants", ResistanceMethods.AluminiumBucklingConstantsLrfd, (s, l) => Rhs(2 * s, 4, l, AluminiumAlloys.EnAw6082T6Extrusion),
            m => m.Section.Area.SquareMeters * 250e6 * (1 + 1e-12)),
        // Tangent-modulus column: N ≤ the Euler load with the initial modulus (Et ≤ E) and ≤ A fu (the stress-strain law stays below fu; common practice).
        ("tangent modulus", ResistanceMethods.TangentModulusRambergOsgood, (s, l) => Rhs(2 * s, 4, l, AluminiumAlloys.EnAw6082T6Extrusion),
            m => Math.Min(m.Section.Area.SquareMeters * 290e6,
                Math.PI * Math.PI * 70e9 * Math.Min(m.Section.SecondMomentY.MetersToTheFourth, m.Section.SecondMomentZ.MetersToTheFourth) / (m.Length.Meters * m.Length.Meters)) * (1 + 1e-9)),
        // FE buckling: Ncr ≤ π² E I / L² (1 + 1e-5) for a pinned uniform bar (the mesh is stiffer, never softer, than the exact bar:
        // conforming Hermite elements give an upper bound; Euler 1744).
        ("FE critical load", ResistanceMethods.FiniteElementCritical, (s, l) => Rect(s, 1.5 * s, l, IsotropicMaterial.GenericStructuralSteel),
            m => Math.PI * Math.PI * 200e9 * m.Section.SecondMomentZ.MetersToTheFourth / (m.Length.Meters * m.Length.Meters) * (1 + 1e-5)),
        // Second-order elastic: N ≤ A fy (first yield cannot exceed the squash load; fy 250 MPa, common practice).
        ("second order", ResistanceMethods.SecondOrderElastic, (s, l) => Rect(s, 1.5 * s, l, IsotropicMaterial.GenericStructuralSteel),
            m => m.Section.Area.SquareMeters * 250e6 * (1 + 1e-9)),
        // Classical: Perry–Robertson and Johnson ≤ A fy (common practice).
        ("Perry-Robertson", ResistanceMethods.PerryRobertsonDefault, (s, l) => Rect(s, 1.5 * s, l, IsotropicMaterial.GenericStructuralSteel),
            m => m.Section.Area.SquareMeters * 250e6 * (1 + 1e-12)),
        ("Johnson", ResistanceMethods.Johnson, (s, l) => Rect(s, 1.5 * s, l, IsotropicMaterial.GenericStructuralSteel),
            m => m.Section.Area.SquareMeters * 250e6 * (1 + 1e-12)),
    ];

    public static TheoryData<int> FamilyIndex()
    {
        var d = new TheoryData<int>();
        for (int i = 0; i < Families.Length; i++) d.Add(i);
        return d;
    }

    [Theory]
    [MemberData(nameof(FamilyIndex))]
    public void Resistance_AnySizeAndLength_IsPositiveAndWithinItsSquashTypeBound(int family)
    {
        var f = Families[family];
        Run(Gen.Select(Gen.Double[40, 200], Gen.Double[200, 6000]), t =>
        {
            var m = f.Make(t.Item1, t.Item2);
            double n = N(m, f.Method), bound = f.Bound(m);
            if (!(n > 0 && n <= bound))
                throw new Xunit.Sdk.XunitException($"{f.Name}: size {t.Item1:R} mm, length {m.Length.Millimeters:R} mm: N = {n:R} N, bound {bound:R} N");
        });
    }

    [Theory]
    [MemberData(nameof(FamilyIndex))]
    public void Resistance_LongerMember_IsNoGreater(int family)
    {
        var f = Families[family];
        Run(Gen.Select(Gen.Double[40, 200], Gen.Double[200, 5000], Gen.Double[1, 1000]), t =>
        {
            double n1 = N(f.Make(t.Item1, t.Item2), f.Method), n2 = N(f.Make(t.Item1, t.Item2 + t.Item3), f.Method);
            // Relative 1e-9: the secant/FE roots and mesh choices have a last-digit tolerance where two lengths give nearly equal capacity.
            if (n2 > n1 * (1 + 1e-9))
                throw new Xunit.Sdk.XunitException($"{f.Name}: size {t.Item1:R}, L {t.Item2:R} → {t.Item2 + t.Item3:R} mm: N rose {n1:R} → {n2:R}");
        });
    }

    [Theory]
    [MemberData(nameof(FamilyIndex))]
    public void Resistance_LargerSectionOfTheSameShape_IsNoSmaller(int family)
    {
        var f = Families[family];
        Run(Gen.Select(Gen.Double[40, 150], Gen.Double[1, 50], Gen.Double[500, 4000]), t =>
        {
            double n1 = N(f.Make(t.Item1, t.Item3), f.Method), n2 = N(f.Make(t.Item1 + t.Item2, t.Item3), f.Method);
            if (n2 < n1 * (1 - 1e-9))
                throw new Xunit.Sdk.XunitException($"{f.Name}: L {t.Item3:R} mm, size {t.Item1:R} → {t.Item1 + t.Item2:R}: N fell {n1:R} → {n2:R}");
        });
    }

    [Theory]
    [MemberData(nameof(FamilyIndex))]
    public void Check_AnySizeLengthAndLoadOverManyDecades_IsFiniteOrRefusedTyped(int family)
    {
        // Sizes 1 mm to 10 m, lengths 1 mm to 1 km, loads 1 N to 1 GN, drawn log-uniformly: every check either gives a
        // finite, non-negative resistance with a utilisation that is not NaN, or refuses with an ArgumentException
        // (MethodNotApplicableException included). An InvalidOperationException would be a method returning NaN.
        var f = Families[family];
        Run(Gen.Select(Gen.Double[0, 4], Gen.Double[0, 6], Gen.Double[0, 9]), t =>
        {
            double size = Math.Pow(10, t.Item1), length = Math.Pow(10, t.Item2), load = Math.Pow(10, t.Item3);
            Member m;
            try { m = f.Make(size, length); }
            catch (ArgumentException) { return; }
            var a = DesignActions.Compression(Force.FromNewtons(load)).WithLoadDuration(LoadDurationClass.MediumTerm);
            try
            {
                var r = Check.Evaluate(m, a, f.Method);
                if (!(double.IsFinite(r.DesignResistanceN) && r.DesignResistanceN >= 0) || double.IsNaN(r.Utilisation))
                    throw new Xunit.Sdk.XunitException($"{f.Name}: size {size:R} mm, L {length:R} mm, N {load:R} N: resistance {r.DesignResistanceN:R}, u {r.Utilisation:R}");
            }
            catch (ArgumentException) { }
            catch (InvalidOperationException e)
            {
                throw new Xunit.Sdk.XunitException($"{f.Name}: size {size:R} mm, L {length:R} mm, N {load:R} N: {e.Message}");
            }
        });
    }

    [Fact]
    public void Ec5_SameMemberInInchAndPsi_GivesTheSameResistance()
    {
        // 1 in = 25.4 mm and 1 psi = 6894.757 Pa (exact definitions); the check works in SI, so only rounding may differ.
        var c = TimberGrades.C24;
        TimberMaterial Psi() => TimberMaterial.Create("C24 in psi", c.Product, P(c.CompressionStrength), P(c.BendingStrength), P(c.TensionStrength),
            P(c.ShearStrength), P(c.MeanModulus), P(c.FifthPercentileModulus), P(c.MeanShearModulus),
            Density.FromPoundsPerCubicFoot(c.CharacteristicDensity.PoundsPerCubicFoot), Density.FromPoundsPerCubicFoot(c.MeanDensity.PoundsPerCubicFoot), c.Source);
        var imperial = Psi();
        Run(Gen.Select(Gen.Double[40, 200], Gen.Double[300, 5000]), t =>
        {
            var si = Rect(t.Item1, 1.5 * t.Item1, t.Item2, c);
            var us = Member.Create(new RectangleSection(Length.FromInches(t.Item1 / 25.4), Length.FromInches(1.5 * t.Item1 / 25.4)), imperial,
                Length.FromInches(t.Item2 / 25.4), Restraint.PinnedBothAxes);
            Near.Relative(N(si, ResistanceMethods.Ec5Column), N(us, ResistanceMethods.Ec5Column), 1e-9, "unit invariance (common practice)");
        });
    }

    private static Pressure P(Pressure p) => Pressure.FromPoundsForcePerSquareInch(p.PoundsForcePerSquareInch);

    [Fact]
    public void Nds_SameMemberInMmAndMpa_GivesTheSameResistance()
    {
        // NDS grades are tabulated in psi; the same grade typed in MPa and mm must give the same capacity.
        var g = NdsGrades.DouglasFirLarchNo2;
        var metric = new NdsTimberMaterial("DF-L No. 2 in MPa", g.Product, Pressure.FromMegapascals(g.CompressionValue.Megapascals),
            Pressure.FromMegapascals(g.BendingValue.Megapascals), Pressure.FromMegapascals(g.Modulus.Megapascals),
            Pressure.FromMegapascals(g.StabilityModulus.Megapascals), Density.FromKilogramsPerCubicMeter(g.Density.KilogramsPerCubicMeter), g.Source);
        Run(Gen.Select(Gen.Double[1.5, 7.5], Gen.Double[2, 40]), t =>
        {
            double b = t.Item1, le = t.Item2 * b; // le/d from 2 to 40: inside the 50 limit of NDS 3.7.1.4
            var us = Member.Create(new RectangleSection(Length.FromInches(b), Length.FromInches(1.5 * b)), g, Length.FromInches(le), Restraint.PinnedBothAxes);
            var si = Member.Create(new RectangleSection(Mm(b * 25.4), Mm(1.5 * b * 25.4)), metric, Mm(le * 25.4), Restraint.PinnedBothAxes);
            Near.Relative(N(us, ResistanceMethods.NdsColumnAsd), N(si, ResistanceMethods.NdsColumnAsd), 1e-9, "unit invariance (common practice)");
        });
    }

    [Fact]
    public void Ec9AndFe_SameMemberInInch_GivesTheSameResistance()
    {
        Run(Gen.Double[500, 5000], l =>
        {
            var si = Rhs(80, 4, l, AluminiumAlloys.EnAw6082T6Extrusion);
            var us = Member.Create(new RectangularHollowSection(Length.FromInches(80 / 25.4), Length.FromInches(80 / 25.4), Length.FromInches(4 / 25.4)),
                AluminiumAlloys.EnAw6082T6Extrusion, Length.FromInches(l / 25.4), Restraint.PinnedBothAxes);
            Near.Relative(N(si, ResistanceMethods.Eurocode9), N(us, ResistanceMethods.Eurocode9), 1e-9, "unit invariance (common practice)");
            Near.Relative(N(si, ResistanceMethods.FiniteElementCritical), N(us, ResistanceMethods.FiniteElementCritical), 1e-9, "unit invariance (common practice)");
            Near.Relative(N(si, ResistanceMethods.AluminiumBucklingConstantsLrfd), N(us, ResistanceMethods.AluminiumBucklingConstantsLrfd), 1e-9, "unit invariance (common practice)");
        });
    }

    [Theory]
    [MemberData(nameof(FamilyIndex))]
    public void Resistance_SameMemberTypedInInches_IsTheSame(int family)
    {
        // Every family's member re-typed with its section and length in inches (1 in = 25.4 mm exactly): the check works
        // in SI, so only conversion rounding may differ (common practice: a result cannot depend on the unit of entry).
        var f = Families[family];
        static Length In(Length l) => Length.FromInches(l.Millimeters / 25.4);
        Run(Gen.Select(Gen.Double[40, 200], Gen.Double[300, 5000]), t =>
        {
            var si = f.Make(t.Item1, t.Item2);
            Section us = si.Section switch
            {
                RectangleSection r => new RectangleSection(In(r.Width), In(r.Depth)),
                RectangularHollowSection h => new RectangularHollowSection(In(h.Width), In(h.Depth), In(h.WallThickness)),
                _ => throw new InvalidOperationException("unexpected section"),
            };
            var inch = Member.Create(us, si.Material, In(si.Length), si.Restraint, si.Name);
            Near.Relative(N(si, f.Method), N(inch, f.Method), 1e-9, $"{f.Name}: unit invariance (common practice)");
        });
    }

    [Theory]
    [MemberData(nameof(FamilyIndex))]
    public void Resistance_RectangleTurnedThroughNinetyDegrees_ChangesOnlyTheAxisLabel(int family)
    {
        // A b × h rectangle and the same rectangle h × b (axes y and z swapped) under pinned ends on both axes: the same
        // member turned, so the same resistance; the governing axis swaps between y and z.
        var f = Families[family];
        if (f.Method is CompressionMembers.Methods.Aluminium.Eurocode9Compression or CompressionMembers.Methods.Aluminium.BucklingConstantMethod or CompressionMembers.Methods.Aluminium.TangentModulusColumn)
        {
            Run(Gen.Select(Gen.Double[60, 120], Gen.Double[1.1, 1.6], Gen.Double[500, 4000]), t =>
            {
                var a = Member.Create(new RectangularHollowSection(Mm(t.Item1), Mm(t.Item1 * t.Item2), Mm(4)), AluminiumAlloys.EnAw6082T6Extrusion, Mm(t.Item3), Restraint.PinnedBothAxes);
                var b = Member.Create(new RectangularHollowSection(Mm(t.Item1 * t.Item2), Mm(t.Item1), Mm(4)), AluminiumAlloys.EnAw6082T6Extrusion, Mm(t.Item3), Restraint.PinnedBothAxes);
                Swapped(f.Name, f.Method, a, b);
            });
            return;
        }
        Material mat = f.Make(100, 1000).Material;
        double extra = f.Method is CompressionMembers.Methods.Timber.Ec5FireReducedSection ? 80 : 0;
        Run(Gen.Select(Gen.Double[40, 150], Gen.Double[1.1, 2], Gen.Double[300, 2000]), t =>
        {
            double b = t.Item1 + extra, h = t.Item1 * t.Item2 + extra;
            Swapped(f.Name, f.Method, Rect(b, h, t.Item3, mat), Rect(h, b, t.Item3, mat));
        });
    }

    private static void Swapped(string name, IResistanceMethod method, Member a, Member b)
    {
        var ra = Check.Evaluate(a, Load, method);
        var rb = Check.Evaluate(b, Load, method);
        Near.Relative(ra.DesignResistanceN, rb.DesignResistanceN, 1e-12, $"{name}: symmetry of the turned section (common practice)");
        // The axis values swap too; the governing label swaps wherever one axis is weaker (at a tie, such as kc = 1 on both
        // axes of a stocky post, either label is right).
        Near.Relative(ra.AboutY.ResistanceN, rb.AboutZ.ResistanceN, 1e-12, $"{name}: y of one is z of the other");
        Near.Relative(ra.AboutZ.ResistanceN, rb.AboutY.ResistanceN, 1e-12, $"{name}: z of one is y of the other");
        if (Math.Abs(ra.AboutY.ResistanceN - ra.AboutZ.ResistanceN) > 1e-9 * ra.AboutY.ResistanceN)
        {
            static BucklingAxis Other(BucklingAxis x) => x == BucklingAxis.Y ? BucklingAxis.Z : x == BucklingAxis.Z ? BucklingAxis.Y : x;
            Assert.Equal(Other(ra.GoverningAxis), rb.GoverningAxis);
        }
    }

    [Fact]
    public void CriticalLoad_ScaledMember_ScalesWithTheSquareOfTheScale()
    {
        // Euler: Ncr = π² E I / L². Scaling every length by k scales I by k⁴ and L² by k², so Ncr by k² at equal slenderness
        // (Euler 1744; dimensional analysis). Checked for the classical Euler method and the FE critical load.
        Run(Gen.Select(Gen.Double[0.3, 3], Gen.Double[1000, 5000]), t =>
        {
            double k = t.Item1;
            var m1 = Rect(50, 80, t.Item2, IsotropicMaterial.GenericStructuralSteel);
            var mk = Rect(50 * k, 80 * k, t.Item2 * k, IsotropicMaterial.GenericStructuralSteel);
            foreach (var method in new IResistanceMethod[] { ResistanceMethods.FiniteElementCritical })
                Near.Relative(k * k * N(m1, method), N(mk, method), 1e-9, "Ncr ∝ k² at equal slenderness (Euler)");
            Near.Relative(k * k * Check.Evaluate(m1, Load, ResistanceMethods.Euler).AboutZ.CriticalForceN,
                Check.Evaluate(mk, Load, ResistanceMethods.Euler).AboutZ.CriticalForceN, 1e-9, "Ncr ∝ k² at equal slenderness (Euler)");
        });
    }

    [Theory]
    [InlineData(0)] // EC5 column
    [InlineData(2)] // NDS column
    [InlineData(3)] // EC9 column
    [InlineData(8)] // Perry–Robertson
    public void DesignStress_ScaledMemberAtEqualSlenderness_IsUnchanged(int family)
    {
        // Column curves depend on the slenderness L/i only (EN 1995-1-1 6.3.2, NDS 3.7.1 through le/d, EN 1999-1-1 6.3.1.2
        // with b/t unchanged, Perry–Robertson): scaling every length by k leaves N/A unchanged.
        var f = Families[family];
        double kMax = family == 3 ? 1.25 : 3; // EC9: the 6082-T6 extrusion values hold up to t = 5 mm (4 mm × 1.25)
        Run(Gen.Select(Gen.Double[0.8, kMax], Gen.Double[500, 3000]), t =>
        {
            double k = t.Item1;
            var m1 = family == 3 ? Rhs(80, 4, t.Item2, AluminiumAlloys.EnAw6082T6Extrusion) : Rect(60, 90, Math.Min(t.Item2, 50 * 60), f.Make(60, 1000).Material);
            var mk = family == 3 ? Rhs(80 * k, 4 * k, t.Item2 * k, AluminiumAlloys.EnAw6082T6Extrusion) : Rect(60 * k, 90 * k, Math.Min(t.Item2, 50 * 60) * k, f.Make(60, 1000).Material);
            Near.Relative(N(m1, f.Method) / m1.Section.Area.SquareMeters, N(mk, f.Method) / mk.Section.Area.SquareMeters, 1e-9,
                $"{f.Name}: N/A depends on slenderness only (column-curve form)");
        });
    }
}
