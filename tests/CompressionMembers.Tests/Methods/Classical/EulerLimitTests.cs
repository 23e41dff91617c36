using System;
using CompressionMembers.Actions;
using CompressionMembers.Methods;
using CompressionMembers.Members;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using UnitsNet;

namespace CompressionMembers.Tests.Methods.Classical;

public class EulerLimitTests
{
    [Fact]
    public void Evaluate_StockyMember_IsCutOffAtSquashLoad()
    {
        var r = Check.Evaluate(Fixtures.PinnedBar(50, 50, 200), DesignActions.Compression(Force.FromKilonewtons(10)), ResistanceMethods.Euler);
        Near.Relative(0.0025 * 250e6, r.DesignResistanceN, 1e-14, "squash load A f (common practice)");
        Assert.Equal(FailureMode.Yielding, r.GoverningMode);
        Assert.Equal(BucklingAxis.None, r.GoverningAxis);
    }

    [Fact]
    public void Evaluate_BracedWeakAxis_StrongAxisGoverns()
    {
        // 40 × 120 bar, 4 m, weak axis braced at quarter points: Lcr,z = 1 m, so Ncr,z/Ncr,y = (Iz/Iy)(4/1)² = 16/9.
        var z = AxisRestraint.PinnedPinned.WithBracingAt(Length.FromMeters(1), Length.FromMeters(2), Length.FromMeters(3));
        var m = Member.Create(new RectangleSection(Length.FromMillimeters(40), Length.FromMillimeters(120)), Fixtures.Steel, Length.FromMeters(4),
            new Restraint(AxisRestraint.PinnedPinned, z));
        var r = Check.Evaluate(m, DesignActions.Compression(Force.FromKilonewtons(10)), ResistanceMethods.Euler);
        double ncrY = Math.PI * Math.PI * 200e9 * (0.04 * Math.Pow(0.12, 3) / 12) / 16;
        double ncrZ = Math.PI * Math.PI * 200e9 * (0.12 * Math.Pow(0.04, 3) / 12) / 1.0;
        Assert.True(ncrY < ncrZ, "hand check: the strong axis has the lower Euler load here");
        Near.Relative(ncrY, r.DesignResistanceN, 1e-12, "Euler's formula about y");
        Assert.Equal(BucklingAxis.Y, r.GoverningAxis);
    }

    [Theory]
    [InlineData(EndCondition.Fixed, EndCondition.Free, 2.0)]
    [InlineData(EndCondition.Fixed, EndCondition.Fixed, 0.5)]
    public void Evaluate_EndConditions_ScaleTheEulerLoadByOneOverKSquared(EndCondition a, EndCondition b, double k)
    {
        var pinned = Check.Evaluate(Fixtures.PinnedBar(20, 20, 1500), DesignActions.Compression(Force.FromKilonewtons(1)), ResistanceMethods.Euler);
        var m = Fixtures.PinnedBar(20, 20, 1500).WithRestraint(Restraint.Same(AxisRestraint.FromEndConditions(a, b, EffectiveLengthBasis.Theoretical)));
        var r = Check.Evaluate(m, DesignActions.Compression(Force.FromKilonewtons(1)), ResistanceMethods.Euler);
        Near.Relative(pinned.DesignResistanceN / (k * k), r.DesignResistanceN, 1e-12, "Ncr = π²EI/(KL)² (Timoshenko & Gere §2.2)");
    }
}
