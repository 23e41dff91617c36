using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Text.Json;
using CompressionMembers.Actions;
using CompressionMembers.Internal;
using CompressionMembers.Members;
using CompressionMembers.Restraints;
using CompressionMembers.Workflows.Catalogues;
using CompressionMembers.Workflows.Json;
using CompressionMembers.Workflows.Registry;
using UnitsNet;

namespace CompressionMembers.Workflows.Schedules;

/// <summary>A schedule of members and action cases read from CSV or JSON (formats of our own, docs/schedule-format.md).
/// Every row of the input becomes one <see cref="ScheduleItem"/>, read or with the reason it could not be.</summary>
/// <remarks>
/// <para>A file that cannot be read at all (wrong header, unknown column, invalid JSON, unknown JSON field, too large or
/// too deep) throws <see cref="FormatException"/> naming the line. A row whose values are wrong (not a number, an
/// unknown material, a negative length) becomes an error item and the other rows are still read.</para>
/// <para>Materials, methods and catalogued sections are named through a <see cref="NameRegistry"/>.</para>
/// <para>Thread safety: immutable reference type.</para>
/// </remarks>
[Immutable]
public sealed class MemberSchedule
{
    /// <summary>The format tag of a JSON schedule.</summary>
    public const string JsonFormat = "compression-members/schedule@1";

    /// <summary>The columns of a CSV schedule, in the documented order.</summary>
    public static IReadOnlyList<string> CsvColumns { get; } =
    [
        "member", "case", "material", "section", "method", "length_mm", "K_y", "K_z", "K_t",
        "N_kN", "ey_mm", "ez_mm", "My_top_kNm", "My_bottom_kNm", "Mz_top_kNm", "Mz_bottom_kNm", "bow_y_mm", "bow_z_mm", "duration",
    ];

    private static readonly string[] RequiredColumns = ["member", "material", "section", "method", "length_mm", "N_kN"];

    private readonly ScheduleItem[] _items;

    private MemberSchedule(string name, ScheduleItem[] items)
    {
        Name = name;
        _items = items;
    }

    /// <summary>The schedule's name (a file name, for reports).</summary>
    public string Name { get; }

    /// <summary>The rows, in input order.</summary>
    public IReadOnlyList<ScheduleItem> Items => _items;

    /// <summary>Reads a CSV schedule.</summary>
    /// <param name="reader">The text.</param>
    /// <param name="name">A name for reports, such as the file name.</param>
    /// <param name="registry">Names of materials, methods and catalogues; <see cref="NameRegistry.Default"/> if null.</param>
    /// <returns>The schedule.</returns>
    /// <exception cref="FormatException">The header is wrong (unknown, repeated or missing column).</exception>
    public static MemberSchedule ReadCsv(TextReader reader, string name, NameRegistry? registry = null)
    {
        var table = CsvTable.Read(reader, CsvColumns, RequiredColumns, "schedule CSV");
        var columns = ColumnIndex(table.Header);
        var names = new ScheduleNames(registry ?? NameRegistry.Default);
        var items = new ScheduleItem[table.Rows.Count];
        for (int i = 0; i < items.Length; i++)
        {
            var (line, fields, extra) = table.Rows[i];
            items[i] = CsvItem(line, fields, extra, columns, names);
        }
        return new MemberSchedule(string.IsNullOrWhiteSpace(name) ? "schedule" : name, items);
    }

    /// <summary>Reads and checks the header of a CSV schedule.</summary>
    /// <returns>The header's column names.</returns>
    /// <exception cref="FormatException">The header is empty, or has an unknown, repeated or missing column.</exception>
    internal static string[] ReadCsvHeader(CsvRecordReader reader) => CsvTable.ReadHeader(reader, CsvColumns, RequiredColumns, "schedule CSV");

    /// <summary>For each of <see cref="CsvColumns"/>, its position in the header, or -1.</summary>
    internal static int[] ColumnIndex(string[] header)
    {
        var index = new int[CsvColumns.Count];
        for (int c = 0; c < index.Length; c++) index[c] = Array.IndexOf(header, CsvColumns[c]);
        return index;
    }

