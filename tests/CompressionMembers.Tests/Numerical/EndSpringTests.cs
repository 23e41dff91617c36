using System;
using CompressionMembers.Actions;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Numerical;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using CsCheck;
using UnitsNet;

namespace CompressionMembers.Tests.Numerical;

/// <summary>K from end springs (characteristic equation) against hand-derived equations and the independent FE model.</summary>
public class EndSpringTests
{
    private const double E = FiniteElementBucklingTests.E, I = FiniteElementBucklingTests.I, L = FiniteElementBucklingTests.L, EI = E * I;

    private static double K(EndSpring bottom, EndSpring top) =>
        EffectiveLength.BucklingFactorFromEndSprings(bottom, top, Pressure.FromPascals(E), AreaMomentOfInertia.FromMetersToTheFourth(I), Length.FromMeters(L));

    private static EndSpring Rot(double ratio) => EndSpring.Rotational(RotationalStiffness.FromNewtonMetersPerRadian(ratio * EI / L));
    private static ForcePerLength Trans(double ratio) => ForcePerLength.FromNewtonsPerMeter(ratio * EI / (L * L * L));

    private static double KFe(EndSpring bottom, EndSpring top)
    {
        double p = FiniteElementBucklingTests.Ncr(FiniteElementBucklingTests.Model(bottom, top).WithElementCount(64));
        return Math.PI * Math.Sqrt(EI / p) / L;
    }

    [Theory]
    [InlineData("fixed", "fixed", 0.5)]
    [InlineData("pinned", "pinned", 1.0)]
    [InlineData("fixed", "free", 2.0)]
    [InlineData("fixed", "guided", 1.0)]
    public void FromEndSprings_IdealEnds_RecoverTheoreticalKExactly(string b, string t, double k)
    {
        // Theoretical K of the ideal ends (Timoshenko & Gere §2.1–2.2; common practice table), returned exactly.
        static EndSpring End(string s) => s switch { "fixed" => EndSpring.Fixed, "pinned" => EndSpring.Pinned, "free" => EndSpring.Free, _ => EndSpring.Guided };
        Assert.Equal(k, K(End(b), End(t)));
    }

    [Fact]
    public void FromEndSprings_ZeroAndVeryStiffSprings_ApproachPinnedAndFixed()
    {
        // Limits of the spring model: kθ = 0 is a pin (exact), kθ → ∞ tends to the fixed end (Timoshenko & Gere §2.3).
        Assert.Equal(1.0, K(Rot(0), Rot(0)));
        Near.Relative(0.5, K(Rot(1e9), Rot(1e9)), 1e-6, "fixed–fixed limit K = 0.5");
        Near.Relative(Math.PI / 4.493409457909064, K(Rot(1e9), EndSpring.Pinned), 1e-6, "fixed–pinned limit, tan u = u");
        Near.Relative(1.0, K(Rot(1e-9), Rot(1e-9)), 1e-6, "pinned limit");
    }

    [Theory]
    [InlineData(0.5)]
    [InlineData(2)]
    [InlineData(10)]
    [InlineData(100)]
    public void FromEndSprings_BracedSpringAndPin_SolvesHandDerivedEquation(double r)
    {
        // Braced column, rotational spring R = kθ L / EI at the bottom, pinned top. Hand derivation from EI w'''' + P w'' = 0
        // (Timoshenko & Gere §2.3 method): tan u = R u / (R + u²), u = π / K; limits tan u = 0 (R = 0) and tan u = u (R = ∞).
        double F(double u) => Math.Tan(u) * (r + u * u) - r * u;
        double lo = Math.PI * 1.0000001, hi = 4.4934094579; // between pinned–pinned and fixed–pinned
        for (int i = 0; i < 200; i++) { double m = 0.5 * (lo + hi); if (F(m) < 0) lo = m; else hi = m; }
        double expected = Math.PI / (0.5 * (lo + hi));
        Near.Relative(expected, K(Rot(r), EndSpring.Pinned), 1e-9, "tan u = R u / (R + u²), hand derivation");
        Near.Relative(expected, KFe(Rot(r), EndSpring.Pinned), 1e-5, "FE model of the same column");
    }

