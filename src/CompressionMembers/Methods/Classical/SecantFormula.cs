using System;
using CompressionMembers.Internal;
using CompressionMembers.Methods.Common;
using CompressionMembers.Resolution;
using CompressionMembers.Results;
using UnitsNet;

namespace CompressionMembers.Methods.Classical;

/// <summary>
/// The secant formula for an eccentrically loaded elastic column: the maximum compressive stress
/// σmax = P/A [1 + (e c / i²) sec((Lcr / 2i) √(P / E A))], summed over both axes for biaxial eccentricity, and the
/// nominal capacity as the load at which σmax reaches the compressive strength f.
/// </summary>
/// <remarks>
/// <para>Source: Beer &amp; Johnston, Mechanics of Materials, section on eccentric loading of columns (the secant
/// formula); Timoshenko &amp; Gere §1.4. Valid while the material stays elastic; end moments are accepted only when
/// equal at both ends (single curvature), where they are the same as an eccentricity M / N.</para>
/// <para>A concentric axis (no eccentricity) is checked by its Euler load. The capacity is nominal (no partial factor).
/// Thread safety: immutable.</para>
/// </remarks>
[Immutable]
public sealed class SecantFormula : IResistanceMethod
{
    private const string Ref = "secant formula (Beer & Johnston, eccentric loading)";

    /// <inheritdoc/>
    public MethodIdentity Identity { get; } = new("Secant formula for eccentric compression", "Secant formula (Beer & Johnston, Mechanics of Materials)", "", "eccentric loading of columns");
    /// <summary>The method in words: <see cref="MethodIdentity.ToString"/> of its <see cref="Identity"/>.</summary>
    /// <returns>The name, standard, edition and clause in one line.</returns>
    public override string ToString() => Identity.ToString();

