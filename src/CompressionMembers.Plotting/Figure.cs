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
        string svg = _plot.GetSvgXml(Width, Height);
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
