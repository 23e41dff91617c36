using System;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Materials.Timber;

/// <summary>
/// A European timber strength class or product (EN 338 solid timber, EN 14080 glued laminated timber, EN 14374 LVL)
/// with the characteristic values that compression design to EN 1995 needs: fc,0,k, fm,k, ft,0,k, fv,k, E0,mean,
/// E0,05, Gmean, ρk and ρmean.
/// </summary>
/// <remarks>
/// <para>What the base <see cref="Material"/> holds: <see cref="Material.ElasticModulus"/> is E0,05, the fifth-percentile
/// modulus that EN 1995-1-1 §6.3.2 (6.21) uses for stability; <see cref="Material.CompressiveStrength"/> is fc,0,k;
/// <see cref="Material.ShearModulus"/> is Gmean; <see cref="Material.Density"/> is the mean density ρmean (for self-weight).
/// The characteristic density ρk is <see cref="CharacteristicDensity"/>.</para>
/// <para>Presets are in <see cref="TimberGrades"/>; make your own class with <see cref="Create"/> or an LVL product with
/// <see cref="Lvl"/>. Every value must be finite and greater than 0, and E0,05 must not exceed E0,mean.</para>
/// <para>Thread safety: immutable reference type.</para>
/// </remarks>
[Immutable]
public sealed class TimberMaterial : Material
{
    private TimberMaterial(string name, TimberProduct product, Pressure fc0k, Pressure fmk, Pressure ft0k, Pressure fvk,
        Pressure e0mean, Pressure e005, Pressure gmean, Density rhok, Density rhomean, double sizeEffectExponent, string source)
        : base(name, e005, gmean, fc0k, rhomean, source)
    {
        if (!Enum.IsDefined(product)) throw new ArgumentOutOfRangeException(nameof(product), product, $"Unknown timber product {(int)product}.");
        Si.Pascals(fmk, nameof(fmk), "Characteristic bending strength fm,k");
        Si.Pascals(ft0k, nameof(ft0k), "Characteristic tension strength ft,0,k");
        Si.Pascals(fvk, nameof(fvk), "Characteristic shear strength fv,k");
        double em = Si.Pascals(e0mean, nameof(e0mean), "Mean modulus E0,mean");
        double e5 = e005.Pascals;
        if (e5 > em)
            throw new ArgumentOutOfRangeException(nameof(e005), (double)e005.Value,
                $"The fifth-percentile modulus E0,05 must not exceed the mean modulus E0,mean ({Si.Given(e0mean)}); got {Si.Given(e005)}.");
        Si.KilogramsPerCubicMeter(rhok, nameof(rhok), "Characteristic density ρk");
        if (rhok.KilogramsPerCubicMeter > rhomean.KilogramsPerCubicMeter)
            throw new ArgumentOutOfRangeException(nameof(rhok), (double)rhok.Value,
                $"The characteristic density ρk must not exceed the mean density ρmean ({Si.Given(rhomean)}); got {Si.Given(rhok)}.");
        Product = product;
        // SI doubles kept once, so that a check never converts a quantity (STACK.md: conversions are 8–12× a double).
        FmkPa = fmk.Pascals;
        E0MeanPa = em;
        GMeanPa = gmean.Pascals;
        SlendernessRoot = Math.Sqrt(CompressiveStrengthPa / ElasticModulusPa);
        SlendernessRootOverPi = SlendernessRoot / Math.PI;
        // EN 1995-1-2 Table 3.1 βn in m/s, a constant of the product and density (NaN where the table does not cover them;
        // the fire method refuses such a material unless it is given a charring rate).
        NotionalCharringRateMs = Methods.Timber.En1995Factors.CharringCoverage(product, rhok.KilogramsPerCubicMeter) is null
            ? Methods.Timber.En1995Factors.CharringRateMmPerMin(product, rhok.KilogramsPerCubicMeter, true) / 60000.0
            : double.NaN;
        RhokKgM3 = rhok.KilogramsPerCubicMeter;
        // βc of EN 1995-1-1 (6.29) and kfi of EN 1995-1-2 Table 2.1, constants of the product, read once here rather than
        // looked up by product on every check.
        StraightnessFactor = Methods.Timber.En1995Factors.BetaCUnchecked(product);
        FireFractileFactor = Methods.Timber.En1995Factors.KfiUnchecked(product);
        BendingStrength = fmk;
        TensionStrength = ft0k;
        ShearStrength = fvk;
        MeanModulus = e0mean;
        CharacteristicDensity = rhok;
        SizeEffectExponent = sizeEffectExponent;
    }

