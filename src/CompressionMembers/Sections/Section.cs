using System;
using System.Globalization;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Sections;

/// <summary>
/// A member cross-section and the properties stability needs: area, second moments about the centroidal reference
/// axes and the principal axes, radii of gyration, elastic section moduli to each extreme fibre, the St Venant
/// torsion constant, the warping constant and the shear-centre offset.
/// </summary>
/// <remarks>
/// <para>Axes: y is the horizontal and z the vertical reference axis through the centroid. For a section with no
/// product moment of area (every doubly or singly symmetric shape drawn on its axis of symmetry) the principal axes
/// are y and z themselves. Otherwise (angles, general polygons) the principal axes y′ and z′ are turned by
/// <see cref="PrincipalAxisAngle"/> from y and z, y′ being the major axis (u–u) and z′ the minor axis (v–v); the
/// "Y" and "Z" properties below are always about the principal axes.</para>
/// <para>Open thin-walled shapes (channel, angle, tee) take their torsion and warping constants and shear centre
/// from the thin-walled (centre-line) formulas; closed and solid shapes neglect warping (Iw = 0).</para>
/// <para>Thread safety: immutable reference type; safe to share between threads.</para>
/// </remarks>
[Immutable]
public abstract class Section
{
    private protected static readonly CultureInfo Inv = CultureInfo.InvariantCulture;
    internal readonly SectionProperties Props;

    private protected Section(in SectionProperties props)
    {
        // Dimensions that are each valid can still be too large or too small for their powers to be represented
        // (a 1e200 m plate has no finite I): refuse a section whose properties are not finite, positive numbers.
        if (!Usable(props.AreaM2) || !Usable(props.IyM4) || !Usable(props.IzM4)
            || !Usable(props.FibrePositiveZM + props.FibreNegativeZM) || !Usable(props.FibrePositiveYM + props.FibreNegativeYM))
            throw Unrepresentable("dimensions",
                $"The section's dimensions give properties that cannot be represented (A = {Guard.Show(props.AreaM2)} m², Iy = {Guard.Show(props.IyM4)} m⁴, Iz = {Guard.Show(props.IzM4)} m⁴); use dimensions between about 1e-6 m and 1e6 m.");
        Props = props;
    }

    /// <summary>The EN 1999-1-1 classifications of this section, one per alloy and welding, computed on first use and
    /// published atomically (see <c>Ec9ClassificationCache</c>). A memo of values that follow from the immutable section
    /// alone: it never changes what the section is or reports.</summary>
    internal Methods.Aluminium.Ec9SectionEntry[]? Ec9Entries;

    private static ArgumentOutOfRangeException Unrepresentable(string paramName, string message) => new(paramName, message);

    private static bool Usable(double v) => double.IsFinite(v) && v > 0 && double.IsNormal(v);

    /// <summary>The shape family.</summary>
    public abstract SectionKind Kind { get; }

    /// <summary>A short description with the dimensions in the caller's units, such as "rectangle 140 × 90 mm".</summary>
    public abstract string Designation { get; }

    /// <summary>Whether the section is an open thin-walled shape whose torsional values come from centre-line formulas.</summary>
    public virtual bool IsThinWalledOpen => false;

    /// <summary>Cross-sectional area, A.</summary>
    public Area Area => Area.FromSquareMillimeters(Props.AreaM2 * 1e6);

    /// <summary>Second moment of area about the principal axis y (the major axis where the section is unsymmetric).</summary>
    public AreaMomentOfInertia SecondMomentY => Mm4(Props.IyM4);

    /// <summary>Second moment of area about the principal axis z (the minor axis where the section is unsymmetric).</summary>
    public AreaMomentOfInertia SecondMomentZ => Mm4(Props.IzM4);

    /// <summary>Second moment of area about the centroidal horizontal reference axis (before rotation to principal axes).</summary>
    public AreaMomentOfInertia ReferenceSecondMomentY => Mm4(Props.ReferenceIyM4);

    /// <summary>Second moment of area about the centroidal vertical reference axis (before rotation to principal axes).</summary>
    public AreaMomentOfInertia ReferenceSecondMomentZ => Mm4(Props.ReferenceIzM4);

    /// <summary>Product moment of area about the centroidal reference axes, ∫ y z dA (may be negative).</summary>
    public AreaMomentOfInertia ReferenceProductMoment => Mm4(Props.ReferenceIyzM4);

