using System;
using System.Runtime.CompilerServices;
using System.Threading;
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
/// cases) is classified once, not twice per check (applicability and evaluation). The entries hang on the section
/// itself (<see cref="Section.Ec9Entries"/>, an internal slot): an entry lives as long as its section does, and a hit is
/// one field read and a short scan, with no hashing or weak-table lookup. Each section keeps a small immutable array of
/// entries (one per alloy and welding); a new entry is published with a compare-and-swap, retried when another thread
/// published first, so no entry is ever lost to a race (a thread that found its entry once keeps finding it). Two
/// threads that miss at once both compute the same deterministic entry and one of them is kept, so every thread sees
/// bit-identical values. Past <see cref="MaxEntriesPerSection"/> combinations the array starts afresh. Thread safety:
/// safe from any number of threads.
/// </summary>
internal static class Ec9ClassificationCache
{
    internal const int MaxEntriesPerSection = 32;

    /// <summary>When true on the current thread, <see cref="Get"/> classifies afresh and stores nothing (tests compare
    /// the cached and uncached results with it).</summary>
    [ThreadStatic] internal static bool BypassOnThisThread;

    internal static Ec9SectionEntry Get(Section section, AluminiumAlloy alloy, bool welded)
    {
        if (BypassOnThisThread) return new Ec9SectionEntry(section, alloy, welded);
        var entries = Volatile.Read(ref section.Ec9Entries);
        if (entries is not null)
        {
            foreach (var e in entries)
                if (ReferenceEquals(e.Alloy, alloy) && e.Welded == welded) return e;
        }
        return Add(section, alloy, welded, entries);
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static Ec9SectionEntry Add(Section section, AluminiumAlloy alloy, bool welded, Ec9SectionEntry[]? seen)
    {
        var fresh = new Ec9SectionEntry(section, alloy, welded);
        while (true)
        {
            Ec9SectionEntry[] next;
            if (seen is null || seen.Length >= MaxEntriesPerSection) next = [fresh];
            else
            {
                next = new Ec9SectionEntry[seen.Length + 1];
                seen.CopyTo(next, 0);
                next[^1] = fresh;
            }
            var found = Interlocked.CompareExchange(ref section.Ec9Entries, next, seen);
            if (ReferenceEquals(found, seen)) return fresh;
            // Another thread published first: keep its entry if it is ours, else add ours to what it published.
            seen = found;
            if (seen is not null)
                foreach (var e in seen)
                    if (ReferenceEquals(e.Alloy, alloy) && e.Welded == welded) return e;
        }
    }
}
