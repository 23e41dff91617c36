using System;
using CompressionMembers.Internal;
using CompressionMembers.Materials;
using CompressionMembers.Workflows.Catalogues;

namespace CompressionMembers.Workflows.Selection;

/// <summary>What "lightest" means when choosing a section: area, mass per metre, or a user's own measure. Lower is better.</summary>
/// <remarks>Thread safety: immutable; a custom function must be pure and thread-safe.</remarks>
[Immutable]
public sealed class SelectionObjective
{
    private readonly Func<CatalogueEntry, Material, double> _measure;

    private SelectionObjective(string name, string unit, Func<CatalogueEntry, Material, double> measure)
    {
        Name = name;
        Unit = unit;
        _measure = measure;
    }

    /// <summary>Smallest cross-sectional area (m² internally; shown in mm²).</summary>
    public static SelectionObjective Area { get; } = new("area", "mm²", (e, _) => e.AreaM2 * 1e6);

    /// <summary>Smallest mass per metre: the catalogue's stated value, else ρ·A of the member's material (kg/m).</summary>
    public static SelectionObjective Mass { get; } = new("mass per metre", "kg/m", (e, m) => e.MassPerMetreKgM(m));

    /// <summary>A user's own measure, such as cost per metre; lower is better, and it must be finite.</summary>
    /// <param name="name">A name for reports.</param>
    /// <param name="unit">The unit the measure is in (may be empty).</param>
    /// <param name="measure">The measure of an entry for a material.</param>
    /// <returns>The objective.</returns>
    /// <exception cref="ArgumentException">The name is empty.</exception>
    /// <exception cref="ArgumentNullException">The measure is null.</exception>
    public static SelectionObjective Custom(string name, string unit, Func<CatalogueEntry, Material, double> measure)
    {
        if (string.IsNullOrWhiteSpace(name)) throw new ArgumentException("An objective's name must not be empty.", nameof(name));
        ArgumentNullException.ThrowIfNull(measure);
        return new SelectionObjective(name, unit ?? "", measure);
    }

    /// <summary>The objective's name.</summary>
    public string Name { get; }

    /// <summary>The unit its values are in.</summary>
    public string Unit { get; }

    /// <summary>The measure of an entry for a material.</summary>
    /// <param name="entry">The entry.</param>
    /// <param name="material">The member's material.</param>
    /// <returns>The value (lower is better).</returns>
    /// <exception cref="InvalidOperationException">The measure is not finite.</exception>
    public double Measure(CatalogueEntry entry, Material material)
    {
        ArgumentNullException.ThrowIfNull(entry);
        ArgumentNullException.ThrowIfNull(material);
        double v = _measure(entry, material);
        if (!double.IsFinite(v))
            throw new InvalidOperationException($"The objective \"{Name}\" gave {Guard.Show(v)} for \"{entry.Designation}\"; an objective must be finite.");
        return v;
    }

    /// <inheritdoc/>
    public override string ToString() => Name;
}
