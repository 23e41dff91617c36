using System;
using System.Runtime.CompilerServices;
using BenchmarkDotNet.Attributes;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Methods.Timber;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using MathNet.Numerics.RootFinding;
using UnitsNet;

namespace CompressionMembers.Benchmarks;

/// <summary>
/// Every closed-form built-in method, tracing off, through the typed API — <see cref="Check.Evaluate(Member, DesignActions, IResistanceMethod)"/>
/// on members and actions built once (they are resolved to SI doubles when they are built) — against a hand-written loop of
/// the same formula on raw doubles, from the members' dimensions and length, in one run.
/// </summary>
/// <remarks>
/// <para>Both sides deliver the same numbers per member — the utilisation, the design resistance and, per axis or mode, the
/// slenderness, relative slenderness, elastic critical force, reduction factor and resistance that a result carries — and
/// sum them all, so that neither side can drop work the other does. <see cref="Setup"/> checks every raw loop against the
/// method (utilisation, resistance and the sum of all outputs, to 1e-12 relative; 1e-9 where both solve by Brent) before
/// anything is timed.</para>
/// <para>The raw loops hoist the material constants (fd, Bc, Dc, Cc, √(f/E)) out of the loop, as a hand-written study
/// would. The typed side has its members' geometry resolved once when the member is built (area, second moments,
/// slenderness, Euler forces); <see cref="MemberCreationBenchmarks"/> times that building separately.</para>
/// </remarks>
[MemoryDiagnoser]
public class MethodBenchmarks
{
    private const int N = 2000;
    private const double Steel = 200e9, SteelF = 250e6;

    private double[] _b = [], _h = [], _l = [];        // solid rectangles (m): steel for the classical methods, timber for the codes
    private double[] _tb = [], _th = [], _tt = [], _tl = [];     // rectangular aluminium tubes (m): width, depth, wall, length
    private Member[] _steel = [], _c24 = [], _c24Big = [], _dfl = [], _tube = [];
    private DesignActions _steelLoad = null!, _steelEccentric = null!, _timberLoad = null!, _timberBending = null!, _ndsLoad = null!, _aluLoad = null!;
    private readonly Ec5ColumnStability _ec5 = ResistanceMethods.Ec5Column;
    private readonly NdsColumnStability _nds = ResistanceMethods.NdsColumnAsd;
    private double _ndsFc, _ndsEmin;
    private double _se;
    private readonly Func<double, double> _residual;

    public MethodBenchmarks() => _residual = Residual;

    // BenchmarkDotNet's set-up and clean-up also print the machine probe (MachineProbe.cs), so that a run's log tells which
    // of its processes began or ended in this machine's slow mode (docs/performance.md, "What the slow mode is").
    [GlobalSetup]
    public void SetupAndProbe()
    {
        Setup();
        Console.WriteLine(MachineProbe.Report("set-up"));
    }

    [GlobalCleanup]
    public void ProbeAtCleanup() => Console.WriteLine(MachineProbe.Report("clean-up"));

