using System.Collections.Generic;
using UnitsNet;

namespace CompressionMembers.Materials.Aluminium;

/// <summary>
/// Common structural aluminium alloys and tempers with their EN 1999-1-1 characteristic values. Names read
/// alloy, temper, product form and, where the values change with thickness, the thickness band.
/// </summary>
/// <remarks>
/// <para>Source of every value: EN 1999-1-1:2007+A1:2009, Table 3.2a (sheet, strip and plate) and Table 3.2b
/// (extrusions): f0, fu, fo,haz, fu,haz (MIG) and the buckling class. The extrusions of 6060 (T5, T6), 6061-T6, 6063 (T5, T6),
/// 6005A-T6 (open profiles and bars) and 5083-O/H111 were checked against a stored copy of Table 3.2b; that check
/// corrected 6061-T6 (thickness band t ≤ 20 mm, was 25), 6063-T5 (fo,haz 60, fu,haz 100 MPa, were 65 and 110) and
/// 6063-T6 (f0 160, fu 195 MPa, were 170 and 215). The 6082 and 7020 extrusions and every sheet and plate preset
/// (Table 3.2a) are still recalled from memory. Each preset's <see cref="Material.Source"/> says which. Check them
/// against your copy before relying on them, or build your own with <see cref="AluminiumAlloy.Create"/>.</para>
/// <para>ρo,haz = fo,haz / fo and ρu,haz = fu,haz / fu for MIG welding (EN 1999-1-1 Table 3.2). TIG: for the
/// heat-treated 6xxx and 7xxx tempers the MIG factors are multiplied by 0.8, a conservative reduction recalled
/// (from memory, not verified) for TIG's greater heat input; for the non-heat-treatable 5083 in the O/H111 condition
/// welding does not soften the material (ρ = 1 for both processes).</para>
/// <para>Thread safety: immutable; the presets are shared instances.</para>
/// </remarks>
public static class AluminiumAlloys
{
    private const string TableA = "EN 1999-1-1:2007+A1:2009 Table 3.2a (sheet, strip, plate), from memory";
    private const string TableB = "EN 1999-1-1:2007+A1:2009 Table 3.2b (extrusions), from memory";
    // Rows read in a stored copy of Table 3.2b (docs/methods-aluminium.md, "Checked against"); the TIG factors are still this
    // library's assumption for the heat-treated tempers.
    private const string TableBChecked = "EN 1999-1-1:2007+A1:2009 Table 3.2b (extrusions), checked against a copy of the table; TIG factors assumed (0.8 × MIG)";
    private const string TableBCheckedNonHeatTreated = "EN 1999-1-1:2007+A1:2009 Table 3.2b (extrusions), checked against a copy of the table";
    private const double TigFactor = 0.8;

    private static AluminiumAlloy Preset(string name, string alloy, string temper, AluminiumProductForm form,
        double f0, double fu, double f0Haz, double fuHaz, double tMinMm, double tMaxMm, BucklingClass cls, bool heatTreated, string? source = null)
    {
        double ro = f0Haz / f0, ru = fuHaz / fu;
        double k = heatTreated ? TigFactor : 1.0;
        return AluminiumAlloy.Create(name, alloy, temper, form, Pressure.FromMegapascals(f0), Pressure.FromMegapascals(fu),
            Length.FromMillimeters(tMinMm), Length.FromMillimeters(tMaxMm), cls, ro, ru, ro * k, ru * k,
            source ?? (form == AluminiumProductForm.Extrusion ? TableB : TableA));
    }

    /// <summary>EN AW-6060 T5 extrusion, t ≤ 5 mm: f0 120, fu 160, fo,haz 50, fu,haz 80 MPa, class B (Table 3.2b, checked).</summary>
    public static AluminiumAlloy EnAw6060T5Extrusion { get; } =
        Preset("EN AW-6060-T5 extrusion t ≤ 5 mm", "EN AW-6060", "T5", AluminiumProductForm.Extrusion, 120, 160, 50, 80, 0, 5, BucklingClass.B, true, TableBChecked);

    /// <summary>EN AW-6060 T6 extrusion, t ≤ 15 mm: f0 140, fu 170, fo,haz 60, fu,haz 100 MPa, class A (Table 3.2b, checked).</summary>
    public static AluminiumAlloy EnAw6060T6Extrusion { get; } =
        Preset("EN AW-6060-T6 extrusion t ≤ 15 mm", "EN AW-6060", "T6", AluminiumProductForm.Extrusion, 140, 170, 60, 100, 0, 15, BucklingClass.A, true, TableBChecked);

