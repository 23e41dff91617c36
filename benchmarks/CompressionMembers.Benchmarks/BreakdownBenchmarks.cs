using System;
using BenchmarkDotNet.Attributes;
using CompressionMembers.Actions;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Timber;
using CompressionMembers.Resolution;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Benchmarks;

/// <summary>
/// Profiling aid: where the time of one EN 1995-1-1 and one EN 1999-1-1 check goes, over 10,000 resolved members —
/// the applicability check alone, the method's Evaluate alone (no applicability), the EN 1995-1-1 kernel alone
/// (inputs filled, no result record), and the whole <see cref="Check.Evaluate(in ResolvedMember, in ResolvedActions, IResistanceMethod, Results.CalculationTrace?)"/>.
/// </summary>
[MemoryDiagnoser]
public class BreakdownBenchmarks
{
    private const int N = 10_000;
    private ResolvedMember[] _timber = [], _alu = [];
    private ResolvedActions _load, _aluLoad;
    private readonly Ec5ColumnStability _ec5 = new(ServiceClass.Class1, checkLateralTorsionalBuckling: false);

    [GlobalSetup]
    public void Setup()
    {
        var rnd = new Random(2024);
        _timber = new ResolvedMember[N]; _alu = new ResolvedMember[N];
        for (int i = 0; i < N; i++)
        {
            double b = 0.09 + 0.1 * rnd.NextDouble(), h = b + 0.1 * rnd.NextDouble(), l = 1.5 + 3 * rnd.NextDouble();
            _timber[i] = ResolvedMember.From(Member.Create(new RectangleSection(Length.FromMeters(b), Length.FromMeters(h)), TimberGrades.C24,
                Length.FromMeters(l), Restraint.PinnedBothAxes));
            double ab = 0.04 + 0.04 * rnd.NextDouble(), at = 0.0042 + 0.0007 * rnd.NextDouble(), al = 1 + 3 * rnd.NextDouble();
            _alu[i] = ResolvedMember.From(Member.Create(new RectangularHollowSection(Length.FromMeters(ab), Length.FromMeters(ab), Length.FromMeters(at)),
                AluminiumAlloys.EnAw6082T6Extrusion, Length.FromMeters(al), Restraint.PinnedBothAxes));
        }
        _load = ResolvedActions.From(DesignActions.Compression(Force.FromKilonewtons(30)).WithLoadDuration(LoadDurationClass.MediumTerm));
        _aluLoad = ResolvedActions.From(DesignActions.Compression(Force.FromKilonewtons(40)));
    }

    [Benchmark] public int Ec5AppliesTo() { int s = 0; for (int i = 0; i < N; i++) s += _ec5.AppliesTo(_timber[i], _load).IsApplicable ? 1 : 0; return s; }
    [Benchmark] public double Ec5EvaluateOnly() { double s = 0; for (int i = 0; i < N; i++) s += _ec5.Evaluate(_timber[i], _load, null).Utilisation; return s; }
    [Benchmark] public double Ec5KernelOnly()
    {
        double s = 0;
        for (int i = 0; i < N; i++)
        {
            var inp = default(Ec5Input);
            Ec5ColumnStability.Geometry(_timber[i], (TimberMaterial)_timber[i].Member.Material, ref inp);
            inp.Kmod = 0.8; inp.GammaM = 1.3; inp.NEdN = 30e3; inp.KhY = inp.KhZ = 1;
            Ec5Kernel.Run(inp, out var o);
            s += o.Utilisation;
        }
        return s;
    }
    [Benchmark] public double Ec5ViaInterface()
    {
        IResistanceMethod m = _ec5;
        double s = 0;
        for (int i = 0; i < N; i++)
        {
            if (!m.AppliesTo(_timber[i], _load).IsApplicable) throw new InvalidOperationException();
            s += m.Evaluate(_timber[i], _load, null).Utilisation;
        }
        return s;
    }
    [Benchmark(Baseline = true)] public double Ec5Check() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_timber[i], _load, _ec5, null).Utilisation; return s; }

    [Benchmark] public int Ec9AppliesTo() { int s = 0; for (int i = 0; i < N; i++) s += ResistanceMethods.Eurocode9.AppliesTo(_alu[i], _aluLoad).IsApplicable ? 1 : 0; return s; }
    [Benchmark] public double Ec9EvaluateOnly() { double s = 0; for (int i = 0; i < N; i++) s += ResistanceMethods.Eurocode9.Evaluate(_alu[i], _aluLoad, null).Utilisation; return s; }
    [Benchmark] public double Ec9Check() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_alu[i], _aluLoad, ResistanceMethods.Eurocode9, null).Utilisation; return s; }
}
