using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Text;

namespace CompressionMembers.Plotting;

/// <summary>A rendered-on-demand chart: save it as SVG or PNG, or take the SVG text to embed in a page.</summary>
/// <remarks>
/// <para>Points that matter (the member's own point on a column curve) are also written into the SVG as elements with
/// an <c>id</c> and <c>data-*</c> attributes, so that a reader or a test can find them.</para>
/// <para>Thread safety: not thread-safe; render one figure on one thread at a time.</para>
/// </remarks>
public sealed class Figure
{
    private readonly ScottPlot.Plot _plot;
    private readonly List<(string Id, double X, double Y, string Label)> _marks = [];

    internal Figure(ScottPlot.Plot plot, int width, int height)
    {
        _plot = plot;
        Width = width;
        Height = height;
    }

    /// <summary>Width in pixels.</summary>
    public int Width { get; }

    /// <summary>Height in pixels.</summary>
    public int Height { get; }

    /// <summary>The ids of the marked points written into the SVG.</summary>
    public IReadOnlyList<string> MarkIds
    {
        get
        {
            var ids = new List<string>(_marks.Count);
            foreach (var m in _marks) ids.Add(m.Id);
            return ids;
        }
    }

    internal void Mark(string id, double x, double y, string label) => _marks.Add((id, x, y, label));

    /// <summary>The chart as SVG text, with the marked points as elements of their own.</summary>
    /// <returns>The SVG document.</returns>
    public string ToSvg()
    {
        string svg = SvgWithLinePatterns();
        if (_marks.Count == 0) return svg;
        _plot.RenderInMemory(Width, Height);
        var inv = CultureInfo.InvariantCulture;
        var sb = new StringBuilder();
        sb.Append("<g id=\"compression-members-marks\">");
        foreach (var (id, x, y, label) in _marks)
        {
            var px = _plot.GetPixel(new ScottPlot.Coordinates(x, y));
            sb.Append(inv, $"<circle id=\"{Escape(id)}\" cx=\"{px.X:0.##}\" cy=\"{px.Y:0.##}\" r=\"7\" fill=\"none\" stroke=\"#A23B2A\" stroke-width=\"1.5\" data-x=\"{x:R}\" data-y=\"{y:R}\"><title>{Escape(label)}</title></circle>");
        }
        sb.Append("</g>");
        int end = svg.LastIndexOf("</svg>", StringComparison.Ordinal);
        return end < 0 ? svg : svg[..end] + sb + svg[end..];
    }

    // The SVG writer under ScottPlot drops dash patterns (a dashed Euler curve came out solid, and a capacity chart's ninth
    // section, dashed in the PNG, had the same solid line and colour as its first) and says "Unsupported path effect" on
    // the standard error for each. So for the SVG every patterned line is drawn solid in a colour of its own that no chart
    // uses, and that colour is then replaced by the line's own colour with the pattern as stroke-dasharray: the same
    // dashes as the PNG, in the plot and in its legend, and nothing written to the console.
    private string SvgWithLinePatterns()
    {
        var patterned = new List<(ScottPlot.LineStyle Style, ScottPlot.Color Color, ScottPlot.LinePattern Pattern)>();
        foreach (var p in _plot.GetPlottables())
            if (p is ScottPlot.IHasLine { LineStyle: { } style } && style.Pattern.Intervals is { Length: > 0 }
                && !patterned.Exists(q => ReferenceEquals(q.Style, style)))
                patterned.Add((style, style.Color, style.Pattern));
        if (patterned.Count == 0) return _plot.GetSvgXml(Width, Height);
        string svg;
        try
        {
            for (int i = 0; i < patterned.Count; i++)
            {
                patterned[i].Style.Pattern = ScottPlot.LinePattern.Solid;
                patterned[i].Style.Color = StandIn(i);
            }
            svg = _plot.GetSvgXml(Width, Height);
        }
        finally
        {
            foreach (var (style, color, pattern) in patterned) { style.Color = color; style.Pattern = pattern; }
        }
        var inv = CultureInfo.InvariantCulture;
        for (int i = 0; i < patterned.Count; i++)
        {
            var (_, color, pattern) = patterned[i];
            string dashes = string.Join(" ", Array.ConvertAll(pattern.Intervals, v => v.ToString("0.###", inv)));
            string stroke = $"stroke=\"{Hex(color)}\"" + (color.A < 255 ? string.Create(inv, $" stroke-opacity=\"{color.A / 255.0:0.###}\"") : "");
            svg = svg.Replace($"stroke=\"{Hex(StandIn(i))}\"", $"{stroke} stroke-dasharray=\"{dashes}\"", StringComparison.Ordinal);
        }
        return svg;
    }

    // Stand-in colours #01 2g hh (ghh = the line's number): darker than any colour of the palette and not ScottPlot's own
    // near-black (#010101, the legend's shadow), so never a chart's stroke.
    private static ScottPlot.Color StandIn(int i) => new((byte)1, (byte)(0x20 + ((i >> 8) & 0x0F)), (byte)(i & 0xFF));

    private static string Hex(ScottPlot.Color c) => string.Create(CultureInfo.InvariantCulture, $"#{c.R:X2}{c.G:X2}{c.B:X2}");

    /// <summary>Writes the SVG to a file.</summary>
    /// <param name="path">The file.</param>
    public void SaveSvg(string path) => File.WriteAllText(path, ToSvg(), new UTF8Encoding(false));

    /// <summary>Writes a PNG to a file.</summary>
    /// <param name="path">The file.</param>
    public void SavePng(string path) => _plot.SavePng(path, Width, Height);

    /// <summary>The PNG bytes.</summary>
    /// <returns>The image.</returns>
    public byte[] ToPng() => _plot.GetImageBytes(Width, Height, ScottPlot.ImageFormat.Png);

    private static string Escape(string s) => s.Replace("&", "&amp;", StringComparison.Ordinal).Replace("<", "&lt;", StringComparison.Ordinal)
        .Replace(">", "&gt;", StringComparison.Ordinal).Replace("\"", "&quot;", StringComparison.Ordinal);
}
