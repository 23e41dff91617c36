using System;
using CompressionMembers.Internal;
using CompressionMembers.Materials;
using CompressionMembers.Methods.Common;
using CompressionMembers.Resolution;
using CompressionMembers.Results;
using MathNet.Numerics.RootFinding;
using UnitsNet;

namespace CompressionMembers.Methods.Aluminium;

/// <summary>
/// The ideal inelastic column by the tangent-modulus (Engesser) theory with a Ramberg–Osgood stress–strain law:
/// ε = σ / E + 0.002 (σ / f0)^n, Et = dσ/dε = 1 / [1/E + 0.002 n / f0 (σ / f0)^(n−1)], and σcr solves σ = π² Et(σ) / λ².
/// A physics check beside the design methods: nominal, no partial factor, no imperfection.
/// </summary>
/// <remarks>
/// <para>The exponent n follows from two proof stresses as EN 1999-1-1 Annex E describes: n = ln(εp,1 / εp,2) / ln(f1 / f2),
/// with f0 at 0.2 % (<see cref="FromProofStresses"/>); or is given (<see cref="WithExponent"/>); or, by default, n = f0 / 10
/// with f0 in MPa (Steinhardt's approximation as Annex E quotes it; from memory).</para>
/// <para>σcr is found by Brent's method (MathNet) on (0, π² E / λ²]. The Ramberg–Osgood law has no ceiling, so at low
/// slenderness σcr exceeds f0; the capacity is limited to f0 A (the governing mode is then yielding) and the trace
/// shows the uncapped σcr. Concentric compression only. Thread safety: immutable.</para>
/// </remarks>
[Immutable]
public sealed class TangentModulusColumn : IResistanceMethod
{
    private const string Ref = "Engesser tangent-modulus theory; Ramberg–Osgood law per EN 1999-1-1 Annex E";
    private const string CheckTangent = "tangent-modulus (Engesser) critical stress";
    private const string CheckProof = "proof-stress limit f0 A";

    private TangentModulusColumn(double exponent, string basis)
    {
        Exponent = exponent;
        ExponentBasis = basis;
        // Reports show n as "—" when each member's material gives it; the fingerprint keeps 0.1.0's line (0 for that case),
        // so that a report made with 0.1.0 keeps its fingerprint.
        bool perMaterial = double.IsNaN(exponent);
        var released = new MethodSetting("n", "Ramberg–Osgood exponent", perMaterial ? 0 : exponent, StepUnit.None, perMaterial, basis);
        Identity = new MethodIdentity("Tangent-modulus column (Ramberg–Osgood)", "Engesser tangent-modulus theory; EN 1999-1-1 Annex E material law", "", "",
            [released], new MethodSetting("n", perMaterial ? "Ramberg–Osgood exponent, from each member's material" : "Ramberg–Osgood exponent",
                exponent, StepUnit.None, perMaterial, basis));
    }

    /// <summary>n = f0 / 10 (f0 in MPa) for each material (Steinhardt's approximation, from memory).</summary>
    public static TangentModulusColumn Default { get; } = new(double.NaN, "n = f0 / 10 with f0 in MPa (Steinhardt; EN 1999-1-1 Annex E, from memory)");

    /// <summary>A given Ramberg–Osgood exponent.</summary>
    /// <param name="exponent">n, from 1 to 200.</param>
    /// <returns>The method.</returns>
    /// <exception cref="ArgumentOutOfRangeException">n is not finite or outside [1, 200].</exception>
    public static TangentModulusColumn WithExponent(double exponent)
    {
        Guard.InRange(exponent, 1, 200, nameof(exponent), "", "Ramberg–Osgood exponent n");
        return new(exponent, "given");
    }

