using System;
using MathNet.Numerics.RootFinding;

namespace CompressionMembers.Methods.Aluminium;

/// <summary>The smallest root of the flexural-torsional cubic of a section with no axis of symmetry, by Brent's method
/// (MathNet) on (0, min(Ny, Nz, NT)], where the cubic changes sign: it is −i0² Ny Nz NT &lt; 0 at 0 and ≥ 0 at the
/// smallest of the three uncoupled loads.</summary>
internal static class FtCubic
{
    internal static double Value(double n, double ny, double nz, double nt, double i02, double y0, double z0) =>
        i02 * (n - ny) * (n - nz) * (n - nt) - n * n * y0 * y0 * (n - nz) - n * n * z0 * z0 * (n - ny);

    internal static double SmallestRoot(double ny, double nz, double nt, double i02, double y0, double z0)
    {
        double hi = Math.Min(ny, Math.Min(nz, nt));
        // One cached delegate per thread reads the parameters from a per-thread state object (no allocation after the first call).
        var s = t_state ??= new State();
        s.Set(ny, nz, nt, i02, y0, z0, hi);
        var f = t_function ??= s.Residual;
        if (f(1.0) <= 0) return hi; // a root at the bracket end itself (coincident loads)
        return hi * Brent.FindRoot(f, 0, 1.0, 1e-13, 200);
    }

    [ThreadStatic] private static State? t_state;
    [ThreadStatic] private static Func<double, double>? t_function;

    private sealed class State
    {
        private double _ny, _nz, _nt, _i02, _y0, _z0;

        internal void Set(double ny, double nz, double nt, double i02, double y0, double z0, double scale)
        {
            _ny = ny / scale; _nz = nz / scale; _nt = nt / scale; _i02 = i02; _y0 = y0; _z0 = z0;
        }

        // In units of the bracket end, so the root is sought on (0, 1].
        internal double Residual(double x) => Value(x, _ny, _nz, _nt, _i02, _y0, _z0);
    }
}
