using System;
using CompressionMembers.Resolution;
using CompressionMembers.Results;

namespace CompressionMembers.Methods.Common;

/// <summary>The per-axis values every flexural method starts from, in SI doubles.</summary>
internal readonly struct AxisData
{
    internal AxisData(in ResolvedMember m, BucklingAxis axis)
    {
        Axis = axis;
        bool y = axis == BucklingAxis.Y;
        SecondMomentM4 = y ? m.SecondMomentYM4 : m.SecondMomentZM4;
        EffectiveLengthM = y ? m.EffectiveLengthYM : m.EffectiveLengthZM;
        // Resolved once with the member (the same expressions): √(I/A), Lcr/i, π² E I / Lcr².
        RadiusM = y ? m.RadiusYM : m.RadiusZM;
        Slenderness = y ? m.SlendernessY : m.SlendernessZ;
        CriticalForceN = y ? m.CriticalForceYN : m.CriticalForceZN;
        FibrePositiveM = y ? m.FibrePositiveZM : m.FibrePositiveYM;
        FibreNegativeM = y ? m.FibreNegativeZM : m.FibreNegativeYM;
    }

    internal BucklingAxis Axis { get; }
    internal double SecondMomentM4 { get; }
    internal double EffectiveLengthM { get; }
    internal double RadiusM { get; }
    internal double Slenderness { get; }
    internal double CriticalForceN { get; }
    internal double FibrePositiveM { get; }
    internal double FibreNegativeM { get; }
    internal double FibreMaxM => Math.Max(FibrePositiveM, FibreNegativeM);

    /// <summary><see cref="FibreMaxM"/> straight from the member, for kernels that read its scalars without an AxisData:
    /// a buckle about y moves the section along z, so its extreme fibres are the z ones, and the other way round.</summary>
    internal static double FibreMaxAbout(in ResolvedMember m, BucklingAxis axis) =>
        axis == BucklingAxis.Y ? Math.Max(m.FibrePositiveZM, m.FibreNegativeZM) : Math.Max(m.FibrePositiveYM, m.FibreNegativeYM);

    /// <summary>Relative slenderness λ̄ = λ / λ1 with λ1 = π √(E / f), i.e. √(A f / Ncr).</summary>
    internal double RelativeSlenderness(double ePa, double fPa) => Slenderness / Lambda1(ePa, fPa);

    /// <summary>λ1 = π √(E / f), the slenderness at which the Euler stress equals f (the divisor of
    /// <see cref="RelativeSlenderness"/>; kernels that read the member's scalars divide by it themselves).</summary>
    internal static double Lambda1(double ePa, double fPa) => Math.PI * Math.Sqrt(ePa / fPa);
    internal string Sub => Axis == BucklingAxis.Y ? "y" : "z";
}
