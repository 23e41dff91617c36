using System;
using CompressionMembers.Materials;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Tests.Support;
using UnitsNet;

namespace CompressionMembers.Tests.Aluminium;

public class AluminiumAlloyTests
{
    [Fact]
    public void Presets_All_HaveEurocodeModuliAndAluminiumKind()
    {
        foreach (var a in AluminiumAlloys.All)
        {
            // E = 70 000 MPa and G = 27 000 MPa: EN 1999-1-1 3.2.5 (from memory); E ≈ 70 GPa is a fact of the trade.
            Near.Relative(70e9, a.ElasticModulus.Pascals, 1e-12, "EN 1999-1-1 3.2.5");
            Near.Relative(27e9, a.ShearModulus.Pascals, 1e-12, "EN 1999-1-1 3.2.5");
            Assert.Equal(MaterialKind.Aluminium, a.Kind);
            Assert.True(a.UltimateStrength.Pascals >= a.ProofStrength.Pascals, a.Name);
            // Each preset names its table; those read in a copy of Table 3.2b say "checked", the others "from memory".
            Assert.True(a.Source.Contains("from memory") || a.Source.Contains("checked against"), a.Source);
            Assert.InRange(a.HazProofFactorMig, 0.3, 1.0);
            Assert.True(a.HazProofFactorTig <= a.HazProofFactorMig, a.Name);
        }
        Assert.True(AluminiumAlloys.All.Count >= 16);
    }

    [Theory]
    // alloy, f0, fu, class, ρo,haz MIG, source (EN 1999-1-1:2007+A1:2009 Table 3.2b, from memory)
    [InlineData("EN AW-6082", "T6", 250, 290, BucklingClass.A, 0.50, "Table 3.2b, 6082-T6 extrusion t ≤ 5 mm, from memory")]
    [InlineData("EN AW-6082", "T5", 230, 270, BucklingClass.B, 125.0 / 230, "Table 3.2b, 6082-T5 extrusion t ≤ 5 mm, from memory")]
    [InlineData("EN AW-6060", "T6", 140, 170, BucklingClass.A, 60.0 / 140, "Table 3.2b, 6060-T6 extrusion (checked: Published/AluminiumPublishedTests)")]
    [InlineData("EN AW-7020", "T6", 290, 350, BucklingClass.A, 205.0 / 290, "Table 3.2b, 7020-T6 extrusion t ≤ 15 mm, from memory")]
    [InlineData("EN AW-5083", "O/H111", 110, 270, BucklingClass.B, 1.0, "Table 3.2b, 5083-O/H111: not softened by welding (checked: Published/AluminiumPublishedTests)")]
    public void Presets_Extrusions_CarryTableValues(string alloy, string temper, double f0, double fu, BucklingClass cls, double rhoO, string source)
    {
        var a = Array.Find([.. AluminiumAlloys.All], x => x.AlloyDesignation == alloy && x.Temper == temper && x.ProductForm == AluminiumProductForm.Extrusion)!;
        Near.Relative(f0 * 1e6, a.ProofStrength.Pascals, 1e-12, source);
        Near.Relative(fu * 1e6, a.UltimateStrength.Pascals, 1e-12, source);
        Assert.Equal(cls, a.BucklingClass);
        Near.Relative(rhoO, a.HazProofFactorMig, 1e-12, source);
    }

    [Fact]
    public void Presets_HeatTreatedClassA_NonHeatTreatableClassB()
    {
        // Common practice (EN 1999-1-1 Table 3.2): heat-treated T6 tempers are class A; 5083-O and the T5 tempers listed class B.
        foreach (var a in AluminiumAlloys.All)
        {
            if (a.Temper == "T6") Assert.Equal(BucklingClass.A, a.BucklingClass);
            if (a.Temper == "O/H111") Assert.Equal(BucklingClass.B, a.BucklingClass);
        }
    }

    [Fact]
    public void CoversThickness_Band_InclusiveAtTop()
    {
        var a = AluminiumAlloys.EnAw6082T6ExtrusionOver5mm;
        Assert.False(a.CoversThickness(Length.FromMillimeters(5)));
        Assert.True(a.CoversThickness(Length.FromMillimeters(5.5)));
        Assert.True(a.CoversThickness(Length.FromMillimeters(15)));
        Assert.False(a.CoversThickness(Length.FromMillimeters(15.5)));
    }

    private static AluminiumAlloy Make(double f0 = 200, double fu = 240, double ro = 0.5, double tMin = 0, double tMax = 10) =>
        AluminiumAlloy.Create("my alloy", "EN AW-6xxx", "T6", AluminiumProductForm.Extrusion, Pressure.FromMegapascals(f0), Pressure.FromMegapascals(fu),
            Length.FromMillimeters(tMin), Length.FromMillimeters(tMax), BucklingClass.A, ro, 0.6, ro, 0.6);

    [Fact]
    public void Create_UserAlloy_KeepsValuesAndDefaultsModuli()
    {
        var a = Make();
        Assert.Equal("user-defined", a.Source);
        Near.Relative(200e6, a.CompressiveStrength.Pascals, 1e-12, "given");
        Near.Relative(70e9, a.ElasticModulus.Pascals, 1e-12, "EN 1999-1-1 3.2.5 default");
    }

    [Fact]
    public void Create_UltimateBelowProof_ThrowsArgumentException()
    {
        var ex = Assert.Throws<ArgumentException>(() => Make(f0: 250, fu: 200));
        Assert.Equal("ultimateStrength", ex.ParamName);
        Assert.Contains("must not be less than the proof strength", ex.Message);
    }

    [Fact]
    public void Create_HazFactorAboveOne_ThrowsArgumentOutOfRange()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Make(ro: 1.2));
        Assert.Equal("hazProofFactorMig", ex.ParamName);
        Assert.Contains("between 0 and 1; got 1.2", ex.Message);
    }

    [Fact]
    public void Create_NegativeStrength_ThrowsArgumentOutOfRange()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Make(f0: -200));
        Assert.Equal("proofStrength", ex.ParamName);
        Assert.Contains("Proof strength f0 must be greater than 0; got -200 MPa", ex.Message);
    }

    [Fact]
    public void Create_ThicknessRangeInverted_ThrowsArgumentException()
    {
        var ex = Assert.Throws<ArgumentException>(() => Make(tMin: 10, tMax: 5));
        Assert.Equal("minimumThickness", ex.ParamName);
        Assert.Contains("less than the maximum thickness", ex.Message);
    }
}