    [Theory]
    [InlineData(0.1)]
    [InlineData(1)]
    [InlineData(10)]
    public void FromEndSprings_FlagpoleOnRotationalSpring_SolvesUTanUEqualsR(double r)
    {
        // Sway cantilever on a rotational base spring: u tan u = R (Timoshenko & Gere §2.1 with an elastic base, hand
        // derivation); K ≥ 2, → 2 as R → ∞.
        double lo = 1e-9, hi = Math.PI / 2 - 1e-12;
        for (int i = 0; i < 200; i++) { double m = 0.5 * (lo + hi); if (m * Math.Tan(m) < r) lo = m; else hi = m; }
        double expected = Math.PI / (0.5 * (lo + hi));
        var bottom = EndSpring.Rotational(RotationalStiffness.FromNewtonMetersPerRadian(r * EI / L));
        double k = K(bottom, EndSpring.Free);
        Near.Relative(expected, k, 1e-9, "u tan u = R, hand derivation");
        Assert.True(k > 2);
        Near.Relative(expected, KFe(bottom, EndSpring.Free), 1e-5, "FE model of the same column");
    }

    [Fact]
    public void FromEndSprings_RandomSprings_AgreeWithFiniteElements()
    {
        // Independent check of the characteristic equation: springs of every kind at both ends against the FE model.
        Gen.Select(Gen.Double[-2, 3], Gen.Double[-2, 3], Gen.Double[-1, 4], Gen.Double[-1, 4]).Sample((rb, rt, tb, tt) =>
        {
            var bottom = EndSpring.Elastic(RotationalStiffness.FromNewtonMetersPerRadian(Math.Pow(10, rb) * EI / L), Trans(Math.Pow(10, tb)));
            var top = EndSpring.Elastic(RotationalStiffness.FromNewtonMetersPerRadian(Math.Pow(10, rt) * EI / L), Trans(Math.Pow(10, tt)));
            double k = K(bottom, top), kfe = KFe(bottom, top);
            return Math.Abs(k - kfe) <= 2e-5 * k && k >= 0.5;
        }, iter: 60, seed: "0N0XIzNsQ0O2");
    }

    [Theory]
    [InlineData(0.0)]      // translational springs only: rigid-body rotation and bending modes cross as Rt grows
    [InlineData(0.5)]
    [InlineData(5.0)]
    public void FromEndSprings_DenseSweepOfEqualLateralSprings_NeverSkipsTheLowestMode(double rotRatio)
    {
        // Equal springs at both ends make symmetric and antisymmetric modes cross (a double root of the characteristic
        // equation, with no change of sign). The lowest mode must still be found: checked against the FE model, which
        // cannot skip a mode, on a dense sweep of Rt = kt L³ / EI (common practice: Rayleigh–Ritz bounds).
        for (int i = 0; i <= 120; i++)
        {
            double rt = Math.Pow(10, -1 + 4.0 * i / 120);
            var end = EndSpring.Elastic(RotationalStiffness.FromNewtonMetersPerRadian(rotRatio * EI / L), Trans(rt));
            double k = K(end, end), kfe = KFe(end, end);
            Near.Relative(kfe, k, 2e-5, $"FE model, Rt = {rt}");
        }
    }

