using System;
using CompressionMembers.Internal;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Methods.Common;
using CompressionMembers.Resolution;
using CompressionMembers.Results;

namespace CompressionMembers.Methods.Numerical;

/// <summary>
/// The elastic critical load of a member about each axis by finite elements, from the member's real end conditions
/// (ideal ends, or end springs made by <c>EffectiveLength.FromEndSprings</c>) and its braces, with the squash load A·f
/// as a cut-off, exactly as <see cref="EulerBuckling"/> does with the closed form: the two agree wherever the closed form holds.
/// The capacity is nominal (no partial factor).
/// </summary>
/// <remarks>
/// <para>It does not use K: it models the supports themselves, so a restraint with a "recommended" K (such as 0.65 for
/// fixed–fixed) is analysed with the ideal supports and gives the theoretical load, and a bare K from the user or an
/// alignment chart is refused. Concentric compression only.</para>
/// <para>Unlike the closed-form methods this one allocates (matrices and the eigenvalue decomposition) even without a
/// trace. Sources as <see cref="BucklingAnalysis"/>. Thread safety: immutable.</para>
/// </remarks>
[Immutable]
public sealed class FiniteElementBuckling : IResistanceMethod
{
    private const string Ref = "FE linear buckling (Timoshenko & Gere ch. 2)";

    /// <summary>Creates the method with the automatic mesh.</summary>
    public FiniteElementBuckling()
    {
        Identity = new("Elastic critical load by finite elements, with squash-load cut-off", "Linear buckling analysis (Timoshenko & Gere ch. 2; Przemieniecki 1968)", "", "eigenvalue problem K φ = λ Kg φ");
    }

    /// <summary>Creates the method with a chosen number of elements per member.</summary>
    /// <param name="elementCount">Elements per member, 2 to 2000.</param>
    /// <exception cref="ArgumentOutOfRangeException">The count is outside 2 to 2000.</exception>
    public FiniteElementBuckling(int elementCount)
    {
        if (elementCount < 2 || elementCount > 2000)
            throw new ArgumentOutOfRangeException(nameof(elementCount), elementCount, $"Element count must be between 2 and 2000; got {elementCount}.");
        ElementCount = elementCount;
        Identity = new("Elastic critical load by finite elements, with squash-load cut-off", "Linear buckling analysis (Timoshenko & Gere ch. 2; Przemieniecki 1968)", "", "eigenvalue problem K φ = λ Kg φ",
            new MethodSetting("n", "number of elements per member", elementCount, StepUnit.None, false, "set by the user (automatic mesh: about 48)"));
    }

    /// <summary>Elements per member, or null for the automatic mesh.</summary>
    public int? ElementCount { get; }

    /// <inheritdoc/>
    public MethodIdentity Identity { get; }
    /// <summary>The method in words: <see cref="MethodIdentity.ToString"/> of its <see cref="Identity"/>.</summary>
    /// <returns>The name, standard, edition and clause in one line.</returns>
    public override string ToString() => Identity.ToString();

