using System;
using System.Linq;
using System.Numerics;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Aluminium;
using CompressionMembers.Resolution;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using CsCheck;
using UnitsNet;
using static CompressionMembers.Tests.Aluminium.AluminiumCases;

namespace CompressionMembers.Tests.Aluminium;

public class Eurocode9CompressionTests
{
    private const double E = 70e9, F0 = 250e6;

    private static double ChiA(double l)
    {
        // EN 1999-1-1 6.3.1.2 with class A α = 0.20, λ̄0 = 0.10 (Table 6.6, from memory), written out here independently.
        if (l <= 0.1) return 1;
        double phi = 0.5 * (1 + 0.2 * (l - 0.1) + l * l);
        return Math.Min(1, 1 / (phi + Math.Sqrt(phi * phi - l * l)));
    }

    [Fact]
    public void Evaluate_SquareTube6082Class3_MatchesHandCalculation()
    {
        // Hand calculation, EN 1999-1-1 6.3.1: 100 × 100 × 5 tube, walls b/t = 90/5 = 18 ≤ 22ε → class 3, Aeff = A.
        var r = Check.Evaluate(Pinned(Rhs100x5, A6082T6, 3000), Kn(100), ResistanceMethods.Eurocode9);
        double a = (100 * 100 - 90 * 90) * 1e-6, i = (Math.Pow(0.1, 4) - Math.Pow(0.09, 4)) / 12;
        double ncr = Math.PI * Math.PI * E * i / (3.0 * 3.0);
        double lam = Math.Sqrt(a * F0 / ncr);
        double nrd = ChiA(lam) * a * F0 / 1.10;
        Near.Relative(nrd, r.DesignResistanceN, 1e-9, "EN 1999-1-1 6.3.1.1–6.3.1.2, hand calculation in the test");
        Near.Relative(lam, r.AboutY.RelativeSlenderness, 1e-12, "λ̄ = √(A f0 / Ncr), hand calculation");
        Near.Relative(100e3 / nrd, r.Utilisation, 1e-9, "NEd / NRd");
        Assert.Equal(FailureMode.FlexuralBuckling, r.GoverningMode);
        Assert.Equal(BucklingAxis.Y, r.GoverningAxis); // square tube: y and z equal, y reported first
        Assert.False(r.Torsional.IsEvaluated);
    }

    [Fact]
    public void Evaluate_SquareTubeClass4_EffectiveAreaAndSecondMomentMatchHand()
    {
        // 150 × 150 × 3: b/t = 144/3 = 48 > 22ε → class 4; ρc = 32/48 − 220/48² (Table 6.3, class A unwelded internal, from memory).
        var m = Pinned(Rhs150x3, A6082T6, 3000);
        var r = Check.EvaluateWithTrace(m, Kn(100), ResistanceMethods.Eurocode9);
        double rho = 32.0 / 48 - 220.0 / (48 * 48);
        double aMm = 150 * 150 - 144 * 144, aEffMm = aMm - 4 * (1 - rho) * 144 * 3;
        // Ieff: the walls keep their width and their centre line, thickness ρc t (EN 1999-1-1 6.1.5); corners stay.
        double iMm = (Math.Pow(150, 4) - Math.Pow(144, 4)) / 12;
        double lossTopBottom = 2 * (144 * 3 * 73.5 * 73.5 * (1 - rho) + 144 * (27 - Math.Pow(3 * rho, 3)) / 12);
        double lossSides = 2 * (3 * Math.Pow(144, 3) / 12 * (1 - rho));
        double iEffMm = iMm - lossTopBottom - lossSides;
        Near.Relative(aEffMm * 1e-6, Step(r, "Aeff"), 1e-12, "EN 1999-1-1 6.1.5, hand calculation");
        Near.Relative(iEffMm * 1e-12, Step(r, "Ieff,y"), 1e-10, "effective section, hand calculation");
        double ncr = Math.PI * Math.PI * E * iMm * 1e-12 / 9.0; // Ncr from the gross section
        double lam = Math.Sqrt(aEffMm * 1e-6 * F0 / ncr);
        Near.Relative(ChiA(lam) * aEffMm * 1e-6 * F0 / 1.1, r.DesignResistanceN, 1e-9, "NRd = χ Aeff f0 / γM1, hand calculation");
        Assert.Equal(4.0, Step(r, "class", last: true));
    }

