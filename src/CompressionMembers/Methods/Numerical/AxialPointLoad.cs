using UnitsNet;

namespace CompressionMembers.Methods.Numerical;

/// <summary>An axial compression applied at one level of a numerical model (a floor or a purlin bearing on a column).</summary>
/// <remarks>It compresses the member below its level. The default value is a zero load at the bottom and is never held by a model.
/// Thread safety: immutable value type.</remarks>
/// <param name="Position">Level above the bottom end (0 &lt; position ≤ L; the top end is L).</param>
/// <param name="Compression">The axial compression, greater than 0.</param>
public readonly record struct AxialPointLoad(Length Position, Force Compression);
