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

    /// <summary>Passed, failed or error.</summary>
    public RowStatus Status => Result is { } r ? (r.Passed ? RowStatus.Passed : RowStatus.Failed) : RowStatus.Error;
}
