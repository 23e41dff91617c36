using System.Globalization;
using System.Threading;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
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
            // The numbers as the result holds them, to six significant figures with a point (π²EI/L² = 228.2 kN for this tube).
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
}
