using System;
using CompressionMembers.Internal;
using CompressionMembers.Methods.Common;
using CompressionMembers.Resolution;
using CompressionMembers.Results;

namespace CompressionMembers.Methods.Classical;

/// <summary>
/// Euler elastic buckling of an ideal, straight, concentrically loaded column: Ncr = π² E I / Lcr² about each
/// principal axis, with the squash load A·f as a cut-off so that a stocky member is never credited with more than
/// its cross-section can carry. The capacity is nominal (no partial factor).
/// </summary>
/// <remarks>
/// Source: L. Euler (1744); Timoshenko &amp; Gere, Theory of Elastic Stability, 2nd ed., §2.1–2.2. Valid for elastic
/// buckling, i.e. where the critical stress π²E/λ² is below the proportional limit; use <see cref="JohnsonParabola"/>
/// or <see cref="PerryRobertson"/> for intermediate columns. Applies to concentric compression only.
/// Thread safety: immutable; safe from many threads.
/// </remarks>
[Immutable]
public sealed class EulerBuckling : IResistanceMethod
{
    private const string Ref = "Euler; Timoshenko & Gere §2.2";

    /// <inheritdoc/>
    public MethodIdentity Identity { get; } = new("Euler elastic buckling with squash-load cut-off", "Euler critical load (Timoshenko & Gere)", "2nd ed.", "§2.1–2.2");

    /// <inheritdoc/>
    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions) => ClassicalRules.Concentric(actions, "Euler");

    /// <inheritdoc/>
    public CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace)
    {
        var y = new AxisData(member, BucklingAxis.Y);
        var z = new AxisData(member, BucklingAxis.Z);
        double squash = member.AreaM2 * member.StrengthPa;
        if (trace is not null)
        {
            trace.Add("E", "elastic modulus", TraceCommon.Input, member.ElasticModulusPa, StepUnit.Stress, member.Material.Source);
            trace.Add("f", "compressive strength (yield)", TraceCommon.Input, member.StrengthPa, StepUnit.Stress, member.Material.Source);
            TraceCommon.SectionAndLengths(trace, member);
            TraceCommon.Slenderness(trace, y, Ref);
            TraceCommon.Slenderness(trace, z, Ref);
            trace.Add("Npl", "squash load", "A f", squash, StepUnit.Force, "common practice");
        }
        var gov = y.CriticalForceN <= z.CriticalForceN ? y : z;
        double capacity = Math.Min(gov.CriticalForceN, squash);
        bool yields = squash < gov.CriticalForceN;
        double u = actions.AxialForceN / capacity;
        if (trace is not null)
        {
            trace.Add("N", "nominal capacity", "min(Ncr,y, Ncr,z, Npl)", capacity, StepUnit.Force, Ref);
            if (yields) trace.Note("The squash load is below the Euler load: the member yields before it buckles elastically; Euler alone would overestimate it.", "common practice");
            ClassicalRules.Verdict(trace, actions.AxialForceN, capacity, u);
        }
        return new CheckResult(member, actions, this, capacity, u,
            yields ? BucklingAxis.None : gov.Axis, yields ? FailureMode.Yielding : FailureMode.FlexuralBuckling,
            yields ? "squash load A·f (below the Euler load)" : "Euler critical load",
            new AxisOutcome(y.EffectiveLengthM, y.Slenderness, y.RelativeSlenderness(member.ElasticModulusPa, member.StrengthPa), y.CriticalForceN, double.NaN, Math.Min(y.CriticalForceN, squash)),
            new AxisOutcome(z.EffectiveLengthM, z.Slenderness, z.RelativeSlenderness(member.ElasticModulusPa, member.StrengthPa), z.CriticalForceN, double.NaN, Math.Min(z.CriticalForceN, squash)),
            default, trace);
    }
}
