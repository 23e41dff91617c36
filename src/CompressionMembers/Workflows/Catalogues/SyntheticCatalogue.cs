using System;
using System.Collections.Generic;
using System.Globalization;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Workflows.Catalogues;

/// <summary>Large invented catalogues for tests and benchmarks: four families (round tubes, square tubes, solid
/// rectangles, I-shapes), each a geometric series of one shape scaled by a constant factor. Invented dimensions, not a
/// product list.</summary>
internal static class SyntheticCatalogue
{
    internal static SectionCatalogue Scaled(int count)
    {
        if (count < 4) throw new ArgumentOutOfRangeException(nameof(count), count, "A synthetic catalogue needs at least 4 sections.");
        var inv = CultureInfo.InvariantCulture;
        var list = new List<CatalogueEntry>(count);
        int perFamily = count / 4;
        double ratio = Math.Pow(12.0, 1.0 / Math.Max(1, perFamily - 1)); // each family spans a factor of 12 in size
        for (int f = 0; f < 4; f++)
        {
            int n = f < 3 ? perFamily : count - 3 * perFamily;
            for (int k = 0; k < n; k++)
            {
                double s = Math.Pow(ratio, k);
                static Length Mm(double v) => Length.FromMillimeters(Math.Round(v, 3));
                string tag = k.ToString("D4", inv);
                list.Add(f switch
                {
                    0 => new CatalogueEntry($"syn-CHS-{tag}", new CircularHollowSection(Mm(20 * s), Mm(1.5 * s)), "syn-CHS"),
                    1 => new CatalogueEntry($"syn-SHS-{tag}", new RectangularHollowSection(Mm(20 * s), Mm(20 * s), Mm(1.5 * s)), "syn-SHS"),
                    2 => new CatalogueEntry($"syn-rect-{tag}", new RectangleSection(Mm(12 * s), Mm(18 * s)), "syn-rect"),
                    _ => new CatalogueEntry($"syn-I-{tag}", new ISection(Mm(25 * s), Mm(25 * s), Mm(2 * s), Mm(1.5 * s)), "syn-I"),
                });
            }
        }
        return SectionCatalogue.Create($"synthetic scaled ({count})", "invented for tests and benchmarks", list);
    }
}
