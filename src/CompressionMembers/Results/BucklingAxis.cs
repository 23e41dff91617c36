namespace CompressionMembers.Results;

/// <summary>The axis a check or a mode refers to.</summary>
/// <remarks>The default value, <see cref="None"/>, is for modes with no axis (torsional buckling, crushing).</remarks>
public enum BucklingAxis
{
    /// <summary>No single axis (torsional buckling, cross-section crushing).</summary>
    None = 0,
    /// <summary>The principal axis y (major axis of unsymmetric sections).</summary>
    Y,
    /// <summary>The principal axis z (minor axis of unsymmetric sections).</summary>
    Z,
    /// <summary>Both axes together (biaxial interaction).</summary>
    Both,
}
