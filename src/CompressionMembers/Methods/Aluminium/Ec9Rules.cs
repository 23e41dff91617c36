using System;
using CompressionMembers.Materials.Aluminium;

namespace CompressionMembers.Methods.Aluminium;

/// <summary>The formulas and tables of EN 1999-1-1:2007+A1:2009 on doubles (values recalled from memory where the
/// comments say so): ε, class limits, ρc, χ, κ, α and λ̄0.</summary>
internal static class Ec9Rules
{
    /// <summary>ε = √(250 / f0[MPa]), EN 1999-1-1 Table 6.2.</summary>
    internal static double Epsilon(double f0Pa) => Math.Sqrt(250e6 / f0Pa);

    /// <summary>Class limits β1/ε, β2/ε, β3/ε, EN 1999-1-1 Table 6.2 (from memory).</summary>
    internal static void ClassLimits(BucklingClass cls, bool welded, bool outstand, out double b1, out double b2, out double b3)
    {
        if (cls == BucklingClass.A)
        {
            if (!welded) { if (outstand) { b1 = 3; b2 = 4.5; b3 = 6; } else { b1 = 11; b2 = 16; b3 = 22; } }
            else { if (outstand) { b1 = 2.5; b2 = 4; b3 = 5; } else { b1 = 9; b2 = 13; b3 = 18; } }
        }
        else
        {
            if (!welded) { if (outstand) { b1 = 3.5; b2 = 4.5; b3 = 5; } else { b1 = 13; b2 = 16.5; b3 = 18; } }
            else { if (outstand) { b1 = 3; b2 = 3.5; b3 = 4; } else { b1 = 10; b2 = 13.5; b3 = 15; } }
        }
    }

    /// <summary>Constants C1, C2 of ρc, EN 1999-1-1 Table 6.3 (from memory).</summary>
    internal static void LocalBucklingConstants(BucklingClass cls, bool welded, bool outstand, out double c1, out double c2)
    {
        if (cls == BucklingClass.A)
        {
            if (!welded) { if (outstand) { c1 = 10; c2 = 24; } else { c1 = 32; c2 = 220; } }
            else { if (outstand) { c1 = 9; c2 = 20; } else { c1 = 29; c2 = 198; } }
        }
        else
        {
            if (!welded) { if (outstand) { c1 = 10; c2 = 24; } else { c1 = 29; c2 = 198; } }
            else { if (outstand) { c1 = 8; c2 = 16; } else { c1 = 25; c2 = 150; } }
        }
    }

    /// <summary>The class (1 to 4) of a part of slenderness β: β ≤ β1 ε → 1, ≤ β2 ε → 2, ≤ β3 ε → 3, else 4 (EN 1999-1-1 6.1.4.4).</summary>
    internal static int ClassOf(double beta, double eps, BucklingClass cls, bool welded, bool outstand)
    {
        ClassLimits(cls, welded, outstand, out double b1, out double b2, out double b3);
        return beta <= b1 * eps ? 1 : beta <= b2 * eps ? 2 : beta <= b3 * eps ? 3 : 4;
    }

    /// <summary>ρc = C1/(β/ε) − C2/(β/ε)² for a class 4 part, at most 1; 1 otherwise (EN 1999-1-1 6.1.5). The cap at 1
    /// matters for class B unwelded outstands, where the expression exceeds 1 for 4 &lt; β/ε &lt; 6.</summary>
    internal static double RhoC(double beta, double eps, BucklingClass cls, bool welded, bool outstand)
    {
        ClassLimits(cls, welded, outstand, out _, out _, out double b3);
        if (beta <= b3 * eps) return 1;
        LocalBucklingConstants(cls, welded, outstand, out double c1, out double c2);
        double x = beta / eps;
        return Math.Min(1.0, c1 / x - c2 / (x * x));
    }

    /// <summary>α and λ̄0 for flexural buckling, EN 1999-1-1 Table 6.6 (from memory): class A 0.20 / 0.10, class B 0.32 / 0.00.</summary>
    internal static void FlexuralCurve(BucklingClass cls, out double alpha, out double lambda0)
    {
        if (cls == BucklingClass.A) { alpha = 0.20; lambda0 = 0.10; }
        else { alpha = 0.32; lambda0 = 0.0; }
    }

