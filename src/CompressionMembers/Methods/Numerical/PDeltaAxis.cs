using System;
using CompressionMembers.Methods.Common;
using CompressionMembers.Resolution;
using CompressionMembers.Results;
using MathNet.Numerics.LinearAlgebra;

namespace CompressionMembers.Methods.Numerical;

/// <summary>The P-δ model of a pinned member about one axis: mesh, matrices, the load-line offsets, the bow and the
/// section values; solves the second-order equilibrium at a given load and samples moments and stresses.</summary>
internal sealed class PDeltaAxis
{
    internal const int SamplesPerElement = 8;

    private PDeltaAxis(BeamKernel k, BucklingAxis axis, double ncr, double eB, double eT, double bow, double l, double a, double i, double cPos, double cNeg, Vector<double> rhs)
    {
        Kernel = k; Axis = axis; CriticalForceN = ncr; EccentricityBottomM = eB; EccentricityTopM = eT; BowM = bow;
        LengthM = l; AreaM2 = a; SecondMomentM4 = i; FibrePositiveM = cPos; FibreNegativeM = cNeg; _rhsUnit = rhs;
    }

    private readonly Vector<double> _rhsUnit;
    internal BeamKernel Kernel { get; }
    internal BucklingAxis Axis { get; }
    internal double CriticalForceN { get; }
    internal double EccentricityBottomM { get; }
    internal double EccentricityTopM { get; }
    internal double BowM { get; }
    internal double LengthM { get; }
    internal double AreaM2 { get; }
    internal double SecondMomentM4 { get; }
    internal double FibrePositiveM { get; }
    internal double FibreNegativeM { get; }
    internal bool HasBending => EccentricityBottomM != 0 || EccentricityTopM != 0 || BowM != 0;
    internal int SampleCount => (Kernel.NodesM.Length - 1) * (SamplesPerElement + 1);

    /// <summary>Whether the member is pinned at both ends about the axis without bracing; if not, why.</summary>
    internal static bool TryCreate(in ResolvedMember rm, in ResolvedActions ra, BucklingAxis axis, out PDeltaAxis? model, out string? why)
    {
        model = null;
        string ax = axis == BucklingAxis.Y ? "y" : "z";
        if (!BucklingAnalysis.TryModelOf(rm, axis, out var bm, out why)) return false;
        if (!IsPinned(bm!.Bottom) || !IsPinned(bm.Top) || bm.Supports.Count > 0)
        {
            why = $"second-order analysis covers members pinned at both ends without bracing; about {ax} the member is {bm.Bottom.Description} (bottom), {bm.Top.Description} (top)" +
                (bm.Supports.Count > 0 ? $", with {bm.Supports.Count} brace(s)" : "") + ".";
            return false;
        }
        var ad = new AxisData(rm, axis);
        double n = ra.AxialForceN;
        double e = axis == BucklingAxis.Y ? ra.EccentricityYM : ra.EccentricityZM;
        double mTop = axis == BucklingAxis.Y ? ra.EndMomentYTopNm : ra.EndMomentZTopNm;
        double mBottom = axis == BucklingAxis.Y ? ra.EndMomentYBottomNm : ra.EndMomentZBottomNm;
        double bow = Math.Abs(axis == BucklingAxis.Y ? ra.InitialBowYM : ra.InitialBowZM);
        // End moments are load-line offsets M / N at the design load (proportional loading, as in the secant formula).
        double eTop = e + mTop / n, eBottom = e + mBottom / n;
        // The bow is taken on the side that adds to the bending of the eccentricity (the unfavourable side).
        if (eTop + eBottom < 0) bow = -bow;

        var k = BeamKernel.Assemble(bm);
        k.Buckle(1, out var factors, out _);
        double l = rm.LengthM;
        var x = k.NodesM;
        int nn = x.Length, nf = k.Elastic.RowCount;
        var v0 = Vector<double>.Build.Dense(nf);
        var mv = Vector<double>.Build.Dense(nf);
        for (int i = 0; i < nn; i++)
        {
            int fv = k.Map[2 * i], ft = k.Map[2 * i + 1];
            if (fv >= 0) v0[fv] = bow * Math.Sin(Math.PI * x[i] / l) / k.Scale[fv];
            if (ft >= 0) v0[ft] = bow * Math.PI / l * Math.Cos(Math.PI * x[i] / l) / k.Scale[ft];
        }
        // Weak form of EI v'''' + P v'' = −P v0'' with EI v''(0) = −P eB, EI v''(L) = −P eT: end moments +P eB on θ0, −P eT on θL.
        int fb = k.Map[1], ft2 = k.Map[2 * (nn - 1) + 1];
        mv[fb] += eBottom * k.Scale[fb];
        mv[ft2] -= eTop * k.Scale[ft2];
        model = new PDeltaAxis(k, axis, factors[0], eBottom, eTop, bow, l, rm.AreaM2, ad.SecondMomentM4, ad.FibrePositiveM, ad.FibreNegativeM,
            k.Geometric * v0 + mv);
        why = null;
        return true;
    }

