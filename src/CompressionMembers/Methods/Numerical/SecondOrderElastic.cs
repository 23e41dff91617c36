using System;
using CompressionMembers.Internal;
using CompressionMembers.Methods.Common;
using CompressionMembers.Resolution;
using CompressionMembers.Results;
using MathNet.Numerics.RootFinding;

namespace CompressionMembers.Methods.Numerical;

/// <summary>
/// The load at which the extreme fibre of a pinned, eccentric or bowed member first reaches the compressive strength f,
/// by second-order (P-δ) finite-element analysis about both axes: the numerical twin of the secant formula and of the
/// Perry–Robertson first-yield criterion. Unequal end moments are allowed. The capacity is nominal (no partial factor).
/// </summary>
/// <remarks>
/// <para>At a load P the member is analysed about y and z (<see cref="SecondOrderAnalysis"/>); the stress at each level is
/// P/A + |My| c / Iy + |Mz| c / Iz, and its largest value is σmax(P). End moments are load-line offsets M / N_Ed kept
/// proportional to P (as the secant formula does). The capacity is the root of σmax(P) = f below the smallest elastic
/// critical load of a bending axis (Brent, MathNet); an axis without bending is limited by its own critical load, and a
/// member without bending by min(A f, Ncr).</para>
/// <para>Range: as <see cref="SecondOrderAnalysis"/> (pinned ends about both axes, no bracing, elastic first yield; it
/// gives no credit for plastic reserve). It allocates (matrices) even without a trace. Thread safety: immutable.</para>
/// </remarks>
[Immutable]
public sealed class SecondOrderElastic : IResistanceMethod
{
    private const string Ref = "P-δ analysis (Timoshenko & Gere §1.3–1.11)";

    /// <inheritdoc/>
    public MethodIdentity Identity { get; } = new("Second-order elastic analysis to first yield (finite elements)", "Beam-column theory (Timoshenko & Gere, Theory of Elastic Stability)", "2nd ed.", "§1.3–1.4, §1.11");
    /// <summary>The method in words: <see cref="MethodIdentity.ToString"/> of its <see cref="Identity"/>.</summary>
    /// <returns>The name, standard, edition and clause in one line.</returns>
    public override string ToString() => Identity.ToString();

