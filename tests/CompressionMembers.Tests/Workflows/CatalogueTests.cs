using System;
using System.IO;
using System.Linq;
using System.Text;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using CompressionMembers.Workflows.Catalogues;
using UnitsNet;

namespace CompressionMembers.Tests.Workflows;

public class CatalogueTests
{
    [Fact]
    public void UsDressedLumber_2x4_IsOneAndAHalfByThreeAndAHalfInches()
    {
        var e = SectionCatalogues.UsDressedLumber["2x4"];
        var r = Assert.IsType<RectangleSection>(e.Section);
        // nominal 2x4 dresses to 1.5 in x 3.5 in: common practice (from memory); 1 in = 25.4 mm exactly.
        Near.Relative(1.5 * 25.4, r.Width.Millimeters, 1e-12, "common practice: 2x nominal = 1.5 in dressed (from memory)");
        Near.Relative(3.5 * 25.4, r.Depth.Millimeters, 1e-12, "common practice: 4 nominal = 3.5 in dressed (from memory)");
        Near.Relative(1.5 * 3.5 * 25.4 * 25.4, e.Section.Area.SquareMillimeters, 1e-12, "A = b h by hand");
    }

    [Theory]
    [InlineData("2x12", 1.5, 11.25)] // common practice (from memory): 12 nominal → 11.25 in
    [InlineData("6x8", 5.5, 7.25)]   // common practice (from memory): 6 → 5.5 in, 8 → 7.25 in
    [InlineData("4x10", 3.5, 9.25)]  // common practice (from memory): 10 → 9.25 in
    public void UsDressedLumber_NominalSizes_MapToDressedInches(string name, double bIn, double hIn, string source = "common practice (from memory)")
    {
        var r = Assert.IsType<RectangleSection>(SectionCatalogues.UsDressedLumber[name].Section);
        Near.Relative(bIn, r.Width.Inches, 1e-12, source);
        Near.Relative(hIn, r.Depth.Inches, 1e-12, source);
    }

    [Fact]
    public void BuiltIns_HaveUniqueDesignationsAndSeveralFamilies()
    {
        foreach (var c in SectionCatalogues.All)
        {
            Assert.True(c.Count > 5, c.Name);
            Assert.Equal(c.Count, c.Entries.Select(e => e.Designation.ToUpperInvariant()).Distinct().Count());
        }
        var al = SectionCatalogues.AluminiumGenericShapes.Entries.Select(e => e.Family).Distinct().ToArray();
        Assert.Equal(["CHS", "SHS", "RHS", "angle", "channel", "I"], al);
        Assert.Contains(SectionCatalogues.Glulam.Entries, e => e.Designation == "glulam 140x450"); // 10 laminations of 45 mm
    }

    [Fact]
    public void MassPerMetre_WithoutStatedMass_IsDensityTimesArea()
    {
        var e = SectionCatalogues.AluminiumGenericShapes["CHS 50x3"];
        double a = Math.PI / 4 * (50 * 50 - 44 * 44) * 1e-6; // m², by hand
        Near.Relative(7850 * a, e.MassPerMetreFor(Fixtures.Steel).KilogramsPerMeter, 1e-12, "m = ρ A by hand, ρ = 7850 kg/m³ (common practice)");
    }

    [Fact]
    public void ReadCsv_ValidFile_ReadsEntriesAndStatedMass()
    {
        const string csv = "designation,family,section,mass_kg_per_m\nP-1,posts,rect 90x90,3.9\nP-2,posts,rect 90x140,\nT-1,tubes,chs 60x3,\n";
        var c = CatalogueFiles.ReadCsv(new StringReader(csv), "yard stock", "user-defined");
        Assert.Equal(3, c.Count);
        Assert.Equal(3.9, c["P-1"].MassPerMetre!.Value.KilogramsPerMeter);
        Assert.Null(c["p-2"].MassPerMetre); // designations ignore case
        Assert.IsType<CircularHollowSection>(c["T-1"].Section);
    }

