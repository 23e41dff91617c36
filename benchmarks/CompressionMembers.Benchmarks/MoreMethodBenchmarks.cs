using System;
using BenchmarkDotNet.Attributes;
using CompressionMembers.Actions;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Resolution;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using MathNet.Numerics.RootFinding;
using UnitsNet;

namespace CompressionMembers.Benchmarks;

/// <summary>
/// The other built-in methods over 2,000 members each: EN 1995-1-2 reduced cross-section in fire (R30), the aluminium
/// buckling-constant method (LRFD) and the Ramberg–Osgood tangent-modulus column, typed API against a raw-double loop of
/// the same formula (the tangent-modulus raw loop uses MathNet's Brent with the same tolerances, as the method does), and
/// EN 1999-1-1 torsional/flexural-torsional buckling of angles (typed and resolved only: no raw loop is written for the
/// coupled cubic). <see cref="Setup"/> checks each raw loop against the method to 1e-12 (1e-9 for the Brent roots) before
/// anything is timed. Material constants (fd, bc, dc, Cc) are hoisted out of the raw loops, as a hand-written study would do.
/// </summary>
[MemoryDiagnoser]
public class MoreMethodBenchmarks
{
    private const int N = 2000;
    private Member[] _timber = [], _alu = [], _angles = [];
    private ResolvedMember[] _anglesR = [];
    private double[] _b = [], _h = [], _l = [], _ab = [], _at = [], _al = [];
    private DesignActions _timberLoad = null!, _aluLoad = null!, _angleLoad = null!;
    private ResolvedActions _angleLoadR;
    private readonly Func<double, double> _residual;
    private double _se;

    public MoreMethodBenchmarks() => _residual = Residual;

    [GlobalSetup]
    public void Setup()
    {
        var rnd = new Random(77);
        _timber = new Member[N]; _alu = new Member[N]; _angles = new Member[N]; _anglesR = new ResolvedMember[N];
        _b = new double[N]; _h = new double[N]; _l = new double[N]; _ab = new double[N]; _at = new double[N]; _al = new double[N];
        for (int i = 0; i < N; i++)
        {
            _b[i] = 0.14 + 0.1 * rnd.NextDouble(); _h[i] = _b[i] + 0.1 * rnd.NextDouble(); _l[i] = 2 + 2 * rnd.NextDouble();
            _timber[i] = Member.Create(new RectangleSection(Length.FromMeters(_b[i]), Length.FromMeters(_h[i])), TimberGrades.C24, Length.FromMeters(_l[i]), Restraint.PinnedBothAxes);
            _ab[i] = 0.04 + 0.04 * rnd.NextDouble(); _at[i] = 0.0042 + 0.0007 * rnd.NextDouble(); _al[i] = 1 + 3 * rnd.NextDouble();
            _alu[i] = Member.Create(new RectangularHollowSection(Length.FromMeters(_ab[i]), Length.FromMeters(_ab[i]), Length.FromMeters(_at[i])),
                AluminiumAlloys.EnAw6082T6Extrusion, Length.FromMeters(_al[i]), Restraint.PinnedBothAxes);
            _angles[i] = Member.Create(new AngleSection(Length.FromMillimeters(80), Length.FromMillimeters(40), Length.FromMillimeters(4)),
                AluminiumAlloys.EnAw6082T6Extrusion, Length.FromMeters(0.4 + 1.5 * rnd.NextDouble()), Restraint.PinnedBothAxes);
            _anglesR[i] = ResolvedMember.From(_angles[i]);
        }
        _timberLoad = DesignActions.Compression(Force.FromKilonewtons(30)).WithLoadDuration(LoadDurationClass.MediumTerm);
        _aluLoad = DesignActions.Compression(Force.FromKilonewtons(40));
        _angleLoad = DesignActions.Compression(Force.FromKilonewtons(10));
        _angleLoadR = ResolvedActions.From(_angleLoad);

        for (int i = 0; i < N; i += 37)
        {
            Same(Check.Evaluate(_timber[i], _timberLoad, ResistanceMethods.Ec5FireR30).Utilisation, FireRaw(i), 1e-12, "EN 1995-1-2 R30");
            Same(Check.Evaluate(_alu[i], _aluLoad, ResistanceMethods.AluminiumBucklingConstantsLrfd).Utilisation, ConstantsRaw(i), 1e-12, "buckling constants");
            Same(Check.Evaluate(_alu[i], _aluLoad, ResistanceMethods.TangentModulusRambergOsgood).Utilisation, TangentRaw(i), 1e-9, "tangent modulus");
        }
    }

    private static void Same(double a, double b, double tol, string what)
    {
        if (Math.Abs(a - b) > tol * Math.Abs(a))
            throw new InvalidOperationException($"{what}: the raw loop ({b:R}) does not reproduce the method ({a:R}); the benchmark would compare different formulas.");
    }

