using System.Globalization;
using System.Threading;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Tests.Reporting;

/// <summary>The one-line texts a script prints (<c>Console.WriteLine(result)</c>) and a debugger shows: the same on every
/// culture, and saying what the result says. Consistency checks of the library's own text, not of a published value.</summary>
public class OneLineTextTests
{
    private static CheckResult Tube(double kN)
    {
        // A pin-ended 150 × 5 mm steel tube 7.2 m long (the member of ClassicalWorkedExampleTests), Euler method.
        var tube = Member.Create(new CircularHollowSection(Length.FromMillimeters(150), Length.FromMillimeters(5)),
            IsotropicMaterial.GenericStructuralSteel, Length.FromMeters(7.2), Restraint.PinnedBothAxes, "tube T1");
        return Check.EvaluateWithTrace(tube, DesignActions.Compression(Force.FromKilonewtons(kN)), ResistanceMethods.Euler);
    }

    [Theory]
    [InlineData("en-US")]
    [InlineData("de-DE")]
    [InlineData("fr-FR")]
    public void CheckResult_ToString_IsOneInvariantLine(string culture)
    {
        var old = Thread.CurrentThread.CurrentCulture;
        try
        {
            Thread.CurrentThread.CurrentCulture = new CultureInfo(culture);
            var r = Tube(100);
            string text = r.ToString();
            // The numbers as the result holds them, to six significant figures with a point. For this tube π²EI/L² = 228.2 kN
            // (Hibbeler, Mechanics of Materials, Example 13.1; PublishedSources.Hibbeler), so 100 kN is a utilisation of 0.438.
            string nRd = (r.DesignResistanceN / 1e3).ToString("0.###", CultureInfo.InvariantCulture);
            Assert.StartsWith("tube T1: utilisation 0.43", text);
            Assert.Contains(", passes; NRd = " + nRd[..5], text);
            Assert.Contains("NEd = 100 kN; ", text);
            Assert.Contains(r.GoverningCheck, text);
            Assert.EndsWith("[" + r.Method.Identity.Name + "]", text);
            Assert.DoesNotContain('\n', text);
            Assert.DoesNotContain("0,4", text);
        }
        finally { Thread.CurrentThread.CurrentCulture = old; }
    }

    [Fact]
    public void CheckResult_ToString_SaysFails_AboveOne_AndNoResultForDefault()
    {
        Assert.Contains(", FAILS; ", Tube(300).ToString());
        Assert.Equal("(no result)", default(CheckResult).ToString());
    }

    [Fact]
    public void CheckResult_ToString_NeverThrows_ForAResultAUserBuiltWithoutActionsOrMethod()
    {
        // A method author's result from default resolved actions and no method (the constructor allows both): it prints.
        var tube = Member.Create(new CircularHollowSection(Length.FromMillimeters(150), Length.FromMillimeters(5)),
            IsotropicMaterial.GenericStructuralSteel, Length.FromMeters(7.2), Restraint.PinnedBothAxes, "tube T2");
        var r = new CheckResult(tube.Resolved, default, null!, 2000, 0.5, BucklingAxis.Y, FailureMode.FlexuralBuckling, null!, default, default, default, null);
        Assert.Equal("tube T2: utilisation 0.5, passes; NRd = 2 kN, NEd = — kN;  [method without a name]", r.ToString());
    }

    [Fact]
    public void CalculationStep_ToString_IsTheSameInEveryCulture()
    {
        var old = Thread.CurrentThread.CurrentCulture;
        try
        {
            var step = Tube(100).Steps[0];
            Thread.CurrentThread.CurrentCulture = CultureInfo.InvariantCulture;
            string invariant = step.ToString();
            Thread.CurrentThread.CurrentCulture = new CultureInfo("de-DE");
            Assert.Equal(invariant, step.ToString());
            Assert.StartsWith(step.Symbol + " = " + step.Value.ToString(CultureInfo.InvariantCulture), invariant);
        }
        finally { Thread.CurrentThread.CurrentCulture = old; }
    }

    [Fact]
    public void DesignActions_ToString_SaysWhatIsGiven_InEveryCulture()
    {
        var old = Thread.CurrentThread.CurrentCulture;
        try
        {
            Thread.CurrentThread.CurrentCulture = new CultureInfo("de-DE");
            Assert.Equal("c1: NEd = 12.5 kN", DesignActions.Compression(Force.FromKilonewtons(12.5), "c1").ToString());
            var a = DesignActions.Compression(Force.FromKilonewtons(180), "dead + snow")
                .WithEccentricity(Length.FromMillimeters(30), Length.Zero)
                .WithEndMomentsAboutY(Torque.FromKilonewtonMeters(2.5), Torque.FromKilonewtonMeters(-1.25))
                .WithInitialBow(null, Length.FromMillimeters(7.2))
                .WithLoadDuration(LoadDurationClass.MediumTerm);
            Assert.Equal("dead + snow: NEd = 180 kN, ey = 30 mm, My = 2.5 kN·m top, -1.25 kN·m bottom, bow about z = 7.2 mm, medium-term", a.ToString());
        }
        finally { Thread.CurrentThread.CurrentCulture = old; }
    }

    [Fact]
    public void Restraint_Applicability_Method_AndAxisOutcome_HaveOneLineTexts()
    {
        Assert.Equal("about y: pinned–pinned, theoretical value; K = 1 | about z: pinned–pinned, theoretical value; K = 1 | twist: pinned–pinned, theoretical value; K = 1",
            Restraint.PinnedBothAxes.ToString());
        Assert.Equal("applicable", Applicability.Applicable.ToString());
        Assert.Equal("not applicable: too short", Applicability.NotApplicable("too short").ToString());
        Assert.Equal(ResistanceMethods.Ec5Column.Identity.ToString(), ResistanceMethods.Ec5Column.ToString());
        Assert.StartsWith("EN 1995-1-1", ResistanceMethods.Ec5Column.ToString().Split('(')[1]);
        Assert.Equal("not evaluated", default(AxisOutcome).ToString());
        var old = Thread.CurrentThread.CurrentCulture;
        try
        {
            Thread.CurrentThread.CurrentCulture = new CultureInfo("fr-FR");
            var y = Tube(100).AboutY;
            // Lcr = 7.2 m; λ = L / i with i = √((75² + 70²) / 4) mm of the 150 × 5 tube.
            Assert.StartsWith("Lcr = 7200 mm, λ = " + Internal_Show(7200 / System.Math.Sqrt((75.0 * 75 + 70.0 * 70) / 4)) + ", ", y.ToString());
            Assert.Contains(" kN, reduction ", y.ToString());
        }
        finally { Thread.CurrentThread.CurrentCulture = old; }
    }

    // Six significant figures, as Guard.Show writes a value of this size.
    private static string Internal_Show(double v) => System.Math.Round(v, 6 - 1 - (int)System.Math.Floor(System.Math.Log10(v))).ToString("0.##########", CultureInfo.InvariantCulture);
}
