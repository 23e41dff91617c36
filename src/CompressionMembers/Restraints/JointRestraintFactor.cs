using System;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Restraints;

/// <summary>
/// The restraint factor G at one end of a frame column for the alignment charts: the ratio of the column stiffness
/// to the restraining beam stiffness at the joint, G = Σ(EI/L)columns / Σ(EI/L)beams.
/// </summary>
/// <remarks>
/// <para>G = 0 is a perfectly fixed end (<see cref="Fixed"/>) and G → ∞ a perfectly pinned end (<see cref="Pinned"/>).
/// In design practice the commentary of the steel specification (AISC 360-16 Commentary, Appendix 7.2, from memory)
/// suggests G = 10 for a pinned base and G = 1 for a base built as fixed, because neither ideal is reached; use
/// <see cref="Of"/> for those.</para>
/// <para>The default value is G = 0 (fixed). Thread safety: immutable value type.</para>
/// </remarks>
[Immutable]
public readonly struct JointRestraintFactor : IEquatable<JointRestraintFactor>
{
    private JointRestraintFactor(double g) => Value = g;

    /// <summary>A perfectly fixed end, G = 0.</summary>
    public static JointRestraintFactor Fixed => new(0);

    /// <summary>A perfectly pinned end, G → ∞ (no rotational restraint).</summary>
    public static JointRestraintFactor Pinned => new(double.PositiveInfinity);

    /// <summary>A finite restraint factor.</summary>
    /// <param name="g">G, finite and not negative.</param>
    /// <returns>The factor.</returns>
    /// <exception cref="ArgumentOutOfRangeException">G is not finite or is negative (use <see cref="Pinned"/> for G → ∞).</exception>
    public static JointRestraintFactor Of(double g)
    {
        if (!double.IsFinite(g) || g < 0)
            throw new ArgumentOutOfRangeException(nameof(g), g,
                $"Restraint factor G must be a finite number of at least 0; got {Guard.Show(g)}. Use JointRestraintFactor.Pinned for G → ∞.");
        return new(g);
    }

    /// <summary>G from the stiffness sums at the joint.</summary>
    /// <param name="columns">Σ(EI/L) of the columns meeting at the joint (in the plane of buckling).</param>
    /// <param name="beams">Σ(EI/L) of the restraining beams; zero gives <see cref="Pinned"/>.</param>
    /// <returns>The factor.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A sum is not finite, the column sum is not positive, or the beam sum is negative.</exception>
    public static JointRestraintFactor FromStiffnessSums(RotationalStiffness columns, RotationalStiffness beams)
    {
        double c = Si.NewtonMetersPerRadian(columns, nameof(columns), "Column stiffness sum Σ(EI/L)", Si.Sign.Positive);
        double b = Si.NewtonMetersPerRadian(beams, nameof(beams), "Beam stiffness sum Σ(EI/L)", Si.Sign.NonNegative);
        return b == 0 ? Pinned : new(c / b);
    }

    /// <summary>G (positive infinity for <see cref="Pinned"/>).</summary>
    public double Value { get; }

    /// <summary>Whether this is the pinned limit G → ∞.</summary>
    public bool IsPinned => double.IsPositiveInfinity(Value);

    /// <summary>G as reports show it: "∞ (pinned)", "0 (fixed)" or the number.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => IsPinned ? "∞ (pinned)" : Value == 0 ? "0 (fixed)" : Guard.Show(Value);

    /// <summary>Exact equality of G.</summary>
    /// <param name="other">The other factor.</param>
    /// <returns>Whether the values are equal.</returns>
    public bool Equals(JointRestraintFactor other) => Value.Equals(other.Value);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is JointRestraintFactor o && Equals(o);

    /// <inheritdoc/>
    public override int GetHashCode() => Value.GetHashCode();

    /// <summary>Exact equality of G.</summary>
    /// <param name="left">One factor.</param>
    /// <param name="right">The other.</param>
    /// <returns>Whether they are equal.</returns>
    public static bool operator ==(JointRestraintFactor left, JointRestraintFactor right) => left.Equals(right);

    /// <summary>Exact inequality of G.</summary>
    /// <param name="left">One factor.</param>
    /// <param name="right">The other.</param>
    /// <returns>Whether they differ.</returns>
    public static bool operator !=(JointRestraintFactor left, JointRestraintFactor right) => !left.Equals(right);
}
