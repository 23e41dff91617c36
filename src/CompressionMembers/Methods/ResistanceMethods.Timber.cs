using CompressionMembers.Methods.Timber;

namespace CompressionMembers.Methods;

public static partial class ResistanceMethods
{
    /// <summary>EN 1995-1-1 timber column in service class 1 with the recommended γM of Table 2.3 and kmod of Table 3.1.</summary>
    public static Ec5ColumnStability Ec5Column { get; } = new();

    /// <summary>EN 1995-1-1 timber column in service class 2 with the recommended factors.</summary>
    public static Ec5ColumnStability Ec5ColumnServiceClass2 { get; } = new(ServiceClass.Class2);

    /// <summary>EN 1995-1-1 timber column in service class 3 with the recommended factors.</summary>
    public static Ec5ColumnStability Ec5ColumnServiceClass3 { get; } = new(ServiceClass.Class3);

    /// <summary>EN 1995-1-1 timber column with a national annex's γM or a fixed kmod.</summary>
    /// <param name="serviceClass">The service class.</param>
    /// <param name="materialFactor">γM for every product, or null for Table 2.3.</param>
    /// <param name="modificationFactor">kmod, or null for Table 3.1.</param>
    /// <returns>The method.</returns>
    public static Ec5ColumnStability Ec5ColumnWith(ServiceClass serviceClass, double? materialFactor = null, double? modificationFactor = null) =>
        new(serviceClass, materialFactor, modificationFactor);

    /// <summary>NDS 2018 wood column, allowable stress design, CD from the load-duration class, no other adjustment.</summary>
    public static NdsColumnStability NdsColumnAsd { get; } = new(NdsDesignFormat.Asd);

    /// <summary>NDS 2018 wood column, load and resistance factor design, λ from the load-duration class, no other adjustment.</summary>
    public static NdsColumnStability NdsColumnLrfd { get; } = new(NdsDesignFormat.Lrfd);

    /// <summary>NDS 2018 wood column with adjustment factors of your own.</summary>
    /// <param name="format">ASD or LRFD.</param>
    /// <param name="adjustments">The use-dependent factors.</param>
    /// <returns>The method.</returns>
    public static NdsColumnStability NdsColumn(NdsDesignFormat format, NdsAdjustments adjustments) => new(format, adjustments);

    /// <summary>EN 1995-1-2 reduced cross-section, four sides exposed, R30 (γM,fi = 1.0, Table 3.1 charring, Table 2.1 kfi).</summary>
    public static Ec5FireReducedSection Ec5FireR30 { get; } = new(UnitsNet.Duration.FromMinutes(30));

    /// <summary>EN 1995-1-2 reduced cross-section, four sides exposed, R60.</summary>
    public static Ec5FireReducedSection Ec5FireR60 { get; } = new(UnitsNet.Duration.FromMinutes(60));

    /// <summary>EN 1995-1-2 reduced cross-section, four sides exposed, R90.</summary>
    public static Ec5FireReducedSection Ec5FireR90 { get; } = new(UnitsNet.Duration.FromMinutes(90));

    /// <summary>EN 1995-1-2 reduced cross-section for a required time and exposure of your choice.</summary>
    /// <param name="requiredDuration">Required fire resistance time.</param>
    /// <param name="exposure">Faces exposed.</param>
    /// <returns>The method.</returns>
    public static Ec5FireReducedSection Ec5Fire(UnitsNet.Duration requiredDuration, FireExposure exposure) => new(requiredDuration, exposure);
}
