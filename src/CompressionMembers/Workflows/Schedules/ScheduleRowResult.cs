using CompressionMembers.Internal;
using CompressionMembers.Results;

namespace CompressionMembers.Workflows.Schedules;

/// <summary>The outcome of one schedule row: its check result, or an explicit error with the reason.</summary>
/// <remarks>Thread safety: immutable reference type.</remarks>
[Immutable]
public sealed class ScheduleRowResult
{
    internal ScheduleRowResult(ScheduleItem item, CheckResult? result, string? error, string? fingerprint)
    {
        Item = item;
        Result = result;
        Error = error;
        Fingerprint = fingerprint ?? "";
    }

    /// <summary>The row as read.</summary>
    public ScheduleItem Item { get; }

    /// <summary>The check result, or null for an error row.</summary>
    public CheckResult? Result { get; }

    /// <summary>Why the row has no result, or null.</summary>
    public string? Error { get; }

    /// <summary>The input fingerprint of the check ("" for an error row).</summary>
    public string Fingerprint { get; }

    /// <summary>The row in one line: where it stands, then its result (<see cref="CheckResult.ToString"/>) or its error.</summary>
    /// <returns>Such as <c>line 4: C1: utilisation 0.7676, passes; …</c> or <c>line 5: error: …</c>.</returns>
    public override string ToString() => Result is { } r ? $"{Item.Location}: {r}" : $"{Item.Location}: error: {Error}";

    /// <summary>Passed, failed or error.</summary>
    public RowStatus Status => Result is { } r ? (r.Passed ? RowStatus.Passed : RowStatus.Failed) : RowStatus.Error;
}
