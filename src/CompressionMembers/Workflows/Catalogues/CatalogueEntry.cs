using System;
using CompressionMembers.Internal;
using CompressionMembers.Materials;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Workflows.Catalogues;

/// <summary>One named section of a catalogue: its designation, the section, the shape family it belongs to and, where the
/// catalogue gives one, its mass per metre.</summary>
/// <remarks>
/// <para>The family ("RHS", "sawn", "glulam", …) groups sections whose resistance grows with size; size selection prunes
/// only within a family. Without a stated mass per metre, <see cref="MassPerMetreFor"/> takes ρ·A of the member's material.</para>
/// <para>Thread safety: immutable reference type.</para>
/// </remarks>
[Immutable]
public sealed class CatalogueEntry
{
    /// <summary>Creates an entry.</summary>
    /// <param name="designation">The name the catalogue gives the section, such as "RHS 100x50x4"; not empty.</param>
    /// <param name="section">The section.</param>
    /// <param name="family">The shape family; the section kind's name when null or empty.</param>
    /// <param name="massPerMetre">Mass per metre if the catalogue states it (greater than 0), else null.</param>
    /// <exception cref="ArgumentException">The designation is empty.</exception>
    /// <exception cref="ArgumentNullException">The section is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The mass per metre is not finite or not greater than 0.</exception>
    public CatalogueEntry(string designation, Section section, string? family = null, LinearDensity? massPerMetre = null)
    {
        if (string.IsNullOrWhiteSpace(designation))
            throw new ArgumentException("A catalogue entry's designation must not be empty.", nameof(designation));
        ArgumentNullException.ThrowIfNull(section);
        if (massPerMetre is { } m)
            Guard.Positive(m.KilogramsPerMeter, nameof(massPerMetre), "kg/m", "Mass per metre");
        Designation = designation.Trim();
        Section = section;
        Family = string.IsNullOrWhiteSpace(family) ? section.Kind.ToString() : family.Trim();
        MassPerMetre = massPerMetre;
        AreaM2 = section.Props.AreaM2;
    }

    /// <summary>The catalogue's name for the section.</summary>
    public string Designation { get; }

    /// <summary>The section.</summary>
    public Section Section { get; }

    /// <summary>The shape family (pruning never crosses families).</summary>
    public string Family { get; }

    /// <summary>Mass per metre as the catalogue states it, or null.</summary>
    public LinearDensity? MassPerMetre { get; }

    internal double AreaM2 { get; }

    /// <summary>Mass per metre: the stated value, else ρ·A of the material.</summary>
    /// <param name="material">The material of the member.</param>
    /// <returns>The mass per metre.</returns>
    /// <exception cref="ArgumentNullException">The material is null.</exception>
    public LinearDensity MassPerMetreFor(Material material)
    {
        ArgumentNullException.ThrowIfNull(material);
        return LinearDensity.FromKilogramsPerMeter(MassPerMetreKgM(material));
    }

    internal double MassPerMetreKgM(Material material) => MassPerMetre?.KilogramsPerMeter ?? material.DensityKgM3 * AreaM2;

    /// <inheritdoc/>
    public override string ToString() => $"{Designation} ({Family})";
}
