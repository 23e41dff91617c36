using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Text;
using CompressionMembers.Internal;
using CompressionMembers.Reporting;
using CompressionMembers.Results;

namespace CompressionMembers.Workflows.Schedules;

/// <summary>The results of a checked schedule: one row result per input row, in input order, with writers for the
/// results CSV and one combined report.</summary>
/// <remarks>Output is culture-invariant and the same input gives the same bytes whatever the number of cores.
/// Thread safety: immutable reference type.</remarks>
[Immutable]
public sealed class ScheduleOutcome
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;
    private readonly ScheduleRowResult[] _rows;
    private static readonly string[] TableHeader = ["line", "member", "case", "section", "method", "N_Ed kN", "N_Rd kN", "util.", "result"];

    /// <summary>The columns of the results CSV.</summary>
    public static IReadOnlyList<string> ResultColumns { get; } =
    [
        "line", "location", "member", "case", "status", "utilisation", "N_Ed_kN", "N_Rd_kN", "governing_axis", "governing_mode",
        "governing_check", "section", "method", "input_fingerprint", "message",
    ];

    internal ScheduleOutcome(MemberSchedule schedule, IReadOnlyList<ScheduleRowResult> rows)
    {
        Schedule = schedule;
        _rows = [.. rows];
        foreach (var r in _rows)
        {
            if (r.Status == RowStatus.Passed) PassedCount++;
            else if (r.Status == RowStatus.Failed) FailedCount++;
            else ErrorCount++;
        }
    }

    /// <summary>The schedule checked.</summary>
    public MemberSchedule Schedule { get; }

    /// <summary>One result per input row, in order.</summary>
    public IReadOnlyList<ScheduleRowResult> Rows => _rows;

    /// <summary>Rows that passed.</summary>
    public int PassedCount { get; }

    /// <summary>Rows that failed.</summary>
    public int FailedCount { get; }

    /// <summary>Rows with an error.</summary>
    public int ErrorCount { get; }

    /// <summary>The counts in one line, as the streamed check's summary writes them.</summary>
    /// <returns>Such as <c>schedule "hall": 120 rows: 117 passed, 2 failed, 1 errors</c>.</returns>
    public override string ToString() => string.Create(System.Globalization.CultureInfo.InvariantCulture,
        $"schedule \"{Schedule.Name}\": {_rows.Length} rows: {PassedCount} passed, {FailedCount} failed, {ErrorCount} errors");

    /// <summary>Writes the results CSV: a header and one line per row. Text cells that a spreadsheet would run as a
    /// formula (starting with = + - @, a tab or CR) are escaped with a leading apostrophe; numbers are written with
    /// the shortest round-trip form in the invariant culture. Lines end with "\n".</summary>
    /// <param name="writer">Where to write.</param>
    /// <exception cref="ArgumentNullException">The writer is null.</exception>
    public void WriteCsv(TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(writer);
        var csv = new CsvRecordWriter(writer);
        WriteCsvHeader(csv);
        foreach (var r in _rows) WriteCsvRow(csv, r.Item, r.Result, r.Error, r.Fingerprint);
        csv.Flush();
        writer.Flush();
    }

    /// <summary>The header line of the results CSV (shared with the streamed check, so that both give the same bytes).</summary>
    internal static void WriteCsvHeader(CsvRecordWriter csv)
    {
        foreach (var c in ResultColumns) csv.Text(c);
        csv.EndRecord();
    }

    /// <summary>One line of the results CSV (shared with the streamed check, which passes its name memory so that a
    /// section's designation is formatted once).</summary>
    internal static void WriteCsvRow(CsvRecordWriter csv, ScheduleItem item, CheckResult? result, string? error, string fingerprint, ScheduleNames? names = null)
    {
        csv.Number(item.Line);
        csv.Text(item.Location);
        csv.Text(item.MemberName);
        csv.Text(item.CaseName);
        csv.Text(result is { } r0 ? (r0.Passed ? "passed" : "failed") : "error");
        if (result is { } res)
        {
            csv.Number(res.Utilisation);
            csv.Number(res.Actions.AxialCompression.Newtons / 1e3);
            csv.Number(res.DesignResistanceN / 1e3);
            csv.Text(res.GoverningAxis.ToString());
            csv.Text(res.GoverningMode.ToString());
            csv.Text(res.GoverningCheck);
            csv.Text(names is null ? res.Member.Section.Designation : names.Designation(res.Member.Section));
            csv.Text(res.Method.Identity.Name);
            csv.Text(fingerprint);
            csv.Text("");
        }
        else
        {
            for (int i = 0; i < 9; i++) csv.Text("");
            csv.Text(error ?? "");
        }
        csv.EndRecord();
    }

    /// <summary>The results CSV as a string.</summary>
    /// <returns>The CSV text.</returns>
    public string ToCsv()
    {
        var sw = new StringWriter(Inv);
        WriteCsv(sw);
        return sw.ToString();
    }

    /// <summary>One combined plain-text report: the counts, a table of every row, the error rows with their reasons,
    /// and the full traced calculation of the most utilised row of each member (up to <paramref name="detailLimit"/> members).</summary>
    /// <param name="detailLimit">How many members get a full calculation (0 for none).</param>
    /// <returns>The report; lines end with "\n".</returns>
    /// <exception cref="ArgumentOutOfRangeException">The limit is negative.</exception>
    public string RenderReport(int detailLimit = 20)
    {
        if (detailLimit < 0) throw new ArgumentOutOfRangeException(nameof(detailLimit), detailLimit, $"The detail limit must not be negative; got {detailLimit}.");
        var sb = new StringBuilder();
        string title = $"Member schedule check: {Schedule.Name}";
        sb.Append(title).Append('\n').Append(new string('=', title.Length)).Append('\n');
        sb.Append("  library : CompressionMembers ").Append(LibraryInfo.Version).Append('\n');
        sb.Append(Inv, $"  rows    : {_rows.Length} ({PassedCount} passed, {FailedCount} failed, {ErrorCount} errors)\n");
        sb.Append('\n').Append("Rows\n----\n");
        var table = new List<string[]> { (string[])TableHeader.Clone() };
        foreach (var r in _rows)
        {
            var i = r.Item;
            if (r.Result is { } res)
                table.Add([i.Line.ToString(Inv), i.MemberName, res.Actions.Name, res.Member.Section.Designation, res.Method.Identity.Name,
                    NumberFormat.Number(res.Actions.AxialCompression.Newtons / 1e3), NumberFormat.Number(res.DesignResistanceN / 1e3),
                    res.Utilisation.ToString("0.000", Inv), res.Passed ? "passes" : "FAILS"]);
            else
                table.Add([i.Line.ToString(Inv), i.MemberName, i.CaseName, "", "", "", "", "", "ERROR"]);
        }
        Table(sb, table);
        if (ErrorCount > 0)
        {
            sb.Append('\n').Append("Errors\n------\n");
            foreach (var r in _rows)
                if (r.Status == RowStatus.Error) sb.Append("  ").Append(r.Item.Location).Append(": ").Append(r.Error).Append('\n');
        }
        var governing = GoverningRows();
        if (detailLimit > 0 && governing.Count > 0)
        {
            sb.Append('\n').Append("Calculations (most utilised case of each member)\n-------------------------------------------------\n");
            int n = 0;
            foreach (var r in governing)
            {
                if (n++ == detailLimit) { sb.Append(Inv, $"\n  ({governing.Count - detailLimit} more members not shown)\n"); break; }
                var traced = CompressionMembers.Check.EvaluateWithTrace(r.Item.Member!, r.Item.Actions!, r.Item.Method!);
                sb.Append('\n').Append(Inv, $"[{r.Item.Location}]\n").Append(TextReport.Render(traced));
            }
        }
        sb.Append('\n').Append(LibraryInfo.Caution).Append('\n');
        return sb.ToString();
    }

    /// <summary>The most utilised checked row of each member, in order of first appearance.</summary>
    /// <returns>The rows.</returns>
    public IReadOnlyList<ScheduleRowResult> GoverningRows()
    {
        var order = new List<string>();
        var best = new Dictionary<string, ScheduleRowResult>(StringComparer.Ordinal);
        foreach (var r in _rows)
        {
            if (r.Result is not { } res) continue;
            if (!best.TryGetValue(r.Item.MemberName, out var b)) { order.Add(r.Item.MemberName); best[r.Item.MemberName] = r; }
            else if (res.Utilisation > b.Result!.Value.Utilisation) best[r.Item.MemberName] = r;
        }
        var list = new List<ScheduleRowResult>(order.Count);
        foreach (var k in order) list.Add(best[k]);
        return list;
    }

    private static void Table(StringBuilder sb, List<string[]> rows)
    {
        int cols = rows[0].Length;
        var w = new int[cols];
        foreach (var r in rows) for (int c = 0; c < cols; c++) w[c] = Math.Max(w[c], r[c].Length);
        for (int k = 0; k < rows.Count; k++)
        {
            var line = new StringBuilder("  ");
            for (int c = 0; c < cols; c++) line.Append(rows[k][c].PadRight(w[c])).Append(c + 1 < cols ? "  " : "");
            sb.Append(line.ToString().TrimEnd()).Append('\n');
            if (k == 0)
            {
                var rule = new StringBuilder("  ");
                for (int c = 0; c < cols; c++) rule.Append(new string('-', w[c])).Append(c + 1 < cols ? "  " : "");
                sb.Append(rule.ToString().TrimEnd()).Append('\n');
            }
        }
    }
}
