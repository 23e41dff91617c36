using System;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Methods.Aluminium;
using CompressionMembers.Tests.Support;
using CsCheck;
using UnitsNet;

namespace CompressionMembers.Tests.Aluminium;

public class Eurocode9ClassificationTests
{
    [Theory]
    // ψ, kind, η — EN 1999-1-1 6.1.4.3 (from memory): 0.70 + 0.30ψ for 1 ≥ ψ ≥ −1, 0.80/(1 − ψ) below −1; outstand with peak at toe η = 1
    [InlineData(1.0, PartKind.Internal, 1.0)]
    [InlineData(0.0, PartKind.Internal, 0.70)]
    [InlineData(-1.0, PartKind.Internal, 0.40)]
    [InlineData(-3.0, PartKind.Internal, 0.20)]
    [InlineData(0.5, PartKind.OutstandPeakAtRoot, 0.85)]
    [InlineData(-1.0, PartKind.OutstandPeakAtToe, 1.0)]
    public void StressGradientFactor_Values(double psi, PartKind kind, double expected) =>
        Near.Relative(expected, Eurocode9Classification.StressGradientFactor(psi, kind), 1e-14, "EN 1999-1-1 6.1.4.3, hand calculation");

    [Fact]
    public void StressGradientFactor_ContinuousAtMinusOne_AndNotRisingBelow()
    {
        // Both expressions give 0.40 at ψ = −1 (a consistency check of the recalled formulas).
        Near.Relative(0.40, Eurocode9Classification.StressGradientFactor(-1 - 1e-12, PartKind.Internal), 1e-9, "continuity at ψ = −1");
        Gen.Select(Gen.Double[-10, 1], Gen.Double[0, 5]).Sample((psi, d) =>
            Eurocode9Classification.StressGradientFactor(psi - d, PartKind.Internal) <= Eurocode9Classification.StressGradientFactor(psi, PartKind.Internal) + 1e-15);
    }

    [Fact]
    public void PartSlenderness_WebInBending_IsPointFourBOverT()
    {
        double beta = Eurocode9Classification.PartSlenderness(Length.FromMillimeters(200), Length.FromMillimeters(5), -1);
        Near.Relative(0.4 * 40, beta, 1e-14, "β = η b / t, η = 0.4 at ψ = −1 (EN 1999-1-1 6.1.4.3)");
        // A 200/5 web (ε = 1): class 4 in uniform compression (β = 40 > 22ε), class 2 in pure bending (β = 16 ≤ β2 = 16ε); Table 6.2.
        var f0 = Pressure.FromMegapascals(250);
        Assert.Equal(4, Eurocode9Classification.ClassOf(40, f0, BucklingClass.A, false, PartKind.Internal));
        Assert.Equal(2, Eurocode9Classification.ClassOf(beta, f0, BucklingClass.A, false, PartKind.Internal));
    }

    [Fact]
    public void RoundTubeSlenderness_HandCalculation()
    {
        // β = 3 √(D/t) (EN 1999-1-1 6.1.4.3, from memory): D = 100, t = 4 → 3 × 5 = 15.
        Near.Relative(15, Eurocode9Classification.RoundTubeSlenderness(Length.FromMillimeters(100), Length.FromMillimeters(4)), 1e-14, "hand calculation");
    }

    [Fact]
    public void LocalBucklingFactor_MatchesKernel()
    {
        double rho = Eurocode9Classification.LocalBucklingFactor(12, Pressure.FromMegapascals(160), BucklingClass.B, true, PartKind.OutstandPeakAtRoot);
        double x = 12 / Math.Sqrt(250.0 / 160);
        Near.Relative(8 / x - 16 / (x * x), rho, 1e-14, "EN 1999-1-1 6.1.5, class B welded outstand C1 = 8, C2 = 16 (from memory)");
    }

    [Fact]
    public void StressGradientFactor_PsiAboveOne_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Eurocode9Classification.StressGradientFactor(1.5, PartKind.Internal));
        Assert.Equal("stressRatio", ex.ParamName);
        Assert.Contains("must be at most 1", ex.Message);
    }

    [Fact]
    public void ClassOf_NegativeSlenderness_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Eurocode9Classification.ClassOf(-3, Pressure.FromMegapascals(250), BucklingClass.A, false, PartKind.Internal));
        Assert.Equal("slenderness", ex.ParamName);
        Assert.Contains("greater than 0; got -3", ex.Message);
    }
}
