using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Materials;

/// <summary>
/// A structural material, as much of it as stability needs: the elastic modulus used for buckling, the shear
/// modulus, the compressive strength (characteristic compressive strength, yield or 0.2 % proof stress), the
/// density, a name, and the source of its values.
/// </summary>
/// <remarks>
/// <para>Families (timber, aluminium) derive from this type and add the values their standards use. All values
/// are kept in the units the caller gave and validated at construction: each must be finite and greater than 0.</para>
/// <para>Thread safety: immutable reference type; safe to share between threads.</para>
/// </remarks>
[Immutable]
public abstract class Material
{
    /// <summary>Validates and stores the values every material has.</summary>
    /// <param name="name">A name for reports, such as "C24" or "6082-T6". Must not be empty.</param>
    /// <param name="elasticModulus">The modulus used for stability, E.</param>
    /// <param name="shearModulus">The shear modulus, G.</param>
    /// <param name="compressiveStrength">Characteristic compressive strength, yield or proof stress.</param>
    /// <param name="density">Density (characteristic or mean, as the family states).</param>
    /// <param name="source">Where the values come from (standard and table, edition; or "user-defined").</param>
    /// <exception cref="System.ArgumentException">The name or source is empty.</exception>
    /// <exception cref="System.ArgumentOutOfRangeException">A value is not finite or not greater than 0.</exception>
    protected Material(string name, Pressure elasticModulus, Pressure shearModulus, Pressure compressiveStrength, Density density, string source)
    {
        if (string.IsNullOrWhiteSpace(name))
            throw new System.ArgumentException("Material name must not be empty.", nameof(name));
        if (string.IsNullOrWhiteSpace(source))
            throw new System.ArgumentException("Material source must not be empty; say \"user-defined\" for values of your own.", nameof(source));
        ElasticModulusPa = Si.Pascals(elasticModulus, nameof(elasticModulus), "Elastic modulus");
        ShearModulusPa = Si.Pascals(shearModulus, nameof(shearModulus), "Shear modulus");
        CompressiveStrengthPa = Si.Pascals(compressiveStrength, nameof(compressiveStrength), "Compressive strength");
        DensityKgM3 = Si.KilogramsPerCubicMeter(density, nameof(density), "Density");
        Name = name;
        Source = source;
        ElasticModulus = elasticModulus;
        ShearModulus = shearModulus;
        CompressiveStrength = compressiveStrength;
        Density = density;
    }

    /// <summary>The material's name, as reports show it.</summary>
    public string Name { get; }

    /// <summary>Where the values come from: standard, table and edition, or "user-defined".</summary>
    public string Source { get; }

    /// <summary>The elastic modulus used for stability checks, E (for timber the family says which value).</summary>
    public Pressure ElasticModulus { get; }

    /// <summary>The shear modulus, G, used for torsional buckling.</summary>
    public Pressure ShearModulus { get; }

    /// <summary>The compressive strength used by the classical methods: characteristic strength, yield or proof stress.</summary>
    public Pressure CompressiveStrength { get; }

    /// <summary>The density, for self-weight and mass-based size selection.</summary>
    public Density Density { get; }

    // SI values converted once at construction, so that resolving a member costs no unit conversion.
    internal double ElasticModulusPa { get; }
    internal double ShearModulusPa { get; }
    internal double CompressiveStrengthPa { get; }
    internal double DensityKgM3 { get; }

    /// <summary>The family this material belongs to.</summary>
    public abstract MaterialKind Kind { get; }

    private string? _canonicalSegment;

    /// <summary>The material's canonical lines, formed on first use and kept (a material never changes; two threads that
    /// race form the same text).</summary>
    internal string CanonicalSegment => _canonicalSegment ??= CanonicalForm.Segment(AddCanonical);

    /// <summary>Adds the material's defining values to the canonical input form; families add their own values.</summary>
    internal virtual void AddCanonical(CanonicalForm form)
    {
        form.Add("material.kind", Kind.ToString())
            .Add("material.type", GetType().FullName ?? GetType().Name)
            .Add("material.name", Name)
            .Add("material.E", ElasticModulus.Pascals)
            .Add("material.G", ShearModulus.Pascals)
            .Add("material.f", CompressiveStrength.Pascals)
            .Add("material.rho", Density.KilogramsPerCubicMeter);
    }

    /// <inheritdoc/>
    public override string ToString() => Name;
}
