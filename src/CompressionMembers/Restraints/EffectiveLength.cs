using System;
using System.Globalization;
using System.Runtime.CompilerServices;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Restraints;

/// <summary>
/// The effective length factor K of a uniform elastic column from the real stiffness of its end restraints: the
/// exact lowest root of the characteristic equation, braced or unbraced. The result feeds a member's effective length
/// in any method, and its <see cref="AxisRestraint.BasisText"/> says how K was obtained.
/// </summary>
/// <remarks>
/// <para>Source: the differential equation of the elastic column EI w'''' + P w'' = 0 with elastic end restraints,
/// Timoshenko &amp; Gere, Theory of Elastic Stability, 2nd ed. (1961), §2.1–2.3 and §2.6 (from memory). The root is
/// bracketed in 0 &lt; L√(P/EI) ≤ 2π and refined with Brent's method (MathNet.Numerics), so the lowest buckling load is
/// returned and never a higher branch. K = π / (L√(Pcr/EI)).</para>
/// <para>Range: braced members (both ends held against translation) give 0.5 ≤ K ≤ 1; sway members (one end free to
/// translate) give K ≥ 1; translational springs give any K ≥ 0.5. Ideal ends (every spring rigid or absent) return the
/// theoretical values of <see cref="AxisRestraint.BucklingFactorFor"/> exactly. The member is taken as uniform, straight
/// and loaded at its ends only; for stepped or tapered members, intermediate loads or springs use the finite-element
/// model in <c>CompressionMembers.Methods.Numerical</c>.</para>
/// <para>Thread safety: stateless; safe from any number of threads.</para>
/// </remarks>
public static class EffectiveLength
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;
    private const string Source = "characteristic equation of the elastic column (Timoshenko & Gere §2.1–2.3)";

    // Remembers the springs behind a restraint made here, so that the finite-element method can model them.
    private static readonly ConditionalWeakTable<AxisRestraint, SpringPair> Springs = new();

    internal sealed class SpringPair(EndSpring bottom, EndSpring top, double eiNm2, double lengthM)
    {
        internal EndSpring Bottom { get; } = bottom;
        internal EndSpring Top { get; } = top;
        internal double FlexuralRigidityNm2 { get; } = eiNm2;
        internal double LengthM { get; } = lengthM;
    }

    /// <summary>The exact effective length factor K from the end springs.</summary>
    /// <param name="bottom">Restraint at the bottom end.</param>
    /// <param name="top">Restraint at the top end.</param>
    /// <param name="elasticModulus">Elastic modulus E of the member.</param>
    /// <param name="secondMoment">Second moment of area I about the buckling axis.</param>
    /// <param name="length">System length L.</param>
    /// <returns>K, at least 0.5.</returns>
    /// <exception cref="ArgumentNullException">An end restraint is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">E, I or L is not finite or not positive.</exception>
    /// <exception cref="ArgumentException">The restraints leave a mechanism (the member can move without bending).</exception>
    public static double BucklingFactorFromEndSprings(EndSpring bottom, EndSpring top, Pressure elasticModulus,
        AreaMomentOfInertia secondMoment, Length length)
    {
        ArgumentNullException.ThrowIfNull(bottom);
        ArgumentNullException.ThrowIfNull(top);
        double e = Si.Pascals(elasticModulus, nameof(elasticModulus), "Elastic modulus");
        double i = Si.MetersToFourth(secondMoment, nameof(secondMoment), "Second moment of area");
        double l = Si.Meters(length, nameof(length), "Member length");
        return Factor(bottom, top, e * i, l);
    }

    /// <summary>The restraint about one axis with the exact K from the end springs.</summary>
    /// <param name="bottom">Restraint at the bottom end.</param>
    /// <param name="top">Restraint at the top end.</param>
    /// <param name="elasticModulus">Elastic modulus E of the member.</param>
    /// <param name="secondMoment">Second moment of area I about the buckling axis.</param>
    /// <param name="length">System length L (the member made with this restraint should have the same length).</param>
    /// <returns>The restraint; its basis text records the springs and how K was found.</returns>
    /// <exception cref="ArgumentNullException">An end restraint is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">E, I or L is not finite or not positive.</exception>
    /// <exception cref="ArgumentException">The restraints leave a mechanism.</exception>
    public static AxisRestraint FromEndSprings(EndSpring bottom, EndSpring top, Pressure elasticModulus,
        AreaMomentOfInertia secondMoment, Length length)
    {
        double k = BucklingFactorFromEndSprings(bottom, top, elasticModulus, secondMoment, length);
        string kind = bottom.HoldsTranslation && top.HoldsTranslation ? "braced"
            : (bottom.TranslationalNPerM == 0 || top.TranslationalNPerM == 0) ? "sway" : "on lateral springs";
        string how = bottom.IsIdeal && top.IsIdeal
            ? $"theoretical K = {k.ToString("0.0000", Inv)} of the ideal ends"
            : $"exact K = {k.ToString("0.0000", Inv)} from the characteristic equation of the elastic column";
        string text = $"end springs ({kind}): bottom {bottom.Description}; top {top.Description}; " +
            $"EI = {(elasticModulus.Pascals * secondMoment.MetersToTheFourth / 1e3).ToString("0.###", Inv)} kN·m², L = {Si.Given(length)}: {how}";
        var bc = bottom.AsEndCondition;
        var tc = top.AsEndCondition;
        bool ideal = bc.HasValue && tc.HasValue;
        var r = new AxisRestraint(k, text, ideal ? bc : null, ideal ? tc : null, ideal ? EffectiveLengthBasis.Theoretical : null, []);
        Springs.AddOrUpdate(r, new SpringPair(bottom, top, elasticModulus.Pascals * secondMoment.MetersToTheFourth, length.Meters));
        return r;
    }

    /// <summary>The restraint about one axis of a member-to-be, with E from the material and I from the section about that axis.</summary>
    /// <param name="bottom">Restraint at the bottom end.</param>
    /// <param name="top">Restraint at the top end.</param>
    /// <param name="material">The material (its elastic modulus for stability).</param>
    /// <param name="section">The section.</param>
    /// <param name="axis">The buckling axis, <see cref="Results.BucklingAxis.Y"/> or <see cref="Results.BucklingAxis.Z"/>.</param>
    /// <param name="length">The member's system length.</param>
    /// <returns>The restraint.</returns>
    /// <exception cref="ArgumentNullException">A reference argument is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The axis is not Y or Z, or the length is not finite or not positive.</exception>
    /// <exception cref="ArgumentException">The restraints leave a mechanism.</exception>
    public static AxisRestraint FromEndSprings(EndSpring bottom, EndSpring top, Materials.Material material, Sections.Section section,
        Results.BucklingAxis axis, Length length)
    {
        ArgumentNullException.ThrowIfNull(material);
        ArgumentNullException.ThrowIfNull(section);
        if (axis != Results.BucklingAxis.Y && axis != Results.BucklingAxis.Z)
            throw new ArgumentOutOfRangeException(nameof(axis), axis, "The axis must be Y or Z.");
        return FromEndSprings(bottom, top, material.ElasticModulus, axis == Results.BucklingAxis.Y ? section.SecondMomentY : section.SecondMomentZ, length);
    }

    /// <summary>The springs behind a restraint made by <c>FromEndSprings</c>, if it is one, with the EI and L it was made for.</summary>
    internal static bool TryGetSprings(AxisRestraint restraint, out SpringPair? springs) => Springs.TryGetValue(restraint, out springs);

    /// <summary>K on doubles: EI in N·m², L in m.</summary>
    internal static double Factor(EndSpring bottom, EndSpring top, double eiNm2, double lengthM)
    {
        if (bottom.AsEndCondition is { } b && top.AsEndCondition is { } t)
            return AxisRestraint.BucklingFactorFor(b, t, EffectiveLengthBasis.Theoretical); // exact limits; throws for a mechanism
        double rb = bottom.RotationalNmPerRad * lengthM / eiNm2, tb = bottom.TranslationalNPerM * lengthM * lengthM * lengthM / eiNm2;
        double rt = top.RotationalNmPerRad * lengthM / eiNm2, tt = top.TranslationalNPerM * lengthM * lengthM * lengthM / eiNm2;
        if (ElasticColumnKernel.IsMechanism(rb, tb, rt, tt))
            throw new ArgumentException(
                $"End restraints bottom {bottom.Description} and top {top.Description} form a mechanism: the member can move without bending. " +
                "Hold at least one end against translation and give a rotational restraint, or give both ends a lateral restraint.", nameof(top));
        double u = ElasticColumnKernel.LowestRoot(rb, tb, rt, tt);
        return Math.PI / u;
    }

    internal static string SourceText => Source;
}
