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
/// EN 1995-1-1 and NDS column checks of 10,000 timber members and EN 1999-1-1 flexural-buckling checks of 10,000
/// aluminium tubes: the typed API (members built once, resolution included), the resolved path, and the same formulas
/// hand-written on raw doubles. <see cref="Setup"/> verifies that each raw loop gives the method's own utilisations
/// to 1e-12 before anything is timed, so the comparison is of the same formula.
/// </summary>
[MemoryDiagnoser]
public class CodeMethodBenchmarks
{
    private const int N = 10_000;
    private Member[] _timber = [], _alu = [];
    private ResolvedMember[] _timberR = [], _aluR = [];
    private double[] _b = [], _h = [], _l = [], _ab = [], _at = [], _al = [];
    private DesignActions _timberLoad = null!, _aluLoad = null!, _ndsLoad = null!;
    private ResolvedActions _timberLoadR, _aluLoadR, _ndsLoadR;
    private readonly Ec5ColumnStability _ec5 = new(ServiceClass.Class1, checkLateralTorsionalBuckling: false);
    private readonly NdsColumnStability _nds = new(NdsDesignFormat.Asd, NdsAdjustments.None, loadDurationFactor: 1.0);
    private NdsTimberMaterial _ndsGrade = null!;
    private double _ndsFc, _ndsEmin;
    private Member[] _ndsMembers = [];
    private ResolvedMember[] _ndsR = [];

    [GlobalSetup]
    public void Setup()
    {
        var rnd = new Random(2024);
        _timber = new Member[N]; _timberR = new ResolvedMember[N]; _alu = new Member[N]; _aluR = new ResolvedMember[N];
        _ndsMembers = new Member[N]; _ndsR = new ResolvedMember[N];
        _b = new double[N]; _h = new double[N]; _l = new double[N]; _ab = new double[N]; _at = new double[N]; _al = new double[N];
        _ndsGrade = NdsGrades.DouglasFirLarchNo2;
        _ndsFc = _ndsGrade.CompressionValue.Pascals;
        _ndsEmin = _ndsGrade.StabilityModulus.Pascals;
        for (int i = 0; i < N; i++)
        {
            _b[i] = 0.09 + 0.1 * rnd.NextDouble(); _h[i] = _b[i] + 0.1 * rnd.NextDouble(); _l[i] = 1.5 + 3 * rnd.NextDouble();
            var rect = new RectangleSection(Length.FromMeters(_b[i]), Length.FromMeters(_h[i]));
            _timber[i] = Member.Create(rect, TimberGrades.C24, Length.FromMeters(_l[i]), Restraint.PinnedBothAxes);
            _timberR[i] = ResolvedMember.From(_timber[i]);
            _ndsMembers[i] = Member.Create(rect, _ndsGrade, Length.FromMeters(_l[i]), Restraint.PinnedBothAxes);
            _ndsR[i] = ResolvedMember.From(_ndsMembers[i]);
            _ab[i] = 0.04 + 0.04 * rnd.NextDouble(); _at[i] = 0.0042 + 0.0007 * rnd.NextDouble(); _al[i] = 1 + 3 * rnd.NextDouble();
            _alu[i] = Member.Create(new RectangularHollowSection(Length.FromMeters(_ab[i]), Length.FromMeters(_ab[i]), Length.FromMeters(_at[i])),
                AluminiumAlloys.EnAw6082T6Extrusion, Length.FromMeters(_al[i]), Restraint.PinnedBothAxes);
            _aluR[i] = ResolvedMember.From(_alu[i]);
        }
        _timberLoad = DesignActions.Compression(Force.FromKilonewtons(30)).WithLoadDuration(LoadDurationClass.MediumTerm);
        _ndsLoad = DesignActions.Compression(Force.FromKilonewtons(30)).WithLoadDuration(LoadDurationClass.MediumTerm);
        _aluLoad = DesignActions.Compression(Force.FromKilonewtons(40));
        _timberLoadR = ResolvedActions.From(_timberLoad); _ndsLoadR = ResolvedActions.From(_ndsLoad); _aluLoadR = ResolvedActions.From(_aluLoad);

        for (int i = 0; i < N; i += 97)
        {
            Same(Check.Evaluate(_timber[i], _timberLoad, _ec5).Utilisation, Ec5Raw(i), "EN 1995-1-1");
            Same(Check.Evaluate(_ndsMembers[i], _ndsLoad, _nds).Utilisation, NdsRaw(i), "NDS");
            Same(Check.Evaluate(_alu[i], _aluLoad, ResistanceMethods.Eurocode9).Utilisation, Ec9Raw(i), "EN 1999-1-1");
        }
    }

