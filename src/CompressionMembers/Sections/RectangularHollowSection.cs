using System;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Sections;

/// <summary>A rectangular hollow section (box tube) of width b, depth h and uniform wall t, with sharp corners.</summary>
/// <remarks>
/// A = b h − (b − 2t)(h − 2t); Iy = [b h³ − (b − 2t)(h − 2t)³]/12. Torsion by Bredt's thin-walled closed-section
/// formula It = 4 Am² t / p with Am = (b − t)(h − t), p = 2[(b − t) + (h − t)]. Corner radii are not modelled.
/// Thread safety: immutable reference type.
/// </remarks>
[Immutable]
public sealed class RectangularHollowSection : Section
{
    /// <summary>Creates a box tube.</summary>
    /// <param name="width">Overall width b, along y.</param>
    /// <param name="depth">Overall depth h, along z.</param>
    /// <param name="wallThickness">Wall thickness t, less than half the smaller of b and h.</param>
    /// <exception cref="ArgumentOutOfRangeException">A dimension is not finite or not positive.</exception>
    /// <exception cref="ArgumentException">The wall is as thick as half the width or depth, or thicker.</exception>
    public RectangularHollowSection(Length width, Length depth, Length wallThickness) : base(Compute(width, depth, wallThickness))
    {
        Width = width;
        Depth = depth;
        WallThickness = wallThickness;
    }

    /// <summary>Overall width b.</summary>
    public Length Width { get; }

    /// <summary>Overall depth h.</summary>
    public Length Depth { get; }

    /// <summary>Wall thickness t.</summary>
    public Length WallThickness { get; }

    /// <inheritdoc/>
    public override SectionKind Kind => SectionKind.RectangularHollow;

    /// <inheritdoc/>
    public override string Designation =>
        $"box tube {Num(Width)} × {Num(Depth)} {Unit(Depth)} × {Num(WallThickness)} {Unit(WallThickness)} wall";

    private static SectionProperties Compute(Length width, Length depth, Length wallThickness)
    {
        double b = Dim(width, nameof(width), "Width"), h = Dim(depth, nameof(depth), "Depth");
        double t = Dim(wallThickness, nameof(wallThickness), "Wall thickness");
        if (2 * t >= Math.Min(b, h))
            throw new ArgumentException(
                $"Wall thickness must be less than half the smaller of width and depth ({Guard.Show(Math.Min(b, h) / 2 * 1e3)} mm); got {Si.Given(wallThickness)}.",
                nameof(wallThickness));
        var sum = new RectangleSum();
        sum.Add(-b / 2, b / 2, -h / 2, h / 2);
        sum.Add(-b / 2 + t, b / 2 - t, -h / 2 + t, h / 2 - t, -1);
        double am = (b - t) * (h - t), p = 2 * ((b - t) + (h - t));
        Span<double> ys = [-b / 2, b / 2, b / 2, -b / 2];
        Span<double> zs = [-h / 2, -h / 2, h / 2, h / 2];
        return SectionProperties.FromReference(sum.Area, 0, 0, sum.Iy, sum.Iz, 0, ys, zs, 0, 4 * am * am * t / p, 0, 0, 0);
    }

    internal override void AddCanonical(CanonicalForm form) =>
        form.Add("section.kind", Kind.ToString()).Add("section.b", Width.Meters).Add("section.h", Depth.Meters).Add("section.t", WallThickness.Meters);
}
