using System;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Methods.Aluminium;
using CompressionMembers.Tests.Support;
using CsCheck;

namespace CompressionMembers.Tests.Aluminium;

public class Ec9RulesTests
{
    [Fact]
    public void Epsilon_At250MPa_IsOne()
    {
        // ε = √(250 / f0): 1 at f0 = 250 MPa (EN 1999-1-1 Table 6.2; a fact of the trade).
        Near.Relative(1.0, Ec9Rules.Epsilon(250e6), 1e-15, "EN 1999-1-1 Table 6.2");
        Near.Relative(Math.Sqrt(250.0 / 160), Ec9Rules.Epsilon(160e6), 1e-15, "EN 1999-1-1 Table 6.2, hand calculation");
    }

    [Theory]
    // β, ε, class A/B, welded, outstand, expected class — limits of EN 1999-1-1 Table 6.2 (from memory)
    [InlineData(11.0, 1.0, BucklingClass.A, false, false, 1)] // internal, at β1 = 11ε
    [InlineData(11.1, 1.0, BucklingClass.A, false, false, 2)]
    [InlineData(22.0, 1.0, BucklingClass.A, false, false, 3)] // at β3 = 22ε
    [InlineData(22.1, 1.0, BucklingClass.A, false, false, 4)]
    [InlineData(18.0, 1.0, BucklingClass.A, true, false, 3)] // welded internal β3 = 18ε
    [InlineData(6.0, 1.0, BucklingClass.A, false, true, 3)] // outstand β3 = 6ε
    [InlineData(5.5, 1.0, BucklingClass.B, false, true, 4)] // class B outstand β3 = 5ε
    [InlineData(15.5, 1.0, BucklingClass.B, true, false, 4)] // class B welded internal β3 = 15ε
    [InlineData(26.0, 1.2, BucklingClass.A, false, false, 3)] // ε scales the limits: 22 × 1.2 = 26.4
    public void ClassOf_Limits_FollowTable62(double beta, double eps, BucklingClass cls, bool welded, bool outstand, int expected) =>
        Assert.Equal(expected, Ec9Rules.ClassOf(beta, eps, cls, welded, outstand));

    [Fact]
    public void RhoC_ClassAUnweldedInternal_MatchesHandCalculation()
    {
        // ρc = C1/(β/ε) − C2/(β/ε)², C1 = 32, C2 = 220 (EN 1999-1-1 Table 6.3, class A unwelded internal, from memory); β = 48, ε = 1.
        double expected = 32.0 / 48 - 220.0 / (48 * 48);
        Near.Relative(expected, Ec9Rules.RhoC(48, 1, BucklingClass.A, false, false), 1e-14, "EN 1999-1-1 6.1.5, hand calculation");
        // Independent inputs: class B welded outstand, C1 = 8, C2 = 16, β = 9, ε = 1.1.
        double x = 9 / 1.1;
        Near.Relative(8 / x - 16 / (x * x), Ec9Rules.RhoC(9, 1.1, BucklingClass.B, true, true), 1e-14, "EN 1999-1-1 6.1.5, hand calculation");
    }

    [Fact]
    public void RhoC_AtClass3Limit_IsOneForEveryColumnOfTable63()
    {
        // The constants of Table 6.3 make ρc = 1 at β = β3 (a consistency check of the recalled tables), except class B
        // unwelded outstands, where C1/x − C2/x² exceeds 1 between β/ε = 4 and 6 and the cap at 1 holds.
        foreach (var cls in new[] { BucklingClass.A, BucklingClass.B })
            foreach (bool welded in new[] { false, true })
                foreach (bool outstand in new[] { false, true })
                {
                    Ec9Rules.ClassLimits(cls, welded, outstand, out _, out _, out double b3);
                    Ec9Rules.LocalBucklingConstants(cls, welded, outstand, out double c1, out double c2);
                    double raw = c1 / b3 - c2 / (b3 * b3);
                    if (cls == BucklingClass.B && !welded && outstand) Assert.True(raw > 1);
                    else Near.Relative(1.0, raw, 1e-12, "EN 1999-1-1 Tables 6.2 and 6.3 (from memory): ρc(β3) = 1");
                    Assert.Equal(1.0, Ec9Rules.RhoC(b3 * 1.0001, 1, cls, welded, outstand), 3);
                }
    }

    [Fact]
    public void RhoC_Property_InZeroOneAndFallingWithBeta()
    {
        Gen.Select(Gen.Double[1, 400], Gen.Double[0, 50], Gen.Int[0, 7]).Sample((beta, d, k) =>
        {
            var cls = (k & 1) == 0 ? BucklingClass.A : BucklingClass.B;
            bool welded = (k & 2) != 0, outstand = (k & 4) != 0;
            double r1 = Ec9Rules.RhoC(beta, 1, cls, welded, outstand), r2 = Ec9Rules.RhoC(beta + d, 1, cls, welded, outstand);
            return r1 > 0 && r1 <= 1 && r2 <= r1 + 1e-15;
        });
    }