    /// <inheritdoc/>
    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions)
    {
        if (actions.EndMomentYTopNm != actions.EndMomentYBottomNm || actions.EndMomentZTopNm != actions.EndMomentZBottomNm)
            return Applicability.NotApplicable("the secant formula covers equal end moments (single curvature) only; unequal end moments need an interaction method or a second-order analysis.");
        return Applicability.Applicable;
    }

    /// <summary>Maximum compressive stress in an eccentrically loaded elastic column (one axis).</summary>
    /// <param name="load">Axial load P, greater than 0.</param>
    /// <param name="area">Area A.</param>
    /// <param name="eccentricity">Eccentricity e (its magnitude is used).</param>
    /// <param name="extremeFibre">Distance c from the neutral axis to the extreme fibre on the side of the eccentricity.</param>
    /// <param name="radiusOfGyration">Radius of gyration i about the bending axis.</param>
    /// <param name="effectiveLength">Effective length Lcr.</param>
    /// <param name="elasticModulus">Elastic modulus E.</param>
    /// <returns>σmax.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or not positive (e may be zero), or P is at
    /// or above the Euler load π² E A / (Lcr / i)², where the secant diverges; the message gives P / Pcr.</exception>
    public static Pressure MaximumStress(Force load, Area area, Length eccentricity, Length extremeFibre, Length radiusOfGyration,
        Length effectiveLength, Pressure elasticModulus)
    {
        double p = Si.Newtons(load, nameof(load), "Load");
        double a = Si.SquareMeters(area, nameof(area), "Area");
        double e = Si.Meters(eccentricity, nameof(eccentricity), "Eccentricity", Si.Sign.Any);
        double c = Si.Meters(extremeFibre, nameof(extremeFibre), "Extreme-fibre distance");
        double i = Si.Meters(radiusOfGyration, nameof(radiusOfGyration), "Radius of gyration");
        double l = Si.Meters(effectiveLength, nameof(effectiveLength), "Effective length");
        double ePa = Si.Pascals(elasticModulus, nameof(elasticModulus), "Elastic modulus");
        double pcr = Math.PI * Math.PI * ePa * a * i * i / (l * l);
        if (p >= pcr)
            throw new ArgumentOutOfRangeException(nameof(load), load.Value,
                $"The load is at or above the Euler load (P/Pcr = {Guard.Show(p / pcr)}); the secant formula has no finite stress there.");
        return Pressure.FromMegapascals(SecantKernel.MaxStress(p, a, ePa, e, c, i, l, 0, 0, 1, 1) / 1e6);
    }

    /// <summary>The load at which the maximum stress of the secant formula reaches a limit (one axis).</summary>
    /// <param name="stressLimit">The limiting stress, such as the yield stress.</param>
    /// <param name="area">Area A.</param>
    /// <param name="eccentricity">Eccentricity e.</param>
    /// <param name="extremeFibre">Extreme-fibre distance c.</param>
    /// <param name="radiusOfGyration">Radius of gyration i.</param>
    /// <param name="effectiveLength">Effective length Lcr.</param>
    /// <param name="elasticModulus">Elastic modulus E.</param>
    /// <returns>The load, strictly below the Euler load (equal to min(A·σ, Pcr) when e = 0).</returns>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or not positive (e may be zero).</exception>
    public static Force LoadAtStress(Pressure stressLimit, Area area, Length eccentricity, Length extremeFibre, Length radiusOfGyration,
        Length effectiveLength, Pressure elasticModulus)
    {
        double s = Si.Pascals(stressLimit, nameof(stressLimit), "Stress limit");
        double a = Si.SquareMeters(area, nameof(area), "Area");
        double e = Si.Meters(eccentricity, nameof(eccentricity), "Eccentricity", Si.Sign.Any);
        double c = Si.Meters(extremeFibre, nameof(extremeFibre), "Extreme-fibre distance");
        double i = Si.Meters(radiusOfGyration, nameof(radiusOfGyration), "Radius of gyration");
        double l = Si.Meters(effectiveLength, nameof(effectiveLength), "Effective length");
        double ePa = Si.Pascals(elasticModulus, nameof(elasticModulus), "Elastic modulus");
        double pcr = Math.PI * Math.PI * ePa * a * i * i / (l * l);
        double p = SecantKernel.LoadAtStress(s, pcr, a, ePa, e, c, i, l, 0, 0, 1, 1, out _);
        return Force.FromKilonewtons(p / 1e3);
    }

    /// <inheritdoc/>
    public CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace)
    {
        var y = new AxisData(member, BucklingAxis.Y);
        var z = new AxisData(member, BucklingAxis.Z);
        double a = member.AreaM2, e = member.ElasticModulusPa, f = member.StrengthPa, n = actions.AxialForceN;
        // Equal end moments are an eccentricity M / N (single curvature); add them to the load eccentricity.
        double ey = actions.EccentricityYM + actions.EndMomentYTopNm / n;
        double ez = actions.EccentricityZM + actions.EndMomentZTopNm / n;
        double cy = ey >= 0 ? y.FibrePositiveM : y.FibreNegativeM;
        double cz = ez >= 0 ? z.FibrePositiveM : z.FibreNegativeM;

        double upper = double.PositiveInfinity;
        if (ey != 0) upper = Math.Min(upper, y.CriticalForceN);
        if (ez != 0) upper = Math.Min(upper, z.CriticalForceN);
        double pSecant = SecantKernel.LoadAtStress(f, upper, a, e, ey, cy, y.RadiusM, y.EffectiveLengthM, ez, cz, z.RadiusM, z.EffectiveLengthM, out _);
        // An axis without eccentricity can still buckle: it is limited by its Euler load.
        double pConcY = ey == 0 ? y.CriticalForceN : double.PositiveInfinity;
        double pConcZ = ez == 0 ? z.CriticalForceN : double.PositiveInfinity;
        double capacity = Math.Min(pSecant, Math.Min(pConcY, pConcZ));
        double u = n / capacity;

        BucklingAxis axis;
        FailureMode mode;
        string check;
        if (capacity == pSecant && (ey != 0 || ez != 0))
        {
            axis = ey != 0 && ez != 0 ? BucklingAxis.Both : ey != 0 ? BucklingAxis.Y : BucklingAxis.Z;
            mode = FailureMode.ExtremeFibreStress;
            check = "secant formula: σmax = f";
        }
        else if (ey == 0 && ez == 0 && pSecant < Math.Min(pConcY, pConcZ))
        {
            axis = BucklingAxis.None; mode = FailureMode.Yielding; check = "no eccentricity: squash load A·f";
        }
        else
        {
            axis = pConcY <= pConcZ ? BucklingAxis.Y : BucklingAxis.Z;
            mode = FailureMode.FlexuralBuckling;
            check = "Euler load of the axis without eccentricity";
        }

        if (trace is not null)
        {
            trace.Add("E", "elastic modulus", TraceCommon.Input, e, StepUnit.Stress, member.Material.Source);
            trace.Add("f", "stress limit (compressive strength)", TraceCommon.Input, f, StepUnit.Stress, member.Material.Source);
            TraceCommon.SectionAndLengths(trace, member);
            TraceCommon.Slenderness(trace, y, Ref);
            TraceCommon.Slenderness(trace, z, Ref);
            trace.Add("NEd", "design axial compression", TraceCommon.Input, n, StepUnit.Force, "actions");
            trace.Add("ey", "eccentricity bending about y", actions.EndMomentYTopNm != 0 ? "e (load) + My / NEd" : TraceCommon.Input, ey, StepUnit.Length, "actions");
            trace.Add("ez", "eccentricity bending about z", actions.EndMomentZTopNm != 0 ? "e (load) + Mz / NEd" : TraceCommon.Input, ez, StepUnit.Length, "actions");
            if (ey != 0)
            {
                trace.Add("cy", "extreme fibre on the side of ey", "section", cy, StepUnit.Length, "section");
                trace.Add("ey cy / iy²", "eccentricity ratio about y", "ey cy / iy²", Math.Abs(ey) * cy / (y.RadiusM * y.RadiusM), StepUnit.None, Ref);
            }
            if (ez != 0)
            {
                trace.Add("cz", "extreme fibre on the side of ez", "section", cz, StepUnit.Length, "section");
                trace.Add("ez cz / iz²", "eccentricity ratio about z", "ez cz / iz²", Math.Abs(ez) * cz / (z.RadiusM * z.RadiusM), StepUnit.None, Ref);
            }
            if (n < upper)
            {
                double smax = SecantKernel.MaxStress(n, a, e, ey, cy, y.RadiusM, y.EffectiveLengthM, ez, cz, z.RadiusM, z.EffectiveLengthM);
                trace.Add("σmax", "maximum compressive stress at NEd", "NEd/A [1 + Σ (e c / i²) sec((Lcr / 2i) √(NEd / E A))]", smax, StepUnit.Stress, Ref);
            }
            else
            {
                trace.Note("NEd is at or above the Euler load of an eccentric axis: the secant stress is unbounded and the member fails.", Ref);
            }
            trace.Add("Ps", "load at which σmax reaches f", "root of σmax(P) = f on (0, Ncr) (Brent)", pSecant, StepUnit.Force, Ref);
            trace.Add("N", "nominal capacity", "min(Ps, Ncr of an axis without eccentricity)", capacity, StepUnit.Force, Ref);
            trace.Add("u", "utilisation", "NEd / N", u, StepUnit.None, "common practice");
        }
        return new CheckResult(member, actions, this, capacity, u, axis, mode, check,
            new AxisOutcome(y.EffectiveLengthM, y.Slenderness, y.RelativeSlenderness(e, f), y.CriticalForceN, double.NaN, ey != 0 ? pSecant : y.CriticalForceN),
            new AxisOutcome(z.EffectiveLengthM, z.Slenderness, z.RelativeSlenderness(e, f), z.CriticalForceN, double.NaN, ez != 0 ? pSecant : z.CriticalForceN),
            default, trace);
    }
}
