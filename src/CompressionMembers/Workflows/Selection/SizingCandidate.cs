using CompressionMembers.Internal;
using CompressionMembers.Workflows.Catalogues;

namespace CompressionMembers.Workflows.Selection;

/// <summary>A section that passes every action case of a member, with the value of the objective and the governing
/// utilisation (the largest over the cases), as found by the real check.</summary>
/// <remarks>Thread safety: immutable reference type.</remarks>
[Immutable]
public sealed class SizingCandidate
{
    internal SizingCandidate(CatalogueEntry entry, int index, double objective, double utilisation, string governingCase, double resistanceN)
    {
        Entry = entry;
        CatalogueIndex = index;
        Objective = objective;
        Utilisation = utilisation;
        GoverningCase = governingCase;
        DesignResistanceN = resistanceN;
    }

    /// <summary>The catalogue entry.</summary>
    public CatalogueEntry Entry { get; }

    /// <summary>Its position in the catalogue (ties of the objective go to the earlier entry).</summary>
    public int CatalogueIndex { get; }

    /// <summary>The objective's value (area in mm², mass in kg/m, or the user's measure).</summary>
    public double Objective { get; }

    /// <summary>The governing utilisation: the largest over the action cases.</summary>
    public double Utilisation { get; }

    /// <summary>The name of the action case that governs.</summary>
    public string GoverningCase { get; }

    /// <summary>Design resistance in the governing case, N.</summary>
    public double DesignResistanceN { get; }

    /// <inheritdoc/>
    public override string ToString() => $"{Entry.Designation}: utilisation {Guard.Show(Utilisation)} ({GoverningCase})";
}
