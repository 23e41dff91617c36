using System;
using CompressionMembers.Actions;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using CsCheck;
using UnitsNet;

namespace CompressionMembers.Tests.Methods.Classical;

public class PerryRobertsonTests
{
    [Theory]
    [InlineData(250e6, 100e6)]
    [InlineData(250e6, 400e6)]
    [InlineData(250e6, 250e6)]
    public void CriticalStress_ZeroImperfection_IsMinOfStrengthAndEuler(double f, double sigmaE)
    {
        // η = 0: the perfect strut fails at min(f, σE) (Timoshenko & Gere §1.12; Trahair & Bradford, compression members).
        Near.Relative(Math.Min(f, sigmaE), PerryRobertson.CriticalStress(f, sigmaE, 0), 1e-12, "Perry–Robertson with η = 0");
    }

    [Fact]
    public void CriticalStress_SatisfiesPerrysEquation()
    {
        // Perry's first-yield condition (f − σ)(σE − σ) = η σ σE (Trahair & Bradford; Timoshenko & Gere §1.12), checked on
        // random inputs: the closed form is its smaller root.
        Gen.Select(Gen.Double[100e6, 500e6], Gen.Double[10e6, 2000e6], Gen.Double[0, 2]).Sample((f, se, eta) =>
        {
            double s = PerryRobertson.CriticalStress(f, se, eta);
            double lhs = (f - s) * (se - s), rhs = eta * s * se;
            return Math.Abs(lhs - rhs) <= 1e-6 * f * se && s > 0 && s <= Math.Min(f, se) * (1 + 1e-12);
        }, seed: "0N0XIzNsQ0O2");
    }

    [Fact]
    public void CriticalStress_FallsAsImperfectionGrows()
    {
        Gen.Select(Gen.Double[0, 1], Gen.Double[0.001, 1]).Sample((eta, d) =>
            PerryRobertson.CriticalStress(250e6, 300e6, eta + d) < PerryRobertson.CriticalStress(250e6, 300e6, eta), seed: "0N0XIzNsQ0O2");
    }

    [Fact]
    public void Evaluate_Robertson_RecomputesTheFormula()
    {
        // η = 0.003 λ (Robertson's constant for BS 449 struts, from memory), 40 × 40 bar, L = 1.2 m, steel.
        var member = Fixtures.PinnedBar(40, 40, 1200);
        var r = Check.Evaluate(member, DesignActions.Compression(Force.FromKilonewtons(10)), ResistanceMethods.PerryRobertsonDefault);
        double i = 0.04 / Math.Sqrt(12), lam = 1.2 / i, se = Math.PI * Math.PI * 200e9 / (lam * lam), eta = 0.003 * lam, f = 250e6;
        double p = 0.5 * (f + (1 + eta) * se);
        double expected = (p - Math.Sqrt(p * p - f * se)) * 0.0016;
        Near.Relative(expected, r.DesignResistanceN, 1e-12, "Perry–Robertson formula, hand evaluation");
    }

    [Fact]
    public void Evaluate_BowRatio_MatchesBowFromActions()
    {
        // A bow of L/500 given either way gives the same η = e0 c / i² (definition).
        var member = Fixtures.PinnedBar(40, 40, 1500);
        var a = DesignActions.Compression(Force.FromKilonewtons(10));
        var byRatio = Check.Evaluate(member, a, ResistanceMethods.PerryRobertson(PerryImperfection.FromBowRatio(500)));
        var byActions = Check.Evaluate(member, a.WithInitialBow(Length.FromMillimeters(3), Length.FromMillimeters(3)), ResistanceMethods.PerryRobertson(PerryImperfection.FromActions));
        Near.Relative(byRatio.DesignResistanceN, byActions.DesignResistanceN, 1e-12, "definition of the bow ratio");
    }

