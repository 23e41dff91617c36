namespace CompressionMembers.Results;

/// <summary>The kind of quantity a calculation step holds; values are stored in SI and renderers choose the display unit.</summary>
/// <remarks>The default value, <see cref="None"/>, is a dimensionless number.</remarks>
public enum StepUnit
{
    /// <summary>A dimensionless number.</summary>
    None = 0,
    /// <summary>Length (stored in m; shown in mm).</summary>
    Length,
    /// <summary>Area (m²; shown in mm²).</summary>
    Area,
    /// <summary>Second moment of area or torsion constant (m⁴; shown in mm⁴).</summary>
    SecondMoment,
    /// <summary>Section modulus (m³; shown in mm³).</summary>
    SectionModulus,
    /// <summary>Warping constant (m⁶; shown in mm⁶).</summary>
    WarpingConstant,
    /// <summary>Force (N; shown in kN).</summary>
    Force,
    /// <summary>Stress or modulus (Pa; shown in MPa).</summary>
    Stress,
    /// <summary>Moment (N·m; shown in kN·m).</summary>
    Moment,
    /// <summary>Angle (rad; shown in degrees).</summary>
    Angle,
    /// <summary>Time (s; shown in min).</summary>
    Time,
    /// <summary>Rate of charring or other speed (m/s; shown in mm/min).</summary>
    CharringRate,
    /// <summary>Density (kg/m³).</summary>
    Density,
    /// <summary>A yes/no outcome (1 = yes, 0 = no).</summary>
    Boolean,
}
