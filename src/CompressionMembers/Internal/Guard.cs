using System;
using System.Globalization;

namespace CompressionMembers.Internal;

/// <summary>Validation helpers. Messages name the parameter, the value and its unit; nothing is clamped.</summary>
internal static class Guard
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>A value as a message shows it: invariant culture, six significant digits, NaN and infinities spelt out.</summary>
    internal static string Show(double value) =>
        double.IsNaN(value) ? "NaN" :
        double.IsPositiveInfinity(value) ? "+infinity" :
        double.IsNegativeInfinity(value) ? "-infinity" :
        value == 0 || Math.Abs(value) < 1e-4 || Math.Abs(value) >= 1e15 ? value.ToString("G6", Inv) :
        RoundToSignificant(value, 6).ToString("0.##########", Inv);

    private static double RoundToSignificant(double value, int digits)
    {
        int magnitude = (int)Math.Floor(Math.Log10(Math.Abs(value))) + 1;
        int decimals = Math.Clamp(digits - magnitude, 0, 15);
        return Math.Round(value, decimals, MidpointRounding.AwayFromZero);
    }

    /// <summary>A value followed by its unit, or the bare value for a dimensionless one.</summary>
    internal static string Show(double value, string unit) =>
        unit.Length == 0 ? Show(value) : Show(value) + " " + unit;

    /// <summary>Throws unless <paramref name="value"/> is a finite, normal number greater than zero.</summary>
    internal static double Positive(double value, string paramName, string unit, string what)
    {
        if (!double.IsFinite(value)) ThrowNotFinite(value, paramName, unit, what);
        if (!(value > 0) || !double.IsNormal(value))
            throw new ArgumentOutOfRangeException(paramName, value, $"{what} must be greater than 0; got {Show(value, unit)}.");
        return value;
    }

    /// <summary>Throws unless <paramref name="value"/> is finite and not negative.</summary>
    internal static double NonNegative(double value, string paramName, string unit, string what)
    {
        if (!double.IsFinite(value)) ThrowNotFinite(value, paramName, unit, what);
        if (value < 0)
            throw new ArgumentOutOfRangeException(paramName, value, $"{what} must not be negative; got {Show(value, unit)}.");
        return value;
    }

    /// <summary>Throws unless <paramref name="value"/> is finite.</summary>
    internal static double Finite(double value, string paramName, string unit, string what)
    {
        if (!double.IsFinite(value)) ThrowNotFinite(value, paramName, unit, what);
        return value;
    }

    /// <summary>Throws unless lo ≤ value ≤ hi and the value is finite.</summary>
    internal static double InRange(double value, double lo, double hi, string paramName, string unit, string what)
    {
        if (!double.IsFinite(value)) ThrowNotFinite(value, paramName, unit, what);
        if (value < lo || value > hi)
            throw new ArgumentOutOfRangeException(paramName, value,
                $"{what} must be between {Show(lo)} and {Show(hi, unit)}; got {Show(value, unit)}.");
        return value;
    }

    internal static T NotNull<T>(T? value, string paramName) where T : class =>
        value ?? throw new ArgumentNullException(paramName);

    internal static void ThrowNotFinite(double value, string paramName, string unit, string what) =>
        throw new ArgumentOutOfRangeException(paramName, value, $"{what} must be a finite number; got {Show(value, unit)}.");
}