    [Fact]
    public void Evaluate_TeeWithBowsFromActions_RecomputesTheFormulaPerAxis()
    {
        // An asymmetric section, so that each axis must take its own extreme fibre: η = e0 c / i² with c the greater
        // distance from the centroid to an extreme fibre across the axis of buckling, and σ the smaller root of Perry's
        // (f − σ)(σE − σ) = η σ σE (Timoshenko & Gere §1.12; Trahair & Bradford, compression members). Tee 150 deep,
        // flange 120 × 10, stem 8 mm, L = 2.4 m pinned, steel E = 200 GPa, f = 250 MPa; bows 4 mm about y, 2.5 mm about z.
        // Section properties by hand from the two plates (parallel-axis theorem).
        double h = 0.150, b = 0.120, tf = 0.010, tw = 0.008, l = 2.4, e = 200e9, f = 250e6;
        double a = b * tf + (h - tf) * tw;
        double zc = (b * tf * (h - tf / 2) + (h - tf) * tw * (h - tf) / 2) / a;   // from the stem's tip
        double iy = b * tf * tf * tf / 12 + b * tf * Math.Pow(h - tf / 2 - zc, 2) + tw * Math.Pow(h - tf, 3) / 12 + tw * (h - tf) * Math.Pow((h - tf) / 2 - zc, 2);
        double iz = tf * b * b * b / 12 + (h - tf) * tw * tw * tw / 12;
        double Sigma(double i2, double c, double e0)
        {
            double lam2 = l * l / i2, se = Math.PI * Math.PI * e / lam2, eta = e0 * c / i2;
            double p = 0.5 * (f + (1 + eta) * se);
            return p - Math.Sqrt(p * p - f * se);
        }
        double nY = Sigma(iy / a, Math.Max(zc, h - zc), 0.004) * a, nZ = Sigma(iz / a, b / 2, 0.0025) * a;

        var member = Member.Create(new TeeSection(Length.FromMillimeters(150), Length.FromMillimeters(120), Length.FromMillimeters(10), Length.FromMillimeters(8)),
            Fixtures.Steel, Length.FromMeters(l), Restraint.PinnedBothAxes);
        var actions = DesignActions.Compression(Force.FromKilonewtons(50)).WithInitialBow(Length.FromMillimeters(4), Length.FromMillimeters(2.5));
        foreach (var r in new[] { Check.Evaluate(member, actions, ResistanceMethods.PerryRobertson(PerryImperfection.FromActions)),
                                  Check.EvaluateWithTrace(member, actions, ResistanceMethods.PerryRobertson(PerryImperfection.FromActions)) })
        {
            Near.Relative(nY, r.AboutY.ResistanceN, 1e-9, "Perry–Robertson about y, tee, hand evaluation");
            Near.Relative(nZ, r.AboutZ.ResistanceN, 1e-9, "Perry–Robertson about z, tee, hand evaluation");
            Near.Relative(Math.Min(nY, nZ), r.DesignResistanceN, 1e-9, "Perry–Robertson capacity, tee, hand evaluation");
        }
    }

    [Fact]
    public void Identity_Setting_IsTheModelsOwnQuantity()
    {
        // A report must not show a bow ratio or Robertson's constant as η (0.1.0 printed "η : 1000" for a bow of L/1000,
        // and "η : 0" for bows from the actions, which reads as a perfect column). a = 0.003 is Robertson's constant for
        // BS 449 struts (from memory), the library's default, hence its recommended-value mark.
        static MethodSetting Only(PerryImperfection m) => Assert.Single(ResistanceMethods.PerryRobertson(m).Identity.Settings);
        var constant = Only(PerryImperfection.Constant(0.2));
        Assert.Equal(("η", 0.2), (constant.Symbol, constant.Value));
        var robertson = Only(PerryImperfection.Robertson());
        Assert.Equal(("a", 0.003, true), (robertson.Symbol, robertson.Value, robertson.IsRecommendedValue));
        var ratio = Only(PerryImperfection.FromBowRatio(1000));
        Assert.Equal(("Lcr / e0", 1000.0), (ratio.Symbol, ratio.Value));
        var actions = Only(PerryImperfection.FromActions);
        Assert.Equal("e0", actions.Symbol);
        Assert.True(double.IsNaN(actions.Value));   // no single value: reports show "—"
    }

    [Fact]
    public void Constant_NegativeEta_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => PerryImperfection.Constant(-0.1));
        Assert.Equal("eta", ex.ParamName);
        Assert.StartsWith("Imperfection parameter η must not be negative; got -0.1.", ex.Message);
    }
}
