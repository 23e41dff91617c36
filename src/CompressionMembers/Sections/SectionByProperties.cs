using System;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Sections;

/// <summary>A section given directly by its properties about its principal axes (from a catalogue or another program
/// of the user's).</summary>
/// <remarks>
/// The values are checked for plausibility: each second moment must not exceed A·c² for its extreme-fibre distance c,
/// which every real section satisfies (I = ∫z² dA ≤ A·max z²). Torsion, warping and shear centre are optional; without
/// them torsional methods refuse the section. Thread safety: immutable reference type.
/// </remarks>
[Immutable]
public sealed class SectionByProperties : Section
{
    /// <summary>Creates a section from its properties.</summary>
    /// <param name="designation">A name for reports.</param>
    /// <param name="area">Area A.</param>
    /// <param name="secondMomentY">Second moment about the principal axis y.</param>
    /// <param name="secondMomentZ">Second moment about the principal axis z.</param>
    /// <param name="extremeFibreZ">Distance from the y axis to the farthest fibre (for bending about y).</param>
    /// <param name="extremeFibreY">Distance from the z axis to the farthest fibre (for bending about z).</param>
    /// <param name="torsionConstant">St Venant torsion constant It, if known.</param>
    /// <param name="warpingConstantMm6">Warping constant Iw in mm⁶, if known.</param>
    /// <param name="shearCentreOffsetY">Shear-centre offset from the centroid along y, if the section has one.</param>
    /// <param name="shearCentreOffsetZ">Shear-centre offset from the centroid along z, if the section has one.</param>
    /// <exception cref="ArgumentException">The designation is empty, or a second moment exceeds A·c².</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or not positive.</exception>
    public SectionByProperties(string designation, Area area, AreaMomentOfInertia secondMomentY, AreaMomentOfInertia secondMomentZ,
        Length extremeFibreZ, Length extremeFibreY, AreaMomentOfInertia? torsionConstant = null, double? warpingConstantMm6 = null,
        Length? shearCentreOffsetY = null, Length? shearCentreOffsetZ = null)
        : base(Compute(designation, area, secondMomentY, secondMomentZ, extremeFibreZ, extremeFibreY, torsionConstant, warpingConstantMm6, shearCentreOffsetY, shearCentreOffsetZ))
    {
        Name = designation;
    }

    /// <summary>The designation given at construction.</summary>
    public string Name { get; }

    /// <inheritdoc/>
    public override SectionKind Kind => SectionKind.ByProperties;

    /// <inheritdoc/>
    public override string Designation => Name;

    private static SectionProperties Compute(string designation, Area area, AreaMomentOfInertia secondMomentY, AreaMomentOfInertia secondMomentZ,
        Length extremeFibreZ, Length extremeFibreY, AreaMomentOfInertia? torsionConstant, double? warpingConstantMm6, Length? shearCentreOffsetY, Length? shearCentreOffsetZ)
    {
        if (string.IsNullOrWhiteSpace(designation))
            throw new ArgumentException("Section designation must not be empty.", nameof(designation));
        double a = Si.SquareMeters(area, nameof(area), "Area");
        double iy = Si.MetersToFourth(secondMomentY, nameof(secondMomentY), "Second moment about y");
        double iz = Si.MetersToFourth(secondMomentZ, nameof(secondMomentZ), "Second moment about z");
        double cz = Si.Meters(extremeFibreZ, nameof(extremeFibreZ), "Extreme-fibre distance for bending about y");
        double cy = Si.Meters(extremeFibreY, nameof(extremeFibreY), "Extreme-fibre distance for bending about z");
        if (iy > a * cz * cz * (1 + 1e-12))
            throw new ArgumentException($"Second moment about y ({Si.Given(secondMomentY)}) cannot exceed A·c² = {Guard.Show(a * cz * cz * 1e12)} mm⁴ for the given area and extreme fibre.", nameof(secondMomentY));
        if (iz > a * cy * cy * (1 + 1e-12))
            throw new ArgumentException($"Second moment about z ({Si.Given(secondMomentZ)}) cannot exceed A·c² = {Guard.Show(a * cy * cy * 1e12)} mm⁴ for the given area and extreme fibre.", nameof(secondMomentZ));
        double it = torsionConstant is { } t ? Si.MetersToFourth(t, nameof(torsionConstant), "Torsion constant") : double.NaN;
        double iw = warpingConstantMm6 is { } w ? Guard.NonNegative(w, nameof(warpingConstantMm6), "mm⁶", "Warping constant") * 1e-18 : double.NaN;
        double sy = shearCentreOffsetY is { } sy0 ? Si.Meters(sy0, nameof(shearCentreOffsetY), "Shear-centre offset y", Si.Sign.Any) : (it > 0 ? 0 : double.NaN);
        double sz = shearCentreOffsetZ is { } sz0 ? Si.Meters(sz0, nameof(shearCentreOffsetZ), "Shear-centre offset z", Si.Sign.Any) : (it > 0 ? 0 : double.NaN);
        return new SectionProperties
        {
            AreaM2 = a, ReferenceIyM4 = iy, ReferenceIzM4 = iz, IyM4 = iy, IzM4 = iz,
            FibrePositiveZM = cz, FibreNegativeZM = cz, FibrePositiveYM = cy, FibreNegativeYM = cy,
            TorsionConstantM4 = it, WarpingConstantM6 = iw, ShearCentreYM = sy, ShearCentreZM = sz,
        };
    }

    internal override void AddCanonical(CanonicalForm form) =>
        form.Add("section.kind", Kind.ToString()).Add("section.name", Name).Add("section.A", Props.AreaM2)
            .Add("section.Iy", Props.IyM4).Add("section.Iz", Props.IzM4).Add("section.cz", Props.FibrePositiveZM)
            .Add("section.cy", Props.FibrePositiveYM).Add("section.It", Props.TorsionConstantM4).Add("section.Iw", Props.WarpingConstantM6)
            .Add("section.scy", Props.ShearCentreYM).Add("section.scz", Props.ShearCentreZM);
}
