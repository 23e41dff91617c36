using System;
using CompressionMembers.Reporting;
using CompressionMembers.Results;

namespace CompressionMembers.Tests.Reporting;

public class NumberFormatTests
{
    [Theory]
    [InlineData(0.0, "0")]
    [InlineData(0.699155, "0.6992")]
    [InlineData(1.0, "1")]
    [InlineData(4.0, "4")]
    [InlineData(1.0000001, "1.000")]
    [InlineData(245.67, "245.7")]
    [InlineData(3200.0, "3200")]
    [InlineData(200000.0, "200 000")]
    [InlineData(12345678.0, "12.35 × 10⁶")]
    [InlineData(0.00012345, "123.5 × 10⁻⁶")]
    [InlineData(-42.42, "−42.42")]
    [InlineData(double.NaN, "—")]
    public void Number_FourSignificantFigures(double value, string expected) => Assert.Equal(expected, NumberFormat.Number(value));

    [Theory]
    [InlineData(91360.0, StepUnit.Force, "91.36 kN")]
    [InlineData(250e6, StepUnit.Stress, "250 MPa")]
    [InlineData(0.839, StepUnit.Length, "839 mm")]
    [InlineData(475e-6, StepUnit.Area, "475 mm²")]
    [InlineData(1800.0, StepUnit.Time, "30 min")]
    [InlineData(-3.469e-18, StepUnit.Length, "0 mm")]
    public void Quantity_InDisplayUnits(double si, StepUnit unit, string expected) => Assert.Equal(expected, NumberFormat.Quantity(si, unit));

    // No value (NaN) is a dash alone, in either set of units: "— kN" read as a force of some unknown size.
    [Theory]
    [InlineData(StepUnit.Force, ReportUnits.Metric)]
    [InlineData(StepUnit.Force, ReportUnits.UsCustomary)]
    [InlineData(StepUnit.Stress, ReportUnits.Metric)]
    [InlineData(StepUnit.None, ReportUnits.Metric)]
    [InlineData(StepUnit.Boolean, ReportUnits.Metric)]
    public void Quantity_NoValue_IsADashWithoutUnit(StepUnit unit, ReportUnits units) =>
        Assert.Equal("—", NumberFormat.Quantity(double.NaN, unit, units));

    [Fact]
    public void Quantity_UndefinedUnits_StillRefused_EvenForNoValue() =>
        Assert.Throws<ArgumentOutOfRangeException>(() => NumberFormat.Quantity(double.NaN, StepUnit.Force, (ReportUnits)99));
}