    /// <summary>Builds the members and checks every raw loop against its method (the plain loop calls it directly).</summary>
    public void Setup()
    {
        var rnd = new Random(2026);
        _b = new double[N]; _h = new double[N]; _l = new double[N]; _tb = new double[N]; _th = new double[N]; _tt = new double[N]; _tl = new double[N];
        _steel = new Member[N]; _c24 = new Member[N]; _c24Big = new Member[N]; _dfl = new Member[N]; _tube = new Member[N];
        var dfl = NdsGrades.DouglasFirLarchNo2;
        _ndsFc = dfl.CompressionValue.Pascals; _ndsEmin = dfl.StabilityModulus.Pascals;
        for (int i = 0; i < N; i++)
        {
            _b[i] = 0.09 + 0.1 * rnd.NextDouble(); _h[i] = _b[i] + 0.1 * rnd.NextDouble(); _l[i] = 1.5 + 3 * rnd.NextDouble();
            var rect = new RectangleSection(Length.FromMeters(_b[i]), Length.FromMeters(_h[i]));
            _steel[i] = Member.Create(rect, IsotropicMaterial.GenericStructuralSteel, Length.FromMeters(_l[i]), Restraint.PinnedBothAxes);
            _c24[i] = Member.Create(rect, TimberGrades.C24, Length.FromMeters(_l[i]), Restraint.PinnedBothAxes);
            _dfl[i] = Member.Create(rect, dfl, Length.FromMeters(_l[i]), Restraint.PinnedBothAxes);
            // Fire: sections large enough to keep a residual section after 30 min on four sides.
            var big = new RectangleSection(Length.FromMeters(_b[i] + 0.05), Length.FromMeters(_h[i] + 0.05));
            _c24Big[i] = Member.Create(big, TimberGrades.C24, Length.FromMeters(_l[i]), Restraint.PinnedBothAxes);
            _tb[i] = 0.04 + 0.04 * rnd.NextDouble(); _th[i] = _tb[i] + 0.02 * rnd.NextDouble(); _tt[i] = 0.0042 + 0.0007 * rnd.NextDouble();
            _tl[i] = 1 + 3 * rnd.NextDouble();
            _tube[i] = Member.Create(new RectangularHollowSection(Length.FromMeters(_tb[i]), Length.FromMeters(_th[i]), Length.FromMeters(_tt[i])),
                AluminiumAlloys.EnAw6082T6Extrusion, Length.FromMeters(_tl[i]), Restraint.PinnedBothAxes);
        }
        _steelLoad = DesignActions.Compression(Force.FromKilonewtons(200));
        _steelEccentric = _steelLoad.WithEccentricity(Length.FromMillimeters(10), Length.Zero);
        _timberLoad = DesignActions.Compression(Force.FromKilonewtons(30)).WithLoadDuration(LoadDurationClass.MediumTerm);
        _timberBending = _timberLoad.WithEccentricity(Length.FromMillimeters(20), Length.FromMillimeters(5));
        _ndsLoad = _timberLoad;
        _aluLoad = DesignActions.Compression(Force.FromKilonewtons(40));

        for (int i = 0; i < N; i += 41)
        {
            { double sum = EulerRaw(i, out double u, out double n); Same(Check.Evaluate(_steel[i], _steelLoad, ResistanceMethods.Euler), u, n, sum, 1e-12, "Euler"); }
            { double sum = JohnsonRaw(i, out double u, out double n); Same(Check.Evaluate(_steel[i], _steelLoad, ResistanceMethods.Johnson), u, n, sum, 1e-12, "Johnson"); }
            { double sum = SecantRaw(i, out double u, out double n); Same(Check.Evaluate(_steel[i], _steelEccentric, ResistanceMethods.Secant), u, n, sum, 1e-9, "secant"); }
            { double sum = PerryRaw(i, out double u, out double n); Same(Check.Evaluate(_steel[i], _steelLoad, ResistanceMethods.PerryRobertsonDefault), u, n, sum, 1e-12, "Perry–Robertson"); }
            { double sum = Ec5Raw(i, out double u, out double n); Same(Check.Evaluate(_c24[i], _timberLoad, _ec5), u, n, sum, 1e-12, "EN 1995-1-1"); }
            { double sum = Ec5BendingRaw(i, out double u, out double n); Same(Check.Evaluate(_c24[i], _timberBending, _ec5), u, n, sum, 1e-12, "EN 1995-1-1 with bending"); }
            { double sum = FireRaw(i, out double u, out double n); Same(Check.Evaluate(_c24Big[i], _timberLoad, ResistanceMethods.Ec5FireR30), u, n, sum, 1e-12, "EN 1995-1-2 R30"); }
            { double sum = NdsRaw(i, out double u, out double n); Same(Check.Evaluate(_dfl[i], _ndsLoad, _nds), u, n, sum, 1e-12, "NDS"); }
            { double sum = Ec9Raw(i, out double u, out double n); Same(Check.Evaluate(_tube[i], _aluLoad, ResistanceMethods.Eurocode9), u, n, sum, 1e-12, "EN 1999-1-1"); }
            { double sum = ConstantsRaw(i, out double u, out double n); Same(Check.Evaluate(_tube[i], _aluLoad, ResistanceMethods.AluminiumBucklingConstantsLrfd), u, n, sum, 1e-12, "buckling constants"); }
            { double sum = TangentRaw(i, out double u, out double n); Same(Check.Evaluate(_tube[i], _aluLoad, ResistanceMethods.TangentModulusRambergOsgood), u, n, sum, 1e-9, "tangent modulus"); }
        }
    }

