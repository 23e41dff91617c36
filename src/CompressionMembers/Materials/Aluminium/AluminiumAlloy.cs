using System;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Materials.Aluminium;

/// <summary>
/// A structural aluminium alloy in one temper and product form, with the characteristic values EN 1999-1-1 uses:
/// the 0.2 % proof strength f0 (the base <see cref="Material.CompressiveStrength"/>), the ultimate strength fu, the
/// thickness range they hold for, the buckling class, and the heat-affected-zone factors ρo,haz and ρu,haz for MIG
/// and TIG welding.
/// </summary>
/// <remarks>
/// <para>Presets are in <see cref="AluminiumAlloys"/>; <see cref="Create"/> makes a user's own alloy. E = 70 000 MPa and
/// G = 27 000 MPa by default (EN 1999-1-1 3.2.5), density 2700 kg/m³.</para>
/// <para>Validation: strengths finite and positive with fu ≥ f0; HAZ factors in (0, 1]; a thickness range with
/// 0 ≤ tmin &lt; tmax. Thread safety: immutable reference type.</para>
/// </remarks>
[Immutable]
public sealed class AluminiumAlloy : Material
{
    /// <summary>E = 70 000 MPa, EN 1999-1-1 3.2.5 (from memory).</summary>
    public static Pressure DefaultElasticModulus { get; } = Pressure.FromMegapascals(70_000);

    /// <summary>G = 27 000 MPa, EN 1999-1-1 3.2.5 (from memory).</summary>
    public static Pressure DefaultShearModulus { get; } = Pressure.FromMegapascals(27_000);

    private AluminiumAlloy(string name, string alloy, string temper, AluminiumProductForm form, Pressure f0, Pressure fu,
        Length tMin, Length tMax, BucklingClass bucklingClass, double roMig, double ruMig, double roTig, double ruTig,
        Pressure e, Pressure g, string source)
        : base(name, e, g, f0, Density.FromKilogramsPerCubicMeter(2700), source)
    {
        AlloyDesignation = alloy;
        Temper = temper;
        ProductForm = form;
        UltimateStrength = fu;
        MinimumThickness = tMin;
        MaximumThickness = tMax;
        BucklingClass = bucklingClass;
        HazProofFactorMig = roMig;
        HazUltimateFactorMig = ruMig;
        HazProofFactorTig = roTig;
        HazUltimateFactorTig = ruTig;
        // US-practice buckling constants of both temper groups, computed once (they follow from f0 and E alone).
        IsArtificiallyAged = Methods.Aluminium.BucklingConstantMethod.IsArtificiallyAged(temper);
        Methods.Aluminium.BucklingConstantMethod.Constants(true, CompressiveStrengthPa, ElasticModulusPa, out AgedBc, out AgedDc, out AgedCc);
        Methods.Aluminium.BucklingConstantMethod.Constants(false, CompressiveStrengthPa, ElasticModulusPa, out OtherBc, out OtherDc, out OtherCc);
    }

    /// <summary>Whether the temper is artificially aged (T5 to T9), read once from <see cref="Temper"/>.</summary>
    internal bool IsArtificiallyAged { get; }

    // Bc, Dc (Pa) and Cc of the buckling-constant method for artificially aged tempers and for the others.
    internal readonly double AgedBc, AgedDc, AgedCc, OtherBc, OtherDc, OtherCc;

