using System;
using System.Collections.Generic;
using BenchmarkDotNet.Attributes;
using CompressionMembers.Actions;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CompressionMembers.Workflows.Batch;
using UnitsNet;

namespace CompressionMembers.Benchmarks;

/// <summary>
/// A parametric sweep of 200,000 EN 1995-1-1 column checks (members built once) through <see cref="BatchEvaluator"/> on one
/// core and on two, into a results array the sweep reuses: the speed-up of the batch. <see cref="Setup"/> proves the two runs give bit-identical results, in input order.
/// </summary>
[MemoryDiagnoser]
public class CheckBatchBenchmarks
{
    private const int N = 200_000;
    private Member[] _members = [];
    private CheckResult[] _results = [];
    private (double Utilisation, double ResistanceN)[] _numbers = [];
    private DesignActions _load = null!;
    private readonly Func<Member, int, CheckResult> _check;
    private readonly Func<Member, int, (double, double)> _checkNumbers;

    public CheckBatchBenchmarks()
    {
        _check = (m, _) => Check.Evaluate(m, _load, ResistanceMethods.Ec5Column);
        _checkNumbers = (m, _) => { var r = Check.Evaluate(m, _load, ResistanceMethods.Ec5Column); return (r.Utilisation, r.DesignResistanceN); };
    }

    /// <summary>How many times the batch goes over the 200,000 members (1 for BenchmarkDotNet; the plain batch harness
    /// also runs ten, to see what the batch's fixed cost per call weighs against a longer run).</summary>
    internal int Repeat { get; init; } = 1;

    [GlobalSetup]
    public void Setup()
    {
        var rnd = new Random(2026);
        _members = new Member[N * Repeat];
        var sections = new RectangleSection[64];
        for (int k = 0; k < sections.Length; k++)
            sections[k] = new RectangleSection(Length.FromMillimeters(90 + 5 * (k % 8)), Length.FromMillimeters(140 + 20 * (k / 8)));
        for (int i = 0; i < N; i++)
            _members[i] = Member.Create(sections[rnd.Next(sections.Length)], TimberGrades.C24, Length.FromMeters(1.5 + 3 * rnd.NextDouble()), Restraint.PinnedBothAxes);
        for (int i = N; i < _members.Length; i++) _members[i] = _members[i % N];
        _results = new CheckResult[_members.Length];
        _numbers = new (double, double)[_members.Length];
        _load = DesignActions.Compression(Force.FromKilonewtons(30)).WithLoadDuration(LoadDurationClass.MediumTerm);
        var one = BatchEvaluator.Run(_members, _check, BatchOptions.Serial);
        var two = BatchEvaluator.Run(_members, _check, new BatchOptions(2));
        for (int i = 0; i < _members.Length; i++)
            if (!one[i].Utilisation.Equals(two[i].Utilisation) || !one[i].DesignResistanceN.Equals(two[i].DesignResistanceN) || !ReferenceEquals(one[i].Member, two[i].Member))
                throw new InvalidOperationException($"Row {i}: the two-core batch differs from the serial one.");
    }

    /// <summary>A second benchmark over the same members and actions with result arrays of its own: what the plain batch
    /// harness runs on a second thread beside this one (same inputs, no output shared between the threads).</summary>
    internal CheckBatchBenchmarks SharingInputs() => new()
    {
        Repeat = Repeat, _members = _members, _load = _load,
        _results = new CheckResult[_results.Length], _numbers = new (double, double)[_numbers.Length],
    };

    // Results into an array the sweep reuses (the batch allocates nothing per run). Only the last result is read after the
    // batch: a serial pass over all 48 MB of results (as these benchmarks made before 2026-12-03) is timed on both sides
    // and so held the two-core figure back by itself.
    [Benchmark(Baseline = true)] public double OneCore() { BatchEvaluator.RunInto(_members, _check, _results, BatchOptions.Serial); return _results[^1].Utilisation; }
    [Benchmark] public double TwoCores() { BatchEvaluator.RunInto(_members, _check, _results, new BatchOptions(2)); return _results[^1].Utilisation; }
    // The numbers a sweep keeps (utilisation and resistance, 16 bytes a case) into a reused array: the checks, not the
    // memory bus, set the pace.
    [Benchmark] public double NumbersOneCore() { BatchEvaluator.RunInto(_members, _checkNumbers, _numbers, BatchOptions.Serial); return _numbers[^1].Utilisation; }
    [Benchmark] public double NumbersTwoCores() { BatchEvaluator.RunInto(_members, _checkNumbers, _numbers, new BatchOptions(2)); return _numbers[^1].Utilisation; }
    // A new result list per run: 48 MB of results allocated each time, which the memory bus, not the cores, limits.
    [Benchmark] public double TwoCoresNewList() { var r = BatchEvaluator.Run(_members, _check, new BatchOptions(2)); return r[0].Utilisation; }
}
