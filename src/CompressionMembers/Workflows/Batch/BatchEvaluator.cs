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
        var results = new TOut[items.Count];
        RunInto(items, evaluate, results, options);
        return results;
    }

    /// <summary>Evaluates every item into an array the caller provides (and may reuse), so that a sweep of millions of
    /// cases allocates nothing per run: result <c>i</c> goes to <c>results[i]</c>.</summary>
    /// <typeparam name="TIn">Input type.</typeparam>
    /// <typeparam name="TOut">Result type.</typeparam>
    /// <param name="items">The items.</param>
    /// <param name="evaluate">The work for one item and its index; must be thread-safe.</param>
    /// <param name="results">Where the results go; at least as long as <paramref name="items"/> (further slots are left as they are).</param>
    /// <param name="options">Cores, progress and cancellation; <see cref="BatchOptions.Default"/> if null.</param>
    /// <remarks>The items are handed out in contiguous ranges (about 64), so that the cores do not contend for
    /// each item and neighbouring results are written by the same core; each result is written to its own slot, so the
    /// output never depends on scheduling.</remarks>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="results"/> is shorter than <paramref name="items"/>.</exception>
    /// <exception cref="OperationCanceledException">The batch was cancelled.</exception>
    /// <exception cref="AggregateException">The work threw for some item (the first exceptions, as Parallel.For gathers them).</exception>
    public static void RunInto<TIn, TOut>(IReadOnlyList<TIn> items, Func<TIn, int, TOut> evaluate, TOut[] results, BatchOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(items);
        ArgumentNullException.ThrowIfNull(evaluate);
        ArgumentNullException.ThrowIfNull(results);
        int n = items.Count;
        if (results.Length < n)
            throw new ArgumentException($"The results array holds {results.Length} slots; the batch has {n} items.", nameof(results));
        options ??= BatchOptions.Default;
        var progress = options.Progress;
        var token = options.CancellationToken;
        token.ThrowIfCancellationRequested();
        if (options.MaxDegreeOfParallelism == 1)
        {
            int step = Math.Max(1, n / 100);
            for (int i = 0; i < n; i++)
            {
                token.ThrowIfCancellationRequested();
                results[i] = evaluate(items[i], i);
                if (progress is not null && ((i + 1) % step == 0 || i + 1 == n)) progress.Report(new BatchProgress(i + 1, n));
            }
            return;
        }
        // About 64 ranges (of at least 64 items): few enough hand-outs to cost nothing, enough to even out cores that
        // finish early on machines of up to a few dozen cores. The split does not depend on the machine, and no result
        // depends on it.
        int chunk = Math.Max(64, (n + 63) / 64);
        int ranges = (n + chunk - 1) / chunk;
        int done = 0;
        var po = new ParallelOptions { MaxDegreeOfParallelism = options.MaxDegreeOfParallelism, CancellationToken = token };
        Parallel.For(0, ranges, po, r =>
        {
            int from = r * chunk, to = Math.Min(n, from + chunk);
            for (int i = from; i < to; i++) results[i] = evaluate(items[i], i);
            if (progress is not null)
            {
                int d = Interlocked.Add(ref done, to - from);
                progress.Report(new BatchProgress(d, n));
            }
        });
    }
}