    /// <summary>The exponent from two proof stresses: f0 at 0.2 % plastic strain and f_p at plastic strain εp:
    /// n = ln(0.002 / εp) / ln(f0 / f_p) (EN 1999-1-1 Annex E).</summary>
    /// <param name="proofStrength">f0, the 0.2 % proof stress.</param>
    /// <param name="otherProofStress">A second proof stress f_p (for example f0.1).</param>
    /// <param name="otherPlasticStrain">The plastic strain of f_p (0.001 for f0.1), in (0, 0.2], not 0.002.</param>
    /// <returns>The method.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or out of range.</exception>
    /// <exception cref="ArgumentException">The two points do not give a positive exponent of at least 1.</exception>
    public static TangentModulusColumn FromProofStresses(Pressure proofStrength, Pressure otherProofStress, double otherPlasticStrain)
    {
        double f0 = Si.Pascals(proofStrength, nameof(proofStrength), "Proof strength f0");
        double fp = Si.Pascals(otherProofStress, nameof(otherProofStress), "Second proof stress");
        Guard.InRange(otherPlasticStrain, 1e-6, 0.2, nameof(otherPlasticStrain), "", "Plastic strain of the second proof stress");
        double n = Exponent2(f0, 0.002, fp, otherPlasticStrain);
        if (!double.IsFinite(n) || n < 1)
            throw new ArgumentException(
                $"The proof stresses {Si.Given(proofStrength)} at 0.2 % and {Si.Given(otherProofStress)} at {Guard.Show(otherPlasticStrain * 100)} % give n = {Guard.Show(n)}; they must rise with strain and give n ≥ 1.",
                nameof(otherProofStress));
        return new(n, $"n = ln(0.002 / {Guard.Show(otherPlasticStrain)}) / ln(f0 / fp) from f0 = {Guard.Show(f0 / 1e6)} MPa, fp = {Guard.Show(fp / 1e6)} MPa (EN 1999-1-1 Annex E)");
    }

    /// <summary>n = ln(ε1 / ε2) / ln(f1 / f2).</summary>
    internal static double Exponent2(double f1, double e1, double f2, double e2) => Math.Log(e1 / e2) / Math.Log(f1 / f2);

    /// <summary>The exponent (NaN when it follows from each material's f0).</summary>
    public double Exponent { get; }
    /// <summary>Where the exponent comes from.</summary>
    public string ExponentBasis { get; }

    /// <inheritdoc/>
    public MethodIdentity Identity { get; }
    /// <summary>The method in words: <see cref="MethodIdentity.ToString"/> of its <see cref="Identity"/>.</summary>
    /// <returns>The name, standard, edition and clause in one line.</returns>
    public override string ToString() => Identity.ToString();

