using System;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Methods.Timber;
using CompressionMembers.Tests.Support;
using UnitsNet;

namespace CompressionMembers.Tests.Timber;

public class TimberMaterialTests
{
    [Theory]
    // name, fc,0,k, fm,k, E0,05 (MPa), ρk — EN 338:2009 Table 1 / EN 14080:2013 Tables 4 and 5. The values checked against
    // published copies (the glulam classes; fc,0,k, E0,05, fm,k of C16, C24, C30; fm,k of C18, D30, D40) are tested with
    // their sources in Published/TimberStrengthClassTests; the solid-timber ρk and the hardwood fc,0,k and E0,05 here are
    // still from memory. GL30h ρg,k is 430 kg/m³ (EN 14080:2013 as reproduced by structuralbasics.com; it was 425 before).
    [InlineData("C16", 17, 16, 5400, 310)]
    [InlineData("C18", 18, 18, 6000, 320)]
    [InlineData("C24", 21, 24, 7400, 350)]
    [InlineData("C30", 23, 30, 8000, 380)]
    [InlineData("D30", 23, 30, 8000, 530)]
    [InlineData("D40", 26, 40, 9400, 590)]
    [InlineData("GL24h", 24, 24, 9600, 385)]
    [InlineData("GL28h", 28, 28, 10500, 425)]
    [InlineData("GL30h", 30, 30, 11300, 430)]
    [InlineData("GL32h", 32, 32, 11800, 440)]
    [InlineData("GL24c", 21.5, 24, 9100, 365)]
    [InlineData("GL28c", 24, 28, 10400, 390)]
    [InlineData("GL30c", 24.5, 30, 10800, 390)]
    public void Presets_KeyValues_MatchTables(string name, double fc0k, double fmk, double e005, double rhok)
    {
        var m = Assert.Single(TimberGrades.All, g => g.Name == name);
        Near.Relative(fc0k, m.CompressionStrength.Megapascals, 1e-12, "EN 338 / EN 14080 tables (partly checked, see Published/)");
        Near.Relative(fmk, m.BendingStrength.Megapascals, 1e-12, "EN 338 / EN 14080 tables (partly checked, see Published/)");
        Near.Relative(e005, m.FifthPercentileModulus.Megapascals, 1e-12, "EN 338 / EN 14080 tables (partly checked, see Published/)");
        Near.Relative(rhok, m.CharacteristicDensity.KilogramsPerCubicMeter, 1e-12, "EN 338 / EN 14080 tables (partly checked, see Published/)");
        Assert.Equal(MaterialKind.Timber, m.Kind);
        // Every preset says where its values come from; only the homogeneous glulam classes were checked in full.
        Assert.Contains(m.IsGlulam && m.Product == TimberProduct.GlulamHomogeneous ? "checked against" : "from memory", m.Source);
        Assert.Equal(m.FifthPercentileModulus, m.ElasticModulus); // E0,05 is the stability modulus
    }

    [Fact]
    public void Presets_Products_AreSet()
    {
        Assert.Equal(TimberProduct.SolidSoftwood, TimberGrades.C24.Product);
        Assert.Equal(TimberProduct.SolidHardwood, TimberGrades.D40.Product);
        Assert.Equal(TimberProduct.GlulamHomogeneous, TimberGrades.GL28h.Product);
        Assert.Equal(TimberProduct.GlulamCombined, TimberGrades.GL28c.Product);
        Assert.True(TimberGrades.GL24c.IsGlulam);
    }

