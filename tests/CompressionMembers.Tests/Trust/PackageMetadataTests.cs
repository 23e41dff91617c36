using System.IO;
using System.Linq;
using System.Xml.Linq;

namespace CompressionMembers.Tests.Trust;

/// <summary>The package project carries the metadata a pinned, traceable package needs (docs/reproducibility.md); the
/// consumer test in .ci/run packs it and compares the packed package's reports with the source build.</summary>
public class PackageMetadataTests
{
    private static XElement Project() =>
        XElement.Load(Path.Combine(ReproducibilityTests.RepoRoot(), "src", "CompressionMembers", "CompressionMembers.csproj"));

    private static string? Property(XElement project, string name) =>
        project.Elements("PropertyGroup").Elements(name).Select(e => e.Value).FirstOrDefault();

    [Theory]
    [InlineData("PackageId", "CompressionMembers")]
    [InlineData("Version", LibraryInfo.Version)]
    [InlineData("PackageLicenseExpression", "MIT")]
    [InlineData("PackageReadmeFile", "README.md")]
    [InlineData("IncludeSymbols", "true")]
    [InlineData("SymbolPackageFormat", "snupkg")]
    [InlineData("GenerateDocumentationFile", "true")]
    [InlineData("PublishRepositoryUrl", "true")]
    [InlineData("EmbedUntrackedSources", "true")]
    [InlineData("Deterministic", "true")]
    [InlineData("DebugType", "portable")]
    public void PackageProject_SetsTheMetadata(string name, string expected) =>
        Assert.Equal(expected, Property(Project(), name));

    [Theory]
    [InlineData("Description")]
    [InlineData("Title")]
    [InlineData("PackageTags")]
    [InlineData("PackageReleaseNotes")]
    public void PackageProject_DescribesThePackage(string name) =>
        Assert.False(string.IsNullOrWhiteSpace(Property(Project(), name)), name);

    [Fact]
    public void PackageProject_PacksTheReadmeChangelogLimitsAndReproducibilityPages()
    {
        var packed = Project().Elements("ItemGroup").Elements("None")
            .Where(e => (string?)e.Attribute("Pack") == "true").Select(e => (string)e.Attribute("Include")!).ToArray();
        foreach (var doc in new[] { "../../README.md", "../../docs/CHANGELOG.md", "../../docs/limits.md", "../../docs/reproducibility.md" })
        {
            Assert.Contains(doc, packed);
            Assert.True(File.Exists(Path.Combine(ReproducibilityTests.RepoRoot(), "src", "CompressionMembers", doc)), doc);
        }
    }

    [Fact]
    public void PackageProject_DependsOnlyOnUnitsNetAndMathNet()
    {
        // DESIGN.md: the core keeps only UnitsNet and MathNet.Numerics as dependencies (CSV is read and written by our own
        // code); analyzers that do not flow to consumers (PrivateAssets="all") are not dependencies.
        var dependencies = Project().Elements("ItemGroup").Elements("PackageReference")
            .Where(e => (string?)e.Attribute("PrivateAssets") != "all")
            .Select(e => (string)e.Attribute("Include")!).Order(System.StringComparer.Ordinal).ToArray();
        Assert.Equal(["MathNet.Numerics", "UnitsNet"], dependencies);
    }

    [Fact]
    public void Build_IsContinuousIntegrationOnCi()
    {
        // Directory.Build.props: ContinuousIntegrationBuild when CI=true, which normalises source paths in the PDB.
        var props = XElement.Load(Path.Combine(ReproducibilityTests.RepoRoot(), "Directory.Build.props"));
        var ci = props.Elements("PropertyGroup").Elements("ContinuousIntegrationBuild").Single();
        Assert.Equal("true", ci.Value);
        Assert.Contains("'$(CI)' == 'true'", (string?)ci.Attribute("Condition"));
    }
}