    [Fact]
    public void Evaluate_StockyClass4Tube_LocalBucklingGoverns()
    {
        var r = Check.Evaluate(Pinned(Rhs150x3, A6082T6, 200), Kn(100), ResistanceMethods.Eurocode9);
        Assert.Equal(FailureMode.LocalBuckling, r.GoverningMode);
        double rho = 32.0 / 48 - 220.0 / (48 * 48);
        Near.Relative((1764 - 4 * (1 - rho) * 432) * 1e-6 * F0 / 1.1, r.DesignResistanceN, 1e-9, "Aeff f0 / γM1 with χ = 1 (λ̄ ≤ λ̄0)");
    }

    [Fact]
    public void Evaluate_LongitudinalWelds_KappaMatchesHandAndIsWeaker()
    {
        // Two MIG seams in 5 mm walls: Ahaz = 2 × 2 × bhaz × t = 2 × 2 × 20 × 5 = 400 mm² (bhaz = 20 mm for t ≤ 6 mm, EN 1999-1-1 6.1.6.3, from memory).
        var w = AluminiumWelding.LongitudinalSeams(WeldingProcess.Mig, 2, Mm(5));
        Near.Relative(400e-6, w.HeatAffectedAreaM2, 1e-12, "hand calculation");
        var welded = Check.Evaluate(Pinned(Rhs100x5, A6082T6, 3000), Kn(100), ResistanceMethods.Eurocode9With(w));
        var plain = Check.Evaluate(Pinned(Rhs100x5, A6082T6, 3000), Kn(100), ResistanceMethods.Eurocode9);
        double a = 1900e-6, a1 = a - 400e-6 * (1 - 0.5); // ρo,haz = 125/250 (Table 3.2b, from memory)
        double lam = welded.AboutY.RelativeSlenderness;
        double kappa = 1 - (1 - a1 / a) * Math.Pow(10, -lam) - (0.05 + 0.1 * a1 / a) * Math.Pow(lam, 1.3 * (1 - lam));
        Near.Relative(kappa * ChiA(lam) * a * F0 / 1.1, welded.DesignResistanceN, 1e-9, "EN 1999-1-1 6.3.1.1 with κ of Table 6.5, hand calculation");
        Assert.True(welded.DesignResistanceN < plain.DesignResistanceN);
    }

    [Fact]
    public void Evaluate_EndWelds_HazSectionGovernsShortStrut()
    {
        var r = Check.Evaluate(Pinned(Rhs100x5, A6082T6, 500), Kn(100), ResistanceMethods.Eurocode9With(AluminiumWelding.AtEnds(WeldingProcess.Mig)));
        // EN 1999-1-1 6.2.4 (from memory): min(ρu,haz A fu / γM2, ρo,haz A f0 / γM1) = min(185/290 × 1900 × 290 / 1.25, 0.5 × 1900 × 250 / 1.1) N.
        double expected = Math.Min(185e6 * 1900e-6 / 1.25, 0.5 * 1900e-6 * F0 / 1.1);
        Near.Relative(expected, r.DesignResistanceN, 1e-12, "EN 1999-1-1 6.2.4, hand calculation");
        Assert.Equal(FailureMode.Yielding, r.GoverningMode);
        Assert.Contains("welded end", r.GoverningCheck);
    }

    [Fact]
    public void Evaluate_WeldedNeverStrongerThanUnwelded_Property()
    {
        var seams = ResistanceMethods.Eurocode9With(AluminiumWelding.LongitudinalSeams(WeldingProcess.Mig, 2, Mm(5)));
        var ends = ResistanceMethods.Eurocode9With(AluminiumWelding.AtEnds(WeldingProcess.Tig));
        Gen.Double[150, 8000].Sample(l =>
        {
            var m = Pinned(Rhs100x5, A6082T6, l);
            double plain = Check.Evaluate(m, Kn(10), ResistanceMethods.Eurocode9).DesignResistanceN;
            return Check.Evaluate(m, Kn(10), seams).DesignResistanceN <= plain && Check.Evaluate(m, Kn(10), ends).DesignResistanceN <= plain;
        }, iter: 200);
    }

    [Fact]
    public void Evaluate_ResistanceFallsWithLength_Property()
    {
        Gen.Select(Gen.Double[100, 6000], Gen.Double[1, 2000]).Sample((l, d) =>
            Check.Evaluate(Pinned(Angle80x40x4, A6082T6, l + d), Kn(1), ResistanceMethods.Eurocode9).DesignResistanceN
            <= Check.Evaluate(Pinned(Angle80x40x4, A6082T6, l), Kn(1), ResistanceMethods.Eurocode9).DesignResistanceN * (1 + 1e-12), iter: 200);
    }

