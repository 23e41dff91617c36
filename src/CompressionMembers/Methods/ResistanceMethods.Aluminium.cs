using CompressionMembers.Methods.Aluminium;

namespace CompressionMembers.Methods;

public static partial class ResistanceMethods
{
    /// <summary>EN 1999-1-1 (Eurocode 9) for an unwelded aluminium member, with the recommended γM1 = 1.10 and γM2 = 1.25.</summary>
    public static Eurocode9Compression Eurocode9 { get; } = new();

    /// <summary>EN 1999-1-1 for a welded aluminium member, with partial factors of your choice.</summary>
    /// <param name="welding">How the member is welded.</param>
    /// <param name="partialFactorM1">γM1; 1.10 recommended.</param>
    /// <param name="partialFactorM2">γM2; 1.25 recommended.</param>
    /// <returns>The method.</returns>
    public static Eurocode9Compression Eurocode9With(AluminiumWelding? welding = null,
        double partialFactorM1 = Eurocode9Compression.RecommendedPartialFactorM1, double partialFactorM2 = Eurocode9Compression.RecommendedPartialFactorM2) =>
        new(welding, partialFactorM1, partialFactorM2);

    /// <summary>The buckling-constant method of US aluminium practice, LRFD with φc = 0.90 (from memory).</summary>
    public static BucklingConstantMethod AluminiumBucklingConstantsLrfd { get; } = new(DesignBasis.Lrfd);

    /// <summary>The buckling-constant method of US aluminium practice, ASD with Ωc = 1.65 (from memory).</summary>
    public static BucklingConstantMethod AluminiumBucklingConstantsAsd { get; } = new(DesignBasis.Asd);

    /// <summary>The ideal inelastic column: tangent modulus with a Ramberg–Osgood law, n = f0 / 10 (a physics check).</summary>
    public static TangentModulusColumn TangentModulusRambergOsgood => TangentModulusColumn.Default;
}
