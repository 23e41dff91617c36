using System;
using CompressionMembers.Actions;
using CompressionMembers.Members;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Methods.Numerical;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using CsCheck;
using UnitsNet;

namespace CompressionMembers.Tests.Numerical;

/// <summary>The second-order (P-δ) model against the secant formula, the bow amplification and the end-moment solution.</summary>
public class SecondOrderAnalysisTests
{
    // 40 mm wide, 60 mm deep steel bar, 2.5 m, pinned (a check member of common practice): about y, c = 30 mm.
    private static readonly RectangleSection Bar = new(Length.FromMillimeters(40), Length.FromMillimeters(60));
    private static Member Strut(Restraint? r = null) => Member.Create(Bar, Fixtures.Steel, Length.FromMillimeters(2500), r ?? Restraint.PinnedBothAxes, "strut");
    private static double Pcr => Math.PI * Math.PI * 200e9 * Bar.SecondMomentY.MetersToTheFourth / (2.5 * 2.5);

    [Theory]
    [InlineData(0.1, 5.0)]
    [InlineData(0.5, 5.0)]
    [InlineData(0.8, 20.0)]
    [InlineData(0.9, 1.0)]
    public void Analyse_EqualEccentricities_ReproducesSecantFormula(double fraction, double eMm)
    {
        // σmax = P/A [1 + (e c / i²) sec((L / 2i) √(P / E A))] (secant formula; Beer & Johnston, eccentric loading;
        // the library's SecantFormula.MaximumStress). Issue #5 asks for 0.5 %; the model gives far better.
        var actions = DesignActions.Compression(Force.FromNewtons(fraction * Pcr)).WithEccentricity(Length.FromMillimeters(eMm), Length.Zero);
        var r = SecondOrderAnalysis.Analyse(Strut(), actions, BucklingAxis.Y);
        var secant = SecantFormula.MaximumStress(actions.AxialCompression, Bar.Area, Length.FromMillimeters(eMm), Length.FromMillimeters(30),
            Bar.RadiusOfGyrationY, Length.FromMillimeters(2500), Fixtures.Steel.ElasticModulus);
        Near.Relative(secant.Pascals, r.AtDesignLoad.MaximumStress.Pascals, 5e-3, "secant formula (issue #5 tolerance)");
        Near.Relative(secant.Pascals, r.AtDesignLoad.MaximumStress.Pascals, 1e-5, "secant formula");
        // Mmax = P e sec(u/2), u = L √(P/EI) (Timoshenko & Gere §1.4).
        double u = 2.5 * Math.Sqrt(fraction * Pcr / (200e9 * Bar.SecondMomentY.MetersToTheFourth));
        Near.Relative(fraction * Pcr * eMm / 1e3 / Math.Cos(u / 2), r.AtDesignLoad.MaximumMoment.NewtonMeters, 1e-5, "P e sec(u/2)");
        Near.Relative(Pcr, r.CriticalForce.Newtons, 1e-6, "Euler, pinned–pinned");
        Near.Relative(1250, r.AtDesignLoad.MaximumStressPosition.Millimeters, 1e-9, "symmetric: the largest stress at mid-length");
    }

    [Fact]
    public void Analyse_SecantRange_PropertyWithinHalfPercent()
    {
        // Over the range where the secant formula holds (elastic, P < Pcr), random loads and eccentricities.
        Gen.Select(Gen.Double[0.02, 0.9], Gen.Double[0.5, 60]).Sample((f, e) =>
        {
            var actions = DesignActions.Compression(Force.FromNewtons(f * Pcr)).WithEccentricity(Length.FromMillimeters(e), Length.Zero);
            double fe = SecondOrderAnalysis.Analyse(Strut(), actions, BucklingAxis.Y, steps: 1).AtDesignLoad.MaximumStress.Pascals;
            double s = SecantFormula.MaximumStress(actions.AxialCompression, Bar.Area, Length.FromMillimeters(e), Length.FromMillimeters(30),
                Bar.RadiusOfGyrationY, Length.FromMillimeters(2500), Fixtures.Steel.ElasticModulus).Pascals;
            return Math.Abs(fe - s) <= 5e-3 * s;
        }, iter: 40, seed: "0N0XIzNsQ0O2");
    }

    [Fact]
    public void Analyse_BowOnly_AmplifiesByOneOverOneMinusPOverPcr()
    {
        // A half-sine bow e0 under P: total bow e0 / (1 − P/Pcr) exactly (Timoshenko & Gere §1.11).
        double f = 0.6, e0 = 0.0025;
        var actions = DesignActions.Compression(Force.FromNewtons(f * Pcr)).WithInitialBow(Length.FromMeters(e0), null);
        var r = SecondOrderAnalysis.Analyse(Strut(), actions, BucklingAxis.Y, steps: 4);
        Near.Relative(e0 / (1 - f) - e0, r.AtDesignLoad.MaximumDeflection.Meters, 1e-6, "additional deflection e0 P/Pcr / (1 − P/Pcr)");
        Near.Relative(f * Pcr * e0 / (1 - f), r.AtDesignLoad.MaximumMoment.NewtonMeters, 1e-6, "M = P e0 / (1 − P/Pcr)");
        Assert.Equal(4, r.Path.Count);
        // The path rises faster than linearly in P (second-order effect).
        Assert.True(r.Path[3].MaximumDeflection.Meters > 4 * r.Path[0].MaximumDeflection.Meters);
    }

