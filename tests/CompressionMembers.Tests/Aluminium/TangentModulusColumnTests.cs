using System;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Aluminium;
using CompressionMembers.Tests.Support;
using CsCheck;
using UnitsNet;
using static CompressionMembers.Tests.Aluminium.AluminiumCases;

namespace CompressionMembers.Tests.Aluminium;

public class TangentModulusColumnTests
{
    private const double E = 70e9, F0 = 250e6, N = 25; // n = f0/10 for f0 = 250 MPa (Steinhardt, EN 1999-1-1 Annex E; from memory)

    [Fact]
    public void TangentModulus_AtZeroStress_IsE_AndMatchesDerivative()
    {
        Near.Relative(E, TangentModulusColumn.TangentModulus(1e-3, E, F0, N), 1e-12, "Ramberg–Osgood: Et(0) = E");
        // Et = 1 / (dε/dσ) with ε = σ/E + 0.002 (σ/f0)^n: central finite difference in the test.
        double s = 230e6, h = 1e3;
        double Eps(double x) => x / E + 0.002 * Math.Pow(x / F0, N);
        double fd = 2 * h / (Eps(s + h) - Eps(s - h));
        Near.Relative(fd, TangentModulusColumn.TangentModulus(s, E, F0, N), 1e-6, "finite difference of the Ramberg–Osgood law");
    }

    [Fact]
    public void CriticalStress_SatisfiesEngesserEquation()
    {
        foreach (double lam in new[] { 15.0, 30, 50, 80 })
        {
            double s = TangentModulusColumn.CriticalStress(lam, E, F0, N);
            // σcr = π² Et(σcr) / λ² (Engesser), re-evaluated here.
            Near.Relative(Math.PI * Math.PI * TangentModulusColumn.TangentModulus(s, E, F0, N) / (lam * lam), s, 1e-9, "Engesser tangent-modulus equation");
        }
    }

    [Fact]
    public void CriticalStress_SlenderLimit_IsEuler()
    {
        double lam = 300, euler = Math.PI * Math.PI * E / (lam * lam);
        Near.Relative(euler, TangentModulusColumn.CriticalStress(lam, E, F0, N), 1e-6, "λ → ∞: Euler (Et → E)");
    }

    [Fact]
    public void FromProofStresses_ExponentMatchesAnnexE()
    {
        // n = ln(0.002/0.001) / ln(f0.2/f0.1), EN 1999-1-1 Annex E; f0.2 = 250, f0.1 = 243 MPa invented for the test.
        var m = TangentModulusColumn.FromProofStresses(Pressure.FromMegapascals(250), Pressure.FromMegapascals(243), 0.001);
        Near.Relative(Math.Log(2) / Math.Log(250.0 / 243), m.Exponent, 1e-12, "EN 1999-1-1 Annex E, hand calculation");
    }

    [Fact]
    public void FromProofStresses_FallingStress_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => TangentModulusColumn.FromProofStresses(Pressure.FromMegapascals(250), Pressure.FromMegapascals(260), 0.001));
        Assert.Equal("otherProofStress", ex.ParamName);
        Assert.Contains("must rise with strain", ex.Message);
    }

    [Fact]
    public void CodeCurve_LiesBelowIdealInelasticColumn_Property()
    {
        // The EN 1999-1-1 class A curve (χ, with γM1 = 1) includes imperfections and residual effects, so it must lie at or
        // below the ideal straight inelastic column of the same alloy (tangent modulus, Ramberg–Osgood n = 25, capped at f0).
        Ec9Rules.FlexuralCurve(CompressionMembers.Materials.Aluminium.BucklingClass.A, out double a, out double l0);
        Gen.Double[0.05, 3].Sample(lbar =>
        {
            double lam = lbar * Math.PI * Math.Sqrt(E / F0);
            double ideal = Math.Min(1, TangentModulusColumn.CriticalStress(lam, E, F0, N) / F0);
            return Ec9Rules.Chi(lbar, a, l0) <= ideal + 1e-12;
        });
    }

    [Fact]
    public void Evaluate_StockyStrut_CappedAtProofStress()
    {
        var r = Check.Evaluate(Pinned(Rhs100x5, A6082T6, 200), Kn(10), ResistanceMethods.TangentModulusRambergOsgood);
        Near.Relative(1900e-6 * F0, r.DesignResistanceN, 1e-12, "f0 A cap");
        Assert.Equal(CompressionMembers.Results.FailureMode.Yielding, r.GoverningMode);
    }

    [Fact]
    public void Evaluate_TracingOff_AllocatesNothing()
    {
        var rm = CompressionMembers.Resolution.ResolvedMember.From(Pinned(Rhs100x5, A6082T6, 1500));
        var ra = CompressionMembers.Resolution.ResolvedActions.From(Kn(10));
        Assert.Equal(0, Allocations.OfChecks(rm, ra, ResistanceMethods.TangentModulusRambergOsgood));
    }
}
