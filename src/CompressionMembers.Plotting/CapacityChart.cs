using System;
using CompressionMembers.Workflows.Tables;
using ScottPlot;

namespace CompressionMembers.Plotting;

/// <summary>Capacity against effective length: one line per section of a <see cref="CapacityTable"/>.</summary>
/// <remarks>Cells where the method does not apply are left out of their line. Thread safety: stateless.</remarks>
public static class CapacityChart
{
    /// <summary>Builds the chart.</summary>
    /// <param name="table">The table.</param>
    /// <param name="width">Width in pixels (200 to 4000).</param>
    /// <param name="height">Height in pixels (150 to 4000).</param>
    /// <returns>The figure.</returns>
    /// <exception cref="ArgumentNullException">The table is null.</exception>
    public static Figure Create(CapacityTable table, int width = 900, int height = 600)
    {
        ArgumentNullException.ThrowIfNull(table);
        ColumnCurvePlot.Size(width, height);
        var plt = Palette.NewPlot($"Design resistance against effective length ({table.Method.Identity.Name}, {table.Material.Name})",
            "effective length L_cr  (m)", "design resistance N_Rd  (kN)");
        int n = table.EffectiveLengths.Count;
        for (int i = 0; i < table.Sections.Count; i++)
        {
            var xs = new System.Collections.Generic.List<double>(n);
            var ys = new System.Collections.Generic.List<double>(n);
            for (int j = 0; j < n; j++)
            {
                double r = table.ResistanceN(i, j);
                if (double.IsNaN(r)) continue;
                xs.Add(table.EffectiveLengths[j].Meters);
                ys.Add(r / 1e3);
            }
            if (xs.Count == 0) continue;
            var s = plt.Add.Scatter(xs.ToArray(), ys.ToArray(), Palette.Series[i % Palette.Series.Length]);
            s.LegendText = table.Sections[i].Designation;
            s.LineWidth = 2;
            s.MarkerSize = 5;
            if (i >= Palette.Series.Length) s.LinePattern = LinePattern.Dashed;
        }
        plt.Axes.Margins(0.02, 0.05);
        plt.Axes.SetLimitsY(0, double.NaN);
        plt.ShowLegend(Alignment.UpperRight);
        return new Figure(plt, width, height);
    }
}
