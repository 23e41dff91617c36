using System;
using CompressionMembers.Methods;
using CompressionMembers.Reporting;
using CompressionMembers.Workflows.Batch;

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

    internal static ScheduleRowResult CheckRow(ScheduleItem item)
    {
        if (!item.IsValid) return new ScheduleRowResult(item, null, item.Error, null);
        try
        {
            var r = CompressionMembers.Check.Evaluate(item.Member!, item.Actions!, item.Method!);
            return new ScheduleRowResult(item, r, null, InputFingerprint.Compute(item.Member!, item.Actions!, item.Method!));
        }
        catch (MethodNotApplicableException ex)
        {
            return new ScheduleRowResult(item, null, $"{item.Method!.Identity.Name} does not apply: {ex.Reason}", null);
        }
        catch (Exception ex) when (ex is not OperationCanceledException)
        {
            // A method that throws (a broken method or a solver that did not converge) still gives the row a reason.
            return new ScheduleRowResult(item, null, $"{item.Method!.Identity.Name} failed: {ex.GetType().Name}: {ex.Message}", null);
        }
    }
}