    // EN 1995-1-2 4.2.2 with EN 1995-1-1 6.3.2, C24 four sides exposed, t = 30 min: def = βn t + k0 d0 with βn = 0.8 mm/min
    // (Table 3.1, solid softwood), k0 = 1, d0 = 7 mm; fd,fi = kfi fk (kmod,fi = 1, γM,fi = 1, kfi = 1.25), βc = 0.2.
    private double FireRaw(int i)
    {
        const double fc0k = 21e6, e005 = 7400e6, kfi = 1.25, fd = kfi * fc0k;
        const double def = 0.8 / 60000.0 * 1800 + 0.007;
        double b = _b[i] - 2 * def, h = _h[i] - 2 * def, l = _l[i];
        double root = Math.Sqrt(fc0k / e005);
        double lamY = l / Math.Sqrt(b * h * h * h / 12 / (b * h)), lamZ = l / Math.Sqrt(h * b * b * b / 12 / (b * h));
        double kcY = Kc(lamY / Math.PI * root), kcZ = Kc(lamZ / Math.PI * root);
        double sigma = 30e3 / (b * h);
        return Math.Max(sigma / (kcY * fd), sigma / (kcZ * fd));
    }

    private static double Kc(double lr)
    {
        if (lr <= 0.3) return 1;
        double k = 0.5 * (1 + 0.2 * (lr - 0.3) + lr * lr);
        return 1 / (k + Math.Sqrt(k * k - lr * lr));
    }

    // Aluminum Design Manual style buckling constants for an artificially aged temper (6082-T6, Fcy = 250 MPa):
    // Bc = Fcy (1 + √(Fcy / 2250 ksi)), Dc = Bc/10 √(Bc/E), Cc = 0.41 Bc/Dc; Fc = min(Fcy, Bc − Dc λ) below Cc, π²E/λ² above; φ = 0.90.
    private static readonly double Bc = 250e6 * (1 + Math.Sqrt(250e6 / (2250 * 6.894757293168361e6)));
    private static readonly double Dc = Bc / 10 * Math.Sqrt(Bc / 70000e6);
    private static readonly double Cc = 0.41 * Bc / Dc;

    private double ConstantsRaw(int i)
    {
        const double fcy = 250e6, e = 70000e6;
        double b = _ab[i], t = _at[i], l = _al[i], bi = b - 2 * t;
        double a = b * b - bi * bi, iSec = (b * b * b * b - bi * bi * bi * bi) / 12;
        // Both axes, as the method reports both (the same numbers for a square tube).
        double lamY = l / Math.Sqrt(iSec / a), lamZ = l / Math.Sqrt(iSec / a);
        double fy = lamY >= Cc ? Math.PI * Math.PI * e / (lamY * lamY) : Math.Min(fcy, Bc - Dc * lamY);
        double fz = lamZ >= Cc ? Math.PI * Math.PI * e / (lamZ * lamZ) : Math.Min(fcy, Bc - Dc * lamZ);
        return 40e3 / (0.90 * Math.Min(fy, fz) * a);
    }

    // Engesser tangent modulus with Ramberg–Osgood ε = σ/E + 0.002 (σ/f0)^n, n = f0/10 MPa: σcr = x σE with x the root of
    // x − Et(x σE)/E on (1e-12, 1) by Brent (the method's tolerances); capacity min(σcr, f0) A.
    private double Residual(double x)
    {
        const double e = 70000e6, f0 = 250e6, n = 25;
        double sigma = x * _se;
        return x - 1 / (1 / e + 0.002 * n / f0 * Math.Pow(sigma / f0, n - 1)) / e;
    }

    private double TangentRaw(int i)
    {
        const double e = 70000e6, f0 = 250e6;
        double b = _ab[i], t = _at[i], l = _al[i], bi = b - 2 * t;
        double a = b * b - bi * bi, iSec = (b * b * b * b - bi * bi * bi * bi) / 12;
        // Both axes, as the method reports both (the same numbers for a square tube).
        double sy = Critical(l / Math.Sqrt(iSec / a)), sz = Critical(l / Math.Sqrt(iSec / a));
        return 40e3 / (Math.Min(Math.Min(sy, sz), f0) * a);

        double Critical(double lam)
        {
            _se = Math.PI * Math.PI * e / (lam * lam);
            return _residual(1.0) <= 0 ? _se : _se * Brent.FindRoot(_residual, 1e-12, 1.0, 1e-13, 300);
        }
    }

    [Benchmark] public double FireTyped() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_timber[i], _timberLoad, ResistanceMethods.Ec5FireR30).Utilisation; return s; }
    [Benchmark(Baseline = true)] public double FireRawLoop() { double s = 0; for (int i = 0; i < N; i++) s += FireRaw(i); return s; }

    [Benchmark] public double ConstantsTyped() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_alu[i], _aluLoad, ResistanceMethods.AluminiumBucklingConstantsLrfd).Utilisation; return s; }
    [Benchmark] public double ConstantsRawLoop() { double s = 0; for (int i = 0; i < N; i++) s += ConstantsRaw(i); return s; }

    [Benchmark] public double TangentTyped() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_alu[i], _aluLoad, ResistanceMethods.TangentModulusRambergOsgood).Utilisation; return s; }
    [Benchmark] public double TangentRawLoop() { double s = 0; for (int i = 0; i < N; i++) s += TangentRaw(i); return s; }

    [Benchmark] public double Ec9AngleTyped() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_angles[i], _angleLoad, ResistanceMethods.Eurocode9).Utilisation; return s; }
    [Benchmark] public double Ec9AngleResolved() { double s = 0; for (int i = 0; i < N; i++) s += Check.Evaluate(_anglesR[i], _angleLoadR, ResistanceMethods.Eurocode9, null).Utilisation; return s; }
}
