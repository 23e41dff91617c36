using System;
using System.Runtime.CompilerServices;
using BenchmarkDotNet.Attributes;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Resolution;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Benchmarks;

public sealed class Trivial : IResistanceMethod
{
    public MethodIdentity Identity { get; } = new("t", "t", "t", "t");
    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions) => default;
    public CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace) =>
        new(member, actions, this, member.CriticalForceYN, actions.AxialForceN / member.CriticalForceYN, BucklingAxis.Y, FailureMode.FlexuralBuckling, "x",
            new AxisOutcome(1, 2, 3, member.CriticalForceYN, 5, 6), new AxisOutcome(1, 2, 3, member.CriticalForceZN, 5, 6), default, trace);
}

[MemoryDiagnoser]
public class TmpProbe
{
    private const int N = 1000;
    private Member[] _m = [];
    private double[] _ncr = [];
    private DesignActions _a = null!;
    private readonly Trivial _t = new();

    [GlobalSetup]
    public void Setup()
    {
        var rnd = new Random(2024);
        _m = new Member[N]; _ncr = new double[N];
        for (int i = 0; i < N; i++)
        {
            double b = 0.09 + 0.1 * rnd.NextDouble(), h = b + 0.1 * rnd.NextDouble(), l = 1.5 + 3 * rnd.NextDouble();
            _m[i] = Member.Create(new RectangleSection(Length.FromMeters(b), Length.FromMeters(h)), IsotropicMaterial.GenericStructuralSteel,
                Length.FromMeters(l), Restraint.PinnedBothAxes);
            _ncr[i] = _m[i].Resolved.CriticalForceYN;
        }
        _a = DesignActions.Compression(Force.FromKilonewtons(30));
    }

    [Benchmark(Baseline = true)] public double Raw() { double s = 0; for (int i = 0; i < N; i++) s += 30e3 / _ncr[i]; return s; }
    [Benchmark] public double CheckTrivial() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_m[i], _a, _t).Utilisation; return s; }
    [Benchmark] public double DirectTrivial() { double s = 0; for (int i = 0; i < N; i++) s += D(_m[i], _a, _t); return s; }
    [MethodImpl(MethodImplOptions.NoInlining)]
    private static double D(Member m, DesignActions a, IResistanceMethod t) => t.Evaluate(in m.Resolved, in a.Resolved, null).Utilisation;
}
