using System;
using System.Linq;
using CompressionMembers.Methods;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using CompressionMembers.Workflows.Catalogues;
using CompressionMembers.Workflows.Tables;
using CsCheck;
using UnitsNet;

namespace CompressionMembers.Tests.Workflows;

public class CapacityTableTests
{
    private static readonly Length[] Lengths = [Length.FromMillimeters(500), Length.FromMillimeters(1500), Length.FromMillimeters(3000), Length.FromMillimeters(6000)];

    [Fact]
    public void Compute_Euler_MatchesHandCalculation()
    {
        var bar = new CatalogueEntry("bar 30", new RectangleSection(Length.FromMillimeters(30), Length.FromMillimeters(30)));
        var t = CapacityTable.Compute([bar], Fixtures.Steel, ResistanceMethods.Euler, Lengths);
        // Euler (Timoshenko & Gere §2.2) with squash cut-off: min(π² E I / L², A fy), E = 200 GPa, fy = 250 MPa (common practice).
        double i = Math.Pow(0.03, 4) / 12, a = 0.03 * 0.03;
        for (int j = 0; j < Lengths.Length; j++)
        {
            double l = Lengths[j].Meters;
            Near.Relative(Math.Min(Math.PI * Math.PI * 200e9 * i / (l * l), a * 250e6), t.ResistanceN(0, j), 1e-9, "hand calculation, Euler with squash cut-off");
        }
    }

    [Fact]
    public void Compute_AnyMethod_ResistanceFallsWithLength()
    {
        var secs = SectionCatalogues.AluminiumGenericShapes.Entries.Take(12).ToArray();
        Gen.Int[0, 2].Sample(k =>
        {
            IResistanceMethod m = k switch { 0 => ResistanceMethods.Euler, 1 => ResistanceMethods.Johnson, _ => ResistanceMethods.PerryRobertsonDefault };
            var t = CapacityTable.Compute(secs, Fixtures.Steel, m, Lengths);
            for (int r = 0; r < secs.Length; r++)
                for (int j = 1; j < Lengths.Length; j++)
                    Assert.True(t.ResistanceN(r, j) <= t.ResistanceN(r, j - 1)); // a longer column never carries more
        }, iter: 3);
    }

    [Fact]
    public void ToMarkdownAndCsv_HaveOneRowPerSection()
    {
        var secs = SectionCatalogues.UsDressedLumber.Entries.Take(3).ToArray();
        var t = CapacityTable.Compute(secs, Fixtures.Steel, ResistanceMethods.Johnson, Lengths);
        var md = t.ToMarkdown();
        Assert.Contains("| section | L_cr 500 mm | L_cr 1500 mm | L_cr 3000 mm | L_cr 6000 mm |", md);
        Assert.Contains("| 2x4 |", md);
        var csv = t.ToCsv().Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(4, csv.Length);
        Assert.Equal("section,N_Rd_kN@L_cr_mm=500,N_Rd_kN@L_cr_mm=1500,N_Rd_kN@L_cr_mm=3000,N_Rd_kN@L_cr_mm=6000", csv[0]);
    }

    [Fact]
    public void ResistanceN_RowOutOfRange_NamesTheRange()
    {
        var t = CapacityTable.Compute(SectionCatalogues.UsDressedLumber.Entries.Take(2), Fixtures.Steel, ResistanceMethods.Euler, Lengths);
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => t.ResistanceN(2, 0));
        Assert.Equal("row", ex.ParamName);
        Assert.StartsWith("Row must be from 0 to 1; got 2.", ex.Message);
    }
}
