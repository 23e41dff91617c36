using System.Collections.Generic;
using System.Globalization;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Workflows.Catalogues;

/// <summary>Built-in catalogues: common timber sizes (metric sawn, glulam, US dressed lumber) and a representative set
/// of generic aluminium shapes of this library's own dimensions (not any supplier's list).</summary>
/// <remarks>
/// <para>The timber sizes are sizes of common practice, listed from memory; check availability with your supplier.
/// The aluminium shapes are generic dimensions chosen for this library, so that size selection has something to
/// choose from; they are not the list of any standard or supplier.</para>
/// <para>Thread safety: the catalogues are immutable and built once.</para>
/// </remarks>
public static class SectionCatalogues
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Metric sawn softwood, width × depth in mm: the thicknesses of <see cref="TimberSizes.MetricSawnThicknesses"/> up
    /// to 100 mm with the widths of <see cref="TimberSizes.MetricSawnWidths"/> as depths (EN 336 sizes, common practice, from
    /// memory; the one table of the library). Family "sawn b" for each width b, so pruning climbs the depths.</summary>
    public static SectionCatalogue MetricSawnTimber { get; } = Build("metric sawn timber", "common practice sizes (from memory)", SawnEntries());

    /// <summary>Glued laminated timber, width × depth in mm: the widths of <see cref="TimberSizes.GlulamWidths"/> and depths in 45 mm
    /// laminations from 180 to 900 (common practice, from memory). Family "glulam b".</summary>
    public static SectionCatalogue Glulam { get; } = Build("glulam", "common practice sizes, 45 mm laminations (from memory)", GlulamEntries());

    /// <summary>US dressed lumber: nominal 2×, 4× and 6× widths by nominal depths 4 to 12, at the dressed (actual)
    /// sizes 2 → 1.5 in, 4 → 3.5 in, 6 → 5.5 in, 8 → 7.25 in, 10 → 9.25 in, 12 → 11.25 in (common practice, from memory).
    /// Designations are nominal ("2x4"); dimensions are in inches.</summary>
    public static SectionCatalogue UsDressedLumber { get; } = Build("US dressed lumber", "common practice dressed sizes (from memory)", UsEntries());

    /// <summary>Generic aluminium shapes of this library's own dimensions: round tubes, square and rectangular tubes,
    /// equal angles, channels and I-shapes, in mm. Families "CHS", "SHS", "RHS", "angle", "channel", "I".</summary>
    public static SectionCatalogue AluminiumGenericShapes { get; } = Build("aluminium generic shapes", "CompressionMembers' own generic dimensions (not a supplier's list)", AluminiumEntries());

    /// <summary>All built-in catalogues.</summary>
    public static IReadOnlyList<SectionCatalogue> All { get; } = [MetricSawnTimber, Glulam, UsDressedLumber, AluminiumGenericShapes];

    private static SectionCatalogue Build(string name, string source, List<CatalogueEntry> entries) => SectionCatalogue.Create(name, source, entries);

    private static string N(double v) => v.ToString("0.##", Inv);

    private static List<CatalogueEntry> SawnEntries()
    {
        var list = new List<CatalogueEntry>();
        // One table of sizes for the library: TimberSizes (thicknesses up to 100 mm as widths here, its widths as depths).
        foreach (var bl in TimberSizes.MetricSawnThicknesses)
            foreach (var hl in TimberSizes.MetricSawnWidths)
            {
                double b = bl.Millimeters, h = hl.Millimeters;
                if (b <= 100 && h >= b) list.Add(new CatalogueEntry($"sawn {N(b)}x{N(h)}", new RectangleSection(Length.FromMillimeters(b), Length.FromMillimeters(h)), $"sawn {N(b)}"));
            }
        return list;
    }

    private static List<CatalogueEntry> GlulamEntries()
    {
        var list = new List<CatalogueEntry>();
        foreach (var bl in TimberSizes.GlulamWidths)
            for (int n = 4; n <= 20; n++)
            {
                double b = bl.Millimeters, h = 45 * n;
                list.Add(new CatalogueEntry($"glulam {N(b)}x{N(h)}", new RectangleSection(Length.FromMillimeters(b), Length.FromMillimeters(h)), $"glulam {N(b)}"));
            }
        return list;
    }

    private static List<CatalogueEntry> UsEntries()
    {
        // Nominal → dressed by TimberSizes.UsDressedSize (PS 20 / NDS Supplement Table 1A, from memory): one table.
        int[] nominal = [2, 4, 6, 8, 10, 12];
        var list = new List<CatalogueEntry>();
        foreach (int nb in nominal[..3])
            foreach (int nh in nominal)
                if (nh >= nb && nh >= 4)
                    list.Add(new CatalogueEntry($"{nb}x{nh}", new RectangleSection(TimberSizes.UsDressedSize(nb, false), TimberSizes.UsDressedSize(nh, false)), $"US {nb}x"));
        return list;
    }

    private static List<CatalogueEntry> AluminiumEntries()
    {
        var list = new List<CatalogueEntry>();
        static Length Mm(double v) => Length.FromMillimeters(v);
        foreach (var d in new double[] { 25, 32, 40, 50, 60, 76, 90, 100, 120, 150 })
            foreach (var t in new double[] { 2, 3, 4, 5 })
                if (t <= d / 10) list.Add(new CatalogueEntry($"CHS {N(d)}x{N(t)}", new CircularHollowSection(Mm(d), Mm(t)), "CHS"));
        foreach (var b in new double[] { 25, 30, 40, 50, 60, 80, 100, 120 })
            foreach (var t in new double[] { 2, 3, 4, 5 })
                if (t <= b / 8) list.Add(new CatalogueEntry($"SHS {N(b)}x{N(b)}x{N(t)}", new RectangularHollowSection(Mm(b), Mm(b), Mm(t)), "SHS"));
        foreach (var (b, h) in new (double, double)[] { (25, 50), (30, 60), (40, 80), (50, 100), (60, 120), (80, 160) })
            foreach (var t in new double[] { 2, 3, 4, 5 })
                if (t <= b / 8) list.Add(new CatalogueEntry($"RHS {N(b)}x{N(h)}x{N(t)}", new RectangularHollowSection(Mm(b), Mm(h), Mm(t)), "RHS"));
        foreach (var b in new double[] { 20, 25, 30, 40, 50, 60, 80, 100 })
            foreach (var t in new double[] { 2, 3, 4, 5, 6, 8 })
                if (t <= b / 8 && t >= b / 20) list.Add(new CatalogueEntry($"angle {N(b)}x{N(b)}x{N(t)}", AngleSection.Equal(Mm(b), Mm(t)), "angle"));
        foreach (var (h, b, tf, tw) in new (double, double, double, double)[] { (40, 20, 3, 2), (50, 25, 4, 3), (60, 30, 4, 3), (80, 40, 5, 4), (100, 50, 6, 4), (120, 55, 7, 5), (150, 65, 8, 6), (200, 75, 9, 7) })
            list.Add(new CatalogueEntry($"channel {N(h)}x{N(b)}x{N(tf)}x{N(tw)}", new ChannelSection(Mm(h), Mm(b), Mm(tf), Mm(tw)), "channel"));
        foreach (var (h, b, tf, tw) in new (double, double, double, double)[] { (60, 60, 5, 4), (80, 80, 6, 4), (100, 100, 7, 5), (120, 120, 8, 5), (150, 150, 9, 6), (200, 150, 10, 7), (250, 200, 12, 8) })
            list.Add(new CatalogueEntry($"I {N(h)}x{N(b)}x{N(tf)}x{N(tw)}", new ISection(Mm(h), Mm(b), Mm(tf), Mm(tw)), "I"));
        return list;
    }
}
