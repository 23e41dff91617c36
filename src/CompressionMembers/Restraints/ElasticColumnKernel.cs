using System;
using MathNet.Numerics.RootFinding;

namespace CompressionMembers.Restraints;

/// <summary>
/// The characteristic equation of a uniform elastic column with rotational and translational springs at both ends,
/// on doubles, and its lowest root. Also the alignment-chart equations. Allocation-free after the first call on a thread.
/// </summary>
/// <remarks>
/// <para>Model: EI w'''' + P w'' = 0 on 0 ≤ x ≤ L (Timoshenko &amp; Gere, Theory of Elastic Stability, 2nd ed., §2.1–2.3,
/// from memory), u = L √(P / EI). With ξ = x / L the general solution is written in the basis 1, ξ,
/// (1 − cos uξ) / u², (uξ − sin uξ) / u³, which stays independent as u → 0, so that u = 0 is a root only for a
/// genuine mechanism and no spurious branch appears. End conditions (from the variation of the total potential):
/// bottom −w'' + Rθ w' = 0 and w''' + u² w' + Rt w = 0; top w'' + Rθ w' = 0 and −w''' − u² w' + Rt w = 0, with
/// Rθ = kθ L / EI and Rt = kt L³ / EI. Each is scaled by 1 / (1 + R), so that a rigid spring (R = ∞) is exactly
/// w' = 0 or w = 0.</para>
/// <para>The lowest critical load of any such column lies in 0 &lt; u ≤ 2π (fixed–fixed is the stiffest case), so the
/// root is found by scanning (0, 2π] for the first change of sign and refining with Brent's method (MathNet).</para>
/// </remarks>
internal static class ElasticColumnKernel
{
    internal const int ScanSteps = 512;

    /// <summary>Weights (a, b) of one end condition: a·(force or moment term) + b·(displacement term) = 0.</summary>
    internal static void Weights(double ratio, out double a, out double b)
    {
        if (double.IsPositiveInfinity(ratio)) { a = 0; b = 1; return; }
        a = 1 / (1 + ratio);
        b = ratio / (1 + ratio);
    }

    // sin u / u, (1 − cos u) / u², (u − sin u) / u³, with series near 0 to avoid cancellation.
    private static void Functions(double u, out double s1, out double s2, out double s3)
    {
        double u2 = u * u;
        if (u < 1e-2)
        {
            s1 = 1 - u2 / 6 + u2 * u2 / 120;
            s2 = 0.5 - u2 / 24 + u2 * u2 / 720;
            s3 = 1.0 / 6 - u2 / 120 + u2 * u2 / 5040;
            return;
        }
        s1 = Math.Sin(u) / u;
        s2 = (1 - Math.Cos(u)) / u2;
        s3 = (u - Math.Sin(u)) / (u2 * u);
    }

    /// <summary>The 4 × 4 characteristic determinant for u = L √(P/EI) and the spring ratios (∞ = rigid).</summary>
    internal static double Determinant(double u, double rotBottom, double transBottom, double rotTop, double transTop)
    {
        Weights(rotBottom, out double aRb, out double bRb);
        Weights(transBottom, out double aTb, out double bTb);
        Weights(rotTop, out double aRt, out double bRt);
        Weights(transTop, out double aTt, out double bTt);
        Functions(u, out double s1, out double s2, out double s3);
        double u2 = u * u, c = Math.Cos(u);
        // Unknowns (D, C, E, F) multiply 1, ξ, (1 − cos uξ)/u², (uξ − sin uξ)/u³.
        double m00 = 0, m01 = bRb, m02 = -aRb, m03 = 0;
        double m10 = bTb, m11 = aTb * u2, m12 = 0, m13 = aTb;
        double m20 = 0, m21 = bRt, m22 = aRt * c + bRt * s1, m23 = aRt * s1 + bRt * s2;
        double m30 = bTt, m31 = -aTt * u2 + bTt, m32 = bTt * s2, m33 = -aTt + bTt * s3;
        return Det4(m00, m01, m02, m03, m10, m11, m12, m13, m20, m21, m22, m23, m30, m31, m32, m33);
    }

