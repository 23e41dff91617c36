using System;
using CompressionMembers.Methods;
using CompressionMembers.Resolution;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using UnitsNet;

using CompressionMembers.Tests.Support;

namespace CompressionMembers.Tests.Timber;

/// <summary>With tracing off a check allocates nothing (DESIGN.md "two speeds, one code path").</summary>
public class TimberAllocationTests
{
    private static long Allocated(in ResolvedMember m, in ResolvedActions a, IResistanceMethod method) => Allocations.OfChecks(m, a, method);

    [Fact]
    public void Ec5Column_ThousandUntracedChecksInPureCompression_AllocateNothing()
    {
        var m = ResolvedMember.From(TimberFixtures.Post(90, 140, 3000, TimberGrades.C24));
        var a = ResolvedActions.From(TimberFixtures.Load(10));
        Assert.Equal(0, Allocated(m, a, ResistanceMethods.Ec5Column));
    }

    [Fact]
    public void Ec5Column_ThousandUntracedChecksWithBendingAndLtb_AllocateNothing()
    {
        var m = ResolvedMember.From(TimberFixtures.Post(60, 300, 4000, TimberGrades.C24));
        var a = ResolvedActions.From(TimberFixtures.Load(10).WithEccentricity(Length.FromMillimeters(50), Length.FromMillimeters(5)));
        Assert.Equal(0, Allocated(m, a, ResistanceMethods.Ec5Column));
    }

    [Fact]
    public void NdsColumn_ThousandUntracedChecks_AllocateNothing()
    {
        var mem = Member.Create(new RectangleSection(Length.FromInches(1.5), Length.FromInches(5.5)), NdsGrades.DouglasFirLarchNo2,
            Length.FromInches(72), Restraint.PinnedBothAxes);
        var m = ResolvedMember.From(mem);
        var a = ResolvedActions.From(UnitsNetActions());
        Assert.Equal(0, Allocated(m, a, ResistanceMethods.NdsColumnAsd));
        Assert.Equal(0, Allocated(m, a, ResistanceMethods.NdsColumnLrfd));
    }

    private static Actions.DesignActions UnitsNetActions() =>
        Actions.DesignActions.Compression(Force.FromKilopoundsForce(1)).WithLoadDuration(Actions.LoadDurationClass.ShortTerm)
            .WithEccentricity(Length.FromInches(0.5), Length.FromInches(0.1));

    [Fact]
    public void FireMethod_ThousandUntracedChecks_AllocateNothing()
    {
        var m = ResolvedMember.From(TimberFixtures.Post(140, 240, 2500, TimberGrades.GL28h));
        var a = ResolvedActions.From(Actions.DesignActions.Compression(Force.FromKilonewtons(40)).WithEccentricity(Length.FromMillimeters(10), Length.Zero));
        Assert.Equal(0, Allocated(m, a, ResistanceMethods.Ec5FireR60));
        Assert.Equal(0, Allocated(m, a, new CompressionMembers.Methods.Timber.Ec5FireReducedSection(Duration.FromMinutes(45), CompressionMembers.Methods.Timber.FireExposure.ThreeSidesDepthFaceProtected)));
    }
}