    /// <summary>Creates an alloy of your own (or one from a newer table).</summary>
    /// <param name="name">Name for reports, such as "EN AW-6082-T6 extrusion t ≤ 5 mm".</param>
    /// <param name="alloyDesignation">Alloy, such as "EN AW-6082".</param>
    /// <param name="temper">Temper, such as "T6".</param>
    /// <param name="productForm">Product form.</param>
    /// <param name="proofStrength">Characteristic 0.2 % proof strength f0.</param>
    /// <param name="ultimateStrength">Characteristic ultimate strength fu, at least f0.</param>
    /// <param name="minimumThickness">Smallest thickness the values hold for (may be zero).</param>
    /// <param name="maximumThickness">Largest thickness the values hold for.</param>
    /// <param name="bucklingClass">Buckling class (A for heat-treated, B otherwise).</param>
    /// <param name="hazProofFactorMig">ρo,haz = fo,haz / fo for MIG welding, in (0, 1].</param>
    /// <param name="hazUltimateFactorMig">ρu,haz = fu,haz / fu for MIG welding, in (0, 1].</param>
    /// <param name="hazProofFactorTig">ρo,haz for TIG welding, in (0, 1].</param>
    /// <param name="hazUltimateFactorTig">ρu,haz for TIG welding, in (0, 1].</param>
    /// <param name="source">Where the values come from; "user-defined" for your own.</param>
    /// <param name="elasticModulus">E; 70 000 MPa if null.</param>
    /// <param name="shearModulus">G; 27 000 MPa if null.</param>
    /// <returns>The alloy.</returns>
    /// <exception cref="ArgumentException">A name or the source is empty, or fu &lt; f0, or tmin ≥ tmax.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite, not positive, or a factor is outside (0, 1].</exception>
    public static AluminiumAlloy Create(string name, string alloyDesignation, string temper, AluminiumProductForm productForm,
        Pressure proofStrength, Pressure ultimateStrength, Length minimumThickness, Length maximumThickness, BucklingClass bucklingClass,
        double hazProofFactorMig, double hazUltimateFactorMig, double hazProofFactorTig, double hazUltimateFactorTig,
        string source = "user-defined", Pressure? elasticModulus = null, Pressure? shearModulus = null)
    {
        if (string.IsNullOrWhiteSpace(alloyDesignation)) throw new ArgumentException("Alloy designation must not be empty.", nameof(alloyDesignation));
        if (string.IsNullOrWhiteSpace(temper)) throw new ArgumentException("Temper must not be empty.", nameof(temper));
        if (!Enum.IsDefined(productForm)) throw new ArgumentOutOfRangeException(nameof(productForm), productForm, $"Unknown product form {(int)productForm}.");
        if (!Enum.IsDefined(bucklingClass)) throw new ArgumentOutOfRangeException(nameof(bucklingClass), bucklingClass, $"Unknown buckling class {(int)bucklingClass}.");
        double f0 = Si.Pascals(proofStrength, nameof(proofStrength), "Proof strength f0");
        double fu = Si.Pascals(ultimateStrength, nameof(ultimateStrength), "Ultimate strength fu");
        if (fu < f0)
            throw new ArgumentException($"Ultimate strength fu must not be less than the proof strength f0 ({Si.Given(proofStrength)}); got {Si.Given(ultimateStrength)}.", nameof(ultimateStrength));
        double t0 = Si.Meters(minimumThickness, nameof(minimumThickness), "Minimum thickness", Si.Sign.NonNegative);
        double t1 = Si.Meters(maximumThickness, nameof(maximumThickness), "Maximum thickness");
        if (t0 >= t1)
            throw new ArgumentException($"Minimum thickness must be less than the maximum thickness ({Si.Given(maximumThickness)}); got {Si.Given(minimumThickness)}.", nameof(minimumThickness));
        Factor(hazProofFactorMig, nameof(hazProofFactorMig), "HAZ factor ρo,haz (MIG)");
        Factor(hazUltimateFactorMig, nameof(hazUltimateFactorMig), "HAZ factor ρu,haz (MIG)");
        Factor(hazProofFactorTig, nameof(hazProofFactorTig), "HAZ factor ρo,haz (TIG)");
        Factor(hazUltimateFactorTig, nameof(hazUltimateFactorTig), "HAZ factor ρu,haz (TIG)");
        return new AluminiumAlloy(name, alloyDesignation, temper, productForm, proofStrength, ultimateStrength, minimumThickness, maximumThickness,
            bucklingClass, hazProofFactorMig, hazUltimateFactorMig, hazProofFactorTig, hazUltimateFactorTig,
            elasticModulus ?? DefaultElasticModulus, shearModulus ?? DefaultShearModulus, source);
    }

    private static void Factor(double v, string p, string what)
    {
        Guard.Positive(v, p, "", what);
        if (v > 1) throw new ArgumentOutOfRangeException(p, v, $"{what} must be between 0 and 1; got {Guard.Show(v)}.");
    }

