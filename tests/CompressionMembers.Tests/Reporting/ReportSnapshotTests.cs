using ApprovalTests;
using CompressionMembers.Reporting;

namespace CompressionMembers.Tests.Reporting;

/// <summary>Locks the text of each report. A failing snapshot prints a line diff and how to accept the new text.</summary>
public class ReportSnapshotTests
{
    [Fact] public void Text_EulerSlenderRod() => Approvals.Verify(TextReport.Render(ReportCases.EulerSlenderRod()));
    [Fact] public void Text_EulerStockyBlock_SquashGoverns() => Approvals.Verify(TextReport.Render(ReportCases.EulerStockyBlock()));
    [Fact] public void Text_JohnsonTube_RecommendedK() => Approvals.Verify(TextReport.Render(ReportCases.JohnsonTube()));
    [Fact] public void Text_AngleAboutMinorPrincipalAxis() => Approvals.Verify(TextReport.Render(ReportCases.AngleMinorAxis()));
    [Fact] public void Text_SecantEccentric() => Approvals.Verify(TextReport.Render(ReportCases.SecantEccentric()));
    [Fact] public void Text_SecantBiaxial() => Approvals.Verify(TextReport.Render(ReportCases.SecantBiaxial()));
    [Fact] public void Text_PerryRobertsonBowFromActions() => Approvals.Verify(TextReport.Render(ReportCases.PerryBowed()));
    [Fact] public void Text_PerryRobertsonDefaultChannel() => Approvals.Verify(TextReport.Render(ReportCases.PerryRobertsonDefault()));
    [Fact] public void Text_BracedWeakAxisDoesNotGovern() => Approvals.Verify(TextReport.Render(ReportCases.BracedWeakAxisNotGoverning()));
    [Fact] public void Text_FailingUntraced() => Approvals.Verify(TextReport.Render(ReportCases.FailingUntraced()));
    [Fact] public void Markdown_SecantEccentric() => Approvals.Verify(MarkdownReport.Render(ReportCases.SecantEccentric()));
}