    /// <summary>The item of one CSV line: <paramref name="fields"/> in header order (missing ones empty), <paramref name="extra"/>
    /// when the line had more fields than the header.</summary>
    internal static ScheduleItem CsvItem(long line, string[] fields, bool extra, int[] columns, ScheduleNames names)
    {
        static string? G(string[] fields, int[] columns, int c)
        {
            int i = columns[c];
            return i < 0 || string.IsNullOrWhiteSpace(fields[i]) ? null : fields[i];
        }
        // Positions in CsvColumns, in RowText's order.
        var row = new RowText(G(fields, columns, 0), G(fields, columns, 1), G(fields, columns, 2), G(fields, columns, 3), G(fields, columns, 4),
            G(fields, columns, 5), G(fields, columns, 6), G(fields, columns, 7), G(fields, columns, 8), G(fields, columns, 9), G(fields, columns, 10),
            G(fields, columns, 11), G(fields, columns, 12), G(fields, columns, 13), G(fields, columns, 14), G(fields, columns, 15), G(fields, columns, 16),
            G(fields, columns, 17), G(fields, columns, 18));
        string location = "line " + line.ToString(CultureInfo.InvariantCulture);
        return extra
            ? new ScheduleItem(line, location, row.Member ?? "", row.Case ?? "", null, null, null, "the line has more fields than the header.")
            : Build(line, location, row, names);
    }

    /// <summary>Reads a JSON schedule.</summary>
    /// <param name="stream">The UTF-8 JSON.</param>
    /// <param name="name">A name for reports.</param>
    /// <param name="registry">Names; <see cref="NameRegistry.Default"/> if null.</param>
    /// <param name="maxBytes">The largest input accepted (64 MiB by default).</param>
    /// <returns>The schedule.</returns>
    /// <exception cref="FormatException">The JSON is invalid, has an unknown field, is too large or too deep, or has the wrong format tag.</exception>
    public static MemberSchedule ReadJson(Stream stream, string name, NameRegistry? registry = null, long maxBytes = StrictJson.DefaultMaxBytes)
    {
        var names = new ScheduleNames(registry ?? NameRegistry.Default);
        byte[] bytes = StrictJson.ReadLimited(stream ?? throw new ArgumentNullException(nameof(stream)), maxBytes, "schedule JSON");
        var dto = StrictJson.Read(new MemoryStream(bytes, false), WorkflowJsonContext.Default.ScheduleFileDto, maxBytes, "schedule JSON");
        if (dto.Format != JsonFormat) throw new FormatException($"The schedule JSON has format \"{dto.Format}\"; expected \"{JsonFormat}\".");
        var members = dto.Members ?? throw new FormatException("The schedule JSON has no \"members\" list.");
        var lines = CaseLines(bytes);
        var items = new List<ScheduleItem>();
        for (int i = 0; i < members.Count; i++)
        {
            var m = members[i];
            long memberLine = lines.Members.Count > i ? lines.Members[i] : 0;
            if (m.Cases is null || m.Cases.Count == 0)
            {
                items.Add(new ScheduleItem(memberLine, $"members[{i}]", m.Member ?? "", "", null, null, null, "the member has no action case (\"cases\" is missing or empty)."));
                continue;
            }
            for (int j = 0; j < m.Cases.Count; j++)
            {
                var c = m.Cases[j];
                long line = lines.Cases.TryGetValue((i, j), out var l) ? l : memberLine;
                var row = new RowText(m.Member, c.Case, m.Material, m.Section, m.Method, Num(m.LengthMm), Num(m.Ky), Num(m.Kz), Num(m.Kt),
                    Num(c.NkN), Num(c.EyMm), Num(c.EzMm), Num(c.MyTop), Num(c.MyBottom), Num(c.MzTop), Num(c.MzBottom), Num(c.BowY), Num(c.BowZ), c.Duration);
                items.Add(Build(line, $"members[{i}].cases[{j}]", row, names));
            }
        }
        return new MemberSchedule(string.IsNullOrWhiteSpace(name) ? "schedule" : name, items.ToArray());
    }

    private static string? Num(double? v) => v?.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>The line of each member object and case object, found by a second pass of the reader over the valid JSON.</summary>
    private static (List<long> Members, Dictionary<(int, int), long> Cases) CaseLines(byte[] bytes)
    {
        var members = new List<long>();
        var cases = new Dictionary<(int, int), long>();
        var reader = new Utf8JsonReader(bytes, new JsonReaderOptions { MaxDepth = 16 });
        int lineNo = 1, scanned = 0;
        long LineAt(long index)
        {
            for (; scanned < index; scanned++) if (bytes[scanned] == (byte)'\n') lineNo++;
            return lineNo;
        }
        string? lastProperty = null;
        bool inMembers = false, inCases = false;
        int m = -1, c = -1;
        while (reader.Read())
        {
            switch (reader.TokenType)
            {
                case JsonTokenType.PropertyName:
                    lastProperty = reader.GetString();
                    break;
                case JsonTokenType.StartArray:
                    if (reader.CurrentDepth == 1 && lastProperty == "members") inMembers = true;
                    else if (inMembers && reader.CurrentDepth == 3 && lastProperty == "cases") { inCases = true; c = -1; }
                    break;
                case JsonTokenType.EndArray:
                    if (reader.CurrentDepth == 1) inMembers = false;
                    else if (reader.CurrentDepth == 3) inCases = false;
                    break;
                case JsonTokenType.StartObject:
                    if (inMembers && reader.CurrentDepth == 2) { m++; members.Add(LineAt(reader.TokenStartIndex)); }
                    else if (inCases && reader.CurrentDepth == 4) { c++; cases[(m, c)] = LineAt(reader.TokenStartIndex); }
                    break;
            }
        }
        return (members, cases);
    }