    /// <summary>Alloy designation, such as "EN AW-6082".</summary>
    public string AlloyDesignation { get; }
    /// <summary>Temper, such as "T6" or "O/H111".</summary>
    public string Temper { get; }
    /// <summary>Product form.</summary>
    public AluminiumProductForm ProductForm { get; }
    /// <summary>Characteristic 0.2 % proof strength f0 (the same as <see cref="Material.CompressiveStrength"/>).</summary>
    public Pressure ProofStrength => CompressiveStrength;
    /// <summary>Characteristic ultimate strength fu.</summary>
    public Pressure UltimateStrength { get; }
    /// <summary>Smallest thickness the values hold for.</summary>
    public Length MinimumThickness { get; }
    /// <summary>Largest thickness the values hold for.</summary>
    public Length MaximumThickness { get; }
    /// <summary>Buckling class.</summary>
    public BucklingClass BucklingClass { get; }
    /// <summary>ρo,haz for MIG welding.</summary>
    public double HazProofFactorMig { get; }
    /// <summary>ρu,haz for MIG welding.</summary>
    public double HazUltimateFactorMig { get; }
    /// <summary>ρo,haz for TIG welding.</summary>
    public double HazProofFactorTig { get; }
    /// <summary>ρu,haz for TIG welding.</summary>
    public double HazUltimateFactorTig { get; }

    /// <summary>ρo,haz for a process.</summary>
    /// <param name="process">The welding process.</param>
    /// <returns>The factor.</returns>
    /// <exception cref="System.ArgumentOutOfRangeException">The process is not MIG or TIG.</exception>
    public double HazProofFactor(WeldingProcess process) => CheckedProcess(process) == WeldingProcess.Tig ? HazProofFactorTig : HazProofFactorMig;

    /// <summary>ρu,haz for a process.</summary>
    /// <param name="process">The welding process.</param>
    /// <returns>The factor.</returns>
    /// <exception cref="System.ArgumentOutOfRangeException">The process is not MIG or TIG.</exception>
    public double HazUltimateFactor(WeldingProcess process) => CheckedProcess(process) == WeldingProcess.Tig ? HazUltimateFactorTig : HazUltimateFactorMig;

    internal double HazProofFactorFor(WeldingProcess trusted) => trusted == WeldingProcess.Tig ? HazProofFactorTig : HazProofFactorMig;
    internal double HazUltimateFactorFor(WeldingProcess trusted) => trusted == WeldingProcess.Tig ? HazUltimateFactorTig : HazUltimateFactorMig;

    // An explicit test, not Enum.IsDefined: this runs inside every EN 1999-1-1 check, and Enum.IsDefined reads a per-type
    // cache that the runtime may drop under memory pressure and rebuild (an allocation on the hot path).
    private static WeldingProcess CheckedProcess(WeldingProcess process) => process is WeldingProcess.Mig or WeldingProcess.Tig
        ? process
        : throw new System.ArgumentOutOfRangeException(nameof(process), process, $"Unknown welding process {(int)process}; use MIG or TIG.");

    /// <summary>Whether a plate thickness lies in the range the values hold for (tmin &lt; t ≤ tmax, or t ≥ 0 when tmin is 0).</summary>
    /// <param name="thickness">The thickness.</param>
    /// <returns>Whether it is in range.</returns>
    public bool CoversThickness(Length thickness) => CoversThicknessM(thickness.Meters);

    internal bool CoversThicknessM(double tM) =>
        tM <= MaximumThickness.Meters * (1 + 1e-9) && (MinimumThickness.Meters == 0 ? tM > 0 : tM > MinimumThickness.Meters * (1 + 1e-9));

    /// <inheritdoc/>
    public override MaterialKind Kind => MaterialKind.Aluminium;

    internal override void AddCanonical(CanonicalForm form)
    {
        base.AddCanonical(form);
        form.Add("alloy.designation", AlloyDesignation).Add("alloy.temper", Temper).Add("alloy.form", ProductForm.ToString())
            .Add("alloy.fu", UltimateStrength.Pascals).Add("alloy.tmin", MinimumThickness.Meters).Add("alloy.tmax", MaximumThickness.Meters)
            .Add("alloy.class", BucklingClass.ToString())
            .Add("alloy.haz.o.mig", HazProofFactorMig).Add("alloy.haz.u.mig", HazUltimateFactorMig)
            .Add("alloy.haz.o.tig", HazProofFactorTig).Add("alloy.haz.u.tig", HazUltimateFactorTig)
            .Add("alloy.source", Source);
    }
}
