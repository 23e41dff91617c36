using System;
using CompressionMembers.Actions;
using CompressionMembers.Internal;
using CompressionMembers.Members;
using CompressionMembers.Resolution;
using CompressionMembers.Results;

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
        if (!PDeltaAxis.TryCreate(rm, ra, axis, out var model, out string? why))
            throw new ArgumentException(char.ToUpperInvariant(why![0]) + why[1..], nameof(member));
        double n = ra.AxialForceN, ncr = model!.CriticalForceN;
        double fraction = n / ncr;
        if (fraction > maximumFractionOfCritical)
            throw new ArgumentOutOfRangeException(nameof(actions), n,
                $"N = {Guard.Show(n / 1e3)} kN is {Guard.Show(fraction)} of the elastic critical load about {ax} ({Guard.Show(ncr / 1e3)} kN), above the stated limit {Guard.Show(maximumFractionOfCritical)}.");

        var path = new SecondOrderPoint[steps];
        for (int s = 1; s <= steps; s++) path[s - 1] = model.Point(n * s / steps);
        var k = model.Kernel;
        var sol = model.Solve(n);
        int nn = k.NodesM.Length;
        var defl = new double[nn];
        for (int i = 0; i < nn; i++) defl[i] = k.Physical(sol, 2 * i) + 0.0;
        return new SecondOrderResult(member, actions, axis, ncr, model.EccentricityBottomM, model.EccentricityTopM, model.BowM, k.ElementCount, path,
            (double[])k.NodesM.Clone(), defl, model.AreaM2, model.SecondMomentM4, model.FibrePositiveM, model.FibreNegativeM);
    }
}
