using System;
using System.Collections.Generic;
using System.Threading;
using System.Threading.Tasks;

namespace CompressionMembers.Workflows.Batch;

/// <summary>Evaluates many independent items across cores with results in input order, so that the output is the same
/// whatever the number of cores.</summary>
/// <remarks>
/// Items are handed out by <see cref="Parallel.For(int, int, ParallelOptions, Action{int})"/>; each result is written to
/// its own slot of the output, so order never depends on scheduling. The work function must be pure (our checks are).
/// Thread safety: stateless.
/// </remarks>
public static class BatchEvaluator
{
    /// <summary>Evaluates every item.</summary>
    /// <typeparam name="TIn">Input type.</typeparam>
    /// <typeparam name="TOut">Result type.</typeparam>
    /// <param name="items">The items.</param>
    /// <param name="evaluate">The work for one item and its index; must be thread-safe.</param>
    /// <param name="options">Cores, progress and cancellation; <see cref="BatchOptions.Default"/> if null.</param>
    /// <returns>The results, in the order of the items.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="OperationCanceledException">The batch was cancelled.</exception>
    /// <exception cref="AggregateException">The work threw for some item (the first exceptions, as Parallel.For gathers them).</exception>
    public static IReadOnlyList<TOut> Run<TIn, TOut>(IReadOnlyList<TIn> items, Func<TIn, int, TOut> evaluate, BatchOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(items);
        ArgumentNullException.ThrowIfNull(evaluate);
        options ??= BatchOptions.Default;
        int n = items.Count;
        var results = new TOut[n];
        var progress = options.Progress;
        int step = Math.Max(1, n / 100);
        int done = 0;
        var token = options.CancellationToken;
        token.ThrowIfCancellationRequested();
        if (options.MaxDegreeOfParallelism == 1)
        {
            for (int i = 0; i < n; i++)
            {
                token.ThrowIfCancellationRequested();
                results[i] = evaluate(items[i], i);
                if (progress is not null && ((i + 1) % step == 0 || i + 1 == n)) progress.Report(new BatchProgress(i + 1, n));
            }
            return results;
        }
        var po = new ParallelOptions { MaxDegreeOfParallelism = options.MaxDegreeOfParallelism, CancellationToken = token };
        Parallel.For(0, n, po, i =>
        {
            results[i] = evaluate(items[i], i);
            if (progress is not null)
            {
                int d = Interlocked.Increment(ref done);
                if (d % step == 0 || d == n) progress.Report(new BatchProgress(d, n));
            }
        });
        return results;
    }
}
