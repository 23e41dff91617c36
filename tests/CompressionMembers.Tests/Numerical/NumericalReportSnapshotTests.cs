using ApprovalTests;
using CompressionMembers.Actions;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Numerical;
using CompressionMembers.Reporting;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using UnitsNet;

namespace CompressionMembers.Tests.Numerical;

/// <summary>Locks the text of the numerical reports. Invented members (demo numbers, not from any source).</summary>
public class NumericalReportSnapshotTests
{
    // A steel post 6 m, I = 8356 cm⁴ about the buckling axis, on a base plate with kθ = 5000 kN·m/rad, pinned at the top.
    internal static BucklingModel SpringPost() =>
        BucklingModel.Uniform(Length.FromMillimeters(6000), Pressure.FromGigapascals(210), AreaMomentOfInertia.FromCentimetersToTheFourth(8356),
                EndSpring.Rotational(RotationalStiffness.FromKilonewtonMetersPerRadian(5000)), EndSpring.Pinned)
            .WithName("spring-restrained post");

    // A crane column: lower 5 m with I = 2.5e8 mm⁴, upper 3 m with 6e7 mm⁴, fixed base, top guided on a bracing spring,
    // 300 kN from the crane girder at 5 m and 100 kN from the roof at the top, with self-weight 1.2 kN/m.
    internal static BucklingModel SteppedColumn() =>
        BucklingModel.FromSegments(
            [
                MemberSegment.Uniform(Length.FromMillimeters(5000), Pressure.FromGigapascals(210), AreaMomentOfInertia.FromMillimetersToTheFourth(2.5e8)),
                MemberSegment.Uniform(Length.FromMillimeters(3000), Pressure.FromGigapascals(210), AreaMomentOfInertia.FromMillimetersToTheFourth(6e7)),
            ],
            EndSpring.Fixed, EndSpring.Translational(ForcePerLength.FromKilonewtonsPerMeter(200)))
        .WithAxialLoadAt(Length.FromMillimeters(5000), Force.FromKilonewtons(300))
        .WithAxialLoadAtTop(Force.FromKilonewtons(100))
        .WithSelfWeight(ForcePerLength.FromKilonewtonsPerMeter(1.2))
        .WithName("stepped crane column");

    [Fact] public void Report_SpringRestrainedPost() => Approvals.Verify(BucklingAnalysis.Solve(SpringPost(), 3).ToReport());

    [Fact] public void Report_SteppedColumn() => Approvals.Verify(BucklingAnalysis.Solve(SteppedColumn(), 2).ToReport());

    [Fact]
    public void Report_SecondOrderEccentricStrut()
    {
        var member = Member.Create(new RectangleSection(Length.FromMillimeters(40), Length.FromMillimeters(60)), Fixtures.Steel,
            Length.FromMillimeters(2500), Restraint.PinnedBothAxes, "eccentric strut");
        var actions = DesignActions.Compression(Force.FromKilonewtons(60), "demo case")
            .WithEccentricity(Length.FromMillimeters(5), Length.Zero)
            .WithEndMomentsAboutY(Torque.FromKilonewtonMeters(0.3), Torque.FromKilonewtonMeters(0))
            .WithInitialBow(Length.FromMillimeters(2.5), null);
        Approvals.Verify(SecondOrderAnalysis.Analyse(member, actions, BucklingAxis.Y, steps: 6).ToReport());
    }

    [Fact]
    public void Report_SecondOrder_UnnamedCase_ShowsNoPlaceholderName()
    {
        // A case made without a name carries the default "action case" (part of the fingerprint); the report leaves it out
        // rather than print "(action case)" as if it were a name. A named case keeps its name (the snapshot above).
        var member = Member.Create(new RectangleSection(Length.FromMillimeters(40), Length.FromMillimeters(60)), Fixtures.Steel,
            Length.FromMillimeters(2500), Restraint.PinnedBothAxes, "eccentric strut");
        var actions = DesignActions.Compression(Force.FromKilonewtons(60)).WithEccentricity(Length.FromMillimeters(5), Length.Zero);
        string report = SecondOrderAnalysis.Analyse(member, actions, BucklingAxis.Y, steps: 2).ToReport();
        Assert.Contains("  design load N = 60 kN\n", report.Replace("\r\n", "\n", System.StringComparison.Ordinal));
        Assert.DoesNotContain("(action case)", report);
        Assert.Contains("action case       : not named", CompressionMembers.Reporting.TextReport.Render(
            Check.EvaluateWithTrace(member, actions, ResistanceMethods.Secant)));
    }

    [Fact]
    public void Text_FiniteElementCriticalWithEndSprings()
    {
        // The check report of the FE method for a member whose K about y came from end springs: the report shows how K was obtained.
        var section = new RectangleSection(Length.FromMillimeters(80), Length.FromMillimeters(120));
        var ky = EffectiveLength.FromEndSprings(EndSpring.Rotational(RotationalStiffness.FromKilonewtonMetersPerRadian(400)), EndSpring.Pinned,
            Fixtures.Steel.ElasticModulus, section.SecondMomentY, Length.FromMillimeters(4000));
        var member = Member.Create(section, Fixtures.Steel, Length.FromMillimeters(4000),
            new Restraint(ky, AxisRestraint.PinnedPinned.WithBracingAt(Length.FromMillimeters(2000))), "spring-based post");
        var r = Check.EvaluateWithTrace(member, DesignActions.Compression(Force.FromKilonewtons(150), "demo case"), ResistanceMethods.FiniteElementCritical);
        Approvals.Verify(TextReport.Render(r));
    }
}
