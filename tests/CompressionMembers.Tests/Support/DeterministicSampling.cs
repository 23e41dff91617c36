using System;
using System.Globalization;
using CsCheck;

namespace CompressionMembers.Tests;

/// <summary>
/// Property sampling that repeats exactly: every test's <c>gen.Sample(…)</c> binds here, not to CsCheck's own <c>Sample</c>
/// (extension methods of an enclosing namespace are found before those of a <c>using</c> directive), and draws iteration
/// k from <c>new PCG(stream, seed + k)</c> of one recorded seed — so every run, on every machine, tries the same values.
/// CsCheck's own <c>seed:</c> fixes only the first iteration and draws the rest at random.
/// </summary>
/// <remarks>
/// <para>A failure names the iteration, its seed (CsCheck format) and the values, and rethrows the property's exception
/// inside. Passing that seed with <c>iter: 1</c> replays the one failing case.</para>
/// <para>To explore beyond the fixed values (random seeds, CsCheck's shrinking), set the environment variable
/// <c>CM_PROPERTY_EXPLORE=1</c>: the same calls then run CsCheck's own <c>Sample</c>, which prints a seed to reproduce any
/// failure it finds. CI never sets it.</para>
/// </remarks>
public static class DeterministicSampling
{
    /// <summary>The recorded seed every property starts from unless a test passes its own (CsCheck seed format).</summary>
    public const string DefaultSeed = "0N0XIzNsQ0O2";

    /// <summary>Iterations when a test does not say (CsCheck's own default).</summary>
    public const long DefaultIterations = 100;

    private static bool Explore => Environment.GetEnvironmentVariable("CM_PROPERTY_EXPLORE") == "1";

    private static void Run<T>(Gen<T> gen, Func<T, bool> property, string? seed, long iter, Action<string>? writeLine)
    {
        var root = PCG.Parse(seed ?? DefaultSeed);
        long n = iter < 0 ? DefaultIterations : iter;
        for (long k = 0; k < n; k++)
        {
            var pcg = new PCG(root.Stream, unchecked(root.Seed + (ulong)k));
            string at = pcg.ToString();
            T value = gen.Generate(pcg, null, out _);
            bool holds;
            try { holds = property(value); }
            catch (Exception e)
            {
                throw new PropertyFailedException(string.Create(CultureInfo.InvariantCulture,
                    $"property failed at iteration {k} of {n} (seed {at}; replay with seed: \"{at}\", iter: 1) for {value}: {e.Message}"), e);
            }
            if (!holds)
                throw new PropertyFailedException(string.Create(CultureInfo.InvariantCulture,
                    $"property false at iteration {k} of {n} (seed {at}; replay with seed: \"{at}\", iter: 1) for {value}"), null);
        }
        writeLine?.Invoke(string.Create(CultureInfo.InvariantCulture, $"Passed {n} fixed iterations from seed {seed ?? DefaultSeed}."));
    }

    /// <summary>Runs <paramref name="assert"/> on values of <paramref name="gen"/> (see the class remarks).</summary>
    public static void Sample<T>(this Gen<T> gen, Action<T> assert, Action<string>? writeLine = null, string? seed = null, long iter = -1, int threads = -1)
    {
        if (Explore) { global::CsCheck.Check.Sample(gen, assert, writeLine: writeLine, seed: seed, iter: iter, threads: threads); return; }
        Run(gen, t => { assert(t); return true; }, seed, iter, writeLine);
    }

    /// <summary>Checks <paramref name="predicate"/> on values of <paramref name="gen"/> (see the class remarks).</summary>
    public static void Sample<T>(this Gen<T> gen, Func<T, bool> predicate, Action<string>? writeLine = null, string? seed = null, long iter = -1, int threads = -1)
    {
        if (Explore) { global::CsCheck.Check.Sample(gen, predicate, writeLine: writeLine, seed: seed, iter: iter, threads: threads); return; }
        Run(gen, predicate, seed, iter, writeLine);
    }

    /// <summary>Runs <paramref name="assert"/> on the 2 values of each tuple (see the class remarks).</summary>
    public static void Sample<T1, T2>(this Gen<(T1, T2)> gen, Action<T1, T2> assert, Action<string>? writeLine = null, string? seed = null, long iter = -1, int threads = -1)
    {
        if (Explore) { global::CsCheck.Check.Sample(gen, assert, writeLine: writeLine, seed: seed, iter: iter, threads: threads); return; }
        Run(gen, t => { assert(t.Item1, t.Item2); return true; }, seed, iter, writeLine);
    }

