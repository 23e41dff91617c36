using ApprovalTests;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Aluminium;
using CompressionMembers.Reporting;
using static CompressionMembers.Tests.Aluminium.AluminiumCases;

namespace CompressionMembers.Tests.Aluminium;

/// <summary>Text reports of the aluminium methods, locked by snapshots (inputs invented for the tests).</summary>
public class AluminiumReportTests
{
    [Fact]
    public void Text_Ec9_TubeClass3_Flexural() =>
        Approvals.Verify(TextReport.Render(Check.EvaluateWithTrace(Pinned(Rhs100x5, A6082T6, 3000, "tube strut"), Kn(100), ResistanceMethods.Eurocode9)));

    [Fact]
    public void Text_Ec9_TubeClass4_EffectiveSection() =>
        Approvals.Verify(TextReport.Render(Check.EvaluateWithTrace(Pinned(Rhs150x3, A6082T6, 3000, "thin tube strut"), Kn(100), ResistanceMethods.Eurocode9)));

    [Fact]
    public void Text_Ec9_TubeLongitudinalWelds() =>
        Approvals.Verify(TextReport.Render(Check.EvaluateWithTrace(Pinned(Rhs100x5, A6082T6, 3000, "welded tube strut"), Kn(100),
            ResistanceMethods.Eurocode9With(AluminiumWelding.LongitudinalSeams(WeldingProcess.Mig, 2, Mm(5))))));

    [Fact]
    public void Text_Ec9_TubeEndWelds() =>
        Approvals.Verify(TextReport.Render(Check.EvaluateWithTrace(Pinned(Rhs100x5, A6082T6, 500, "short strut with end plates"), Kn(100),
            ResistanceMethods.Eurocode9With(AluminiumWelding.AtEnds(WeldingProcess.Mig)))));

    [Fact]
    public void Text_Ec9_UnequalAngle_FlexuralTorsional() =>
        Approvals.Verify(TextReport.Render(Check.EvaluateWithTrace(Pinned(Angle80x40x4, A6082T6, 500, "angle brace"), Kn(20), ResistanceMethods.Eurocode9)));

    [Fact]
    public void Text_Ec9_TubeBiaxialBending() =>
        Approvals.Verify(TextReport.Render(Check.EvaluateWithTrace(Pinned(Rhs100x5, A6082T6, 3000, "eccentric post"),
            Kn(50).WithEccentricity(Mm(20), Mm(10)), ResistanceMethods.Eurocode9)));

    [Fact]
    public void Text_BucklingConstants_Lrfd() =>
        Approvals.Verify(TextReport.Render(Check.EvaluateWithTrace(Pinned(Rhs100x5, A6082T6, 1500, "tube strut"), Kn(100), ResistanceMethods.AluminiumBucklingConstantsLrfd)));

    [Fact]
    public void Text_TangentModulus_RambergOsgood() =>
        Approvals.Verify(TextReport.Render(Check.EvaluateWithTrace(Pinned(Rhs100x5, A6082T6, 1500, "tube strut"), Kn(100), ResistanceMethods.TangentModulusRambergOsgood)));

    [Fact]
    public void Markdown_EveryAluminiumMethod_RendersWithTheGoverningCheck()
    {
        IResistanceMethod[] methods =
        [
            ResistanceMethods.Eurocode9, ResistanceMethods.Eurocode9With(AluminiumWelding.AtEnds(WeldingProcess.Tig)),
            ResistanceMethods.AluminiumBucklingConstantsAsd, ResistanceMethods.TangentModulusRambergOsgood,
        ];
        foreach (var m in methods)
        {
            var r = Check.EvaluateWithTrace(Pinned(Rhs100x5, A6082T6, 2000, "tube strut"), Kn(50), m);
            string md = MarkdownReport.Render(r);
            Assert.Contains(r.GoverningCheck, md);
            Assert.Contains(m.Identity.Name, md);
        }
    }

    [Fact]
    public void Fingerprint_ChangesWithWelding()
    {
        var member = Pinned(Rhs100x5, A6082T6, 2000);
        string plain = InputFingerprint.Compute(member, Kn(50), ResistanceMethods.Eurocode9);
        string welded = InputFingerprint.Compute(member, Kn(50), ResistanceMethods.Eurocode9With(AluminiumWelding.AtEnds(WeldingProcess.Mig)));
        Assert.NotEqual(plain, welded);
    }
}
