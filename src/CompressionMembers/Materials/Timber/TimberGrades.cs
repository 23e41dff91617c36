using UnitsNet;

namespace CompressionMembers.Materials.Timber;

/// <summary>
/// Named European timber strength classes: solid timber of EN 338 (C16, C18, C24, C30, D30, D40) and glued laminated
/// timber of EN 14080 (GL24h, GL28h, GL30h, GL32h, GL24c, GL28c, GL30c).
/// </summary>
/// <remarks>
/// <para>Sources, to be verified against the edition in force where you work: solid timber — EN 338:2009 Table 1
/// (softwood C classes and hardwood D classes); glulam — EN 14080:2013 Table 5 (homogeneous, GL..h) and Table 4 (combined,
/// GL..c), using the glulam values fm,g,k, ft,0,g,k, fc,0,g,k, fv,g,k, E0,g,mean, E0,g,05, Gg,mean, ρg,k and ρg,mean. Each
/// preset's <see cref="Material.Source"/> says which of its values were checked against a published copy (the homogeneous
/// glulam classes in full; the combined classes except Gg,mean and the densities; fc,0,k, E0,05, fm,k and ρmean of C16, C24
/// and C30; fm,k and ρmean of C18, D30 and D40) and which are still recalled from memory. Later editions (EN 338:2016)
/// changed some values; make your own class with <see cref="TimberMaterial.Create"/> when yours differ.</para>
/// <para>Thread safety: the presets are immutable and shared.</para>
/// </remarks>
public static class TimberGrades
{
    // Which values were read in a published source and which are still recalled: each class's Source says so, and it
    // enters every report. The published copies are named in docs/methods-timber.md ("Checked against") and in the tests
    // under Published/.
    internal const string En338Checked = "EN 338:2009 Table 1 (fc,0,k, E0,05, fm,k and ρmean checked against published copies; the other values from memory — verify against the edition in force)";
    internal const string En338 = "EN 338:2009 Table 1 (fm,k and ρmean checked against a published copy; the other values from memory — verify against the edition in force)";
    internal const string En14080H = "EN 14080:2013 Table 5, homogeneous glulam (checked against a published copy — verify against the edition in force)";
    internal const string En14080C = "EN 14080:2013 Table 4, combined glulam (strengths and moduli checked against a published copy; Gg,mean and densities from memory — verify against the edition in force)";

    private static TimberMaterial Class(string name, TimberProduct p, double fm, double ft0, double fc0, double fv,
        double e0meanGPa, double e005GPa, double gmeanGPa, double rhok, double rhomean, string source) =>
        TimberMaterial.Create(name, p, Pressure.FromMegapascals(fc0), Pressure.FromMegapascals(fm), Pressure.FromMegapascals(ft0),
            Pressure.FromMegapascals(fv), Pressure.FromGigapascals(e0meanGPa), Pressure.FromGigapascals(e005GPa), Pressure.FromGigapascals(gmeanGPa),
            Density.FromKilogramsPerCubicMeter(rhok), Density.FromKilogramsPerCubicMeter(rhomean), source);

    // Columns: fm,k, ft,0,k, fc,0,k, fv,k (MPa), E0,mean, E0,05, Gmean (GPa), ρk, ρmean (kg/m³).

    /// <summary>C16 softwood (EN 338:2009 Table 1): fm,k 16, fc,0,k 17 MPa, E0,05 5.4 GPa (checked against published copies), ρk 310 kg/m³ (from memory).</summary>
    public static TimberMaterial C16 { get; } = Class("C16", TimberProduct.SolidSoftwood, 16, 10, 17, 3.2, 8.0, 5.4, 0.50, 310, 370, En338Checked);

    /// <summary>C18 softwood (EN 338:2009 Table 1): fm,k 18 MPa (checked), fc,0,k 18 MPa, E0,05 6.0 GPa, ρk 320 kg/m³ (from memory).</summary>
    public static TimberMaterial C18 { get; } = Class("C18", TimberProduct.SolidSoftwood, 18, 11, 18, 3.4, 9.0, 6.0, 0.56, 320, 380, En338);

    /// <summary>C24 softwood (EN 338:2009 Table 1): fm,k 24, fc,0,k 21 MPa, E0,05 7.4 GPa (checked against published copies), ρk 350 kg/m³ (from memory).</summary>
    public static TimberMaterial C24 { get; } = Class("C24", TimberProduct.SolidSoftwood, 24, 14, 21, 4.0, 11.0, 7.4, 0.69, 350, 420, En338Checked);

