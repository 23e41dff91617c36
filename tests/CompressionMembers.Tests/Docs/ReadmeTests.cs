using System;
using System.IO;
using System.Text.RegularExpressions;

namespace CompressionMembers.Tests.Docs;

/// <summary>Docs that run: the README's quick start is the script samples/scripts/quick-start.cs, which CI runs.</summary>
public class ReadmeTests
{
    private static string Root()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "CompressionMembers.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("repository root not found");
    }

    [Fact]
    public void QuickStart_IsTheScriptThatCiRuns()
    {
        string readme = File.ReadAllText(Path.Combine(Root(), "README.md"));
        var block = Regex.Match(readme, "```csharp\n(.*?)```", RegexOptions.Singleline);
        Assert.True(block.Success, "README has a C# quick start");
        string script = File.ReadAllText(Path.Combine(Root(), "samples", "scripts", "quick-start.cs"));
        Assert.Contains(block.Groups[1].Value, script);
    }

    [Fact]
    public void Readme_CarriesTheCautionAndTheTwoCommands()
    {
        string readme = File.ReadAllText(Path.Combine(Root(), "README.md"));
        Assert.Contains("licensed structural engineer", readme);
        Assert.Contains("dotnet run --project samples/Demo", readme);
        Assert.Contains("dotnet test CompressionMembers.sln", readme);
    }
}