    /// <summary>EN AW-6061 T6 extrusion, t ≤ 20 mm: f0 240, fu 260, fo,haz 115, fu,haz 175 MPa, class A (Table 3.2b, checked;
    /// the band was t ≤ 25 mm before that check).</summary>
    public static AluminiumAlloy EnAw6061T6Extrusion { get; } =
        Preset("EN AW-6061-T6 extrusion t ≤ 20 mm", "EN AW-6061", "T6", AluminiumProductForm.Extrusion, 240, 260, 115, 175, 0, 20, BucklingClass.A, true, TableBChecked);

    /// <summary>EN AW-6063 T5 extrusion, t ≤ 3 mm: f0 130, fu 175, fo,haz 60, fu,haz 100 MPa, class B (Table 3.2b, checked;
    /// the HAZ strengths were 65 and 110 MPa before that check).</summary>
    public static AluminiumAlloy EnAw6063T5Extrusion { get; } =
        Preset("EN AW-6063-T5 extrusion t ≤ 3 mm", "EN AW-6063", "T5", AluminiumProductForm.Extrusion, 130, 175, 60, 100, 0, 3, BucklingClass.B, true, TableBChecked);

    /// <summary>EN AW-6063 T6 extrusion (EP, ET, ER/B), t ≤ 25 mm: f0 160, fu 195, fo,haz 65, fu,haz 110 MPa, class A
    /// (Table 3.2b, checked; f0 and fu were 170 and 215 MPa before that check).</summary>
    public static AluminiumAlloy EnAw6063T6Extrusion { get; } =
        Preset("EN AW-6063-T6 extrusion t ≤ 25 mm", "EN AW-6063", "T6", AluminiumProductForm.Extrusion, 160, 195, 65, 110, 0, 25, BucklingClass.A, true, TableBChecked);

    /// <summary>EN AW-6005A T6 open extrusion or bar (EP/O, ER/B), t ≤ 5 mm: f0 225, fu 270, fo,haz 115, fu,haz 165 MPa, class A
    /// (Table 3.2b, checked). Hollow profiles and tubes (EP/H, ET) have lower values (f0 215, fu 255 MPa for t ≤ 5 mm): build
    /// them with <see cref="AluminiumAlloy.Create"/>.</summary>
    public static AluminiumAlloy EnAw6005AT6Extrusion { get; } =
        Preset("EN AW-6005A-T6 extrusion t ≤ 5 mm", "EN AW-6005A", "T6", AluminiumProductForm.Extrusion, 225, 270, 115, 165, 0, 5, BucklingClass.A, true, TableBChecked);

    /// <summary>EN AW-6082 T5 extrusion, t ≤ 5 mm: f0 230, fu 270, fo,haz 125, fu,haz 185 MPa, class B (from memory).</summary>
    public static AluminiumAlloy EnAw6082T5Extrusion { get; } =
        Preset("EN AW-6082-T5 extrusion t ≤ 5 mm", "EN AW-6082", "T5", AluminiumProductForm.Extrusion, 230, 270, 125, 185, 0, 5, BucklingClass.B, true);

    /// <summary>EN AW-6082 T6 extrusion, t ≤ 5 mm: f0 250, fu 290, fo,haz 125, fu,haz 185 MPa, class A (from memory).</summary>
    public static AluminiumAlloy EnAw6082T6Extrusion { get; } =
        Preset("EN AW-6082-T6 extrusion t ≤ 5 mm", "EN AW-6082", "T6", AluminiumProductForm.Extrusion, 250, 290, 125, 185, 0, 5, BucklingClass.A, true);

    /// <summary>EN AW-6082 T6 extrusion, 5 &lt; t ≤ 15 mm: f0 260, fu 310, fo,haz 125, fu,haz 185 MPa, class A (from memory).</summary>
    public static AluminiumAlloy EnAw6082T6ExtrusionOver5mm { get; } =
        Preset("EN AW-6082-T6 extrusion 5 < t ≤ 15 mm", "EN AW-6082", "T6", AluminiumProductForm.Extrusion, 260, 310, 125, 185, 5, 15, BucklingClass.A, true);

