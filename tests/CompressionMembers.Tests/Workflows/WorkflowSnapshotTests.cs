using System.IO;
using System.Linq;
using ApprovalTests;
using CompressionMembers.Methods;
using CompressionMembers.Tests.Support;
using CompressionMembers.Workflows.Batch;
using CompressionMembers.Workflows.Catalogues;
using CompressionMembers.Workflows.Schedules;
using CompressionMembers.Workflows.Tables;
using UnitsNet;

namespace CompressionMembers.Tests.Workflows;

/// <summary>Locks the text of the workflow outputs: the boathouse schedule's results CSV and combined report, and a
/// capacity table. A change to any of them is a changed calculation or layout; read the diff before accepting.</summary>
public class WorkflowSnapshotTests
{
    private static ScheduleOutcome Boathouse() =>
        ScheduleChecker.Check(MemberSchedule.ReadCsv(new StringReader(File.ReadAllText(ScheduleTests.BoathousePath())), "boathouse-schedule.csv"), new BatchOptions(2));

    [Fact] public void Schedule_BoathouseResultsCsv() => Approvals.Verify(Boathouse().ToCsv());

    [Fact] public void Schedule_BoathouseReport() => Approvals.Verify(Boathouse().RenderReport(detailLimit: 2));

    [Fact]
    public void CapacityTable_SquareTubesJohnson() => Approvals.Verify(CapacityTable.Compute(
        SectionCatalogues.AluminiumGenericShapes.OnlyFamily("SHS").Entries.Take(6), Fixtures.Steel, ResistanceMethods.Johnson,
        new[] { 1.0, 2.0, 3.0, 4.0 }.Select(m => Length.FromMeters(m))).ToMarkdown());
}
