using System;
using System.Threading;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Resolution;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using UnitsNet;

namespace CompressionMembers.Tests.Workflows;

/// <summary>A method wrapper that counts evaluations, to check the selector's own counter independently.</summary>
internal sealed class CountingMethod(IResistanceMethod inner) : IResistanceMethod
{
    private int _count;
    public int Count => Volatile.Read(ref _count);
    public MethodIdentity Identity => inner.Identity;
    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions) => inner.AppliesTo(member, actions);
    public CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace)
    {
        Interlocked.Increment(ref _count);
        return inner.Evaluate(member, actions, trace);
    }
}

/// <summary>A deliberately broken method whose resistance falls as the area grows beyond a point (not monotone in size),
/// to show the selector's verification and fallback.</summary>
internal sealed class NonMonotoneMethod : IResistanceMethod
{
    public MethodIdentity Identity { get; } = new("non-monotone test method", "invented for tests", "", "");
    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions) => Applicability.Applicable;
    public CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace)
    {
        // Resistance = A·f for small sections, but only a tenth of that for sections above 1500 mm².
        double n = member.AreaM2 * member.StrengthPa * (member.AreaM2 > 1500e-6 ? 0.1 : 1.0);
        return new CheckResult(member, actions, this, n, actions.AxialForceN / n, BucklingAxis.Y, FailureMode.Yielding, "invented",
            default, default, default, trace);
    }
}

internal static class WorkflowFixtures
{
    internal static Member Column(double lengthMm, string name = "column") =>
        Member.Create(new RectangleSection(Length.FromMillimeters(50), Length.FromMillimeters(50)), Fixtures.Steel,
            Length.FromMillimeters(lengthMm), Restraint.PinnedBothAxes, name);
}

/// <summary>A method that throws for sections of area between 400 and 600 mm² (a stand-in for a solver that fails to
/// converge), and is Euler otherwise.</summary>
internal sealed class PartlyThrowingMethod : IResistanceMethod
{
    public MethodIdentity Identity { get; } = new("partly throwing test method", "invented for tests", "", "");
    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions) => ResistanceMethods.Euler.AppliesTo(member, actions);
    public CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace)
    {
        if (member.AreaM2 > 400e-6 && member.AreaM2 < 600e-6) throw new InvalidOperationException("no convergence (test)");
        return ResistanceMethods.Euler.Evaluate(member, actions, trace);
    }
}