    private static void Same(CheckResult r, double u, double nRd, double sum, double tol, string what)
    {
        double typed = Sum(r);
        if (!Close(r.Utilisation, u, tol) || !Close(r.DesignResistanceN, nRd, tol) || !Close(typed, sum, tol))
            throw new InvalidOperationException($"{what}: the raw loop (u {u:R}, N {nRd:R}, all outputs {sum:R}) does not reproduce the method (u {r.Utilisation:R}, N {r.DesignResistanceN:R}, all outputs {typed:R}); the benchmark would compare different formulas.");

        static bool Close(double a, double b, double tol) => Math.Abs(a - b) <= tol * Math.Abs(a);
    }

    // Every number a result carries (utilisation, resistance and, per axis or mode, λ, λ̄, Ncr, the reduction factor and the
    // resistance; the effective length is an input), so that the typed side is charged for all it computes and the raw
    // side must compute the same. NaN marks a value a method does not use; it counts as 0. This is the set-up's sum, to
    // compare with the raw loop's; the timed loop adds the same numbers plainly (Tally).
    private static double Sum(in CheckResult r) => r.Utilisation + r.DesignResistanceN + Sum(r.AboutY) + Sum(r.AboutZ) + Sum(r.Torsional);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double Sum(in AxisOutcome o) =>
        !o.IsEvaluated ? 0 : Z(o.Slenderness) + Z(o.RelativeSlenderness) + Z(o.CriticalForceN) + Z(o.ReductionFactor) + Z(o.ResistanceN);

    private static double Z(double x) => double.IsNaN(x) ? 0 : x;

    // The timed loop's sum: the same numbers as Sum, added as they are, as the raw loops add theirs — the raw loops leave
    // out what a method does not use, while this adds all fifteen outcome fields (an unused outcome is zeros, an unused
    // value NaN, which only makes the total NaN; adding NaN costs what adding a number costs). Until the thirteenth round
    // (docs/performance.md) the timed loop used Sum, whose ten or fifteen NaN tests per check the raw loops did not run.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]   // the raw loops sum in line; so does the typed side
    private static double Tally(in CheckResult r) => r.Utilisation + r.DesignResistanceN + Tally(r.AboutY) + Tally(r.AboutZ) + Tally(r.Torsional);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double Tally(in AxisOutcome o) => o.Slenderness + o.RelativeSlenderness + o.CriticalForceN + o.ReductionFactor + o.ResistanceN;

    // The typed path as a user's sweep writes it: members and actions built once, then Check.Evaluate per member.
    private static double Typed(Member[] members, DesignActions actions, IResistanceMethod method)
    {
        double s = 0;
        for (int i = 0; i < N; i++)
        {
            var r = Check.Evaluate(members[i], actions, method);
            s += Tally(r);
        }
        return s;
    }

    // ---- the raw formulas: each returns the sum of the same outputs, with u and N for the set-up check ---------------

    private static readonly double SteelLambda1 = Math.PI * Math.Sqrt(Steel / SteelF);   // λ1 = π √(E/f)

    // Euler: Ncr = π² E I / L² about both axes, squash load A f as cut-off (Timoshenko & Gere §2.2).
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private double EulerRaw(int i, out double u, out double nRd)
    {
        double b = _b[i], h = _h[i], l = _l[i], a = b * h;
        double ly = l / Math.Sqrt(h * h / 12), lz = l / Math.Sqrt(b * b / 12);
        double ny = Math.PI * Math.PI * Steel * (b * h * h * h / 12) / (l * l), nz = Math.PI * Math.PI * Steel * (h * b * b * b / 12) / (l * l);
        double sq = a * SteelF;
        nRd = Math.Min(Math.Min(ny, nz), sq);
        u = 200e3 / nRd;
        return u + nRd + ly + ly / SteelLambda1 + ny + Math.Min(ny, sq) + lz + lz / SteelLambda1 + nz + Math.Min(nz, sq);
    }

