using System;
using CompressionMembers.Actions;
using CompressionMembers.Internal;
using CompressionMembers.Members;
using CompressionMembers.Methods.Common;
using CompressionMembers.Resolution;
using CompressionMembers.Results;
using MathNet.Numerics.LinearAlgebra;

namespace CompressionMembers.Methods.Numerical;

/// <summary>
/// Geometrically nonlinear (P-δ) elastic analysis of a member pinned at both ends, with end eccentricities (load
/// eccentricity plus end moment / N, unequal ends allowed) and a half-sine initial bow: the load–deflection path, and the
/// largest moment and compressive stress, up to a stated fraction of the elastic critical load.
/// </summary>
/// <remarks>
/// <para>Model: the second-order equilibrium EI v'''' + P v'' = −P v0'' of the beam-column (Timoshenko &amp; Gere, Theory of
/// Elastic Stability, 2nd ed., §1.3–1.4 and §1.11, from memory), discretised with the same Euler–Bernoulli elements as
/// <see cref="BucklingAnalysis"/>: at each load step P the system (K − P Kg) v = P (Kg v0 + m) is solved, where m holds the
/// end moments P·e. The response is nonlinear in P (it grows without bound as P → Ncr); the moment follows by
/// equilibrium, M(x) = P (e(x) + v0(x) + v(x)), with e(x) the load line between the end offsets.</para>
/// <para>For equal end eccentricities and no bow it reproduces the secant formula (see
/// <see cref="Classical.SecantFormula.MaximumStress"/>); for a bow alone, the amplification 1 / (1 − P/Ncr).
/// Range: linear elastic material, small deflections, pinned ends without intermediate bracing, one plane of bending; the
/// stress is elastic (no yielding). Thread safety: stateless; safe from any number of threads.</para>
/// </remarks>
public static class SecondOrderAnalysis
{
    /// <summary>Runs the analysis about one axis, from the first load step to the design load.</summary>
    /// <param name="member">The member; its restraint about the axis must be pinned at both ends, without bracing.</param>
    /// <param name="actions">The design actions: N, eccentricity and end moments about the axis, initial bow about the axis.</param>
    /// <param name="axis">The bending axis, <see cref="BucklingAxis.Y"/> (eccentricity Y, bow Y) or <see cref="BucklingAxis.Z"/>.</param>
    /// <param name="steps">Load steps on the path, 1 to 200.</param>
    /// <param name="maximumFractionOfCritical">The largest N / Ncr accepted, greater than 0 and at most 0.99 (default 0.95):
    /// close to Ncr small errors in stiffness are amplified without bound and the small-deflection model no longer serves.</param>
    /// <returns>The result.</returns>
    /// <exception cref="ArgumentNullException">A reference argument is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The axis is not Y or Z, steps or the fraction are out of range, or N / Ncr exceeds the fraction.</exception>
    /// <exception cref="ArgumentException">The member is not pinned at both ends about the axis, or is braced.</exception>
    public static SecondOrderResult Analyse(Member member, DesignActions actions, BucklingAxis axis, int steps = 10, double maximumFractionOfCritical = 0.95)
    {
        ArgumentNullException.ThrowIfNull(member);
        ArgumentNullException.ThrowIfNull(actions);
        if (axis != BucklingAxis.Y && axis != BucklingAxis.Z)
            throw new ArgumentOutOfRangeException(nameof(axis), axis, "The axis must be Y or Z.");
        if (steps < 1 || steps > 200)
            throw new ArgumentOutOfRangeException(nameof(steps), steps, $"Load steps must be between 1 and 200; got {steps}.");
        if (!double.IsFinite(maximumFractionOfCritical) || !(maximumFractionOfCritical > 0) || maximumFractionOfCritical > 0.99)
            throw new ArgumentOutOfRangeException(nameof(maximumFractionOfCritical), maximumFractionOfCritical,
                $"The largest fraction of the critical load must be greater than 0 and at most 0.99; got {Guard.Show(maximumFractionOfCritical)}.");

        var rm = ResolvedMember.From(member);
        var ra = ResolvedActions.From(actions);
        string ax = axis == BucklingAxis.Y ? "y" : "z";
        if (!BucklingAnalysis.TryModelOf(rm, axis, out var model, out string? why)) throw new ArgumentException(why, nameof(member));
        if (!IsPinned(model!.Bottom) || !IsPinned(model.Top) || model.Supports.Count > 0)
            throw new ArgumentException(
                $"Second-order analysis covers members pinned at both ends without bracing; about {ax} the member is {model.Bottom.Description} (bottom), {model.Top.Description} (top)" +
                (model.Supports.Count > 0 ? $", with {model.Supports.Count} brace(s)" : "") + ".", nameof(member));

        var ad = new AxisData(rm, axis);
        double n = ra.AxialForceN;
        double e = axis == BucklingAxis.Y ? ra.EccentricityYM : ra.EccentricityZM;
        double mTop = axis == BucklingAxis.Y ? ra.EndMomentYTopNm : ra.EndMomentZTopNm;
        double mBottom = axis == BucklingAxis.Y ? ra.EndMomentYBottomNm : ra.EndMomentZBottomNm;
        double bow = Math.Abs(axis == BucklingAxis.Y ? ra.InitialBowYM : ra.InitialBowZM);
        double eTop = e + mTop / n, eBottom = e + mBottom / n;
        // The bow is taken on the side that adds to the bending of the eccentricity (the unfavourable side).
        if (eTop + eBottom < 0) bow = -bow;

        var k = BeamKernel.Assemble(model);
        k.Buckle(1, out var factors, out _);
        double ncr = factors[0]; // reference 1 N at the top: λ is Ncr in N
        double fraction = n / ncr;
        if (fraction > maximumFractionOfCritical)
            throw new ArgumentOutOfRangeException(nameof(actions), n,
                $"N = {Guard.Show(n / 1e3)} kN is {Guard.Show(fraction)} of the elastic critical load about {ax} ({Guard.Show(ncr / 1e3)} kN), above the stated limit {Guard.Show(maximumFractionOfCritical)}.");

        double l = rm.LengthM;
        var x = k.NodesM;
        int nn = x.Length, nf = k.Elastic.RowCount;
        // Initial bow v0 = e0 sin(πx/L) at the free dofs (scaled), and the end-moment vector m (scaled).
        var v0 = Vector<double>.Build.Dense(nf);
        var mv = Vector<double>.Build.Dense(nf);
        for (int i = 0; i < nn; i++)
        {
            int fv = k.Map[2 * i], ft = k.Map[2 * i + 1];
            if (fv >= 0) v0[fv] = bow * Math.Sin(Math.PI * x[i] / l) / k.Scale[fv];
            if (ft >= 0) v0[ft] = bow * Math.PI / l * Math.Cos(Math.PI * x[i] / l) / k.Scale[ft];
        }
        int fb = k.Map[1], ftTop = k.Map[2 * (nn - 1) + 1];
        mv[fb] += eBottom * k.Scale[fb];
        mv[ftTop] -= eTop * k.Scale[ftTop];
        var rhsUnit = k.Geometric * v0 + mv;

        var path = new SecondOrderPoint[steps];
        Vector<double> sol = v0;
        for (int s = 1; s <= steps; s++)
        {
            double p = n * s / steps;
            var a = k.Elastic - p * k.Geometric;
            sol = a.Cholesky().Solve(p * rhsUnit);
            path[s - 1] = Evaluate(k, sol, p, p / ncr, l, eBottom, eTop, bow, rm.AreaM2, ad.SecondMomentM4, ad.FibrePositiveM, ad.FibreNegativeM);
        }
        var defl = new double[nn];
        for (int i = 0; i < nn; i++) defl[i] = k.Physical(sol, 2 * i) + 0.0;
        return new SecondOrderResult(member, actions, axis, ncr, eBottom, eTop, bow, k.ElementCount, path, (double[])x.Clone(), defl,
            rm.AreaM2, ad.SecondMomentM4, ad.FibrePositiveM, ad.FibreNegativeM);
    }

