using System;
using System.Runtime.CompilerServices;
using CompressionMembers.Actions;
using CompressionMembers.Materials.Timber;

namespace CompressionMembers.Methods.Timber;

/// <summary>
/// The tabled factors of EN 1995-1-1:2004+A2:2014 and EN 1995-1-2:2004 that the timber methods use: kmod (Table 3.1),
/// kdef (Table 3.2), γM (Table 2.3, recommended values), βc (6.29), kfi (EN 1995-1-2 Table 2.1) and the charring rates
/// β0 and βn (EN 1995-1-2 Table 3.1). Verify against your copy and your national annex.
/// </summary>
/// <remarks>
/// <para>Checked against published copies (tests in Published/, list in docs/methods-timber.md): kmod (the LVL Handbook
/// Europe 2025, Table 4.2, which states that the same values hold for structural timber and glulam); kdef for LVL (the same
/// handbook, Table 4.3); βc (0.2 solid timber in Porteous &amp; Kermani's worked examples, 0.1 LVL in the handbook's column
/// example); kfi = 1.1 for LVL and γM,fi = 1.0 (the handbook, section 6.4); the charring rates (Buchanan, Structural Design
/// for Fire Safety, 2nd ed., Table 9.1, "Charring rates from Eurocode 5"). Still recalled from memory: kdef for solid
/// timber and glulam, the recommended γM of Table 2.3 (the UK national annex values quoted by Porteous &amp; Kermani, 1.3
/// solid and 1.2 LVL, are the same numbers), kfi for solid timber and glulam.</para>
/// <para>Only the rows for solid timber, glued laminated timber and LVL are held (the products of <see cref="TimberProduct"/>).
/// Thread safety: stateless.</para>
/// </remarks>
public static class En1995Factors
{
    internal const string KmodRef = "EN 1995-1-1 3.1.3, Table 3.1";
    internal const string KdefRef = "EN 1995-1-1 3.1.4, Table 3.2";
    internal const string GammaMRef = "EN 1995-1-1 2.4.1, Table 2.3 (recommended values)";
    internal const string BetaCRef = "EN 1995-1-1 6.3.2 (6.29)";
    internal const string KfiRef = "EN 1995-1-2 2.3, Table 2.1";
    internal const string CharringRef = "EN 1995-1-2 3.4.2, Table 3.1";

