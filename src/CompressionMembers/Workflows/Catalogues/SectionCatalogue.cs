using System;
using System.Collections.Generic;
using CompressionMembers.Internal;

namespace CompressionMembers.Workflows.Catalogues;

/// <summary>An immutable, named list of catalogue entries with unique designations: the sections size selection
/// chooses from and schedules refer to by name.</summary>
/// <remarks>
/// <para>Built-in catalogues are in <see cref="SectionCatalogues"/>; user catalogues come from <see cref="Create"/>,
/// <see cref="CatalogueFiles.ReadCsv"/> and <see cref="CatalogueFiles.ReadJson"/>.
/// Designations are compared without regard to case.</para>
/// <para>Thread safety: immutable reference type.</para>
/// </remarks>
[Immutable]
public sealed class SectionCatalogue
{
    private readonly CatalogueEntry[] _entries;
    private readonly Dictionary<string, CatalogueEntry> _byName;

    private SectionCatalogue(string name, string source, CatalogueEntry[] entries, Dictionary<string, CatalogueEntry> byName)
    {
        Name = name;
        Source = source;
        _entries = entries;
        _byName = byName;
    }

    /// <summary>Creates a catalogue.</summary>
    /// <param name="name">The catalogue's name, such as "aluminium generic shapes"; not empty.</param>
    /// <param name="source">Where the dimensions come from (or "user-defined"); not empty.</param>
    /// <param name="entries">The entries; at least one, designations unique (ignoring case).</param>
    /// <returns>The catalogue.</returns>
    /// <exception cref="ArgumentException">A name is empty, the list is empty, or a designation repeats.</exception>
    /// <exception cref="ArgumentNullException">The list or an entry is null.</exception>
    public static SectionCatalogue Create(string name, string source, IEnumerable<CatalogueEntry> entries)
    {
        if (string.IsNullOrWhiteSpace(name)) throw new ArgumentException("A catalogue's name must not be empty.", nameof(name));
        if (string.IsNullOrWhiteSpace(source)) throw new ArgumentException("A catalogue's source must not be empty; say \"user-defined\" for your own.", nameof(source));
        ArgumentNullException.ThrowIfNull(entries);
        var list = new List<CatalogueEntry>();
        var byName = new Dictionary<string, CatalogueEntry>(StringComparer.OrdinalIgnoreCase);
        foreach (var e in entries)
        {
            if (e is null) throw new ArgumentNullException(nameof(entries), $"Entry {list.Count + 1} of catalogue \"{name}\" is null.");
            if (!byName.TryAdd(e.Designation, e))
                throw new ArgumentException($"Catalogue \"{name}\" lists the designation \"{e.Designation}\" twice; designations must be unique (ignoring case).", nameof(entries));
            list.Add(e);
        }
        if (list.Count == 0) throw new ArgumentException($"Catalogue \"{name}\" has no entries.", nameof(entries));
        return new SectionCatalogue(name.Trim(), source.Trim(), list.ToArray(), byName);
    }

    /// <summary>The catalogue's name.</summary>
    public string Name { get; }

    /// <summary>Where the dimensions come from.</summary>
    public string Source { get; }

    /// <summary>The entries, in the catalogue's own order.</summary>
    public IReadOnlyList<CatalogueEntry> Entries => _entries;

    /// <summary>Number of entries.</summary>
    public int Count => _entries.Length;

    /// <summary>Finds an entry by designation (ignoring case).</summary>
    /// <param name="designation">The designation.</param>
    /// <param name="entry">The entry, if found.</param>
    /// <returns>Whether it was found.</returns>
    public bool TryFind(string designation, [System.Diagnostics.CodeAnalysis.NotNullWhen(true)] out CatalogueEntry? entry)
    {
        entry = null;
        return designation is not null && _byName.TryGetValue(designation.Trim(), out entry);
    }

    /// <summary>The entry with this designation.</summary>
    /// <param name="designation">The designation (ignoring case).</param>
    /// <returns>The entry.</returns>
    /// <exception cref="KeyNotFoundException">No entry has that designation.</exception>
    public CatalogueEntry this[string designation] => TryFind(designation, out var e) ? e
        : throw new KeyNotFoundException($"Catalogue \"{Name}\" has no section \"{designation}\".");

    /// <summary>A catalogue of the entries of one family only.</summary>
    /// <param name="family">The family (ignoring case).</param>
    /// <returns>The sub-catalogue.</returns>
    /// <exception cref="ArgumentException">No entry belongs to the family.</exception>
    public SectionCatalogue OnlyFamily(string family)
    {
        var list = new List<CatalogueEntry>();
        foreach (var e in _entries) if (string.Equals(e.Family, family, StringComparison.OrdinalIgnoreCase)) list.Add(e);
        if (list.Count == 0) throw new ArgumentException($"Catalogue \"{Name}\" has no section of family \"{family}\".", nameof(family));
        return Create(Name + " (" + family + ")", Source, list);
    }

    /// <inheritdoc/>
    public override string ToString() => $"{Name}: {Count} sections";
}
