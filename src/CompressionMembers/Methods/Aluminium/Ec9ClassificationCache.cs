using System;
using System.Runtime.CompilerServices;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Sections;

namespace CompressionMembers.Methods.Aluminium;

/// <summary>The EN 1999-1-1 classification of one section in one alloy, welded or not: the classified section, its
/// plates, and the alloy values the check reads (thickness range, fu in Pa), all computed once. Immutable once built.</summary>
internal sealed class Ec9SectionEntry
{
    private readonly Ec9Plate[] _plates;

    internal Ec9SectionEntry(Section section, AluminiumAlloy alloy, bool welded)
    {
        Alloy = alloy;
        Welded = welded;
        _plates = new Ec9Plate[Ec9Section.MaxPlates];
        Result = Ec9Section.Classify(section, _plates, alloy.CompressiveStrengthPa, alloy.BucklingClass, welded);
        ThicknessCovered = alloy.CoversThicknessM(Result.MinThicknessM) && alloy.CoversThicknessM(Result.MaxThicknessM);
        UltimateStrengthPa = alloy.UltimateStrength.Pascals;
    }

    internal AluminiumAlloy Alloy { get; }
    internal bool Welded { get; }

    /// <summary>The classified section (as <see cref="Ec9Section.Classify"/> returns it).</summary>
    internal readonly Ec9Classified Result;

    /// <summary>Whether the alloy's values hold for the thinnest and the thickest part.</summary>
    internal bool ThicknessCovered { get; }

    /// <summary>fu of the alloy, Pa.</summary>
    internal double UltimateStrengthPa { get; }

    /// <summary>The classified plates (read only; the first <see cref="Ec9Classified.Count"/> are used).</summary>
    internal ReadOnlySpan<Ec9Plate> Plates => _plates;
}

/// <summary>
/// A per-section cache of <see cref="Ec9SectionEntry"/>, so that a member checked many times (parametric studies, load
/// cases) is classified once, not twice per check (applicability and evaluation). Keyed weakly by the section (an
/// immutable class): an entry lives as long as its section does. Each section keeps a small immutable array of entries
/// (one per alloy and welding); a new entry replaces the array atomically (<see cref="ConditionalWeakTable{TKey, TValue}.AddOrUpdate"/>).
/// Two threads that miss at once both compute the same deterministic entry and one of them is kept, so every
/// thread sees bit-identical values. Thread safety: safe from any number of threads.
/// </summary>
internal static class Ec9ClassificationCache
{
    private const int MaxEntriesPerSection = 8;
    private static readonly ConditionalWeakTable<Section, Ec9SectionEntry[]> Table = new();

    /// <summary>When true on the current thread, <see cref="Get"/> classifies afresh and stores nothing (tests compare
    /// the cached and uncached results with it).</summary>
    [ThreadStatic] internal static bool BypassOnThisThread;

    internal static Ec9SectionEntry Get(Section section, AluminiumAlloy alloy, bool welded)
    {
        if (BypassOnThisThread) return new Ec9SectionEntry(section, alloy, welded);
        Table.TryGetValue(section, out var entries);
        if (entries is not null)
        {
            foreach (var e in entries)
                if (ReferenceEquals(e.Alloy, alloy) && e.Welded == welded) return e;
        }
        var fresh = new Ec9SectionEntry(section, alloy, welded);
        Ec9SectionEntry[] next;
        if (entries is null || entries.Length >= MaxEntriesPerSection) next = [fresh];
        else
        {
            next = new Ec9SectionEntry[entries.Length + 1];
            entries.CopyTo(next, 0);
            next[^1] = fresh;
        }
        Table.AddOrUpdate(section, next);
        return fresh;
    }
}
