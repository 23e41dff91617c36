namespace CompressionMembers.Methods.Aluminium;

/// <summary>The kind of a flat part of a cross-section for EN 1999-1-1 classification (6.1.4.3).</summary>
/// <remarks>The default value, <see cref="Internal"/>, is a part supported along both edges.</remarks>
public enum PartKind
{
    /// <summary>An internal part, supported along both longitudinal edges (a web, a tube wall).</summary>
    Internal = 0,
    /// <summary>An outstand, supported along one edge, with the peak compression at its root (or uniform).</summary>
    OutstandPeakAtRoot = 1,
    /// <summary>An outstand with the peak compression at its free edge (toe).</summary>
    OutstandPeakAtToe = 2,
}
