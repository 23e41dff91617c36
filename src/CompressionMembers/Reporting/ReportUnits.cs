namespace CompressionMembers.Reporting;

/// <summary>The units a report shows its calculated values in. Inputs are always echoed in the caller's own units; the
/// calculation itself is always in SI.</summary>
/// <remarks>The default value, <see cref="Metric"/>, is the metric set every report used before this option existed.
/// Changing the display units changes no calculated value, only how it is printed (the input fingerprint is the same).</remarks>
public enum ReportUnits
{
    /// <summary>mm, mm², mm⁴, mm³, mm⁶, kN, MPa, kN·m, mm/min, kg/m³.</summary>
    Metric = 0,

    /// <summary>in, in², in⁴, in³, in⁶, lb, psi, lb·ft, in/min, lb/ft³ — the units of US wood and aluminium practice
    /// (exact definitions: 1 in = 25.4 mm, 1 lb = 4.4482216152605 N).</summary>
    UsCustomary = 1,
}