    private static void Same(double a, double b, string what)
    {
        if (Math.Abs(a - b) > 1e-12 * Math.Abs(a))
            throw new InvalidOperationException($"{what}: the raw loop ({b:R}) does not reproduce the method ({a:R}); the benchmark would compare different formulas.");
    }

    // EN 1995-1-1 6.3.2: C24 (fc,0,k = 21 MPa, E0,05 = 7400 MPa), kmod = 0.8 (service class 1, medium-term), γM = 1.3, βc = 0.2.
    private double Ec5Raw(int i)
    {
        const double fc0k = 21e6, e005 = 7400e6, fc0d = 0.8 * fc0k / 1.3;
        double b = _b[i], h = _h[i], l = _l[i];
        double lamY = l / (h / Math.Sqrt(12)), lamZ = l / (b / Math.Sqrt(12));
        double kcY = Kc(lamY / Math.PI * Math.Sqrt(fc0k / e005)), kcZ = Kc(lamZ / Math.PI * Math.Sqrt(fc0k / e005));
        double sigma = 30e3 / (b * h);
        return Math.Max(sigma / (kcY * fc0d), sigma / (kcZ * fc0d));

        static double Kc(double lr)
        {
            if (lr <= 0.3) return 1;
            double k = 0.5 * (1 + 0.2 * (lr - 0.3) + lr * lr);
            return 1 / (k + Math.Sqrt(k * k - lr * lr));
        }
    }

    // NDS 3.7.1: Fc* = Fc CD (other factors 1), E'min = Emin, FcE = 0.822 E'min / (le/d)², Cp with c = 0.8 (sawn lumber).
    private double NdsRaw(int i)
    {
        double fcStar = _ndsFc, eMin = _ndsEmin;
        double b = _b[i], h = _h[i], l = _l[i];
        double cp = Math.Min(Cp(0.822 * eMin / ((l / h) * (l / h)) / fcStar), Cp(0.822 * eMin / ((l / b) * (l / b)) / fcStar));
        return 30e3 / (b * h) / (fcStar * cp);

        static double Cp(double alpha)
        {
            const double c = 0.8;
            double q = (1 + alpha) / (2 * c);
            return q - Math.Sqrt(q * q - alpha / c);
        }
    }

    // EN 1999-1-1 6.3.1: 6082-T6 (f0 = 250 MPa, class A: α = 0.20, λ̄0 = 0.10), square tubes of class ≤ 3 (Aeff = A), γM1 = 1.10.
    private double Ec9Raw(int i)
    {
        const double f0 = 250e6, e = 70000e6;
        double b = _ab[i], t = _at[i], l = _al[i];
        double bi = b - 2 * t;
        double a = b * b - bi * bi, iSec = (Math.Pow(b, 4) - Math.Pow(bi, 4)) / 12;
        double ncr = Math.PI * Math.PI * e * iSec / (l * l);
        double lb = Math.Sqrt(a * f0 / ncr);
        double phi = 0.5 * (1 + 0.2 * (lb - 0.1) + lb * lb);
        double chi = Math.Min(1, 1 / (phi + Math.Sqrt(phi * phi - lb * lb)));
        return 40e3 / (chi * a * f0 / 1.1);
    }

    [Benchmark] public double Ec5Typed() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_timber[i], _timberLoad, _ec5).Utilisation; return s; }
    [Benchmark] public double Ec5Resolved() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_timberR[i], _timberLoadR, _ec5, null).Utilisation; return s; }
    [Benchmark(Baseline = true)] public double Ec5RawLoop() { double s = 0; for (int i = 0; i < N; i++) s += Ec5Raw(i); return s; }

    [Benchmark] public double NdsTyped() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_ndsMembers[i], _ndsLoad, _nds).Utilisation; return s; }
    [Benchmark] public double NdsResolved() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_ndsR[i], _ndsLoadR, _nds, null).Utilisation; return s; }
    [Benchmark] public double NdsRawLoop() { double s = 0; for (int i = 0; i < N; i++) s += NdsRaw(i); return s; }

    [Benchmark] public double Ec9Typed() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_alu[i], _aluLoad, ResistanceMethods.Eurocode9).Utilisation; return s; }
    [Benchmark] public double Ec9Resolved() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_aluR[i], _aluLoadR, ResistanceMethods.Eurocode9, null).Utilisation; return s; }
    [Benchmark] public double Ec9RawLoop() { double s = 0; for (int i = 0; i < N; i++) s += Ec9Raw(i); return s; }
}
