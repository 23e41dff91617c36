using System;
using CompressionMembers.Actions;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Results;
using CompressionMembers.Tests.Support;
using UnitsNet;

namespace CompressionMembers.Tests.Methods.Classical;

public class JohnsonParabolaTests
{
    private const double E = 200e9, F = 250e6;

    [Fact]
    public void TransitionSlenderness_GenericSteel_Is125_7()
    {
        // Cc = √(2π² E / f) = √(2π² · 200 000 / 250) = 125.66 (hand calculation; the same Cc appears in the classical
        // steel allowable-stress column formula, common practice).
        Near.Relative(Math.Sqrt(2 * Math.PI * Math.PI * E / F), JohnsonParabola.TransitionSlenderness(E, F), 1e-15, "definition");
        Near.Relative(125.66, JohnsonParabola.TransitionSlenderness(E, F), 1e-4, "hand calculation");
    }

    [Fact]
    public void CriticalStress_AtTransition_MeetsEulerWithEqualValueAndSlope()
    {
        // At λ = Cc both curves give f/2 and share their slope (tangency; Shigley's treatment of columns).
        double cc = JohnsonParabola.TransitionSlenderness(E, F);
        double johnson = F - Math.Pow(F * cc / (2 * Math.PI), 2) / E;
        double euler = Math.PI * Math.PI * E / (cc * cc);
        Near.Relative(F / 2, johnson, 1e-13, "tangent point at f/2");
        Near.Relative(F / 2, euler, 1e-13, "tangent point at f/2");
        double slopeJohnson = -2 * Math.Pow(F / (2 * Math.PI), 2) * cc / E;   // d/dλ of f − (fλ/2π)²/E
        double slopeEuler = -2 * Math.PI * Math.PI * E / Math.Pow(cc, 3);     // d/dλ of π²E/λ²
        Near.Relative(slopeEuler, slopeJohnson, 1e-13, "equal slope at Cc");
        // And the kernel is continuous across Cc.
        double below = JohnsonParabola.CriticalStress(cc * (1 - 1e-9), E, F, out bool j1);
        double above = JohnsonParabola.CriticalStress(cc * (1 + 1e-9), E, F, out bool j2);
        Assert.True(j1);
        Assert.False(j2);
        Near.Relative(below, above, 1e-8, "continuity at Cc");
    }

    [Fact]
    public void Evaluate_IntermediateColumn_RecomputesShigleysParabolicFormula()
    {
        // Shigley's Mechanical Engineering Design (9th ed., §4-12, the parabolic formula Pcr/A = Sy − (Sy l / 2πk)² / (C E),
        // C = 1 for pinned ends; equation recalled from memory). 25 mm round bar, L = 600 mm, generic steel.
        var member = CompressionMembers.Members.Member.Create(new CompressionMembers.Sections.CircleSection(Length.FromMillimeters(25)), Fixtures.Steel,
            Length.FromMillimeters(600), CompressionMembers.Restraints.Restraint.PinnedBothAxes);
        var r = Check.Evaluate(member, DesignActions.Compression(Force.FromKilonewtons(50)), ResistanceMethods.Johnson);
        double k = 25.0 / 4, lk = 600 / k;                                  // k = d/4 = 6.25 mm, l/k = 96
        double a = Math.PI * 25 * 25 / 4 * 1e-6;
        double expected = a * (F - Math.Pow(F * lk / (2 * Math.PI), 2) / E);
        Near.Relative(expected, r.DesignResistanceN, 1e-12, "Shigley's parabolic formula, hand evaluation");
        Assert.Equal("Johnson parabola (λ < Cc)", r.GoverningCheck);
    }

    [Fact]
    public void Evaluate_SlenderColumn_UsesEulerBranch()
    {
        var member = Fixtures.PinnedBar(20, 20, 2000);              // λ = 2000 / 5.774 = 346 > Cc
        var r = Check.Evaluate(member, DesignActions.Compression(Force.FromKilonewtons(1)), ResistanceMethods.Johnson);
        Near.Relative(Math.PI * Math.PI * E * (0.02 * 0.02 * 0.02 * 0.02 / 12) / 4, r.DesignResistanceN, 1e-12, "Euler's formula");
        Assert.Equal("Euler hyperbola (λ ≥ Cc)", r.GoverningCheck);
    }

    [Fact]
    public void Evaluate_VeryStockyColumn_TendsToSquashLoad()
    {
        var member = Fixtures.PinnedBar(100, 100, 10);                // λ ≈ 0.35
        var r = Check.Evaluate(member, DesignActions.Compression(Force.FromKilonewtons(1)), ResistanceMethods.Johnson);
        Near.Relative(0.01 * F, r.DesignResistanceN, 1e-4, "λ → 0 gives A f");
    }

    [Fact]
    public void Evaluate_EccentricLoad_IsRefusedWithAdvice()
    {
        var member = Fixtures.PinnedBar(20, 20, 600);
        var actions = DesignActions.Compression(Force.FromKilonewtons(1)).WithEccentricity(Length.FromMillimeters(5), Length.Zero);
        var ex = Assert.Throws<MethodNotApplicableException>(() => Check.Evaluate(member, actions, ResistanceMethods.Johnson));
        Assert.Equal("method", ex.ParamName);
        Assert.Equal("Johnson parabola with Euler hyperbola does not apply to \"test bar\": the Johnson method covers concentric compression only; use the secant method for an eccentric load. (Parameter 'method')", ex.Message);
        Assert.Same(member, ex.Member);
    }

    [Fact]
    public void Evaluate_WeakAxisGoverns()
    {
        var member = Fixtures.PinnedBar(20, 40, 800);
        var r = Check.Evaluate(member, DesignActions.Compression(Force.FromKilonewtons(1)), ResistanceMethods.Johnson);
        Assert.Equal(BucklingAxis.Z, r.GoverningAxis);
        Assert.True(r.AboutZ.ResistanceN < r.AboutY.ResistanceN);
    }
}
