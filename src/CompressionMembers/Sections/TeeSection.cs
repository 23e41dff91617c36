using System;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Sections;

/// <summary>A tee of overall depth h, flange width b, flange thickness tf and stem thickness tw, flange at the top,
/// sharp corners. z is the axis of symmetry.</summary>
/// <remarks>
/// Area and second moments exact for the two plates. Thin-walled values: It = [b tf³ + (h − tf/2) tw³]/3, Iw ≈ 0,
/// shear centre at the intersection of the flange and stem centre lines (common practice for tees).
/// Thread safety: immutable reference type.
/// </remarks>
[Immutable]
public sealed class TeeSection : Section
{
    /// <summary>Creates a tee.</summary>
    /// <param name="depth">Overall depth h, flange included.</param>
    /// <param name="flangeWidth">Flange width b.</param>
    /// <param name="flangeThickness">Flange thickness tf, less than h.</param>
    /// <param name="stemThickness">Stem thickness tw, less than b.</param>
    /// <exception cref="ArgumentOutOfRangeException">A dimension is not finite or not positive.</exception>
    /// <exception cref="ArgumentException">The plates do not fit together.</exception>
    public TeeSection(Length depth, Length flangeWidth, Length flangeThickness, Length stemThickness)
        : base(Compute(depth, flangeWidth, flangeThickness, stemThickness))
    {
        Depth = depth;
        FlangeWidth = flangeWidth;
        FlangeThickness = flangeThickness;
        StemThickness = stemThickness;
    }

    /// <summary>Overall depth h.</summary>
    public Length Depth { get; }
    /// <summary>Flange width b.</summary>
    public Length FlangeWidth { get; }
    /// <summary>Flange thickness tf.</summary>
    public Length FlangeThickness { get; }
    /// <summary>Stem thickness tw.</summary>
    public Length StemThickness { get; }

    /// <inheritdoc/>
    public override SectionKind Kind => SectionKind.Tee;

    /// <inheritdoc/>
    public override bool IsThinWalledOpen => true;

    /// <inheritdoc/>
    public override string Designation =>
        $"tee {Num(Depth)} × {Num(FlangeWidth)} × {Num(FlangeThickness)}/{Num(StemThickness)} {Unit(Depth)}";

    private static SectionProperties Compute(Length depth, Length flangeWidth, Length flangeThickness, Length stemThickness)
    {
        double h = Dim(depth, nameof(depth), "Depth"), b = Dim(flangeWidth, nameof(flangeWidth), "Flange width");
        double tf = Dim(flangeThickness, nameof(flangeThickness), "Flange thickness");
        double tw = Dim(stemThickness, nameof(stemThickness), "Stem thickness");
        if (tf >= h)
            throw new ArgumentException($"Flange thickness must be less than the depth ({Si.Given(depth)}); got {Si.Given(flangeThickness)}.", nameof(flangeThickness));
        if (tw >= b)
            throw new ArgumentException($"Stem thickness must be less than the flange width ({Si.Given(flangeWidth)}); got {Si.Given(stemThickness)}.", nameof(stemThickness));
        var s = new RectangleSum();
        s.Add(-b / 2, b / 2, h - tf, h);
        s.Add(-tw / 2, tw / 2, 0, h - tf);
        Span<double> ys = [-b / 2, b / 2, b / 2, -b / 2, -tw / 2, tw / 2];
        Span<double> zs = [h, h, h - tf, h - tf, 0, 0];
        return SectionProperties.FromReference(s.Area, 0, s.CentroidZ, s.Iy, s.Iz, 0, ys, zs, 0,
            (b * tf * tf * tf + (h - tf / 2) * tw * tw * tw) / 3, 0, 0, h - tf / 2);
    }

    internal override void AddCanonical(CanonicalForm form) =>
        form.Add("section.kind", Kind.ToString()).Add("section.h", Depth.Meters).Add("section.b", FlangeWidth.Meters)
            .Add("section.tf", FlangeThickness.Meters).Add("section.tw", StemThickness.Meters);
}
