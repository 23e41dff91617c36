using ScottPlot;

namespace CompressionMembers.Plotting;

/// <summary>Our own colours and layout: muted harbour tones on a warm white, thin grid, titles with symbols and units.</summary>
internal static class Palette
{
    internal static readonly Color Background = Color.FromHex("#FBFAF6");
    internal static readonly Color Grid = Color.FromHex("#E4E1D8");
    internal static readonly Color Ink = Color.FromHex("#2D3540");
    internal static readonly Color Euler = Color.FromHex("#4A6FA5");
    internal static readonly Color Johnson = Color.FromHex("#C9821E");
    internal static readonly Color Code = Color.FromHex("#1B6F7A");
    internal static readonly Color Member = Color.FromHex("#A23B2A");
    internal static readonly Color Capacity = Color.FromHex("#5C7F3A");

    internal static readonly Color[] Series =
    [
        Color.FromHex("#1B6F7A"), Color.FromHex("#C9821E"), Color.FromHex("#4A6FA5"), Color.FromHex("#A23B2A"),
        Color.FromHex("#5C7F3A"), Color.FromHex("#7B5EA7"), Color.FromHex("#8C6D46"), Color.FromHex("#2D3540"),
    ];

    internal static Plot NewPlot(string title, string xTitle, string yTitle)
    {
        var plt = new Plot();
        plt.FigureBackground.Color = Background;
        plt.DataBackground.Color = Colors.White;
        plt.Grid.MajorLineColor = Grid;
        plt.Axes.Color(Ink);
        plt.Title(title, 15);
        plt.XLabel(xTitle, 13);
        plt.YLabel(yTitle, 13);
        return plt;
    }
}
