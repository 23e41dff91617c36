using System;
using System.Collections.Generic;
using CompressionMembers.Internal;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Materials.Timber;

/// <summary>
/// Standard timber sizes as facts of the trade: US nominal versus dressed dimension lumber and timbers, common metric
/// sawn sizes, and glulam built up from laminations.
/// </summary>
/// <remarks>
/// <para>US sizes: dry dressed dimensions of American Softwood Lumber Standard PS 20 as tabulated in the NDS Supplement
/// Table 1A (from memory): dimension lumber (nominal 2 to 4 in thick) loses ½ in on the thickness and on widths up to 6 in,
/// ¾ in on widths of 8 in and more (a nominal 2×4 is 1.5 × 3.5 in, a 2×8 is 1.5 × 7.25 in); timbers (5 × 5 in and larger)
/// lose ½ in on each face. Metric sawn sizes are the common European sizes of EN 336 (from memory; common practice),
/// glulam widths those commonly stocked, depths a whole number of 45 mm laminations (common practice, EN 14080 allows
/// others). Sections are built with the thickness (the smaller size) as the width b along y and the other size as the
/// depth h along z. Thread safety: stateless; the lists are immutable.</para>
/// </remarks>
public static class TimberSizes
{
    /// <summary>Source of the US sizes, for reports.</summary>
    public const string UsSizesSource = "PS 20 / NDS Supplement Table 1A, dry dressed sizes (from memory)";

    /// <summary>The dressed size, in inches, of a nominal US size.</summary>
    /// <param name="nominalInches">The nominal size: 2, 3, 4, 5, 6, 8, 10, 12, 14 or 16.</param>
    /// <param name="isTimber">True for timbers (5 × 5 in and larger: nominal − ½ in); false for dimension lumber.</param>
    /// <returns>The dressed size.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The nominal size is not one listed, or a timber size below 5 in.</exception>
    public static Length UsDressedSize(int nominalInches, bool isTimber)
    {
        if (nominalInches is not (2 or 3 or 4 or 5 or 6 or 8 or 10 or 12 or 14 or 16))
            throw new ArgumentOutOfRangeException(nameof(nominalInches), nominalInches,
                $"Nominal size must be 2, 3, 4, 5, 6, 8, 10, 12, 14 or 16 in; got {nominalInches} in.");
        if (isTimber && nominalInches < 5)
            throw new ArgumentOutOfRangeException(nameof(nominalInches), nominalInches, $"Timbers are 5 in nominal and larger; got {nominalInches} in.");
        double d = isTimber || nominalInches <= 6 ? nominalInches - 0.5 : nominalInches - 0.75;
        return Length.FromInches(d);
    }

    /// <summary>A US sawn section from its nominal sizes, such as (2, 4) for a 2×4 (1.5 × 3.5 in dressed).</summary>
    /// <param name="nominalThickness">Nominal thickness in inches (2, 3, 4 for dimension lumber; 5 and more for timbers).</param>
    /// <param name="nominalWidth">Nominal width in inches, at least the thickness.</param>
    /// <returns>The dressed rectangle: b = dressed thickness (along y), h = dressed width (along z).</returns>
    /// <exception cref="ArgumentOutOfRangeException">A size is not a listed nominal size, or the width is less than the thickness.</exception>
    public static RectangleSection UsNominal(int nominalThickness, int nominalWidth)
    {
        if (nominalWidth < nominalThickness)
            throw new ArgumentOutOfRangeException(nameof(nominalWidth), nominalWidth,
                $"Nominal width must be at least the nominal thickness ({nominalThickness} in); got {nominalWidth} in.");
        bool timber = nominalThickness >= 5;
        if (nominalThickness is not (2 or 3 or 4) && !timber)
            throw new ArgumentOutOfRangeException(nameof(nominalThickness), nominalThickness,
                $"Nominal thickness must be 2, 3 or 4 in (dimension lumber) or 5 in and more (timbers); got {nominalThickness} in.");
        return new RectangleSection(UsDressedSize(nominalThickness, timber), UsDressedSize(nominalWidth, timber));
    }

    private static Length[] Mm(params double[] v)
    {
        var a = new Length[v.Length];
        for (int i = 0; i < v.Length; i++) a[i] = Length.FromMillimeters(v[i]);
        return a;
    }

    /// <summary>Common metric sawn thicknesses (EN 336, from memory; common practice): 38, 47, 63, 75, 100, 150, 200 mm.</summary>
    public static IReadOnlyList<Length> MetricSawnThicknesses { get; } = Mm(38, 47, 63, 75, 100, 150, 200);

    /// <summary>Common metric sawn widths (EN 336, from memory; common practice): 75 to 300 mm.</summary>
    public static IReadOnlyList<Length> MetricSawnWidths { get; } = Mm(75, 100, 125, 150, 175, 200, 225, 250, 300);

    /// <summary>Commonly stocked glulam widths (common practice): 90, 115, 140, 165, 190, 215, 240 mm.</summary>
    public static IReadOnlyList<Length> GlulamWidths { get; } = Mm(90, 115, 140, 165, 190, 215, 240);

    /// <summary>A metric sawn section, thickness along y and width along z.</summary>
    /// <param name="thicknessMm">Thickness in mm.</param>
    /// <param name="widthMm">Width in mm.</param>
    /// <returns>The rectangle.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A size is not finite or not positive.</exception>
    public static RectangleSection Metric(double thicknessMm, double widthMm) =>
        new(Length.FromMillimeters(thicknessMm), Length.FromMillimeters(widthMm));

    /// <summary>A glulam section of a width and a whole number of laminations (45 mm each unless given).</summary>
    /// <param name="width">Width b (along y).</param>
    /// <param name="laminations">Number of laminations, at least 2.</param>
    /// <param name="laminationThickness">Lamination thickness (45 mm if null); EN 14080 limits it to 45 mm for service classes 1 and 2 and 35 mm in service class 3 (from memory).</param>
    /// <returns>The rectangle, depth h = laminations × thickness (along z).</returns>
    /// <exception cref="ArgumentOutOfRangeException">Fewer than 2 laminations, or a size not finite and positive.</exception>
    public static RectangleSection Glulam(Length width, int laminations, Length? laminationThickness = null)
    {
        if (laminations < 2)
            throw new ArgumentOutOfRangeException(nameof(laminations), laminations, $"Glulam needs at least 2 laminations; got {laminations}.");
        var t = laminationThickness ?? Length.FromMillimeters(45);
        double tm = Si.Meters(t, nameof(laminationThickness), "Lamination thickness");
        return new RectangleSection(width, Length.FromMeters(tm * laminations).ToUnit(t.Unit));
    }
}