    /// <summary>Checks <paramref name="predicate"/> on the 2 values of each tuple (see the class remarks).</summary>
    public static void Sample<T1, T2>(this Gen<(T1, T2)> gen, Func<T1, T2, bool> predicate, Action<string>? writeLine = null, string? seed = null, long iter = -1, int threads = -1)
    {
        if (Explore) { global::CsCheck.Check.Sample(gen, predicate, writeLine: writeLine, seed: seed, iter: iter, threads: threads); return; }
        Run(gen, t => predicate(t.Item1, t.Item2), seed, iter, writeLine);
    }

    /// <summary>Runs <paramref name="assert"/> on the 3 values of each tuple (see the class remarks).</summary>
    public static void Sample<T1, T2, T3>(this Gen<(T1, T2, T3)> gen, Action<T1, T2, T3> assert, Action<string>? writeLine = null, string? seed = null, long iter = -1, int threads = -1)
    {
        if (Explore) { global::CsCheck.Check.Sample(gen, assert, writeLine: writeLine, seed: seed, iter: iter, threads: threads); return; }
        Run(gen, t => { assert(t.Item1, t.Item2, t.Item3); return true; }, seed, iter, writeLine);
    }

    /// <summary>Checks <paramref name="predicate"/> on the 3 values of each tuple (see the class remarks).</summary>
    public static void Sample<T1, T2, T3>(this Gen<(T1, T2, T3)> gen, Func<T1, T2, T3, bool> predicate, Action<string>? writeLine = null, string? seed = null, long iter = -1, int threads = -1)
    {
        if (Explore) { global::CsCheck.Check.Sample(gen, predicate, writeLine: writeLine, seed: seed, iter: iter, threads: threads); return; }
        Run(gen, t => predicate(t.Item1, t.Item2, t.Item3), seed, iter, writeLine);
    }

    /// <summary>Runs <paramref name="assert"/> on the 4 values of each tuple (see the class remarks).</summary>
    public static void Sample<T1, T2, T3, T4>(this Gen<(T1, T2, T3, T4)> gen, Action<T1, T2, T3, T4> assert, Action<string>? writeLine = null, string? seed = null, long iter = -1, int threads = -1)
    {
        if (Explore) { global::CsCheck.Check.Sample(gen, assert, writeLine: writeLine, seed: seed, iter: iter, threads: threads); return; }
        Run(gen, t => { assert(t.Item1, t.Item2, t.Item3, t.Item4); return true; }, seed, iter, writeLine);
    }

    /// <summary>Checks <paramref name="predicate"/> on the 4 values of each tuple (see the class remarks).</summary>
    public static void Sample<T1, T2, T3, T4>(this Gen<(T1, T2, T3, T4)> gen, Func<T1, T2, T3, T4, bool> predicate, Action<string>? writeLine = null, string? seed = null, long iter = -1, int threads = -1)
    {
        if (Explore) { global::CsCheck.Check.Sample(gen, predicate, writeLine: writeLine, seed: seed, iter: iter, threads: threads); return; }
        Run(gen, t => predicate(t.Item1, t.Item2, t.Item3, t.Item4), seed, iter, writeLine);
    }

    /// <summary>Runs <paramref name="assert"/> on the 5 values of each tuple (see the class remarks).</summary>
    public static void Sample<T1, T2, T3, T4, T5>(this Gen<(T1, T2, T3, T4, T5)> gen, Action<T1, T2, T3, T4, T5> assert, Action<string>? writeLine = null, string? seed = null, long iter = -1, int threads = -1)
    {
        if (Explore) { global::CsCheck.Check.Sample(gen, assert, writeLine: writeLine, seed: seed, iter: iter, threads: threads); return; }
        Run(gen, t => { assert(t.Item1, t.Item2, t.Item3, t.Item4, t.Item5); return true; }, seed, iter, writeLine);
    }

    /// <summary>Checks <paramref name="predicate"/> on the 5 values of each tuple (see the class remarks).</summary>
    public static void Sample<T1, T2, T3, T4, T5>(this Gen<(T1, T2, T3, T4, T5)> gen, Func<T1, T2, T3, T4, T5, bool> predicate, Action<string>? writeLine = null, string? seed = null, long iter = -1, int threads = -1)
    {
        if (Explore) { global::CsCheck.Check.Sample(gen, predicate, writeLine: writeLine, seed: seed, iter: iter, threads: threads); return; }
        Run(gen, t => predicate(t.Item1, t.Item2, t.Item3, t.Item4, t.Item5), seed, iter, writeLine);
    }

