using System;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Reflection;
using System.Security.Cryptography;
using System.Text;
using System.Text.RegularExpressions;
using System.Threading.Tasks;
using CompressionMembers.Reporting;
using Xunit.Abstractions;

namespace CompressionMembers.Tests.Trust;

/// <summary>
/// The same inputs give byte-identical reports across runs, current cultures, time zones and thread counts
/// (docs/reproducibility.md). The reports cover every method family (<see cref="TrustCases"/>).
/// </summary>
public class ReproducibilityTests(ITestOutputHelper output)
{
    private static string Hash(string s) => Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(s)));

    [Fact]
    public void Reports_RenderedAgainInTheSameProcess_AreByteIdentical()
    {
        string a = TrustCases.RenderAll(), b = TrustCases.RenderAll();
        Assert.Equal(a, b);
        output.WriteLine($"all-family report set: {a.Length} characters, SHA-256 {Hash(a)}");
    }

    [Theory]
    [InlineData("")]        // invariant
    [InlineData("de-DE")]   // decimal comma, '.' thousands
    [InlineData("tr-TR")]   // dotted and dotless i in upper/lower case
    [InlineData("ar-SA")]   // another calendar, Arabic digits available
    [InlineData("fr-CH")]   // apostrophe/narrow space grouping
    public void Reports_UnderAnyCurrentCulture_AreByteIdenticalToInvariant(string culture)
    {
        string invariant = WithCulture(CultureInfo.InvariantCulture, TrustCases.RenderAll);
        string other = WithCulture(culture.Length == 0 ? CultureInfo.InvariantCulture : new CultureInfo(culture), TrustCases.RenderAll);
        Assert.Equal(invariant, other);
    }

    [Theory]
    [InlineData("UTC")]
    [InlineData("Pacific/Kiritimati")]  // UTC+14
    [InlineData("America/St_Johns")]    // half-hour offset, daylight saving
    [InlineData("Asia/Kathmandu")]      // UTC+5:45
    public void Reports_UnderAnyLocalTimeZone_AreByteIdentical(string zone)
    {
        string baseline = TrustCases.RenderAll();
        string? old = Environment.GetEnvironmentVariable("TZ");
        try
        {
            // On Linux TimeZoneInfo.Local reads TZ; clearing the cache makes the change visible in this process.
            Environment.SetEnvironmentVariable("TZ", zone);
            TimeZoneInfo.ClearCachedData();
            output.WriteLine($"local time zone now {TimeZoneInfo.Local.Id}");
            Assert.Equal(baseline, TrustCases.RenderAll());
        }
        finally
        {
            Environment.SetEnvironmentVariable("TZ", old);
            TimeZoneInfo.ClearCachedData();
        }
    }

    [Fact]
    public void ReportSource_WritesNoPlatformLineEnd()
    {
        // Reports end lines with '\n' on every platform: AppendLine, WriteLine and Environment.NewLine would give "\r\n" on
        // Windows. (Readers may still accept "\r\n" input; only writing the platform's line end is refused.)
        var src = Path.Combine(RepoRoot(), "src", "CompressionMembers");
        foreach (var file in Directory.EnumerateFiles(src, "*.cs", SearchOption.AllDirectories))
            foreach (var line in File.ReadLines(file))
                if (!line.TrimStart().StartsWith("//", StringComparison.Ordinal))
                    Assert.False(line.Contains("AppendLine(", StringComparison.Ordinal) || line.Contains("WriteLine(", StringComparison.Ordinal) || line.Contains("Environment.NewLine", StringComparison.Ordinal),
                        $"{Path.GetFileName(file)}: {line.Trim()}");
        Assert.DoesNotContain('\r', TrustCases.RenderAll());
    }

    [Fact]
    public void LibrarySource_UsesNoClockTimeZoneRandomOrCurrentCultureApi()
    {
        // By construction: a report cannot depend on the time, the zone, the machine or the culture if the library never
        // asks for them. Doc comments are left out.
        var forbidden = new Regex(@"\b(DateTime|DateTimeOffset|TimeZoneInfo|Stopwatch|TimeProvider|Environment\.|Random|Guid\.NewGuid|CurrentCulture|CurrentUICulture|TickCount|ProcessorCount|\.GetHashCode\(\))");
        var src = Path.Combine(RepoRoot(), "src", "CompressionMembers");
        int files = 0;
        foreach (var file in Directory.EnumerateFiles(src, "*.cs", SearchOption.AllDirectories).Where(f => !f.Contains($"{Path.DirectorySeparatorChar}obj{Path.DirectorySeparatorChar}")))
        {
            files++;
            foreach (var (line, n) in File.ReadLines(file).Select((l, i) => (l, i + 1)))
            {
                string code = line.TrimStart();
                if (code.StartsWith("//", StringComparison.Ordinal)) continue;
                // Equality members may hash (HashCode is seeded per process) as long as nothing printed depends on it.
                if (code.Contains("override int GetHashCode", StringComparison.Ordinal)) continue;
                // One exception: the batch evaluator times its first items to decide whether a batch is worth a second core.
                // That decides only which thread computes an item, never a value (each result has its slot, and
                // BatchEvaluatorTests hold every path to the serial run's bits); the clock is read nowhere else.
                if (Path.GetFileName(file) == "BatchEvaluator.cs" && Regex.Replace(code, @"Stopwatch\.(GetTimestamp\(\)|Frequency)", "") is var rest && !forbidden.IsMatch(rest)) continue;
                Assert.False(forbidden.IsMatch(code), $"{Path.GetRelativePath(src, file)}:{n} uses a run-dependent API: {code}");
            }
        }
        output.WriteLine($"{files} source files scanned");
        Assert.True(files > 50);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(4)]
    [InlineData(16)]
    public void Reports_RenderedOnAnyNumberOfThreads_AreByteIdentical(int threads)
    {
        string baseline = TrustCases.RenderAll();
        var texts = new string[2 * threads];
        Parallel.For(0, texts.Length, new ParallelOptions { MaxDegreeOfParallelism = threads }, i => texts[i] = TrustCases.RenderAll());
        Assert.All(texts, t => Assert.Equal(baseline, t));
    }

    [Fact]
    public void Reports_NameTheExactPackageVersionAndEveryMethodEdition()
    {
        foreach (var (name, m, a, method) in TrustCases.All)
        {
            var r = Check.EvaluateWithTrace(m, a, method);
            foreach (var text in new[] { TextReport.Render(r), MarkdownReport.Render(r) })
            {
                Assert.Contains(LibraryInfo.Version, text, StringComparison.Ordinal);
                Assert.Contains(method.Identity.Standard, text, StringComparison.Ordinal);
                Assert.Contains(method.Identity.Edition, text, StringComparison.Ordinal);
            }
        }
    }

    [Fact]
    public void Version_IsSemanticAndListedInTheChangelog_AndTheAssemblyCarriesIt()
    {
        Assert.Matches(@"^\d+\.\d+\.\d+(-[0-9A-Za-z.-]+)?$", LibraryInfo.Version); // semver.org 2.0.0 core form
        var info = typeof(LibraryInfo).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()!.InformationalVersion;
        Assert.StartsWith(LibraryInfo.Version, info, StringComparison.Ordinal);
        string changelog = File.ReadAllText(Path.Combine(RepoRoot(), "docs", "CHANGELOG.md"));
        Assert.Contains("## " + LibraryInfo.Version, changelog, StringComparison.Ordinal);
    }

    internal static string RepoRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "CompressionMembers.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("repository root not found");
    }

    private static string WithCulture(CultureInfo c, Func<string> f)
    {
        var (oc, ou) = (CultureInfo.CurrentCulture, CultureInfo.CurrentUICulture);
        try { CultureInfo.CurrentCulture = c; CultureInfo.CurrentUICulture = c; return f(); }
        finally { CultureInfo.CurrentCulture = oc; CultureInfo.CurrentUICulture = ou; }
    }
}
