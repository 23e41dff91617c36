using System;
using CompressionMembers.Restraints;
using CompressionMembers.Tests.Support;
using CsCheck;
using UnitsNet;

namespace CompressionMembers.Tests.Numerical;

/// <summary>The alignment-chart equations (AISC 360-16 Commentary App. 7.2, Eqs. C-A-7-1 and C-A-7-2) against chart
/// readings, the spring characteristic equation and the FE model.</summary>
public class AlignmentChartTests
{
    private const double E = FiniteElementBucklingTests.E, I = FiniteElementBucklingTests.I, L = FiniteElementBucklingTests.L, EI = E * I;
    private static JointRestraintFactor G(double g) => JointRestraintFactor.Of(g);

    [Theory]
    // G bottom, G top, K read from the published chart (from memory, common practice), tolerance of a chart reading
    [InlineData(1.0, 1.0, 0.77, 0.01)]
    [InlineData(0.0, 0.0, 0.50, 1e-12)]
    [InlineData(10.0, 10.0, 0.96, 0.01)]
    public void BucklingFactorBraced_ChartReadings_Agree(double gb, double gt, double kChart, double tol)
    {
        Near.Absolute(kChart, AlignmentChart.BucklingFactorBraced(G(gb), G(gt)), tol, "braced alignment chart reading (from memory)");
    }

    [Theory]
    [InlineData(1.0, 1.0, 1.32, 0.02)]
    [InlineData(0.0, 0.0, 1.00, 1e-12)]
    [InlineData(10.0, 10.0, 3.0, 0.05)]
    public void BucklingFactorSway_ChartReadings_Agree(double gb, double gt, double kChart, double tol)
    {
        Near.Absolute(kChart, AlignmentChart.BucklingFactorSway(G(gb), G(gt)), tol, "sway alignment chart reading (from memory)");
    }

    [Fact]
    public void BucklingFactor_LimitsOfG_GiveIdealColumns()
    {
        // G = 0 fixed, G → ∞ pinned: the ideal columns (Timoshenko & Gere §2.2; AISC Commentary Table C-A-7.1 theoretical values).
        Assert.Equal(1.0, AlignmentChart.BucklingFactorBraced(JointRestraintFactor.Pinned, JointRestraintFactor.Pinned));
        Near.Relative(Math.PI / 4.493409457909064, AlignmentChart.BucklingFactorBraced(JointRestraintFactor.Fixed, JointRestraintFactor.Pinned), 1e-12, "fixed–pinned tan u = u");
        Near.Relative(2.0, AlignmentChart.BucklingFactorSway(JointRestraintFactor.Fixed, JointRestraintFactor.Pinned), 1e-12, "flagpole K = 2");
    }

    [Fact]
    public void BucklingFactorBraced_EqualsSpringColumnWithTwoEIOverGL()
    {
        // The braced chart is the column with rotational springs kθ = 2 EI / (G L) at translation-held ends
        // (beams in single curvature; AISC 360-16 Commentary App. 7.2 assumptions, from memory), solved independently by
        // the characteristic equation of EffectiveLength and by the FE model.
        Gen.Select(Gen.Double[-2, 2], Gen.Double[-2, 2]).Sample((a, b) =>
        {
            double ga = Math.Pow(10, a), gb = Math.Pow(10, b);
            double kChart = AlignmentChart.BucklingFactorBraced(G(gb), G(ga));
            var bottom = EndSpring.Rotational(RotationalStiffness.FromNewtonMetersPerRadian(2 * EI / (gb * L)));
            var top = EndSpring.Rotational(RotationalStiffness.FromNewtonMetersPerRadian(2 * EI / (ga * L)));
            double kSpring = EffectiveLength.BucklingFactorFromEndSprings(bottom, top, Pressure.FromPascals(E), AreaMomentOfInertia.FromMetersToTheFourth(I), Length.FromMeters(L));
            return Math.Abs(kChart - kSpring) <= 1e-9 * kChart && kChart >= 0.5 && kChart <= 1;
        }, iter: 200, seed: "0N0XIzNsQ0O2");
        var fe = FiniteElementBucklingTests.Ncr(FiniteElementBucklingTests.Model(
            EndSpring.Rotational(RotationalStiffness.FromNewtonMetersPerRadian(2 * EI / L)), EndSpring.Rotational(RotationalStiffness.FromNewtonMetersPerRadian(2 * EI / L))));
        Near.Relative(AlignmentChart.BucklingFactorBraced(G(1), G(1)), Math.PI * Math.Sqrt(EI / fe) / L, 1e-6, "FE, kθ = 2EI/L at both ends");
    }

