using System;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Sections;

/// <summary>An equal or unequal angle (L) of vertical leg h, horizontal leg b and thickness t, sharp corners (root
/// and toe radii not modelled). The heel is at the reference origin, legs along +y and +z.</summary>
/// <remarks>
/// Area, centroid, second and product moments exact for the two legs; the principal axes follow (y the major axis
/// u–u, z the minor axis v–v; 45° for an equal angle). Thin-walled values: It = (b + h − t) t³/3, Iw ≈ 0, shear
/// centre at the intersection of the leg centre lines (t/2, t/2) (common practice for angles).
/// Thread safety: immutable reference type.
/// </remarks>
[Immutable]
public sealed class AngleSection : Section
{
    /// <summary>Creates an angle.</summary>
    /// <param name="verticalLeg">Length of the leg along z, h.</param>
    /// <param name="horizontalLeg">Length of the leg along y, b.</param>
    /// <param name="thickness">Leg thickness t, less than either leg.</param>
    /// <exception cref="ArgumentOutOfRangeException">A dimension is not finite or not positive.</exception>
    /// <exception cref="ArgumentException">The thickness is not less than both legs.</exception>
    public AngleSection(Length verticalLeg, Length horizontalLeg, Length thickness)
        : base(Compute(verticalLeg, horizontalLeg, thickness))
    {
        VerticalLeg = verticalLeg;
        HorizontalLeg = horizontalLeg;
        Thickness = thickness;
    }

    /// <summary>Creates an equal angle.</summary>
    /// <param name="leg">Length of each leg.</param>
    /// <param name="thickness">Leg thickness.</param>
    /// <returns>The angle.</returns>
    public static AngleSection Equal(Length leg, Length thickness) => new(leg, leg, thickness);

    /// <summary>Leg along z, h.</summary>
    public Length VerticalLeg { get; }
    /// <summary>Leg along y, b.</summary>
    public Length HorizontalLeg { get; }
    /// <summary>Leg thickness t.</summary>
    public Length Thickness { get; }

    /// <inheritdoc/>
    public override SectionKind Kind => SectionKind.Angle;

    /// <inheritdoc/>
    public override bool IsThinWalledOpen => true;

    /// <inheritdoc/>
    public override string Designation =>
        $"angle {Num(VerticalLeg)} × {Num(HorizontalLeg)} × {Num(Thickness)} {Unit(Thickness)}";

    private static SectionProperties Compute(Length verticalLeg, Length horizontalLeg, Length thickness)
    {
        double h = Dim(verticalLeg, nameof(verticalLeg), "Vertical leg"), b = Dim(horizontalLeg, nameof(horizontalLeg), "Horizontal leg");
        double t = Dim(thickness, nameof(thickness), "Thickness");
        if (t >= h || t >= b)
            throw new ArgumentException($"Thickness must be less than both legs ({Si.Given(verticalLeg)}, {Si.Given(horizontalLeg)}); got {Si.Given(thickness)}.", nameof(thickness));
        var s = new RectangleSum();
        s.Add(0, b, 0, t);
        s.Add(0, t, t, h);
        Span<double> ys = [0, b, b, t, t, 0];
        Span<double> zs = [0, 0, t, t, h, h];
        return SectionProperties.FromReference(s.Area, s.CentroidY, s.CentroidZ, s.Iy, s.Iz, s.Iyz, ys, zs, 0,
            (b + h - t) * t * t * t / 3, 0, t / 2, t / 2);
    }

    internal override void AddCanonical(CanonicalForm form) =>
        form.Add("section.kind", Kind.ToString()).Add("section.h", VerticalLeg.Meters).Add("section.b", HorizontalLeg.Meters).Add("section.t", Thickness.Meters);
}
