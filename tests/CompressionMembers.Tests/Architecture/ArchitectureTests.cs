using System;
using System.Linq;
using System.Reflection;
using CompressionMembers.Actions;
using CompressionMembers.Methods;
using CompressionMembers.Resolution;
using CompressionMembers.Results;
using CompressionMembers.Tests.Support;
using UnitsNet;

namespace CompressionMembers.Tests.Architecture;

/// <summary>Reflection tests that keep the house rules from drifting (after NodaTime's MutabilityTest).</summary>
public class ArchitectureTests
{
    private static readonly Assembly Library = typeof(Check).Assembly;

    [Fact]
    public void EveryPublicClass_IsMarkedImmutableOrMutable()
    {
        var immutable = Library.GetType("CompressionMembers.Internal.ImmutableAttribute")!;
        var mutable = Library.GetType("CompressionMembers.Internal.MutableAttribute")!;
        var unmarked = Library.GetExportedTypes()
            .Where(t => t.IsClass && !(t.IsAbstract && t.IsSealed) && !typeof(Exception).IsAssignableFrom(t) && !typeof(Delegate).IsAssignableFrom(t))
            .Where(t => !t.IsDefined(immutable, false) && !t.IsDefined(mutable, false))
            .Select(t => t.FullName).ToList();
        Assert.Empty(unmarked);
    }

    [Fact]
    public void EveryPublicStruct_IsReadOnly()
    {
        var notReadOnly = Library.GetExportedTypes()
            .Where(t => t.IsValueType && !t.IsEnum)
            .Where(t => !t.IsDefined(typeof(System.Runtime.CompilerServices.IsReadOnlyAttribute), false))
            .Select(t => t.FullName).ToList();
        Assert.Empty(notReadOnly);
    }

    [Fact]
    public void NoPublicMember_ExposesAMutableArray()
    {
        var arrays = Library.GetExportedTypes()
            .SelectMany(t => t.GetProperties(BindingFlags.Public | BindingFlags.Instance | BindingFlags.Static | BindingFlags.DeclaredOnly))
            .Where(p => p.PropertyType.IsArray)
            .Select(p => p.DeclaringType!.Name + "." + p.Name).ToList();
        Assert.Empty(arrays);
    }

    [Fact]
    public void LibraryVersion_MatchesAssemblyVersion()
    {
        var v = Library.GetName().Version!;
        Assert.Equal(LibraryInfo.Version, $"{v.Major}.{v.Minor}.{v.Build}");
    }

    [Theory]
    [InlineData("Euler")]
    [InlineData("Johnson")]
    [InlineData("Secant")]
    [InlineData("Perry")]
    public void Evaluate_TracingOff_AllocatesNothing(string which)
    {
        IResistanceMethod method = which switch
        {
            "Euler" => ResistanceMethods.Euler,
            "Johnson" => ResistanceMethods.Johnson,
            "Secant" => ResistanceMethods.Secant,
            _ => ResistanceMethods.PerryRobertsonDefault,
        };
        var member = ResolvedMember.From(Fixtures.PinnedBar(40, 60, 1800));
        var actions = ResolvedActions.From(which == "Secant"
            ? DesignActions.Compression(Force.FromKilonewtons(20)).WithEccentricity(Length.FromMillimeters(8), Length.FromMillimeters(3))
            : DesignActions.Compression(Force.FromKilonewtons(20)));
        Assert.Equal(0, Allocations.OfChecks(member, actions, method));
    }
}
