using CompressionMembers.Actions;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Members;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Tests.Aluminium;

/// <summary>Aluminium members shared by the tests. Dimensions are invented for the tests (not from any catalogue).</summary>
public static class AluminiumCases
{
    public static AluminiumAlloy A6082T6 => AluminiumAlloys.EnAw6082T6Extrusion;

    public static Length Mm(double v) => Length.FromMillimeters(v);

    public static Member Pinned(Section s, AluminiumAlloy alloy, double lengthMm, string name = "aluminium strut") =>
        Member.Create(s, alloy, Mm(lengthMm), Restraint.PinnedBothAxes, name);

    /// <summary>Square tube 100 × 100 × 5 (walls b/t = 18: class 3 for class A unwelded).</summary>
    public static RectangularHollowSection Rhs100x5 => new(Mm(100), Mm(100), Mm(5));

    /// <summary>Square tube 150 × 150 × 3 (walls b/t = 48: class 4).</summary>
    public static RectangularHollowSection Rhs150x3 => new(Mm(150), Mm(150), Mm(3));

    /// <summary>Unequal angle 80 × 40 × 4: no axis of symmetry in the principal frame offsets, flexural-torsional at short length.</summary>
    public static AngleSection Angle80x40x4 => new(Mm(80), Mm(40), Mm(4));

    public static DesignActions Kn(double kn) => DesignActions.Compression(Force.FromKilonewtons(kn));
}
