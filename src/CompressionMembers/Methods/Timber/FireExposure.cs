namespace CompressionMembers.Methods.Timber;

/// <summary>Which faces of a rectangular member are exposed to fire (EN 1995-1-2 4.2.2).</summary>
/// <remarks>Faces are named by the section's axes: a "width face" has length b and faces ±z; a "depth face" has length h
/// and faces ±y. The default value, <see cref="FourSides"/>, is a free-standing column.</remarks>
public enum FireExposure
{
    /// <summary>All four faces exposed: b,fi = b − 2 def, h,fi = h − 2 def.</summary>
    FourSides = 0,
    /// <summary>Three faces exposed, one width face (normal to z) protected, as against a floor or a wall along b:
    /// b,fi = b − 2 def, h,fi = h − def.</summary>
    ThreeSidesWidthFaceProtected,
    /// <summary>Three faces exposed, one depth face (normal to y) protected, as against a wall along h:
    /// b,fi = b − def, h,fi = h − 2 def.</summary>
    ThreeSidesDepthFaceProtected,
}
