using System;
using MathNet.Numerics.RootFinding;

namespace CompressionMembers.Methods.Classical;

/// <summary>The secant formula on doubles: σmax = P/A [1 + Σ (e c / i²) sec((Lcr / 2i) √(P / E A))], and its inverse.</summary>
internal static class SecantKernel
{
    /// <summary>Bending term of one axis: (e c / i²) sec((Lcr/2i)√(P/(E A))). Infinite at or above the Euler load.</summary>
    internal static double Term(double pN, double eM, double cM, double iM, double lcrM, double ePa, double aM2)
    {
        if (eM == 0) return 0;
        double arg = lcrM / (2 * iM) * Math.Sqrt(pN / (ePa * aM2));
        if (arg >= Math.PI / 2) return double.PositiveInfinity;
        return Math.Abs(eM) * cM / (iM * iM) / Math.Cos(arg);
    }

    /// <summary>Maximum compressive stress at load P with eccentricities about both axes.</summary>
    internal static double MaxStress(double pN, double aM2, double ePa,
        double eyM, double cyM, double iyM, double lcrYM, double ezM, double czM, double izM, double lcrZM) =>
        pN / aM2 * (1 + Term(pN, eyM, cyM, iyM, lcrYM, ePa, aM2) + Term(pN, ezM, czM, izM, lcrZM, ePa, aM2));

    /// <summary>
    /// The load at which σmax reaches <paramref name="limitPa"/>, bracketed strictly inside (0, upperN) where upperN
    /// is the smallest Euler load of an eccentric axis. Brent's method (MathNet), absolute accuracy 1e-12·upperN on P,
    /// refined once more on a tighter bracket when the root is small so that the relative accuracy is 1e-10.
    /// </summary>
    internal static double LoadAtStress(double limitPa, double upperN, double aM2, double ePa,
        double eyM, double cyM, double iyM, double lcrYM, double ezM, double czM, double izM, double lcrZM, out int evaluations)
    {
        // MathNet's Brent takes a delegate: one cached delegate per thread reads the parameters from a per-thread
        // state object, so that a check allocates nothing after the first call on a thread.
        var s = t_state ??= new State();
        s.Set(limitPa, aM2, ePa, eyM, cyM, iyM, lcrYM, ezM, czM, izM, lcrZM);
        var f = t_function ??= s.Residual;
        double hi = Math.Min(upperN * (1 - 1e-12), limitPa * aM2);
        if (f(hi) <= 0) { evaluations = s.Count; return hi; } // only without eccentricity: the squash load governs
        double root = Brent.FindRoot(f, 0, hi, 1e-12 * hi, 200);
        if (root < 0.01 * hi)
            root = Brent.FindRoot(f, 0, Math.Min(hi, 2 * root), 1e-10 * root, 200);
        evaluations = s.Count;
        return root;
    }

    [ThreadStatic] private static State? t_state;
    [ThreadStatic] private static Func<double, double>? t_function;

    private sealed class State
    {
        private double _limit, _a, _e, _ey, _cy, _iy, _ly, _ez, _cz, _iz, _lz;
        internal int Count;

        internal void Set(double limit, double a, double e, double ey, double cy, double iy, double ly, double ez, double cz, double iz, double lz)
        {
            _limit = limit; _a = a; _e = e; _ey = ey; _cy = cy; _iy = iy; _ly = ly; _ez = ez; _cz = cz; _iz = iz; _lz = lz;
            Count = 0;
        }

        internal double Residual(double p)
        {
            Count++;
            return MaxStress(p, _a, _e, _ey, _cy, _iy, _ly, _ez, _cz, _iz, _lz) - _limit;
        }
    }
}
