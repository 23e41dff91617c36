using System;
using CompressionMembers.Reporting;
using CompressionMembers.Results;

namespace CompressionMembers.Tests.Reporting;

/// <summary>US customary display units. Expected values follow from the exact definitions of the international inch and
/// pound (1959): 1 in = 25.4 mm, 1 lb = 0.45359237 kg, 1 lbf = 4.4482216152605 N (so 1 psi = 6894.757293168361 Pa and
/// 1 lb·ft = 1.3558179483314004 N·m).</summary>
public class ReportUnitsTests
{
    [Theory]
    [InlineData(0.0254, StepUnit.Length, "1 in")]
    [InlineData(0.0254 * 12, StepUnit.Length, "12.00 in")]   // 0.3048 / 0.0254 is 11.999… in doubles: four figures
    [InlineData(0.00064516, StepUnit.Area, "1 in²")]
    [InlineData(0.0254 * 0.0254 * 0.0254 * 0.0254, StepUnit.SecondMoment, "1 in⁴")]
    [InlineData(0.0254 * 0.0254 * 0.0254, StepUnit.SectionModulus, "1 in³")]
    [InlineData(4.4482216152605e3, StepUnit.Force, "1000 lb")]
    [InlineData(6894.757293168361 * 1350, StepUnit.Stress, "1350 psi")]
    [InlineData(1.3558179483314004 * 250, StepUnit.Moment, "250.0 lb·ft")]
    [InlineData(0.0254 / 60, StepUnit.CharringRate, "1 in/min")]
    [InlineData(16.018463373960138 * 35, StepUnit.Density, "35 lb/ft³")]
    [InlineData(1800, StepUnit.Time, "30 min")]
    [InlineData(0.5, StepUnit.None, "0.5000")]
    public void Quantity_UsCustomary_UsesExactDefinitions(double si, StepUnit unit, string expected) =>
        Assert.Equal(expected, NumberFormat.Quantity(si, unit, ReportUnits.UsCustomary));

    [Theory]
    [InlineData(245.7e3, StepUnit.Force)]
    [InlineData(21e6, StepUnit.Stress)]
    [InlineData(0.1234, StepUnit.Length)]
    public void Quantity_Metric_SameAsTheDefault(double si, StepUnit unit) =>
        Assert.Equal(NumberFormat.Quantity(si, unit), NumberFormat.Quantity(si, unit, ReportUnits.Metric));

    [Fact]
    public void Render_UndefinedUnits_ThrowsNamingTheParameter()
    {
        var r = Timber.TimberReportCases.NdsAsdCompression();
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => TextReport.Render(r, (ReportUnits)7));
        Assert.Equal("units", ex.ParamName);
        Assert.Contains("Unknown report units 7", ex.Message);
    }

    [Fact]
    public void Render_UsCustomary_ChangesOnlyTheDisplayNotTheFingerprint()
    {
        // The same result rendered both ways: the same input fingerprint and verdict line (common practice: display
        // units are a presentation choice).
        var r = Timber.TimberReportCases.NdsAsdCompression();
        string metric = TextReport.Render(r), us = TextReport.Render(r, ReportUnits.UsCustomary);
        string Fingerprint(string text) => text.Split('\n')[Array.FindIndex(text.Split('\n'), l => l.Contains("input fingerprint", StringComparison.Ordinal))];
        Assert.Equal(Fingerprint(metric), Fingerprint(us));
        Assert.Contains("display units", us, StringComparison.Ordinal);
        Assert.DoesNotContain("display units", metric, StringComparison.Ordinal);
        Assert.Contains(" psi", us, StringComparison.Ordinal);
        Assert.DoesNotContain(" MPa ", us.Split("Calculation")[1], StringComparison.Ordinal);
    }
}
