using System;
using System.Collections.Generic;
using System.Diagnostics;
using System.Threading;
using System.Threading.Tasks;

namespace CompressionMembers.Workflows.Batch;

/// <summary>Evaluates many independent items across cores with results in input order, so that the output is the same
/// whatever the number of cores.</summary>
/// <remarks>
/// Items are handed out in ranges by <see cref="Parallel.For(int, int, ParallelOptions, Action{int})"/> (after the first
/// items, on the calling thread, show the batch is worth a second core); each result is written to its own slot of the
/// output, so order never depends on scheduling. The work function must be pure (our checks are).
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
    /// <exception cref="AggregateException">The work threw for some item (the first exceptions, as Parallel.For gathers them),
    /// whichever thread ran it. With a <see cref="BatchOptions.MaxDegreeOfParallelism"/> of 1 (<see cref="BatchOptions.Serial"/>)
    /// the work's exception arrives as it was thrown, unwrapped.</exception>
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
    /// output never depends on scheduling. A batch that takes less than about a quarter of a millisecond runs on the
    /// calling thread alone (waking a second core would cost more); a larger one is spread after its first items.</remarks>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="results"/> is shorter than <paramref name="items"/>.</exception>
    /// <exception cref="OperationCanceledException">The batch was cancelled.</exception>
    /// <exception cref="AggregateException">The work threw for some item (the first exceptions, as Parallel.For gathers them),
    /// whichever thread ran it. With a <see cref="BatchOptions.MaxDegreeOfParallelism"/> of 1 (<see cref="BatchOptions.Serial"/>)
    /// the work's exception arrives as it was thrown, unwrapped.</exception>
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
        // A batch of fewer than 16,384 items runs its first items here, in order, sixteen at a time, while it looks small:
        // handing work to a second core costs waking it (0.1-0.5 ms measured on a two-core virtual machine,
        // docs/performance.md), more than a batch of a thousand checks takes. As soon as the time so far, or the time
        // projected from it for the whole batch, reaches SmallBatchTicks, the rest is handed out across the cores; the
        // projection is trusted only after a quarter of that (a stall of a few tens of microseconds early on, which this
        // machine has, would make a small batch look large). So a small batch never pays for a second core, a larger one
        // starts it after some 60 µs, and a batch whose first items happen to be cheap loses at most about SmallBatchTicks.
        // A batch of 16,384 items or more goes to the cores at once: even at 20 ns an item (a short check) it takes longer
        // than that, and a pool thread still spinning after the previous batch of a sweep is caught awake. Which items ran
        // here never changes a result.
        int k = 0;
        if (n < 16_384)
        {
            long start = Stopwatch.GetTimestamp();
            try
            {
                while (k < n)
                {
                    token.ThrowIfCancellationRequested();
                    for (int to = Math.Min(n, k + 16); k < to; k++) results[k] = evaluate(items[k], k);
                    long elapsed = Stopwatch.GetTimestamp() - start;
                    if (elapsed >= SmallBatchTicks || (elapsed >= SmallBatchTicks / 4 && elapsed * (double)n / k >= SmallBatchTicks)) break;
                }
            }
            catch (Exception ex) when (ex is not OperationCanceledException oce || oce.CancellationToken != token)
            {
                throw new AggregateException(ex);   // as Parallel.For reports the work's exceptions
            }
        }
        if (progress is not null && k > 0) progress.Report(new BatchProgress(k, n));
        if (k == n) return;
        // The rest in about 64 ranges (of at least 64 items): few enough hand-outs to cost nothing, enough to even out
        // cores that finish early on machines of up to a few dozen cores. No result depends on the split.
        int first = k, rest = n - k;
        int chunk = Math.Max(64, (rest + 63) / 64);
        int ranges = (rest + chunk - 1) / chunk;
        int done = k;
        var po = new ParallelOptions { MaxDegreeOfParallelism = options.MaxDegreeOfParallelism, CancellationToken = token };
        Parallel.For(0, ranges, po, r =>
        {
            int from = first + r * chunk, to = Math.Min(n, from + chunk);
            for (int i = from; i < to; i++) results[i] = evaluate(items[i], i);
            if (progress is not null)
            {
                int d = Interlocked.Add(ref done, to - from);
                progress.Report(new BatchProgress(d, n));
            }
        });
    }

    /// <summary>A quarter of a millisecond: below this a batch is not worth a second core (see RunInto).</summary>
    private static readonly long SmallBatchTicks = Stopwatch.Frequency / 4000;
}
