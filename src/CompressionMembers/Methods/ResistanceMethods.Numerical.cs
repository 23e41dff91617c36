using CompressionMembers.Methods.Numerical;

namespace CompressionMembers.Methods;

public static partial class ResistanceMethods
{
    /// <summary>The elastic critical load by finite elements from the member's real supports, with the squash load as a
    /// cut-off (nominal, concentric): the numerical twin of <see cref="Euler"/>.</summary>
    public static FiniteElementBuckling FiniteElementCritical { get; } = new();

    /// <summary>The load at which the extreme fibre first reaches f, by second-order (P-δ) analysis of a pinned member
    /// with eccentricities, unequal end moments and bow (nominal): the numerical twin of <see cref="Secant"/>.</summary>
    public static SecondOrderElastic SecondOrderElastic { get; } = new();
}
