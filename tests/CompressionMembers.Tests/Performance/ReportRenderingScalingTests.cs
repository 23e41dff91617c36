using System;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Reporting;
using CompressionMembers.Resolution;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Tests.Performance;

/// <summary>
/// Report rendering is linear in the report's length (issue "Performance": no quadratic string building). Counted in bytes
/// allocated, which is deterministic, not timed: a report of 16× the steps may allocate at most about 16× the bytes (a
/// renderer that concatenated strings in a loop would allocate about 256×).
/// </summary>
public class ReportRenderingScalingTests
{
    /// <summary>A method that records <see cref="Steps"/> steps — a stand-in for a long derivation.</summary>
    private sealed class ManySteps(int steps) : IResistanceMethod
    {
        public int Steps { get; } = steps;
        public MethodIdentity Identity { get; } = new("many steps (test)", "many steps", "", "test");
        public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions) => Applicability.Applicable;

        public CheckResult Evaluate(in ResolvedMember m, in ResolvedActions a, CalculationTrace? trace)
        {
            double n = m.StrengthPa * m.AreaM2;
            for (int k = 0; k < Steps; k++)
                trace?.Add("x" + k, "an intermediate value", "f A / (1 + k)", n / (1 + k), StepUnit.Force, "test");
            return new CheckResult(m, a, this, n, a.AxialForceN / n, BucklingAxis.Y, FailureMode.Yielding, "test", default, default, default, trace);
        }
    }

    private static readonly Member Post = Member.Create(new RectangleSection(Length.FromMillimeters(80), Length.FromMillimeters(120)),
        IsotropicMaterial.GenericStructuralSteel, Length.FromMeters(2), Restraint.PinnedBothAxes, "scaling post");

    private static (long Bytes, int Length) Rendered(int steps, Func<CheckResult, string> render)
    {
        var result = Check.EvaluateWithTrace(Post, DesignActions.Compression(Force.FromKilonewtons(10)), new ManySteps(steps));
        render(result);   // warm
        long before = GC.GetAllocatedBytesForCurrentThread();
        string text = render(result);
        return (GC.GetAllocatedBytesForCurrentThread() - before, text.Length);
    }

    [Theory]
    [InlineData("text")]
    [InlineData("markdown")]
    public void AllocationGrowsLinearlyWithTheNumberOfSteps(string format)
    {
        Func<CheckResult, string> render = format == "text" ? r => TextReport.Render(r) : r => MarkdownReport.Render(r);
        var small = Rendered(100, render);
        var large = Rendered(1600, render);
        double lengthRatio = (double)large.Length / small.Length, byteRatio = (double)large.Bytes / small.Bytes;
        Assert.True(lengthRatio > 10, $"the long report should be much longer ({small.Length} → {large.Length} characters)");
        // Linear: bytes grow with the length (a builder's doubling chunks add at most a constant factor), never with its square.
        Assert.True(byteRatio < 1.5 * lengthRatio,
            $"{format}: 16× the steps made the report {lengthRatio:0.0}× longer but allocated {byteRatio:0.0}× the bytes ({small.Bytes} → {large.Bytes} B)");
    }
}
