using System;
using System.Collections.Generic;
using System.Diagnostics;
using System.Globalization;
using System.Linq;
using System.Reflection;

namespace CompressionMembers.Benchmarks;

/// <summary>
/// A second opinion on <see cref="MethodBenchmarks"/> without BenchmarkDotNet's engine: the same typed and raw benchmark
/// methods (<c>FireTyped</c> and <c>FireRawLoop</c>, …) called from a plain loop, typed and raw alternating round by round
/// in one process, in several processes one after the other. Each process prints the median of its rounds; the summary
/// gives, per method, the ratios of all processes. Not a test and not run by CI.
/// </summary>
/// <remarks>
/// <code>dotnet run -c Release --project benchmarks/CompressionMembers.Benchmarks -- --plain-loop Fire Ec5Bending --processes 6</code>
/// Names are the benchmark names without <c>Typed</c>/<c>RawLoop</c>; no name means every method.
/// </remarks>
internal static class PlainLoop
{
    private const int Rounds = 9;
    private const double RoundSeconds = 0.25;

    public static int Run(string[] args)
    {
        var names = new List<string>();
        int processes = 5;
        bool child = false;
        for (int i = 0; i < args.Length; i++)
        {
            if (args[i] == "--processes" && i + 1 < args.Length) processes = int.Parse(args[++i], CultureInfo.InvariantCulture);
            else if (args[i] == "--child") child = true;
            else names.Add(args[i]);
        }
        if (names.Count == 0) names.AddRange(AllMethodNames());
        return child ? Child(names) : Parent(names, processes);
    }

    /// <summary>Every method <see cref="MethodBenchmarks"/> times: its benchmark names without <c>RawLoop</c>.</summary>
    internal static IEnumerable<string> AllMethodNames() =>
        typeof(MethodBenchmarks).GetMethods().Where(m => m.Name.EndsWith("RawLoop", StringComparison.Ordinal)).Select(m => m.Name[..^"RawLoop".Length]);

    // One process: set up once, then for each method alternate typed and raw rounds and print the medians.
    private static int Child(List<string> names)
    {
        var bench = new MethodBenchmarks();
        bench.Setup();
        foreach (var name in names)
        {
            var typed = Method(name + "Typed");
            var raw = Method(name + "RawLoop");
            Func<double> t = typed.CreateDelegate<Func<double>>(bench), r = raw.CreateDelegate<Func<double>>(bench);
            int calls = Calibrate(t);
            var ts = new double[Rounds];
            var rs = new double[Rounds];
            var ps = new double[Rounds];
            double sink = 0;
            for (int k = 0; k < Rounds; k++)
            {
                ts[k] = Time(t, calls, ref sink);
                rs[k] = Time(r, calls, ref sink);
                ps[k] = MachineProbe.Ratio();
            }
            Array.Sort(ts);
            Array.Sort(rs);
            Array.Sort(ps);
            double tm = ts[Rounds / 2], rm = rs[Rounds / 2];
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"{name} {tm * 1e6:F1} {rm * 1e6:F1} {tm / rm:F2} {ps[Rounds / 2]:F2}{(sink == 0.5 ? " " : "")}"));   // the sink keeps the results alive (NaN where a method leaves a value unused)
        }
        return 0;
    }

    internal static MethodInfo Method(string name) =>
        typeof(MethodBenchmarks).GetMethod(name) ?? throw new ArgumentException($"No benchmark method {name} in MethodBenchmarks.");

    // Calls per round so that a round of the typed side takes about roundSeconds (after a warm-up that lets the runtime
    // reach its optimised code).
    internal static int Calibrate(Func<double> f, double warmUpSeconds = 1.0, double roundSeconds = RoundSeconds)
    {
        double sink = 0;
        var sw = Stopwatch.StartNew();
        int n = 0;
        while (sw.Elapsed.TotalSeconds < warmUpSeconds) { sink += f(); n++; }
        return Math.Max(1, (int)(n * roundSeconds / sw.Elapsed.TotalSeconds) + (sink == 0.5 ? 1 : 0));
    }

    // Seconds per call (one call checks every member of the benchmark once).
    internal static double Time(Func<double> f, int calls, ref double sink)
    {
        var sw = Stopwatch.StartNew();
        for (int i = 0; i < calls; i++) sink += f();
        return sw.Elapsed.TotalSeconds / calls;
    }

    private static int Parent(List<string> names, int processes)
    {
        string self = Assembly.GetEntryAssembly()!.Location;
        var ratios = names.ToDictionary(n => n, _ => new List<double>());
        Console.WriteLine($"Plain loop, typed and raw alternating, {Rounds} rounds per method and process; per process: median typed and raw time of one call (2,000 checks), µs, and their ratio;");
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"then the machine probe (MachineProbe.cs: memory round trip ÷ arithmetic, median of the same rounds; above {MachineProbe.SlowModeRatio:F2}: the machine's slow mode)."));
        for (int p = 1; p <= processes; p++)
        {
            var psi = new ProcessStartInfo(Environment.ProcessPath ?? "dotnet") { RedirectStandardOutput = true, UseShellExecute = false };
            if (!self.EndsWith(".exe", StringComparison.OrdinalIgnoreCase) && (Environment.ProcessPath ?? "").EndsWith("dotnet", StringComparison.Ordinal))
                psi.ArgumentList.Add(self);
            psi.ArgumentList.Add("--plain-loop");
            psi.ArgumentList.Add("--child");
            foreach (var n in names) psi.ArgumentList.Add(n);
            using var proc = Process.Start(psi)!;
            string output = proc.StandardOutput.ReadToEnd();
            proc.WaitForExit();
            if (proc.ExitCode != 0) { Console.Error.WriteLine($"process {p} failed ({proc.ExitCode})"); return proc.ExitCode; }
            foreach (var line in output.Split('\n', StringSplitOptions.RemoveEmptyEntries))
            {
                var f = line.Split(' ');
                bool slow = double.Parse(f[4], CultureInfo.InvariantCulture) > MachineProbe.SlowModeRatio;
                Console.WriteLine($"process {p}: {f[0],-12} typed {f[1],8} raw {f[2],8}  typed/raw {f[3]}  probe {f[4]}{(slow ? "  slow mode" : "")}");
                if (ratios.TryGetValue(f[0], out var list)) list.Add(double.Parse(f[3], CultureInfo.InvariantCulture));
            }
        }
        Console.WriteLine();
        foreach (var (name, list) in ratios)
        {
            list.Sort();
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"{name,-12} typed/raw over {list.Count} processes: min {list[0]:F2}, median {list[list.Count / 2]:F2}, max {list[^1]:F2}  ({string.Join(" ", list.Select(x => x.ToString("F2", CultureInfo.InvariantCulture)))})"));
        }
        return 0;
    }
}
