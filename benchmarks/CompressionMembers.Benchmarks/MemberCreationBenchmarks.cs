using System;
using BenchmarkDotNet.Attributes;
using CompressionMembers.Actions;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Benchmarks;

/// <summary>
/// What the typed path pays once per member and once per action case, before any check: building a section, a member and
/// design actions from UnitsNet quantities (validation, conversion to SI, and the member's resolution: radii, slenderness,
/// Euler forces, section moduli). A sweep that builds a member for every check pays this on top of the check.
/// </summary>
[MemoryDiagnoser]
public class MemberCreationBenchmarks
{
    private const int N = 2000;
    private Length[] _b = [], _h = [], _l = [];
    private RectangleSection[] _sections = [];

    [GlobalSetup]
    public void Setup()
    {
        var rnd = new Random(2026);
        _b = new Length[N]; _h = new Length[N]; _l = new Length[N]; _sections = new RectangleSection[N];
        for (int i = 0; i < N; i++)
        {
            _b[i] = Length.FromMillimeters(90 + 100 * rnd.NextDouble());
            _h[i] = Length.FromMillimeters(_b[i].Millimeters + 100 * rnd.NextDouble());
            _l[i] = Length.FromMeters(1.5 + 3 * rnd.NextDouble());
            _sections[i] = new RectangleSection(_b[i], _h[i]);
        }
    }

    [Benchmark] public int Section() { int k = 0; for (int i = 0; i < N; i++) k += new RectangleSection(_b[i], _h[i]).Kind == SectionKind.SolidRectangle ? 1 : 0; return k; }
    [Benchmark] public int MemberFromSection() { int k = 0; for (int i = 0; i < N; i++) k += Member.Create(_sections[i], TimberGrades.C24, _l[i], Restraint.PinnedBothAxes).Name.Length; return k; }
    [Benchmark] public int MemberWithLength() { int k = 0; var m = Member.Create(_sections[0], TimberGrades.C24, _l[0], Restraint.PinnedBothAxes); for (int i = 0; i < N; i++) k += m.WithLength(_l[i]).Name.Length; return k; }
    [Benchmark] public int Actions() { int k = 0; for (int i = 0; i < N; i++) k += DesignActions.Compression(Force.FromKilonewtons(10 + i)).WithLoadDuration(LoadDurationClass.MediumTerm).Name.Length; return k; }
}
