using System;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Sections;

/// <summary>A solid circle of diameter d: a round bar, a timber pole.</summary>
/// <remarks>A = π d²/4, I = π d⁴/64, It = π d⁴/32 (exact for a circle). Thread safety: immutable reference type.</remarks>
[Immutable]
public sealed class CircleSection : Section
{
    /// <summary>Creates a solid circle.</summary>
    /// <param name="diameter">Diameter d.</param>
    /// <exception cref="ArgumentOutOfRangeException">The diameter is not finite or not greater than 0.</exception>
    public CircleSection(Length diameter) : base(Compute(diameter)) => Diameter = diameter;

    /// <summary>Diameter d.</summary>
    public Length Diameter { get; }

    /// <inheritdoc/>
    public override SectionKind Kind => SectionKind.SolidCircle;

    /// <inheritdoc/>
    public override string Designation => $"round {Num(Diameter)} {Unit(Diameter)} diameter";

    private static SectionProperties Compute(Length diameter)
    {
        double d = Dim(diameter, nameof(diameter), "Diameter");
        double i = Math.PI * d * d * d * d / 64;
        return SectionProperties.FromReference(Math.PI * d * d / 4, 0, 0, i, i, 0, [], [], d / 2, 2 * i, 0, 0, 0);
    }

    internal override void AddCanonical(CanonicalForm form) =>
        form.Add("section.kind", Kind.ToString()).Add("section.d", Diameter.Meters);
}
