namespace CompressionMembers.Results;

/// <summary>The mode that governs a check.</summary>
/// <remarks>The default value, <see cref="FlexuralBuckling"/>, is the commonest mode.</remarks>
public enum FailureMode
{
    /// <summary>Flexural buckling about one axis (see the governing axis).</summary>
    FlexuralBuckling = 0,
    /// <summary>Torsional buckling (twisting about the shear centre).</summary>
    TorsionalBuckling,
    /// <summary>Flexural-torsional buckling (bending and twisting together).</summary>
    FlexuralTorsionalBuckling,
    /// <summary>Local buckling of thin plate elements.</summary>
    LocalBuckling,
    /// <summary>Yielding or crushing of the cross-section (squash load).</summary>
    Yielding,
    /// <summary>Lateral-torsional buckling of a member in bending.</summary>
    LateralTorsionalBuckling,
    /// <summary>Combined compression and bending (an interaction check).</summary>
    CombinedCompressionAndBending,
    /// <summary>Elastic stress limit reached at an extreme fibre (secant formula).</summary>
    ExtremeFibreStress,
}
