using System;
using System.Globalization;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using CompressionMembers.Actions;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Reporting;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using UnitsNet;

namespace CompressionMembers.Tests.Reporting;

public class DeterminismTests
{
    private static string Render() => TextReport.Render(ReportCases.SecantEccentric()) + MarkdownReport.Render(ReportCases.AngleMinorAxis());

    [Theory]
    [InlineData("de-DE")]
    [InlineData("tr-TR")]
    [InlineData("ar-SA")]
    [InlineData("fr-CH")]
    public void Render_UnderAnyCurrentCulture_GivesTheSameBytes(string culture)
    {
        string invariant = WithCulture(CultureInfo.InvariantCulture, Render);
        string other = WithCulture(new CultureInfo(culture), Render);
        Assert.Equal(invariant, other);
    }

    [Fact]
    public void Render_RepeatedAndFromParallelThreads_GivesTheSameBytes()
    {
        string first = Render();
        var texts = new string[64];
        Parallel.For(0, texts.Length, new ParallelOptions { MaxDegreeOfParallelism = 8 }, i => texts[i] = Render());
        Assert.All(texts, t => Assert.Equal(first, t));
    }

    [Fact]
    public void Fingerprint_SameMemberInOtherUnits_IsTheSame()
    {
        var mm = Member.Create(new RectangleSection(Length.FromMillimeters(50.8), Length.FromMillimeters(101.6)), Fixtures.Steel, Length.FromMillimeters(2540), Restraint.PinnedBothAxes);
        var inch = Member.Create(new RectangleSection(Length.FromInches(2), Length.FromInches(4)), Fixtures.Steel, Length.FromInches(100), Restraint.PinnedBothAxes);
        var a = DesignActions.Compression(Force.FromKilonewtons(10));
        Assert.Equal(InputFingerprint.Compute(mm, a, ResistanceMethods.Euler), InputFingerprint.Compute(inch, a, ResistanceMethods.Euler));
    }

    [Fact]
    public void Fingerprint_ChangesWithAnyInput()
    {
        var m = Fixtures.PinnedBar(50, 100, 2000);
        var a = DesignActions.Compression(Force.FromKilonewtons(10));
        var baseline = InputFingerprint.Compute(m, a, ResistanceMethods.Euler);
        Assert.NotEqual(baseline, InputFingerprint.Compute(m.WithLength(Length.FromMillimeters(2001)), a, ResistanceMethods.Euler));
        Assert.NotEqual(baseline, InputFingerprint.Compute(m, a.WithAxialCompression(Force.FromKilonewtons(11)), ResistanceMethods.Euler));
        Assert.NotEqual(baseline, InputFingerprint.Compute(m, a, ResistanceMethods.Johnson));
        Assert.Matches("^c1-[0-9a-f]{16}$", baseline);
    }

    [Fact]
    public void Fingerprint_IsStableAcrossVersions()
    {
        // Locked value: an unchanged input must keep its fingerprint in every later release (docs/methods.md, fingerprint).
        var m = Fixtures.PinnedBar(50, 100, 2000);
        Assert.Equal("c1-a5fb63402d074dfb", InputFingerprint.Compute(m, DesignActions.Compression(Force.FromKilonewtons(10)), ResistanceMethods.Euler));
    }

    private static string WithCulture(CultureInfo c, Func<string> f)
    {
        var (oc, ou) = (CultureInfo.CurrentCulture, CultureInfo.CurrentUICulture);
        try { CultureInfo.CurrentCulture = c; CultureInfo.CurrentUICulture = c; return f(); }
        finally { CultureInfo.CurrentCulture = oc; CultureInfo.CurrentUICulture = ou; }
    }
}
