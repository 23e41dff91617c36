using System;
using System.Globalization;
using UnitsNet;

namespace CompressionMembers.Internal;

/// <summary>
/// Converts quantities at the public boundary to SI doubles and validates them. A failure message quotes the
/// value in the unit the caller used, so "got -3200 mm" reads as the caller wrote it.
/// </summary>
internal static class Si
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    internal static string Given(IQuantity q) => Guard.Show((double)q.Value) + " " + q.ToString("a", Inv);

    private static double Check(double si, IQuantity q, string paramName, string what, Sign sign)
    {
        if (!double.IsFinite(si) || !double.IsFinite((double)q.Value))
            throw new ArgumentOutOfRangeException(paramName, (double)q.Value, $"{what} must be a finite number; got {Given(q)}.");
        switch (sign)
        {
            case Sign.Positive when !(si > 0) || !double.IsNormal(si):
                throw new ArgumentOutOfRangeException(paramName, (double)q.Value, $"{what} must be greater than 0; got {Given(q)}.");
            case Sign.NonNegative when si < 0:
                throw new ArgumentOutOfRangeException(paramName, (double)q.Value, $"{what} must not be negative; got {Given(q)}.");
        }
        return si;
    }

    internal enum Sign { Any, NonNegative, Positive }

    internal static double Meters(Length q, string p, string what, Sign s = Sign.Positive) => Check(q.Meters, q, p, what, s);
    internal static double SquareMeters(Area q, string p, string what, Sign s = Sign.Positive) => Check(q.SquareMeters, q, p, what, s);
    internal static double MetersToFourth(AreaMomentOfInertia q, string p, string what, Sign s = Sign.Positive) => Check(q.MetersToTheFourth, q, p, what, s);
    internal static double CubicMeters(Volume q, string p, string what, Sign s = Sign.Positive) => Check(q.CubicMeters, q, p, what, s);
    internal static double Newtons(Force q, string p, string what, Sign s = Sign.Positive) => Check(q.Newtons, q, p, what, s);
    /// <summary>A stress or modulus; above 10 000 GPa it is no property of a structural material (diamond's E is about
    /// 1 200 GPa) and would overflow the kernels' products, so it is refused.</summary>
    internal static double Pascals(Pressure q, string p, string what, Sign s = Sign.Positive)
    {
        double v = Check(q.Pascals, q, p, what, s);
        if (Math.Abs(v) > MaxStressPa)
            throw new ArgumentOutOfRangeException(p, (double)q.Value, $"{what} must be at most 10 000 GPa (no structural material comes near); got {Given(q)}.");
        return v;
    }

    internal const double MaxStressPa = 1e13;
    internal static double NewtonMeters(Torque q, string p, string what, Sign s = Sign.Any) => Check(q.NewtonMeters, q, p, what, s);
    internal static double KilogramsPerCubicMeter(Density q, string p, string what, Sign s = Sign.Positive) => Check(q.KilogramsPerCubicMeter, q, p, what, s);
    internal static double Radians(Angle q, string p, string what, Sign s = Sign.Any) => Check(q.Radians, q, p, what, s);
    internal static double NewtonMetersPerRadian(RotationalStiffness q, string p, string what, Sign s = Sign.NonNegative) => Check(q.NewtonMetersPerRadian, q, p, what, s);
    internal static double NewtonsPerMeter(ForcePerLength q, string p, string what, Sign s = Sign.NonNegative) => Check(q.NewtonsPerMeter, q, p, what, s);
    internal static double Seconds(Duration q, string p, string what, Sign s = Sign.NonNegative) => Check(q.Seconds, q, p, what, s);
}
