using System;
using System.Globalization;
using CompressionMembers.Methods.Numerical;
using ScottPlot;

namespace CompressionMembers.Plotting;

/// <summary>Buckling mode shapes of the numerical model (<see cref="BucklingAnalysis"/>) drawn along the member: position on
/// the vertical axis, deflection (scaled to a largest magnitude of 1) across, with each mode's critical force.</summary>
/// <remarks>Thread safety: stateless.</remarks>
public static class BucklingModePlot
{
    /// <summary>Builds the figure.</summary>
    /// <param name="modes">The result of <see cref="BucklingAnalysis.Solve"/>, such as
    /// <c>BucklingAnalysis.Solve(BucklingAnalysis.ModelOf(member, BucklingAxis.Y), 3)</c>.</param>
    /// <param name="title">A title, such as the member's name.</param>
    /// <param name="width">Width in pixels (200 to 4000).</param>
    /// <param name="height">Height in pixels (150 to 4000).</param>
    /// <returns>The figure.</returns>
    /// <exception cref="ArgumentNullException">The modes are null.</exception>
    public static Figure Create(BucklingResult modes, string title, int width = 600, int height = 800)
    {
        ArgumentNullException.ThrowIfNull(modes);
        ColumnCurvePlot.Size(width, height);
        var inv = CultureInfo.InvariantCulture;
        var plt = Palette.NewPlot($"Buckling modes: {title}", "deflection w / w_max  (–)", "position along the member x  (m)");
        for (int m = 0; m < modes.Modes.Count; m++)
        {
            var mode = modes.Modes[m];
            var x = new double[mode.PositionsM.Count];
            var w = new double[x.Length];
            double max = 0;
            for (int i = 0; i < x.Length; i++) { x[i] = mode.PositionsM[i]; w[i] = mode.Deflections[i]; if (Math.Abs(w[i]) > Math.Abs(max)) max = w[i]; }
            if (max != 0) for (int i = 0; i < w.Length; i++) w[i] /= max;
            var s = plt.Add.ScatterLine(w, x, Palette.Series[m % Palette.Series.Length]);
            s.LineWidth = 2.5f;
            s.LegendText = string.Format(inv, "mode {0}: N_cr = {1:0.###} kN", mode.Number, mode.CriticalForce.Kilonewtons);
        }
        var axisLine = plt.Add.VerticalLine(0, 1, Palette.Ink);
        axisLine.LinePattern = LinePattern.Dotted;
        plt.Axes.SetLimitsX(-1.3, 1.3);
        plt.ShowLegend(Alignment.LowerRight);
        return new Figure(plt, width, height);
    }
}