    /// <summary>The smallest positive real root of the Timoshenko &amp; Gere cubic, expanded by hand and solved with
    /// MathNet's polynomial roots (companion-matrix eigenvalues), independently of the kernel.</summary>
    private static double[] CubicRoots(Member m)
    {
        var s = m.Section;
        double a = s.Area.SquareMeters, iy = s.SecondMomentY.MetersToTheFourth, iz = s.SecondMomentZ.MetersToTheFourth;
        double y0 = s.ShearCentreOffsetY.Meters, z0 = s.ShearCentreOffsetZ.Meters, it = s.TorsionConstant.MetersToTheFourth, iw = s.WarpingConstantMm6 * 1e-18;
        double l = m.Length.Meters, g = 27e9;
        double ny = Math.PI * Math.PI * E * iy / (l * l), nz = Math.PI * Math.PI * E * iz / (l * l);
        double i02 = (iy + iz) / a + y0 * y0 + z0 * z0;
        double nt = (g * it + Math.PI * Math.PI * E * iw / (l * l)) / i02;
        // i0²(N − Ny)(N − Nz)(N − NT) − y0² N² (N − Nz) − z0² N² (N − Ny), coefficients in ascending powers, N in MN.
        double sc = 1e6; ny /= sc; nz /= sc; nt /= sc;
        double c3 = i02 - y0 * y0 - z0 * z0;
        double c2 = -i02 * (ny + nz + nt) + y0 * y0 * nz + z0 * z0 * ny;
        double c1 = i02 * (ny * nz + ny * nt + nz * nt);
        double c0 = -i02 * ny * nz * nt;
        Complex[] roots = MathNet.Numerics.FindRoots.Polynomial([c0, c1, c2, c3]);
        return [.. roots.Where(r => Math.Abs(r.Imaginary) < 1e-9 * r.Magnitude && r.Real > 0).Select(r => r.Real * sc).OrderBy(x => x)];
    }

    [Fact]
    public void Evaluate_UnequalAngle_FlexuralTorsionalGovernsAndMatchesIndependentCubic()
    {
        var m = Pinned(Angle80x40x4, A6082T6, 500);
        var r = Check.Evaluate(m, Kn(20), ResistanceMethods.Eurocode9);
        Assert.Equal(FailureMode.FlexuralTorsionalBuckling, r.GoverningMode);
        Assert.Equal(BucklingAxis.None, r.GoverningAxis);
        double expected = CubicRoots(m)[0];
        Near.Relative(expected, r.Torsional.CriticalForceN, 1e-8, "Timoshenko & Gere §5.3 cubic, MathNet polynomial roots in the test");
        // The reduction: radiating outstands α = 0.20, λ̄0 = 0.60, Aeff = A (EN 1999-1-1 6.3.1.4, Table 6.6, from memory).
        double a = m.Section.Area.SquareMeters, lam = Math.Sqrt(a * F0 / expected);
        double phi = 0.5 * (1 + 0.2 * (lam - 0.6) + lam * lam);
        double chi = lam <= 0.6 ? 1 : 1 / (phi + Math.Sqrt(phi * phi - lam * lam));
        Near.Relative(chi * a * F0 / 1.1, r.DesignResistanceN, 1e-8, "EN 1999-1-1 6.3.1.4, hand calculation");
    }

    [Fact]
    public void Evaluate_EqualAngle_CoupledRootMatchesIndependentCubic()
    {
        var m = Pinned(AngleSection.Equal(Mm(60), Mm(5)), A6082T6, 1000);
        var r = Check.Evaluate(m, Kn(20), ResistanceMethods.Eurocode9);
        double nz = r.AboutZ.CriticalForceN;
        // For an equal angle the cubic factors into (N − Nz) × quadratic: the minor-axis flexural root is uncoupled.
        double coupled = CubicRoots(m).First(x => Math.Abs(x - nz) > 1e-6 * nz);
        Near.Relative(coupled, r.Torsional.CriticalForceN, 1e-8, "Timoshenko & Gere §5.3 cubic, MathNet polynomial roots in the test");
        Assert.True(r.Torsional.CriticalForceN < r.AboutY.CriticalForceN);
    }

