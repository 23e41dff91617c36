using System;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using UnitsNet;

namespace CompressionMembers.Tests.Sections;

/// <summary>Section properties against the closed forms of the handbooks. Roark's Formulas for Stress and Strain
/// (7th ed., Table A.1, properties of sections) gives A and I for rectangles, circles, rings and composite shapes;
/// values below are hand-evaluated from those formulas.</summary>
public class ClosedFormSectionTests
{
    private static Length Mm(double v) => Length.FromMillimeters(v);

    [Fact]
    public void Rectangle_AreaAndSecondMoments_MatchRoarkTableA1()
    {
        // Roark Table A.1 case 1: A = b d, Ix = b d³/12. b = 90, h = 140 mm.
        var s = new RectangleSection(Mm(90), Mm(140));
        Near.Relative(12600, s.Area.SquareMillimeters, 1e-12, "Roark Table A.1 case 1: A = b h");
        Near.Relative(90 * Math.Pow(140, 3) / 12, s.SecondMomentY.MillimetersToTheFourth, 1e-12, "Roark Table A.1 case 1: I = b h³/12");
        Near.Relative(140 * Math.Pow(90, 3) / 12, s.SecondMomentZ.MillimetersToTheFourth, 1e-12, "Roark Table A.1 case 1: I = h b³/12");
        Near.Relative(90 * 140.0 * 140 / 6, s.SectionModulusY.CubicMillimeters, 1e-12, "W = b h²/6 (Roark Table A.1 case 1)");
        Near.Relative(140 / Math.Sqrt(12), s.RadiusOfGyrationY.Millimeters, 1e-12, "r = h/√12 (Roark Table A.1 case 1)");
        Assert.Equal(0, s.PrincipalAxisAngle.Degrees);
    }

    [Theory]
    // Torsion constant factor β = It / (b t³) for a rectangle b × t, exact series solution tabulated by
    // Timoshenko & Goodier, Theory of Elasticity, §109 (values from memory: 0.141, 0.196, 0.229, 0.263, 0.291, 0.312).
    [InlineData(1.0, 0.141, 0.003)]
    [InlineData(1.5, 0.196, 0.005)]
    [InlineData(2.0, 0.229, 0.005)]
    [InlineData(3.0, 0.263, 0.005)]
    [InlineData(5.0, 0.291, 0.005)]
    [InlineData(10.0, 0.312, 0.003)]
    public void Rectangle_TorsionConstant_MatchesExactSeriesWithinHalfPercent(double ratio, double beta, double tol)
    {
        var s = new RectangleSection(Mm(10 * ratio), Mm(10));
        double it = s.TorsionConstant.MillimetersToTheFourth;
        Near.Relative(beta * (10 * ratio) * 1000, it, tol, "Timoshenko & Goodier §109 table of β (from memory)");
    }

    [Fact]
    public void Circle_Properties_MatchRoark()
    {
        // Roark Table A.1 case 15 (solid circle): A = π R², I = π R⁴/4; polar J = π R⁴/2 (exact for torsion of a circle).
        var s = new CircleSection(Mm(60));
        Near.Relative(Math.PI * 900, s.Area.SquareMillimeters, 1e-12, "Roark Table A.1, solid circle");
        Near.Relative(Math.PI * Math.Pow(30, 4) / 4, s.SecondMomentY.MillimetersToTheFourth, 1e-12, "Roark Table A.1, solid circle");
        Near.Relative(Math.PI * Math.Pow(30, 4) / 2, s.TorsionConstant.MillimetersToTheFourth, 1e-12, "polar moment of a circle (exact)");
        Near.Relative(15, s.RadiusOfGyrationZ.Millimeters, 1e-12, "r = D/4 for a solid circle");
    }

