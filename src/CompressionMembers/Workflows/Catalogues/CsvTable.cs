using System;
using System.Collections.Generic;
using System.IO;
using CompressionMembers.Internal;

namespace CompressionMembers.Workflows.Catalogues;

/// <summary>A CSV file read (by our own <see cref="CsvRecordReader"/>) into its header and rows of text, each row with the
/// line it starts on; unknown columns are errors.</summary>
internal sealed class CsvTable
{
    internal required string[] Header { get; init; }
    internal required List<(long Line, string[] Fields, bool ExtraFields)> Rows { get; init; }

    internal static CsvTable Read(TextReader text, IReadOnlyList<string> known, IReadOnlyList<string> required, string what)
    {
        var reader = new CsvRecordReader(text);
        var header = ReadHeader(reader, known, required, what);
        var rows = new List<(long, string[], bool)>();
        var record = new List<string>();
        while (reader.Read(record, out long line)) rows.Add((line, Fields(record, header.Length), record.Count > header.Length));
        return new CsvTable { Header = header, Rows = rows };
    }

    /// <summary>The row's fields in header order: missing trailing fields are empty, extra ones are left out.</summary>
    internal static string[] Fields(List<string> record, int columns)
    {
        var fields = new string[columns];
        for (int i = 0; i < columns; i++) fields[i] = i < record.Count ? record[i] : "";
        return fields;
    }

    /// <summary>Reads and checks the header (the first record that is not a comment or blank line); messages name the
    /// header's own line.</summary>
    /// <exception cref="FormatException">The header is empty, or has an unknown, repeated or missing column.</exception>
    internal static string[] ReadHeader(CsvRecordReader reader, IReadOnlyList<string> known, IReadOnlyList<string> required, string what)
    {
        var record = new List<string>();
        reader.Read(record, out long line);
        var header = new string[record.Count];
        for (int i = 0; i < header.Length; i++) header[i] = record[i].Trim();
        if (header.Length == 0 || (header.Length == 1 && header[0].Length == 0))
            throw new FormatException($"The {what} is empty; expected a header line with the columns {string.Join(",", required)}.");
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var h in header)
        {
            if (!Contains(known, h))
                throw new FormatException($"Line {line}: unknown column \"{h}\" in the {what}; the columns are {string.Join(", ", known)} (names are case-sensitive).");
            if (!seen.Add(h)) throw new FormatException($"Line {line}: the column \"{h}\" appears twice in the {what}.");
        }
        foreach (var r in required)
            if (!seen.Contains(r)) throw new FormatException($"Line {line}: the {what} has no column \"{r}\"; it needs {string.Join(", ", required)}.");
        return header;
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
