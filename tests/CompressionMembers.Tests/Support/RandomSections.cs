using CompressionMembers.Sections;
using CsCheck;
using UnitsNet;

namespace CompressionMembers.Tests.Support;

/// <summary>The sections the random-input consistency tests draw (dimensions in mm): timber rectangles and circles, and
/// aluminium tubes, solid bars and an open channel, which between them reach every path beside a method's straight line.</summary>
internal static class RandomSections
{
    /// <summary>A rectangle b × h, or a circle of diameter b.</summary>
    internal static Section Timber(double bMm, double hMm, bool circle) =>
        circle ? new CircleSection(Length.FromMillimeters(bMm)) : new RectangleSection(Length.FromMillimeters(bMm), Length.FromMillimeters(hMm));

    /// <summary>Kind 0: rectangular tube d × 1.3d × t; 1: circular tube d × t; 2: solid bar d/3 × d/2; otherwise a channel
    /// d × d/2 × t.</summary>
    internal static Section Aluminium(int kind, double dMm, double tMm) => kind switch
    {
        0 => new RectangularHollowSection(Length.FromMillimeters(dMm), Length.FromMillimeters(dMm * 1.3), Length.FromMillimeters(tMm)),
        1 => new CircularHollowSection(Length.FromMillimeters(dMm), Length.FromMillimeters(tMm)),
        2 => new RectangleSection(Length.FromMillimeters(dMm / 3), Length.FromMillimeters(dMm / 2)),
        _ => new ChannelSection(Length.FromMillimeters(dMm), Length.FromMillimeters(dMm / 2), Length.FromMillimeters(tMm), Length.FromMillimeters(tMm)),
    };

    /// <summary>Timber inputs: b, h and L in mm, a material index below <paramref name="materials"/>, an eccentricity draw
    /// in mm (the tests bend above 20), a fire exposure (0–2), a fire duration in minutes and whether the section is a
    /// circle.</summary>
    internal static Gen<(double, double, double, int, double, int, double, bool)> TimberCases(int materials) =>
        Gen.Select(Gen.Double[40, 300], Gen.Double[40, 400], Gen.Double[500, 9000], Gen.Int[0, materials - 1], Gen.Double[0, 40], Gen.Int[0, 2],
            Gen.Double[10, 150], Gen.Bool);
}
