using UnitsNet;

namespace CompressionMembers.Sections;

/// <summary>A vertex of a polygonal section outline, at (y, z) in the section's reference axes.</summary>
/// <remarks>The default value is the origin (0, 0) with lengths in metres. Thread safety: immutable value type.</remarks>
/// <param name="Y">Horizontal coordinate.</param>
/// <param name="Z">Vertical coordinate.</param>
public readonly record struct SectionPoint(Length Y, Length Z)
{
    /// <summary>A vertex from coordinates in millimetres.</summary>
    /// <param name="y">Horizontal coordinate in mm.</param>
    /// <param name="z">Vertical coordinate in mm.</param>
    /// <returns>The vertex.</returns>
    public static SectionPoint FromMillimeters(double y, double z) => new(Length.FromMillimeters(y), Length.FromMillimeters(z));
}