    private static bool IsPinned(Restraints.EndSpring s) => s.HoldsTranslation && s.RotationalNmPerRad == 0;

    /// <summary>Solves (K − P Kg) v = P (Kg v0 + m) (scaled free dofs).</summary>
    internal Vector<double> Solve(double p) => (Kernel.Elastic - p * Kernel.Geometric).Cholesky().Solve(p * _rhsUnit);

    /// <summary>Walks the sample points (8 per element, Hermite interpolation) and reports x, deflection v and the
    /// signed lever e(x) + v0(x) + v(x) at each.</summary>
    internal void Sample(Vector<double> sol, double[] xOut, double[] vOut, double[] leverOut)
    {
        var x = Kernel.NodesM;
        int at = 0;
        for (int el = 0; el + 1 < x.Length; el++)
        {
            double xa = x[el], h = x[el + 1] - xa;
            double va = Kernel.Physical(sol, 2 * el), ta = Kernel.Physical(sol, 2 * el + 1), vb = Kernel.Physical(sol, 2 * el + 2), tb = Kernel.Physical(sol, 2 * el + 3);
            for (int q = 0; q <= SamplesPerElement; q++, at++)
            {
                double xi = (double)q / SamplesPerElement, xx = xa + xi * h;
                double v = (1 - 3 * xi * xi + 2 * xi * xi * xi) * va + h * (xi - 2 * xi * xi + xi * xi * xi) * ta
                    + (3 * xi * xi - 2 * xi * xi * xi) * vb + h * (-xi * xi + xi * xi * xi) * tb;
                xOut[at] = xx;
                vOut[at] = v;
                leverOut[at] = EccentricityBottomM + (EccentricityTopM - EccentricityBottomM) * xx / LengthM + BowM * Math.Sin(Math.PI * xx / LengthM) + v;
            }
        }
    }

    /// <summary>Bending stress |M| c / I at a lever, with c the fibre on the side of the lever.</summary>
    internal double BendingStress(double p, double lever) => p * Math.Abs(lever) * (lever >= 0 ? FibrePositiveM : FibreNegativeM) / SecondMomentM4;

    /// <summary>The path point at load p.</summary>
    internal SecondOrderPoint Point(double p)
    {
        var sol = Solve(p);
        int n = SampleCount;
        var xs = new double[n];
        var vs = new double[n];
        var ls = new double[n];
        Sample(sol, xs, vs, ls);
        double vMax = 0, mMax = 0, sMax = 0, sAt = 0;
        for (int i = 0; i < n; i++)
        {
            vMax = Math.Max(vMax, Math.Abs(vs[i]));
            mMax = Math.Max(mMax, p * Math.Abs(ls[i]));
            double s = p / AreaM2 + BendingStress(p, ls[i]);
            if (s > sMax) { sMax = s; sAt = xs[i]; }
        }
        return new SecondOrderPoint(p, p / CriticalForceN, vMax, mMax, sMax, sAt);
    }
}
