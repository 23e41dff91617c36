using System;
using System.Collections.Generic;
using System.IO;
using CsvHelper;

namespace CompressionMembers.Workflows.Catalogues;

/// <summary>A CSV file read through CsvHelper into its header and rows of text, each row with the line it starts on;
/// unknown columns are errors.</summary>
internal sealed class CsvTable
{
    internal required string[] Header { get; init; }
    internal required List<(long Line, string[] Fields, bool ExtraFields)> Rows { get; init; }

    internal static CsvTable Read(TextReader text, IReadOnlyList<string> known, IReadOnlyList<string> required, string what)
    {
        ArgumentNullException.ThrowIfNull(text);
        var options = new CsvReaderOptions
        {
            Separator = ',',
            HasHeader = true,
            TrimWhitespace = true,
            TrackLineNumbers = true,
            SkipEmptyLines = true,
            CommentPrefix = '#',
            MaxRecordSize = 1 << 20,
        };
        using var reader = CsvReader.Create(text, options, true);
        reader.ReadHeader();
        var header = new string[reader.Headers.Count];
        for (int i = 0; i < header.Length; i++) header[i] = reader.Headers[i].Trim();
        if (header.Length == 0 || (header.Length == 1 && header[0].Length == 0))
            throw new FormatException($"The {what} is empty; expected a header line with the columns {string.Join(",", required)}.");
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var h in header)
        {
            if (!Contains(known, h))
                throw new FormatException($"Line 1: unknown column \"{h}\" in the {what}; the columns are {string.Join(", ", known)} (names are case-sensitive).");
            if (!seen.Add(h)) throw new FormatException($"Line 1: the column \"{h}\" appears twice in the {what}.");
        }
        foreach (var r in required)
            if (!seen.Contains(r)) throw new FormatException($"Line 1: the {what} has no column \"{r}\"; it needs {string.Join(", ", required)}.");
        var rows = new List<(long, string[], bool)>();
        while (reader.Read())
        {
            var fields = new string[header.Length];
            for (int i = 0; i < header.Length; i++) fields[i] = i < reader.FieldCount ? reader.GetString(i) : "";
            rows.Add((reader.LineNumber, fields, reader.FieldCount > header.Length));
        }
        return new CsvTable { Header = header, Rows = rows };
    }

    internal string? Get(string[] fields, string column)
    {
        int i = Array.IndexOf(Header, column);
        if (i < 0) return null;
        var v = fields[i];
        return string.IsNullOrWhiteSpace(v) ? null : v;
    }

    private static bool Contains(IReadOnlyList<string> list, string s)
    {
        foreach (var x in list) if (x == s) return true;
        return false;
    }
}