    [Fact]
    public void Chi_HandCalculation_ClassAandB()
    {
        // χ = 1/(φ + √(φ² − λ̄²)), φ = 0.5[1 + α(λ̄ − λ̄0) + λ̄²] (EN 1999-1-1 6.3.1.2); class A α 0.20, λ̄0 0.10; class B α 0.32, λ̄0 0 (Table 6.6, from memory).
        double l = 0.83;
        double pa = 0.5 * (1 + 0.20 * (l - 0.10) + l * l), pb = 0.5 * (1 + 0.32 * l + l * l);
        Ec9Rules.FlexuralCurve(BucklingClass.A, out double aA, out double l0A);
        Ec9Rules.FlexuralCurve(BucklingClass.B, out double aB, out double l0B);
        Near.Relative(1 / (pa + Math.Sqrt(pa * pa - l * l)), Ec9Rules.Chi(l, aA, l0A), 1e-14, "EN 1999-1-1 6.3.1.2, hand calculation");
        Near.Relative(1 / (pb + Math.Sqrt(pb * pb - l * l)), Ec9Rules.Chi(l, aB, l0B), 1e-14, "EN 1999-1-1 6.3.1.2, hand calculation");
    }

    [Fact]
    public void Chi_Limits_OneAtZeroAndEulerAtInfinity()
    {
        Ec9Rules.FlexuralCurve(BucklingClass.A, out double a, out double l0);
        Assert.Equal(1.0, Ec9Rules.Chi(1e-9, a, l0));
        Assert.Equal(1.0, Ec9Rules.Chi(l0, a, l0));
        // λ̄ → ∞: χ λ̄² → 1 (the Euler hyperbola; common practice).
        Near.Relative(1.0, Ec9Rules.Chi(1000, a, l0) * 1e6, 1e-3, "limit λ̄ → ∞, Euler");
    }

    [Fact]
    public void Chi_Property_InZeroOneFallingAndClassAAboveClassB()
    {
        Ec9Rules.FlexuralCurve(BucklingClass.A, out double aA, out double l0A);
        Ec9Rules.FlexuralCurve(BucklingClass.B, out double aB, out double l0B);
        Gen.Select(Gen.Double[0.001, 5], Gen.Double[0, 2]).Sample((l, d) =>
        {
            double ca = Ec9Rules.Chi(l, aA, l0A), cb = Ec9Rules.Chi(l, aB, l0B);
            // χ in (0, 1], falling with λ̄, and class A at or above class B at equal λ̄ (EN 1999-1-1 Table 6.6; fact of the trade).
            return ca > 0 && ca <= 1 && cb > 0 && cb <= 1 && Ec9Rules.Chi(l + d, aA, l0A) <= ca + 1e-15 && ca >= cb;
        });
    }

    [Fact]
    public void Kappa_HandCalculation_ClassA()
    {
        // κ = 1 − (1 − A1/A) 10^(−λ̄) − (0.05 + 0.1 A1/A) λ̄^(1.3(1 − λ̄)) (EN 1999-1-1 Table 6.5, class A, from memory); λ̄ = 0.7, A1/A = 0.85.
        double l = 0.7, r = 0.85;
        double expected = 1 - (1 - r) * Math.Pow(10, -l) - (0.05 + 0.1 * r) * Math.Pow(l, 1.3 * (1 - l));
        Near.Relative(expected, Ec9Rules.KappaLongitudinalWeld(BucklingClass.A, l, r), 1e-14, "EN 1999-1-1 Table 6.5, hand calculation");
        // class B, λ̄ = 0.9: 1 + 0.04 (4λ̄)^(0.5 − λ̄) − 0.22 λ̄^(1.4(1 − λ̄))
        double eb = 1 + 0.04 * Math.Pow(3.6, 0.5 - 0.9) - 0.22 * Math.Pow(0.9, 1.4 * 0.1);
        Near.Relative(eb, Ec9Rules.KappaLongitudinalWeld(BucklingClass.B, 0.9, 0.5), 1e-14, "EN 1999-1-1 Table 6.5, hand calculation");
        Assert.Equal(1.0, Ec9Rules.KappaLongitudinalWeld(BucklingClass.B, 0.2, 0.5));
    }

    [Fact]
    public void Kappa_Property_NeverAboveOne()
    {
        Gen.Select(Gen.Double[0.01, 4], Gen.Double[0.2, 1]).Sample((l, r) =>
            Ec9Rules.KappaLongitudinalWeld(BucklingClass.A, l, r) <= 1 && Ec9Rules.KappaLongitudinalWeld(BucklingClass.B, l, r) <= 1
            && Ec9Rules.KappaLongitudinalWeld(BucklingClass.A, l, r) > 0);
    }

    [Fact]
    public void TorsionalCritical_NoOffset_IsTorsionalLoad()
    {
        double n = Ec9Rules.TorsionalCritical(3e5, 2e5, 1e5, 1e-3, 0, 0, out bool coupled);
        Assert.False(coupled);
        Assert.Equal(1e5, n);
    }

    [Fact]
    public void TorsionalCritical_OneOffset_MatchesTimoshenkoQuadratic()
    {
        // Singly symmetric section (offset on y): (1 − y0²/i0²) N² − (Ny + NT) N + Ny NT = 0, smaller root
        // (Timoshenko & Gere, Theory of Elastic Stability §5.3), solved here with the textbook formula.
        double ny = 4e5, nz = 1e6, nt = 2.5e5, i02 = 1.2e-3, y0 = 0.02;
        double k = 1 - y0 * y0 / i02;
        double expected = ((ny + nt) - Math.Sqrt((ny + nt) * (ny + nt) - 4 * k * ny * nt)) / (2 * k);
        Near.Relative(expected, Ec9Rules.TorsionalCritical(ny, nz, nt, i02, y0, 0, out bool c), 1e-12, "Timoshenko & Gere §5.3 quadratic");
        Assert.True(c);
        Assert.True(expected < Math.Min(ny, nt));
    }
}