    // Johnson parabola below Cc = √(2π²E/f), Euler above (Shigley, columns).
    private static readonly double SteelCc = Math.Sqrt(2 * Math.PI * Math.PI * Steel / SteelF);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private double JohnsonRaw(int i, out double u, out double nRd)
    {
        double b = _b[i], h = _h[i], l = _l[i], a = b * h;
        double ly = l / Math.Sqrt(h * h / 12), lz = l / Math.Sqrt(b * b / 12);
        double sy = Johnson(ly), sz = Johnson(lz);
        double ny = Math.PI * Math.PI * Steel * (b * h * h * h / 12) / (l * l), nz = Math.PI * Math.PI * Steel * (h * b * b * b / 12) / (l * l);
        nRd = Math.Min(sy, sz) * a;
        u = 200e3 / nRd;
        return u + nRd + ly + ly / SteelLambda1 + ny + sy / SteelF + sy * a + lz + lz / SteelLambda1 + nz + sz / SteelF + sz * a;

        static double Johnson(double lam)
        {
            if (lam < SteelCc) { double k = SteelF * lam / (2 * Math.PI); return SteelF - k * k / Steel; }
            return Math.PI * Math.PI * Steel / (lam * lam);
        }
    }

    // Secant formula about y with e = 10 mm, Euler load about z (no eccentricity): the same bracketed Brent inverse.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private double SecantRaw(int i, out double u, out double nRd)
    {
        double b = _b[i], h = _h[i], l = _l[i], a = b * h, iy = Math.Sqrt(h * h / 12), iz = Math.Sqrt(b * b / 12);
        double ny = Math.PI * Math.PI * Steel * (b * h * h * h / 12) / (l * l), nz = Math.PI * Math.PI * Steel * (h * b * b * b / 12) / (l * l);
        double p = SecantKernel.LoadAtStress(SteelF, ny, a, Steel, 0.01, h / 2, iy, l, 0, 0, iz, l, out _);
        nRd = Math.Min(p, nz);
        u = 200e3 / nRd;
        double ly = l / iy, lz = l / iz;
        return u + nRd + ly + ly / SteelLambda1 + ny + p + lz + lz / SteelLambda1 + nz + nz;
    }

    // Perry–Robertson with Robertson's η = 0.003 λ (Timoshenko & Gere §1.12).
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private double PerryRaw(int i, out double u, out double nRd)
    {
        double b = _b[i], h = _h[i], l = _l[i], a = b * h;
        double ly = l / Math.Sqrt(h * h / 12), lz = l / Math.Sqrt(b * b / 12);
        double seY = Math.PI * Math.PI * Steel / (ly * ly), seZ = Math.PI * Math.PI * Steel / (lz * lz);
        double sy = Perry(seY, ly), sz = Perry(seZ, lz);
        double ny = Math.PI * Math.PI * Steel * (b * h * h * h / 12) / (l * l), nz = Math.PI * Math.PI * Steel * (h * b * b * b / 12) / (l * l);
        nRd = Math.Min(sy, sz) * a;
        u = 200e3 / nRd;
        return u + nRd + ly + Math.Sqrt(SteelF / seY) + ny + sy / SteelF + sy * a + lz + Math.Sqrt(SteelF / seZ) + nz + sz / SteelF + sz * a;

        static double Perry(double se, double lam)
        {
            double r = SteelF / se, q = 0.5 * (r + 1 + 0.003 * lam);
            return SteelF / (q + Math.Sqrt(Math.Max(q * q - r, 0)));
        }
    }