    private static bool IsPinned(Restraints.EndSpring s) => s.HoldsTranslation && s.RotationalNmPerRad == 0;

    /// <summary>Largest deflection, moment and stress along the member, sampled at 8 points per element (Hermite interpolation).</summary>
    private static SecondOrderPoint Evaluate(BeamKernel k, Vector<double> sol, double p, double fraction, double l, double eB, double eT, double bow,
        double a, double i, double cPos, double cNeg)
    {
        var x = k.NodesM;
        double vMax = 0, mMax = 0, sMax = 0, sAt = 0;
        for (int el = 0; el + 1 < x.Length; el++)
        {
            double xa = x[el], h = x[el + 1] - xa;
            double va = k.Physical(sol, 2 * el), ta = k.Physical(sol, 2 * el + 1), vb = k.Physical(sol, 2 * el + 2), tb = k.Physical(sol, 2 * el + 3);
            for (int q = 0; q <= 8; q++)
            {
                double xi = q / 8.0, xx = xa + xi * h;
                double v = (1 - 3 * xi * xi + 2 * xi * xi * xi) * va + h * (xi - 2 * xi * xi + xi * xi * xi) * ta
                    + (3 * xi * xi - 2 * xi * xi * xi) * vb + h * (-xi * xi + xi * xi * xi) * tb;
                double lever = eB + (eT - eB) * xx / l + bow * Math.Sin(Math.PI * xx / l) + v;
                double m = p * lever;
                double sigma = p / a + Math.Abs(m) * (lever >= 0 ? cPos : cNeg) / i;
                vMax = Math.Max(vMax, Math.Abs(v));
                mMax = Math.Max(mMax, Math.Abs(m));
                if (sigma > sMax) { sMax = sigma; sAt = xx; }
            }
        }
        return new SecondOrderPoint(p, fraction, vMax, mMax, sMax, sAt);
    }
}
