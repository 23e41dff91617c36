using System;
using CompressionMembers.Internal;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Sections;

namespace CompressionMembers.Resolution;

/// <summary>
/// A member resolved once into SI doubles (N, m, Pa): what a method kernel reads. Below this line no quantity type
/// is used; above it, no bare double.
/// </summary>
/// <remarks>
/// <para>Names carry their unit: <c>AreaM2</c>, <c>SecondMomentYM4</c>, <c>ElasticModulusPa</c>. Axes y and z are the
/// principal axes of the section (see <see cref="Section"/>).</para>
/// <para>A member is resolved once, when it is created: <see cref="From"/> returns that value, so a check pays no unit
/// conversion and no re-computation of the member's own properties (radii of gyration, slenderness, Euler critical
/// forces, section moduli). Methods read these instead of computing them again, so every method sees the same bits.</para>
/// <para>The default value has a null <see cref="Member"/> and zeros everywhere; methods reject it. Use
/// <see cref="From"/>. Thread safety: immutable value type.</para>
/// </remarks>
[Immutable]
public readonly struct ResolvedMember
{
    internal ResolvedMember(Member member)
        : this(member, member.Material, member.Section, member.LengthM, member.EffectiveLengthYM, member.EffectiveLengthZM, member.EffectiveLengthTorsionalM)
    {
    }

    // One constructor for a member and for a candidate section resolved without one (WithSection), so both give the same
    // bits for the same material, section and lengths.
    private ResolvedMember(Member? member, Material m, Section section, double lengthM, double effectiveLengthYM, double effectiveLengthZM,
        double effectiveLengthTorsionalM)
    {
        Member = member!;   // null only for WithSection's candidates, which never leave the size selector
        Material = m;
        Section = section;
        var p = section.Props;
        MaterialKind = m.Kind;
        SectionKind = section.Kind;
        ElasticModulusPa = m.ElasticModulusPa;
        ShearModulusPa = m.ShearModulusPa;
        StrengthPa = m.CompressiveStrengthPa;
        DensityKgM3 = m.DensityKgM3;
        AreaM2 = p.AreaM2;
        SecondMomentYM4 = p.IyM4;
        SecondMomentZM4 = p.IzM4;
        FibrePositiveZM = p.FibrePositiveZM;
        FibreNegativeZM = p.FibreNegativeZM;
        FibrePositiveYM = p.FibrePositiveYM;
        FibreNegativeYM = p.FibreNegativeYM;
        TorsionConstantM4 = p.TorsionConstantM4;
        WarpingConstantM6 = p.WarpingConstantM6;
        ShearCentreYM = p.ShearCentreYM;
        ShearCentreZM = p.ShearCentreZM;
        LengthM = lengthM;
        EffectiveLengthYM = effectiveLengthYM;
        EffectiveLengthZM = effectiveLengthZM;
        EffectiveLengthTorsionalM = effectiveLengthTorsionalM;
        // Derived once here; the expressions are those the methods used to evaluate on every check (same bits).
        RadiusYM = Math.Sqrt(SecondMomentYM4 / AreaM2);
        RadiusZM = Math.Sqrt(SecondMomentZM4 / AreaM2);
        SlendernessY = EffectiveLengthYM / RadiusYM;
        SlendernessZ = EffectiveLengthZM / RadiusZM;
        double root = Math.Sqrt(StrengthPa / ElasticModulusPa);
        RelativeSlendernessY = SlendernessY / Math.PI * root;
        RelativeSlendernessZ = SlendernessZ / Math.PI * root;
        CriticalForceYN = Math.PI * Math.PI * ElasticModulusPa * SecondMomentYM4 / (EffectiveLengthYM * EffectiveLengthYM);
        CriticalForceZN = Math.PI * Math.PI * ElasticModulusPa * SecondMomentZM4 / (EffectiveLengthZM * EffectiveLengthZM);
        SectionModulusYM3 = SecondMomentYM4 / Math.Max(FibrePositiveZM, FibreNegativeZM);
        SectionModulusZM3 = SecondMomentZM4 / Math.Max(FibrePositiveYM, FibreNegativeYM);
    }

    /// <summary>Resolves a member to SI doubles.</summary>
    /// <param name="member">The member.</param>
    /// <returns>The resolved member.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="member"/> is null.</exception>
    public static ResolvedMember From(Member member)
    {
        ArgumentNullException.ThrowIfNull(member);
        return member.Resolved;
    }

    /// <summary>A resolved member with another section and the same material, length and restraint, without building a
    /// <see cref="Members.Member"/>: the same values, to the bit, as <c>From(member.WithSection(section))</c>, but with a
    /// null <see cref="Member"/> (so <see cref="IsValid"/> is false). Only for the size selector, and only with built-in
    /// methods whose untraced checks read the material and section from here and nothing else from the member
    /// (<c>SizeSelector</c> keeps that list); a result built from it has no member and is never handed out.</summary>
    internal static ResolvedMember WithSection(in ResolvedMember basis, Section section) =>
        new(null, basis.Material, section, basis.LengthM, basis.EffectiveLengthYM, basis.EffectiveLengthZM, basis.EffectiveLengthTorsionalM);

    /// <summary>The member this was resolved from (families read their own values from its material and section).</summary>
    public Member Member { get; }
    /// <summary>The member's material (what methods type-test and read their family's values from).</summary>
    internal Material Material { get; }
    /// <summary>The member's section (for a family's own geometry: plates, dimensions, designation).</summary>
    internal Section Section { get; }
    /// <summary>Material family.</summary>
    public MaterialKind MaterialKind { get; }
    /// <summary>Section family.</summary>
    public SectionKind SectionKind { get; }
    /// <summary>Elastic modulus for stability, E, in Pa.</summary>
    public double ElasticModulusPa { get; }
    /// <summary>Shear modulus G in Pa.</summary>
    public double ShearModulusPa { get; }
    /// <summary>Compressive strength (characteristic, yield or proof) in Pa.</summary>
    public double StrengthPa { get; }
    /// <summary>Density in kg/m³.</summary>
    public double DensityKgM3 { get; }
    /// <summary>Area in m².</summary>
    public double AreaM2 { get; }
    /// <summary>Second moment about the principal axis y, m⁴.</summary>
    public double SecondMomentYM4 { get; }
    /// <summary>Second moment about the principal axis z, m⁴.</summary>
    public double SecondMomentZM4 { get; }
    /// <summary>Distance from the y axis to the extreme fibre on the +z side, m.</summary>
    public double FibrePositiveZM { get; }
    /// <summary>Distance from the y axis to the extreme fibre on the −z side, m (positive).</summary>
    public double FibreNegativeZM { get; }
    /// <summary>Distance from the z axis to the extreme fibre on the +y side, m.</summary>
    public double FibrePositiveYM { get; }
    /// <summary>Distance from the z axis to the extreme fibre on the −y side, m (positive).</summary>
    public double FibreNegativeYM { get; }
    /// <summary>St Venant torsion constant, m⁴ (NaN where unknown).</summary>
    public double TorsionConstantM4 { get; }
    /// <summary>Warping constant, m⁶ (NaN where unknown).</summary>
    public double WarpingConstantM6 { get; }
    /// <summary>Shear-centre offset from the centroid along y, m (NaN where unknown).</summary>
    public double ShearCentreYM { get; }
    /// <summary>Shear-centre offset from the centroid along z, m (NaN where unknown).</summary>
    public double ShearCentreZM { get; }
    /// <summary>System length, m.</summary>
    public double LengthM { get; }
    /// <summary>Effective length about y, m.</summary>
    public double EffectiveLengthYM { get; }
    /// <summary>Effective length about z, m.</summary>
    public double EffectiveLengthZM { get; }
    /// <summary>Effective length for torsional buckling, m.</summary>
    public double EffectiveLengthTorsionalM { get; }

    /// <summary>Radius of gyration about y, √(Iy / A), m.</summary>
    public double RadiusYM { get; }
    /// <summary>Radius of gyration about z, √(Iz / A), m.</summary>
    public double RadiusZM { get; }
    /// <summary>Geometric slenderness about y, Lcr,y / iy.</summary>
    public double SlendernessY { get; }
    /// <summary>Geometric slenderness about z, Lcr,z / iz.</summary>
    public double SlendernessZ { get; }
    /// <summary>Relative slenderness about y with the member's strength and stability modulus, λ̄y = λy / π × √(f / E)
    /// (= √(A f / Ncr,y); EN 1995-1-1 (6.21) for timber). Methods whose code defines it otherwise compute their own.</summary>
    public double RelativeSlendernessY { get; }
    /// <summary>Relative slenderness about z, λ̄z = λz / π × √(f / E).</summary>
    public double RelativeSlendernessZ { get; }
    /// <summary>Euler critical force about y with the stability modulus, π² E Iy / Lcr,y², N.</summary>
    public double CriticalForceYN { get; }
    /// <summary>Euler critical force about z with the stability modulus, π² E Iz / Lcr,z², N.</summary>
    public double CriticalForceZN { get; }
    /// <summary>The smaller elastic section modulus about y, Iy / max(z+, z−), m³.</summary>
    public double SectionModulusYM3 { get; }
    /// <summary>The smaller elastic section modulus about z, Iz / max(y+, y−), m³.</summary>
    public double SectionModulusZM3 { get; }
    /// <summary>Whether the torsion constant, warping constant and shear centre are all known.</summary>
    public bool HasTorsionalProperties => double.IsFinite(TorsionConstantM4) && double.IsFinite(WarpingConstantM6)
        && double.IsFinite(ShearCentreYM) && double.IsFinite(ShearCentreZM);
    /// <summary>Whether this value came from <see cref="From"/> (false for <c>default</c>).</summary>
    public bool IsValid => Member is not null;
}