    /// <inheritdoc/>
    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions)
    {
        if (!PDeltaAxis.TryCreate(member, actions, BucklingAxis.Y, out _, out string? why) || !PDeltaAxis.TryCreate(member, actions, BucklingAxis.Z, out _, out why))
            return Applicability.NotApplicable(why!);
        return Applicability.Applicable;
    }

    /// <inheritdoc/>
    public CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace)
    {
        PDeltaAxis.TryCreate(member, actions, BucklingAxis.Y, out var y, out _);
        PDeltaAxis.TryCreate(member, actions, BucklingAxis.Z, out var z, out _);
        double a = member.AreaM2, f = member.StrengthPa, n = actions.AxialForceN;
        double upper = double.PositiveInfinity;
        if (y!.HasBending) upper = Math.Min(upper, y.CriticalForceN);
        if (z!.HasBending) upper = Math.Min(upper, z.CriticalForceN);
        double hi = Math.Min(upper * (1 - 1e-9), a * f);
        var state = new Residual(y, z, a, f);
        double pYield = state.Stress(hi) <= f ? hi : Brent.FindRoot(state.Evaluate, 0, hi, 1e-10 * hi, 200);
        double pConcY = y.HasBending ? double.PositiveInfinity : y.CriticalForceN;
        double pConcZ = z.HasBending ? double.PositiveInfinity : z.CriticalForceN;
        double capacity = Math.Min(pYield, Math.Min(pConcY, pConcZ));
        double u = n / capacity;
        bool bending = y.HasBending || z.HasBending;
        BucklingAxis axis;
        FailureMode mode;
        string check;
        if (capacity == pYield && bending)
        {
            axis = y.HasBending && z.HasBending ? BucklingAxis.Both : y.HasBending ? BucklingAxis.Y : BucklingAxis.Z;
            mode = FailureMode.ExtremeFibreStress; check = "second-order analysis: σmax = f";
        }
        else if (!bending && pYield < Math.Min(pConcY, pConcZ))
        {
            axis = BucklingAxis.None; mode = FailureMode.Yielding; check = "no bending: squash load A·f";
        }
        else
        {
            axis = pConcY <= pConcZ ? BucklingAxis.Y : BucklingAxis.Z; mode = FailureMode.FlexuralBuckling;
            check = "elastic critical load of the axis without bending";
        }
        if (trace is not null)
        {
            trace.Add("E", "elastic modulus", TraceCommon.Input, member.ElasticModulusPa, StepUnit.Stress, member.Material.Source);
            trace.Add("f", "stress limit (compressive strength)", TraceCommon.Input, f, StepUnit.Stress, member.Material.Source);
            TraceCommon.SectionAndLengths(trace, member);
            trace.Note("Pinned ends about both axes; K is not used: the member itself is analysed to second order.", Ref);
            trace.Add("NEd", "design axial compression", TraceCommon.Input, n, StepUnit.Force, "actions");
            AxisSteps(trace, y, "y");
            AxisSteps(trace, z, "z");
            if (n < upper && n <= hi)
                trace.Add("σmax", "largest compressive stress at NEd", "max over x of NEd/A + |My| cz / Iy + |Mz| cy / Iz", state.Stress(n), StepUnit.Stress, Ref);
            else
                trace.Note("NEd is at or above the critical load of a bending axis: the deflection is unbounded and the member fails.", Ref);
            trace.Add("Ps", "load at which σmax reaches f", "root of σmax(P) = f below Ncr of the bending axes (Brent)", pYield, StepUnit.Force, Ref);
            trace.Add("N", "nominal capacity", "min(Ps, Ncr of an axis without bending)", capacity, StepUnit.Force, Ref);
            trace.Add("u", "utilisation", "NEd / N", u, StepUnit.None, "common practice");
        }
        var ay = new AxisData(member, BucklingAxis.Y);
        var az = new AxisData(member, BucklingAxis.Z);
        return new CheckResult(member, actions, this, capacity, u, axis, mode, check,
            new AxisOutcome(ay.EffectiveLengthM, ay.Slenderness, double.NaN, y.CriticalForceN, double.NaN, y.HasBending ? pYield : y.CriticalForceN),
            new AxisOutcome(az.EffectiveLengthM, az.Slenderness, double.NaN, z.CriticalForceN, double.NaN, z.HasBending ? pYield : z.CriticalForceN),
            default, trace);
    }

    private static void AxisSteps(CalculationTrace t, PDeltaAxis m, string s)
    {
        t.Add("Ncr," + s, "elastic critical force about " + s + " (finite elements)", "lowest λ of K φ = λ Kg φ", m.CriticalForceN, StepUnit.Force, Ref);
        if (!m.HasBending) { t.Note($"No eccentricity, end moment or bow about {s}: limited by Ncr,{s}.", Ref); return; }
        t.Add("e" + s + ",bottom", "load-line offset at the bottom, bending about " + s, "e + M_bottom / NEd", m.EccentricityBottomM, StepUnit.Length, "actions");
        t.Add("e" + s + ",top", "load-line offset at the top, bending about " + s, "e + M_top / NEd", m.EccentricityTopM, StepUnit.Length, "actions");
        t.Add("e0," + s, "initial bow (half sine, unfavourable side)", TraceCommon.Input, m.BowM, StepUnit.Length, "actions");
    }

    /// <summary>σmax(P) − f for Brent, summing the bending stresses of both axes at the same level.</summary>
    private sealed class Residual(PDeltaAxis y, PDeltaAxis z, double a, double f)
    {
        private readonly double[] _x = new double[y.SampleCount], _vy = new double[y.SampleCount], _ly = new double[y.SampleCount];
        private readonly double[] _vz = new double[z.SampleCount], _lz = new double[z.SampleCount], _xz = new double[z.SampleCount];

        internal double Evaluate(double p) => Stress(p) - f;

        internal double Stress(double p)
        {
            bool by = y.HasBending, bz = z.HasBending;
            if (by) y.Sample(y.Solve(p), _x, _vy, _ly);
            if (bz) z.Sample(z.Solve(p), _xz, _vz, _lz);
            double max = 0;
            int n = by ? _ly.Length : _lz.Length;
            for (int i = 0; i < n; i++)
            {
                double s = p / a + (by ? y.BendingStress(p, _ly[i]) : 0) + (bz ? z.BendingStress(p, _lz[i]) : 0);
                if (s > max) max = s;
            }
            return by || bz ? max : p / a;
        }
    }
}