    /// <summary>Runs <paramref name="assert"/> on the 6 values of each tuple (see the class remarks).</summary>
    public static void Sample<T1, T2, T3, T4, T5, T6>(this Gen<(T1, T2, T3, T4, T5, T6)> gen, Action<T1, T2, T3, T4, T5, T6> assert, Action<string>? writeLine = null, string? seed = null, long iter = -1, int threads = -1)
    {
        if (Explore) { global::CsCheck.Check.Sample(gen, assert, writeLine: writeLine, seed: seed, iter: iter, threads: threads); return; }
        Run(gen, t => { assert(t.Item1, t.Item2, t.Item3, t.Item4, t.Item5, t.Item6); return true; }, seed, iter, writeLine);
    }

    /// <summary>Checks <paramref name="predicate"/> on the 6 values of each tuple (see the class remarks).</summary>
    public static void Sample<T1, T2, T3, T4, T5, T6>(this Gen<(T1, T2, T3, T4, T5, T6)> gen, Func<T1, T2, T3, T4, T5, T6, bool> predicate, Action<string>? writeLine = null, string? seed = null, long iter = -1, int threads = -1)
    {
        if (Explore) { global::CsCheck.Check.Sample(gen, predicate, writeLine: writeLine, seed: seed, iter: iter, threads: threads); return; }
        Run(gen, t => predicate(t.Item1, t.Item2, t.Item3, t.Item4, t.Item5, t.Item6), seed, iter, writeLine);
    }

    /// <summary>Runs <paramref name="assert"/> on the 7 values of each tuple (see the class remarks).</summary>
    public static void Sample<T1, T2, T3, T4, T5, T6, T7>(this Gen<(T1, T2, T3, T4, T5, T6, T7)> gen, Action<T1, T2, T3, T4, T5, T6, T7> assert, Action<string>? writeLine = null, string? seed = null, long iter = -1, int threads = -1)
    {
        if (Explore) { global::CsCheck.Check.Sample(gen, assert, writeLine: writeLine, seed: seed, iter: iter, threads: threads); return; }
        Run(gen, t => { assert(t.Item1, t.Item2, t.Item3, t.Item4, t.Item5, t.Item6, t.Item7); return true; }, seed, iter, writeLine);
    }

    /// <summary>Checks <paramref name="predicate"/> on the 7 values of each tuple (see the class remarks).</summary>
    public static void Sample<T1, T2, T3, T4, T5, T6, T7>(this Gen<(T1, T2, T3, T4, T5, T6, T7)> gen, Func<T1, T2, T3, T4, T5, T6, T7, bool> predicate, Action<string>? writeLine = null, string? seed = null, long iter = -1, int threads = -1)
    {
        if (Explore) { global::CsCheck.Check.Sample(gen, predicate, writeLine: writeLine, seed: seed, iter: iter, threads: threads); return; }
        Run(gen, t => predicate(t.Item1, t.Item2, t.Item3, t.Item4, t.Item5, t.Item6, t.Item7), seed, iter, writeLine);
    }

    /// <summary>Runs <paramref name="assert"/> on the 8 values of each tuple (see the class remarks).</summary>
    public static void Sample<T1, T2, T3, T4, T5, T6, T7, T8>(this Gen<(T1, T2, T3, T4, T5, T6, T7, T8)> gen, Action<T1, T2, T3, T4, T5, T6, T7, T8> assert, Action<string>? writeLine = null, string? seed = null, long iter = -1, int threads = -1)
    {
        if (Explore) { global::CsCheck.Check.Sample(gen, assert, writeLine: writeLine, seed: seed, iter: iter, threads: threads); return; }
        Run(gen, t => { assert(t.Item1, t.Item2, t.Item3, t.Item4, t.Item5, t.Item6, t.Item7, t.Item8); return true; }, seed, iter, writeLine);
    }

    /// <summary>Checks <paramref name="predicate"/> on the 8 values of each tuple (see the class remarks).</summary>
    public static void Sample<T1, T2, T3, T4, T5, T6, T7, T8>(this Gen<(T1, T2, T3, T4, T5, T6, T7, T8)> gen, Func<T1, T2, T3, T4, T5, T6, T7, T8, bool> predicate, Action<string>? writeLine = null, string? seed = null, long iter = -1, int threads = -1)
    {
        if (Explore) { global::CsCheck.Check.Sample(gen, predicate, writeLine: writeLine, seed: seed, iter: iter, threads: threads); return; }
        Run(gen, t => predicate(t.Item1, t.Item2, t.Item3, t.Item4, t.Item5, t.Item6, t.Item7, t.Item8), seed, iter, writeLine);
    }

}

/// <summary>A property did not hold for a fixed sample; the message says which iteration, seed and values.</summary>
public sealed class PropertyFailedException(string message, Exception? inner) : Exception(message, inner);
