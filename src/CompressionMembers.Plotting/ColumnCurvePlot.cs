using System;
using System.Collections.Generic;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Resolution;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using ScottPlot;

namespace CompressionMembers.Plotting;

/// <summary>The column curve of a checked member: stress against slenderness, with the Euler hyperbola π²E/λ², the
/// Johnson parabola f (1 − f λ² / (4π²E)), the method's own curve for this section and material, and the member's point
/// about each axis (its demand N_Ed/A and its resistance on the curve).</summary>
/// <remarks>
/// The method's curve is traced by evaluating the method on pinned members of the same section and material whose
/// effective length gives each slenderness about the weaker axis; where the method does not apply, the curve has a gap.
/// Thread safety: stateless (each call builds its own figure).
/// </remarks>
public static class ColumnCurvePlot
{
    /// <summary>The id of the member's demand point about y in the SVG.</summary>
    public const string MemberPointY = "member-point-y";

    /// <summary>The id of the member's demand point about z in the SVG.</summary>
    public const string MemberPointZ = "member-point-z";

    /// <summary>Builds the figure.</summary>
    /// <param name="result">A result (traced or not).</param>
    /// <param name="width">Width in pixels (200 to 4000).</param>
    /// <param name="height">Height in pixels (150 to 4000).</param>
    /// <returns>The figure.</returns>
    /// <exception cref="ArgumentException">The result is default.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A size is out of range.</exception>
    public static Figure Create(in CheckResult result, int width = 900, int height = 600)
    {
        if (result.Member is null) throw new ArgumentException("The result is default (no member).", nameof(result));
        Size(width, height);
        var member = result.Member;
        var rm = ResolvedMember.From(member);
        double e = rm.ElasticModulusPa, f = rm.StrengthPa, a = rm.AreaM2;
        double iMin = Math.Min(rm.RadiusYM, rm.RadiusZM);
        double ly = result.AboutY.IsEvaluated ? result.AboutY.Slenderness : rm.EffectiveLengthYM / rm.RadiusYM;
        double lz = result.AboutZ.IsEvaluated ? result.AboutZ.Slenderness : rm.EffectiveLengthZM / rm.RadiusZM;
        double lamMax = Math.Max(200, 1.3 * Math.Max(ly, lz));
        double mpa = 1e-6;

        var plt = Palette.NewPlot($"Column curve: {member.Name} ({member.Section.Designation})",
            "slenderness λ = L_cr / i  (–)", "stress σ = N / A  (MPa)");

        // The method's own curve for this section and material.
        var ra = ResolvedActions.From(result.Actions);
        var cx = new List<double>();
        var cy = new List<double>();
        for (int k = 1; k <= 120; k++)
        {
            double lam = lamMax * k / 120.0;
            var m = Member.Create(member.Section, member.Material, UnitsNet.Length.FromMeters(lam * iMin), Restraint.PinnedBothAxes, member.Name);
            var r = ResolvedMember.From(m);
            if (!result.Method.AppliesTo(r, ra).IsApplicable) continue;
            cx.Add(lam);
            cy.Add(Check.Evaluate(r, ra, result.Method, null).DesignResistanceN / a * mpa);
        }
        if (cx.Count > 1)
        {
            var code = plt.Add.ScatterLine(cx.ToArray(), cy.ToArray(), Palette.Code);
            code.LegendText = "method: " + result.Method.Identity.Name;
            code.LineWidth = 3;
        }

        // Euler hyperbola, shown where it is below 1.2 f so that the plot keeps its scale.
        var ex = new List<double>();
        var ey = new List<double>();
        double lamStart = Math.PI * Math.Sqrt(e / (1.2 * f));
        for (int k = 0; k <= 160; k++)
        {
            double lam = lamStart + (lamMax - lamStart) * k / 160.0;
            ex.Add(lam);
            ey.Add(Math.PI * Math.PI * e / (lam * lam) * mpa);
        }
        var euler = plt.Add.ScatterLine(ex.ToArray(), ey.ToArray(), Palette.Euler);
        euler.LegendText = "Euler  σ_cr = π²E/λ²";
        euler.LineWidth = 2;
        euler.LinePattern = LinePattern.Dashed;

        // Johnson parabola up to the transition slenderness λ_c = π √(2E/f).
        double lamC = Math.PI * Math.Sqrt(2 * e / f);
        var jx = new List<double>();
        var jy = new List<double>();
        for (int k = 0; k <= 100; k++)
        {
            double lam = Math.Min(lamC, lamMax) * k / 100.0;
            jx.Add(lam);
            jy.Add(f * (1 - f * lam * lam / (4 * Math.PI * Math.PI * e)) * mpa);
        }
        var johnson = plt.Add.ScatterLine(jx.ToArray(), jy.ToArray(), Palette.Johnson);
        johnson.LegendText = "Johnson  σ = f (1 − f λ²/4π²E)";
        johnson.LineWidth = 2;
        johnson.LinePattern = LinePattern.DenselyDashed;

        var fig = new Figure(plt, width, height);
        double sEd = result.Actions.AxialCompression.Newtons / a * mpa;
        AddAxis(plt, fig, "y", ly, sEd, result.AboutY, a, MemberPointY, MarkerShape.FilledCircle);
        AddAxis(plt, fig, "z", lz, sEd, result.AboutZ, a, MemberPointZ, MarkerShape.FilledSquare);

        plt.Axes.SetLimits(0, lamMax, 0, 1.25 * Math.Max(f * mpa, sEd));
        plt.ShowLegend(Alignment.UpperRight);
        return fig;
    }

    private static void AddAxis(Plot plt, Figure fig, string axis, double lam, double sEd, in AxisOutcome o, double a, string id, MarkerShape shape)
    {
        if (!double.IsFinite(lam)) return;
        var d = plt.Add.Marker(lam, sEd, shape, 11, Palette.Member);
        d.LegendText = $"member about {axis}: σ_Ed = N_Ed/A at λ_{axis}";
        fig.Mark(id, lam, sEd, $"member about {axis}: λ = {lam:0.#}, σ_Ed = {sEd:0.##} MPa");
        if (o.IsEvaluated && double.IsFinite(o.ResistanceN))
        {
            var c = plt.Add.Marker(lam, o.ResistanceN / a * 1e-6, MarkerShape.OpenCircle, 11, Palette.Capacity);
            c.LegendText = $"resistance about {axis}: N_Rd/A";
        }
    }

    internal static void Size(int width, int height)
    {
        if (width < 200 || width > 4000) throw new ArgumentOutOfRangeException(nameof(width), width, $"Width must be from 200 to 4000 px; got {width}.");
        if (height < 150 || height > 4000) throw new ArgumentOutOfRangeException(nameof(height), height, $"Height must be from 150 to 4000 px; got {height}.");
    }
}
