using System;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Sections;

/// <summary>A circular hollow section (round tube) of outside diameter D and wall thickness t.</summary>
/// <remarks>A = π (D² − d²)/4, I = π (D⁴ − d⁴)/64 with d = D − 2t, It = 2I (exact for a circular ring).
/// Thread safety: immutable reference type.</remarks>
[Immutable]
public sealed class CircularHollowSection : Section
{
    /// <summary>Creates a round tube.</summary>
    /// <param name="outsideDiameter">Outside diameter D.</param>
    /// <param name="wallThickness">Wall thickness t, less than D/2.</param>
    /// <exception cref="ArgumentOutOfRangeException">A dimension is not finite or not positive.</exception>
    /// <exception cref="ArgumentException">The wall is as thick as half the diameter or thicker.</exception>
    public CircularHollowSection(Length outsideDiameter, Length wallThickness) : base(Compute(outsideDiameter, wallThickness))
    {
        OutsideDiameter = outsideDiameter;
        WallThickness = wallThickness;
    }

    /// <summary>Outside diameter D.</summary>
    public Length OutsideDiameter { get; }

    /// <summary>Wall thickness t.</summary>
    public Length WallThickness { get; }

    /// <inheritdoc/>
    public override SectionKind Kind => SectionKind.CircularHollow;

    /// <inheritdoc/>
    public override string Designation =>
        $"round tube {Num(OutsideDiameter)} {Unit(OutsideDiameter)} × {Num(WallThickness)} {Unit(WallThickness)} wall";

    private static SectionProperties Compute(Length outsideDiameter, Length wallThickness)
    {
        double d = Dim(outsideDiameter, nameof(outsideDiameter), "Outside diameter");
        double t = Dim(wallThickness, nameof(wallThickness), "Wall thickness");
        if (2 * t >= d)
            throw new ArgumentException(
                $"Wall thickness must be less than half the outside diameter ({Si.Given(outsideDiameter / 2)}); got {Si.Given(wallThickness)}. A solid bar is a CircleSection.",
                nameof(wallThickness));
        double di = d - 2 * t;
        double i = Math.PI * (d * d * d * d - di * di * di * di) / 64;
        return SectionProperties.FromReference(Math.PI * (d * d - di * di) / 4, 0, 0, i, i, 0, [], [], d / 2, 2 * i, 0, 0, 0);
    }

    internal override void AddCanonical(CanonicalForm form) =>
        form.Add("section.kind", Kind.ToString()).Add("section.D", OutsideDiameter.Meters).Add("section.t", WallThickness.Meters);
}
