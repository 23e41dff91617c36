using CompressionMembers.Methods.Classical;

namespace CompressionMembers.Methods;

/// <summary>The built-in resistance methods, as named values to pass to <see cref="Check"/>.</summary>
/// <remarks>Each family of methods adds its members in its own file (classical here; timber and aluminium beside it).</remarks>
public static partial class ResistanceMethods
{
    /// <summary>Euler elastic buckling with the squash load as a cut-off (nominal, concentric).</summary>
    public static EulerBuckling Euler { get; } = new();

    /// <summary>Johnson parabola below the transition slenderness, Euler above (nominal, concentric).</summary>
    public static JohnsonParabola Johnson { get; } = new();

    /// <summary>The secant formula for eccentric compression (nominal).</summary>
    public static SecantFormula Secant { get; } = new();

    /// <summary>The Perry–Robertson formula with Robertson's η = 0.003 λ (nominal, concentric).</summary>
    public static PerryRobertson PerryRobertsonDefault { get; } = new(PerryImperfection.Robertson());

    /// <summary>The Perry–Robertson formula with an imperfection model of your choice.</summary>
    /// <param name="imperfection">How η is set.</param>
    /// <returns>The method.</returns>
    public static PerryRobertson PerryRobertson(PerryImperfection imperfection) => new(imperfection);
}
