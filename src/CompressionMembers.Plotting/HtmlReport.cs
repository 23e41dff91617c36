using System;
using System.Net;
using System.Text;
using CompressionMembers.Reporting;
using CompressionMembers.Results;

namespace CompressionMembers.Plotting;

/// <summary>A self-contained HTML page: the text calculation report with the member's column curve embedded as SVG.
/// It opens in any browser, needs no network and carries the caution.</summary>
/// <remarks>Thread safety: stateless.</remarks>
public static class HtmlReport
{
    /// <summary>Renders the page.</summary>
    /// <param name="result">The result (traced for a full calculation).</param>
    /// <returns>The HTML text.</returns>
    /// <exception cref="ArgumentException">The result is default.</exception>
    public static string Render(in CheckResult result)
    {
        if (result.Member is null) throw new ArgumentException("The result is default (no member).", nameof(result));
        string text = TextReport.Render(result);
        string svg = ColumnCurvePlot.Create(result, 860, 560).ToSvg();
        int start = svg.IndexOf("<svg", StringComparison.Ordinal);
        if (start > 0) svg = svg[start..]; // drop any XML prolog: the SVG is inline
        var sb = new StringBuilder();
        sb.Append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
        sb.Append("<title>").Append(WebUtility.HtmlEncode("Compression member check: " + result.Member.Name)).Append("</title>\n");
        sb.Append("<style>body{background:#FBFAF6;color:#2D3540;font-family:sans-serif;margin:2em;max-width:62em}")
          .Append("pre{background:#fff;border:1px solid #E4E1D8;padding:1em;overflow-x:auto;font-size:13px}")
          .Append(".verdict{font-weight:bold}figure{margin:1.5em 0}figcaption{font-size:13px}</style>\n</head>\n<body>\n");
        sb.Append("<h1>").Append(WebUtility.HtmlEncode("Compression member check: " + result.Member.Name)).Append("</h1>\n");
        sb.Append("<p class=\"verdict\">").Append(WebUtility.HtmlEncode(
            $"{(result.Passed ? "Passes" : "FAILS")}: utilisation {result.Utilisation.ToString("0.000", System.Globalization.CultureInfo.InvariantCulture)} ({result.Method.Identity.Name})")).Append("</p>\n");
        sb.Append("<figure>\n").Append(svg).Append("\n<figcaption>Column curve: stress against slenderness, with the member's point about each axis.</figcaption>\n</figure>\n");
        sb.Append("<pre>").Append(WebUtility.HtmlEncode(text)).Append("</pre>\n");
        sb.Append("<p><small>").Append(WebUtility.HtmlEncode(LibraryInfo.Caution)).Append("</small></p>\n</body>\n</html>\n");
        return sb.ToString();
    }
}
