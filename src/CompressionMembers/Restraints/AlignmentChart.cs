using System;
using System.Globalization;
using CompressionMembers.Internal;

namespace CompressionMembers.Restraints;

/// <summary>
/// The effective length factor K of a frame column from the restraint factors G at its ends, by the equations behind
/// the alignment charts (nomographs) for braced frames (sidesway inhibited) and sway frames (sidesway uninhibited).
/// </summary>
/// <remarks>
/// <para>Source: ANSI/AISC 360-16, Specification for Structural Steel Buildings, Commentary to Appendix 7, §7.2,
/// Eqs. (C-A-7-1) braced and (C-A-7-2) sway (from memory; the same equations appear in the commentaries of earlier
/// editions back to 1999, and in AISC 360-22):</para>
/// <para>braced: (GA GB / 4)(π/K)² + ((GA + GB) / 2)(1 − (π/K) / tan(π/K)) + 2 tan(π/2K) / (π/K) − 1 = 0;</para>
/// <para>sway: (GA GB (π/K)² − 36) / (6 (GA + GB)) − (π/K) / tan(π/K) = 0.</para>
/// <para>The equations are solved in a form multiplied out so that it has no poles and G → ∞ is exact; the root is
/// bracketed in 0.5 ≤ K ≤ 1 (braced) or K ≥ 1 (sway) and refined with Brent's method (MathNet), so no spurious branch is
/// returned. The charts assume (among others) that all columns buckle together, elastic behaviour, and beams bent in
/// single curvature (braced) or double curvature (sway); they are the characteristic equation of a column with
/// rotational end springs kθ = 2EI/(G L) (braced) and 6EI/(G L) (sway). The optional stiffness reduction τ multiplies G
/// for an inelastic column (G_inelastic = τ G, AISC 360-16 Commentary Appendix 7.2, from memory).</para>
/// <para>Thread safety: stateless; safe from any number of threads.</para>
/// </remarks>
public static class AlignmentChart
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;
    internal const string BracedRef = "AISC 360-16 Commentary App. 7.2 Eq. (C-A-7-1)";
    internal const string SwayRef = "AISC 360-16 Commentary App. 7.2 Eq. (C-A-7-2)";

    /// <summary>K of a column in a braced frame (sidesway inhibited).</summary>
    /// <param name="bottom">G at the bottom end (GB).</param>
    /// <param name="top">G at the top end (GA).</param>
    /// <param name="stiffnessReduction">τ, the column stiffness reduction for inelastic behaviour, 0 &lt; τ ≤ 1 (1 = elastic).</param>
    /// <returns>K, between 0.5 and 1.</returns>
    /// <exception cref="ArgumentOutOfRangeException">τ is outside (0, 1].</exception>
    public static double BucklingFactorBraced(JointRestraintFactor bottom, JointRestraintFactor top, double stiffnessReduction = 1.0)
    {
        double tau = CheckTau(stiffnessReduction);
        double ga = top.Value * tau, gb = bottom.Value * tau;
        if (double.IsPositiveInfinity(ga) && double.IsPositiveInfinity(gb)) return 1.0;
        if (ga == 0 && gb == 0) return 0.5;
        return Math.PI / ElasticColumnKernel.BracedChartRoot(ga, gb);
    }

    /// <summary>K of a column in a sway frame (sidesway uninhibited).</summary>
    /// <param name="bottom">G at the bottom end (GB).</param>
    /// <param name="top">G at the top end (GA).</param>
    /// <param name="stiffnessReduction">τ, 0 &lt; τ ≤ 1 (1 = elastic).</param>
    /// <returns>K, at least 1.</returns>
    /// <exception cref="ArgumentOutOfRangeException">τ is outside (0, 1].</exception>
    /// <exception cref="ArgumentException">Both ends are pinned: the sway frame is a mechanism.</exception>
    public static double BucklingFactorSway(JointRestraintFactor bottom, JointRestraintFactor top, double stiffnessReduction = 1.0)
    {
        double tau = CheckTau(stiffnessReduction);
        double ga = top.Value * tau, gb = bottom.Value * tau;
        if (double.IsPositiveInfinity(ga) && double.IsPositiveInfinity(gb))
            throw new ArgumentException("A sway column pinned at both ends (GA = GB = ∞) is a mechanism; give at least one end a rotational restraint.", nameof(top));
        if (ga == 0 && gb == 0) return 1.0;
        return Math.PI / ElasticColumnKernel.SwayChartRoot(ga, gb);
    }

    /// <summary>The restraint of a braced-frame column, K from the alignment-chart equation.</summary>
    /// <param name="bottom">G at the bottom end.</param>
    /// <param name="top">G at the top end.</param>
    /// <param name="stiffnessReduction">τ, 0 &lt; τ ≤ 1.</param>
    /// <returns>The restraint; its basis text gives G, τ, the equation and K.</returns>
    /// <exception cref="ArgumentOutOfRangeException">τ is outside (0, 1].</exception>
    public static AxisRestraint Braced(JointRestraintFactor bottom, JointRestraintFactor top, double stiffnessReduction = 1.0)
    {
        double k = BucklingFactorBraced(bottom, top, stiffnessReduction);
        return new AxisRestraint(k, Text("braced frame", BracedRef, bottom, top, stiffnessReduction, k), null, null, null, []);
    }

    /// <summary>The restraint of a sway-frame column, K from the alignment-chart equation.</summary>
    /// <param name="bottom">G at the bottom end.</param>
    /// <param name="top">G at the top end.</param>
    /// <param name="stiffnessReduction">τ, 0 &lt; τ ≤ 1.</param>
    /// <returns>The restraint; its basis text gives G, τ, the equation and K.</returns>
    /// <exception cref="ArgumentOutOfRangeException">τ is outside (0, 1].</exception>
    /// <exception cref="ArgumentException">Both ends are pinned.</exception>
    public static AxisRestraint Sway(JointRestraintFactor bottom, JointRestraintFactor top, double stiffnessReduction = 1.0)
    {
        double k = BucklingFactorSway(bottom, top, stiffnessReduction);
        return new AxisRestraint(k, Text("sway frame", SwayRef, bottom, top, stiffnessReduction, k), null, null, null, []);
    }

    /// <summary>The stiffness reduction factor τb for an inelastic column from its axial load ratio.</summary>
    /// <param name="axialLoadRatio">α Pr / Pns: required axial strength (×1.0 for LRFD, ×1.6 for ASD) over the cross-section compressive strength, 0 ≤ ratio ≤ 1.</param>
    /// <returns>τb = 1 for a ratio up to 0.5, else 4 ratio (1 − ratio).</returns>
    /// <exception cref="ArgumentOutOfRangeException">The ratio is not finite or outside [0, 1].</exception>
    /// <remarks>Source: AISC 360-16 §C2.3, Eqs. (C2-2a) and (C2-2b) (from memory).</remarks>
    public static double StiffnessReduction(double axialLoadRatio)
    {
        Guard.InRange(axialLoadRatio, 0, 1, nameof(axialLoadRatio), "", "Axial load ratio α Pr / Pns");
        return axialLoadRatio <= 0.5 ? 1.0 : 4 * axialLoadRatio * (1 - axialLoadRatio);
    }

    private static double CheckTau(double stiffnessReduction)
    {
        if (!double.IsFinite(stiffnessReduction) || !(stiffnessReduction > 0) || stiffnessReduction > 1)
            throw new ArgumentOutOfRangeException(nameof(stiffnessReduction), stiffnessReduction,
                $"Stiffness reduction τ must be greater than 0 and at most 1; got {Guard.Show(stiffnessReduction)}.");
        return stiffnessReduction;
    }

    private static string Text(string frame, string eq, JointRestraintFactor bottom, JointRestraintFactor top, double tau, double k) =>
        $"{frame}, G (bottom) = {bottom}, G (top) = {top}" + (tau < 1 ? $", stiffness reduction τ = {tau.ToString("0.###", Inv)} (G × τ)" : "") +
        $": K = {k.ToString("0.0000", Inv)} from the alignment-chart equation, {eq}";
}