    [Fact]
    public void CircularHollow_Properties_MatchRoarkRing()
    {
        // Roark Table A.1 (hollow circle): A = π (R² − Ri²), I = π (R⁴ − Ri⁴)/4. D = 114.3, t = 6.3 mm.
        var s = new CircularHollowSection(Mm(114.3), Mm(6.3));
        double r = 57.15, ri = 57.15 - 6.3;
        Near.Relative(Math.PI * (r * r - ri * ri), s.Area.SquareMillimeters, 1e-12, "Roark Table A.1, hollow circle");
        Near.Relative(Math.PI * (Math.Pow(r, 4) - Math.Pow(ri, 4)) / 4, s.SecondMomentY.MillimetersToTheFourth, 1e-12, "Roark Table A.1, hollow circle");
        Near.Relative(2 * s.SecondMomentY.MillimetersToTheFourth, s.TorsionConstant.MillimetersToTheFourth, 1e-12, "J = 2I for a ring (exact)");
    }

    [Fact]
    public void RectangularHollow_Properties_MatchHandCalculation()
    {
        // Difference of rectangles (Roark Table A.1 case 2, hollow rectangle) and Bredt's formula It = 4 Am² t / p
        // (Roark Table 10.7, thin-walled closed section). 100 × 50 × 4 mm, sharp corners.
        var s = new RectangularHollowSection(Mm(100), Mm(50), Mm(4));
        Near.Relative(100 * 50 - 92 * 42, s.Area.SquareMillimeters, 1e-12, "Roark Table A.1, hollow rectangle");
        Near.Relative((100 * Math.Pow(50, 3) - 92 * Math.Pow(42, 3)) / 12, s.SecondMomentY.MillimetersToTheFourth, 1e-12, "Roark Table A.1, hollow rectangle");
        Near.Relative((50 * Math.Pow(100, 3) - 42 * Math.Pow(92, 3)) / 12, s.SecondMomentZ.MillimetersToTheFourth, 1e-12, "Roark Table A.1, hollow rectangle");
        double am = 96 * 46, p = 2 * (96 + 46);
        Near.Relative(4 * am * am * 4 / p, s.TorsionConstant.MillimetersToTheFourth, 1e-12, "Bredt, Roark Table 10.7");
    }

    [Fact]
    public void ISection_WithoutFillets_MatchesPlateSums()
    {
        // Hand calculation by plates (parallel-axis theorem): h = 300, b = 150, tf = 10.7, tw = 7.1 mm.
        var s = new ISection(Mm(300), Mm(150), Mm(10.7), Mm(7.1));
        double hw = 300 - 2 * 10.7;
        Near.Relative(2 * 150 * 10.7 + hw * 7.1, s.Area.SquareMillimeters, 1e-12, "plate sum");
        Near.Relative((150 * Math.Pow(300, 3) - (150 - 7.1) * Math.Pow(hw, 3)) / 12, s.SecondMomentY.MillimetersToTheFourth, 1e-12, "Roark Table A.1, I-section");
        Near.Relative((2 * 10.7 * Math.Pow(150, 3) + hw * Math.Pow(7.1, 3)) / 12, s.SecondMomentZ.MillimetersToTheFourth, 1e-12, "plate sum");
        // Thin-walled torsion and warping of a doubly symmetric I (Timoshenko & Gere §5.2; common practice):
        Near.Relative((2 * 150 * Math.Pow(10.7, 3) + hw * Math.Pow(7.1, 3)) / 3, s.TorsionConstant.MillimetersToTheFourth, 1e-12, "It = Σ b t³/3");
        Near.Relative(10.7 * Math.Pow(150, 3) * Math.Pow(300 - 10.7, 2) / 24, s.WarpingConstantMm6, 1e-12, "Iw = tf b³ (h − tf)²/24");
        Assert.Equal(0, s.ShearCentreOffsetY.Millimeters);
    }