    /// <summary>EN AW-7020 T6 extrusion, t ≤ 15 mm: f0 290, fu 350, fo,haz 205, fu,haz 280 MPa, class A (from memory).</summary>
    public static AluminiumAlloy EnAw7020T6Extrusion { get; } =
        Preset("EN AW-7020-T6 extrusion t ≤ 15 mm", "EN AW-7020", "T6", AluminiumProductForm.Extrusion, 290, 350, 205, 280, 0, 15, BucklingClass.A, true);

    /// <summary>EN AW-5083 O/H111 extrusion, t ≤ 200 mm: f0 110, fu 270 MPa, not softened by welding (HAZ factors 1), class B
    /// (Table 3.2b, checked).</summary>
    public static AluminiumAlloy EnAw5083OH111Extrusion { get; } =
        Preset("EN AW-5083-O/H111 extrusion t ≤ 200 mm", "EN AW-5083", "O/H111", AluminiumProductForm.Extrusion, 110, 270, 110, 270, 0, 200, BucklingClass.B, false, TableBCheckedNonHeatTreated);

    /// <summary>EN AW-5083 O/H111 sheet and plate, t ≤ 50 mm: f0 125, fu 275 MPa, not softened by welding, class B (from memory).</summary>
    public static AluminiumAlloy EnAw5083OH111Plate { get; } =
        Preset("EN AW-5083-O/H111 plate t ≤ 50 mm", "EN AW-5083", "O/H111", AluminiumProductForm.SheetStripPlate, 125, 275, 125, 275, 0, 50, BucklingClass.B, false);

    /// <summary>EN AW-6061 T6 sheet and plate, t ≤ 12.5 mm: f0 240, fu 290, fo,haz 115, fu,haz 175 MPa, class A (from memory).</summary>
    public static AluminiumAlloy EnAw6061T6Sheet { get; } =
        Preset("EN AW-6061-T6 sheet t ≤ 12.5 mm", "EN AW-6061", "T6", AluminiumProductForm.SheetStripPlate, 240, 290, 115, 175, 0, 12.5, BucklingClass.A, true);

    /// <summary>EN AW-6082 T6 sheet, t ≤ 6 mm: f0 260, fu 310, fo,haz 125, fu,haz 185 MPa, class A (from memory).</summary>
    public static AluminiumAlloy EnAw6082T6Sheet { get; } =
        Preset("EN AW-6082-T6 sheet t ≤ 6 mm", "EN AW-6082", "T6", AluminiumProductForm.SheetStripPlate, 260, 310, 125, 185, 0, 6, BucklingClass.A, true);

    /// <summary>EN AW-6082 T6 plate, 12.5 &lt; t ≤ 100 mm: f0 240, fu 295, fo,haz 125, fu,haz 185 MPa, class A (from memory).</summary>
    public static AluminiumAlloy EnAw6082T6Plate { get; } =
        Preset("EN AW-6082-T6 plate 12.5 < t ≤ 100 mm", "EN AW-6082", "T6", AluminiumProductForm.SheetStripPlate, 240, 295, 125, 185, 12.5, 100, BucklingClass.A, true);

    /// <summary>EN AW-7020 T6 sheet and plate, t ≤ 12.5 mm: f0 280, fu 350, fo,haz 205, fu,haz 280 MPa, class A (from memory).</summary>
    public static AluminiumAlloy EnAw7020T6Sheet { get; } =
        Preset("EN AW-7020-T6 sheet t ≤ 12.5 mm", "EN AW-7020", "T6", AluminiumProductForm.SheetStripPlate, 280, 350, 205, 280, 0, 12.5, BucklingClass.A, true);

    /// <summary>Every preset, in the order above.</summary>
    public static IReadOnlyList<AluminiumAlloy> All { get; } =
    [
        EnAw6060T5Extrusion, EnAw6060T6Extrusion, EnAw6061T6Extrusion, EnAw6063T5Extrusion, EnAw6063T6Extrusion,
        EnAw6005AT6Extrusion, EnAw6082T5Extrusion, EnAw6082T6Extrusion, EnAw6082T6ExtrusionOver5mm, EnAw7020T6Extrusion,
        EnAw5083OH111Extrusion, EnAw5083OH111Plate, EnAw6061T6Sheet, EnAw6082T6Sheet, EnAw6082T6Plate, EnAw7020T6Sheet,
    ];
}
