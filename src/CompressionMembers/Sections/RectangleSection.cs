using System;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Sections;

/// <summary>A solid rectangle of width b (along y) and depth h (along z): sawn timber, glulam, a flat bar.</summary>
/// <remarks>
/// A = b h, Iy = b h³/12, Iz = h b³/12. St Venant torsion constant by the approximate formula for a rectangle
/// It = a t³ [1/3 − 0.21 (t/a)(1 − t⁴/(12 a⁴))], a the longer and t the shorter side (Roark's Formulas for Stress and
/// Strain, table of torsion constants). Warping neglected. Thread safety: immutable reference type.
/// </remarks>
[Immutable]
public sealed class RectangleSection : Section
{
    /// <summary>Creates a solid rectangle.</summary>
    /// <param name="width">Width b, along the y axis.</param>
    /// <param name="depth">Depth h, along the z axis.</param>
    /// <exception cref="ArgumentOutOfRangeException">A dimension is not finite or not greater than 0.</exception>
    public RectangleSection(Length width, Length depth) : base(Compute(width, depth))
    {
        Width = width;
        Depth = depth;
    }

    /// <summary>Width b, along y.</summary>
    public Length Width { get; }

    /// <summary>Depth h, along z.</summary>
    public Length Depth { get; }

    /// <inheritdoc/>
    public override SectionKind Kind => SectionKind.SolidRectangle;

    /// <inheritdoc/>
    public override string Designation => $"rectangle {Num(Width)} {Unit(Width)} wide × {Num(Depth)} {Unit(Depth)} deep";

    /// <summary>A copy with another width.</summary>
    /// <param name="width">The new width.</param>
    /// <returns>The new section.</returns>
    public RectangleSection WithWidth(Length width) => new(width, Depth);

    /// <summary>A copy with another depth.</summary>
    /// <param name="depth">The new depth.</param>
    /// <returns>The new section.</returns>
    public RectangleSection WithDepth(Length depth) => new(Width, depth);

    internal static double TorsionConstantOf(double b, double h)
    {
        double a = Math.Max(b, h), t = Math.Min(b, h), r = t / a;
        return a * t * t * t * (1.0 / 3 - 0.21 * r * (1 - r * r * r * r / 12));
    }

    private static SectionProperties Compute(Length width, Length depth)
    {
        double b = Dim(width, nameof(width), "Width"), h = Dim(depth, nameof(depth), "Depth");
        Span<double> ys = [-b / 2, b / 2, b / 2, -b / 2];
        Span<double> zs = [-h / 2, -h / 2, h / 2, h / 2];
        return SectionProperties.FromReference(b * h, 0, 0, b * h * h * h / 12, h * b * b * b / 12, 0, ys, zs, 0,
            TorsionConstantOf(b, h), 0, 0, 0);
    }

    internal override void AddCanonical(CanonicalForm form) =>
        form.Add("section.kind", Kind.ToString()).Add("section.b", Width.Meters).Add("section.h", Depth.Meters);
}
