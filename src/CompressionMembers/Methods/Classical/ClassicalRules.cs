using System.Runtime.CompilerServices;
using CompressionMembers.Resolution;
using CompressionMembers.Results;

namespace CompressionMembers.Methods.Classical;

/// <summary>What the classical methods share: the concentric-load rule and the closing verdict steps.</summary>
internal static class ClassicalRules
{
    // The test in line (Check calls it for every untraced check of the three methods), the sentence in Refusal.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static Applicability Concentric(in ResolvedActions a, string method) =>
        a.HasEccentricity || a.HasEndMoments ? Refusal(method) : Applicability.Applicable;

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static Applicability Refusal(string method) =>
        Applicability.NotApplicable(method switch
        {
            "Euler" => "the Euler method covers concentric compression only; use the secant method for an eccentric load.",
            "Johnson" => "the Johnson method covers concentric compression only; use the secant method for an eccentric load.",
            _ => "the Perry–Robertson method covers concentric compression (with an initial bow) only; use the secant method for an eccentric load.",
        });

    internal static void Verdict(CalculationTrace t, double demandN, double capacityN, double u)
    {
        t.Add("NEd", "design axial compression", TraceCommon_Input, demandN, StepUnit.Force, "actions");
        t.Add("u", "utilisation", "NEd / N", u, StepUnit.None, "common practice");
    }

    private const string TraceCommon_Input = "input";
}
