using System;
using System.Collections.Generic;
using System.Diagnostics;
using System.Globalization;
using System.Threading;

namespace CompressionMembers.Benchmarks;

/// <summary>
/// The two-core speed-up of the batches measured in one process, without BenchmarkDotNet's engine: for each workload,
/// rounds of the serial run, the two-core run and — the machine's own ceiling — two serial runs at once on two threads
/// (two independent runs over the same inputs, each writing results of its own), alternating round by round so that the
/// machine's drift touches all three alike. BenchmarkDotNet times the one-core and two-core benchmarks in processes
/// minutes apart, and on a machine whose speed drifts by a third within minutes their ratio is then mostly drift.
/// Not a test and not run by CI.
/// </summary>
/// <remarks>
/// <code>dotnet run -c Release --project benchmarks/CompressionMembers.Benchmarks -- --plain-batch --rounds 9</code>
/// Per workload: the medians of the three times, <c>batch</c> = one core ÷ two cores, and <c>ceiling</c> = 2 × one core ÷
/// the two copies at once (2.0 when two threads do not slow each other at all), and <c>batch / ceiling</c>, the share of
/// what the machine gives two threads that the batch turns into speed-up, round by round. Workloads may be named
/// (<c>checks</c>, <c>checks10</c> — the same checks ten times over in one call —, <c>results</c>, <c>selection</c>,
/// <c>schedule</c>); no name means all five.
/// </remarks>
internal static class PlainBatch
{
    private const double RoundSeconds = 0.4;

    private sealed record Workload(string Name, string What, Func<int> OneCore, Func<int> TwoCores, Func<int> OneCoreCopy);

    public static int Run(string[] args)
    {
        int rounds = 9;
        var names = new List<string>();
        for (int i = 0; i < args.Length; i++)
        {
            if (args[i] == "--rounds" && i + 1 < args.Length) rounds = int.Parse(args[++i], CultureInfo.InvariantCulture);
            else names.Add(args[i].ToLowerInvariant());
        }
        if (names.Count == 0) names.AddRange(["checks", "checks10", "results", "selection", "schedule"]);
        Console.WriteLine($"Plain batch: one core, two cores and two serial copies at once, alternating, {rounds} rounds per workload; medians, ms per run.");
        Console.WriteLine("batch = one core / two cores; ceiling = 2 x one core / two copies at once (what two cores give two independent runs here).");
        foreach (var name in names)
        {
            var w = Build(name);
            Measure(w, rounds);
        }
        return 0;
    }

    // The two copies of the ceiling read the same inputs, as the two threads of the batch do, and write results of their
    // own (no cache line written by both threads): the check sweeps through a second benchmark object with arrays of its
    // own; size selection and the schedule return new results from every run.
    private static Workload Build(string name)
    {
        switch (name)
        {
            case "checks":
            case "checks10":
            case "results":
            {
                int repeat = name == "checks10" ? 10 : 1;
                var a = new CheckBatchBenchmarks { Repeat = repeat }; a.Setup();
                var b = a.SharingInputs();
                return name != "results"
                    ? new Workload(name, string.Create(CultureInfo.InvariantCulture, $"{200_000 * repeat:N0} EN 1995-1-1 checks, (u, N) into a reused array"),
                        () => Sink(a.NumbersOneCore()), () => Sink(a.NumbersTwoCores()), () => Sink(b.NumbersOneCore()))
                    : new Workload(name, "200,000 EN 1995-1-1 checks, full results into a reused array",
                        () => Sink(a.OneCore()), () => Sink(a.TwoCores()), () => Sink(b.OneCore()));
            }
            case "selection":
            {
                var a = new WorkflowBenchmarks { Members = 10_000, Sections = 1_000 }; a.Setup();
                return new Workload(name, "size selection, 10,000 members x 1,000 sections, pruned",
                    a.PrunedOneCore, a.PrunedTwoCores, a.PrunedOneCore);   // each run returns a list of its own
            }
            case "schedule":
            {
                var a = new ScheduleBatchBenchmarks(); a.Setup();
                return new Workload(name, "schedule of 10,000 rows checked in memory", a.OneCore, a.TwoCores, a.OneCore);   // likewise
            }
            default:
                throw new ArgumentException($"No workload \"{name}\"; the workloads are checks, checks10, results, selection and schedule.");
        }
    }

    private static int Sink(double x) => double.IsNaN(x) ? 1 : 0;

    private static void Measure(Workload w, int rounds)
    {
        int calls = Calibrate(w.OneCore);
        var one = new double[rounds];
        var two = new double[rounds];
        var pair = new double[rounds];
        var batch = new double[rounds];
        var ceiling = new double[rounds];
        var share = new double[rounds];
        var probe = new double[rounds];
        for (int k = 0; k < rounds; k++)
        {
            one[k] = Time(w.OneCore, calls);
            two[k] = Time(w.TwoCores, calls);
            pair[k] = TimePair(w.OneCore, w.OneCoreCopy, calls);
            batch[k] = one[k] / two[k];
            ceiling[k] = 2 * one[k] / pair[k];
            share[k] = batch[k] / ceiling[k];
            probe[k] = MachineProbe.Ratio();
        }
        Console.WriteLine();
        Console.WriteLine($"{w.Name}: {w.What}, {calls} runs per round");
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"  one core {Median(one) * 1e3:F1} ms, two cores {Median(two) * 1e3:F1} ms, two copies at once {Median(pair) * 1e3:F1} ms"));
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"  batch {Median(batch):F2}x (rounds {Range(batch)}), ceiling {Median(ceiling):F2}x (rounds {Range(ceiling)}), batch / ceiling {Median(share):F2} (rounds {Range(share)})"));
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"  probe {Median(probe):F2} (rounds {Range(probe)}){(Median(probe) > MachineProbe.SlowModeRatio ? ", slow mode" : "")}"));
    }

    // Runs per round so that a one-core round takes about RoundSeconds, after a second of warm-up.
    private static int Calibrate(Func<int> f)
    {
        int sink = 0, n = 0;
        var sw = Stopwatch.StartNew();
        while (sw.Elapsed.TotalSeconds < 1.0) { sink += f(); n++; }
        return Math.Max(1, (int)(n * RoundSeconds / sw.Elapsed.TotalSeconds) + (sink == int.MinValue ? 1 : 0));
    }

    // Seconds per run.
    private static double Time(Func<int> f, int calls)
    {
        var sw = Stopwatch.StartNew();
        for (int i = 0; i < calls; i++) f();
        return sw.Elapsed.TotalSeconds / calls;
    }

    // Seconds per run of each copy when both run at once, from the start of both to the end of the later one.
    private static double TimePair(Func<int> a, Func<int> b, int calls)
    {
        using var go = new ManualResetEventSlim(false);
        var other = new Thread(() => { go.Wait(); for (int i = 0; i < calls; i++) b(); }) { IsBackground = true };
        other.Start();
        Thread.Sleep(20);   // the other thread is waiting at the gate
        var sw = Stopwatch.StartNew();
        go.Set();
        for (int i = 0; i < calls; i++) a();
        other.Join();
        return sw.Elapsed.TotalSeconds / calls;
    }

    private static double Median(double[] xs)
    {
        var c = (double[])xs.Clone();
        Array.Sort(c);
        return c[c.Length / 2];
    }

    private static string Range(double[] xs)
    {
        var c = (double[])xs.Clone();
        Array.Sort(c);
        return string.Create(CultureInfo.InvariantCulture, $"{c[0]:F2}-{c[^1]:F2}");
    }
}
