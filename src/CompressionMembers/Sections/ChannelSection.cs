using System;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Sections;

/// <summary>A channel (C or U) of depth h, flange width b, flange thickness tf and web thickness tw, sharp corners,
/// web on the −y side and flanges pointing to +y.</summary>
/// <remarks>
/// Area and second moments exact for the three plates. Torsion, warping and shear centre by the thin-walled
/// centre-line formulas with h′ = h − tf and b′ = b − tw/2: It = (2 b′ tf³ + h′ tw³)/3; shear centre at
/// e = 3 b′² tf / (6 b′ tf + h′ tw) behind the web centre line; Iw = tf b′³ h′² (3 b′ tf + 2 h′ tw) / [12 (6 b′ tf + h′ tw)]
/// (Timoshenko &amp; Gere, Theory of Elastic Stability; common practice). y is the axis of symmetry.
/// Thread safety: immutable reference type.
/// </remarks>
[Immutable]
public sealed class ChannelSection : Section
{
    /// <summary>Creates a channel.</summary>
    /// <param name="depth">Overall depth h.</param>
    /// <param name="flangeWidth">Overall flange width b (including the web).</param>
    /// <param name="flangeThickness">Flange thickness tf, less than h/2.</param>
    /// <param name="webThickness">Web thickness tw, less than b.</param>
    /// <exception cref="ArgumentOutOfRangeException">A dimension is not finite or not positive.</exception>
    /// <exception cref="ArgumentException">The plates do not fit together.</exception>
    public ChannelSection(Length depth, Length flangeWidth, Length flangeThickness, Length webThickness)
        : base(Compute(depth, flangeWidth, flangeThickness, webThickness))
    {
        Depth = depth;
        FlangeWidth = flangeWidth;
        FlangeThickness = flangeThickness;
        WebThickness = webThickness;
    }

    /// <summary>Overall depth h.</summary>
    public Length Depth { get; }
    /// <summary>Overall flange width b.</summary>
    public Length FlangeWidth { get; }
    /// <summary>Flange thickness tf.</summary>
    public Length FlangeThickness { get; }
    /// <summary>Web thickness tw.</summary>
    public Length WebThickness { get; }

    /// <inheritdoc/>
    public override SectionKind Kind => SectionKind.Channel;

    /// <inheritdoc/>
    public override bool IsThinWalledOpen => true;

    /// <inheritdoc/>
    public override string Designation =>
        $"channel {Num(Depth)} × {Num(FlangeWidth)} × {Num(FlangeThickness)}/{Num(WebThickness)} {Unit(Depth)}";

    private static SectionProperties Compute(Length depth, Length flangeWidth, Length flangeThickness, Length webThickness)
    {
        double h = Dim(depth, nameof(depth), "Depth"), b = Dim(flangeWidth, nameof(flangeWidth), "Flange width");
        double tf = Dim(flangeThickness, nameof(flangeThickness), "Flange thickness");
        double tw = Dim(webThickness, nameof(webThickness), "Web thickness");
        if (2 * tf >= h)
            throw new ArgumentException($"Flange thickness must be less than half the depth ({Si.Given(depth / 2)}); got {Si.Given(flangeThickness)}.", nameof(flangeThickness));
        if (tw >= b)
            throw new ArgumentException($"Web thickness must be less than the flange width ({Si.Given(flangeWidth)}); got {Si.Given(webThickness)}.", nameof(webThickness));
        var s = new RectangleSum();
        s.Add(0, b, h / 2 - tf, h / 2);
        s.Add(0, b, -h / 2, -h / 2 + tf);
        s.Add(0, tw, -h / 2 + tf, h / 2 - tf);
        double hp = h - tf, bp = b - tw / 2;
        double it = (2 * bp * tf * tf * tf + hp * tw * tw * tw) / 3;
        double e = 3 * bp * bp * tf / (6 * bp * tf + hp * tw);
        double iw = tf * bp * bp * bp * hp * hp * (3 * bp * tf + 2 * hp * tw) / (12 * (6 * bp * tf + hp * tw));
        Span<double> ys = [0, b, b, 0];
        Span<double> zs = [-h / 2, -h / 2, h / 2, h / 2];
        return SectionProperties.FromReference(s.Area, s.CentroidY, 0, s.Iy, s.Iz, 0, ys, zs, 0, it, iw, tw / 2 - e, 0);
    }

    internal override void AddCanonical(CanonicalForm form) =>
        form.Add("section.kind", Kind.ToString()).Add("section.h", Depth.Meters).Add("section.b", FlangeWidth.Meters)
            .Add("section.tf", FlangeThickness.Meters).Add("section.tw", WebThickness.Meters);
}
