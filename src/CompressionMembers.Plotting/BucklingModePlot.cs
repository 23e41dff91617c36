using System;
using System.Globalization;
using ScottPlot;

namespace CompressionMembers.Plotting;

/// <summary>Buckling mode shapes drawn along the member: position on the vertical axis, deflection across.</summary>
/// <remarks>Thread safety: stateless.</remarks>
public static class BucklingModePlot
{
    /// <summary>Builds the figure.</summary>
    /// <param name="modes">The modes from <see cref="BucklingModes.Compute"/>.</param>
    /// <param name="title">A title, such as the member's name.</param>
    /// <param name="width">Width in pixels (200 to 4000).</param>
    /// <param name="height">Height in pixels (150 to 4000).</param>
    /// <returns>The figure.</returns>
    /// <exception cref="ArgumentNullException">The modes are null.</exception>
    public static Figure Create(BucklingModes modes, string title, int width = 600, int height = 800)
    {
        ArgumentNullException.ThrowIfNull(modes);
        ColumnCurvePlot.Size(width, height);
        var inv = CultureInfo.InvariantCulture;
        var plt = Palette.NewPlot($"Buckling modes about {modes.Axis}: {title}", "deflection w / w_max  (–)", "position along the member x  (m)");
        var x = new double[modes.PositionsM.Count];
        for (int i = 0; i < x.Length; i++) x[i] = modes.PositionsM[i];
        for (int m = 0; m < modes.Count; m++)
        {
            var shape = modes.Shape(m);
            var w = new double[shape.Count];
            for (int i = 0; i < w.Length; i++) w[i] = shape[i];
            var s = plt.Add.ScatterLine(w, x, Palette.Series[m % Palette.Series.Length]);
            s.LineWidth = 2.5f;
            s.LegendText = string.Format(inv, "mode {0}: N_cr = {1:0.###} kN", m + 1, modes.CriticalForcesN[m] / 1e3);
        }
        var axisLine = plt.Add.VerticalLine(0, 1, Palette.Ink);
        axisLine.LinePattern = LinePattern.Dotted;
        plt.Axes.SetLimitsX(-1.3, 1.3);
        plt.ShowLegend(Alignment.LowerRight);
        return new Figure(plt, width, height);
    }
}
