using System;
using System.Collections.Generic;
using System.Diagnostics;
using System.Linq;
using System.Threading;
using CompressionMembers.Workflows.Batch;

namespace CompressionMembers.Tests.Workflows;

/// <summary>
/// <see cref="BatchEvaluator"/> runs a small batch on the calling thread and spreads a large one over the cores once its
/// first ranges show it is worth it. Whatever the path, the results are the serial run's, slot for slot; the work's
/// exceptions arrive as an <see cref="AggregateException"/> (unwrapped with <see cref="BatchOptions.Serial"/>); cancellation
/// throws. (Consistency checks of our own: the reference here is the serial run.)
/// </summary>
public class BatchEvaluatorTests
{
    // A pure function of the item and its index whose bits depend on both (so a result in the wrong slot shows).
    private static double Work(double x, int i) => Math.Sqrt(x * (i + 1)) / (1 + (i % 7));

    // About 20 µs an item: any batch of more than a dozen items is projected past the quarter millisecond at once.
    private static double SlowWork(double x, int i)
    {
        long until = Stopwatch.GetTimestamp() + Stopwatch.Frequency / 50_000;
        while (Stopwatch.GetTimestamp() < until) { }
        return Work(x, i);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(1)]
    [InlineData(10)]
    [InlineData(64)]
    [InlineData(65)]
    [InlineData(1_000)]
    [InlineData(100_000)]
    public void RunInto_CheapAndSlowWork_SameSlotsAsTheSerialRun(int n)
    {
        var items = Enumerable.Range(0, n).Select(i => 1.0 + i * 0.37).ToArray();
        var serial = new double[n];
        BatchEvaluator.RunInto(items, Work, serial, BatchOptions.Serial);
        var two = new double[n];
        BatchEvaluator.RunInto(items, Work, two, new BatchOptions(2));
        Assert.Equal(serial.Select(BitConverter.DoubleToInt64Bits), two.Select(BitConverter.DoubleToInt64Bits));
        if (n > 2_000) return;   // slow work: a few hundred items are enough to go past the first ranges
        var slow = new double[n];
        BatchEvaluator.RunInto(items, SlowWork, slow, new BatchOptions(2));
        Assert.Equal(serial.Select(BitConverter.DoubleToInt64Bits), slow.Select(BitConverter.DoubleToInt64Bits));
    }

    [Fact]
    public void RunInto_ItemsCheapFirstThenSlow_SameSlotsAsTheSerialRun()
    {
        // The first ranges look small, the rest are not: the batch starts here and is spread on the way.
        var items = Enumerable.Range(0, 2_000).Select(i => 1.0 + i).ToArray();
        Func<double, int, double> mixed = (x, i) => i < 640 ? Work(x, i) : SlowWork(x, i);
        var serial = new double[items.Length];
        BatchEvaluator.RunInto(items, mixed, serial, BatchOptions.Serial);
        var two = new double[items.Length];
        BatchEvaluator.RunInto(items, mixed, two, new BatchOptions(2));
        Assert.Equal(serial, two);
    }

    [Theory]
    [InlineData(10, false)]        // on the calling thread
    [InlineData(5_000, true)]      // spread over the cores
    public void RunInto_WorkThrows_AggregateExceptionWithTheWorksException(int n, bool slow)
    {
        var items = Enumerable.Range(0, n).Select(i => (double)i).ToArray();
        int bad = n - 3;
        Func<double, int, double> work = (x, i) => i == bad ? throw new InvalidOperationException("item " + i) : slow ? SlowWork(x, i) : Work(x, i);
        var ex = Assert.Throws<AggregateException>(() => BatchEvaluator.Run(items, work, new BatchOptions(2)));
        Assert.Contains(ex.Flatten().InnerExceptions, e => e is InvalidOperationException { Message: var m } && m == "item " + bad);
    }

    [Fact]
    public void RunInto_SerialWorkThrows_TheWorksExceptionUnwrapped()
    {
        // BatchOptions.Serial runs the work as a plain loop: its exception arrives as thrown (the XML doc and
        // docs/workflows.md say so).
        var items = Enumerable.Range(0, 10).Select(i => (double)i).ToArray();
        Func<double, int, double> work = (x, i) => i == 7 ? throw new InvalidOperationException("item " + i) : Work(x, i);
        var ex = Assert.Throws<InvalidOperationException>(() => BatchEvaluator.Run(items, work, BatchOptions.Serial));
        Assert.Equal("item 7", ex.Message);
    }

    [Theory]
    [InlineData(100)]
    [InlineData(5_000)]
    public void RunInto_CancelledByTheWork_Throws(int n)
    {
        using var cts = new CancellationTokenSource();
        var items = Enumerable.Range(0, n).Select(i => (double)i).ToArray();
        Func<double, int, double> work = (x, i) => { if (i == 5) cts.Cancel(); return SlowWork(x, i); };
        Assert.ThrowsAny<OperationCanceledException>(() => BatchEvaluator.Run(items, work, new BatchOptions(2, null, cts.Token)));
    }

    [Theory]
    [InlineData(10)]
    [InlineData(3_000)]
    public void RunInto_Progress_ReachesTheWholeBatch(int n)
    {
        var seen = new List<BatchProgress>();
        var progress = new Collect(seen);
        var items = Enumerable.Range(0, n).Select(i => (double)i).ToArray();
        BatchEvaluator.Run(items, SlowWork, new BatchOptions(2, progress));
        lock (seen)
        {
            Assert.NotEmpty(seen);
            Assert.All(seen, p => Assert.Equal(n, p.Total));
            Assert.Equal(n, seen.Max(p => p.Completed));
        }
    }

    private sealed class Collect(List<BatchProgress> seen) : IProgress<BatchProgress>
    {
        public void Report(BatchProgress value) { lock (seen) seen.Add(value); }
    }
}