    /// <summary>C30 softwood (EN 338:2009 Table 1): fm,k 30, fc,0,k 23 MPa, E0,05 8.0 GPa (checked against published copies), ρk 380 kg/m³ (from memory).</summary>
    public static TimberMaterial C30 { get; } = Class("C30", TimberProduct.SolidSoftwood, 30, 18, 23, 4.0, 12.0, 8.0, 0.75, 380, 460, En338Checked);

    /// <summary>D30 hardwood (EN 338:2009 Table 1): fm,k 30 MPa (checked), fc,0,k 23 MPa, E0,05 8.0 GPa, ρk 530 kg/m³ (from memory).</summary>
    public static TimberMaterial D30 { get; } = Class("D30", TimberProduct.SolidHardwood, 30, 18, 23, 4.0, 10.0, 8.0, 0.60, 530, 640, En338);

    /// <summary>D40 hardwood (EN 338:2009 Table 1): fm,k 40 MPa (checked), fc,0,k 26 MPa, E0,05 9.4 GPa, ρk 590 kg/m³ (from memory).</summary>
    public static TimberMaterial D40 { get; } = Class("D40", TimberProduct.SolidHardwood, 40, 24, 26, 4.0, 11.0, 9.4, 0.69, 590, 700, En338);

    /// <summary>GL24h homogeneous glulam (EN 14080:2013 Table 5, checked against a published copy): fm,g,k 24, fc,0,g,k 24 MPa, E0,g,05 9.6 GPa.</summary>
    public static TimberMaterial GL24h { get; } = Class("GL24h", TimberProduct.GlulamHomogeneous, 24, 19.2, 24, 3.5, 11.5, 9.6, 0.65, 385, 420, En14080H);

    /// <summary>GL28h homogeneous glulam (EN 14080:2013 Table 5, checked against a published copy): fm,g,k 28, fc,0,g,k 28 MPa, E0,g,05 10.5 GPa.</summary>
    public static TimberMaterial GL28h { get; } = Class("GL28h", TimberProduct.GlulamHomogeneous, 28, 22.3, 28, 3.5, 12.6, 10.5, 0.65, 425, 460, En14080H);

    /// <summary>GL30h homogeneous glulam (EN 14080:2013 Table 5, checked against a published copy): fm,g,k 30, fc,0,g,k 30 MPa, E0,g,05 11.3 GPa, ρg,k 430 kg/m³.</summary>
    public static TimberMaterial GL30h { get; } = Class("GL30h", TimberProduct.GlulamHomogeneous, 30, 24, 30, 3.5, 13.6, 11.3, 0.65, 430, 480, En14080H);

    /// <summary>GL32h homogeneous glulam (EN 14080:2013 Table 5, checked against a published copy): fm,g,k 32, fc,0,g,k 32 MPa, E0,g,05 11.8 GPa.</summary>
    public static TimberMaterial GL32h { get; } = Class("GL32h", TimberProduct.GlulamHomogeneous, 32, 25.6, 32, 3.5, 14.2, 11.8, 0.65, 440, 490, En14080H);

    /// <summary>GL24c combined glulam (EN 14080:2013 Table 4; strengths and moduli checked against a published copy, Gg,mean and densities from memory): fm,g,k 24, fc,0,g,k 21.5 MPa, E0,g,05 9.1 GPa.</summary>
    public static TimberMaterial GL24c { get; } = Class("GL24c", TimberProduct.GlulamCombined, 24, 17, 21.5, 3.5, 11.0, 9.1, 0.65, 365, 400, En14080C);

    /// <summary>GL28c combined glulam (EN 14080:2013 Table 4; strengths and moduli checked against a published copy, Gg,mean and densities from memory): fm,g,k 28, fc,0,g,k 24 MPa, E0,g,05 10.4 GPa.</summary>
    public static TimberMaterial GL28c { get; } = Class("GL28c", TimberProduct.GlulamCombined, 28, 19.5, 24, 3.5, 12.5, 10.4, 0.65, 390, 420, En14080C);

    /// <summary>GL30c combined glulam (EN 14080:2013 Table 4; strengths and moduli checked against a published copy, Gg,mean and densities from memory): fm,g,k 30, fc,0,g,k 24.5 MPa, E0,g,05 10.8 GPa.</summary>
    public static TimberMaterial GL30c { get; } = Class("GL30c", TimberProduct.GlulamCombined, 30, 19.5, 24.5, 3.5, 13.0, 10.8, 0.65, 390, 430, En14080C);

    /// <summary>Every preset, solid classes first, for catalogues and tests.</summary>
    public static System.Collections.Generic.IReadOnlyList<TimberMaterial> All { get; } =
        [C16, C18, C24, C30, D30, D40, GL24h, GL28h, GL30h, GL32h, GL24c, GL28c, GL30c];
}
