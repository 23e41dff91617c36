using System;
using System.Threading;
using CompressionMembers.Internal;

namespace CompressionMembers.Workflows.Batch;

/// <summary>How a batch runs: how many cores at most, where to report progress and how to cancel.</summary>
/// <remarks>Thread safety: immutable reference type (the progress sink must itself be thread-safe; <see cref="Progress{T}"/> is).</remarks>
[Immutable]
public sealed class BatchOptions
{
    /// <summary>Creates options.</summary>
    /// <param name="maxDegreeOfParallelism">Most items evaluated at once: 1 runs serially; -1 (the default) lets the runtime choose.</param>
    /// <param name="progress">Where to report progress (about every 1 % and at the end), or null.</param>
    /// <param name="cancellationToken">Cancels the batch: it then throws <see cref="OperationCanceledException"/>.</param>
    /// <exception cref="ArgumentOutOfRangeException">The degree is 0 or less than -1.</exception>
    public BatchOptions(int maxDegreeOfParallelism = -1, IProgress<BatchProgress>? progress = null, CancellationToken cancellationToken = default)
    {
        if (maxDegreeOfParallelism == 0 || maxDegreeOfParallelism < -1)
            throw new ArgumentOutOfRangeException(nameof(maxDegreeOfParallelism), maxDegreeOfParallelism,
                $"The maximum degree of parallelism must be -1 (runtime's choice) or at least 1; got {maxDegreeOfParallelism}.");
        MaxDegreeOfParallelism = maxDegreeOfParallelism;
        Progress = progress;
        CancellationToken = cancellationToken;
    }

    /// <summary>Runtime's choice of cores, no progress, no cancellation.</summary>
    public static BatchOptions Default { get; } = new();

    /// <summary>One item at a time, on the calling thread's pool.</summary>
    public static BatchOptions Serial { get; } = new(1);

    /// <summary>Most items evaluated at once (-1: the runtime's choice).</summary>
    public int MaxDegreeOfParallelism { get; }

    /// <summary>Where progress is reported, or null.</summary>
    public IProgress<BatchProgress>? Progress { get; }

    /// <summary>The cancellation token.</summary>
    public CancellationToken CancellationToken { get; }
}
