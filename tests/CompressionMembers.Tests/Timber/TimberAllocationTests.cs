using System;
using CompressionMembers.Methods;
using CompressionMembers.Resolution;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Tests.Timber;

/// <summary>With tracing off a check allocates nothing (DESIGN.md "two speeds, one code path").</summary>
public class TimberAllocationTests
{
    /// <summary>Bytes allocated by 1000 warm checks: the least of three batches, so that a one-off allocation by the
    /// runtime itself (tiered re-compilation happening to start during a batch under a loaded test run) is not counted,
    /// while an allocation made by every check shows in every batch.</summary>
    private static long Allocated(in ResolvedMember m, in ResolvedActions a, IResistanceMethod method)
    {
        for (int k = 0; k < 2000; k++) Check.Evaluate(m, a, method, null); // warm up (JIT, tiering, thread statics)
        long least = long.MaxValue;
        for (int batch = 0; batch < 3; batch++)
        {
            long before = GC.GetAllocatedBytesForCurrentThread();
            for (int k = 0; k < 1000; k++) Check.Evaluate(m, a, method, null);
            least = Math.Min(least, GC.GetAllocatedBytesForCurrentThread() - before);
        }
        return least;
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
