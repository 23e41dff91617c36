using System;
using System.Runtime.CompilerServices;

namespace CompressionMembers.Benchmarks;

/// <summary>
/// Tells whether the machine ran a plain-loop round, or began and ended a BenchmarkDotNet process of
/// <see cref="MethodBenchmarks"/>, at its usual speed. Two loops over the same 2,000 values do the same core
/// arithmetic (three divisions and a square root per value, as a column check does): <see cref="Arithmetic"/>
/// keeps everything in registers; <see cref="RoundTrip"/> hands ten values per item through memory (a call that writes
/// them to an out struct, read back by the caller), as the typed path hands a method's numbers to <c>Check</c>. At this
/// machine's usual speed the second took 1.05–1.1 times the first; in what docs/performance.md calls the slow mode
/// (a state of the host, not of the code: it comes and goes within one process, with the same machine code and data)
/// it took 1.3–1.45 times (measured 2026-12-02 on an AMD EPYC host), while the arithmetic loop keeps its time. The level
/// depends on the processor: on an Intel Xeon host (2026-12-03) the probe read 1.3–1.5 at its best and 2.0–2.3 in the
/// slow mode, so <see cref="SlowModeRatio"/> marks every round there; <see cref="PlainTicks"/> reads the probe against
/// its best level in its own run instead. Not a test; CI's dry benchmark run prints it once.
/// </summary>
internal static class MachineProbe
{
    private const int N = 2000;
    private static readonly double[] Xs = new double[N], Ys = new double[N], Outs = new double[N];

    static MachineProbe()
    {
        var rnd = new Random(7);
        for (int i = 0; i < N; i++) { Xs[i] = 1 + rnd.NextDouble(); Ys[i] = 2 + rnd.NextDouble(); }
    }

    /// <summary>Above this ratio (round trip ÷ arithmetic) a round is marked as run in the slow mode (set on the AMD host;
    /// see the class remarks for other processors).</summary>
    public const double SlowModeRatio = 1.2;

    private static double s_sink;   // keeps the loops' results alive

    /// <summary>The probe's ratio: round trip ÷ arithmetic, the median of five pairs of 200 calls each (about 25 ms).</summary>
    public static double Ratio()
    {
        var r = new double[5];
        for (int k = 0; k < r.Length; k++) r[k] = Seconds(RoundTrip) / Seconds(Arithmetic);
        Array.Sort(r);
        return r[r.Length / 2];
    }

    private static double Seconds(Func<double> loop)
    {
        var sw = System.Diagnostics.Stopwatch.StartNew();
        for (int c = 0; c < 200; c++) s_sink += loop();
        return sw.Elapsed.TotalSeconds;
    }

    /// <summary>One line for a benchmark process's log: the ratio, and "slow mode" above <see cref="SlowModeRatio"/>.</summary>
    public static string Report(string when)
    {
        double ratio = Ratio();
        return string.Create(System.Globalization.CultureInfo.InvariantCulture,
            $"// machine probe at {when}: {ratio:F2} (round trip ÷ arithmetic; above {SlowModeRatio:F2}: slow mode){(ratio > SlowModeRatio ? " SLOW MODE" : "")}");
    }

    private struct Ten { public double A, B, C, D, E, F, G, H, I, J; }

    // Fully optimised from the first call (no tiers, no profile), so that a probe early in a process measures the same
    // machine code as a late one.
    /// <summary>The arithmetic alone, in registers (summed as it goes).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static double Arithmetic()
    {
        var xs = Xs; var ys = Ys;
        double s = 0;
        for (int i = 0; i < N; i++)
        {
            double b = xs[i], h = ys[i], l = b * 3.4641 / h, k = 0.5 * (1 + 0.2 * (l - 0.3) + l * l);
            s += 1 / (k + Math.Sqrt(k * k - l * l)) + b * h / l;
        }
        return s;
    }

    /// <summary>The same core arithmetic, ten values per item written to memory by a call and read back.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static double RoundTrip()
    {
        var xs = Xs; var ys = Ys; var outs = Outs;
        for (int i = 0; i < N; i++)
        {
            ValuesThroughMemory(xs[i], ys[i], out var t);
            outs[i] = t.A + t.B + t.C + t.D + t.E + t.F + t.G + t.H + t.I + t.J;
        }
        return outs[N / 2];
    }

    [MethodImpl(MethodImplOptions.NoInlining | MethodImplOptions.AggressiveOptimization)]
    private static void ValuesThroughMemory(double b, double h, out Ten t)
    {
        double l = b * 3.4641 / h, k = 0.5 * (1 + 0.2 * (l - 0.3) + l * l);
        t.A = l; t.B = k; t.C = 1 / (k + Math.Sqrt(k * k - l * l)); t.D = b * h / l; t.E = b; t.F = h; t.G = l * 2; t.H = k * 2; t.I = b + h; t.J = b - h;
    }
}