    [Theory]
    [InlineData(0.5, 0.5)]
    [InlineData(0.7, 0.0)]
    [InlineData(0.6, -0.3)]
    public void Analyse_UnequalEndMoments_MatchesClosedFormMaximumMoment(double fraction, double ratio)
    {
        // End moments M2 (top) and M1 = ratio·M2 (bottom, single curvature positive): inside the span
        // Mmax = M2 √(r² − 2 r cos u + 1) / sin u, u = L √(P/EI) (Timoshenko & Gere §1.3 via superposition, from memory;
        // it reduces to M sec(u/2) for r = 1), valid when the maximum lies inside the member.
        double p = fraction * Pcr, m2 = 500; // N·m
        var actions = DesignActions.Compression(Force.FromNewtons(p)).WithEndMomentsAboutY(Torque.FromNewtonMeters(m2), Torque.FromNewtonMeters(ratio * m2));
        var r = SecondOrderAnalysis.Analyse(Strut(), actions, BucklingAxis.Y);
        double u = 2.5 * Math.Sqrt(p / (200e9 * Bar.SecondMomentY.MetersToTheFourth));
        double expected = Math.Max(m2, m2 * Math.Sqrt(ratio * ratio - 2 * ratio * Math.Cos(u) + 1) / Math.Sin(u));
        Near.Relative(expected, r.AtDesignLoad.MaximumMoment.NewtonMeters, 2e-5, "closed-form beam-column end moments");
    }

    [Fact]
    public void Analyse_AboutZ_UsesEccentricityZ()
    {
        // About z: I = 60·40³/12, c = 20 mm; compare with the secant formula (Beer & Johnston).
        double pcrZ = Math.PI * Math.PI * 200e9 * Bar.SecondMomentZ.MetersToTheFourth / (2.5 * 2.5);
        var actions = DesignActions.Compression(Force.FromNewtons(0.4 * pcrZ)).WithEccentricity(Length.Zero, Length.FromMillimeters(8));
        var r = SecondOrderAnalysis.Analyse(Strut(), actions, BucklingAxis.Z);
        var s = SecantFormula.MaximumStress(actions.AxialCompression, Bar.Area, Length.FromMillimeters(8), Length.FromMillimeters(20),
            Bar.RadiusOfGyrationZ, Length.FromMillimeters(2500), Fixtures.Steel.ElasticModulus);
        Near.Relative(s.Pascals, r.AtDesignLoad.MaximumStress.Pascals, 1e-5, "secant formula about z");
    }

    [Theory]
    [InlineData(1200, 3.0)]
    [InlineData(2500, 6.0)]
    public void Analyse_AtPerryRobertsonCapacity_ExtremeFibreReachesStrength(double lengthMm, double bowMm)
    {
        // Perry–Robertson (the library's PerryRobertson with the bow from the actions; Perry 1886, Robertson 1925, as in
        // Timoshenko & Gere §1.11): its capacity is the load at which the extreme fibre of the half-sine bowed strut reaches f.
        // The P-δ model at that load must give σmax = f = 250 MPa.
        var member = Member.Create(Bar, Fixtures.Steel, Length.FromMillimeters(lengthMm), Restraint.PinnedBothAxes, "bowed strut");
        var probe = DesignActions.Compression(Force.FromKilonewtons(1)).WithInitialBow(null, Length.FromMillimeters(bowMm));
        var perry = Check.Evaluate(member, probe, CompressionMembers.Methods.ResistanceMethods.PerryRobertson(PerryImperfection.FromActions));
        Assert.Equal(BucklingAxis.Z, perry.GoverningAxis);
        var atCapacity = probe.WithAxialCompression(Force.FromNewtons(perry.AboutZ.ResistanceN));
        var r = SecondOrderAnalysis.Analyse(member, atCapacity, BucklingAxis.Z, steps: 1);
        Near.Relative(250e6, r.AtDesignLoad.MaximumStress.Pascals, 1e-5, "Perry–Robertson: σmax = f at the capacity");
    }

    [Fact]
    public void Analyse_AboveStatedFraction_ThrowsArgumentOutOfRange()
    {
        var actions = DesignActions.Compression(Force.FromNewtons(0.97 * Pcr)).WithEccentricity(Length.FromMillimeters(5), Length.Zero);
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => SecondOrderAnalysis.Analyse(Strut(), actions, BucklingAxis.Y));
        Assert.Equal("actions", ex.ParamName);
        Assert.Contains("of the elastic critical load about y", ex.Message);
        Assert.Contains("above the stated limit 0.95", ex.Message);
    }

    [Fact]
    public void Analyse_FixedEnds_ThrowsArgumentException()
    {
        var fixedBar = Strut(Restraint.Same(AxisRestraint.FromEndConditions(EndCondition.Fixed, EndCondition.Fixed, EffectiveLengthBasis.Theoretical)));
        var ex = Assert.Throws<ArgumentException>(() => SecondOrderAnalysis.Analyse(fixedBar, DesignActions.Compression(Force.FromKilonewtons(1)), BucklingAxis.Y));
        Assert.Equal("member", ex.ParamName);
        Assert.Contains("pinned at both ends without bracing; about y the member is fixed (bottom), fixed (top)", ex.Message);
    }
}