    [Theory]
    [InlineData(1 - 1e-3)]
    [InlineData(1 - 1e-6)]
    [InlineData(1.0)]
    [InlineData(1 + 1e-6)]
    [InlineData(1 + 1e-3)]
    public void FromEndSprings_LateralSpringsAtModeCrossing_FindsTheLowerOfTwoCloseRoots(double factor)
    {
        // Equal lateral springs kt at both ends, rotation free: the symmetric mode is the half sine, u = π (the springs do
        // not move), the antisymmetric one the rigid rotation, u² = Rt / 2 (P θ L = kt θ L² / 2): hand derivation,
        // confirmed by the FE model. They cross at Rt = 2π², where the characteristic equation has a double root; near it
        // two roots lie closer than the scan grid and must not both be skipped (that would return a far higher load).
        double rt = 2 * Math.PI * Math.PI * factor;
        var end = EndSpring.Translational(Trans(rt));
        double uLow = Math.Min(Math.PI, Math.Sqrt(rt / 2));
        // Near a double root the root is only as sharp as √ε (common practice of root finding): 1e-7.
        Near.Relative(Math.PI / uLow, K(end, end), 1e-7, "lower of u = π and u = √(Rt/2)");
    }

    [Fact]
    public void FromEndSprings_BracedSprings_KBetweenHalfAndOneAndFallsWithStiffness()
    {
        // Braced members: 0.5 ≤ K ≤ 1, and more restraint never raises K (Timoshenko & Gere §2.3; common practice).
        Gen.Select(Gen.Double[-3, 4], Gen.Double[-3, 4]).Sample((a, b) =>
        {
            double k1 = K(Rot(Math.Pow(10, a)), Rot(Math.Pow(10, b)));
            double k2 = K(Rot(Math.Pow(10, a) * 2), Rot(Math.Pow(10, b)));
            return k1 >= 0.5 && k1 <= 1 && k2 <= k1 * (1 + 1e-12);
        }, iter: 200, seed: "0N0XIzNsQ0O2");
    }

    [Fact]
    public void FromEndSprings_SwaySprings_KAtLeastOne()
    {
        // Sway members (top free to translate, rotation restrained): K ≥ 1 (common practice).
        Gen.Select(Gen.Double[-3, 4], Gen.Double[-3, 4]).Sample((a, b) =>
        {
            var top = EndSpring.Elastic(RotationalStiffness.FromNewtonMetersPerRadian(Math.Pow(10, b) * EI / L), ForcePerLength.Zero);
            return K(Rot(Math.Pow(10, a)), top) >= 1;
        }, iter: 200, seed: "0N0XIzNsQ0O2");
    }

    [Fact]
    public void FromEndSprings_StiffLateralSpringAtTop_TendsToBraced()
    {
        // Fixed base, top pinned on a lateral spring: K falls from 2 (no spring) to 0.699 (rigid), common practice.
        double weak = K(EndSpring.Fixed, EndSpring.Translational(Trans(0.01)));
        double stiff = K(EndSpring.Fixed, EndSpring.Translational(Trans(1e8)));
        Assert.InRange(weak, 1.9, 2.0);
        Near.Relative(Math.PI / 4.493409457909064, stiff, 1e-5, "fixed–pinned, tan u = u");
    }

    [Fact]
    public void FromEndSprings_BasisText_SaysHowKWasObtained()
    {
        var r = EffectiveLength.FromEndSprings(EndSpring.Rotational(RotationalStiffness.FromKilonewtonMetersPerRadian(5000)), EndSpring.Fixed,
            Pressure.FromGigapascals(210), AreaMomentOfInertia.FromCentimetersToTheFourth(8356), Length.FromMillimeters(6000));
        Assert.Equal("end springs (braced): bottom kθ = 5000 kN·m/rad, translation held; top fixed; EI = 17547.6 kN·m², L = 6000 mm: exact K = "
            + r.BucklingFactor.ToString("0.0000", System.Globalization.CultureInfo.InvariantCulture) + " from the characteristic equation of the elastic column", r.BasisText);
        Assert.InRange(r.BucklingFactor, 0.5, 0.7);
    }

