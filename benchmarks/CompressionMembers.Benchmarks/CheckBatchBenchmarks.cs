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

    [GlobalSetup]
    public void Setup()
    {
        var rnd = new Random(2026);
        _members = new Member[N];
        var sections = new RectangleSection[64];
        for (int k = 0; k < sections.Length; k++)
            sections[k] = new RectangleSection(Length.FromMillimeters(90 + 5 * (k % 8)), Length.FromMillimeters(140 + 20 * (k / 8)));
        for (int i = 0; i < N; i++)
            _members[i] = Member.Create(sections[rnd.Next(sections.Length)], TimberGrades.C24, Length.FromMeters(1.5 + 3 * rnd.NextDouble()), Restraint.PinnedBothAxes);
        _results = new CheckResult[N];
        _numbers = new (double, double)[N];
        _load = DesignActions.Compression(Force.FromKilonewtons(30)).WithLoadDuration(LoadDurationClass.MediumTerm);
        var one = BatchEvaluator.Run(_members, _check, BatchOptions.Serial);
        var two = BatchEvaluator.Run(_members, _check, new BatchOptions(2));
        for (int i = 0; i < N; i++)
            if (!one[i].Utilisation.Equals(two[i].Utilisation) || !one[i].DesignResistanceN.Equals(two[i].DesignResistanceN) || !ReferenceEquals(one[i].Member, two[i].Member))
                throw new InvalidOperationException($"Row {i}: the two-core batch differs from the serial one.");
    }

    private double Sum()
    {
        double s = 0;
        for (int i = 0; i < _results.Length; i++) s += _results[i].Utilisation;
        return s;
    }

    // Results into an array the sweep reuses (the batch allocates nothing per run).
    [Benchmark(Baseline = true)] public double OneCore() { BatchEvaluator.RunInto(_members, _check, _results, BatchOptions.Serial); return Sum(); }
    [Benchmark] public double TwoCores() { BatchEvaluator.RunInto(_members, _check, _results, new BatchOptions(2)); return Sum(); }
    // The numbers a sweep keeps (utilisation and resistance, 16 bytes a case) into a reused array: the checks, not the
    // memory bus, set the pace.
    [Benchmark] public double NumbersOneCore() { BatchEvaluator.RunInto(_members, _checkNumbers, _numbers, BatchOptions.Serial); return _numbers[^1].Utilisation; }
    [Benchmark] public double NumbersTwoCores() { BatchEvaluator.RunInto(_members, _checkNumbers, _numbers, new BatchOptions(2)); return _numbers[^1].Utilisation; }
    // A new result list per run: 48 MB of results allocated each time, which the memory bus, not the cores, limits.
    [Benchmark] public double TwoCoresNewList() { var r = BatchEvaluator.Run(_members, _check, new BatchOptions(2)); return r[0].Utilisation; }
}
