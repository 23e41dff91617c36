using System;
using System.IO;
using System.Linq;
using System.Text;
using ApprovalTests.Core;
using Xunit.Sdk;

namespace CompressionMembers.Tests.Support;

/// <summary>
/// Fails the test with a readable line diff between the approved and the received snapshot, and says how to accept
/// the new one (ApprovalTests' own diff reporter only looks for a desktop diff tool).
/// </summary>
public sealed class LineDiffReporter : IApprovalFailureReporter
{
    public void Report(string approved, string received)
    {
        var a = File.Exists(approved) ? File.ReadAllLines(approved) : [];
        var r = File.ReadAllLines(received);
        var sb = new StringBuilder();
        sb.AppendLine($"Snapshot differs: {Path.GetFileName(approved)}");
        int shown = 0;
        for (int i = 0; i < Math.Max(a.Length, r.Length) && shown < 40; i++)
        {
            string? x = i < a.Length ? a[i] : null, y = i < r.Length ? r[i] : null;
            if (x == y) continue;
            shown++;
            if (x is not null) sb.AppendLine($"  line {i + 1} approved: {x}");
            if (y is not null) sb.AppendLine($"  line {i + 1} received: {y}");
        }
        if (!File.Exists(approved)) sb.AppendLine("  (no approved file yet)");
        sb.AppendLine("To accept the received output, run:");
        sb.AppendLine($"  mv \"{Rel(received)}\" \"{Rel(approved)}\"");
        sb.AppendLine("or accept every pending snapshot: sh tests/accept-snapshots.sh");
        throw new XunitException(sb.ToString());
    }

    private static string Rel(string path)
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "CompressionMembers.sln"))) dir = dir.Parent;
        return dir is null ? path : Path.GetRelativePath(dir.FullName, path);
    }
}
