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
    /// The load at which σmax reaches <paramref name="limitPa"/>, strictly below <paramref name="upperN"/> (the smallest
    /// Euler load of an eccentric axis). The root is first bracketed by a sandwich that follows from the secant growing
    /// with P: Pu = A f / (1 + Σε) is an upper bound, and Pl = A f / (1 + Σ ε sec θ(Pu)) a lower bound (ε = e c / i²).
    /// MathNet's Brent method then solves G(P) = (P/A − f) Π cos θ + (P/A) Σ ε Π' cos θ = 0 — the secant equation
    /// multiplied by its cosines, which is smooth up to the Euler load — on [Pl, Pu] to 1e-10 relative.
    /// </summary>
    internal static double LoadAtStress(double limitPa, double upperN, double aM2, double ePa,
        double eyM, double cyM, double iyM, double lcrYM, double ezM, double czM, double izM, double lcrZM, out int evaluations)
    {
        // MathNet's Brent takes a delegate: one cached delegate per thread reads the parameters from a per-thread
        // state object, so that a check allocates nothing after the first call on a thread.
        var s = t_state ??= new State();
        s.Set(limitPa, aM2, ePa, eyM, cyM, iyM, lcrYM, ezM, czM, izM, lcrZM);
        var g = t_function ??= s.Smooth;
        double epsY = Math.Abs(eyM) * cyM / (iyM * iyM), epsZ = Math.Abs(ezM) * czM / (izM * izM);
        double squash = limitPa * aM2;
        if (epsY == 0 && epsZ == 0) { evaluations = 0; return Math.Min(squash, upperN); }
        // Just below the Euler load, so that rounding can never put θ past π/2 (where the cosines change sign).
        double hi = Math.Min(squash / (1 + epsY + epsZ), upperN * (1 - 1e-12));
        double amplified = s.Amplified(hi);
        double lo = double.IsFinite(amplified) ? squash / (1 + amplified) : 0;
        if (lo > 0 && hi - lo <= 1e-12 * lo) { evaluations = s.Count; return 0.5 * (lo + hi); }
        double accuracy = lo > 0 ? 5e-11 * lo : 1e-12 * hi;
        if (!Brent.TryFindRoot(g, lo, hi, accuracy, 100, out double root))
        {
            // Not expected (G changes sign on [lo, hi] by construction); bisection on the same bracket is the safe fallback.
            if (!(g(lo) < 0 && g(hi) > 0))
                throw new InvalidOperationException("The secant formula's root could not be bracketed; please report the member and actions.");
            root = Bisection.FindRoot(g, lo, hi, accuracy, 400);
        }
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

        /// <summary>Σ ε sec θ at load P (infinite at or above an Euler load).</summary>
        internal double Amplified(double p)
        {
            Count++;
            return Term(p, _ey, _cy, _iy, _ly, _e, _a) + Term(p, _ez, _cz, _iz, _lz, _e, _a);
        }

        /// <summary>The secant equation multiplied by its cosines: smooth and finite up to the Euler load.</summary>
        internal double Smooth(double p)
        {
            Count++;
            double cy = _ey == 0 ? 1 : Math.Max(0, Math.Cos(_ly / (2 * _iy) * Math.Sqrt(p / (_e * _a))));
            double cz = _ez == 0 ? 1 : Math.Max(0, Math.Cos(_lz / (2 * _iz) * Math.Sqrt(p / (_e * _a))));
            double epsY = Math.Abs(_ey) * _cy / (_iy * _iy), epsZ = Math.Abs(_ez) * _cz / (_iz * _iz);
            double s = p / _a;
            return (s - _limit) * cy * cz + s * (epsY * cz + epsZ * cy);
        }
    }
}
