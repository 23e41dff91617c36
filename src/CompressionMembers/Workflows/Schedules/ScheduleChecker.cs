using System;
using System.IO;
using CompressionMembers.Methods;
using CompressionMembers.Reporting;
using CompressionMembers.Results;
using CompressionMembers.Workflows.Batch;
using CompressionMembers.Workflows.Registry;

namespace CompressionMembers.Workflows.Schedules;

/// <summary>Checks every row of a member schedule, across cores, with results in input order.</summary>
/// <remarks>A row that cannot be checked (unreadable, or the method does not apply) gives an error row with the reason;
/// no row is dropped. Thread safety: stateless.</remarks>
public static class ScheduleChecker
{
    /// <summary>Checks a schedule.</summary>
    /// <param name="schedule">The schedule.</param>
    /// <param name="options">Cores, progress and cancellation.</param>
    /// <returns>One result per row, in order.</returns>
    /// <exception cref="ArgumentNullException">The schedule is null.</exception>
    /// <exception cref="OperationCanceledException">The run was cancelled.</exception>
    public static ScheduleOutcome Check(MemberSchedule schedule, BatchOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(schedule);
        var rows = BatchEvaluator.Run(schedule.Items, (item, _) => CheckRow(item), options);
        return new ScheduleOutcome(schedule, rows);
    }

    /// <summary>Checks a CSV schedule as it is read, writing the results CSV as it goes, in memory that does not grow with
    /// the number of rows: for schedules too large to hold (a million rows and more).</summary>
    /// <remarks>
    /// <para>Rows are read in chunks of a fixed size (2,048 rows); each chunk is checked across cores and its result lines
    /// are written in input order. The results are the same bytes as <see cref="Check"/> followed by
    /// <see cref="ScheduleOutcome.WriteCsv"/> on the same schedule, whatever the number of cores. Every row read becomes
    /// one result line (an error row with its reason if it cannot be read or checked); the summary counts them.</para>
    /// <para>Each distinct material, section and method text is resolved once per run (at most 256 of each are
    /// remembered per slice of a chunk, so memory stays bounded for any input).</para>
    /// <para>Progress is reported after each chunk is written: <see cref="BatchProgress.Completed"/> is the rows written
    /// so far and <see cref="BatchProgress.Total"/> the rows read so far (the length of a stream is not known until its
    /// end; both stop at <see cref="int.MaxValue"/>). On cancellation, the results hold the chunks written before it.</para>
    /// <para>There is no combined text report here (<see cref="ScheduleOutcome.RenderReport"/> needs every row); JSON
    /// schedules, limited to 64 MiB, are read whole with <see cref="MemberSchedule.ReadJson"/>.</para>
    /// </remarks>
    /// <param name="schedule">The CSV schedule (docs/schedule-format.md), read once from its current position.</param>
    /// <param name="results">Where the results CSV is written; flushed at the end, not closed.</param>
    /// <param name="registry">Names of materials, methods and catalogues; <see cref="NameRegistry.Default"/> if null.</param>
    /// <param name="options">Cores, progress and cancellation; <see cref="BatchOptions.Default"/> if null.</param>
    /// <returns>The counts: rows read, result lines written, passed, failed, errors.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="schedule"/> or <paramref name="results"/> is null.</exception>
    /// <exception cref="FormatException">The header is wrong (nothing is written then), or a record is longer than
    /// 1 MiB (an unclosed quote?): every row before it has been checked and written, and the message names its line.</exception>
    /// <exception cref="OperationCanceledException">The run was cancelled.</exception>
    public static ScheduleStreamSummary CheckCsvStreaming(TextReader schedule, TextWriter results, NameRegistry? registry = null, BatchOptions? options = null) =>
        CheckCsvStreamingInChunks(schedule, results, registry, options, StreamedScheduleCheck.DefaultChunkRows);

    /// <summary><see cref="CheckCsvStreaming(TextReader, TextWriter, NameRegistry?, BatchOptions?)"/> with a chosen chunk
    /// size (tests use small chunks to put chunk boundaries everywhere).</summary>
    internal static ScheduleStreamSummary CheckCsvStreamingInChunks(TextReader schedule, TextWriter results, NameRegistry? registry, BatchOptions? options, int chunkRows)
    {
        ArgumentNullException.ThrowIfNull(schedule);
        ArgumentNullException.ThrowIfNull(results);
        ArgumentOutOfRangeException.ThrowIfLessThan(chunkRows, 1);
        return StreamedScheduleCheck.Run(schedule, results, registry ?? NameRegistry.Default, options ?? BatchOptions.Default, chunkRows);
    }

    internal static ScheduleRowResult CheckRow(ScheduleItem item)
    {
        var result = CheckRow(item, out var error, out var fingerprint);
        return new ScheduleRowResult(item, result, error, fingerprint);
    }

    /// <summary>Checks one row: its result and fingerprint, or the reason it has none.</summary>
    internal static CheckResult? CheckRow(ScheduleItem item, out string? error, out string? fingerprint)
    {
        fingerprint = null;
        error = item.Error;
        if (!item.IsValid) return null;
        try
        {
            // A method that does not apply gives the row its reason without an exception: a schedule may hold many such
            // rows, and throwing and catching one per row cost more than checking it (a dotnet-trace profile of a
            // 10,000-row schedule; docs/performance.md). Check asks again, which costs a test.
            var verdict = item.Method!.AppliesTo(item.Member!.Resolved, item.Actions!.Resolved);
            if (!verdict.IsApplicable)
            {
                error = $"{item.Method.Identity.Name} does not apply: {verdict.Reason}";
                return null;
            }
            var r = CompressionMembers.Check.Evaluate(item.Member!, item.Actions!, item.Method!);
            fingerprint = InputFingerprint.Compute(item.Member!, item.Actions!, item.Method!);
            return r;
        }
        catch (MethodNotApplicableException ex)   // a method whose Evaluate refuses what its AppliesTo admitted
        {
            error = $"{item.Method!.Identity.Name} does not apply: {ex.Reason}";
            return null;
        }
        catch (Exception ex) when (ex is not OperationCanceledException)
        {
            // A method that throws (a broken method or a solver that did not converge) still gives the row a reason.
            error = $"{item.Method!.Identity.Name} failed: {ex.GetType().Name}: {ex.Message}";
            return null;
        }
    }
}
