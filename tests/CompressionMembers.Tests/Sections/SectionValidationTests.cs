using System;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Tests.Sections;

public class SectionValidationTests
{
    private static Length Mm(double v) => Length.FromMillimeters(v);

    [Theory]
    [InlineData(0.0, "Width must be greater than 0; got 0 mm.")]
    [InlineData(-90.0, "Width must be greater than 0; got -90 mm.")]
    [InlineData(1e-320, "Width must be greater than 0; got 9.99989E-321 mm.")] // subnormal: not a usable size
    public void Rectangle_BadWidth_ThrowsNamingParameterValueAndUnit(double width, string message)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => new RectangleSection(Mm(width), Mm(140)));
        Assert.Equal("width", ex.ParamName);
        Assert.StartsWith(message, ex.Message);
    }

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    [InlineData(double.NegativeInfinity)]
    public void Quantity_NonFinite_IsRejectedByUnitsNetBeforeItReachesTheLibrary(double value)
    {
        // UnitsNet 5.75 refuses NaN and infinities when a quantity is made, so a section never sees one;
        // the library's own finiteness checks guard the dimensionless inputs (K, η, ν) and computed values.
        Assert.ThrowsAny<ArgumentException>(() => new RectangleSection(Mm(value), Mm(140)));
    }

    [Fact]
    public void CircularHollow_WallAsThickAsRadius_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => new CircularHollowSection(Mm(100), Mm(50)));
        Assert.Equal("wallThickness", ex.ParamName);
        Assert.StartsWith("Wall thickness must be less than half the outside diameter (50 mm); got 50 mm.", ex.Message);
    }

    [Fact]
    public void RectangularHollow_WallThickerThanHalfWidth_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => new RectangularHollowSection(Mm(60), Mm(100), Mm(31)));
        Assert.Equal("wallThickness", ex.ParamName);
        Assert.StartsWith("Wall thickness must be less than half the smaller of width and depth (30 mm); got 31 mm.", ex.Message);
    }

    [Fact]
    public void ISection_FilletLargerThanFlangeOutstand_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => new ISection(Mm(200), Mm(100), Mm(10), Mm(6), Mm(48)));
        Assert.Equal("rootRadius", ex.ParamName);
        Assert.StartsWith("Root radius 48 mm is larger than the flange outstand (b − tw)/2 = 47 mm", ex.Message);
    }

    [Fact]
    public void ISection_FlangesThickerThanHalfDepth_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => new ISection(Mm(100), Mm(100), Mm(50), Mm(6)));
        Assert.Equal("flangeThickness", ex.ParamName);
    }

    [Fact]
    public void Angle_ThicknessNotLessThanLeg_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => new AngleSection(Mm(50), Mm(30), Mm(30)));
        Assert.Equal("thickness", ex.ParamName);
    }

    [Fact]
    public void ByProperties_SecondMomentAboveAreaTimesFibreSquared_Throws()
    {
        // Physically impossible: I = ∫z² dA ≤ A c² (common practice sanity bound).
        var ex = Assert.Throws<ArgumentException>(() => new SectionByProperties("bad", Area.FromSquareMillimeters(1000),
            AreaMomentOfInertia.FromMillimetersToTheFourth(2e6), AreaMomentOfInertia.FromMillimetersToTheFourth(1e5), Mm(40), Mm(40)));
        Assert.Equal("secondMomentY", ex.ParamName);
        Assert.StartsWith("Second moment about y (2000000 mm⁴) cannot exceed A·c² = 1600000 mm⁴", ex.Message);
    }
}
