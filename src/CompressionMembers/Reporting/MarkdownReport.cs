using System;
using System.Collections.Generic;
using System.Text;
using CompressionMembers.Results;

namespace CompressionMembers.Reporting;

/// <summary>Renders a check result as Markdown: the same content as <see cref="TextReport"/>, with tables.
/// Culture-invariant; the same result always gives the same bytes.</summary>
public static class MarkdownReport
{
    /// <summary>Renders one result.</summary>
    /// <param name="result">The result (with steps when it was traced).</param>
    /// <returns>The Markdown text.</returns>
    /// <exception cref="ArgumentException">The result is <c>default</c>.</exception>
    public static string Render(in CheckResult result) => Render(result, ReportUnits.Metric);

    /// <summary>Renders one result with its calculated values in a chosen set of display units.</summary>
    /// <param name="result">The result (with steps when it was traced).</param>
    /// <param name="units">The display units (US customary for NDS and US aluminium practice).</param>
    /// <returns>The Markdown text.</returns>
    /// <exception cref="ArgumentException">The result is <c>default</c>.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The display units are undefined.</exception>
    public static string Render(in CheckResult result, ReportUnits units)
    {
        if (result.Member is null) throw new ArgumentException("The result is default (no member).", nameof(result));
        var c = ReportContent.From(result, units);
        var sb = new StringBuilder(4096);
        sb.Append("# ").Append(Esc(c.Title)).Append("\n\n");
        foreach (var (k, v) in c.Header) sb.Append("- **").Append(Esc(k)).Append("**: ").Append(Esc(v)).Append('\n');
        sb.Append("\n## Input\n\n| item | value |\n|---|---|\n");
        foreach (var (k, v) in c.Inputs) sb.Append("| ").Append(Esc(k)).Append(" | ").Append(Esc(v)).Append(" |\n");
        if (c.Settings.Count > 0)
        {
            sb.Append("\n## Method settings\n\n| symbol | value and origin |\n|---|---|\n");
            foreach (var (k, v) in c.Settings) sb.Append("| ").Append(Esc(k)).Append(" | ").Append(Esc(v)).Append(" |\n");
        }
        sb.Append("\n## Calculation\n\n");
        if (!c.Traced) sb.Append("_Steps not recorded: evaluate with tracing on to see them._\n");
        else
        {
            sb.Append("| # | symbol | value | meaning | from | reference |\n|---:|---|---:|---|---|---|\n");
            int n = 0;
            foreach (var st in c.Steps)
            {
                if (st.Symbol.Length == 0 && double.IsNaN(st.Value))
                {
                    sb.Append("|  |  |  | *").Append(Esc(st.Meaning)).Append("* |  | ").Append(Esc(st.Reference)).Append(" |\n");
                    continue;
                }
                n++;
                sb.Append("| ").Append(n).Append(" | ").Append(Esc(st.Symbol)).Append(" | ").Append(Esc(NumberFormat.Quantity(st.Value, st.Unit, c.Units)))
                  .Append(" | ").Append(Esc(st.Meaning)).Append(" | ").Append(Esc(st.Expression)).Append(" | ").Append(Esc(st.Reference)).Append(" |\n");
            }
        }
        if (c.AxisRows.Count > 0)
        {
            sb.Append("\n## By axis\n\n| ").Append(string.Join(" | ", ReportContent.AxisHeader)).Append(" |\n|---|---:|---:|---:|---:|---:|---:|\n");
            foreach (var r in c.AxisRows) sb.Append("| ").Append(string.Join(" | ", r)).Append(" |\n");
        }
        sb.Append("\n## Result\n\n");
        foreach (var (k, v) in c.Outcome) sb.Append("- **").Append(Esc(k)).Append("**: ").Append(Esc(v)).Append('\n');
        sb.Append("\n**").Append(Esc(c.Verdict)).Append("**\n\n> ").Append(Esc(LibraryInfo.Caution)).Append('\n');
        return sb.ToString();
    }

    private static string Esc(string s) => s.Replace("|", "\\|").Replace("*", "\\*").Replace("_", "\\_").Replace("\n", " ");
}