    /// <summary>Creates a user-defined strength class of solid timber or glulam.</summary>
    /// <param name="name">A name for reports, such as "C27 (own)".</param>
    /// <param name="product">The product type (not <see cref="TimberProduct.Lvl"/>: use <see cref="Lvl"/>).</param>
    /// <param name="fc0k">Characteristic compression strength parallel to grain, fc,0,k.</param>
    /// <param name="fmk">Characteristic bending strength, fm,k.</param>
    /// <param name="ft0k">Characteristic tension strength parallel to grain, ft,0,k.</param>
    /// <param name="fvk">Characteristic shear strength, fv,k.</param>
    /// <param name="e0mean">Mean modulus of elasticity parallel to grain, E0,mean.</param>
    /// <param name="e005">Fifth-percentile modulus parallel to grain, E0,05 (at most E0,mean).</param>
    /// <param name="gmean">Mean shear modulus, Gmean.</param>
    /// <param name="rhok">Characteristic density, ρk.</param>
    /// <param name="rhomean">Mean density, ρmean (at least ρk).</param>
    /// <param name="source">Where the values come from, or "user-defined".</param>
    /// <returns>The material.</returns>
    /// <exception cref="ArgumentException">The name or source is empty, or the product is LVL.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or not positive, E0,05 &gt; E0,mean or ρk &gt; ρmean.</exception>
    public static TimberMaterial Create(string name, TimberProduct product, Pressure fc0k, Pressure fmk, Pressure ft0k, Pressure fvk,
        Pressure e0mean, Pressure e005, Pressure gmean, Density rhok, Density rhomean, string source)
    {
        if (product == TimberProduct.Lvl)
            throw new ArgumentException("Use TimberMaterial.Lvl for laminated veneer lumber: it needs the declared size-effect exponent s.", nameof(product));
        CheckBaseValues(fc0k, e005, gmean, rhomean);
        return new TimberMaterial(name, product, fc0k, fmk, ft0k, fvk, e0mean, e005, gmean, rhok, rhomean, double.NaN, source);
    }

    /// <summary>Creates a laminated veneer lumber (LVL) product from its declared values (EN 14374), edgewise use.</summary>
    /// <param name="name">Product name for reports.</param>
    /// <param name="fc0k">Declared compression strength parallel to grain, fc,0,k.</param>
    /// <param name="fmk">Declared edgewise bending strength, fm,0,edge,k, at the 300 mm reference depth.</param>
    /// <param name="ft0k">Declared tension strength parallel to grain, ft,0,k.</param>
    /// <param name="fvk">Declared edgewise shear strength, fv,0,edge,k.</param>
    /// <param name="e0mean">Declared mean modulus E0,mean.</param>
    /// <param name="e005">Declared fifth-percentile modulus E0,05.</param>
    /// <param name="gmean">Declared mean shear modulus.</param>
    /// <param name="rhok">Declared characteristic density.</param>
    /// <param name="rhomean">Declared mean density.</param>
    /// <param name="sizeEffectExponent">Declared size-effect exponent s for bending (EN 1995-1-1 §3.4 (3.3)), from 0 to 1.</param>
    /// <param name="source">The declaration (manufacturer, document and date).</param>
    /// <returns>The material.</returns>
    /// <exception cref="ArgumentException">The name or source is empty.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or not positive, or s is outside [0, 1].</exception>
    public static TimberMaterial Lvl(string name, Pressure fc0k, Pressure fmk, Pressure ft0k, Pressure fvk,
        Pressure e0mean, Pressure e005, Pressure gmean, Density rhok, Density rhomean, double sizeEffectExponent, string source)
    {
        Guard.InRange(sizeEffectExponent, 0, 1, nameof(sizeEffectExponent), "", "Size-effect exponent s");
        CheckBaseValues(fc0k, e005, gmean, rhomean);
        return new TimberMaterial(name, TimberProduct.Lvl, fc0k, fmk, ft0k, fvk, e0mean, e005, gmean, rhok, rhomean, sizeEffectExponent, source);
    }