    // EN 1995-1-1 6.3.2: C24 (fc,0,k = 21 MPa, E0,05 = 7400 MPa), kmod = 0.8 (service class 1, medium-term), γM = 1.3, βc = 0.2.
    private const double Fc0k = 21e6, E005 = 7400e6, Fmk = 24e6, Fc0d = 0.8 * Fc0k / 1.3;
    private static readonly double Root = Math.Sqrt(Fc0k / E005);
    private static readonly double Sqrt12 = Math.Sqrt(12);

    private static double Kc(double lr)
    {
        if (lr <= 0.3) return 1;
        double k = 0.5 * (1 + 0.2 * (lr - 0.3) + lr * lr);
        return 1 / (k + Math.Sqrt(k * k - lr * lr));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private double Ec5Raw(int i, out double u, out double nRd)
    {
        double b = _b[i], h = _h[i], l = _l[i], a = b * h;
        double ly = l / Math.Sqrt(h * h / 12), lz = l / Math.Sqrt(b * b / 12);
        double lrY = ly / Math.PI * Root, lrZ = lz / Math.PI * Root;
        double kcY = Kc(lrY), kcZ = Kc(lrZ);
        double ny = Math.PI * Math.PI * E005 * (b * h * h * h / 12) / (l * l), nz = Math.PI * Math.PI * E005 * (h * b * b * b / 12) / (l * l);
        double sigma = 30e3 / a;
        nRd = Math.Min(kcY, kcZ) * Fc0d * a;
        u = Math.Max(sigma / (kcY * Fc0d), sigma / (kcZ * Fc0d));
        return u + nRd + ly + lrY + ny + kcY + kcY * Fc0d * a + lz + lrZ + nz + kcZ + kcZ * Fc0d * a;
    }

    // With ey = 20 mm, ez = 5 mm: (6.23)/(6.24) with km = 0.7, kh = min((150/h)^0.2, 1.3) below 150 mm, and lateral
    // torsional buckling (6.32, 6.34, 6.35) with Lef = L and the softwood formula σm,crit = 0.78 b² E0,05 / (h Lef).
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private double Ec5BendingRaw(int i, out double u, out double nRd)
    {
        double b = _b[i], h = _h[i], l = _l[i], a = b * h;
        double ly = l / Math.Sqrt(h * h / 12), lz = l / Math.Sqrt(b * b / 12);
        double lrY = ly / Math.PI * Root, lrZ = lz / Math.PI * Root;
        double kcY = Kc(lrY), kcZ = Kc(lrZ);
        double ny = Math.PI * Math.PI * E005 * (b * h * h * h / 12) / (l * l), nz = Math.PI * Math.PI * E005 * (h * b * b * b / 12) / (l * l);
        double khY = h >= 0.150 ? 1 : Math.Min(Math.Pow(0.150 / h, 0.2), 1.3), khZ = b >= 0.150 ? 1 : Math.Min(Math.Pow(0.150 / b, 0.2), 1.3);
        double fmyd = 0.8 * khY * Fmk / 1.3, fmzd = 0.8 * khZ * Fmk / 1.3;
        double sc = 30e3 / a, smy = 30e3 * 0.020 / (b * h * h / 6), smz = 30e3 * 0.005 / (h * b * b / 6);
        double my = smy / fmyd, mz = smz / fmzd;
        double uY, uZ;
        if (lrY <= 0.3 && lrZ <= 0.3) { double c = sc / Fc0d; uY = c * c + my + 0.7 * mz; uZ = c * c + 0.7 * my + mz; }
        else { uY = sc / (kcY * Fc0d) + my + 0.7 * mz; uZ = sc / (kcZ * Fc0d) + 0.7 * my + mz; }
        double scrit = 0.78 * b * b * E005 / (h * l), lrm = Math.Sqrt(Fmk / scrit);
        double kcrit = lrm <= 0.75 ? 1.0 : lrm <= 1.4 ? 1.56 - 0.75 * lrm : 1 / (lrm * lrm);
        double m = smy / (kcrit * fmyd), uLtb = m * m + sc / (kcZ * Fc0d);
        nRd = Math.Min(kcY, kcZ) * Fc0d * a;
        u = Math.Max(Math.Max(uY, uZ), uLtb);
        return u + nRd + ly + lrY + ny + kcY + kcY * Fc0d * a + lz + lrZ + nz + kcZ + kcZ * Fc0d * a + lrm + kcrit;
    }

    // EN 1995-1-2 4.2.2 with EN 1995-1-1 6.3.2, C24 four sides exposed, t = 30 min: def = βn t + k0 d0 with βn = 0.8 mm/min,
    // k0 = 1, d0 = 7 mm; fd,fi = kfi fk (kmod,fi = 1, γM,fi = 1, kfi = 1.25), E20 = kfi E0,05, βc = 0.2.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private double FireRaw(int i, out double u, out double nRd)
    {
        const double fd = 1.25 * Fc0k, e20 = 1.25 * E005, def = 0.8 / 60000.0 * 1800 + 0.007;
        double b = _b[i] + 0.05 - 2 * def, h = _h[i] + 0.05 - 2 * def, l = _l[i], a = b * h;
        double iy = b * h * h * h / 12, iz = h * b * b * b / 12;
        double ly = l * Sqrt12 / h, lz = l * Sqrt12 / b;      // i = √(I / A) = side / √12 for the residual rectangle
        double lrY = ly / Math.PI * Root, lrZ = lz / Math.PI * Root;
        double kcY = Kc(lrY), kcZ = Kc(lrZ);
        double ny = Math.PI * Math.PI * e20 * iy / (l * l), nz = Math.PI * Math.PI * e20 * iz / (l * l);
        double sigma = 30e3 / a;
        nRd = Math.Min(kcY, kcZ) * fd * a;
        u = Math.Max(sigma / (kcY * fd), sigma / (kcZ * fd));
        return u + nRd + ly + lrY + ny + kcY + kcY * fd * a + lz + lrZ + nz + kcZ + kcZ * fd * a;
    }

    // NDS 3.7.1: Fc* = Fc CD (CD = 1.15, other factors 1), E'min = Emin, FcE = 0.822 E'min / (le/d)², Cp with c = 0.8.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private double NdsRaw(int i, out double u, out double nRd)
    {
        double fcStar = _ndsFc * 1.15, eMin = _ndsEmin;
        double b = _b[i], h = _h[i], l = _l[i], a = b * h;
        double fcEY = 0.822 * eMin / ((l / h) * (l / h)), fcEZ = 0.822 * eMin / ((l / b) * (l / b));
        double cpY = Cp(fcEY / fcStar), cpZ = Cp(fcEZ / fcStar);
        double cp = Math.Min(cpY, cpZ);
        nRd = fcStar * cp * a;
        u = 30e3 / a / (fcStar * cp);
        return u + nRd + l / Math.Sqrt(h * h / 12) + fcEY * a + cpY + fcStar * cpY * a + l / Math.Sqrt(b * b / 12) + fcEZ * a + cpZ + fcStar * cpZ * a;

        static double Cp(double alpha)
        {
            const double c = 0.8;
            double q = (1 + alpha) / (2 * c);
            return q - Math.Sqrt(q * q - alpha / c);
        }
    }

    // EN 1999-1-1 6.3.1: 6082-T6 (f0 = 250 MPa, class A: α = 0.20, λ̄0 = 0.10), rectangular tubes of class ≤ 3 (Aeff = A),
    // γM1 = 1.10, flexural buckling about both axes.
    private const double AluE = 70000e6, AluF0 = 250e6;

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private void Tube(int i, out double a, out double iy, out double iz, out double l)
    {
        double b = _tb[i], h = _th[i], t = _tt[i], bi = b - 2 * t, hi = h - 2 * t;
        a = b * h - bi * hi;
        iy = (b * h * h * h - bi * hi * hi * hi) / 12;
        iz = (h * b * b * b - hi * bi * bi * bi) / 12;
        l = _tl[i];
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private double Ec9Raw(int i, out double u, out double nRd)
    {
        Tube(i, out double a, out double iy, out double iz, out double l);
        double ny = Math.PI * Math.PI * AluE * iy / (l * l), nz = Math.PI * Math.PI * AluE * iz / (l * l);
        double lbY = Math.Sqrt(a * AluF0 / ny), lbZ = Math.Sqrt(a * AluF0 / nz);
        double chiY = Chi(lbY), chiZ = Chi(lbZ);
        double nY = chiY * a * AluF0 / 1.1, nZ = chiZ * a * AluF0 / 1.1;
        nRd = Math.Min(nY, nZ);
        u = 40e3 / nRd;
        return u + nRd + l / Math.Sqrt(iy / a) + lbY + ny + chiY + nY + l / Math.Sqrt(iz / a) + lbZ + nz + chiZ + nZ;

        static double Chi(double lb)
        {
            if (lb <= 0.1) return 1;
            double phi = 0.5 * (1 + 0.2 * (lb - 0.1) + lb * lb);
            return Math.Min(1, 1 / (phi + Math.Sqrt(phi * phi - lb * lb)));
        }
    }

    // Aluminum Design Manual style buckling constants, artificially aged temper (6082-T6, Fcy = 250 MPa):
    // Bc = Fcy (1 + √(Fcy / 2250 ksi)), Dc = Bc/10 √(Bc/E), Cc = 0.41 Bc/Dc; Fc = min(Fcy, Bc − Dc λ) below Cc, π²E/λ² above; φ = 0.90.
    private static readonly double Bc = 250e6 * (1 + Math.Sqrt(250e6 / (2250 * 6.894757293168361e6)));
    private static readonly double Dc = Bc / 10 * Math.Sqrt(Bc / 70000e6);
    private static readonly double Cc = 0.41 * Bc / Dc;

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private double ConstantsRaw(int i, out double u, out double nRd)
    {
        Tube(i, out double a, out double iy, out double iz, out double l);
        double ly = l / Math.Sqrt(iy / a), lz = l / Math.Sqrt(iz / a);
        double fy = Fc(ly), fz = Fc(lz);
        double ny = Math.PI * Math.PI * AluE * iy / (l * l), nz = Math.PI * Math.PI * AluE * iz / (l * l);
        nRd = 0.90 * Math.Min(fy, fz) * a;
        u = 40e3 / nRd;
        return u + nRd + ly + ly / Cc + ny + fy / AluF0 + 0.90 * fy * a + lz + lz / Cc + nz + fz / AluF0 + 0.90 * fz * a;

        static double Fc(double lam) => lam >= Cc ? Math.PI * Math.PI * AluE / (lam * lam) : Math.Min(AluF0, Bc - Dc * lam);
    }

    // Engesser tangent modulus with Ramberg–Osgood ε = σ/E + 0.002 (σ/f0)^n, n = f0/10 MPa: σcr = x σE with x the root of
    // x − Et(x σE)/E on (1e-12, 1) by Brent (the method's tolerances); capacity min(σcr, f0) A.
    private double Residual(double x)
    {
        const double n = 25;
        double sigma = x * _se;
        return x - 1 / (1 / AluE + 0.002 * n / AluF0 * Math.Pow(sigma / AluF0, n - 1)) / AluE;
    }

    private static readonly double TangentRoot = Math.Sqrt(AluF0 / (Math.PI * Math.PI * AluE));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private double TangentRaw(int i, out double u, out double nRd)
    {
        Tube(i, out double a, out double iy, out double iz, out double l);
        double ly = l / Math.Sqrt(iy / a), lz = l / Math.Sqrt(iz / a);
        double sy = Critical(ly), sz = Critical(lz);
        double ny = Math.PI * Math.PI * AluE * iy / (l * l), nz = Math.PI * Math.PI * AluE * iz / (l * l);
        nRd = Math.Min(Math.Min(sy, sz), AluF0) * a;
        u = 40e3 / nRd;
        return u + nRd + ly + TangentRoot * ly + ny + sy / AluF0 + Math.Min(sy, AluF0) * a + lz + TangentRoot * lz + nz + sz / AluF0 + Math.Min(sz, AluF0) * a;
    }

    private double Critical(double lam)
    {
        _se = Math.PI * Math.PI * AluE / (lam * lam);
        return _residual(1.0) <= 0 ? _se : _se * Brent.FindRoot(_residual, 1e-12, 1.0, 1e-13, 300);
    }

    // ---- the benchmarks ---------------------------------------------------------------------------------------------

    [Benchmark] public double EulerTyped() => Typed(_steel, _steelLoad, ResistanceMethods.Euler);
    [Benchmark(Baseline = true)] public double EulerRawLoop() { double s = 0; for (int i = 0; i < N; i++) s += EulerRaw(i, out _, out _); return s; }
    [Benchmark] public double JohnsonTyped() => Typed(_steel, _steelLoad, ResistanceMethods.Johnson);
    [Benchmark] public double JohnsonRawLoop() { double s = 0; for (int i = 0; i < N; i++) s += JohnsonRaw(i, out _, out _); return s; }
    [Benchmark] public double SecantTyped() => Typed(_steel, _steelEccentric, ResistanceMethods.Secant);
    [Benchmark] public double SecantRawLoop() { double s = 0; for (int i = 0; i < N; i++) s += SecantRaw(i, out _, out _); return s; }
    [Benchmark] public double PerryTyped() => Typed(_steel, _steelLoad, ResistanceMethods.PerryRobertsonDefault);
    [Benchmark] public double PerryRawLoop() { double s = 0; for (int i = 0; i < N; i++) s += PerryRaw(i, out _, out _); return s; }
    [Benchmark] public double Ec5Typed() => Typed(_c24, _timberLoad, _ec5);
    [Benchmark] public double Ec5RawLoop() { double s = 0; for (int i = 0; i < N; i++) s += Ec5Raw(i, out _, out _); return s; }
    [Benchmark] public double Ec5BendingTyped() => Typed(_c24, _timberBending, _ec5);
    [Benchmark] public double Ec5BendingRawLoop() { double s = 0; for (int i = 0; i < N; i++) s += Ec5BendingRaw(i, out _, out _); return s; }
    [Benchmark] public double FireTyped() => Typed(_c24Big, _timberLoad, ResistanceMethods.Ec5FireR30);
    [Benchmark] public double FireRawLoop() { double s = 0; for (int i = 0; i < N; i++) s += FireRaw(i, out _, out _); return s; }
    [Benchmark] public double NdsTyped() => Typed(_dfl, _ndsLoad, _nds);
    [Benchmark] public double NdsRawLoop() { double s = 0; for (int i = 0; i < N; i++) s += NdsRaw(i, out _, out _); return s; }
    [Benchmark] public double Ec9Typed() => Typed(_tube, _aluLoad, ResistanceMethods.Eurocode9);
    [Benchmark] public double Ec9RawLoop() { double s = 0; for (int i = 0; i < N; i++) s += Ec9Raw(i, out _, out _); return s; }
    [Benchmark] public double ConstantsTyped() => Typed(_tube, _aluLoad, ResistanceMethods.AluminiumBucklingConstantsLrfd);
    [Benchmark] public double ConstantsRawLoop() { double s = 0; for (int i = 0; i < N; i++) s += ConstantsRaw(i, out _, out _); return s; }
    [Benchmark] public double TangentTyped() => Typed(_tube, _aluLoad, ResistanceMethods.TangentModulusRambergOsgood);
    // Four methods through the one call site (an application that checks every member with several methods): the
    // runtime's profile then sees four types there, and its inlining of the method's calls into the loop is limited. Compare
    // with Ec5Typed + FireTyped + NdsTyped + Ec9Typed, each of which sees only its own method.
    [Benchmark] public double MixedFourMethodsTyped() =>
        Typed(_c24, _timberLoad, _ec5) + Typed(_c24Big, _timberLoad, ResistanceMethods.Ec5FireR30) + Typed(_dfl, _ndsLoad, _nds) + Typed(_tube, _aluLoad, ResistanceMethods.Eurocode9);
    [Benchmark] public double TangentRawLoop() { double s = 0; for (int i = 0; i < N; i++) s += TangentRaw(i, out _, out _); return s; }
}
