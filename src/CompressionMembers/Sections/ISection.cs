using System;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Sections;

/// <summary>A doubly symmetric I or H section: depth h, flange width b, flange thickness tf, web thickness tw and
/// an optional root fillet radius r.</summary>
/// <remarks>
/// Area and second moments are exact for the plates plus the four root fillets (spandrel formulas). Torsion and
/// warping by the thin-walled formulas for a doubly symmetric I: It = [2 b tf³ + (h − 2 tf) tw³]/3 (fillets
/// neglected, a slight underestimate) and Iw = tf b³ (h − tf)²/24. The shear centre is at the centroid.
/// y is the major axis (parallel to the flanges). Thread safety: immutable reference type.
/// </remarks>
[Immutable]
public sealed class ISection : Section
{
    /// <summary>Creates a doubly symmetric I or H section.</summary>
    /// <param name="depth">Overall depth h.</param>
    /// <param name="flangeWidth">Flange width b.</param>
    /// <param name="flangeThickness">Flange thickness tf, less than h/2.</param>
    /// <param name="webThickness">Web thickness tw, less than b.</param>
    /// <param name="rootRadius">Root fillet radius r (zero for none); the fillet must fit between web and flange tip and within the web depth.</param>
    /// <exception cref="ArgumentOutOfRangeException">A dimension is not finite or not positive (the root radius may be zero).</exception>
    /// <exception cref="ArgumentException">The plates do not fit together or the fillet is larger than the space for it.</exception>
    public ISection(Length depth, Length flangeWidth, Length flangeThickness, Length webThickness, Length rootRadius = default)
        : base(Compute(depth, flangeWidth, flangeThickness, webThickness, rootRadius))
    {
        Depth = depth;
        FlangeWidth = flangeWidth;
        FlangeThickness = flangeThickness;
        WebThickness = webThickness;
        RootRadius = rootRadius;
    }

    /// <summary>Overall depth h.</summary>
    public Length Depth { get; }
    /// <summary>Flange width b.</summary>
    public Length FlangeWidth { get; }
    /// <summary>Flange thickness tf.</summary>
    public Length FlangeThickness { get; }
    /// <summary>Web thickness tw.</summary>
    public Length WebThickness { get; }
    /// <summary>Root fillet radius r.</summary>
    public Length RootRadius { get; }

    /// <inheritdoc/>
    public override SectionKind Kind => SectionKind.DoublySymmetricI;

    /// <inheritdoc/>
    public override bool IsThinWalledOpen => true;

    /// <inheritdoc/>
    public override string Designation =>
        $"I {Num(Depth)} × {Num(FlangeWidth)} × {Num(FlangeThickness)}/{Num(WebThickness)}" +
        (RootRadius.Meters > 0 ? $" r{Num(RootRadius)}" : "") + $" {Unit(Depth)}";

    private static SectionProperties Compute(Length depth, Length flangeWidth, Length flangeThickness, Length webThickness, Length rootRadius)
    {
        double h = Dim(depth, nameof(depth), "Depth"), b = Dim(flangeWidth, nameof(flangeWidth), "Flange width");
        double tf = Dim(flangeThickness, nameof(flangeThickness), "Flange thickness");
        double tw = Dim(webThickness, nameof(webThickness), "Web thickness");
        double r = Si.Meters(rootRadius, nameof(rootRadius), "Root radius", Si.Sign.NonNegative);
        if (2 * tf >= h)
            throw new ArgumentException($"Flange thickness must be less than half the depth ({Si.Given(depth / 2)}); got {Si.Given(flangeThickness)}.", nameof(flangeThickness));
        if (tw >= b)
            throw new ArgumentException($"Web thickness must be less than the flange width ({Si.Given(flangeWidth)}); got {Si.Given(webThickness)}.", nameof(webThickness));
        if (r > (b - tw) / 2 || 2 * r > h - 2 * tf)
            throw new ArgumentException(
                $"Root radius {Si.Given(rootRadius)} is larger than the flange outstand (b − tw)/2 = {Guard.Show((b - tw) / 2 * 1e3)} mm or half the clear web depth (h − 2tf)/2 = {Guard.Show((h - 2 * tf) / 2 * 1e3)} mm.",
                nameof(rootRadius));
        var s = new RectangleSum();
        s.Add(-b / 2, b / 2, h / 2 - tf, h / 2);
        s.Add(-b / 2, b / 2, -h / 2, -h / 2 + tf);
        s.Add(-tw / 2, tw / 2, -h / 2 + tf, h / 2 - tf);
        double zf = h / 2 - tf;
        s.AddFillet(tw / 2, zf, +1, -1, r);
        s.AddFillet(-tw / 2, zf, -1, -1, r);
        s.AddFillet(tw / 2, -zf, +1, +1, r);
        s.AddFillet(-tw / 2, -zf, -1, +1, r);
        double it = (2 * b * tf * tf * tf + (h - 2 * tf) * tw * tw * tw) / 3;
        double iw = tf * b * b * b * (h - tf) * (h - tf) / 24;
        Span<double> ys = [-b / 2, b / 2, b / 2, -b / 2];
        Span<double> zs = [-h / 2, -h / 2, h / 2, h / 2];
        return SectionProperties.FromReference(s.Area, 0, 0, s.Iy, s.Iz, 0, ys, zs, 0, it, iw, 0, 0);
    }

    internal override void AddCanonical(CanonicalForm form) =>
        form.Add("section.kind", Kind.ToString()).Add("section.h", Depth.Meters).Add("section.b", FlangeWidth.Meters)
            .Add("section.tf", FlangeThickness.Meters).Add("section.tw", WebThickness.Meters).Add("section.r", RootRadius.Meters);
}
