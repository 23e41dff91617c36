using CompressionMembers.Internal;

namespace CompressionMembers.Workflows.Batch;

/// <summary>How far a batch has got: items completed out of the total.</summary>
/// <remarks>The default value is 0 of 0. Thread safety: immutable value type.</remarks>
[Immutable]
public readonly record struct BatchProgress(int Completed, int Total)
{
    /// <summary>The fraction done, 0 to 1 (1 for an empty batch).</summary>
    public double Fraction => Total == 0 ? 1 : (double)Completed / Total;
}