    /// <inheritdoc/>
    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions)
    {
        if (actions.HasEccentricity || actions.HasEndMoments)
            return Applicability.NotApplicable("the finite-element critical load covers concentric compression only; use SecondOrderAnalysis or the secant method for an eccentric load.");
        if (!BucklingAnalysis.TryModelOf(member, BucklingAxis.Y, out _, out string? why) || !BucklingAnalysis.TryModelOf(member, BucklingAxis.Z, out _, out why))
            return Applicability.NotApplicable(why!);
        return Applicability.Applicable;
    }

    /// <summary>The elastic critical load about one axis, N.</summary>
    internal double CriticalForceN(in ResolvedMember member, BucklingAxis axis, out int elements)
    {
        BucklingAnalysis.TryModelOf(member, axis, out var model, out _);
        if (ElementCount is int n) model = model!.WithElementCount(n);
        var r = BucklingAnalysis.Solve(model!, 1);
        elements = r.ElementCount;
        return r.Lowest.CriticalForceN;
    }

    /// <inheritdoc/>
    public CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace)
    {
        double ncrY = CriticalForceN(member, BucklingAxis.Y, out int elementsY);
        double ncrZ = CriticalForceN(member, BucklingAxis.Z, out int elementsZ);
        double e = member.ElasticModulusPa, a = member.AreaM2;
        double squash = a * member.StrengthPa;
        // The equivalent effective length π √(EI / Ncr): what K·L would give the same load by Euler's formula.
        double lY = Math.PI * Math.Sqrt(e * member.SecondMomentYM4 / ncrY), lZ = Math.PI * Math.Sqrt(e * member.SecondMomentZM4 / ncrZ);
        bool govY = ncrY <= ncrZ;
        double ncr = govY ? ncrY : ncrZ;
        double capacity = Math.Min(ncr, squash);
        bool yields = squash < ncr;
        double u = actions.AxialForceN / capacity;
        if (trace is not null)
        {
            trace.Add("E", "elastic modulus", TraceCommon.Input, e, StepUnit.Stress, member.Material.Source);
            trace.Add("f", "compressive strength (yield)", TraceCommon.Input, member.StrengthPa, StepUnit.Stress, member.Material.Source);
            TraceCommon.SectionAndLengths(trace, member);
            trace.Note("The supports themselves are modelled (ideal ends or end springs, rigid braces); K is not used.", Ref);
            trace.Add("ny", "elements in the model about y", ElementCount is null ? "automatic mesh" : "requested " + ElementCount.Value.ToString(System.Globalization.CultureInfo.InvariantCulture), elementsY, StepUnit.None, Ref);
            trace.Add("nz", "elements in the model about z", ElementCount is null ? "automatic mesh" : "requested " + ElementCount.Value.ToString(System.Globalization.CultureInfo.InvariantCulture), elementsZ, StepUnit.None, Ref);
            trace.Add("Ncr,y", "elastic critical force about y", "lowest λ of K φ = λ Kg φ (about y)", ncrY, StepUnit.Force, Ref);
            trace.Add("Ncr,z", "elastic critical force about z", "lowest λ of K φ = λ Kg φ (about z)", ncrZ, StepUnit.Force, Ref);
            trace.Add("Lcr,y (FE)", "equivalent effective length about y", "π √(E Iy / Ncr,y)", lY, StepUnit.Length, Ref);
            trace.Add("Lcr,z (FE)", "equivalent effective length about z", "π √(E Iz / Ncr,z)", lZ, StepUnit.Length, Ref);
            trace.Add("Npl", "squash load", "A f", squash, StepUnit.Force, "common practice");
            trace.Add("N", "nominal capacity", "min(Ncr,y, Ncr,z, Npl)", capacity, StepUnit.Force, Ref);
            if (yields) trace.Note("The squash load is below the elastic critical load: the member yields before it buckles elastically.", "common practice");
            trace.Add("NEd", "design axial compression", TraceCommon.Input, actions.AxialForceN, StepUnit.Force, "actions");
            trace.Add("u", "utilisation", "NEd / N", u, StepUnit.None, "common practice");
        }
        double iy = member.RadiusYM, iz = member.RadiusZM;
        return new CheckResult(member, actions, this, capacity, u,
            yields ? BucklingAxis.None : govY ? BucklingAxis.Y : BucklingAxis.Z, yields ? FailureMode.Yielding : FailureMode.FlexuralBuckling,
            yields ? "squash load A·f (below the elastic critical load)" : "elastic critical load by finite elements",
            new AxisOutcome(lY, lY / iy, double.NaN, ncrY, double.NaN, Math.Min(ncrY, squash)),
            new AxisOutcome(lZ, lZ / iz, double.NaN, ncrZ, double.NaN, Math.Min(ncrZ, squash)),
            default, trace);
    }
}