    [Fact]
    public void Evaluate_Tee_ShearCentreOnSymmetryAxis_CouplesWithBendingAboutZ()
    {
        var m = Pinned(new TeeSection(Mm(60), Mm(80), Mm(5), Mm(5)), A6082T6, 1500);
        var r = Check.Evaluate(m, Kn(20), ResistanceMethods.Eurocode9);
        double ny = r.AboutY.CriticalForceN;
        double coupled = CubicRoots(m).First(x => Math.Abs(x - ny) > 1e-6 * ny);
        Near.Relative(coupled, r.Torsional.CriticalForceN, 1e-8, "Timoshenko & Gere §5.3 cubic, MathNet polynomial roots in the test");
    }

    [Fact]
    public void Evaluate_ClassBAlloy_WeakerThanClassAAtEqualStrength()
    {
        // Same f0 (230 MPa), same strut: class B (6082-T5) gives a lower χ than a class A alloy of the same f0 (fact of the trade).
        var b = AluminiumAlloys.EnAw6082T5Extrusion;
        var a = AluminiumAlloy.Create("class A twin", "EN AW-6082", "T6", AluminiumProductForm.Extrusion, b.ProofStrength, b.UltimateStrength,
            b.MinimumThickness, b.MaximumThickness, BucklingClass.A, 0.5, 0.6, 0.4, 0.5);
        var rb = Check.Evaluate(Pinned(Rhs100x5, b, 2500), Kn(10), ResistanceMethods.Eurocode9);
        var ra = Check.Evaluate(Pinned(Rhs100x5, a, 2500), Kn(10), ResistanceMethods.Eurocode9);
        Assert.True(ra.DesignResistanceN > rb.DesignResistanceN);
    }

    [Fact]
    public void Evaluate_CompressionWithBending_InteractionMatchesHand()
    {
        var act = Kn(50).WithEccentricity(Mm(20), Mm(0));
        var r = Check.Evaluate(Pinned(Rhs100x5, A6082T6, 3000), act, ResistanceMethods.Eurocode9);
        // (NEd / Nb,y,Rd)^0.8 + My,Ed / My,Rd, My,Ed = N e, My,Rd = Wel f0 / γM1 (EN 1999-1-1 6.3.3, exponents from memory).
        double i = (Math.Pow(0.1, 4) - Math.Pow(0.09, 4)) / 12, w = i / 0.05;
        double nb = r.AboutY.ResistanceN;
        double expected = Math.Pow(50e3 / nb, 0.8) + 50e3 * 0.02 / (w * F0 / 1.1);
        Near.Relative(expected, r.Utilisation, 1e-9, "EN 1999-1-1 6.3.3, hand calculation");
        Assert.Equal(FailureMode.CombinedCompressionAndBending, r.GoverningMode);
        Assert.Equal(BucklingAxis.Y, r.GoverningAxis);
    }

    [Fact]
    public void Identity_PartialFactors_ReportedAsSettings()
    {
        var m = ResistanceMethods.Eurocode9With(partialFactorM1: 1.2);
        var s = m.Identity.Settings;
        Assert.Equal("γM1", s[0].Symbol);
        Assert.Equal(1.2, s[0].Value);
        Assert.False(s[0].IsRecommendedValue);
        Assert.True(s[1].IsRecommendedValue);
        Assert.Contains("national annex", s[0].Note);
    }

    private static MethodNotApplicableException Refused(Member m, DesignActions a, IResistanceMethod method) =>
        Assert.Throws<MethodNotApplicableException>(() => Check.Evaluate(m, a, method));

    [Fact]
    public void Evaluate_SteelMember_Refused()
    {
        var m = Pinned(Rhs100x5, A6082T6, 1000).WithMaterial(IsotropicMaterial.GenericStructuralSteel);
        var ex = Refused(m, Kn(10), ResistanceMethods.Eurocode9);
        Assert.Equal("method", ex.ParamName);
        Assert.Contains("EN 1999-1-1 needs an aluminium alloy", ex.Message);
    }

    [Fact]
    public void Evaluate_SectionByProperties_Refused()
    {
        var s = new SectionByProperties("given", Area.FromSquareMillimeters(1000), AreaMomentOfInertia.FromMillimetersToTheFourth(1e6),
            AreaMomentOfInertia.FromMillimetersToTheFourth(1e6), Mm(50), Mm(50));
        var ex = Refused(Pinned(s, A6082T6, 1000), Kn(10), ResistanceMethods.Eurocode9);
        Assert.Contains("classification needs the flat parts of the section, which a ByProperties section does not give", ex.Message);
    }

