using System;
using System.Globalization;
using CompressionMembers.Results;

namespace CompressionMembers.Reporting;

/// <summary>
/// How reports write numbers: invariant culture, four significant figures, thousands grouped by a space, powers of
/// ten in steps of three beyond a million or below a thousandth, and each kind of quantity in one display unit
/// (mm, mm², mm⁴, kN, MPa, kN·m …). The same double always gives the same text, on any machine or culture.
/// </summary>
public static class NumberFormat
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>A number to four significant figures.</summary>
    /// <param name="value">The number.</param>
    /// <returns>Its text, "—" for NaN and "∞" for infinity.</returns>
    public static string Number(double value)
    {
        if (double.IsNaN(value)) return "—";
        if (double.IsPositiveInfinity(value)) return "∞";
        if (double.IsNegativeInfinity(value)) return "−∞";
        if (value == 0) return "0";
        double a = Math.Abs(value);
        // Whole numbers (a section class, a count, K = 1) are written without decimals.
        if (a < 1e6 && value == Math.Round(value)) return (value < 0 ? "−" : "") + Group(a.ToString("F0", Inv));
        string sign = value < 0 ? "−" : "";
        if (a >= 1e6 || a < 1e-3)
        {
            int e3 = (int)Math.Floor(Math.Log10(a) / 3) * 3;
            double m = a / Math.Pow(10, e3);
            string ms = m.ToString(m >= 100 ? "F1" : m >= 10 ? "F2" : "F3", Inv);
            if (ms == "1000.0") { e3 += 3; ms = "1.000"; }
            return sign + ms + " × 10" + Superscript(e3);
        }
        int digits = Math.Max(0, 3 - (int)Math.Floor(Math.Log10(a)));
        string s = a.ToString("F" + digits.ToString(Inv), Inv);
        return sign + Group(s);
    }

    /// <summary>A value stored in SI, in the report's display unit for its kind.</summary>
    /// <param name="siValue">The value in SI.</param>
    /// <param name="unit">Its kind.</param>
    /// <returns>Number and unit, such as "245.7 kN"; "—" alone for NaN (no value).</returns>
    public static string Quantity(double siValue, StepUnit unit) => Quantity(siValue, unit, ReportUnits.Metric);

    /// <summary>A value stored in SI, in a chosen set of display units.</summary>
    /// <param name="siValue">The value in SI.</param>
    /// <param name="unit">Its kind.</param>
    /// <param name="units">The display units.</param>
    /// <returns>Number and unit, such as "245.7 kN" or "1 350 psi"; "—" alone for NaN (no value), without a unit.</returns>
    /// <exception cref="System.ArgumentOutOfRangeException">The display units are undefined.</exception>
    public static string Quantity(double siValue, StepUnit unit, ReportUnits units) => unit switch
    {
        _ when double.IsNaN(siValue) && units is ReportUnits.Metric or ReportUnits.UsCustomary => "—",
        StepUnit.None => Number(Chop(siValue)),
        StepUnit.Boolean => siValue != 0 ? "yes" : "no",
        _ => Number(Chop(Display(siValue, unit, units))) + " " + UnitText(unit, units),
    };

    // Exact definitions: 1 in = 0.0254 m, 1 lb (force) = 4.4482216152605 N, 1 lb (mass) = 0.45359237 kg, 1 ft = 0.3048 m.
    private const double Inch = 0.0254, PoundForce = 4.4482216152605;

    /// <summary>An SI value in the display unit of its kind.</summary>
    internal static double Display(double siValue, StepUnit unit, ReportUnits units)
    {
        if (units == ReportUnits.Metric) return siValue * Scale(unit);
        if (units != ReportUnits.UsCustomary) throw new System.ArgumentOutOfRangeException(nameof(units), units, $"Unknown report units {(int)units}.");
        return unit switch
        {
            StepUnit.Length => siValue / Inch,
            StepUnit.Area => siValue / (Inch * Inch),
            StepUnit.SecondMoment => siValue / (Inch * Inch * Inch * Inch),
            StepUnit.SectionModulus => siValue / (Inch * Inch * Inch),
            StepUnit.WarpingConstant => siValue / (Inch * Inch * Inch * Inch * Inch * Inch),
            StepUnit.Force => siValue / PoundForce,
            StepUnit.Stress => siValue / (PoundForce / (Inch * Inch)),
            StepUnit.Moment => siValue / (PoundForce * 0.3048),
            StepUnit.CharringRate => siValue * 60 / Inch,
            StepUnit.Density => siValue / (0.45359237 / (0.3048 * 0.3048 * 0.3048)),
            _ => siValue * Scale(unit),
        };
    }

    // A display value below 1e-9 (in mm, kN, MPa …) is rounding noise of a quantity that is zero by symmetry,
    // such as the shear-centre offset of an equal angle across its axis of symmetry: show it as 0.
    private static double Chop(double displayValue) => Math.Abs(displayValue) < 1e-9 ? 0 : displayValue;

    /// <summary>The factor from SI to the display unit.</summary>
    internal static double Scale(StepUnit unit) => unit switch
    {
        StepUnit.Length => 1e3,
        StepUnit.Area => 1e6,
        StepUnit.SecondMoment => 1e12,
        StepUnit.SectionModulus => 1e9,
        StepUnit.WarpingConstant => 1e18,
        StepUnit.Force => 1e-3,
        StepUnit.Stress => 1e-6,
        StepUnit.Moment => 1e-3,
        StepUnit.Angle => 180 / Math.PI,
        StepUnit.Time => 1.0 / 60,
        StepUnit.CharringRate => 1e3 * 60,
        _ => 1,
    };

    /// <summary>The display unit's symbol.</summary>
    /// <param name="unit">The kind of quantity.</param>
    /// <returns>The symbol, empty for a number.</returns>
    public static string UnitText(StepUnit unit) => UnitText(unit, ReportUnits.Metric);

    /// <summary>The symbol of a kind of quantity's display unit in a chosen set of units.</summary>
    /// <param name="unit">The kind of quantity.</param>
    /// <param name="units">The display units.</param>
    /// <returns>The symbol, empty for a number.</returns>
    public static string UnitText(StepUnit unit, ReportUnits units) => units != ReportUnits.UsCustomary ? MetricText(unit) : unit switch
    {
        StepUnit.Length => "in",
        StepUnit.Area => "in²",
        StepUnit.SecondMoment => "in⁴",
        StepUnit.SectionModulus => "in³",
        StepUnit.WarpingConstant => "in⁶",
        StepUnit.Force => "lb",
        StepUnit.Stress => "psi",
        StepUnit.Moment => "lb·ft",
        StepUnit.CharringRate => "in/min",
        StepUnit.Density => "lb/ft³",
        _ => MetricText(unit),
    };

    private static string MetricText(StepUnit unit) => unit switch
    {
        StepUnit.Length => "mm",
        StepUnit.Area => "mm²",
        StepUnit.SecondMoment => "mm⁴",
        StepUnit.SectionModulus => "mm³",
        StepUnit.WarpingConstant => "mm⁶",
        StepUnit.Force => "kN",
        StepUnit.Stress => "MPa",
        StepUnit.Moment => "kN·m",
        StepUnit.Angle => "°",
        StepUnit.Time => "min",
        StepUnit.CharringRate => "mm/min",
        StepUnit.Density => "kg/m³",
        _ => "",
    };

    private static string Group(string s)
    {
        int dot = s.IndexOf('.');
        string intPart = dot < 0 ? s : s[..dot];
        string frac = dot < 0 ? "" : s[dot..];
        if (intPart.Length <= 4) return s;
        var chars = new System.Text.StringBuilder();
        for (int i = 0; i < intPart.Length; i++)
        {
            if (i > 0 && (intPart.Length - i) % 3 == 0) chars.Append(' ');
            chars.Append(intPart[i]);
        }
        return chars.Append(frac).ToString();
    }

    private static string Superscript(int n)
    {
        const string digits = "⁰¹²³⁴⁵⁶⁷⁸⁹";
        var s = Math.Abs(n).ToString(Inv);
        var sb = new System.Text.StringBuilder(n < 0 ? "⁻" : "");
        foreach (char c in s) sb.Append(digits[c - '0']);
        return sb.ToString();
    }
}
