using System;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using UnitsNet;

namespace CompressionMembers.Tests.Sections;

public class PolygonSectionTests
{
    private static SectionPoint Pt(double y, double z) => SectionPoint.FromMillimeters(y, z);

    [Fact]
    public void Rectangle_AsPolygon_MatchesClosedForm()
    {
        var p = new PolygonSection([Pt(10, 20), Pt(100, 20), Pt(100, 160), Pt(10, 160)]);
        var r = new RectangleSection(Length.FromMillimeters(90), Length.FromMillimeters(140));
        Near.Relative(r.Area.SquareMillimeters, p.Area.SquareMillimeters, 1e-13, "b h");
        Near.Relative(r.SecondMomentY.MillimetersToTheFourth, p.SecondMomentY.MillimetersToTheFourth, 1e-12, "b h³/12");
        Near.Relative(r.SecondMomentZ.MillimetersToTheFourth, p.SecondMomentZ.MillimetersToTheFourth, 1e-12, "h b³/12");
        Near.Relative(r.SectionModulusY.CubicMillimeters, p.SectionModulusY.CubicMillimeters, 1e-12, "b h²/6");
    }

    [Fact]
    public void Triangle_MatchesRoarkTriangle()
    {
        // Roark Table A.1 (triangle): A = b h / 2, Ic = b h³/36 about the centroidal axis parallel to the base.
        var p = new PolygonSection([Pt(0, 0), Pt(120, 0), Pt(40, 90)]);
        Near.Relative(120 * 90 / 2.0, p.Area.SquareMillimeters, 1e-13, "Roark Table A.1, triangle");
        Near.Relative(120 * Math.Pow(90, 3) / 36, p.ReferenceSecondMomentY.MillimetersToTheFourth, 1e-12, "Roark Table A.1, triangle");
    }

    [Fact]
    public void HollowSquare_WithHole_MatchesBoxTube()
    {
        var p = new PolygonSection([Pt(0, 0), Pt(80, 0), Pt(80, 80), Pt(0, 80)], [[Pt(5, 5), Pt(5, 75), Pt(75, 75), Pt(75, 5)]]);
        var box = new RectangularHollowSection(Length.FromMillimeters(80), Length.FromMillimeters(80), Length.FromMillimeters(5));
        Near.Relative(box.Area.SquareMillimeters, p.Area.SquareMillimeters, 1e-12, "difference of squares");
        Near.Relative(box.SecondMomentY.MillimetersToTheFourth, p.SecondMomentY.MillimetersToTheFourth, 1e-12, "difference of squares");
    }

    [Fact]
    public void VertexOrder_ClockwiseOrCounterClockwise_GivesSameProperties()
    {
        var ccw = new PolygonSection([Pt(0, 0), Pt(60, 0), Pt(60, 6), Pt(6, 6), Pt(6, 40), Pt(0, 40)]);
        var cw = new PolygonSection([Pt(0, 40), Pt(6, 40), Pt(6, 6), Pt(60, 6), Pt(60, 0), Pt(0, 0)]);
        Near.Relative(ccw.Area.SquareMillimeters, cw.Area.SquareMillimeters, 1e-13, "orientation independence (Green's theorem)");
        Near.Relative(ccw.SecondMomentZ.MillimetersToTheFourth, cw.SecondMomentZ.MillimetersToTheFourth, 1e-12, "orientation independence");
        Near.Relative(ccw.PrincipalAxisAngle.Degrees, cw.PrincipalAxisAngle.Degrees, 1e-12, "orientation independence");
    }

    [Fact]
    public void RotatedRectangle_HasTheSamePrincipalMoments()
    {
        // A rectangle turned by 30°: the principal moments are invariants (Mohr's circle), the angle is 30° or −60°.
        double c = Math.Cos(Math.PI / 6), s = Math.Sin(Math.PI / 6);
        SectionPoint R(double y, double z) => Pt(y * c - z * s, y * s + z * c);
        var p = new PolygonSection([R(-20, -50), R(20, -50), R(20, 50), R(-20, 50)]);
        double imax = 40 * Math.Pow(100, 3) / 12, imin = 100 * Math.Pow(40, 3) / 12;
        Near.Relative(imax, p.SecondMomentY.MillimetersToTheFourth, 1e-11, "Mohr's circle invariants");
        Near.Relative(imin, p.SecondMomentZ.MillimetersToTheFourth, 1e-11, "Mohr's circle invariants");
    }

    [Fact]
    public void Create_SelfIntersectingOutline_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => new PolygonSection([Pt(0, 0), Pt(50, 50), Pt(50, 0), Pt(0, 50)]));
        Assert.Equal("outline", ex.ParamName);
        Assert.StartsWith("Outline crosses itself: edge 0 meets edge 2.", ex.Message);
    }

    [Fact]
    public void Create_HoleOutsideOutline_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => new PolygonSection([Pt(0, 0), Pt(50, 0), Pt(50, 50), Pt(0, 50)],
            [[Pt(40, 40), Pt(60, 40), Pt(60, 60)]]));
        Assert.Equal("holes", ex.ParamName);
        Assert.StartsWith("Hole 0 vertex 1 is not inside the outline.", ex.Message);
    }

    [Fact]
    public void Create_OverlappingHoles_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => new PolygonSection([Pt(0, 0), Pt(100, 0), Pt(100, 100), Pt(0, 100)],
            [[Pt(10, 10), Pt(50, 10), Pt(50, 50), Pt(10, 50)], [Pt(40, 40), Pt(80, 40), Pt(80, 80), Pt(40, 80)]]));
        Assert.StartsWith("Hole 1 overlaps hole 0.", ex.Message);
    }

    [Fact]
    public void Create_TooFewOrRepeatedVertices_Throws()
    {
        var few = Assert.Throws<ArgumentException>(() => new PolygonSection([Pt(0, 0), Pt(1, 0)]));
        Assert.StartsWith("Outline needs at least 3 vertices; got 2.", few.Message);
        var rep = Assert.Throws<ArgumentException>(() => new PolygonSection([Pt(0, 0), Pt(10, 0), Pt(10, 0), Pt(0, 10)]));
        Assert.StartsWith("Outline repeats vertex 1 at vertex 2", rep.Message);
    }

    [Fact]
    public void Create_CollinearOutline_ThrowsNoArea()
    {
        var ex = Assert.Throws<ArgumentException>(() => new PolygonSection([Pt(0, 0), Pt(10, 0), Pt(20, 0)]));
        Assert.Equal("outline", ex.ParamName);
    }

    [Fact]
    public void TorsionConstant_NotGiven_IsUnknownAndSaysSo()
    {
        var p = new PolygonSection([Pt(0, 0), Pt(10, 0), Pt(0, 10)]);
        Assert.False(p.HasTorsionConstant);
        var ex = Assert.Throws<InvalidOperationException>(() => p.TorsionConstant);
        Assert.Contains("give it explicitly", ex.Message);
    }
}
