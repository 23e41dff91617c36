using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using CompressionMembers.Workflows.Json;
using UnitsNet;

namespace CompressionMembers.Workflows.Catalogues;

/// <summary>Reads user catalogues from CSV and JSON files of our own format (docs/schedule-format.md, "Catalogue files").</summary>
/// <remarks>
/// <para>CSV: a header line <c>designation,family,section,mass_kg_per_m</c> (family and mass may be left out or empty),
/// then one section a line; <c>section</c> is a <see cref="SectionSpec"/> such as "rhs 100x50x4".</para>
/// <para>JSON: <c>{"format": "compression-members/catalogue@1", "name": …, "source": …, "sections": [{"designation": …,
/// "family": …, "section": …, "mass_kg_per_m": …}]}</c>; unknown fields are errors.</para>
/// <para>Any error names the line (CSV) or entry (JSON) and throws <see cref="FormatException"/>: a catalogue is
/// reference data and is not read in part. Thread safety: stateless.</para>
/// </remarks>
public static class CatalogueFiles
{
    /// <summary>The format tag of a JSON catalogue.</summary>
    public const string JsonFormat = "compression-members/catalogue@1";

    private static readonly string[] CsvColumns = ["designation", "family", "section", "mass_kg_per_m"];

    /// <summary>Reads a CSV catalogue.</summary>
    /// <param name="reader">The text.</param>
    /// <param name="name">The catalogue's name.</param>
    /// <param name="source">Where the dimensions come from ("user-defined" for your own).</param>
    /// <returns>The catalogue.</returns>
    /// <exception cref="FormatException">A header or line is wrong (the message names the line).</exception>
    public static SectionCatalogue ReadCsv(TextReader reader, string name, string source)
    {
        var table = CsvTable.Read(reader, CsvColumns, ["designation", "section"], "catalogue CSV");
        var entries = new List<CatalogueEntry>();
        foreach (var (line, fields, extra) in table.Rows)
        {
            try
            {
                if (extra) throw new FormatException("the line has more fields than the header.");
                entries.Add(MakeEntry(table.Get(fields, "designation"), table.Get(fields, "family"), table.Get(fields, "section"), ParseOptional(table.Get(fields, "mass_kg_per_m"))));
            }
            catch (Exception ex) when (ex is ArgumentException or FormatException)
            {
                throw new FormatException($"Line {line}: {ex.Message}", ex);
            }
        }
        try { return SectionCatalogue.Create(name, source, entries); }
        catch (ArgumentException ex) { throw new FormatException(ex.Message, ex); }
    }

    /// <summary>Reads a JSON catalogue.</summary>
    /// <param name="stream">The UTF-8 JSON.</param>
    /// <param name="maxBytes">The largest input accepted (64 MiB by default).</param>
    /// <returns>The catalogue.</returns>
    /// <exception cref="FormatException">The JSON is invalid, has unknown fields, is too large or deep, or an entry is wrong.</exception>
    public static SectionCatalogue ReadJson(Stream stream, long maxBytes = StrictJson.DefaultMaxBytes)
    {
        var dto = StrictJson.Read(stream, WorkflowJsonContext.Default.CatalogueFileDto, maxBytes, "catalogue JSON");
        if (dto.Format != JsonFormat)
            throw new FormatException($"The catalogue JSON has format \"{dto.Format}\"; expected \"{JsonFormat}\".");
        var entries = new List<CatalogueEntry>();
        var list = dto.Sections ?? throw new FormatException("The catalogue JSON has no \"sections\" list.");
        for (int i = 0; i < list.Count; i++)
        {
            var e = list[i];
            try { entries.Add(MakeEntry(e.Designation, e.Family, e.Section, e.MassKgPerM)); }
            catch (Exception ex) when (ex is ArgumentException or FormatException)
            {
                throw new FormatException($"sections[{i}]: {ex.Message}", ex);
            }
        }
        try { return SectionCatalogue.Create(dto.Name ?? "", dto.Source ?? "", entries); }
        catch (ArgumentException ex) { throw new FormatException(ex.Message, ex); }
    }

    private static CatalogueEntry MakeEntry(string? designation, string? family, string? section, double? massKgPerM)
    {
        if (string.IsNullOrWhiteSpace(designation)) throw new FormatException("the designation is empty.");
        if (string.IsNullOrWhiteSpace(section)) throw new FormatException($"section \"{designation}\" has no section spec; use one of {SectionSpec.Forms}.");
        var s = SectionSpec.Parse(section);
        return new CatalogueEntry(designation, s, family, massKgPerM is { } m ? LinearDensity.FromKilogramsPerMeter(m) : null);
    }

    private static double? ParseOptional(string? text)
    {
        if (string.IsNullOrWhiteSpace(text)) return null;
        if (!double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var v))
            throw new FormatException($"mass_kg_per_m \"{text}\" is not a number (use a point as the decimal separator).");
        return v;
    }
}
