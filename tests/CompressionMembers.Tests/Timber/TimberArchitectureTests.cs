using System;
using System.Linq;
using System.Reflection;
using CompressionMembers.Internal;
using CompressionMembers.Actions;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Restraints;
using UnitsNet;

namespace CompressionMembers.Tests.Timber;

public class TimberArchitectureTests
{
    [Fact]
    public void PublicTimberClasses_AreMarkedImmutable()
    {
        // STYLE.md 3: every public class carries [Immutable] or [Mutable] (NodaTime's MutabilityTest).
        var missing = typeof(TimberMaterial).Assembly.GetExportedTypes()
            .Where(t => t.Namespace is "CompressionMembers.Materials.Timber" or "CompressionMembers.Methods.Timber")
            .Where(t => t.IsClass && !(t.IsAbstract && t.IsSealed))
            .Where(t => t.GetCustomAttribute<ImmutableAttribute>() is null && t.GetCustomAttribute<MutableAttribute>() is null)
            .Select(t => t.Name).ToArray();
        Assert.Empty(missing);
    }

    [Fact]
    public void LeadDemoSnippet_Runs()
    {
        // The usage snippet handed to the lead for the demo (kept equal by hand).
        var column = Member.Create(TimberSizes.Glulam(Length.FromMillimeters(140), 6), TimberGrades.GL28h,
            Length.FromMeters(3.6), Restraint.PinnedBothAxes, "C1");
        var actions = DesignActions.Compression(Force.FromKilonewtons(180))
            .WithEccentricity(Length.FromMillimeters(30), Length.Zero)
            .WithLoadDuration(LoadDurationClass.MediumTerm);
        var ec5 = Check.Evaluate(column, actions, ResistanceMethods.Ec5ColumnServiceClass2);
        var fire = Check.Evaluate(column, actions.WithAxialCompression(Force.FromKilonewtons(70)), ResistanceMethods.Ec5FireR30);
        var us = Check.Evaluate(Member.Create(TimberSizes.UsNominal(4, 6), NdsGrades.DouglasFirLarchNo2, Length.FromFeet(8),
            Restraint.PinnedBothAxes), DesignActions.Compression(Force.FromKilopoundsForce(5))
            .WithLoadDuration(LoadDurationClass.LongTerm), ResistanceMethods.NdsColumnAsd);
        Assert.True(ec5.Passed && fire.Utilisation > 0 && us.Utilisation > 0);
        Assert.True(Math.Abs(ec5.Utilisation - 0.738) < 0.001); // as printed by samples/scripts/timber-national-annex.cs
    }
}
