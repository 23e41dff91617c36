using CompressionMembers.Methods.Numerical;

namespace CompressionMembers.Methods;

public static partial class ResistanceMethods
{
    /// <summary>The elastic critical load by finite elements from the member's real supports, with the squash load as a
    /// cut-off (nominal, concentric): the numerical twin of <see cref="Euler"/>.</summary>
    public static FiniteElementBuckling FiniteElementCritical { get; } = new();
}
