using System.Runtime.CompilerServices;
using UnitsNet;

namespace CompressionMembers.Results;

/// <summary>What a method found about one axis (or one mode): effective length, slenderness, critical force,
/// reduction factor and resistance.</summary>
/// <remarks>Values that a method does not use are NaN. The default value has <see cref="IsEvaluated"/> false:
/// the axis was not checked. Thread safety: immutable value type.</remarks>
public readonly struct AxisOutcome
{
    /// <summary>Creates an outcome from SI doubles.</summary>
    /// <param name="effectiveLengthM">Effective length, m.</param>
    /// <param name="slenderness">Geometric slenderness Lcr / i.</param>
    /// <param name="relativeSlenderness">Relative (non-dimensional) slenderness, or NaN.</param>
    /// <param name="criticalForceN">Elastic critical force, N.</param>
    /// <param name="reductionFactor">Reduction factor (χ, kc, Cp…), or NaN.</param>
    /// <param name="resistanceN">Resistance for this axis or mode, N.</param>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public AxisOutcome(double effectiveLengthM, double slenderness, double relativeSlenderness, double criticalForceN,
        double reductionFactor, double resistanceN)
    {
        EffectiveLengthM = effectiveLengthM;
        Slenderness = slenderness;
        RelativeSlenderness = relativeSlenderness;
        CriticalForceN = criticalForceN;
        ReductionFactor = reductionFactor;
        ResistanceN = resistanceN;
        IsEvaluated = true;
    }

    /// <summary>Whether the axis was checked.</summary>
    public bool IsEvaluated { get; }
    /// <summary>Effective length in m.</summary>
    public double EffectiveLengthM { get; }
    /// <summary>Geometric slenderness Lcr / i.</summary>
    public double Slenderness { get; }
    /// <summary>Relative slenderness (λ̄, λrel), or NaN.</summary>
    public double RelativeSlenderness { get; }
    /// <summary>Elastic critical force in N.</summary>
    public double CriticalForceN { get; }
    /// <summary>Reduction factor, or NaN.</summary>
    public double ReductionFactor { get; }
    /// <summary>Resistance for this axis in N.</summary>
    public double ResistanceN { get; }

    /// <summary>Effective length.</summary>
    public Length EffectiveLength => Length.FromMeters(EffectiveLengthM);
    /// <summary>Elastic critical force.</summary>
    public Force CriticalForce => Force.FromNewtons(CriticalForceN);
    /// <summary>Resistance for this axis.</summary>
    public Force Resistance => Force.FromNewtons(ResistanceN);

    /// <summary>The outcome in one line, the same in every culture (six significant figures; NaN where a method does not
    /// use a value).</summary>
    /// <returns>Such as <c>Lcr = 3600 mm, λ = 89.08, λ̄ = 1.464, Ncr = 493.7 kN, reduction 0.4261, resistance 277.5 kN</c>
    /// (to six figures), or <c>not evaluated</c>.</returns>
    public override string ToString() => !IsEvaluated ? "not evaluated" :
        $"Lcr = {Internal.Guard.Show(EffectiveLengthM * 1e3)} mm, λ = {Internal.Guard.Show(Slenderness)}, λ̄ = {Internal.Guard.Show(RelativeSlenderness)}, " +
        $"Ncr = {Internal.Guard.Show(CriticalForceN / 1e3)} kN, reduction {Internal.Guard.Show(ReductionFactor)}, resistance {Internal.Guard.Show(ResistanceN / 1e3)} kN";
}
