namespace CompressionMembers.Restraints;

/// <summary>Which effective length factor to take for a pair of ideal end conditions; chosen explicitly by the user.</summary>
/// <remarks>There is deliberately no default the library picks for you: <see cref="Theoretical"/> is the default
/// value of the enum only in the C# sense.</remarks>
public enum EffectiveLengthBasis
{
    /// <summary>The elastic-theory value for perfectly rigid or perfectly free ends (fixed–fixed 0.5, fixed–pinned 0.699, …).</summary>
    Theoretical = 0,
    /// <summary>The recommended design value of common practice, which allows for ends that are never perfectly fixed (fixed–fixed 0.65, fixed–pinned 0.80, …).</summary>
    Recommended,
}
