using System;
using System.Buffers.Binary;
using System.IO;
using System.Linq;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Numerical;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CompressionMembers.Workflows.Catalogues;
using CompressionMembers.Workflows.Tables;
using UnitsNet;

namespace CompressionMembers.Plotting.Tests;

public sealed class PlotTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("cm-plots-").FullName;

    public void Dispose() => Directory.Delete(_dir, true);

    private static Member Strut(double lengthMm, Restraint? r = null) =>
        Member.Create(new CircularHollowSection(Length.FromMillimeters(76), Length.FromMillimeters(3)), IsotropicMaterial.GenericStructuralSteel,
            Length.FromMillimeters(lengthMm), r ?? Restraint.PinnedBothAxes, "jetty post");

    private static (int W, int H) PngSize(string path)
    {
        var b = File.ReadAllBytes(path);
        Assert.True(b.Length > 24 && b[1] == (byte)'P' && b[2] == (byte)'N' && b[3] == (byte)'G', "not a PNG");
        return (BinaryPrimitives.ReadInt32BigEndian(b.AsSpan(16)), BinaryPrimitives.ReadInt32BigEndian(b.AsSpan(20)));
    }

    [Fact]
    public void ColumnCurve_PngAndSvg_HaveSizeAndTheMemberPoint()
    {
        var r = Check.EvaluateWithTrace(Strut(3200), DesignActions.Compression(Force.FromKilonewtons(85)), ResistanceMethods.Johnson);
        var fig = ColumnCurvePlot.Create(r, 900, 600);
        string png = Path.Combine(_dir, "curve.png"), svg = Path.Combine(_dir, "curve.svg");
        fig.SavePng(png);
        fig.SaveSvg(svg);
        Assert.Equal((900, 600), PngSize(png));
        Assert.True(new FileInfo(png).Length > 10_000, "PNG suspiciously small");
        string text = File.ReadAllText(svg);
        Assert.StartsWith("<svg", text.TrimStart().StartsWith("<?xml", StringComparison.Ordinal) ? text[text.IndexOf("<svg", StringComparison.Ordinal)..] : text.TrimStart());
        Assert.Contains($"id=\"{ColumnCurvePlot.MemberPointY}\"", text);
        Assert.Contains($"id=\"{ColumnCurvePlot.MemberPointZ}\"", text);
        // The point sits at the member's slenderness: λ = L / i, i = √(I/A) of the tube (hand calculation).
        double a = Math.PI / 4 * (76 * 76 - 70 * 70), i = Math.Sqrt(Math.PI / 64 * (Math.Pow(76, 4) - Math.Pow(70, 4)) / a);
        Assert.Contains($"data-x=\"{r.AboutY.Slenderness:R}\"", text);
        Assert.Equal(3200 / i, r.AboutY.Slenderness, 9);
    }

    [Fact]
    public void CapacityChart_RendersPngOfTheRequestedSize()
    {
        var t = CapacityTable.Compute(SectionCatalogues.AluminiumGenericShapes.OnlyFamily("SHS").Entries.Take(5), IsotropicMaterial.GenericStructuralSteel,
            ResistanceMethods.PerryRobertsonDefault, Enumerable.Range(1, 8).Select(k => Length.FromMeters(0.5 * k)));
        string png = Path.Combine(_dir, "cap.png");
        CapacityChart.Create(t, 800, 500).SavePng(png);
        Assert.Equal((800, 500), PngSize(png));
        string svg = CapacityChart.Create(t).ToSvg();
        Assert.Contains("SHS 25x25x2", svg); // legend text is drawn as SVG text
    }

    [Fact]
    public void Svg_KeepsTheDashPatterns_OfThePngLines()
    {
        // The column curve draws Euler dashed and Johnson densely dashed: ScottPlot 5.1's LinePattern.Dashed is 10 on, 10 off
        // and DenselyDashed 6, 6 (read from the package's LinePattern.Intervals); the SVG writer underneath
        // drops such patterns, so the figure writes them as stroke-dasharray itself: on the curve and on its legend line.
        var r = Check.EvaluateWithTrace(Strut(3200), DesignActions.Compression(Force.FromKilonewtons(85)), ResistanceMethods.Johnson);
        var fig = ColumnCurvePlot.Create(r, 900, 600);
        string svg = fig.ToSvg();
        Assert.Equal(2, Count(svg, "stroke=\"#4A6FA5\" stroke-dasharray=\"10 10\""));   // Palette.Euler
        Assert.Equal(2, Count(svg, "stroke=\"#C9821E\" stroke-dasharray=\"6 6\""));     // Palette.Johnson
        Assert.DoesNotContain("stroke=\"#0120", svg);                                    // no stand-in colour left
        // The lines got their own colours and patterns back (the SVG writer numbers its clip paths afresh each time).
        static string Clips(string x) => System.Text.RegularExpressions.Regex.Replace(x, "cl_[0-9a-f]+", "cl_");
        Assert.Equal(Clips(svg), Clips(fig.ToSvg()));
        string png1 = Path.Combine(_dir, "a.png"), png2 = Path.Combine(_dir, "b.png");
        ColumnCurvePlot.Create(r, 900, 600).SavePng(png1);
        fig.SavePng(png2);                                                               // after ToSvg: the same PNG as a fresh figure
        Assert.Equal(File.ReadAllBytes(png1), File.ReadAllBytes(png2));

        // A capacity chart draws its ninth and later sections dashed in the first sections' colours: in the SVG too.
        var t = CapacityTable.Compute(SectionCatalogues.AluminiumGenericShapes.Entries.Take(10), IsotropicMaterial.GenericStructuralSteel,
            ResistanceMethods.PerryRobertsonDefault, Enumerable.Range(1, 6).Select(k => Length.FromMeters(0.5 * k)));
        Assert.Equal(4, Count(CapacityChart.Create(t).ToSvg(), "stroke-dasharray=\"10 10\""));   // 2 sections × (line + legend)
    }

    private static int Count(string text, string what)
    {
        int n = 0;
        for (int i = text.IndexOf(what, StringComparison.Ordinal); i >= 0; i = text.IndexOf(what, i + what.Length, StringComparison.Ordinal)) n++;
        return n;
    }

    [Fact]
    public void BucklingModePlot_NumericalModes_RendersPngWithEveryModeInTheLegend()
    {
        var r = Restraint.Same(AxisRestraint.FromEndConditions(EndCondition.Fixed, EndCondition.Free, EffectiveLengthBasis.Theoretical));
        var modes = BucklingAnalysis.Solve(BucklingAnalysis.ModelOf(Strut(2000, r), BucklingAxis.Z), 3);
        double ei = 200e9 * Math.PI / 64 * (Math.Pow(0.076, 4) - Math.Pow(0.070, 4));
        // Cantilever: N_cr = π² EI / (2L)² (Timoshenko & Gere §2.1): the model the plot draws is the right one.
        Assert.Equal(1, modes.Lowest.CriticalForce.Newtons / (Math.PI * Math.PI * ei / (4.0 * 4.0)), 4);
        string png = Path.Combine(_dir, "modes.png");
        var fig = BucklingModePlot.Create(modes, "cantilever", 600, 800);
        fig.SavePng(png);
        Assert.Equal((600, 800), PngSize(png));
        string svg = fig.ToSvg();
        Assert.Contains("mode 1: N_cr", svg);
        Assert.Contains("mode 3: N_cr", svg);
    }

    [Fact]
    public void HtmlReport_EmbedsTheSvgAndTheReport()
    {
        var r = Check.EvaluateWithTrace(Strut(3200), DesignActions.Compression(Force.FromKilonewtons(85)), ResistanceMethods.Johnson);
        string html = HtmlReport.Render(r);
        Assert.StartsWith("<!DOCTYPE html>", html);
        Assert.Contains("<svg", html);
        Assert.Contains("member-point-y", html);
        Assert.Contains("Compression member check: jetty post", html);
        Assert.Contains("CAUTION", html);
        Assert.DoesNotContain("<?xml", html);
    }

    [Fact]
    public void ColumnCurve_TooSmall_IsRejected()
    {
        var r = Check.Evaluate(Strut(3200), DesignActions.Compression(Force.FromKilonewtons(85)), ResistanceMethods.Johnson);
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => ColumnCurvePlot.Create(r, 10, 600));
        Assert.Equal("width", ex.ParamName);
    }
}