    [Fact]
    public void ReadCsv_BadLine_NamesTheLine()
    {
        const string csv = "designation,section\nA,rect 90x90\nB,rect 90xabc\n";
        var ex = Assert.Throws<FormatException>(() => CatalogueFiles.ReadCsv(new StringReader(csv), "x", "user-defined"));
        Assert.StartsWith("Line 3: \"abc\" in \"rect 90xabc\" is not a number", ex.Message);
    }

    [Fact]
    public void ReadCsv_UnknownColumn_IsRejected()
    {
        var ex = Assert.Throws<FormatException>(() => CatalogueFiles.ReadCsv(new StringReader("designation,section,colour\nA,rect 9x9,red\n"), "x", "user-defined"));
        Assert.StartsWith("Line 1: unknown column \"colour\"", ex.Message);
    }

    [Fact]
    public void ReadCsv_DuplicateDesignation_IsRejected()
    {
        var ex = Assert.Throws<FormatException>(() => CatalogueFiles.ReadCsv(new StringReader("designation,section\nA,rect 9x9\na,rect 9x12\n"), "x", "user-defined"));
        Assert.Contains("lists the designation \"a\" twice", ex.Message);
    }

    private static MemoryStream Utf8(string s) => new(Encoding.UTF8.GetBytes(s));

    [Fact]
    public void ReadJson_ValidFile_ReadsEntries()
    {
        var c = CatalogueFiles.ReadJson(Utf8("""{"format":"compression-members/catalogue@1","name":"n","source":"user-defined","sections":[{"designation":"A","section":"rhs 50x100x4","family":"rhs"}]}"""));
        Assert.Equal("rhs", c["A"].Family);
        Assert.IsType<RectangularHollowSection>(c["A"].Section);
    }

    [Fact]
    public void ReadJson_UnknownField_IsRejectedWithItsLine()
    {
        var ex = Assert.Throws<FormatException>(() => CatalogueFiles.ReadJson(Utf8("{\"format\":\"compression-members/catalogue@1\",\n\"name\":\"n\",\n\"$type\":\"x\"}")));
        Assert.Contains("line 3", ex.Message);
    }

    [Fact]
    public void ReadJson_TooLarge_IsRejected()
    {
        var ex = Assert.Throws<FormatException>(() => CatalogueFiles.ReadJson(Utf8(new string(' ', 2000) + "{}"), maxBytes: 1000));
        Assert.Contains("larger than the limit of 1000 bytes", ex.Message);
    }

    [Fact]
    public void ReadJson_TooDeep_IsRejected()
    {
        string deep = "{\"format\":" + new string('[', 40) + new string(']', 40) + "}";
        Assert.Throws<FormatException>(() => CatalogueFiles.ReadJson(Utf8(deep)));
    }

    [Theory]
    [InlineData("rect 90x140", SectionKind.SolidRectangle)]
    [InlineData("round 50", SectionKind.SolidCircle)]
    [InlineData("CHS 60.3 × 3.2", SectionKind.CircularHollow)]
    [InlineData("i 200x100x8x5x6", SectionKind.DoublySymmetricI)]
    [InlineData("angle 50x50x5", SectionKind.Angle)]
    [InlineData("channel 100x50x6x4", SectionKind.Channel)]
    public void SectionSpec_Forms_ParseToTheirKind(string text, SectionKind kind) => Assert.Equal(kind, SectionSpec.Parse(text).Kind);

    [Fact]
    public void SectionSpec_WrongCount_SaysHowManyDimensions()
    {
        var ex = Assert.Throws<FormatException>(() => SectionSpec.Parse("rhs 100x50"));
        Assert.StartsWith("A \"rhs\" section takes 3 dimensions; \"rhs 100x50\" gives 2.", ex.Message);
    }
}