    /// <summary>α and λ̄0 for torsional and flexural-torsional buckling, EN 1999-1-1 Table 6.6 (from memory): sections made
    /// entirely of radiating outstands (angles, tees, cruciforms) 0.20 / 0.60; general sections 0.35 / 0.40.</summary>
    internal static void TorsionalCurve(bool radiatingOutstands, out double alpha, out double lambda0)
    {
        if (radiatingOutstands) { alpha = 0.20; lambda0 = 0.60; }
        else { alpha = 0.35; lambda0 = 0.40; }
    }

    /// <summary>φ = 0.5 [1 + α (λ̄ − λ̄0) + λ̄²], EN 1999-1-1 6.3.1.2.</summary>
    internal static double Phi(double lambdaBar, double alpha, double lambda0) => 0.5 * (1 + alpha * (lambdaBar - lambda0) + lambdaBar * lambdaBar);

    /// <summary>χ = 1 / (φ + √(φ² − λ̄²)), at most 1, EN 1999-1-1 6.3.1.2.</summary>
    internal static double Chi(double lambdaBar, double alpha, double lambda0)
    {
        if (lambdaBar <= lambda0) return 1;
        double phi = Phi(lambdaBar, alpha, lambda0);
        return Math.Min(1.0, 1 / (phi + Math.Sqrt(phi * phi - lambdaBar * lambdaBar)));
    }

    /// <summary>κ for longitudinally welded members in flexural buckling, EN 1999-1-1 6.3.1.1 Table 6.5 (from memory):
    /// class A κ = 1 − (1 − A1/A) 10^(−λ̄) − (0.05 + 0.1 A1/A) λ̄^(1.3 (1 − λ̄));
    /// class B κ = 1 for λ̄ ≤ 0.2, else 1 + 0.04 (4 λ̄)^(0.5 − λ̄) − 0.22 λ̄^(1.4 (1 − λ̄)). Never above 1.</summary>
    internal static double KappaLongitudinalWeld(BucklingClass cls, double lambdaBar, double a1OverA)
    {
        double k;
        if (cls == BucklingClass.A)
            k = 1 - (1 - a1OverA) * Math.Pow(10, -lambdaBar) - (0.05 + 0.1 * a1OverA) * Math.Pow(lambdaBar, 1.3 * (1 - lambdaBar));
        else
            k = lambdaBar <= 0.2 ? 1 : 1 + 0.04 * Math.Pow(4 * lambdaBar, 0.5 - lambdaBar) - 0.22 * Math.Pow(lambdaBar, 1.4 * (1 - lambdaBar));
        return Math.Min(1.0, k);
    }

    /// <summary>
    /// The lowest elastic critical force of torsional or flexural-torsional buckling of a column whose shear centre is
    /// at (y0, z0) from the centroid on the principal axes (Timoshenko &amp; Gere, Theory of Elastic Stability, §5.3):
    /// the smallest root of i0² (N − Ny)(N − Nz)(N − NT) − N² y0² (N − Nz) − N² z0² (N − Ny) = 0. With one offset
    /// zero the mode that couples with twist is the smaller root of a quadratic; with both zero it is NT.
    /// </summary>
    /// <remarks><c>coupled</c> says whether the mode couples bending and twist (flexural-torsional) rather than pure torsion.</remarks>
    internal static double TorsionalCritical(double nyN, double nzN, double ntN, double i02, double y0, double z0, out bool coupled)
    {
        double scale = i02 > 0 ? i02 : 1;
        bool hasY = Math.Abs(y0 * y0) > 1e-12 * scale, hasZ = Math.Abs(z0 * z0) > 1e-12 * scale;
        coupled = hasY || hasZ;
        if (!hasY && !hasZ) return ntN;
        if (hasY && !hasZ) return Quadratic(nyN, ntN, 1 - y0 * y0 / i02); // offset on y (the axis of symmetry) couples bending about y with twist
        if (!hasY && hasZ) return Quadratic(nzN, ntN, 1 - z0 * z0 / i02);
        return FtCubic.SmallestRoot(nyN, nzN, ntN, i02, y0, z0);
    }

    /// <summary>Smaller root of β N² − (Nf + NT) N + Nf NT = 0, written to avoid cancellation.</summary>
    private static double Quadratic(double nf, double nt, double beta)
    {
        double s = nf + nt;
        double disc = Math.Max(0, s * s - 4 * beta * nf * nt);
        return 2 * nf * nt / (s + Math.Sqrt(disc));
    }
}
