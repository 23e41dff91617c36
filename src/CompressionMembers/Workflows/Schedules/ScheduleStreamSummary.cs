using System.Globalization;
using CompressionMembers.Internal;

namespace CompressionMembers.Workflows.Schedules;

/// <summary>What a streamed schedule check did (<see cref="ScheduleChecker.CheckCsvStreaming"/>): the rows read, the
/// result lines written, and how many rows passed, failed or became error rows.</summary>
/// <remarks>
/// <para>Every row read becomes exactly one result line: <see cref="RowsWritten"/> equals <see cref="RowsRead"/> and the
/// three counts add up to it, which <see cref="AllRowsAccountedFor"/> states in one word. Counts are 64-bit, so a
/// schedule of any length can be counted.</para>
/// <para>Thread safety: immutable reference type.</para>
/// </remarks>
[Immutable]
public sealed class ScheduleStreamSummary
{
    internal ScheduleStreamSummary(long rowsRead, long rowsWritten, long passed, long failed, long errors)
    {
        RowsRead = rowsRead;
        RowsWritten = rowsWritten;
        PassedCount = passed;
        FailedCount = failed;
        ErrorCount = errors;
    }

    /// <summary>Data rows read from the schedule (comment and blank lines and the header are not rows).</summary>
    public long RowsRead { get; }

    /// <summary>Result lines written after the header.</summary>
    public long RowsWritten { get; }

    /// <summary>Rows checked with a utilisation of at most 1.</summary>
    public long PassedCount { get; }

    /// <summary>Rows checked with a utilisation above 1.</summary>
    public long FailedCount { get; }

    /// <summary>Rows that could not be read or checked; each has its reason in the results.</summary>
    public long ErrorCount { get; }

    /// <summary>Whether every row read has exactly one result line and one status.</summary>
    public bool AllRowsAccountedFor => RowsWritten == RowsRead && PassedCount + FailedCount + ErrorCount == RowsRead;

    /// <summary>The counts in one line, such as "1000000 rows: 998000 passed, 1000 failed, 1000 errors".</summary>
    /// <returns>The text, invariant culture.</returns>
    public override string ToString() => string.Create(CultureInfo.InvariantCulture,
        $"{RowsRead} rows: {PassedCount} passed, {FailedCount} failed, {ErrorCount} errors");
}
