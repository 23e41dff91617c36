namespace CompressionMembers.Methods.Aluminium;

/// <summary>The temper group that selects the buckling-constant formulas of US practice.</summary>
/// <remarks>The default value, <see cref="FromAlloy"/>, reads the group from the alloy's temper.</remarks>
public enum TemperGroup
{
    /// <summary>From the alloy: tempers T5 to T9 are artificially aged, all others not.</summary>
    FromAlloy = 0,
    /// <summary>Artificially aged tempers (T5, T6, T7, T8, T9).</summary>
    ArtificiallyAged = 1,
    /// <summary>Other tempers (O, H, T1 to T4).</summary>
    Other = 2,
}
