using System;
using System.Globalization;
using System.Linq;
using System.Threading.Tasks;
using CompressionMembers.Actions;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using CompressionMembers.Workflows.Json;
using UnitsNet;
using Xunit.Abstractions;

namespace CompressionMembers.Tests.Trust;

/// <summary>Results written as JSON are byte-identical across repeats, cultures, local time zones and threads (issue:
/// reproducible JSON).</summary>
public class JsonReproducibilityTests(ITestOutputHelper output)
{
    private static string WriteAll() => string.Concat(Documents());

    private static string[] Documents()
    {
        var timber = Member.Create(new RectangleSection(Length.FromMillimeters(115), Length.FromMillimeters(180)), TimberGrades.GL24h,
            Length.FromMeters(3.6), Restraint.PinnedBothAxes, "glulam post");
        var alu = Member.Create(new RectangularHollowSection(Length.FromMillimeters(80), Length.FromMillimeters(80), Length.FromMillimeters(4)),
            AluminiumAlloys.EnAw6082T6Extrusion, Length.FromMeters(2.3), Restraint.PinnedBothAxes, "strut");
        var steel = Member.Create(new CircularHollowSection(Length.FromMillimeters(60.3), Length.FromMillimeters(4)),
            Materials.IsotropicMaterial.GenericStructuralSteel, Length.FromMeters(1.6), Restraint.PinnedBothAxes, "prop");
        return
        [
            ResultJson.Write(Check.EvaluateWithTrace(timber, DesignActions.Compression(Force.FromKilonewtons(120)).WithLoadDuration(LoadDurationClass.MediumTerm), ResistanceMethods.Ec5Column)),
            ResultJson.Write(Check.EvaluateWithTrace(alu, DesignActions.Compression(Force.FromKilonewtons(95)), ResistanceMethods.Eurocode9)),
            ResultJson.Write(Check.EvaluateWithTrace(steel, DesignActions.Compression(Force.FromKilonewtons(85)).WithEccentricity(Length.FromMillimeters(10), Length.Zero), ResistanceMethods.Secant)),
        ];
    }

    [Theory]
    [InlineData("de-DE")]
    [InlineData("tr-TR")]
    [InlineData("ar-SA")]
    [InlineData("fr-CH")]
    public void Write_UnderAnyCulture_GivesTheSameBytes(string culture)
    {
        string invariant = With(CultureInfo.InvariantCulture, WriteAll);
        Assert.Equal(invariant, With(new CultureInfo(culture), WriteAll));
        Assert.DoesNotContain('\r', invariant);
    }

    [Theory]
    [InlineData("UTC")]
    [InlineData("Pacific/Kiritimati")]  // UTC+14
    [InlineData("America/St_Johns")]    // half-hour offset, daylight saving
    [InlineData("Asia/Kathmandu")]      // UTC+5:45
    public void Write_UnderAnyLocalTimeZone_GivesTheSameBytes(string zone)
    {
        // As ReproducibilityTests does for the text reports: on Linux TimeZoneInfo.Local reads TZ, and clearing the cache
        // makes the change visible in this process. The documents are also read back and written again in that zone.
        string baseline = WriteAll();
        string? old = Environment.GetEnvironmentVariable("TZ");
        try
        {
            Environment.SetEnvironmentVariable("TZ", zone);
            TimeZoneInfo.ClearCachedData();
            output.WriteLine($"local time zone now {TimeZoneInfo.Local.Id}, offset {TimeZoneInfo.Local.BaseUtcOffset}");
            string inZone = WriteAll();
            Assert.Equal(baseline, inZone);
            Assert.Equal(baseline, RewriteAll());
        }
        finally
        {
            Environment.SetEnvironmentVariable("TZ", old);
            TimeZoneInfo.ClearCachedData();
        }
    }

    /// <summary>Each document read back with <see cref="ResultJson.Read"/> and written again.</summary>
    private static string RewriteAll() =>
        string.Concat(Documents().Select(d => ResultJson.Write(ResultJson.Read(d))));

    [Fact]
    public void Write_RepeatedAndFromParallelThreads_GivesTheSameBytes()
    {
        string first = WriteAll();
        var texts = new string[32];
        Parallel.For(0, texts.Length, new ParallelOptions { MaxDegreeOfParallelism = 8 }, i => texts[i] = WriteAll());
        Assert.All(texts, t => Assert.Equal(first, t));
    }

    private static string With(CultureInfo c, Func<string> f)
    {
        var (oc, ou) = (CultureInfo.CurrentCulture, CultureInfo.CurrentUICulture);
        try { CultureInfo.CurrentCulture = c; CultureInfo.CurrentUICulture = c; return f(); }
        finally { CultureInfo.CurrentCulture = oc; CultureInfo.CurrentUICulture = ou; }
    }
}