    [Fact]
    public void Evaluate_ThicknessOutsideAlloyBand_Refused()
    {
        var ex = Refused(Pinned(new RectangularHollowSection(Mm(100), Mm(100), Mm(6)), A6082T6, 1000), Kn(10), ResistanceMethods.Eurocode9);
        Assert.Contains("outside the range 0–5 mm", ex.Message);
    }

    [Fact]
    public void Evaluate_BendingOnClass4_Refused()
    {
        var ex = Refused(Pinned(Rhs150x3, A6082T6, 1000), Kn(10).WithEccentricity(Mm(10), Mm(0)), ResistanceMethods.Eurocode9);
        Assert.Contains("class 4 section", ex.Message);
    }

    [Fact]
    public void Evaluate_MajorAxisBendingOfOpenSection_Refused()
    {
        var ex = Refused(Pinned(new ChannelSection(Mm(100), Mm(50), Mm(5), Mm(4)), A6082T6, 1000), Kn(10).WithEccentricity(Mm(10), Mm(0)), ResistanceMethods.Eurocode9);
        Assert.Contains("lateral-torsional buckling", ex.Message);
    }

    [Fact]
    public void Evaluate_MinorAxisBendingOfChannel_Checked()
    {
        // Flanges (30 − 5)/5 = 5 ≤ 6ε, web 90/5 = 18 ≤ 22ε: class 3 (Table 6.2).
        var r = Check.Evaluate(Pinned(new ChannelSection(Mm(100), Mm(30), Mm(5), Mm(5)), A6082T6, 1000), Kn(10).WithEccentricity(Mm(0), Mm(10)), ResistanceMethods.Eurocode9);
        Assert.Equal(FailureMode.CombinedCompressionAndBending, r.GoverningMode);
        Assert.Equal(BucklingAxis.Z, r.GoverningAxis);
    }

    [Fact]
    public void Evaluate_InitialBow_Refused()
    {
        var ex = Refused(Pinned(Rhs100x5, A6082T6, 1000), Kn(10).WithInitialBow(Mm(3), null), ResistanceMethods.Eurocode9);
        Assert.Contains("already include the imperfections", ex.Message);
    }

    [Fact]
    public void Constructor_PartialFactorBelowOne_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => new Eurocode9Compression(partialFactorM1: 0.9));
        Assert.Equal("partialFactorM1", ex.ParamName);
        Assert.Contains("between 1 and 2; got 0.9", ex.Message);
    }

    [Fact]
    public void HeatAffectedExtent_TigAbove6mm_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => AluminiumWelding.HeatAffectedExtent(WeldingProcess.Tig, Mm(8)));
        Assert.Equal("thickness", ex.ParamName);
        Assert.Contains("only up to t = 6 mm", ex.Message);
        // MIG bands (EN 1999-1-1 6.1.6.3, from memory): 20, 30, 35, 40 mm.
        Assert.Equal(20, AluminiumWelding.HeatAffectedExtent(WeldingProcess.Mig, Mm(6)).Millimeters, 9);
        Assert.Equal(30, AluminiumWelding.HeatAffectedExtent(WeldingProcess.Mig, Mm(12)).Millimeters, 9);
        Assert.Equal(35, AluminiumWelding.HeatAffectedExtent(WeldingProcess.Mig, Mm(20)).Millimeters, 9);
        Assert.Equal(40, AluminiumWelding.HeatAffectedExtent(WeldingProcess.Mig, Mm(30)).Millimeters, 9);
    }

    [Fact]
    public void Evaluate_TracingOff_AllocatesNothing()
    {
        var rm = ResolvedMember.From(Pinned(Rhs100x5, A6082T6, 3000));
        var ra = ResolvedActions.From(Kn(100));
        Assert.Equal(0, Allocations.OfChecks(rm, ra, ResistanceMethods.Eurocode9));
    }

    [Fact]
    public void Evaluate_AngleTracingOff_AllocatesNothing()
    {
        // The open-section path (torsional, and the Brent cubic of an unequal angle) too.
        var rm = ResolvedMember.From(Pinned(Angle80x40x4, A6082T6, 500));
        var ra = ResolvedActions.From(Kn(10));
        Assert.Equal(0, Allocations.OfChecks(rm, ra, ResistanceMethods.Eurocode9));
    }

    private static double Step(in CheckResult r, string symbol, bool last = false)
    {
        var steps = r.Steps.Where(s => s.Symbol == symbol).ToList();
        Assert.NotEmpty(steps);
        return last ? steps[^1].Value : steps[0].Value;
    }
}
