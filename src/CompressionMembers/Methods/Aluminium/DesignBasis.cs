namespace CompressionMembers.Methods.Aluminium;

/// <summary>The design basis of US practice: load and resistance factor design or allowable strength design.</summary>
/// <remarks>The default value, <see cref="Lrfd"/>, is LRFD.</remarks>
public enum DesignBasis
{
    /// <summary>Load and resistance factor design: design strength φc Fc A.</summary>
    Lrfd = 0,
    /// <summary>Allowable strength design: allowable strength Fc A / Ωc.</summary>
    Asd = 1,
}
