using System;
using System.Collections.Generic;
using System.Diagnostics;
using System.Globalization;
using System.IO;
using System.Linq;

namespace CompressionMembers.Benchmarks;

/// <summary>
/// The typed ÷ raw ratio of every <see cref="MethodBenchmarks"/> method, tick by tick in one long-running process, each
/// tick with the machine probe before and after it, so that a run states both of the machine's speeds side by side
/// instead of waiting for one of them. A tick is one method: a typed round and a raw round of about 0.1 s each (their
/// order alternating from tick to tick), between two probes. The methods take turns, so every method sees the same
/// stretches of the machine's time.
/// </summary>
/// <remarks>
/// <code>dotnet run -c Release --project benchmarks/CompressionMembers.Benchmarks -- --plain-ticks --minutes 20 --log ticks.tsv</code>
/// Names are the benchmark names without <c>Typed</c>/<c>RawLoop</c>; no name means every method. The summary splits
/// the ticks by their probes, relative to the machine's best level in the same run (the 5th percentile of the probes; the
/// probe's level differs from one processor family to another, so no fixed threshold is used): a tick is "fast" when
/// both of its probes are within 15 % of that level, and "slow" otherwise. A run too short to meet the machine at its
/// best calls its least slow ticks fast all the same: read the printed probe levels (ten minutes or more is safer). Not
/// a test and not run by CI.
/// </remarks>
internal static class PlainTicks
{
    private const double RoundSeconds = 0.1;
    private const double FastBand = 1.15;

    private readonly record struct Tick(double Seconds, string Name, double Typed, double Raw, double ProbeBefore, double ProbeAfter)
    {
        public double Ratio => Typed / Raw;
        public double Probe => Math.Max(ProbeBefore, ProbeAfter);
    }

    public static int Run(string[] args)
    {
        var names = new List<string>();
        double minutes = 10;
        string? log = null;
        for (int i = 0; i < args.Length; i++)
        {
            if (args[i] == "--minutes" && i + 1 < args.Length) minutes = double.Parse(args[++i], CultureInfo.InvariantCulture);
            else if (args[i] == "--log" && i + 1 < args.Length) log = args[++i];
            else names.Add(args[i]);
        }
        if (names.Count == 0) names.AddRange(PlainLoop.AllMethodNames());

        var bench = new MethodBenchmarks();
        bench.Setup();
        var pairs = names.Select(n => (Name: n,
            Typed: PlainLoop.Method(n + "Typed").CreateDelegate<Func<double>>(bench),
            Raw: PlainLoop.Method(n + "RawLoop").CreateDelegate<Func<double>>(bench))).ToArray();
        var calls = pairs.Select(p => PlainLoop.Calibrate(p.Typed, warmUpSeconds: 0.5, roundSeconds: RoundSeconds)).ToArray();

        Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"Plain ticks: {pairs.Length} methods in turn for {minutes:F0} min in one process; a tick is one method, a typed and a raw round of about {RoundSeconds:F1} s between two machine probes."));
        var ticks = new List<Tick>();
        var clock = Stopwatch.StartNew();
        double sink = 0;
        bool typedFirst = true;
        while (clock.Elapsed.TotalMinutes < minutes)
        {
            for (int k = 0; k < pairs.Length; k++)
            {
                double p0 = MachineProbe.Ratio(), t, r;
                if (typedFirst) { t = PlainLoop.Time(pairs[k].Typed, calls[k], ref sink); r = PlainLoop.Time(pairs[k].Raw, calls[k], ref sink); }
                else { r = PlainLoop.Time(pairs[k].Raw, calls[k], ref sink); t = PlainLoop.Time(pairs[k].Typed, calls[k], ref sink); }
                double p1 = MachineProbe.Ratio();
                ticks.Add(new Tick(clock.Elapsed.TotalSeconds, pairs[k].Name, t, r, p0, p1));
            }
            typedFirst = !typedFirst;
        }
        // The sink only keeps the results alive; a typed loop's total is NaN wherever its method leaves a value unused
        // (MethodBenchmarks.Tally), so its value says nothing.
        if (sink == 0.5) Console.WriteLine();

        if (log is not null)
        {
            using var w = new StreamWriter(log);
            w.WriteLine("seconds\tmethod\ttyped_us\traw_us\tratio\tprobe_before\tprobe_after");
            foreach (var k in ticks)
                w.WriteLine(string.Create(CultureInfo.InvariantCulture,
                    $"{k.Seconds:F1}\t{k.Name}\t{k.Typed * 1e6:F2}\t{k.Raw * 1e6:F2}\t{k.Ratio:F3}\t{k.ProbeBefore:F2}\t{k.ProbeAfter:F2}"));
        }

        // The machine's best level: the 5th percentile of the ticks' lower probes (a single low outlier would otherwise
        // set it; one run on the Intel host had one probe at 1.19 among thousands at 1.35-1.5).
        double best = Percentile(ticks.Select(k => Math.Min(k.ProbeBefore, k.ProbeAfter)), 0.05), limit = best * FastBand;
        bool Fast(Tick k) => k.Probe <= limit;
        int fast = ticks.Count(Fast);
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"{ticks.Count} ticks; probe: lowest {ticks.Min(k => Math.Min(k.ProbeBefore, k.ProbeAfter)):F2}, 5th percentile {best:F2}, median {Median(ticks.Select(k => k.Probe)):F2}, highest {ticks.Max(k => k.Probe):F2}; fast ticks (both probes at most {limit:F2}, the 5th percentile + 15 %): {fast}."));
        Console.WriteLine("Per minute, the share of fast ticks: " + string.Join(" ", ticks.GroupBy(k => (int)(k.Seconds / 60))
            .Select(g => string.Create(CultureInfo.InvariantCulture, $"{100.0 * g.Count(Fast) / g.Count():F0}%"))));
        Console.WriteLine();
        Console.WriteLine("typed/raw per tick: n, median (10th-90th percentile); µs: medians of one call (2,000 checks)");
        Console.WriteLine("method       fast ticks                 slow ticks                 typed µs fast / slow   raw µs fast / slow");
        foreach (var p in pairs)
        {
            var f = ticks.Where(k => k.Name == p.Name && Fast(k)).ToList();
            var s = ticks.Where(k => k.Name == p.Name && !Fast(k)).ToList();
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"{p.Name,-12} {Summary(f),-26} {Summary(s),-26} {Median(f.Select(k => k.Typed * 1e6)),8:F1} / {Median(s.Select(k => k.Typed * 1e6)),-8:F1}    {Median(f.Select(k => k.Raw * 1e6)),8:F1} / {Median(s.Select(k => k.Raw * 1e6)),-8:F1}").TrimEnd());
        }
        return 0;
    }

    private static string Summary(List<Tick> ticks) => ticks.Count == 0
        ? "0"
        : string.Create(CultureInfo.InvariantCulture,
            $"{ticks.Count,4}  {Median(ticks.Select(k => k.Ratio)):F2} ({Percentile(ticks.Select(k => k.Ratio), 0.1):F2}-{Percentile(ticks.Select(k => k.Ratio), 0.9):F2})");

    private static double Median(IEnumerable<double> xs) => Percentile(xs, 0.5);

    private static double Percentile(IEnumerable<double> xs, double q)
    {
        var a = xs.OrderBy(x => x).ToArray();
        return a.Length == 0 ? double.NaN : a[(int)Math.Round(q * (a.Length - 1))];
    }
}
