using System;
using CompressionMembers.Actions;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Results;
using CompressionMembers.Tests.Support;
using UnitsNet;

namespace CompressionMembers.Tests.Methods.Classical;

public class SecantFormulaTests
{
    private static Length Mm(double v) => Length.FromMillimeters(v);
    private static readonly Pressure E = Pressure.FromMegapascals(200000);

    /// <summary>
    /// Independent model: the deflection of a pinned–pinned column loaded at eccentricity e, from the differential
    /// equation EI v'' + P (v + e) = 0 solved by central finite differences (Thomas algorithm); M = P (e + v(L/2)).
    /// </summary>
    private static double FiniteDifferenceMaxStress(double p, double a, double e, double c, double i, double l, double ePa, int n = 4000)
    {
        double h = l / n, k2 = p / (ePa * a * i * i);
        int m = n - 1;
        var sub = new double[m]; var diag = new double[m]; var sup = new double[m]; var rhs = new double[m];
        for (int j = 0; j < m; j++) { sub[j] = 1; sup[j] = 1; diag[j] = -2 + k2 * h * h; rhs[j] = -k2 * e * h * h; }
        for (int j = 1; j < m; j++) { double w = sub[j] / diag[j - 1]; diag[j] -= w * sup[j - 1]; rhs[j] -= w * rhs[j - 1]; }
        var v = new double[m];
        v[m - 1] = rhs[m - 1] / diag[m - 1];
        for (int j = m - 2; j >= 0; j--) v[j] = (rhs[j] - sup[j] * v[j + 1]) / diag[j];
        double vmid = v[n / 2 - 1];
        return p / a + p * (e + vmid) * c / (a * i * i);
    }

    [Theory]
    [InlineData(20e3, 10.0, 0.2)]
    [InlineData(60e3, 5.0, 0.5)]
    [InlineData(100e3, 25.0, 0.85)]
    public void MaximumStress_MatchesFiniteDifferenceSolution(double pN, double eMm, double _)
    {
        // 100 × 50 mm bar bent about its weak axis, L = 2 m.
        double a = 5000e-6, i = 0.05 / Math.Sqrt(12), c = 0.025, l = 2.0;
        var s = SecantFormula.MaximumStress(Force.FromNewtons(pN), Area.FromSquareMeters(a), Mm(eMm), Length.FromMeters(c),
            Length.FromMeters(i), Length.FromMeters(l), E);
        double fd = FiniteDifferenceMaxStress(pN, a, eMm / 1000, c, i, l, 200e9);
        Near.Relative(fd, s.Pascals, 1e-5, "finite-difference solution of EI v'' + P(v + e) = 0 (independent model)");
    }

    [Fact]
    public void MaximumStress_RecomputesBeerAndJohnstonSecantFormula()
    {
        // Beer & Johnston, Mechanics of Materials, eccentric loading: σmax = P/A [1 + (e c / r²) sec((Le / 2r) √(P / E A))]
        // (formula from memory), evaluated by hand for a 60 × 60 mm bar, L = 1.5 m, e = 12 mm, P = 150 kN.
        double a = 3600e-6, r = 0.06 / Math.Sqrt(12), c = 0.03, l = 1.5, e = 0.012, p = 150e3;
        double expected = p / a * (1 + e * c / (r * r) / Math.Cos(l / (2 * r) * Math.Sqrt(p / (200e9 * a))));
        var s = SecantFormula.MaximumStress(Force.FromKilonewtons(150), Area.FromSquareMeters(a), Length.FromMeters(e), Length.FromMeters(c),
            Length.FromMeters(r), Length.FromMeters(l), E);
        Near.Relative(expected, s.Pascals, 1e-14, "Beer & Johnston secant formula, hand evaluation");
    }

    [Fact]
    public void MaximumStress_ZeroEccentricity_IsPOverA()
    {
        var s = SecantFormula.MaximumStress(Force.FromKilonewtons(100), Area.FromSquareMillimeters(2000), Length.Zero, Mm(30), Mm(17), Mm(2000), E);
        Near.Relative(50, s.Megapascals, 1e-14, "e → 0: σ = P/A");
    }

