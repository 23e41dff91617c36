using System;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Materials.Timber;

/// <summary>
/// US reference design values for a species and grade (ANSI/AWC NDS and its Supplement): the compression design value
/// parallel to grain Fc, the bending design value Fb, the modulus of elasticity E and the modulus for beam and column
/// stability Emin, as given by the user or as one of the example grades of <see cref="NdsGrades"/>.
/// </summary>
/// <remarks>
/// <para>Reference values are the tabled values before adjustment (load duration, wet service, temperature, size,
/// incising…); the NDS column method applies the adjustments. What the base <see cref="Material"/> holds:
/// <see cref="Material.ElasticModulus"/> is Emin (the stability modulus), <see cref="Material.CompressiveStrength"/> is Fc,
/// <see cref="Material.ShearModulus"/> is E/16 (common practice; the NDS methods do not use it), and
/// <see cref="Material.Density"/> is the density given.</para>
/// <para>For glulam give the values for axially loaded members (the Supplement's axial-combination table) and Emin for the
/// axis of buckling. Thread safety: immutable reference type.</para>
/// </remarks>
[Immutable]
public sealed class NdsTimberMaterial : Material
{
    /// <summary>Creates a set of reference design values.</summary>
    /// <param name="speciesAndGrade">Species and grade, such as "Douglas Fir-Larch No. 2".</param>
    /// <param name="product">The product family (sets c).</param>
    /// <param name="fc">Reference compression design value parallel to grain, Fc.</param>
    /// <param name="fb">Reference bending design value, Fb.</param>
    /// <param name="e">Reference modulus of elasticity, E.</param>
    /// <param name="eMin">Reference modulus for beam and column stability, Emin (at most E).</param>
    /// <param name="density">Density (for self-weight only).</param>
    /// <param name="source">Where the values come from (Supplement table and edition), or "user-defined".</param>
    /// <exception cref="ArgumentException">The name or source is empty.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or not positive, Emin &gt; E, or the product is undefined.</exception>
    public NdsTimberMaterial(string speciesAndGrade, NdsProduct product, Pressure fc, Pressure fb, Pressure e, Pressure eMin, Density density, string source)
        : base(speciesAndGrade, Checked(eMin, nameof(eMin), "Reference modulus Emin"), ShearFrom(e), Checked(fc, nameof(fc), "Reference compression design value Fc"),
            CheckedDensity(density), source)
    {
        if (!Enum.IsDefined(product)) throw new ArgumentOutOfRangeException(nameof(product), product, $"Unknown NDS product {(int)product}.");
        Si.Pascals(fb, nameof(fb), "Reference bending design value Fb");
        if (eMin.Pascals > e.Pascals)
            throw new ArgumentOutOfRangeException(nameof(eMin), (double)eMin.Value, $"Emin must not exceed E ({Si.Given(e)}); got {Si.Given(eMin)}.");
        Product = product;
        FbPa = fb.Pascals;   // kept once in SI, so that a check never converts a quantity
        BendingValue = fb;
        Modulus = e;
    }

    // The base class validates these too, but under its own parameter names; check them first under the caller's.
    private static Pressure Checked(Pressure p, string name, string what)
    {
        Si.Pascals(p, name, what);
        return p;
    }

    private static Density CheckedDensity(Density density)
    {
        Si.KilogramsPerCubicMeter(density, nameof(density), "Density");
        return density;
    }

    private static Pressure ShearFrom(Pressure e)
    {
        Si.Pascals(e, nameof(e), "Reference modulus of elasticity E");
        return Pressure.FromPascals(e.Pascals / 16).ToUnit(e.Unit);
    }

    /// <inheritdoc/>
    public override MaterialKind Kind => MaterialKind.Timber;

    internal double FbPa { get; }

    /// <summary>The product family.</summary>
    public NdsProduct Product { get; }

    /// <summary>Reference compression design value parallel to grain, Fc (the same as <see cref="Material.CompressiveStrength"/>).</summary>
    public Pressure CompressionValue => CompressiveStrength;

    /// <summary>Reference bending design value, Fb.</summary>
    public Pressure BendingValue { get; }

    /// <summary>Reference modulus of elasticity, E.</summary>
    public Pressure Modulus { get; }

    /// <summary>Reference modulus for beam and column stability, Emin (the same as <see cref="Material.ElasticModulus"/>).</summary>
    public Pressure StabilityModulus => ElasticModulus;

    /// <summary>The column-stability constant c of NDS 3.7.1: 0.8 sawn lumber, 0.85 round poles and piles, 0.9 glulam and structural composite lumber.</summary>
    public double ColumnConstant => Product switch
    {
        NdsProduct.SawnLumber => 0.8,
        NdsProduct.RoundTimberPole => 0.85,
        _ => 0.9,
    };

    internal override void AddCanonical(CanonicalForm form)
    {
        base.AddCanonical(form);
        form.Add("nds.product", Product.ToString()).Add("nds.Fb", BendingValue.Pascals).Add("nds.E", Modulus.Pascals).Add("material.source", Source);
    }
}