    /// <summary>The modification factor kmod for duration of load and moisture (EN 1995-1-1 Table 3.1), for solid timber,
    /// glulam and LVL (the same row for all three).</summary>
    /// <param name="product">The product.</param>
    /// <param name="serviceClass">The service class.</param>
    /// <param name="duration">The load-duration class of the shortest action in the combination.</param>
    /// <returns>kmod: 0.60/0.70/0.80/0.90/1.10 in service classes 1 and 2, 0.50/0.55/0.65/0.70/0.90 in service class 3
    /// (permanent to instantaneous).</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is undefined, or the duration is <see cref="LoadDurationClass.Unspecified"/>.</exception>
    public static double Kmod(TimberProduct product, ServiceClass serviceClass, LoadDurationClass duration)
    {
        CheckProduct(product);
        CheckServiceClass(serviceClass);
        if (duration == LoadDurationClass.Unspecified || !Enum.IsDefined(duration))
            throw new ArgumentOutOfRangeException(nameof(duration), duration,
                "kmod needs the load-duration class of the combination (permanent, long-term, medium-term, short-term or instantaneous); give it with DesignActions.WithLoadDuration.");
        return KmodUnchecked(serviceClass, duration);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static double KmodUnchecked(ServiceClass sc, LoadDurationClass d)
    {
        // EN 1995-1-1 Table 3.1, rows "Solid timber EN 14081-1", "Glued laminated timber EN 14080", "LVL EN 14374, EN 14279".
        if (sc == ServiceClass.Class3)
            return d switch
            {
                LoadDurationClass.Permanent => 0.50,
                LoadDurationClass.LongTerm => 0.55,
                LoadDurationClass.MediumTerm => 0.65,
                LoadDurationClass.ShortTerm => 0.70,
                _ => 0.90,
            };
        return d switch
        {
            LoadDurationClass.Permanent => 0.60,
            LoadDurationClass.LongTerm => 0.70,
            LoadDurationClass.MediumTerm => 0.80,
            LoadDurationClass.ShortTerm => 0.90,
            _ => 1.10,
        };
    }

    /// <summary>The deformation factor kdef (EN 1995-1-1 Table 3.2) for solid timber, glulam and LVL: 0.60, 0.80, 2.00 in
    /// service classes 1, 2, 3. It enters final (creep) deformations; the column check of 6.3.2 does not use it.</summary>
    /// <param name="product">The product.</param>
    /// <param name="serviceClass">The service class.</param>
    /// <returns>kdef.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is undefined.</exception>
    public static double Kdef(TimberProduct product, ServiceClass serviceClass)
    {
        CheckProduct(product);
        CheckServiceClass(serviceClass);
        return serviceClass switch { ServiceClass.Class1 => 0.60, ServiceClass.Class2 => 0.80, _ => 2.00 };
    }

    /// <summary>The recommended partial factor γM for the fundamental combinations (EN 1995-1-1 Table 2.3): 1.3 solid
    /// timber, 1.25 glulam, 1.2 LVL. A national annex may change them.</summary>
    /// <param name="product">The product.</param>
    /// <returns>γM.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The product is undefined.</exception>
    public static double GammaM(TimberProduct product)
    {
        CheckProduct(product);
        return GammaMUnchecked(product);
    }

    internal static double GammaMUnchecked(TimberProduct p) => p switch
    {
        TimberProduct.SolidSoftwood or TimberProduct.SolidHardwood => 1.3,
        TimberProduct.GlulamHomogeneous or TimberProduct.GlulamCombined => 1.25,
        _ => 1.2,
    };

    /// <summary>The straightness factor βc of EN 1995-1-1 (6.29): 0.2 for solid timber, 0.1 for glulam and LVL.</summary>
    /// <param name="product">The product.</param>
    /// <returns>βc.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The product is undefined.</exception>
    public static double BetaC(TimberProduct product)
    {
        CheckProduct(product);
        return BetaCUnchecked(product);
    }

    internal static double BetaCUnchecked(TimberProduct p) =>
        p is TimberProduct.SolidSoftwood or TimberProduct.SolidHardwood ? 0.2 : 0.1;

    /// <summary>The factor kfi of EN 1995-1-2 Table 2.1 that turns a characteristic value into the 20 % fractile used in
    /// fire: 1.25 solid timber, 1.15 glulam, 1.1 LVL.</summary>
    /// <param name="product">The product.</param>
    /// <returns>kfi.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The product is undefined.</exception>
    public static double Kfi(TimberProduct product)
    {
        CheckProduct(product);
        return KfiUnchecked(product);
    }

    internal static double KfiUnchecked(TimberProduct p) => p switch
    {
        TimberProduct.SolidSoftwood or TimberProduct.SolidHardwood => 1.25,
        TimberProduct.GlulamHomogeneous or TimberProduct.GlulamCombined => 1.15,
        _ => 1.1,
    };

    /// <summary>The design notional charring rate βn of EN 1995-1-2 Table 3.1, which includes the effect of corner
    /// rounding and fissures: softwood solid 0.8, softwood glulam 0.7, LVL 0.7, hardwood 0.7 at ρk = 290 kg/m³ to 0.55 at
    /// ρk ≥ 450 kg/m³ (linear between, per Table 3.1 note), in mm/min.</summary>
    /// <param name="material">The material.</param>
    /// <returns>βn in m/s.</returns>
    /// <exception cref="ArgumentNullException">The material is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">ρk is below 290 kg/m³ (outside Table 3.1), or below 480 kg/m³ for LVL.</exception>
    public static double NotionalCharringRate(TimberMaterial material)
    {
        ArgumentNullException.ThrowIfNull(material);
        return CharringRateMmPerMin(material.Product, material.CharacteristicDensity.KilogramsPerCubicMeter, notional: true) / 60000.0;
    }

    /// <summary>The design one-dimensional charring rate β0 of EN 1995-1-2 Table 3.1: 0.65 mm/min for softwood and LVL,
    /// hardwood 0.65 at ρk = 290 kg/m³ to 0.50 at ρk ≥ 450 kg/m³.</summary>
    /// <param name="material">The material.</param>
    /// <returns>β0 in m/s.</returns>
    /// <exception cref="ArgumentNullException">The material is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">ρk is outside Table 3.1.</exception>
    public static double OneDimensionalCharringRate(TimberMaterial material)
    {
        ArgumentNullException.ThrowIfNull(material);
        return CharringRateMmPerMin(material.Product, material.CharacteristicDensity.KilogramsPerCubicMeter, notional: false) / 60000.0;
    }

    /// <summary>Whether Table 3.1 covers the product at this density, and if not, why (null when covered).</summary>
    internal static string? CharringCoverage(TimberProduct p, double rhok) =>
        (p == TimberProduct.Lvl && rhok < 480) || rhok < 290 ? CharringNotCovered(p, rhok) : null;

    // The sentence, built only when refused and kept out of the code of every fire check.
    [System.Runtime.CompilerServices.MethodImpl(System.Runtime.CompilerServices.MethodImplOptions.NoInlining)]
    private static string CharringNotCovered(TimberProduct p, double rhok) => p == TimberProduct.Lvl && rhok < 480
        ? $"EN 1995-1-2 Table 3.1 gives charring rates for LVL with ρk ≥ 480 kg/m³; this product has ρk = {Internal.Guard.Show(rhok)} kg/m³. Give the charring rate explicitly."
        : $"EN 1995-1-2 Table 3.1 gives charring rates for timber with ρk ≥ 290 kg/m³; this material has ρk = {Internal.Guard.Show(rhok)} kg/m³. Give the charring rate explicitly.";

    internal static double CharringRateMmPerMin(TimberProduct p, double rhok, bool notional, string paramName = "material")
    {
        var why = CharringCoverage(p, rhok);
        if (why is not null) throw new ArgumentOutOfRangeException(paramName, rhok, why);
        switch (p)
        {
            case TimberProduct.SolidSoftwood: return notional ? 0.8 : 0.65;
            case TimberProduct.GlulamHomogeneous or TimberProduct.GlulamCombined: return notional ? 0.7 : 0.65;
            case TimberProduct.Lvl: return notional ? 0.7 : 0.65;
            default:
                // Hardwood: Table 3.1 gives ρk = 290 and ρk ≥ 450; its note allows linear interpolation between.
                double t = Math.Min(1, (rhok - 290) / (450 - 290));
                return notional ? 0.7 + t * (0.55 - 0.7) : 0.65 + t * (0.50 - 0.65);
        }
    }

    private static void CheckProduct(TimberProduct product)
    {
        if (!Enum.IsDefined(product)) throw new ArgumentOutOfRangeException(nameof(product), product, $"Unknown timber product {(int)product}.");
    }

    private static void CheckServiceClass(ServiceClass serviceClass)
    {
        if (!Enum.IsDefined(serviceClass)) throw new ArgumentOutOfRangeException(nameof(serviceClass), serviceClass, $"Unknown service class {(int)serviceClass}.");
    }
}