    [Fact]
    public void ISection_RootFillets_MatchPolygonWithFineArcs()
    {
        // Independent model: the same section as a polygon whose fillets are 400-segment arcs (Green's theorem).
        double h = 300, b = 150, tf = 10.7, tw = 7.1, r = 15;
        var s = new ISection(Mm(h), Mm(b), Mm(tf), Mm(tw), Mm(r));
        var p = PolygonShapes.IWithFillets(h, b, tf, tw, r, 400);
        Near.Relative(p.Area.SquareMillimeters, s.Area.SquareMillimeters, 1e-5, "polygon with fine fillet arcs");
        Near.Relative(p.SecondMomentY.MillimetersToTheFourth, s.SecondMomentY.MillimetersToTheFourth, 1e-5, "polygon with fine fillet arcs");
        Near.Relative(p.SecondMomentZ.MillimetersToTheFourth, s.SecondMomentZ.MillimetersToTheFourth, 1e-5, "polygon with fine fillet arcs");
        // The fillets add (4 − π) r² of area (four spandrels of (1 − π/4) r²; common practice).
        Near.Relative(2 * b * tf + (h - 2 * tf) * tw + (4 - Math.PI) * r * r, s.Area.SquareMillimeters, 1e-12, "four spandrels (4 − π) r²");
    }

    [Fact]
    public void Channel_ShearCentreAndWarping_MatchThinWalledFormulas()
    {
        // Thin-walled channel (Timoshenko & Gere §5.3; Roark Table 10.7 (channel)): e = 3 b′² tf / (6 b′ tf + h′ tw)
        // from the web centre line, h′ = h − tf, b′ = b − tw/2.
        double h = 200, b = 75, tf = 11.5, tw = 8.5;
        var s = new ChannelSection(Mm(h), Mm(b), Mm(tf), Mm(tw));
        double hp = h - tf, bp = b - tw / 2, e = 3 * bp * bp * tf / (6 * bp * tf + hp * tw);
        double yc = (2 * b * tf * b / 2 + (h - 2 * tf) * tw * tw / 2) / (2 * b * tf + (h - 2 * tf) * tw);
        Near.Relative(tw / 2 - e - yc, s.ShearCentreOffsetY.Millimeters, 1e-12, "thin-walled channel shear centre");
        Near.Relative(tf * Math.Pow(bp, 3) * hp * hp / 12 * (3 * bp * tf + 2 * hp * tw) / (6 * bp * tf + hp * tw), s.WarpingConstantMm6, 1e-12,
            "thin-walled channel warping constant (Timoshenko & Gere §5.3)");
        var poly = new PolygonSection([Pt(0, -h / 2), Pt(b, -h / 2), Pt(b, -h / 2 + tf), Pt(tw, -h / 2 + tf), Pt(tw, h / 2 - tf), Pt(b, h / 2 - tf), Pt(b, h / 2), Pt(0, h / 2)]);
        Near.Relative(poly.SecondMomentY.MillimetersToTheFourth, s.SecondMomentY.MillimetersToTheFourth, 1e-12, "Green's theorem polygon");
        Near.Relative(poly.SecondMomentZ.MillimetersToTheFourth, s.SecondMomentZ.MillimetersToTheFourth, 1e-12, "Green's theorem polygon");
    }

