#:project ../../src/CompressionMembers/CompressionMembers.csproj
#:package UnitsNet@5.75.1
// A user-written resistance method passed wherever a built-in one goes.
// Here: the Rankine–Gordon column formula σ = f / (1 + a λ²) with a = f / (π² E), a classical
// interpolation between crushing and Euler buckling, compared with the built-in Johnson parabola.
// The scenario (a pergola post) is our own invention.
using System;
using CompressionMembers;
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

var post = Member.Create(new CircularHollowSection(Length.FromMillimeters(60.3), Length.FromMillimeters(3.2)),
    IsotropicMaterial.GenericStructuralSteel, Length.FromMeters(2.6), Restraint.PinnedBothAxes, "pergola post");
var actions = DesignActions.Compression(Force.FromKilonewtons(40), "roof slats + snow");

var rankine = new RankineGordon();
var mine = Check.EvaluateWithTrace(post, actions, rankine);
var builtIn = Check.Evaluate(post, actions, ResistanceMethods.Johnson);

Console.Write(TextReport.Render(mine));
Console.WriteLine();
Console.WriteLine($"Rankine–Gordon : N = {NumberFormat.Quantity(mine.DesignResistanceN, StepUnit.Force)}, u = {NumberFormat.Number(mine.Utilisation)}");
Console.WriteLine($"Johnson        : N = {NumberFormat.Quantity(builtIn.DesignResistanceN, StepUnit.Force)}, u = {NumberFormat.Number(builtIn.Utilisation)}");
Console.WriteLine($"ratio          : {NumberFormat.Number(mine.DesignResistanceN / builtIn.DesignResistanceN)} (Rankine–Gordon is the more cautious of the two here)");
return mine.DesignResistanceN < builtIn.DesignResistanceN ? 0 : 1;

/// <summary>Rankine–Gordon: σ = f / (1 + a λ²), a = f / (π² E). Concentric compression, any material.</summary>
sealed class RankineGordon : IResistanceMethod
{
    public MethodIdentity Identity { get; } = new("Rankine–Gordon column formula (user-written)", "Rankine–Gordon", "", "classical formula");

    public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions) =>
        actions.HasEccentricity || actions.HasEndMoments
            ? Applicability.NotApplicable("Rankine–Gordon as written here covers concentric compression only.")
            : Applicability.Applicable;

    public CheckResult Evaluate(in ResolvedMember m, in ResolvedActions a, CalculationTrace? trace)
    {
        double alpha = m.StrengthPa / (Math.PI * Math.PI * m.ElasticModulusPa);
        double ly = m.EffectiveLengthYM / m.RadiusYM, lz = m.EffectiveLengthZM / m.RadiusZM;
        double sy = m.StrengthPa / (1 + alpha * ly * ly), sz = m.StrengthPa / (1 + alpha * lz * lz);
        double n = Math.Min(sy, sz) * m.AreaM2, u = a.AxialForceN / n;
        trace?.Add("a", "Rankine constant", "f / (π² E)", alpha, StepUnit.None, "Rankine–Gordon");
        trace?.Add("λ", "governing slenderness", "max(Lcr / i)", Math.Max(ly, lz), StepUnit.None, "Rankine–Gordon");
        trace?.Add("σ", "failure stress", "f / (1 + a λ²)", Math.Min(sy, sz), StepUnit.Stress, "Rankine–Gordon");
        trace?.Add("N", "nominal capacity", "σ A", n, StepUnit.Force, "Rankine–Gordon");
        trace?.Add("u", "utilisation", "NEd / N", u, StepUnit.None, "common practice");
        return new CheckResult(m, a, this, n, u, sy <= sz ? BucklingAxis.Y : BucklingAxis.Z, FailureMode.FlexuralBuckling, "Rankine–Gordon",
            default, default, default, trace);
    }
}