    [Fact]
    public void Check_MemberWithEndSprings_EulerAndFiniteElementsAgree()
    {
        // A member whose K came from springs: Euler with that K (closed form) and the FE method modelling the springs.
        var section = new RectangleSection(Length.FromMillimeters(60), Length.FromMillimeters(60));
        double i = 0.06 * Math.Pow(0.06, 3) / 12;
        var ax = EffectiveLength.FromEndSprings(EndSpring.Rotational(RotationalStiffness.FromKilonewtonMetersPerRadian(50)), EndSpring.Pinned,
            Fixtures.Steel.ElasticModulus, AreaMomentOfInertia.FromMetersToTheFourth(i), Length.FromMillimeters(3000));
        var member = Member.Create(section, Fixtures.Steel, Length.FromMillimeters(3000), Restraint.Same(ax), "spring post");
        var actions = DesignActions.Compression(Force.FromKilonewtons(10));
        var euler = Check.Evaluate(member, actions, ResistanceMethods.Euler);
        var fe = Check.Evaluate(member, actions, ResistanceMethods.FiniteElementCritical);
        Near.Relative(euler.DesignResistanceN, fe.DesignResistanceN, 1e-6, "Euler with K from the characteristic equation");
    }

    [Fact]
    public void FromEndSprings_MaterialAndSectionOverload_SameAsQuantities()
    {
        var section = new RectangleSection(Length.FromMillimeters(60), Length.FromMillimeters(90));
        var end = EndSpring.Rotational(RotationalStiffness.FromKilonewtonMetersPerRadian(80));
        var a = EffectiveLength.FromEndSprings(end, EndSpring.Pinned, Fixtures.Steel, section, CompressionMembers.Results.BucklingAxis.Z, Length.FromMillimeters(3000));
        var b = EffectiveLength.FromEndSprings(end, EndSpring.Pinned, Fixtures.Steel.ElasticModulus, section.SecondMomentZ, Length.FromMillimeters(3000));
        Assert.Equal(b.BucklingFactor, a.BucklingFactor);
        Assert.Equal(b.BasisText, a.BasisText);
    }

    [Fact]
    public void Check_SpringRestraintMadeForAnotherLength_FiniteElementsRefuse()
    {
        // K from springs depends on kθ L / EI: a restraint made for 3 m must not be used on a 4 m member unnoticed.
        var section = new RectangleSection(Length.FromMillimeters(60), Length.FromMillimeters(60));
        var ax = EffectiveLength.FromEndSprings(EndSpring.Rotational(RotationalStiffness.FromKilonewtonMetersPerRadian(50)), EndSpring.Pinned,
            Fixtures.Steel, section, CompressionMembers.Results.BucklingAxis.Y, Length.FromMillimeters(3000));
        var member = Member.Create(section, Fixtures.Steel, Length.FromMillimeters(4000), Restraint.Same(ax), "post");
        var ex = Assert.Throws<MethodNotApplicableException>(() => Check.Evaluate(member, DesignActions.Compression(Force.FromKilonewtons(1)), ResistanceMethods.FiniteElementCritical));
        Assert.Contains("was made for EI = 216 kN·m² and L = 3000 mm, but the member has EI = 216 kN·m² and L = 4000 mm about y", ex.Message);
    }

    [Fact]
    public void FromEndSprings_FreeBothEnds_ThrowsMechanism()
    {
        var ex = Assert.Throws<ArgumentException>(() => K(EndSpring.Translational(ForcePerLength.Zero), EndSpring.Free));
        Assert.Equal("top", ex.ParamName);
        Assert.Contains("form a mechanism", ex.Message);
        var ex2 = Assert.Throws<ArgumentException>(() => K(EndSpring.Translational(Trans(5)), EndSpring.Free));
        Assert.Contains("bottom kt = ", ex2.Message);
    }

    [Fact]
    public void Rotational_NegativeStiffness_ThrowsArgumentOutOfRange()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => EndSpring.Rotational(RotationalStiffness.FromKilonewtonMetersPerRadian(-5)));
        Assert.Equal("stiffness", ex.ParamName);
        Assert.Contains("Rotational spring stiffness must not be negative; got -5 kN·m/rad.", ex.Message);
    }
}
