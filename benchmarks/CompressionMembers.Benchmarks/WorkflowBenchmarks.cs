using System;
using System.Collections.Generic;
using BenchmarkDotNet.Attributes;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Resolution;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CompressionMembers.Workflows.Batch;
using CompressionMembers.Workflows.Catalogues;
using CompressionMembers.Workflows.Selection;
using UnitsNet;

namespace CompressionMembers.Benchmarks;

/// <summary>
/// Size selection of 10,000 invented members against an invented catalogue of 1,000 sections (four families of scaled
/// shapes): the pruned search against the brute-force search, each on one core and on two. The set-up proves that both
/// searches give the same choice for every member and prints the evaluation counts and their ratio (the issue asks
/// for at least 20× fewer evaluations).
/// </summary>
/// <remarks>Run: <c>dotnet run -c Release --project benchmarks/CompressionMembers.Benchmarks -- --filter '*Workflow*' --job short</c>.
/// The brute-force rows take several seconds per operation.</remarks>
[MemoryDiagnoser]
public class WorkflowBenchmarks
{
    private SizeSelector _selector = null!, _withMembers = null!;
    private SizingRequest[] _requests = [];

    /// <summary>Members to size.</summary>
    [Params(10_000)]
    public int Members { get; set; }

    /// <summary>Sections in the catalogue.</summary>
    [Params(1_000)]
    public int Sections { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        var catalogue = SyntheticCatalogue.Scaled(Sections);
        _selector = new SizeSelector(catalogue, ResistanceMethods.Johnson, SelectionObjective.Mass, candidateCount: 1);
        // The same method behind a forwarding wrapper, which the selector treats as a user's method: a member is built for
        // every candidate section (as for every method before candidates were resolved without one).
        _withMembers = new SizeSelector(catalogue, new Forwarding(ResistanceMethods.Johnson), SelectionObjective.Mass, candidateCount: 1);
        var rnd = new Random(2026);
        var placeholder = new RectangleSection(Length.FromMillimeters(10), Length.FromMillimeters(10));
        var list = new List<SizingRequest>(Members);
        for (int i = 0; i < Members; i++)
        {
            var m = Member.Create(placeholder, IsotropicMaterial.GenericStructuralSteel, Length.FromMillimeters(500 + rnd.NextDouble() * 7500),
                Restraint.PinnedBothAxes, $"member {i}");
            list.Add(new SizingRequest(m, DesignActions.Compression(Force.FromKilonewtons(1 + rnd.NextDouble() * 1500))));
        }
        _requests = list.ToArray();

        var pruned = _selector.SelectAll(_requests, new BatchOptions(2));
        var brute = _selector.SelectAllExhaustively(_requests, new BatchOptions(2));
        var withMembers = _withMembers.SelectAll(_requests, new BatchOptions(2));
        long pe = 0, be = 0;
        for (int i = 0; i < _requests.Length; i++)
        {
            if (pruned[i].Chosen?.Entry.Designation != brute[i].Chosen?.Entry.Designation)
                throw new InvalidOperationException($"Pruned and brute-force searches disagree for {_requests[i].Member.Name}.");
            if (pruned[i].Chosen?.Entry.Designation != withMembers[i].Chosen?.Entry.Designation
                || pruned[i].Chosen?.Utilisation.Equals(withMembers[i].Chosen?.Utilisation) == false || pruned[i].Evaluations != withMembers[i].Evaluations)
                throw new InvalidOperationException($"Candidates resolved with and without members disagree for {_requests[i].Member.Name}.");
            pe += pruned[i].Evaluations;
            be += brute[i].Evaluations;
        }
        Console.WriteLine($"// same choice for all {Members} members; evaluations: pruned {pe}, brute force {be}, ratio {(double)be / pe:0.0}");
    }

    [Benchmark(Baseline = true)]
    public int PrunedOneCore() => Count(_selector.SelectAll(_requests, BatchOptions.Serial));

    [Benchmark]
    public int PrunedTwoCores() => Count(_selector.SelectAll(_requests, new BatchOptions(2)));

    [Benchmark]
    public int PrunedOneCoreMemberPerCandidate() => Count(_withMembers.SelectAll(_requests, BatchOptions.Serial));

    [Benchmark]
    public int PrunedTwoCoresMemberPerCandidate() => Count(_withMembers.SelectAll(_requests, new BatchOptions(2)));

    [Benchmark]
    public int BruteForceOneCore() => Count(_selector.SelectAllExhaustively(_requests, BatchOptions.Serial));

    [Benchmark]
    public int BruteForceTwoCores() => Count(_selector.SelectAllExhaustively(_requests, new BatchOptions(2)));

    private static int Count(IReadOnlyList<SizeSelection> s)
    {
        int found = 0;
        foreach (var x in s) if (x.Found) found++;
        return found;
    }

    private sealed class Forwarding(IResistanceMethod inner) : IResistanceMethod
    {
        public MethodIdentity Identity => inner.Identity;
        public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions) => inner.AppliesTo(member, actions);
        public CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace) => inner.Evaluate(member, actions, trace);
    }
}

/// <summary>A member schedule of 10,000 invented rows (the boathouse rows repeated) checked on one core and on two:
/// the speed-up of <see cref="BatchEvaluator"/>. The timber rows give no load-duration class, so one row in five is
/// refused with its reason (error rows, as a real schedule may have). The set-up proves the two results CSVs are byte
/// for byte equal.</summary>
[MemoryDiagnoser]
public class ScheduleBatchBenchmarks
{
    private CompressionMembers.Workflows.Schedules.MemberSchedule _schedule = null!;

    [GlobalSetup]
    public void Setup()
    {
        var sb = new System.Text.StringBuilder("member,case,material,section,method,length_mm,N_kN,ey_mm\n");
        var rnd = new Random(6);
        string[] rows =
        [
            "generic-steel,CHS 76x3,johnson", "generic-steel,I 150x150x9x6,perry-robertson", "generic-steel,rect 60x100,euler",
            "GL28h,glulam 140x180,ec5-column", "6082-T6,CHS 60x4,ec9",
        ];
        for (int i = 0; i < 10_000; i++)
            sb.Append(System.Globalization.CultureInfo.InvariantCulture, $"M{i},ULS,{rows[i % rows.Length]},{1500 + rnd.Next(3000)},{10 + rnd.Next(200)},\n");
        _schedule = CompressionMembers.Workflows.Schedules.MemberSchedule.ReadCsv(new System.IO.StringReader(sb.ToString()), "bench");
        string one = CompressionMembers.Workflows.Schedules.ScheduleChecker.Check(_schedule, BatchOptions.Serial).ToCsv();
        string two = CompressionMembers.Workflows.Schedules.ScheduleChecker.Check(_schedule, new BatchOptions(2)).ToCsv();
        if (one != two) throw new InvalidOperationException("Serial and parallel schedule results differ.");
    }

    [Benchmark(Baseline = true)]
    public int OneCore() => CompressionMembers.Workflows.Schedules.ScheduleChecker.Check(_schedule, BatchOptions.Serial).PassedCount;

    [Benchmark]
    public int TwoCores() => CompressionMembers.Workflows.Schedules.ScheduleChecker.Check(_schedule, new BatchOptions(2)).PassedCount;
}
