using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Tests.Support;

/// <summary>Shared test members. The generic steel (E = 200 GPa, fy = 250 MPa) is a check material of common practice.</summary>
public static class Fixtures
{
    public static IsotropicMaterial Steel => IsotropicMaterial.GenericStructuralSteel;

    public static Member PinnedBar(double widthMm, double depthMm, double lengthMm, Material? material = null) =>
        Member.Create(new RectangleSection(Length.FromMillimeters(widthMm), Length.FromMillimeters(depthMm)),
            material ?? Steel, Length.FromMillimeters(lengthMm), Restraint.PinnedBothAxes, "test bar");
}
