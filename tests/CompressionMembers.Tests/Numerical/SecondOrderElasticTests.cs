using System;
using CompressionMembers.Actions;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using CsCheck;
using UnitsNet;

namespace CompressionMembers.Tests.Numerical;

/// <summary>The second-order first-yield method against the closed forms it twins: the secant formula and Perry–Robertson.</summary>
public class SecondOrderElasticTests
{
    private static readonly RectangleSection Bar = new(Length.FromMillimeters(40), Length.FromMillimeters(60));
    private static Member Strut(double lengthMm) => Member.Create(Bar, Fixtures.Steel, Length.FromMillimeters(lengthMm), Restraint.PinnedBothAxes, "strut");

    [Theory]
    [InlineData(2500, 5.0, 0.0)]
    [InlineData(1500, 20.0, 0.0)]
    [InlineData(2500, 0.0, 4.0)]
    [InlineData(2000, 6.0, 3.0)]  // biaxial: the secant formula sums both axes' terms at mid-length
    public void Check_EqualEccentricities_AgreesWithSecantMethod(double lengthMm, double eyMm, double ezMm)
    {
        // Secant formula capacity (Beer & Johnston; the library's ResistanceMethods.Secant) against the P-δ model.
        var actions = DesignActions.Compression(Force.FromKilonewtons(20)).WithEccentricity(Length.FromMillimeters(eyMm), Length.FromMillimeters(ezMm));
        var secant = Check.Evaluate(Strut(lengthMm), actions, ResistanceMethods.Secant);
        var pdelta = Check.Evaluate(Strut(lengthMm), actions, ResistanceMethods.SecondOrderElastic);
        Near.Relative(secant.DesignResistanceN, pdelta.DesignResistanceN, 1e-6, "secant formula capacity");
        Assert.Equal(secant.GoverningAxis, pdelta.GoverningAxis);
        Assert.Equal(secant.GoverningMode, pdelta.GoverningMode);
    }

    [Fact]
    public void Check_RandomEccentricStruts_WithinHalfPercentOfSecant()
    {
        // Issue #5: the P-δ model reproduces the secant formula within 0.5 % over its range (here to 1e-5).
        Gen.Select(Gen.Double[800, 4000], Gen.Double[0.5, 40]).Sample((l, e) =>
        {
            var actions = DesignActions.Compression(Force.FromKilonewtons(10)).WithEccentricity(Length.FromMillimeters(e), Length.Zero);
            double s = Check.Evaluate(Strut(l), actions, ResistanceMethods.Secant).DesignResistanceN;
            double p = Check.Evaluate(Strut(l), actions, ResistanceMethods.SecondOrderElastic).DesignResistanceN;
            return Math.Abs(p - s) <= 1e-5 * s;
        }, iter: 25, seed: "0N0XIzNsQ0O2");
    }

    [Fact]
    public void Check_BowOnly_AgreesWithPerryRobertson()
    {
        // Perry–Robertson with the bow of the actions (Timoshenko & Gere §1.11; the library's PerryRobertson(FromActions)).
        var actions = DesignActions.Compression(Force.FromKilonewtons(20)).WithInitialBow(null, Length.FromMillimeters(4));
        var perry = Check.Evaluate(Strut(1800), actions, ResistanceMethods.PerryRobertson(PerryImperfection.FromActions));
        var pdelta = Check.Evaluate(Strut(1800), actions, ResistanceMethods.SecondOrderElastic);
        Near.Relative(perry.DesignResistanceN, pdelta.DesignResistanceN, 1e-6, "Perry–Robertson capacity");
    }

    [Fact]
    public void Check_Concentric_GivesEulerOrSquash()
    {
        // Without bending the capacity is min(A f, Ncr) as Euler's method gives (Timoshenko & Gere §2.2).
        var actions = DesignActions.Compression(Force.FromKilonewtons(20));
        foreach (double l in new[] { 300.0, 3000.0 })
        {
            var euler = Check.Evaluate(Strut(l), actions, ResistanceMethods.Euler);
            var pdelta = Check.Evaluate(Strut(l), actions, ResistanceMethods.SecondOrderElastic);
            Near.Relative(euler.DesignResistanceN, pdelta.DesignResistanceN, 1e-6, "Euler with squash cut-off");
            Assert.Equal(euler.GoverningMode, pdelta.GoverningMode);
        }
    }

    [Fact]
    public void Check_UnequalEndMoments_BelowEqualMomentsCapacity()
    {
        // Reverse curvature is less severe than single curvature (common practice; the secant method refuses unequal moments).
        var single = DesignActions.Compression(Force.FromKilonewtons(20)).WithEndMomentsAboutZ(Torque.FromNewtonMeters(100), Torque.FromNewtonMeters(100));
        var reverse = DesignActions.Compression(Force.FromKilonewtons(20)).WithEndMomentsAboutZ(Torque.FromNewtonMeters(100), Torque.FromNewtonMeters(-100));
        double ps = Check.Evaluate(Strut(2500), single, ResistanceMethods.SecondOrderElastic).DesignResistanceN;
        double pr = Check.Evaluate(Strut(2500), reverse, ResistanceMethods.SecondOrderElastic).DesignResistanceN;
        Assert.True(pr > ps, $"reverse {pr} N, single {ps} N");
        var traced = Check.EvaluateWithTrace(Strut(2500), reverse, ResistanceMethods.SecondOrderElastic);
        Assert.Contains(traced.Steps, s => s.Symbol == "ez,bottom" && Math.Abs(s.Value + 0.005) < 1e-15);
    }

    [Fact]
    public void AppliesTo_FixedEnds_Refuses()
    {
        var member = Member.Create(Bar, Fixtures.Steel, Length.FromMillimeters(2000),
            Restraint.Same(AxisRestraint.FromEndConditions(EndCondition.Fixed, EndCondition.Pinned, EffectiveLengthBasis.Theoretical)), "strut");
        var ex = Assert.Throws<MethodNotApplicableException>(() => Check.Evaluate(member, DesignActions.Compression(Force.FromKilonewtons(1)), ResistanceMethods.SecondOrderElastic));
        Assert.Contains("pinned at both ends without bracing; about y the member is fixed (bottom), pinned (top)", ex.Message);
    }
}
