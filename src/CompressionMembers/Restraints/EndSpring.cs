using System;
using System.Globalization;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Restraints;

/// <summary>
/// The elastic restraint at one end of a member (or at a node of a numerical model), for buckling about one axis:
/// a rotational spring kθ and a translational spring kt, each of which may also be rigid or absent.
/// </summary>
/// <remarks>
/// <para>The four ideal conditions are named values: <see cref="Fixed"/>, <see cref="Pinned"/>, <see cref="Free"/> and
/// <see cref="Guided"/>. Elastic ends come from <see cref="Rotational"/> (translation held), <see cref="Translational"/>
/// (rotation free), <see cref="Elastic"/> (both springs) and <see cref="GuidedOnSpring"/> (rotation held, translation
/// on a spring). A rigid restraint is never a large number: it is a named state, so that the limits are exact.</para>
/// <para>A spring of zero stiffness is allowed and is the same as no restraint. Thread safety: immutable reference type.</para>
/// </remarks>
[Immutable]
public sealed class EndSpring
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    private EndSpring(double rotationalNmPerRad, double translationalNPerM, string description)
    {
        RotationalNmPerRad = rotationalNmPerRad;
        TranslationalNPerM = translationalNPerM;
        Description = description;
    }

    /// <summary>Rotation and translation held.</summary>
    public static EndSpring Fixed { get; } = new(double.PositiveInfinity, double.PositiveInfinity, "fixed");

    /// <summary>Translation held, rotation free.</summary>
    public static EndSpring Pinned { get; } = new(0, double.PositiveInfinity, "pinned");

    /// <summary>Rotation and translation free.</summary>
    public static EndSpring Free { get; } = new(0, 0, "free");

    /// <summary>Rotation held, translation free (a sliding, or guided, end).</summary>
    public static EndSpring Guided { get; } = new(double.PositiveInfinity, 0, "guided");

    /// <summary>A rotational spring with translation held (a braced end on an elastic rotational restraint).</summary>
    /// <param name="stiffness">kθ, finite and not negative (zero is a pinned end).</param>
    /// <returns>The end restraint.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The stiffness is not finite or is negative.</exception>
    public static EndSpring Rotational(RotationalStiffness stiffness)
    {
        double k = Si.NewtonMetersPerRadian(stiffness, nameof(stiffness), "Rotational spring stiffness");
        return new EndSpring(k, double.PositiveInfinity, $"kθ = {Si.Given(stiffness)}, translation held");
    }

    /// <summary>A translational spring with rotation free (an end on an elastic lateral support).</summary>
    /// <param name="stiffness">kt, finite and not negative (zero is a free end).</param>
    /// <returns>The end restraint.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The stiffness is not finite or is negative.</exception>
    public static EndSpring Translational(ForcePerLength stiffness)
    {
        double k = Si.NewtonsPerMeter(stiffness, nameof(stiffness), "Translational spring stiffness");
        return new EndSpring(0, k, $"kt = {Si.Given(stiffness)}, rotation free");
    }

    /// <summary>Both a rotational and a translational spring.</summary>
    /// <param name="rotational">kθ, finite and not negative.</param>
    /// <param name="translational">kt, finite and not negative.</param>
    /// <returns>The end restraint.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A stiffness is not finite or is negative.</exception>
    public static EndSpring Elastic(RotationalStiffness rotational, ForcePerLength translational)
    {
        double kr = Si.NewtonMetersPerRadian(rotational, nameof(rotational), "Rotational spring stiffness");
        double kt = Si.NewtonsPerMeter(translational, nameof(translational), "Translational spring stiffness");
        return new EndSpring(kr, kt, $"kθ = {Si.Given(rotational)}, kt = {Si.Given(translational)}");
    }

    /// <summary>Rotation held, translation on a spring (a column top held by a stiff beam but free to sway against a bracing spring).</summary>
    /// <param name="translational">kt, finite and not negative (zero is a guided end).</param>
    /// <returns>The end restraint.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The stiffness is not finite or is negative.</exception>
    public static EndSpring GuidedOnSpring(ForcePerLength translational)
    {
        double kt = Si.NewtonsPerMeter(translational, nameof(translational), "Translational spring stiffness");
        return new EndSpring(double.PositiveInfinity, kt, $"rotation held, kt = {Si.Given(translational)}");
    }

    /// <summary>Rotational stiffness in N·m/rad; +∞ when rotation is held.</summary>
    internal double RotationalNmPerRad { get; }

    /// <summary>Translational stiffness in N/m; +∞ when translation is held.</summary>
    internal double TranslationalNPerM { get; }

    /// <summary>The rotational stiffness kθ (positive infinity when rotation is held, zero when free).</summary>
    public RotationalStiffness RotationalStiffness => RotationalStiffness.FromNewtonMetersPerRadian(RotationalNmPerRad);

    /// <summary>The translational stiffness kt (positive infinity when translation is held, zero when free).</summary>
    public ForcePerLength TranslationalStiffness => ForcePerLength.FromNewtonsPerMeter(TranslationalNPerM);

    /// <summary>Whether rotation is held rigidly.</summary>
    public bool HoldsRotation => double.IsPositiveInfinity(RotationalNmPerRad);

    /// <summary>Whether translation is held rigidly.</summary>
    public bool HoldsTranslation => double.IsPositiveInfinity(TranslationalNPerM);

    /// <summary>Whether the end is one of the four ideal conditions (each spring rigid or absent).</summary>
    public bool IsIdeal => (RotationalNmPerRad == 0 || HoldsRotation) && (TranslationalNPerM == 0 || HoldsTranslation);

    /// <summary>How the end is restrained, in words, for reports (for example "kθ = 5000 kN·m/rad, translation held").</summary>
    public string Description { get; }

    /// <summary>The ideal end condition this end is, or null when it has an elastic spring.</summary>
    internal EndCondition? AsEndCondition => !IsIdeal ? null
        : HoldsTranslation ? (HoldsRotation ? EndCondition.Fixed : EndCondition.Pinned)
        : (HoldsRotation ? EndCondition.Guided : EndCondition.Free);

    /// <summary>The end spring of an ideal end condition.</summary>
    /// <param name="condition">The condition.</param>
    /// <returns>The matching named value.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The value is undefined.</exception>
    public static EndSpring FromEndCondition(EndCondition condition) => condition switch
    {
        EndCondition.Fixed => Fixed,
        EndCondition.Pinned => Pinned,
        EndCondition.Free => Free,
        EndCondition.Guided => Guided,
        _ => throw new ArgumentOutOfRangeException(nameof(condition), condition, $"Unknown end condition {((int)condition).ToString(Inv)}."),
    };

    /// <inheritdoc/>
    public override string ToString() => Description;
}
