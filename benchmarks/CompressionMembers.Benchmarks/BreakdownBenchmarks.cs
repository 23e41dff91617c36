using System;
using System.Runtime.CompilerServices;
using BenchmarkDotNet.Attributes;
using CompressionMembers.Actions;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Resolution;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Benchmarks;

/// <summary>
/// Profiling aid, not a target: where the time of one check goes, for the methods that cost most — the applicability test
/// alone and the method's Evaluate alone (both called through the interface from a method the JIT may not inline, and
/// reading the resistance and utilisation so that nothing is dropped), over 2,000 members.
/// </summary>
[MemoryDiagnoser]
public class BreakdownBenchmarks
{
    private const int N = 2000;
    private Member[] _tube = [], _dfl = [], _c24 = [];
    private DesignActions _alu = null!, _timber = null!;

    [GlobalSetup]
    public void Setup()
    {
        var rnd = new Random(2026);
        _tube = new Member[N]; _dfl = new Member[N]; _c24 = new Member[N];
        for (int i = 0; i < N; i++)
        {
            double b = 0.09 + 0.1 * rnd.NextDouble(), h = b + 0.1 * rnd.NextDouble(), l = 1.5 + 3 * rnd.NextDouble();
            _dfl[i] = Member.Create(new RectangleSection(Length.FromMeters(b), Length.FromMeters(h)), NdsGrades.DouglasFirLarchNo2, Length.FromMeters(l), Restraint.PinnedBothAxes);
            _c24[i] = Member.Create(new RectangleSection(Length.FromMeters(b + 0.05), Length.FromMeters(h + 0.05)), TimberGrades.C24, Length.FromMeters(l), Restraint.PinnedBothAxes);
            double tb = 0.04 + 0.04 * rnd.NextDouble(), tt = 0.0042 + 0.0007 * rnd.NextDouble(), tl = 1 + 3 * rnd.NextDouble();
            _tube[i] = Member.Create(new RectangularHollowSection(Length.FromMeters(tb), Length.FromMeters(tb + 0.02), Length.FromMeters(tt)),
                AluminiumAlloys.EnAw6082T6Extrusion, Length.FromMeters(tl), Restraint.PinnedBothAxes);
        }
        _alu = DesignActions.Compression(Force.FromKilonewtons(40));
        _timber = DesignActions.Compression(Force.FromKilonewtons(30)).WithLoadDuration(LoadDurationClass.MediumTerm);
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static double Applies(Member[] ms, DesignActions a, IResistanceMethod m)
    {
        double s = 0;
        for (int i = 0; i < ms.Length; i++) s += m.AppliesTo(in ms[i].Resolved, in a.Resolved).IsApplicable ? 1 : 0;
        return s;
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static double Evaluate(Member[] ms, DesignActions a, IResistanceMethod m)
    {
        double s = 0;
        for (int i = 0; i < ms.Length; i++) { var r = m.Evaluate(in ms[i].Resolved, in a.Resolved, null); s += r.Utilisation + r.DesignResistanceN; }
        return s;
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static double ViaCheck(Member[] ms, DesignActions a, IResistanceMethod m)
    {
        double s = 0;
        for (int i = 0; i < ms.Length; i++) { var r = Check.Evaluate(ms[i], a, m); s += r.Utilisation + r.DesignResistanceN; }
        return s;
    }

    [Benchmark] public double Ec9Check() => ViaCheck(_tube, _alu, ResistanceMethods.Eurocode9);
    [Benchmark] public double NdsCheck() => ViaCheck(_dfl, _timber, ResistanceMethods.NdsColumnAsd);
    [Benchmark] public double FireCheck() => ViaCheck(_c24, _timber, ResistanceMethods.Ec5FireR30);
    [Benchmark] public double Ec9AppliesTo() => Applies(_tube, _alu, ResistanceMethods.Eurocode9);
    [Benchmark] public double Ec9Evaluate() => Evaluate(_tube, _alu, ResistanceMethods.Eurocode9);
    [Benchmark] public double NdsAppliesTo() => Applies(_dfl, _timber, ResistanceMethods.NdsColumnAsd);
    [Benchmark] public double NdsEvaluate() => Evaluate(_dfl, _timber, ResistanceMethods.NdsColumnAsd);
    [Benchmark] public double FireAppliesTo() => Applies(_c24, _timber, ResistanceMethods.Ec5FireR30);
    [Benchmark] public double FireEvaluate() => Evaluate(_c24, _timber, ResistanceMethods.Ec5FireR30);
    [Benchmark] public double ConstantsAppliesTo() => Applies(_tube, _alu, ResistanceMethods.AluminiumBucklingConstantsLrfd);
    [Benchmark] public double ConstantsEvaluate() => Evaluate(_tube, _alu, ResistanceMethods.AluminiumBucklingConstantsLrfd);
}
