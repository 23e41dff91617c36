using System;
using System.Collections.Generic;
using CompressionMembers.Internal;
using CompressionMembers.Materials;
using CompressionMembers.Methods;
using CompressionMembers.Sections;
using CompressionMembers.Workflows.Registry;

namespace CompressionMembers.Workflows.Schedules;

/// <summary>The names of one schedule read, resolved through a <see cref="NameRegistry"/> and remembered, so that each
/// distinct material, section and method text is parsed once however many rows repeat it.</summary>
/// <remarks>
/// <para>A text that cannot be resolved is remembered with its reason and refused again with the same message, so a row
/// reads exactly as it would without the memory. Values are immutable (materials, sections, methods) and may be shared
/// between rows. Each kind remembers at most <see cref="MaxEntriesPerKind"/> texts; beyond that a text is resolved
/// afresh every time, so memory stays bounded whatever the schedule holds.</para>
/// <para>It also remembers the designation text of the sections it handed out, for the results.</para>
/// <para>Thread safety: not thread-safe; one instance per reading thread.</para>
/// </remarks>
[Mutable]
internal sealed class ScheduleNames
{
    /// <summary>Most texts remembered per kind (materials, sections, methods).</summary>
    internal const int MaxEntriesPerKind = 256;

    private readonly NameRegistry _registry;
    private readonly Dictionary<string, (Material? Value, string? Error)> _materials = new(StringComparer.Ordinal);
    private readonly Dictionary<string, (Section? Value, string? Error)> _sections = new(StringComparer.Ordinal);
    private readonly Dictionary<string, (IResistanceMethod? Value, string? Error)> _methods = new(StringComparer.Ordinal);
    private readonly Dictionary<Section, string> _designations = new(ReferenceEqualityComparer.Instance);

    internal ScheduleNames(NameRegistry registry) => _registry = registry;

    /// <summary>How many times a text was resolved through the registry (for tests of the memory).</summary>
    internal int Resolutions { get; private set; }

    internal Material Material(string text)
    {
        if (_materials.TryGetValue(text, out var known)) return known.Value ?? throw new FormatException(known.Error);
        Material value;
        try { Resolutions++; value = _registry.Material(text); }
        catch (Exception ex) when (IsRowError(ex)) { Remember(_materials, text, (null, MemberSchedule.FirstLine(ex.Message))); throw; }
        Remember(_materials, text, (value, null));
        return value;
    }

    internal Section Section(string text)
    {
        if (_sections.TryGetValue(text, out var known)) return known.Value ?? throw new FormatException(known.Error);
        Section value;
        try { Resolutions++; value = _registry.Section(text); }
        catch (Exception ex) when (IsRowError(ex)) { Remember(_sections, text, (null, MemberSchedule.FirstLine(ex.Message))); throw; }
        Remember(_sections, text, (value, null));
        return value;
    }

    internal IResistanceMethod Method(string text)
    {
        if (_methods.TryGetValue(text, out var known)) return known.Value ?? throw new FormatException(known.Error);
        IResistanceMethod value;
        try { Resolutions++; value = _registry.Method(text); }
        catch (Exception ex) when (IsRowError(ex)) { Remember(_methods, text, (null, MemberSchedule.FirstLine(ex.Message))); throw; }
        Remember(_methods, text, (value, null));
        return value;
    }

    /// <summary>The designation of a section this memory resolved (a section's designation is formatted on every call;
    /// rows that share a section share its text).</summary>
    internal string Designation(Section section)
    {
        if (_designations.TryGetValue(section, out var text)) return text;
        text = section.Designation;
        Remember(_designations, section, text);
        return text;
    }

    /// <summary>The exceptions that make a row an error row (as <see cref="MemberSchedule"/> catches them).</summary>
    internal static bool IsRowError(Exception ex) => ex is ArgumentException or FormatException or KeyNotFoundException;

    private static void Remember<TKey, T>(Dictionary<TKey, T> memo, TKey key, T entry) where TKey : notnull
    {
        if (memo.Count < MaxEntriesPerKind) memo[key] = entry;
    }
}
