using System;
using System.Collections.Generic;
using System.Linq;
using System.Text;
using CompressionMembers.Results;

namespace CompressionMembers.Reporting;

/// <summary>Renders a check result as a plain-text calculation a checker can follow: inputs in the caller's units,
/// the method's settings, every step with its expression and clause, the per-axis outcome, the verdict and the
/// caution. Lines end with '\n'; the text is culture-invariant and the same result always gives the same bytes.</summary>
public static class TextReport
{
    private const int Width = 100;

    /// <summary>Renders one result.</summary>
    /// <param name="result">The result (with steps when it was traced).</param>
    /// <returns>The report.</returns>
    /// <exception cref="ArgumentException">The result is <c>default</c>.</exception>
    public static string Render(in CheckResult result) => Render(result, ReportUnits.Metric);

    /// <summary>Renders one result with its calculated values in a chosen set of display units.</summary>
    /// <param name="result">The result (with steps when it was traced).</param>
    /// <param name="units">The display units (US customary for NDS and US aluminium practice).</param>
    /// <returns>The report.</returns>
    /// <exception cref="ArgumentException">The result is <c>default</c>.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The display units are undefined.</exception>
    public static string Render(in CheckResult result, ReportUnits units)
    {
        if (result.Member is null) throw new ArgumentException("The result is default (no member).", nameof(result));
        var c = ReportContent.From(result, units);
        var sb = new StringBuilder(4096);
        Line(sb, c.Title);
        Line(sb, new string('=', Math.Min(Width, c.Title.Length)));
        Pairs(sb, c.Header);
        Section(sb, "Input");
        Pairs(sb, c.Inputs);
        if (c.Settings.Count > 0)
        {
            Section(sb, "Method settings");
            Pairs(sb, c.Settings);
        }
        Section(sb, "Calculation");
        if (!c.Traced)
            Line(sb, "  (steps not recorded: evaluate with tracing on to see them)");
        int n = 0;
        foreach (var st in c.Steps)
        {
            if (st.Symbol.Length == 0 && double.IsNaN(st.Value))
            {
                Line(sb, $"       note: {st.Meaning}" + (st.Reference.Length > 0 ? $"  [{st.Reference}]" : ""));
                continue;
            }
            n++;
            string head = $"  {n,3}. {st.Symbol} = {NumberFormat.Quantity(st.Value, st.Unit, c.Units)}";
            Line(sb, head.Length < 44 ? head.PadRight(44) + st.Meaning : head + "  " + st.Meaning);
            string expr = st.Expression.Length > 0 ? "       from " + st.Expression : "";
            string refText = st.Reference.Length > 0 ? "[" + st.Reference + "]" : "";
            if (expr.Length + refText.Length + 2 <= Width) Line(sb, (expr.Length > 0 ? expr.PadRight(Width - refText.Length) : new string(' ', Width - refText.Length)) + refText);
            else { Line(sb, expr); Line(sb, "       " + refText); }
        }
        if (c.AxisRows.Count > 0)
        {
            Section(sb, "By axis");
            Table(sb, ReportContent.AxisHeader, c.AxisRows);
        }
        Section(sb, "Result");
        Pairs(sb, c.Outcome);
        Line(sb, "");
        Line(sb, "  " + c.Verdict);
        Line(sb, "");
        foreach (var l in Wrap(LibraryInfo.Caution, Width)) Line(sb, l);
        return sb.ToString();
    }

    private static void Line(StringBuilder sb, string s) => sb.Append(s.TrimEnd()).Append('\n');

    private static void Section(StringBuilder sb, string title)
    {
        Line(sb, "");
        Line(sb, title);
        Line(sb, new string('-', title.Length));
    }

    private static void Pairs(StringBuilder sb, List<(string Key, string Value)> pairs)
    {
        int w = pairs.Count == 0 ? 0 : Math.Min(22, pairs.Max(p => p.Key.Length));
        foreach (var (k, v) in pairs) Line(sb, "  " + k.PadRight(w) + " : " + v);
    }

    private static void Table(StringBuilder sb, string[] header, List<string[]> rows)
    {
        var widths = header.Select((h, i) => Math.Max(h.Length, rows.Max(r => r[i].Length))).ToArray();
        Line(sb, "  " + string.Join("  ", header.Select((h, i) => i == 0 ? h.PadRight(widths[i]) : h.PadLeft(widths[i]))));
        foreach (var r in rows)
            Line(sb, "  " + string.Join("  ", r.Select((x, i) => i == 0 ? x.PadRight(widths[i]) : x.PadLeft(widths[i]))));
    }

    internal static IEnumerable<string> Wrap(string text, int width)
    {
        var line = new StringBuilder();
        foreach (var word in text.Split(' '))
        {
            if (line.Length > 0 && line.Length + 1 + word.Length > width) { yield return line.ToString(); line.Clear(); }
            if (line.Length > 0) line.Append(' ');
            line.Append(word);
        }
        if (line.Length > 0) yield return line.ToString();
    }
}