    /// <summary>The angle from the reference axis y to the principal axis y (zero for sections with no product moment).</summary>
    public Angle PrincipalAxisAngle => Angle.FromDegrees(Props.PrincipalAngleRad * 180 / Math.PI);

    /// <summary>Radius of gyration about the principal axis y, √(Iy/A).</summary>
    public Length RadiusOfGyrationY => Length.FromMillimeters(Math.Sqrt(Props.IyM4 / Props.AreaM2) * 1e3);

    /// <summary>Radius of gyration about the principal axis z, √(Iz/A).</summary>
    public Length RadiusOfGyrationZ => Length.FromMillimeters(Math.Sqrt(Props.IzM4 / Props.AreaM2) * 1e3);

    /// <summary>Elastic section modulus about y to the extreme fibre on the +z side, Iy / z+.</summary>
    public Volume SectionModulusYPositive => Mm3(Props.IyM4 / Props.FibrePositiveZM);

    /// <summary>Elastic section modulus about y to the extreme fibre on the −z side, Iy / z−.</summary>
    public Volume SectionModulusYNegative => Mm3(Props.IyM4 / Props.FibreNegativeZM);

    /// <summary>Elastic section modulus about z to the extreme fibre on the +y side, Iz / y+.</summary>
    public Volume SectionModulusZPositive => Mm3(Props.IzM4 / Props.FibrePositiveYM);

    /// <summary>Elastic section modulus about z to the extreme fibre on the −y side, Iz / y−.</summary>
    public Volume SectionModulusZNegative => Mm3(Props.IzM4 / Props.FibreNegativeYM);

    /// <summary>The smaller elastic section modulus about y.</summary>
    public Volume SectionModulusY => Mm3(Props.IyM4 / Math.Max(Props.FibrePositiveZM, Props.FibreNegativeZM));

    /// <summary>The smaller elastic section modulus about z.</summary>
    public Volume SectionModulusZ => Mm3(Props.IzM4 / Math.Max(Props.FibrePositiveYM, Props.FibreNegativeYM));

    /// <summary>Whether the St Venant torsion constant is known for this section.</summary>
    public bool HasTorsionConstant => double.IsFinite(Props.TorsionConstantM4);

    /// <summary>St Venant torsion constant, It (J). Throws when <see cref="HasTorsionConstant"/> is false.</summary>
    /// <exception cref="InvalidOperationException">The section does not give a torsion constant.</exception>
    public AreaMomentOfInertia TorsionConstant => HasTorsionConstant
        ? Mm4(Props.TorsionConstantM4)
        : throw new InvalidOperationException($"The torsion constant of the section \"{Designation}\" is not known; give it explicitly.");

    /// <summary>Warping constant Iw in mm⁶ (UnitsNet has no quantity of length to the sixth power).</summary>
    public double WarpingConstantMm6 => Props.WarpingConstantM6 * 1e18;

    /// <summary>Shear-centre offset from the centroid along the principal axis y.</summary>
    public Length ShearCentreOffsetY => Length.FromMillimeters(Props.ShearCentreYM * 1e3);

    /// <summary>Shear-centre offset from the centroid along the principal axis z.</summary>
    public Length ShearCentreOffsetZ => Length.FromMillimeters(Props.ShearCentreZM * 1e3);

    /// <summary>Adds the section's defining values to the canonical input form.</summary>
    internal abstract void AddCanonical(CanonicalForm form);

    private string? _canonicalSegment;

    /// <summary>The section's canonical lines, formed on first use and kept (a section never changes).</summary>
    internal string CanonicalSegment => _canonicalSegment ??= CanonicalForm.Segment(AddCanonical);

    /// <inheritdoc/>
    public override string ToString() => Designation;

    private static AreaMomentOfInertia Mm4(double m4) => AreaMomentOfInertia.FromMillimetersToTheFourth(m4 * 1e12);
    private static Volume Mm3(double m3) => Volume.FromCubicMillimeters(m3 * 1e9);

    /// <summary>A length in the caller's unit, for designations: "140" for 140 mm.</summary>
    private protected static string Num(Length l) => Guard.Show(l.Value);

    /// <summary>The caller's unit abbreviation of a length, invariant culture.</summary>
    private protected static string Unit(Length l) => l.ToString("a", Inv);

    /// <summary>Validates a dimension: finite and greater than zero.</summary>
    private protected static double Dim(Length l, string paramName, string what) => Si.Meters(l, paramName, what);
}
