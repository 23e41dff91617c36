using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Materials;

/// <summary>
/// A general isotropic material — any metal, or a user's own — described by E, G, a compressive strength (yield or
/// proof stress) and density. This is the material of the classical methods (Euler, Johnson, secant,
/// Perry–Robertson).
/// </summary>
/// <remarks>Thread safety: immutable reference type; safe to share between threads.</remarks>
[Immutable]
public sealed class IsotropicMaterial : Material
{
    /// <summary>Creates an isotropic material from E, G, yield stress and density.</summary>
    /// <param name="name">A name for reports.</param>
    /// <param name="elasticModulus">Young's modulus, E.</param>
    /// <param name="shearModulus">Shear modulus, G.</param>
    /// <param name="yieldStrength">Yield (or 0.2 % proof) stress in compression, fy.</param>
    /// <param name="density">Density.</param>
    /// <param name="source">Where the values come from, or "user-defined".</param>
    /// <exception cref="System.ArgumentException">The name or source is empty.</exception>
    /// <exception cref="System.ArgumentOutOfRangeException">A value is not finite or not greater than 0.</exception>
    public IsotropicMaterial(string name, Pressure elasticModulus, Pressure shearModulus, Pressure yieldStrength, Density density, string source)
        : base(name, elasticModulus, shearModulus, yieldStrength, density, source)
    {
    }

    /// <summary>Creates an isotropic material whose shear modulus follows from Poisson's ratio, G = E / (2 (1 + ν)).</summary>
    /// <param name="name">A name for reports.</param>
    /// <param name="elasticModulus">Young's modulus, E.</param>
    /// <param name="poissonRatio">Poisson's ratio ν, from 0 to 0.5 exclusive of 0.5.</param>
    /// <param name="yieldStrength">Yield (or proof) stress, fy.</param>
    /// <param name="density">Density.</param>
    /// <param name="source">Where the values come from, or "user-defined".</param>
    /// <returns>The material.</returns>
    /// <exception cref="System.ArgumentOutOfRangeException">ν is outside [0, 0.5) or a value is not finite and positive.</exception>
    public static IsotropicMaterial FromPoissonRatio(string name, Pressure elasticModulus, double poissonRatio, Pressure yieldStrength, Density density, string source)
    {
        Guard.InRange(poissonRatio, 0, 0.5, nameof(poissonRatio), "", "Poisson's ratio");
        if (poissonRatio >= 0.5)
            throw new System.ArgumentOutOfRangeException(nameof(poissonRatio), poissonRatio,
                $"Poisson's ratio must be less than 0.5 (an incompressible material has no finite G); got {Guard.Show(poissonRatio)}.");
        Si.Pascals(elasticModulus, nameof(elasticModulus), "Elastic modulus");
        var g = Pressure.FromPascals(elasticModulus.Pascals / (2 * (1 + poissonRatio))).ToUnit(elasticModulus.Unit);
        return new IsotropicMaterial(name, elasticModulus, g, yieldStrength, density, source);
    }

    /// <summary>
    /// A generic structural steel used as a check material: E = 200 GPa, ν = 0.3 (G ≈ 76.9 GPa), fy = 250 MPa,
    /// ρ = 7850 kg/m³. These are values of common practice, not a grade of any particular standard.
    /// </summary>
    public static IsotropicMaterial GenericStructuralSteel { get; } = FromPoissonRatio(
        "Generic structural steel (fy 250 MPa)",
        Pressure.FromGigapascals(200), 0.3, Pressure.FromMegapascals(250), Density.FromKilogramsPerCubicMeter(7850),
        "common practice (generic check material)");

    /// <inheritdoc/>
    public override MaterialKind Kind => MaterialKind.Isotropic;
}