    [Fact]
    public void BucklingFactorSway_EqualsSpringColumnWithSixEIOverGL()
    {
        // The sway chart is the column with rotational springs kθ = 6 EI / (G L) (beams in double curvature), one end free
        // to sway (AISC 360-16 Commentary App. 7.2 assumptions, from memory); checked against the characteristic equation.
        Gen.Select(Gen.Double[-2, 2], Gen.Double[-2, 2]).Sample((a, b) =>
        {
            double ga = Math.Pow(10, a), gb = Math.Pow(10, b);
            double kChart = AlignmentChart.BucklingFactorSway(G(gb), G(ga));
            var bottom = EndSpring.Rotational(RotationalStiffness.FromNewtonMetersPerRadian(6 * EI / (gb * L)));
            var top = EndSpring.Elastic(RotationalStiffness.FromNewtonMetersPerRadian(6 * EI / (ga * L)), ForcePerLength.Zero);
            double kSpring = EffectiveLength.BucklingFactorFromEndSprings(bottom, top, Pressure.FromPascals(E), AreaMomentOfInertia.FromMetersToTheFourth(I), Length.FromMeters(L));
            return Math.Abs(kChart - kSpring) <= 1e-9 * kChart && kChart >= 1;
        }, iter: 200, seed: "0N0XIzNsQ0O2");
    }

    [Fact]
    public void BucklingFactor_RisesWithG()
    {
        // Less beam restraint (larger G) never lowers K (common practice; the charts are monotonic).
        Gen.Select(Gen.Double[0, 50], Gen.Double[0, 50]).Sample((ga, gb) =>
            AlignmentChart.BucklingFactorBraced(G(gb), G(ga * 1.5 + 0.01)) >= AlignmentChart.BucklingFactorBraced(G(gb), G(ga)) - 1e-12
            && AlignmentChart.BucklingFactorSway(G(gb), G(ga * 1.5 + 0.01)) >= AlignmentChart.BucklingFactorSway(G(gb), G(ga)) - 1e-12,
            iter: 200, seed: "0N0XIzNsQ0O2");
    }

    [Fact]
    public void StiffnessReduction_MultipliesG()
    {
        // G_inelastic = τ G (AISC 360-16 Commentary App. 7.2, from memory); τb by AISC 360-16 Eq. (C2-2a/b), from memory.
        Near.Relative(AlignmentChart.BucklingFactorSway(G(2 * 0.75), G(3 * 0.75)), AlignmentChart.BucklingFactorSway(G(2), G(3), 0.75), 1e-12, "τ G");
        Assert.Equal(1.0, AlignmentChart.StiffnessReduction(0.4));
        Near.Relative(4 * 0.75 * 0.25, AlignmentChart.StiffnessReduction(0.75), 1e-15, "τb = 4 ratio (1 − ratio), Eq. (C2-2b)");
        var r = AlignmentChart.Sway(G(2), G(3), 0.75);
        Assert.Contains("stiffness reduction τ = 0.75", r.BasisText);
        Assert.Contains("AISC 360-16 Commentary App. 7.2 Eq. (C-A-7-2)", r.BasisText);
    }

    [Fact]
    public void BucklingFactorSway_BothPinned_ThrowsMechanism()
    {
        var ex = Assert.Throws<ArgumentException>(() => AlignmentChart.BucklingFactorSway(JointRestraintFactor.Pinned, JointRestraintFactor.Pinned));
        Assert.Equal("top", ex.ParamName);
        Assert.Contains("is a mechanism", ex.Message);
    }

    [Fact]
    public void Of_NegativeG_ThrowsArgumentOutOfRange()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => JointRestraintFactor.Of(-1));
        Assert.Equal("g", ex.ParamName);
        Assert.Contains("at least 0; got -1", ex.Message);
    }

    [Fact]
    public void BucklingFactorBraced_TauZero_ThrowsArgumentOutOfRange()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => AlignmentChart.BucklingFactorBraced(G(1), G(1), 0));
        Assert.Equal("stiffnessReduction", ex.ParamName);
        Assert.Contains("greater than 0 and at most 1; got 0", ex.Message);
    }
}