    // The base class validates these too, but under its own parameter names; check them first under the caller's.
    private static void CheckBaseValues(Pressure fc0k, Pressure e005, Pressure gmean, Density rhomean)
    {
        Si.Pascals(fc0k, nameof(fc0k), "Characteristic compression strength fc,0,k");
        Si.Pascals(e005, nameof(e005), "Fifth-percentile modulus E0,05");
        Si.Pascals(gmean, nameof(gmean), "Mean shear modulus Gmean");
        Si.KilogramsPerCubicMeter(rhomean, nameof(rhomean), "Mean density ρmean");
    }

    /// <inheritdoc/>
    public override MaterialKind Kind => MaterialKind.Timber;

    internal double FmkPa { get; }
    internal double E0MeanPa { get; }
    internal double GMeanPa { get; }
    /// <summary>√(fc,0,k / E0,05), the material's factor in the relative slenderness of EN 1995-1-1 (6.21, 6.22).</summary>
    internal double SlendernessRoot { get; }
    /// <summary>√(fc,0,k / E0,05) / π, so that λrel = λ × this (6.21, 6.22) takes one multiplication.</summary>
    internal double SlendernessRootOverPi { get; }
    /// <summary>βn of EN 1995-1-2 Table 3.1 in m/s, or NaN where the table does not cover the product and density.</summary>
    internal double NotionalCharringRateMs { get; }
    internal double RhokKgM3 { get; }
    /// <summary>βc of EN 1995-1-1 (6.29) for the product.</summary>
    internal double StraightnessFactor { get; }
    /// <summary>kfi of EN 1995-1-2 Table 2.1 for the product.</summary>
    internal double FireFractileFactor { get; }

    /// <summary>The product type.</summary>
    public TimberProduct Product { get; }

    /// <summary>Whether the product is glued laminated timber (homogeneous or combined).</summary>
    public bool IsGlulam => Product is TimberProduct.GlulamHomogeneous or TimberProduct.GlulamCombined;

    /// <summary>Characteristic compression strength parallel to grain, fc,0,k (the same as <see cref="Material.CompressiveStrength"/>).</summary>
    public Pressure CompressionStrength => CompressiveStrength;

    /// <summary>Characteristic bending strength, fm,k.</summary>
    public Pressure BendingStrength { get; }

    /// <summary>Characteristic tension strength parallel to grain, ft,0,k.</summary>
    public Pressure TensionStrength { get; }

    /// <summary>Characteristic shear strength, fv,k.</summary>
    public Pressure ShearStrength { get; }

    /// <summary>Mean modulus of elasticity parallel to grain, E0,mean.</summary>
    public Pressure MeanModulus { get; }

    /// <summary>Fifth-percentile modulus of elasticity parallel to grain, E0,05 (the same as <see cref="Material.ElasticModulus"/>).</summary>
    public Pressure FifthPercentileModulus => ElasticModulus;

    /// <summary>Mean shear modulus, Gmean (the same as <see cref="Material.ShearModulus"/>).</summary>
    public Pressure MeanShearModulus => ShearModulus;

    /// <summary>Characteristic density, ρk.</summary>
    public Density CharacteristicDensity { get; }

    /// <summary>Mean density, ρmean (the same as <see cref="Material.Density"/>).</summary>
    public Density MeanDensity => Density;

    /// <summary>Declared size-effect exponent s of an LVL product; NaN for other products.</summary>
    public double SizeEffectExponent { get; }

    internal override void AddCanonical(CanonicalForm form)
    {
        base.AddCanonical(form);
        form.Add("timber.product", Product.ToString())
            .Add("timber.fmk", BendingStrength.Pascals)
            .Add("timber.ft0k", TensionStrength.Pascals)
            .Add("timber.fvk", ShearStrength.Pascals)
            .Add("timber.E0mean", MeanModulus.Pascals)
            .Add("timber.rhok", CharacteristicDensity.KilogramsPerCubicMeter)
            .Add("timber.s", SizeEffectExponent)
            .Add("material.source", Source);
    }
}