    /// <inheritdoc/>
    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions)
    {
        if (member.MaterialKind == MaterialKind.Timber)
            return Applicability.NotApplicable("the Ramberg–Osgood tangent-modulus column is for metals; timber is not described by this law.");
        if (actions.HasEccentricity || actions.HasEndMoments || actions.HasInitialBowY || actions.HasInitialBowZ)
            return Applicability.NotApplicable("the tangent-modulus column is the ideal straight column under concentric load; remove eccentricities, end moments and bows.");
        if (double.IsNaN(Exponent) && member.StrengthPa / 1e7 < 1)
            return Applicability.NotApplicable("n = f0 / 10 would be below 1 for this material; give the exponent with WithExponent.");
        return Applicability.Applicable;
    }

    /// <summary>Tangent modulus of the Ramberg–Osgood law.</summary>
    internal static double TangentModulus(double sigma, double e, double f0, double n) =>
        1 / (1 / e + 0.002 * n / f0 * Math.Pow(sigma / f0, n - 1));

    /// <summary>Critical stress of the ideal inelastic column of slenderness λ.</summary>
    internal static double CriticalStress(double lambda, double e, double f0, double n)
    {
        double se = Math.PI * Math.PI * e / (lambda * lambda);
        var s = t_state ??= new State();
        s.Set(se, e, f0, n);
        var f = t_function ??= s.Residual;
        if (f(1.0) <= 0) return se; // Et = E to double precision: the Euler stress itself
        return se * Brent.FindRoot(f, 1e-12, 1.0, 1e-13, 300);
    }

    /// <inheritdoc/>
    public CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace)
    {
        double e = member.ElasticModulusPa, f0 = member.StrengthPa, a = member.AreaM2;
        double n = double.IsNaN(Exponent) ? f0 / 1e7 : Exponent;
        var y = new AxisData(member, BucklingAxis.Y);
        var z = new AxisData(member, BucklingAxis.Z);
        double sy = CriticalStress(y.Slenderness, e, f0, n), sz = CriticalStress(z.Slenderness, e, f0, n);
        bool govY = sy <= sz;
        double s = govY ? sy : sz;
        bool capped = s > f0;
        double capacity = Math.Min(s, f0) * a;
        double u = actions.AxialForceN / capacity;
        if (trace is not null)
        {
            trace.Add("E", "elastic modulus", TraceCommon.Input, e, StepUnit.Stress, member.Material.Source);
            trace.Add("f0", "0.2 % proof strength", TraceCommon.Input, f0, StepUnit.Stress, member.Material.Source);
            trace.Add("n", "Ramberg–Osgood exponent", double.IsNaN(Exponent) ? "f0 / 10 (f0 in MPa)" : ExponentBasis, n, StepUnit.None, "EN 1999-1-1 Annex E");
            trace.Note("ε = σ / E + 0.002 (σ / f0)^n; Et = 1 / [1/E + 0.002 n / f0 (σ / f0)^(n−1)].", Ref);
            TraceCommon.SectionAndLengths(trace, member);
            Axis(trace, y, sy, e, f0, n, a);
            Axis(trace, z, sz, e, f0, n, a);
            if (capped) trace.Note("σcr exceeds f0: the capacity is limited to f0 A.", Ref);
            trace.Add("N", "nominal capacity of the ideal inelastic column", "min(σcr,y, σcr,z, f0) A", capacity, StepUnit.Force, Ref);
            trace.Add("NEd", "axial compression", TraceCommon.Input, actions.AxialForceN, StepUnit.Force, "actions");
            trace.Add("u", "utilisation", "NEd / N", u, StepUnit.None, "common practice");
        }
        return new CheckResult(member, actions, this, capacity, u, govY ? BucklingAxis.Y : BucklingAxis.Z,
            capped ? FailureMode.Yielding : FailureMode.FlexuralBuckling, capped ? CheckProof : CheckTangent,
            new AxisOutcome(y.EffectiveLengthM, y.Slenderness, Math.Sqrt(f0 / (Math.PI * Math.PI * e)) * y.Slenderness, y.CriticalForceN, sy / f0, Math.Min(sy, f0) * a),
            new AxisOutcome(z.EffectiveLengthM, z.Slenderness, Math.Sqrt(f0 / (Math.PI * Math.PI * e)) * z.Slenderness, z.CriticalForceN, sz / f0, Math.Min(sz, f0) * a),
            default, trace);
    }

    private static void Axis(CalculationTrace t, in AxisData ax, double sigma, double e, double f0, double n, double a)
    {
        TraceCommon.Slenderness(t, ax, Ref);
        string s = ax.Sub;
        t.Add("σcr," + s, "tangent-modulus critical stress about " + s, $"root of σ = π² Et(σ) / λ{s}² (Brent)", sigma, StepUnit.Stress, Ref);
        t.Add("Et," + s, "tangent modulus at σcr," + s, "1 / [1/E + 0.002 n / f0 (σ / f0)^(n−1)]", TangentModulus(sigma, e, f0, n), StepUnit.Stress, Ref);
        t.Add("N" + s, "nominal capacity about " + s, $"min(σcr,{s}, f0) A", Math.Min(sigma, f0) * a, StepUnit.Force, Ref);
    }

    [ThreadStatic] private static State? t_state;
    [ThreadStatic] private static Func<double, double>? t_function;

    private sealed class State
    {
        private double _se, _e, _f0, _n;

        internal void Set(double se, double e, double f0, double n) { _se = se; _e = e; _f0 = f0; _n = n; }

        // x = σ / σE: x − Et(x σE) / E, negative near 0 and positive at 1 (Et < E).
        internal double Residual(double x) => x - TangentModulus(x * _se, _e, _f0, _n) / _e;
    }
}
