using System;
using BenchmarkDotNet.Attributes;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Resolution;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Benchmarks;

/// <summary>
/// Euler, Johnson and secant capacity of 1,000 members through the typed API (<see cref="Check"/> on <see cref="Member"/>
/// and <see cref="DesignActions"/>, resolution included), through the resolved path (members resolved once), and the
/// same formulas hand-written on raw doubles, in one run. The raw loops are the baselines the ratios are taken against.
/// </summary>
[MemoryDiagnoser]
public class ClassicalBenchmarks
{
    private const int N = 1000;
    private Member[] _members = [];
    private DesignActions _concentric = null!, _eccentric = null!;
    private ResolvedMember[] _resolved = [];
    private ResolvedActions _rc, _re;
    private double[] _b = [], _h = [], _l = [];
    private const double E = 200e9, F = 250e6, NEd = 20e3, Ecc = 0.01;

    [GlobalSetup]
    public void Setup()
    {
        var rnd = new Random(12345);
        _members = new Member[N]; _resolved = new ResolvedMember[N];
        _b = new double[N]; _h = new double[N]; _l = new double[N];
        for (int i = 0; i < N; i++)
        {
            _b[i] = 0.03 + 0.1 * rnd.NextDouble(); _h[i] = 0.03 + 0.1 * rnd.NextDouble(); _l[i] = 0.5 + 4 * rnd.NextDouble();
            _members[i] = Member.Create(new RectangleSection(Length.FromMeters(_b[i]), Length.FromMeters(_h[i])), IsotropicMaterial.GenericStructuralSteel,
                Length.FromMeters(_l[i]), Restraint.PinnedBothAxes);
            _resolved[i] = ResolvedMember.From(_members[i]);
        }
        _concentric = DesignActions.Compression(Force.FromNewtons(NEd));
        _eccentric = DesignActions.Compression(Force.FromNewtons(NEd)).WithEccentricity(Length.FromMeters(Ecc), Length.Zero);
        _rc = ResolvedActions.From(_concentric);
        _re = ResolvedActions.From(_eccentric);
    }

    [Benchmark] public double EulerTyped() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_members[i], _concentric, ResistanceMethods.Euler).Utilisation; return s; }
    [Benchmark] public double EulerResolved() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_resolved[i], _rc, ResistanceMethods.Euler, null).Utilisation; return s; }
    [Benchmark(Baseline = true)] public double EulerRaw()
    {
        double s = 0;
        for (int i = 0; i < N; i++)
        {
            double b = _b[i], h = _h[i], l = _l[i], a = b * h;
            double ny = Math.PI * Math.PI * E * (b * h * h * h / 12) / (l * l), nz = Math.PI * Math.PI * E * (h * b * b * b / 12) / (l * l);
            s += NEd / Math.Min(Math.Min(ny, nz), a * F);
        }
        return s;
    }

    [Benchmark] public double JohnsonTyped() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_members[i], _concentric, ResistanceMethods.Johnson).Utilisation; return s; }
    [Benchmark] public double JohnsonResolved() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_resolved[i], _rc, ResistanceMethods.Johnson, null).Utilisation; return s; }
    [Benchmark] public double JohnsonRaw()
    {
        double s = 0, cc = Math.Sqrt(2 * Math.PI * Math.PI * E / F);
        for (int i = 0; i < N; i++)
        {
            double b = _b[i], h = _h[i], l = _l[i], a = b * h;
            double ly = l / (h / Math.Sqrt(12)), lz = l / (b / Math.Sqrt(12));
            double lam = Math.Max(ly, lz);
            double sigma = lam < cc ? F - Math.Pow(F * lam / (2 * Math.PI), 2) / E : Math.PI * Math.PI * E / (lam * lam);
            s += NEd / (sigma * a);
        }
        return s;
    }

    [Benchmark] public double SecantTyped() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_members[i], _eccentric, ResistanceMethods.Secant).Utilisation; return s; }
    [Benchmark] public double SecantResolved() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_resolved[i], _re, ResistanceMethods.Secant, null).Utilisation; return s; }
    [Benchmark] public double SecantRaw()
    {
        // The same bracketed inverse by the same MathNet Brent call, on raw doubles.
        double s = 0;
        for (int i = 0; i < N; i++)
        {
            double b = _b[i], h = _h[i], l = _l[i], a = b * h, iy = h / Math.Sqrt(12), iz = b / Math.Sqrt(12);
            double pcrY = Math.PI * Math.PI * E * a * iy * iy / (l * l), pcrZ = Math.PI * Math.PI * E * a * iz * iz / (l * l);
            double p = SecantKernel.LoadAtStress(F, pcrY, a, E, Ecc, h / 2, iy, l, 0, 0, iz, l, out _);
            s += NEd / Math.Min(p, pcrZ);
        }
        return s;
    }
}
