using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Tests.Reporting;

/// <summary>Members of our own invention (not from any published example) whose reports are locked by snapshots.</summary>
internal static class ReportCases
{
    private static Length Mm(double v) => Length.FromMillimeters(v);
    private static IsotropicMaterial Steel => IsotropicMaterial.GenericStructuralSteel;

    internal static CheckResult EulerSlenderRod() => Check.EvaluateWithTrace(
        Member.Create(new CircleSection(Mm(16)), Steel, Length.FromMeters(1.8), Restraint.PinnedBothAxes, "R1 bracing rod"),
        DesignActions.Compression(Force.FromKilonewtons(3), "wind suction"), ResistanceMethods.Euler);

    internal static CheckResult EulerStockyBlock() => Check.EvaluateWithTrace(
        Member.Create(new RectangleSection(Mm(60), Mm(60)), Steel, Mm(250), Restraint.PinnedBothAxes, "B1 bearing block"),
        DesignActions.Compression(Force.FromKilonewtons(400)), ResistanceMethods.Euler);

    internal static CheckResult JohnsonTube() => Check.EvaluateWithTrace(
        Member.Create(new CircularHollowSection(Mm(60.3), Mm(4)), Steel, Length.FromMeters(1.6),
            Restraint.Same(AxisRestraint.FromEndConditions(EndCondition.Fixed, EndCondition.Pinned, EffectiveLengthBasis.Recommended)), "T1 prop"),
        DesignActions.Compression(Force.FromKilonewtons(85)), ResistanceMethods.Johnson);

    internal static CheckResult AngleMinorAxis() => Check.EvaluateWithTrace(
        Member.Create(AngleSection.Equal(Mm(50), Mm(5)), Steel, Length.FromMeters(1.1), Restraint.PinnedBothAxes, "A1 diagonal"),
        DesignActions.Compression(Force.FromKilonewtons(25)), ResistanceMethods.Johnson);

    internal static CheckResult SecantEccentric() => Check.EvaluateWithTrace(
        Member.Create(new ISection(Mm(160), Mm(82), Mm(7.4), Mm(5), Mm(9)), Steel, Length.FromMeters(3.2), Restraint.PinnedBothAxes, "C2 bracket column"),
        DesignActions.Compression(Force.FromKilonewtons(120), "crane bracket").WithEccentricity(Mm(90), Length.Zero), ResistanceMethods.Secant);

    internal static CheckResult SecantBiaxial() => Check.EvaluateWithTrace(
        Member.Create(new RectangularHollowSection(Mm(100), Mm(100), Mm(5)), Steel, Length.FromMeters(2.8), Restraint.PinnedBothAxes, "C3 corner post"),
        DesignActions.Compression(Force.FromKilonewtons(150)).WithEccentricity(Mm(20), Mm(15)), ResistanceMethods.Secant);

    internal static CheckResult PerryBowed() => Check.EvaluateWithTrace(
        Member.Create(new RectangleSection(Mm(50), Mm(30)), Steel, Length.FromMeters(1.2), Restraint.PinnedBothAxes, "S4 strut"),
        DesignActions.Compression(Force.FromKilonewtons(60)).WithInitialBow(Mm(1.2), Mm(1.2)), ResistanceMethods.PerryRobertson(PerryImperfection.FromActions));

    internal static CheckResult PerryRobertsonDefault() => Check.EvaluateWithTrace(
        Member.Create(new ChannelSection(Mm(120), Mm(55), Mm(9), Mm(7)), Steel, Length.FromMeters(2.0), Restraint.PinnedBothAxes, "S5 chord"),
        DesignActions.Compression(Force.FromKilonewtons(140)), ResistanceMethods.PerryRobertsonDefault);

    internal static CheckResult BracedWeakAxisNotGoverning() => Check.EvaluateWithTrace(
        Member.Create(new RectangleSection(Mm(40), Mm(120)), Steel, Length.FromMeters(4),
            new Restraint(AxisRestraint.PinnedPinned, AxisRestraint.PinnedPinned.WithBracingAt(Length.FromMeters(1), Length.FromMeters(2), Length.FromMeters(3))),
            "W1 wall stud"),
        DesignActions.Compression(Force.FromKilonewtons(90)), ResistanceMethods.Johnson);

    internal static CheckResult FailingUntraced() => Check.Evaluate(
        Member.Create(new CircleSection(Mm(12)), Steel, Length.FromMeters(2.5), Restraint.PinnedBothAxes, "R2 overloaded rod"),
        DesignActions.Compression(Force.FromKilonewtons(5)), ResistanceMethods.Johnson);
}