    internal static double Det4(double a00, double a01, double a02, double a03, double a10, double a11, double a12, double a13,
        double a20, double a21, double a22, double a23, double a30, double a31, double a32, double a33)
    {
        double s0 = a00 * a11 - a10 * a01, s1 = a00 * a12 - a10 * a02, s2 = a00 * a13 - a10 * a03;
        double s3 = a01 * a12 - a11 * a02, s4 = a01 * a13 - a11 * a03, s5 = a02 * a13 - a12 * a03;
        double c5 = a22 * a33 - a32 * a23, c4 = a21 * a33 - a31 * a23, c3 = a21 * a32 - a31 * a22;
        double c2 = a20 * a33 - a30 * a23, c1 = a20 * a32 - a30 * a22, c0 = a20 * a31 - a30 * a21;
        return s0 * c5 - s1 * c4 + s2 * c3 + s3 * c2 - s4 * c1 + s5 * c0;
    }

    /// <summary>Whether the springs leave a rigid-body mechanism at zero load (Pcr = 0).</summary>
    internal static bool IsMechanism(double rotBottom, double transBottom, double rotTop, double transTop)
    {
        bool tb = transBottom > 0, tt = transTop > 0;
        if (!tb && !tt) return true;                         // free to translate as a rigid body
        if (tb && tt) return false;                          // two lateral supports hold both rigid-body motions
        return rotBottom == 0 && rotTop == 0;                // one lateral support and no rotational restraint: it rotates about it
    }

    /// <summary>The lowest root u of the characteristic determinant in (0, 2π]; the caller has excluded mechanisms.</summary>
    internal static double LowestRoot(double rotBottom, double transBottom, double rotTop, double transTop)
    {
        var s = t_state ??= new State();
        s.Kind = 0;
        s.P0 = rotBottom; s.P1 = transBottom; s.P2 = rotTop; s.P3 = transTop;
        // Scan slightly past 2π so that the fixed–fixed root (exactly 2π) is bracketed.
        return FirstRoot(s, 0, 2 * Math.PI * (1 + 1e-9), ScanSteps);
    }

    /// <summary>Braced-frame alignment-chart equation, multiplied by 4u sin u and by 1/((1+GA)(1+GB)) so that it has
    /// no poles and G = ∞ is exact: αAαB u³ sin u + 2(αAβB + αBβA)(u sin u − u² cos u) + βAβB(8(1 − cos u) − 4u sin u),
    /// α = G/(1+G), β = 1/(1+G).</summary>
    internal static double BracedChart(double u, double gA, double gB)
    {
        Chart(gA, out double aA, out double bA);
        Chart(gB, out double aB, out double bB);
        double sn = Math.Sin(u), cs = Math.Cos(u);
        return aA * aB * u * u * u * sn + 2 * (aA * bB + aB * bA) * (u * sn - u * u * cs) + bA * bB * (8 * (1 - cs) - 4 * u * sn);
    }

    /// <summary>Sway-frame alignment-chart equation, multiplied by 6(GA+GB) sin u and by 1/((1+GA)(1+GB)):
    /// (αAαB u² − 36 βAβB) sin u − 6(αAβB + αBβA) u cos u.</summary>
    internal static double SwayChart(double u, double gA, double gB)
    {
        Chart(gA, out double aA, out double bA);
        Chart(gB, out double aB, out double bB);
        return (aA * aB * u * u - 36 * bA * bB) * Math.Sin(u) - 6 * (aA * bB + aB * bA) * u * Math.Cos(u);
    }

    private static void Chart(double g, out double alpha, out double beta)
    {
        if (double.IsPositiveInfinity(g)) { alpha = 1; beta = 0; return; }
        alpha = g / (1 + g);
        beta = 1 / (1 + g);
    }

    /// <summary>Root u of the braced chart equation in [π, 2π] (K = π/u between 0.5 and 1).</summary>
    internal static double BracedChartRoot(double gA, double gB)
    {
        var s = t_state ??= new State();
        s.Kind = 1; s.P0 = gA; s.P1 = gB;
        return FirstRoot(s, Math.PI, 2 * Math.PI, 64);
    }

    /// <summary>Root u of the sway chart equation in (0, π] (K = π/u of at least 1).</summary>
    internal static double SwayChartRoot(double gA, double gB)
    {
        var s = t_state ??= new State();
        s.Kind = 2; s.P0 = gA; s.P1 = gB;
        return FirstRoot(s, 0, Math.PI, 128);
    }

