using CompressionMembers.Actions;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Timber;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Tests.Timber;

/// <summary>The traced timber results whose reports are snapshot-locked (invented dimensions and loads, for the reports only).</summary>
internal static class TimberReportCases
{
    internal static CheckResult Ec5PureCompression() =>
        Check.EvaluateWithTrace(TimberFixtures.Post(100, 100, 3000, TimberGrades.C24), TimberFixtures.Load(20), ResistanceMethods.Ec5Column);

    internal static CheckResult Ec5CombinedBending() =>
        Check.EvaluateWithTrace(TimberFixtures.Post(140, 280, 3600, TimberGrades.GL28h),
            TimberFixtures.Load(120, LoadDurationClass.ShortTerm).WithEccentricity(Length.FromMillimeters(40), Length.FromMillimeters(10)),
            ResistanceMethods.Ec5ColumnServiceClass2);

    internal static CheckResult Ec5Stocky() =>
        Check.EvaluateWithTrace(TimberFixtures.Post(150, 150, 600, TimberGrades.C24),
            TimberFixtures.Load(100).WithEndMomentsAboutY(Torque.FromKilonewtonMeters(2), Torque.FromKilonewtonMeters(2)), ResistanceMethods.Ec5Column);

    internal static CheckResult Ec5LateralTorsional() =>
        Check.EvaluateWithTrace(TimberFixtures.Post(60, 300, 4000, TimberGrades.C24),
            TimberFixtures.Load(10).WithEndMomentsAboutY(Torque.FromKilonewtonMeters(6), Torque.FromKilonewtonMeters(6)), ResistanceMethods.Ec5Column);

    internal static CheckResult Ec5NationalAnnex() =>
        Check.EvaluateWithTrace(TimberFixtures.Post(100, 100, 3000, TimberGrades.C24), TimberFixtures.Load(20),
            ResistanceMethods.Ec5ColumnWith(ServiceClass.Class1, materialFactor: 1.4));

    private static Member UsPost(double bIn, double dIn, double lIn, NdsTimberMaterial m) =>
        Member.Create(new RectangleSection(Length.FromInches(bIn), Length.FromInches(dIn)), m, Length.FromInches(lIn), Restraint.PinnedBothAxes, "post");

    internal static CheckResult NdsAsdCompression() =>
        Check.EvaluateWithTrace(UsPost(3.5, 3.5, 96, NdsGrades.DouglasFirLarchNo2),
            DesignActions.Compression(Force.FromKilopoundsForce(3)).WithLoadDuration(LoadDurationClass.LongTerm),
            new NdsColumnStability(NdsDesignFormat.Asd, NdsAdjustments.None.WithSize(1.15, 1.5)));

    internal static CheckResult NdsLrfdBiaxial() =>
        Check.EvaluateWithTrace(UsPost(3.5, 7.25, 120, NdsGrades.SprucePineFirNo2),
            DesignActions.Compression(Force.FromKilopoundsForce(6)).WithLoadDuration(LoadDurationClass.MediumTerm)
                .WithEccentricity(Length.FromInches(1.5), Length.FromInches(0.5)),
            ResistanceMethods.NdsColumnLrfd);

    internal static CheckResult FireR60() =>
        Check.EvaluateWithTrace(TimberFixtures.Post(200, 200, 3000, TimberGrades.GL24h), DesignActions.Compression(Force.FromKilonewtons(120)),
            ResistanceMethods.Ec5FireR60);

    internal static CheckResult FireThreeSidesBending() =>
        Check.EvaluateWithTrace(TimberFixtures.Post(140, 240, 2500, TimberGrades.C24),
            DesignActions.Compression(Force.FromKilonewtons(40)).WithEccentricity(Length.FromMillimeters(15), Length.Zero),
            new Ec5FireReducedSection(Duration.FromMinutes(30), FireExposure.ThreeSidesWidthFaceProtected));
}
