using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Tests.Timber;

/// <summary>Shared timber test members and actions (dimensions chosen for the tests; no published source).</summary>
internal static class TimberFixtures
{
    internal static Member Post(double bMm, double hMm, double lengthMm, Material material, Restraint? restraint = null) =>
        Member.Create(new RectangleSection(Length.FromMillimeters(bMm), Length.FromMillimeters(hMm)), material,
            Length.FromMillimeters(lengthMm), restraint ?? Restraint.PinnedBothAxes, "test post");

    internal static Member Round(double dMm, double lengthMm, Material material) =>
        Member.Create(new CircleSection(Length.FromMillimeters(dMm)), material, Length.FromMillimeters(lengthMm), Restraint.PinnedBothAxes, "test pole");

    internal static DesignActions Load(double kN, LoadDurationClass d = LoadDurationClass.MediumTerm) =>
        DesignActions.Compression(Force.FromKilonewtons(kN)).WithLoadDuration(d);

    /// <summary>Hand formula of EN 1995-1-1 (6.25)–(6.28), written out again here independently of the library.</summary>
    internal static double HandKc(double lambdaRel, double betaC)
    {
        if (lambdaRel <= 0.3) return 1.0;
        double k = 0.5 * (1 + betaC * (lambdaRel - 0.3) + lambdaRel * lambdaRel);
        return 1 / (k + System.Math.Sqrt(k * k - lambdaRel * lambdaRel));
    }
}
