using System;
using System.Numerics;
using CompressionMembers.Actions;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Timber;
using CsCheck;
using MathNet.Numerics;
using UnitsNet;

namespace CompressionMembers.Tests.Timber;

/// <summary>Properties and cross-checks with a general-purpose numeric library (MathNet.Numerics).</summary>
public class TimberPropertyTests
{
    private static double SmallerRealRoot((Complex, Complex) r) => Math.Min(r.Item1.Real, r.Item2.Real);

    [Fact]
    public void Kc_IsSmallerRootOfItsQuadratic_ByMathNet()
    {
        // kc = 1/(k + √(k² − λrel²)) is the smaller root of λrel² x² − 2k x + 1 = 0 (algebra of (6.25)); MathNet solves it.
        Gen.Select(Gen.Double[0.31, 5], Gen.Bool).Sample((l, glulam) =>
        {
            double bc = glulam ? 0.1 : 0.2, k = Ec5Kernel.K(l, bc);
            var roots = FindRoots.Quadratic(1, -2 * k, l * l);
            return Math.Abs(SmallerRealRoot(roots) - Ec5Kernel.Kc(l, bc)) < 1e-12;
        });
    }

    [Fact]
    public void Ec5Compression_UtilisationIsSigmaOverKcFd_WithTheKernelsKc()
    {
        // Pure compression, (6.23)/(6.24) without moments: u = σc,0,d / (kc fc,0,d). The compression core forms it as
        // σc,0,d / fc,0,d × (k + √(k² − λrel²)) — the divisor of kc (6.25), so no division by kc waits on kc — which must
        // agree with the standard's order to rounding; kc itself must be the same bits as Kc, and the resistance kc,min fc,0,d A.
        Gen.Select(Gen.Double[0, 5], Gen.Double[0, 5], Gen.Bool, Gen.Double[1e3, 5e7], Gen.Double[5e6, 6e7], Gen.Double[1e-4, 1]).Sample(
            (ly, lz, glulam, sigma, fd, a) =>
            {
                double bc = glulam ? 0.1 : 0.2;
                Ec5Kernel.Compression(ly, lz, bc, fd, sigma, a, out _, out _, out double kcY, out double kcZ, out double uY, out double uZ, out double nRd);
                double hY = Ec5Kernel.Kc(ly, bc), hZ = Ec5Kernel.Kc(lz, bc);
                return kcY.Equals(hY) && kcZ.Equals(hZ) && Close(uY, sigma / (hY * fd)) && Close(uZ, sigma / (hZ * fd))
                    && nRd.Equals(Math.Min(hY, hZ) * fd * a);
            }, seed: Trust.PropertyTests.Seed);

        static bool Close(double actual, double expected) => Math.Abs(actual - expected) <= 1e-15 * expected;
    }

    [Fact]
    public void Cp_IsSmallerRootOfYlinenQuadratic_ByMathNet()
    {
        // Cp of (3.7-1) is the smaller root of c x² − (1 + α) x + α = 0, α = FcE/Fc* (Ylinen's form); MathNet solves it.
        Gen.Select(Gen.Double[0.01, 10], Gen.Int[0, 2]).Sample((a, ci) =>
        {
            double c = ci == 0 ? 0.8 : ci == 1 ? 0.85 : 0.9;
            var roots = FindRoots.Quadratic(a, -(1 + a), c);
            return Math.Abs(SmallerRealRoot(roots) - NdsColumnStability.Cp(a, c)) < 1e-12;
        });
    }

    [Fact]
    public void Ec5Utilisation_RisesWithLength()
    {
        // Contract: for a fixed section and load the utilisation does not fall as the column gets longer.
        Gen.Select(Gen.Double[300, 6000], Gen.Double[1, 1000]).Sample((l, dl) =>
        {
            var a = TimberFixtures.Load(30).WithEccentricity(Length.FromMillimeters(20), Length.Zero);
            double u1 = Check.Evaluate(TimberFixtures.Post(100, 160, l, TimberGrades.C24), a, ResistanceMethods.Ec5Column).Utilisation;
            double u2 = Check.Evaluate(TimberFixtures.Post(100, 160, l + dl, TimberGrades.C24), a, ResistanceMethods.Ec5Column).Utilisation;
            return u2 >= u1 * (1 - 1e-12);
        });
    }

    [Fact]
    public void Ec5Resistance_GlulamKcAboveSolidAtEqualSlenderness_ByMethod()
    {
        // A user class with C24's values but declared as glulam has βc = 0.1 and so kc no lower than C24's at every length.
        var c = TimberGrades.C24;
        var asGlulam = TimberMaterial.Create("C24 values as glulam (test)", TimberProduct.GlulamHomogeneous, c.CompressionStrength, c.BendingStrength,
            c.TensionStrength, c.ShearStrength, c.MeanModulus, c.FifthPercentileModulus, c.MeanShearModulus, c.CharacteristicDensity, c.MeanDensity, "user-defined (test)");
        Gen.Double[500, 5000].Sample(l =>
        {
            double kSolid = Check.Evaluate(TimberFixtures.Post(100, 100, l, c), TimberFixtures.Load(10), ResistanceMethods.Ec5Column).AboutZ.ReductionFactor;
            double kGlulam = Check.Evaluate(TimberFixtures.Post(100, 100, l, asGlulam), TimberFixtures.Load(10), ResistanceMethods.Ec5Column).AboutZ.ReductionFactor;
            return kGlulam >= kSolid;
        });
    }

    [Fact]
    public void FireTimeToFailure_FallsAsTheLoadRises()
    {
        var m = TimberFixtures.Post(160, 240, 3000, TimberGrades.GL24h);
        Gen.Double[20, 200].Sample(kN =>
        {
            var a1 = DesignActions.Compression(Force.FromKilonewtons(kN));
            var a2 = DesignActions.Compression(Force.FromKilonewtons(kN * 1.2));
            return ResistanceMethods.Ec5FireR60.TimeToFailure(m, a2) < ResistanceMethods.Ec5FireR60.TimeToFailure(m, a1);
        }, iter: 50);
    }
}
