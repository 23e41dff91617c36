using System;
using CompressionMembers.Internal;
using CompressionMembers.Materials.Aluminium;
using UnitsNet;

namespace CompressionMembers.Methods.Aluminium;

/// <summary>
/// How an aluminium member is welded, for the EN 1999-1-1 check: no welds, transverse welds at the ends, or
/// longitudinal welds with a given heat-affected area. The process (MIG or TIG) selects the alloy's ρo,haz and ρu,haz.
/// </summary>
/// <remarks>
/// <para>What follows from each choice (see docs/methods-aluminium.md):
/// <see cref="WeldLocation.EndsOnly"/> — flexural and torsional buckling use the unwelded member (κ = 1, unwelded class
/// limits) and the welded end section is checked by 6.2.4 with the whole section heat-affected;
/// <see cref="WeldLocation.Longitudinal"/> — welded class limits for every part, κ of 6.3.1.1 Table 6.5 for flexural
/// buckling with A1 = A − Ahaz (1 − ρo,haz), and the HAZ-reduced effective area for torsional buckling and for the
/// cross-section.</para>
/// <para>Thread safety: immutable reference type.</para>
/// </remarks>
[Immutable]
public sealed class AluminiumWelding
{
    private AluminiumWelding(WeldLocation location, WeldingProcess process, double hazAreaM2, string description)
    {
        Location = location;
        Process = process;
        HeatAffectedAreaM2 = hazAreaM2;
        Description = description;
    }

    /// <summary>An unwelded member.</summary>
    public static AluminiumWelding None { get; } = new(WeldLocation.None, WeldingProcess.Mig, 0, "unwelded");

    /// <summary>Transverse welds at the ends only.</summary>
    /// <param name="process">MIG or TIG.</param>
    /// <returns>The welding.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The process is undefined.</exception>
    public static AluminiumWelding AtEnds(WeldingProcess process)
    {
        CheckProcess(process);
        return new(WeldLocation.EndsOnly, process, 0, $"transverse {Name(process)} welds at the ends");
    }

    /// <summary>Longitudinal welds whose heat-affected area (within bhaz of the welds, summed over every part) you give.</summary>
    /// <param name="process">MIG or TIG.</param>
    /// <param name="heatAffectedArea">Ahaz, greater than 0 (it must not exceed the section's area; the method checks).</param>
    /// <returns>The welding.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The process is undefined or the area is not finite and positive.</exception>
    public static AluminiumWelding Longitudinal(WeldingProcess process, Area heatAffectedArea)
    {
        CheckProcess(process);
        double a = Si.SquareMeters(heatAffectedArea, nameof(heatAffectedArea), "Heat-affected area");
        return new(WeldLocation.Longitudinal, process, a, $"longitudinal {Name(process)} welds, Ahaz = {Guard.Show(a * 1e6)} mm² (given)");
    }

    /// <summary>Longitudinal welds given as a number of seams in plates of one thickness: Ahaz = seams × 2 bhaz(t) × t, the
    /// HAZ reaching bhaz on both sides of each seam within the plate (an assumption of this library; give the area
    /// yourself with <see cref="Longitudinal(WeldingProcess, Area)"/> for any other layout).</summary>
    /// <param name="process">MIG or TIG.</param>
    /// <param name="seams">Number of longitudinal weld seams, at least 1.</param>
    /// <param name="plateThickness">Thickness of the plates the seams are in.</param>
    /// <returns>The welding.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The process is undefined, seams &lt; 1, or the thickness is not covered by <see cref="HeatAffectedExtent"/>.</exception>
    public static AluminiumWelding LongitudinalSeams(WeldingProcess process, int seams, Length plateThickness)
    {
        CheckProcess(process);
        if (seams < 1 || seams > 1000)
            throw new ArgumentOutOfRangeException(nameof(seams), seams, $"Number of weld seams must be between 1 and 1000; got {seams}.");
        double t = Si.Meters(plateThickness, nameof(plateThickness), "Plate thickness");
        double b = HeatAffectedExtentM(process, t, nameof(plateThickness));
        double a = seams * 2 * b * t;
        return new(WeldLocation.Longitudinal, process, a,
            $"{seams} longitudinal {Name(process)} seam(s) in t = {Guard.Show(t * 1e3)} mm, Ahaz = {seams} × 2 × {Guard.Show(b * 1e3)} × {Guard.Show(t * 1e3)} = {Guard.Show(a * 1e6)} mm²");
    }

    /// <summary>The extent of the heat-affected zone bhaz from a weld, EN 1999-1-1 6.1.6.3 (values recalled, from memory):
    /// MIG 20 mm for t ≤ 6 mm, 30 mm for 6 &lt; t ≤ 12, 35 mm for 12 &lt; t ≤ 25, 40 mm above; TIG 30 mm for t ≤ 6 mm.
    /// For an interpass temperature above 60 °C the standard enlarges bhaz; that is not modelled.</summary>
    /// <param name="process">MIG or TIG.</param>
    /// <param name="thickness">Plate thickness.</param>
    /// <returns>bhaz.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The thickness is not finite and positive, or TIG above 6 mm.</exception>
    public static Length HeatAffectedExtent(WeldingProcess process, Length thickness)
    {
        CheckProcess(process);
        double t = Si.Meters(thickness, nameof(thickness), "Plate thickness");
        return Length.FromMillimeters(HeatAffectedExtentM(process, t, nameof(thickness)) * 1e3);
    }

    internal static double HeatAffectedExtentM(WeldingProcess process, double tM, string paramName)
    {
        double tMm = tM * 1e3;
        if (process == WeldingProcess.Tig)
        {
            if (tMm > 6)
                throw new ArgumentOutOfRangeException(paramName, tMm,
                    $"EN 1999-1-1 6.1.6.3 gives bhaz for TIG welding only up to t = 6 mm; got {Guard.Show(tMm)} mm. Give the heat-affected area yourself.");
            return 0.030;
        }
        return tMm <= 6 ? 0.020 : tMm <= 12 ? 0.030 : tMm <= 25 ? 0.035 : 0.040;
    }

    /// <summary>Where the member is welded.</summary>
    public WeldLocation Location { get; }
    /// <summary>The welding process (MIG for an unwelded member, where it has no effect).</summary>
    public WeldingProcess Process { get; }
    /// <summary>Heat-affected area Ahaz of longitudinal welds, m² (0 otherwise).</summary>
    public double HeatAffectedAreaM2 { get; }
    /// <summary>Heat-affected area Ahaz of longitudinal welds (zero otherwise).</summary>
    public Area HeatAffectedArea => Area.FromSquareMillimeters(HeatAffectedAreaM2 * 1e6);
    /// <summary>A description for reports.</summary>
    public string Description { get; }
    /// <summary>Whether the member has any weld.</summary>
    public bool IsWelded => Location != WeldLocation.None;

    /// <inheritdoc/>
    public override string ToString() => Description;

    private static string Name(WeldingProcess p) => p == WeldingProcess.Tig ? "TIG" : "MIG";

    private static void CheckProcess(WeldingProcess process)
    {
        if (!Enum.IsDefined(process)) throw new ArgumentOutOfRangeException(nameof(process), process, $"Unknown welding process {(int)process}.");
    }
}