    private sealed record RowText(string? Member, string? Case, string? Material, string? Section, string? Method, string? LengthMm, string? Ky, string? Kz, string? Kt,
        string? NkN, string? EyMm, string? EzMm, string? MyTop, string? MyBottom, string? MzTop, string? MzBottom, string? BowY, string? BowZ, string? Duration);

    private static ScheduleItem Build(long line, string location, RowText r, ScheduleNames names)
    {
        string memberName = r.Member?.Trim() ?? "";
        string caseName = r.Case?.Trim() ?? "";
        try
        {
            if (memberName.Length == 0) throw new FormatException("the member name is empty.");
            var material = names.Material(Need(r.Material, "material"));
            var section = names.Section(Need(r.Section, "section"));
            var method = names.Method(Need(r.Method, "method"));
            double lengthMm = Required(Need(r.LengthMm, "length_mm"), "length_mm");
            var restraint = new Restraint(
                AxisRestraint.FromBucklingFactor(Number(r.Ky, "K_y") ?? 1.0, "given in the schedule"),
                AxisRestraint.FromBucklingFactor(Number(r.Kz, "K_z") ?? 1.0, "given in the schedule"),
                AxisRestraint.FromBucklingFactor(Number(r.Kt, "K_t") ?? 1.0, "given in the schedule"));
            var member = Member.Create(section, material, Length.FromMillimeters(lengthMm), restraint, memberName);
            var actions = DesignActions.Compression(Force.FromKilonewtons(Required(Need(r.NkN, "N_kN"), "N_kN")), caseName.Length == 0 ? null : caseName);
            double ey = Number(r.EyMm, "ey_mm") ?? 0, ez = Number(r.EzMm, "ez_mm") ?? 0;
            if (ey != 0 || ez != 0) actions = actions.WithEccentricity(Length.FromMillimeters(ey), Length.FromMillimeters(ez));
            double myT = Number(r.MyTop, "My_top_kNm") ?? 0, myB = Number(r.MyBottom, "My_bottom_kNm") ?? 0;
            if (myT != 0 || myB != 0) actions = actions.WithEndMomentsAboutY(Torque.FromKilonewtonMeters(myT), Torque.FromKilonewtonMeters(myB));
            double mzT = Number(r.MzTop, "Mz_top_kNm") ?? 0, mzB = Number(r.MzBottom, "Mz_bottom_kNm") ?? 0;
            if (mzT != 0 || mzB != 0) actions = actions.WithEndMomentsAboutZ(Torque.FromKilonewtonMeters(mzT), Torque.FromKilonewtonMeters(mzB));
            double? by = Number(r.BowY, "bow_y_mm"), bz = Number(r.BowZ, "bow_z_mm");
            if (by is not null || bz is not null)
                actions = actions.WithInitialBow(by is { } y ? Length.FromMillimeters(y) : null, bz is { } z ? Length.FromMillimeters(z) : null);
            if (r.Duration is { } d && !string.IsNullOrWhiteSpace(d))
            {
                if (!Enum.TryParse<LoadDurationClass>(d.Trim().Replace("-", "", StringComparison.Ordinal), true, out var dur) || !Enum.IsDefined(dur) || int.TryParse(d, out _))
                    throw new FormatException($"duration \"{d}\" is not a load-duration class; use one of {string.Join(", ", Enum.GetNames<LoadDurationClass>())}.");
                actions = actions.WithLoadDuration(dur);
            }
            return new ScheduleItem(line, location, memberName, caseName, member, actions, method, null);
        }
        catch (Exception ex) when (ScheduleNames.IsRowError(ex))
        {
            return new ScheduleItem(line, location, memberName, caseName, null, null, null, FirstLine(ex.Message));
        }
    }

    internal static string FirstLine(string message)
    {
        int i = message.IndexOf(" (Parameter '", StringComparison.Ordinal);
        return i > 0 ? message[..i] : message;
    }

    private static string Need(string? value, string column) =>
        string.IsNullOrWhiteSpace(value) ? throw new FormatException($"{column} is empty; it is required.") : value;

    private static double Required(string text, string column) => Number(text, column)!.Value;

    private static double? Number(string? text, string column)
    {
        if (string.IsNullOrWhiteSpace(text)) return null;
        if (!double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var v) || !double.IsFinite(v))
            throw new FormatException($"{column} \"{text}\" is not a finite number (use a point as the decimal separator).");
        return v;
    }
}