    [Fact]
    public void MaximumStress_DivergesAsLoadApproachesEuler()
    {
        double a = 2000e-6, i = 0.017, l = 2.0, pcr = Math.PI * Math.PI * 200e9 * a * i * i / (l * l);
        double s1 = SecantFormula.MaximumStress(Force.FromNewtons(0.99 * pcr), Area.FromSquareMeters(a), Mm(1), Mm(30), Length.FromMeters(i), Length.FromMeters(l), E).Pascals;
        double s2 = SecantFormula.MaximumStress(Force.FromNewtons(0.9999 * pcr), Area.FromSquareMeters(a), Mm(1), Mm(30), Length.FromMeters(i), Length.FromMeters(l), E).Pascals;
        Assert.True(s2 > 9 * s1, "sec(π/2 √(P/Pcr)) → ∞ as P → Pcr");
    }

    [Fact]
    public void MaximumStress_AtOrAboveEulerLoad_ThrowsNamingTheRatio()
    {
        double a = 2000e-6, i = 0.017, l = 2.0, pcr = Math.PI * Math.PI * 200e9 * a * i * i / (l * l);
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => SecantFormula.MaximumStress(Force.FromNewtons(1.02 * pcr), Area.FromSquareMeters(a),
            Mm(1), Mm(30), Length.FromMeters(i), Length.FromMeters(l), E));
        Assert.Equal("load", ex.ParamName);
        Assert.StartsWith("The load is at or above the Euler load (P/Pcr = 1.02); the secant formula has no finite stress there.", ex.Message);
    }

    [Theory]
    [InlineData(0.5)]
    [InlineData(5.0)]
    [InlineData(50.0)]
    [InlineData(500.0)]
    public void LoadAtStress_IsTheInverseOfMaximumStress_To1e10(double eMm)
    {
        var a = Area.FromSquareMillimeters(2000);
        var p = SecantFormula.LoadAtStress(Pressure.FromMegapascals(250), a, Mm(eMm), Mm(30), Mm(17), Mm(2500), E);
        var s = SecantFormula.MaximumStress(p, a, Mm(eMm), Mm(30), Mm(17), Mm(2500), E);
        Near.Relative(250e6, s.Pascals, 1e-9, "round trip of the inverse (Brent to 1e-10 relative on P)");
    }

    [Fact]
    public void LoadAtStress_NeedsAtMostTwelveEvaluationsTo1e10()
    {
        // Counted, not timed: eccentricity ratios e c / i² from 1e-3 to 100 and slenderness 18 to 470.
        foreach (double e in new[] { 1e-5, 1e-3, 0.005, 0.01, 0.05, 0.2, 1.0 })
            foreach (double l in new[] { 0.3, 1.0, 3.0, 8.0 })
            {
                double a = 2000e-6, i = 0.017, c = 0.03, pcr = Math.PI * Math.PI * 200e9 * a * i * i / (l * l);
                double p = SecantKernel.LoadAtStress(250e6, pcr, a, 200e9, e, c, i, l, 0, 0, 1, 1, out int n);
                Assert.InRange(n, 1, 12);
                double s = SecantKernel.MaxStress(p, a, 200e9, e, c, i, l, 0, 0, 1, 1);
                // d(σmax)/dP·P/σmax ≥ 1, so a 1e-10 relative error in P shows as at least that in σ.
                Near.Relative(250e6, s, 1e-9, $"inverse of the secant formula (e = {e} m, L = {l} m)");
            }
    }

    [Theory]
    [InlineData(127, 127, 4420)]   // a square bar whose two Euler loads coincide: the bracket end sat on θ = π/2
    [InlineData(50.8, 50.8, 3632)]
    public void Evaluate_SquareSectionBiaxialEccentricity_FindsTheRoot(double b, double h, double l)
    {
        // Regression: rounding put θ just past π/2 at the Euler load, both cosines turned negative and the bracket
        // lost its sign change (MathNet threw NonConvergenceException). The capacity must satisfy σmax = f.
        var member = Fixtures.PinnedBar(b, h, l);
        var r = Check.Evaluate(member, DesignActions.Compression(Force.FromKilonewtons(5)).WithEccentricity(Mm(5.08), Mm(2.54)), ResistanceMethods.Secant);
        double a = b * h * 1e-6, i = b / 1000 / Math.Sqrt(12), c = b / 2000;
        double s = SecantKernel.MaxStress(r.DesignResistanceN, a, 200e9, 0.00508, c, i, l / 1000, 0.00254, c, i, l / 1000);
        Near.Relative(250e6, s, 1e-9, "σmax = f at the capacity (definition of the secant capacity)");
    }

    [Fact]
    public void Evaluate_SmallEccentricity_TendsToTheConcentricCapacity()
    {
        // e → 0: the secant capacity tends to min(A f, Ncr) (common practice limit).
        var member = Fixtures.PinnedBar(50, 50, 1500);
        var r = Check.Evaluate(member, DesignActions.Compression(Force.FromKilonewtons(10)).WithEccentricity(Mm(1e-6), Length.Zero), ResistanceMethods.Secant);
        double pcr = Math.PI * Math.PI * 200e9 * Math.Pow(0.05, 4) / 12 / (1.5 * 1.5);
        Near.Relative(Math.Min(0.0025 * 250e6, pcr), r.DesignResistanceN, 1e-3, "e → 0 limit");
    }

    [Fact]
    public void Evaluate_LoadAboveEuler_FailsInsteadOfThrowing()
    {
        var member = Fixtures.PinnedBar(20, 20, 2000);
        var r = Check.EvaluateWithTrace(member, DesignActions.Compression(Force.FromKilonewtons(100)).WithEccentricity(Mm(5), Length.Zero), ResistanceMethods.Secant);
        Assert.False(r.Passed);
        Assert.True(r.Utilisation > 1);
    }

    [Fact]
    public void Evaluate_EqualEndMoments_AreAnEccentricity()
    {
        var member = Fixtures.PinnedBar(60, 60, 1500);
        var n = Force.FromKilonewtons(100);
        var byMoment = Check.Evaluate(member, DesignActions.Compression(n).WithEndMomentsAboutY(Torque.FromKilonewtonMeters(1.2), Torque.FromKilonewtonMeters(1.2)), ResistanceMethods.Secant);
        var byOffset = Check.Evaluate(member, DesignActions.Compression(n).WithEccentricity(Mm(12), Length.Zero), ResistanceMethods.Secant);
        Near.Relative(byOffset.DesignResistanceN, byMoment.DesignResistanceN, 1e-12, "M = N e (statics)");
    }

    [Fact]
    public void Evaluate_UnequalEndMoments_IsRefused()
    {
        var member = Fixtures.PinnedBar(60, 60, 1500);
        var actions = DesignActions.Compression(Force.FromKilonewtons(100)).WithEndMomentsAboutY(Torque.FromKilonewtonMeters(1), Torque.FromKilonewtonMeters(-1));
        var ex = Assert.Throws<MethodNotApplicableException>(() => Check.Evaluate(member, actions, ResistanceMethods.Secant));
        Assert.Contains("equal end moments (single curvature) only", ex.Message);
    }

    [Fact]
    public void Evaluate_EccentricAboutStrongAxis_CanBeGovernedByEulerOfWeakAxis()
    {
        var member = Fixtures.PinnedBar(20, 100, 2000);
        var r = Check.Evaluate(member, DesignActions.Compression(Force.FromKilonewtons(5)).WithEccentricity(Mm(1), Length.Zero), ResistanceMethods.Secant);
        Assert.Equal(BucklingAxis.Z, r.GoverningAxis);
        Assert.Equal(FailureMode.FlexuralBuckling, r.GoverningMode);
    }
}