    [Fact]
    public void Create_E005AboveMean_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => TimberMaterial.Create("x", TimberProduct.SolidSoftwood,
            Pressure.FromMegapascals(20), Pressure.FromMegapascals(20), Pressure.FromMegapascals(10), Pressure.FromMegapascals(3),
            Pressure.FromMegapascals(8000), Pressure.FromMegapascals(9000), Pressure.FromMegapascals(500),
            Density.FromKilogramsPerCubicMeter(350), Density.FromKilogramsPerCubicMeter(420), "user-defined"));
        Assert.Equal("e005", ex.ParamName);
        Assert.Contains("must not exceed the mean modulus", ex.Message);
    }

    [Fact]
    public void Create_NegativeBendingStrength_ThrowsNamingUnit()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => TimberMaterial.Create("x", TimberProduct.SolidSoftwood,
            Pressure.FromMegapascals(20), Pressure.FromMegapascals(-5), Pressure.FromMegapascals(10), Pressure.FromMegapascals(3),
            Pressure.FromMegapascals(8000), Pressure.FromMegapascals(5000), Pressure.FromMegapascals(500),
            Density.FromKilogramsPerCubicMeter(350), Density.FromKilogramsPerCubicMeter(420), "user-defined"));
        Assert.Equal("fmk", ex.ParamName);
        Assert.Contains("got -5 MPa", ex.Message);
    }

    [Fact]
    public void Create_LvlProduct_PointsToLvlFactory()
    {
        var ex = Assert.Throws<ArgumentException>(() => TimberMaterial.Create("x", TimberProduct.Lvl,
            Pressure.FromMegapascals(20), Pressure.FromMegapascals(20), Pressure.FromMegapascals(10), Pressure.FromMegapascals(3),
            Pressure.FromMegapascals(8000), Pressure.FromMegapascals(5000), Pressure.FromMegapascals(500),
            Density.FromKilogramsPerCubicMeter(350), Density.FromKilogramsPerCubicMeter(420), "user-defined"));
        Assert.Equal("product", ex.ParamName);
        Assert.Contains("TimberMaterial.Lvl", ex.Message);
    }

    [Fact]
    public void Lvl_SizeEffectExponent_UsedInKh()
    {
        // LVL with declared values (invented for the test) and s = 0.15: kh = min((300/h)^s, 1.2) (EN 1995-1-1 3.4 (3.3)).
        var lvl = TimberMaterial.Lvl("LVL (test declaration)", Pressure.FromMegapascals(35), Pressure.FromMegapascals(44), Pressure.FromMegapascals(35),
            Pressure.FromMegapascals(4.1), Pressure.FromMegapascals(13800), Pressure.FromMegapascals(11600), Pressure.FromMegapascals(600),
            Density.FromKilogramsPerCubicMeter(480), Density.FromKilogramsPerCubicMeter(510), 0.15, "user-defined (test)");
        Near.Relative(Math.Pow(300 / 200.0, 0.15), Ec5ColumnStability.SizeFactor(lvl, true, 0.2), 1e-14, "EN 1995-1-1 (3.3)");
        // 3.4(3) applies to every depth other than 300 mm: a 400 mm deep LVL is reduced, (300/400)^0.15 = 0.95777.
        Near.Relative(Math.Pow(0.75, 0.15), Ec5ColumnStability.SizeFactor(lvl, true, 0.4), 1e-14, "EN 1995-1-1 (3.3), h > 300 mm");
        Assert.Equal(0.1, En1995Factors.BetaC(lvl.Product));
        Assert.Equal(1.2, En1995Factors.GammaM(lvl.Product));
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => TimberMaterial.Lvl("x", Pressure.FromMegapascals(35), Pressure.FromMegapascals(44), Pressure.FromMegapascals(35),
            Pressure.FromMegapascals(4.1), Pressure.FromMegapascals(13800), Pressure.FromMegapascals(11600), Pressure.FromMegapascals(600),
            Density.FromKilogramsPerCubicMeter(480), Density.FromKilogramsPerCubicMeter(510), 1.5, "user-defined"));
        Assert.Equal("sizeEffectExponent", ex.ParamName);
    }

    [Theory]
    // EN 1995-1-1 Table 3.1, solid timber / glulam / LVL rows (from memory).
    [InlineData(ServiceClass.Class1, LoadDurationClass.Permanent, 0.60)]
    [InlineData(ServiceClass.Class1, LoadDurationClass.LongTerm, 0.70)]
    [InlineData(ServiceClass.Class1, LoadDurationClass.MediumTerm, 0.80)]
    [InlineData(ServiceClass.Class2, LoadDurationClass.ShortTerm, 0.90)]
    [InlineData(ServiceClass.Class2, LoadDurationClass.Instantaneous, 1.10)]
    [InlineData(ServiceClass.Class3, LoadDurationClass.Permanent, 0.50)]
    [InlineData(ServiceClass.Class3, LoadDurationClass.LongTerm, 0.55)]
    [InlineData(ServiceClass.Class3, LoadDurationClass.MediumTerm, 0.65)]
    [InlineData(ServiceClass.Class3, LoadDurationClass.ShortTerm, 0.70)]
    [InlineData(ServiceClass.Class3, LoadDurationClass.Instantaneous, 0.90)]
    public void Kmod_Table31_Values(ServiceClass sc, LoadDurationClass d, double kmod)
    {
        Assert.Equal(kmod, En1995Factors.Kmod(TimberProduct.SolidSoftwood, sc, d));
        Assert.Equal(kmod, En1995Factors.Kmod(TimberProduct.GlulamHomogeneous, sc, d));
    }

    [Fact]
    public void Kmod_Unspecified_ThrowsWithHowToFix()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => En1995Factors.Kmod(TimberProduct.SolidSoftwood, ServiceClass.Class1, LoadDurationClass.Unspecified));
        Assert.Equal("duration", ex.ParamName);
        Assert.Contains("WithLoadDuration", ex.Message);
    }

    [Theory]
    [InlineData(ServiceClass.Class1, 0.60)] // EN 1995-1-1 Table 3.2 (from memory)
    [InlineData(ServiceClass.Class2, 0.80)]
    [InlineData(ServiceClass.Class3, 2.00)]
    public void Kdef_Table32_Values(ServiceClass sc, double kdef) =>
        Assert.Equal(kdef, En1995Factors.Kdef(TimberProduct.SolidSoftwood, sc));

    [Fact]
    public void GammaM_Table23_RecommendedValues()
    {
        // EN 1995-1-1 Table 2.3 (recommended): solid timber 1.3, glulam 1.25, LVL 1.2.
        Assert.Equal(1.3, En1995Factors.GammaM(TimberProduct.SolidSoftwood));
        Assert.Equal(1.3, En1995Factors.GammaM(TimberProduct.SolidHardwood));
        Assert.Equal(1.25, En1995Factors.GammaM(TimberProduct.GlulamCombined));
        Assert.Equal(1.2, En1995Factors.GammaM(TimberProduct.Lvl));
    }

    [Theory]
    // PS 20 / NDS Supplement Table 1A dressed sizes (from memory; facts of the trade).
    [InlineData(2, 4, 1.5, 3.5)]
    [InlineData(2, 6, 1.5, 5.5)]
    [InlineData(2, 8, 1.5, 7.25)]
    [InlineData(2, 12, 1.5, 11.25)]
    [InlineData(4, 4, 3.5, 3.5)]
    [InlineData(6, 6, 5.5, 5.5)]    // timber
    [InlineData(6, 8, 5.5, 7.5)]    // timber: nominal − ½ in
    public void UsNominal_Sizes_AreDressed(int t, int w, double bIn, double hIn)
    {
        var s = TimberSizes.UsNominal(t, w);
        Near.Relative(bIn, s.Width.Inches, 1e-12, TimberSizes.UsSizesSource);
        Near.Relative(hIn, s.Depth.Inches, 1e-12, TimberSizes.UsSizesSource);
    }

    [Fact]
    public void UsNominal_UnknownSize_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => TimberSizes.UsNominal(2, 7));
        Assert.Equal("nominalInches", ex.ParamName);
        Assert.Contains("got 7 in", ex.Message);
    }

    [Fact]
    public void Glulam_Laminations_GiveDepth()
    {
        var s = TimberSizes.Glulam(Length.FromMillimeters(140), 8);
        Near.Relative(360, s.Depth.Millimeters, 1e-12, "8 × 45 mm laminations (common practice)");
        Assert.Throws<ArgumentOutOfRangeException>(() => TimberSizes.Glulam(Length.FromMillimeters(140), 1));
    }

    [Fact]
    public void Create_ZeroE005_ThrowsUnderCallersName()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => TimberMaterial.Create("x", TimberProduct.SolidSoftwood,
            Pressure.FromMegapascals(20), Pressure.FromMegapascals(20), Pressure.FromMegapascals(10), Pressure.FromMegapascals(3),
            Pressure.FromMegapascals(8000), Pressure.FromMegapascals(0), Pressure.FromMegapascals(500),
            Density.FromKilogramsPerCubicMeter(350), Density.FromKilogramsPerCubicMeter(420), "user-defined"));
        Assert.Equal("e005", ex.ParamName);
        Assert.Contains("E0,05 must be greater than 0; got 0 MPa", ex.Message);
    }
}