    [Fact]
    public void EqualAngle_PrincipalAxes_AreAt45DegreesWithHandValues()
    {
        // Equal angle 60 × 60 × 6 mm, sharp corners. Hand calculation (parallel-axis theorem, common practice):
        // A = 60·6 + 54·6 = 684; centroid c = (60·6·30 + 54·6·3)/684 = 17.211 mm from the heel on each axis;
        // principal moments Iu,v = I ± |Iyz| about the 45° axes.
        var s = AngleSection.Equal(Mm(60), Mm(6));
        double a1 = 360, a2 = 324, c = (a1 * 30 + a2 * 3) / 684;
        double i = 6 * Math.Pow(60, 3) / 12 + a1 * Math.Pow(30 - c, 2) + 54 * Math.Pow(6, 3) / 12 + a2 * Math.Pow(3 - c, 2);
        double iyz = a1 * (30 - c) * (3 - c) + a2 * (3 - c) * (6 + 27 - c);
        Near.Relative(684, s.Area.SquareMillimeters, 1e-12, "hand calculation");
        Near.Relative(i, s.ReferenceSecondMomentY.MillimetersToTheFourth, 1e-12, "hand calculation");
        Near.Relative(iyz, s.ReferenceProductMoment.MillimetersToTheFourth, 1e-12, "hand calculation");
        Near.Relative(i + Math.Abs(iyz), s.SecondMomentY.MillimetersToTheFourth, 1e-12, "major principal Iu = I + |Iyz| (Mohr's circle)");
        Near.Relative(i - Math.Abs(iyz), s.SecondMomentZ.MillimetersToTheFourth, 1e-12, "minor principal Iv = I − |Iyz| (Mohr's circle)");
        Near.Absolute(45, Math.Abs(s.PrincipalAxisAngle.Degrees), 1e-9, "principal axes of an equal angle at 45° (symmetry)");
        // Shear centre at the heel's centre-line intersection (common practice for angles): distance from centroid along v.
        double d = Math.Sqrt(2) * (c - 3);
        Near.Relative(d, Math.Sqrt(Math.Pow(s.ShearCentreOffsetY.Millimeters, 2) + Math.Pow(s.ShearCentreOffsetZ.Millimeters, 2)), 1e-12, "geometry");
        // The axis of symmetry of an equal angle is its major principal axis y′ (u–u); the shear centre lies on it.
        Near.Absolute(0, s.ShearCentreOffsetZ.Millimeters, 1e-9, "symmetry of the equal angle");
    }

    [Fact]
    public void UnequalAngle_MatchesPolygon()
    {
        var s = new AngleSection(Mm(100), Mm(65), Mm(8));
        var p = new PolygonSection([Pt(0, 0), Pt(65, 0), Pt(65, 8), Pt(8, 8), Pt(8, 100), Pt(0, 100)]);
        Near.Relative(p.SecondMomentY.MillimetersToTheFourth, s.SecondMomentY.MillimetersToTheFourth, 1e-12, "Green's theorem polygon");
        Near.Relative(p.SecondMomentZ.MillimetersToTheFourth, s.SecondMomentZ.MillimetersToTheFourth, 1e-12, "Green's theorem polygon");
        Near.Relative(p.PrincipalAxisAngle.Degrees, s.PrincipalAxisAngle.Degrees, 1e-12, "Green's theorem polygon");
        Near.Relative(p.SectionModulusZ.CubicMillimeters, s.SectionModulusZ.CubicMillimeters, 1e-12, "extreme fibres from the same outline");
    }

    [Fact]
    public void Tee_MatchesPolygonAndShearCentreAtFlangeCentreLine()
    {
        double h = 150, b = 120, tf = 12, tw = 8;
        var s = new TeeSection(Mm(h), Mm(b), Mm(tf), Mm(tw));
        var p = new PolygonSection([Pt(-tw / 2, 0), Pt(tw / 2, 0), Pt(tw / 2, h - tf), Pt(b / 2, h - tf), Pt(b / 2, h), Pt(-b / 2, h), Pt(-b / 2, h - tf), Pt(-tw / 2, h - tf)]);
        Near.Relative(p.Area.SquareMillimeters, s.Area.SquareMillimeters, 1e-12, "Green's theorem polygon");
        Near.Relative(p.SecondMomentY.MillimetersToTheFourth, s.SecondMomentY.MillimetersToTheFourth, 1e-12, "Green's theorem polygon");
        Near.Relative(p.SecondMomentZ.MillimetersToTheFourth, s.SecondMomentZ.MillimetersToTheFourth, 1e-12, "Green's theorem polygon");
        double zc = (b * tf * (h - tf / 2) + (h - tf) * tw * (h - tf) / 2) / (b * tf + (h - tf) * tw);
        Near.Relative(h - tf / 2 - zc, s.ShearCentreOffsetZ.Millimeters, 1e-12, "shear centre at flange/stem centre-line intersection (common practice)");
    }

    private static SectionPoint Pt(double y, double z) => SectionPoint.FromMillimeters(y, z);
}