    private static double FirstRoot(State s, double lo, double hi, int steps)
    {
        var f = t_function ??= s.Evaluate;
        double step = (hi - lo) / steps;
        double x0 = lo, f0 = f(lo);
        if (f0 == 0 && lo > 0) return lo;
        if (f0 == 0) { x0 = lo + 1e-9 * step; f0 = f(x0); } // u = 0 is a trivial root of a multiplied-out form
        double scale = Math.Abs(f0);
        double xPrev = double.NaN, fPrev = double.NaN;
        for (int i = 1; i <= steps; i++)
        {
            double x1 = i == steps ? hi : lo + i * step;
            double f1 = f(x1);
            scale = Math.Max(scale, Math.Abs(f1));
            if (f1 == 0) return x1;
            if (Math.Sign(f1) != Math.Sign(f0))
                return Brent.FindRoot(f, x0, x1, 1e-15 * Math.Max(1, x1), 200);
            // Two close roots (near-coincident modes of a nearly symmetric column) leave no change of sign on the grid but a
            // dip of |f| towards zero: look inside it on finer grids before going on, so that the lower mode is never skipped.
            if (!double.IsNaN(fPrev) && Math.Abs(f0) < Math.Abs(fPrev) && Math.Abs(f0) <= Math.Abs(f1)
                && TryDip(f, xPrev, x1, 0, scale, out double root))
                return root;
            xPrev = x0; fPrev = f0;
            x0 = x1; f0 = f1;
        }
        // A root at the end of the bracket (the stiff limit, u = 2π or π) can be hidden by rounding of sin and cos there.
        if (Math.Abs(f0) <= 1e-12 * scale) return hi;
        return ThrowNoRoot(lo, hi);
    }

    private static bool TryDip(Func<double, double> f, double lo, double hi, int depth, double scale, out double root)
    {
        const int sub = 32;
        double step = (hi - lo) / sub;
        double x0 = lo, f0 = f(lo), xPrev = double.NaN, fPrev = double.NaN;
        for (int i = 1; i <= sub; i++)
        {
            double x1 = i == sub ? hi : lo + i * step;
            double f1 = f(x1);
            if (f1 == 0) { root = x1; return true; }
            if (Math.Sign(f1) != Math.Sign(f0)) { root = Brent.FindRoot(f, x0, x1, 1e-15 * Math.Max(1, x1), 200); return true; }
            if (depth < 4 && !double.IsNaN(fPrev) && Math.Abs(f0) < Math.Abs(fPrev) && Math.Abs(f0) <= Math.Abs(f1)
                && TryDip(f, xPrev, x1, depth + 1, scale, out root))
                return true;
            xPrev = x0; fPrev = f0;
            x0 = x1; f0 = f1;
        }
        if (depth == 0)
        {
            // A double root (two modes at exactly the same load) touches zero without crossing it: find the least |f| in
            // the dip by golden-section search and accept it when it is zero to rounding.
            double a = lo, b = hi, g = 0.5 * (Math.Sqrt(5) - 1);
            double c = b - g * (b - a), d = a + g * (b - a), fc = Math.Abs(f(c)), fd = Math.Abs(f(d));
            for (int it = 0; it < 80 && b - a > 1e-15 * b; it++)
            {
                if (fc < fd) { b = d; d = c; fd = fc; c = b - g * (b - a); fc = Math.Abs(f(c)); }
                else { a = c; c = d; fc = fd; d = a + g * (b - a); fd = Math.Abs(f(d)); }
            }
            double xm = fc < fd ? c : d;
            if (Math.Min(fc, fd) <= 1e-10 * scale) { root = xm; return true; }
        }
        root = double.NaN;
        return false;
    }

    private static double ThrowNoRoot(double lo, double hi) =>
        throw new InvalidOperationException(
            $"No root of the characteristic equation was found between u = {lo} and {hi}; this is a defect in the library, please report it with the inputs.");

    [ThreadStatic] private static State? t_state;
    [ThreadStatic] private static Func<double, double>? t_function;

    private sealed class State
    {
        internal int Kind;
        internal double P0, P1, P2, P3;

        internal double Evaluate(double u) => Kind switch
        {
            0 => Determinant(u, P0, P1, P2, P3),
            1 => BracedChart(u, P0, P1),
            _ => SwayChart(u, P0, P1),
        };
    }
}
