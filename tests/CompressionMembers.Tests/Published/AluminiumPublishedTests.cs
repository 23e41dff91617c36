using System;
using System.Linq;
using CompressionMembers.Actions;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Members;
using CompressionMembers.Methods.Aluminium;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using UnitsNet;

namespace CompressionMembers.Tests.Published;

/// <summary>The aluminium presets and the buckling-constant method against published copies.</summary>
public class AluminiumPublishedTests
{
    private const double Ksi = 6.894757293168361e6;

    public static TheoryData<string, double, double, double, double, double, double, double, BucklingClass> Table32bRows() => new()
    {
        // preset, tmax (mm), f0, fu, fo,haz, fu,haz (MPa), ρo,haz, ρu,haz, buckling class: EN 1999-1-1:2007+A1:2009
        // Table 3.2b, rows read in the stored copy (PublishedSources.En1999Table32b). ρ is printed to two decimals.
        { nameof(AluminiumAlloys.EnAw6060T5Extrusion), 5, 120, 160, 50, 80, 0.42, 0.50, BucklingClass.B },     // 6060 EP, ET, ER/B T5 t ≤ 5
        { nameof(AluminiumAlloys.EnAw6060T6Extrusion), 15, 140, 170, 60, 100, 0.43, 0.59, BucklingClass.A },   // 6060 ET, EP, ER/B T6 t ≤ 15
        { nameof(AluminiumAlloys.EnAw6061T6Extrusion), 20, 240, 260, 115, 175, 0.48, 0.67, BucklingClass.A },  // 6061 EP, ET, ER/B, DT T6 t ≤ 20
        { nameof(AluminiumAlloys.EnAw6063T5Extrusion), 3, 130, 175, 60, 100, 0.46, 0.57, BucklingClass.B },    // 6063 EP, ET, ER/B T5 t ≤ 3
        { nameof(AluminiumAlloys.EnAw6063T6Extrusion), 25, 160, 195, 65, 110, 0.41, 0.56, BucklingClass.A },   // 6063 EP, ET, ER/B T6 t ≤ 25
        { nameof(AluminiumAlloys.EnAw6005AT6Extrusion), 5, 225, 270, 115, 165, 0.51, 0.61, BucklingClass.A },  // 6005A EP/O, ER/B T6 t ≤ 5
        { nameof(AluminiumAlloys.EnAw5083OH111Extrusion), 200, 110, 270, 110, 270, 1, 1, BucklingClass.B },    // 5083 ET, EP, ER/B O/H111 t ≤ 200
    };

    private static AluminiumAlloy Preset(string name) =>
        (AluminiumAlloy)typeof(AluminiumAlloys).GetProperty(name)!.GetValue(null)!;

    [Theory]
    [MemberData(nameof(Table32bRows))]
    public void Extrusions_CheckedRows_MatchEn1999Table32b(string preset, double tMaxMm, double f0, double fu, double f0Haz, double fuHaz,
        double rhoO, double rhoU, BucklingClass cls)
    {
        var a = Preset(preset);
        const string src = PublishedSources.En1999Table32b;
        Near.Relative(f0 * 1e6, a.ProofStrength.Pascals, 1e-12, src);
        Near.Relative(fu * 1e6, a.UltimateStrength.Pascals, 1e-12, src);
        Near.Relative(tMaxMm, a.MaximumThickness.Millimeters, 1e-12, src);
        Assert.Equal(cls, a.BucklingClass);
        // The presets hold ρ = fhaz / f exactly; the table's strengths give the same ratio, and its printed ρ agrees to the
        // table's two decimals.
        Near.Relative(f0Haz / f0, a.HazProofFactorMig, 1e-12, src + " (fo,haz / fo)");
        Near.Relative(fuHaz / fu, a.HazUltimateFactorMig, 1e-12, src + " (fu,haz / fu)");
        Near.Absolute(rhoO, a.HazProofFactorMig, 0.005, src + " (ρo,haz to two decimals)");
        Near.Absolute(rhoU, a.HazUltimateFactorMig, 0.005, src + " (ρu,haz to two decimals)");
        Assert.DoesNotContain("from memory", a.Source);
    }

    [Fact]
    public void TemperGroups_ArtificiallyAgedAreT5ToT9()
    {
        // Kissell & Ferry, Aluminum Structures, 2nd ed., section 5 (PublishedSources.KissellFerry): "aluminum alloys are
        // divided into two groups: those that are not artificially aged (tempers -O, -H, -T1, -T2, -T3, -T4) and those that are
        // (tempers -T5 through -T9)", with different buckling formula constants for each group.
        foreach (string t in new[] { "T5", "T6", "T7", "T8", "T9", "T6511" })
            Assert.True(BucklingConstantMethod.IsArtificiallyAged(t), t);
        foreach (string t in new[] { "O", "H111", "H14", "T1", "T2", "T3", "T4", "O/H111" })
            Assert.False(BucklingConstantMethod.IsArtificiallyAged(t), t);
    }

}
