using System;

namespace CompressionMembers.Sections;

/// <summary>
/// The computed properties of a cross-section in SI doubles (m, m², m⁴, m⁶). Centroidal reference axes y (horizontal)
/// and z (vertical); principal axes y′, z′ rotated by <see cref="PrincipalAngleRad"/> from them.
/// </summary>
/// <remarks>For a section with no product moment the principal axes are the reference axes (θ = 0). Otherwise
/// y′ is the major principal axis and z′ the minor. Torsion values are NaN where the shape does not give them.</remarks>
internal readonly struct SectionProperties
{
    internal double AreaM2 { get; init; }
    internal double CentroidYM { get; init; }
    internal double CentroidZM { get; init; }
    internal double ReferenceIyM4 { get; init; }
    internal double ReferenceIzM4 { get; init; }
    internal double ReferenceIyzM4 { get; init; }
    internal double PrincipalAngleRad { get; init; }
    internal double IyM4 { get; init; }
    internal double IzM4 { get; init; }
    /// <summary>Largest distance from the y′ axis to a fibre on the +z′ side.</summary>
    internal double FibrePositiveZM { get; init; }
    /// <summary>Largest distance from the y′ axis to a fibre on the −z′ side (positive number).</summary>
    internal double FibreNegativeZM { get; init; }
    internal double FibrePositiveYM { get; init; }
    internal double FibreNegativeYM { get; init; }
    internal double TorsionConstantM4 { get; init; }
    internal double WarpingConstantM6 { get; init; }
    /// <summary>Shear-centre offset from the centroid along y′.</summary>
    internal double ShearCentreYM { get; init; }
    /// <summary>Shear-centre offset from the centroid along z′.</summary>
    internal double ShearCentreZM { get; init; }

    internal static SectionProperties FromReference(
        double area, double yc, double zc, double iy, double iz, double iyz,
        ReadOnlySpan<double> outlineY, ReadOnlySpan<double> outlineZ, double roundRadius,
        double torsion, double warping, double scY, double scZ)
    {
        double theta = 0;
        double scale = Math.Abs(iy) + Math.Abs(iz);
        if (Math.Abs(iyz) > 1e-12 * scale)
            theta = 0.5 * Math.Atan2(-2 * iyz, iy - iz);
        double c = Math.Cos(theta), s = Math.Sin(theta);
        double avg = 0.5 * (iy + iz), half = 0.5 * (iy - iz);
        double ip = avg + half * Math.Cos(2 * theta) - iyz * Math.Sin(2 * theta);
        double iq = avg - half * Math.Cos(2 * theta) + iyz * Math.Sin(2 * theta);
        if (theta == 0) { ip = iy; iq = iz; }

        double pz = 0, nz = 0, py = 0, ny = 0;
        for (int i = 0; i < outlineY.Length; i++)
        {
            double dy = outlineY[i] - yc, dz = outlineZ[i] - zc;
            double yp = dy * c + dz * s, zp = -dy * s + dz * c;
            pz = Math.Max(pz, zp); nz = Math.Max(nz, -zp);
            py = Math.Max(py, yp); ny = Math.Max(ny, -yp);
        }
        if (roundRadius > 0) { pz = nz = py = ny = roundRadius; }

        double dsy = scY - yc, dsz = scZ - zc;
        return new SectionProperties
        {
            AreaM2 = area, CentroidYM = yc, CentroidZM = zc,
            ReferenceIyM4 = iy, ReferenceIzM4 = iz, ReferenceIyzM4 = iyz,
            PrincipalAngleRad = theta, IyM4 = ip, IzM4 = iq,
            FibrePositiveZM = pz, FibreNegativeZM = nz, FibrePositiveYM = py, FibreNegativeYM = ny,
            TorsionConstantM4 = torsion, WarpingConstantM6 = warping,
            ShearCentreYM = dsy * c + dsz * s, ShearCentreZM = -dsy * s + dsz * c,
        };
    }
}
