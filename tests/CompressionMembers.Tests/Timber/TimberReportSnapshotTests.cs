using ApprovalTests;
using CompressionMembers.Reporting;

namespace CompressionMembers.Tests.Timber;

/// <summary>Locks the text of each timber report; a failing snapshot prints a line diff and how to accept it.</summary>
public class TimberReportSnapshotTests
{
    [Fact] public void Text_Ec5PureCompression() => Approvals.Verify(TextReport.Render(TimberReportCases.Ec5PureCompression()));
    [Fact] public void Text_Ec5CombinedBending() => Approvals.Verify(TextReport.Render(TimberReportCases.Ec5CombinedBending()));
    [Fact] public void Text_Ec5StockyBending() => Approvals.Verify(TextReport.Render(TimberReportCases.Ec5Stocky()));
    [Fact] public void Text_Ec5LateralTorsional() => Approvals.Verify(TextReport.Render(TimberReportCases.Ec5LateralTorsional()));
    [Fact] public void Text_Ec5NationalAnnexGammaM() => Approvals.Verify(TextReport.Render(TimberReportCases.Ec5NationalAnnex()));
    [Fact] public void Text_NdsAsdCompression() => Approvals.Verify(TextReport.Render(TimberReportCases.NdsAsdCompression()));
    [Fact] public void Text_NdsAsdCompressionInUsUnits() => Approvals.Verify(TextReport.Render(TimberReportCases.NdsAsdCompression(), ReportUnits.UsCustomary));
    [Fact] public void Markdown_NdsLrfdBiaxialInUsUnits() => Approvals.Verify(MarkdownReport.Render(TimberReportCases.NdsLrfdBiaxial(), ReportUnits.UsCustomary));
    [Fact] public void Text_NdsLrfdBiaxial() => Approvals.Verify(TextReport.Render(TimberReportCases.NdsLrfdBiaxial()));
    [Fact] public void Text_FireR60() => Approvals.Verify(TextReport.Render(TimberReportCases.FireR60()));
    [Fact] public void Text_FireThreeSidesBending() => Approvals.Verify(TextReport.Render(TimberReportCases.FireThreeSidesBending()));
    [Fact] public void Markdown_Ec5CombinedBending() => Approvals.Verify(MarkdownReport.Render(TimberReportCases.Ec5CombinedBending()));
}
