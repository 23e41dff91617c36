using UnitsNet;

namespace CompressionMembers.Materials.Timber;

/// <summary>
/// A few example US reference design values, recalled from memory of the NDS Supplement (2018 edition) — verify every
/// value against the current supplement before use. They are here to show the shape of the data, not as a catalogue.
/// </summary>
/// <remarks>Each preset's <see cref="Material.Source"/> carries the same warning. Values are reference values before the
/// size factor CF (Table 4A species) or size-specific (Southern Pine, Table 4B). Thread safety: immutable, shared.</remarks>
public static class NdsGrades
{
    internal const string Memory = "from memory — verify against the current supplement";

    private static NdsTimberMaterial Grade(string name, NdsProduct p, double fcPsi, double fbPsi, double ePsi, double eminPsi, double specificGravity, string table) =>
        new(name, p, Pressure.FromPoundsForcePerSquareInch(fcPsi), Pressure.FromPoundsForcePerSquareInch(fbPsi),
            Pressure.FromPoundsForcePerSquareInch(ePsi), Pressure.FromPoundsForcePerSquareInch(eminPsi),
            Density.FromKilogramsPerCubicMeter(1000 * specificGravity), $"NDS Supplement 2018 {table} ({Memory}); density from specific gravity {specificGravity.ToString(System.Globalization.CultureInfo.InvariantCulture)}");

    /// <summary>Douglas Fir-Larch No. 2 dimension lumber: Fc 1350, Fb 900 psi, E 1.6, Emin 0.58 × 10⁶ psi (NDS Supplement Table 4A, from memory — verify).</summary>
    public static NdsTimberMaterial DouglasFirLarchNo2 { get; } = Grade("Douglas Fir-Larch No. 2", NdsProduct.SawnLumber, 1350, 900, 1_600_000, 580_000, 0.50, "Table 4A");

    /// <summary>Spruce-Pine-Fir No. 2 dimension lumber: Fc 1150, Fb 875 psi, E 1.4, Emin 0.51 × 10⁶ psi (NDS Supplement Table 4A, from memory — verify).</summary>
    public static NdsTimberMaterial SprucePineFirNo2 { get; } = Grade("Spruce-Pine-Fir No. 2", NdsProduct.SawnLumber, 1150, 875, 1_400_000, 510_000, 0.42, "Table 4A");

    /// <summary>Southern Pine No. 2, 2×4: Fc 1450, Fb 1100 psi, E 1.4, Emin 0.51 × 10⁶ psi (NDS Supplement Table 4B, size-specific, from memory — verify).</summary>
    public static NdsTimberMaterial SouthernPineNo2TwoByFour { get; } = Grade("Southern Pine No. 2 (2x4)", NdsProduct.SawnLumber, 1450, 1100, 1_400_000, 510_000, 0.55, "Table 4B");

    /// <summary>Glulam 24F-1.8E used as a column: Fc 1600, Fb 2400 psi, E 1.8, Emin 0.95 × 10⁶ psi (NDS Supplement Table 5A, from memory — verify; check the axial values for the axis of buckling).</summary>
    public static NdsTimberMaterial Glulam24F18E { get; } = Grade("Glulam 24F-1.8E", NdsProduct.Glulam, 1600, 2400, 1_800_000, 950_000, 0.50, "Table 5A");
}
