using CompressionMembers.Results;

namespace CompressionMembers.Methods.Timber;

/// <summary>The trace steps of the EN 1995-1-1 column kernel, shared by the normal and the fire design methods.</summary>
internal static class Ec5Trace
{
    private const string S21 = "EN 1995-1-1 6.3.2 (6.21)";
    private const string S22 = "EN 1995-1-1 6.3.2 (6.22)";

    /// <summary>Steps from the slenderness to the verdict. <paramref name="fi"/> is ",fi" in fire, "" otherwise.</summary>
    internal static void Write(CalculationTrace t, in Ec5Input i, in Ec5Output o, string fi)
    {
        t.Add("Lef,y", "effective length about y", "Lcr,y", i.LefYM, StepUnit.Length, "restraint");
        t.Add("Lef,z", "effective length about z", "Lcr,z", i.LefZM, StepUnit.Length, "restraint");
        t.Add("λy", "slenderness ratio about y", "Lef,y / iy" + fi, o.LambdaY, StepUnit.None, S21);
        t.Add("λz", "slenderness ratio about z", "Lef,z / iz" + fi, o.LambdaZ, StepUnit.None, S22);
        t.Add("λrel,y", "relative slenderness about y", "λy / π × √(fc,0,k / E0,05)", o.LambdaRelY, StepUnit.None, S21);
        t.Add("λrel,z", "relative slenderness about z", "λz / π × √(fc,0,k / E0,05)", o.LambdaRelZ, StepUnit.None, S22);
        t.Add("βc", "straightness factor", "0.2 solid timber, 0.1 glulam and LVL", i.BetaC, StepUnit.None, En1995Factors.BetaCRef);
        t.Add("ky", "instability factor term about y", "0.5 (1 + βc (λrel,y − 0.3) + λrel,y²)", o.KY, StepUnit.None, "EN 1995-1-1 6.3.2 (6.27)");
        t.Add("kz", "instability factor term about z", "0.5 (1 + βc (λrel,z − 0.3) + λrel,z²)", o.KZ, StepUnit.None, "EN 1995-1-1 6.3.2 (6.28)");
        if (o.LambdaRelY <= 0.3) t.Note("λrel,y ≤ 0.3: no reduction for buckling about y, kc,y = 1.", "EN 1995-1-1 6.3.2(2)");
        t.Add("kc,y", "instability factor about y", o.LambdaRelY <= 0.3 ? "1 (λrel,y ≤ 0.3)" : "1 / (ky + √(ky² − λrel,y²))", o.KcY, StepUnit.None, "EN 1995-1-1 6.3.2 (6.25)");
        if (o.LambdaRelZ <= 0.3) t.Note("λrel,z ≤ 0.3: no reduction for buckling about z, kc,z = 1.", "EN 1995-1-1 6.3.2(2)");
        t.Add("kc,z", "instability factor about z", o.LambdaRelZ <= 0.3 ? "1 (λrel,z ≤ 0.3)" : "1 / (kz + √(kz² − λrel,z²))", o.KcZ, StepUnit.None, "EN 1995-1-1 6.3.2 (6.26)");

        string dRef = fi.Length == 0 ? "EN 1995-1-1 2.4.1 (2.14)" : "EN 1995-1-2 2.3 (2.1)";
        string km = fi.Length == 0 ? "kmod" : "kmod,fi";
        string gm = fi.Length == 0 ? "γM" : "γM,fi";
        // The symbols of the stresses and strengths, with ",fi" in fire, so that every expression names the step it uses.
        string sc = "σc,0,d" + fi, fc = "fc,0,d" + fi, smy = "σm,y,d" + fi, smz = "σm,z,d" + fi, fmy = "fm,y,d" + fi, fmz = "fm,z,d" + fi;
        t.Add(fc, "design compression strength parallel to grain", fi.Length == 0 ? "kmod fc,0,k / γM" : "kmod,fi kfi fc,0,k / γM,fi", o.Fc0dPa, StepUnit.Stress, dRef);
        t.Add(sc, "design compressive stress", "NEd / A" + fi, o.SigmaCPa, StepUnit.Stress, "EN 1995-1-1 6.1.4");
        if (o.Bending)
        {
            t.Add("Wy" + fi, "section modulus about y", "Iy" + fi + " / zmax", i.WyM3, StepUnit.SectionModulus, "section");
            t.Add("Wz" + fi, "section modulus about z", "Iz" + fi + " / ymax", i.WzM3, StepUnit.SectionModulus, "section");
            t.Add(fmy, "design bending strength about y", fi.Length == 0 ? $"{km} kh,y fm,k / {gm}" : $"{km} kfi fm,k / {gm}", o.FmydPa, StepUnit.Stress, dRef);
            t.Add(fmz, "design bending strength about z", fi.Length == 0 ? $"{km} kh,z fm,k / {gm}" : $"{km} kfi fm,k / {gm}", o.FmzdPa, StepUnit.Stress, dRef);
            t.Add(smy, "design bending stress about y", "My,Ed / Wy" + fi, o.SigmaMyPa, StepUnit.Stress, "EN 1995-1-1 6.1.6");
            t.Add(smz, "design bending stress about z", "Mz,Ed / Wz" + fi, o.SigmaMzPa, StepUnit.Stress, "EN 1995-1-1 6.1.6");
            t.Add("km", "redistribution factor for biaxial bending", i.Rectangular ? "0.7 (rectangular section)" : "1.0 (other sections)", i.Km, StepUnit.None, "EN 1995-1-1 6.1.6(2)");
            if (o.Stocky)
            {
                t.Note("λrel,y ≤ 0.3 and λrel,z ≤ 0.3: the cross-section expressions (6.19) and (6.20) apply.", "EN 1995-1-1 6.3.2(2)");
                t.Add("u(6.19)", "compression and bending, bending about y leading", $"({sc} / {fc})² + {smy} / {fmy} + km {smz} / {fmz}", o.UY, StepUnit.None, "EN 1995-1-1 6.2.4 (6.19)");
                t.Add("u(6.20)", "compression and bending, bending about z leading", $"({sc} / {fc})² + km {smy} / {fmy} + {smz} / {fmz}", o.UZ, StepUnit.None, "EN 1995-1-1 6.2.4 (6.20)");
            }
            else
            {
                t.Note("λrel > 0.3 about at least one axis: the column expressions (6.23) and (6.24) apply.", "EN 1995-1-1 6.3.2(3)");
                t.Add("u(6.23)", "compression and bending, buckling about y", $"{sc} / (kc,y {fc}) + {smy} / {fmy} + km {smz} / {fmz}", o.UY, StepUnit.None, "EN 1995-1-1 6.3.2 (6.23)");
                t.Add("u(6.24)", "compression and bending, buckling about z", $"{sc} / (kc,z {fc}) + km {smy} / {fmy} + {smz} / {fmz}", o.UZ, StepUnit.None, "EN 1995-1-1 6.3.2 (6.24)");
            }
        }
        else
        {
            t.Add("uy", "compression, buckling about y", $"{sc} / (kc,y {fc})", o.UY, StepUnit.None, o.LambdaRelY <= 0.3 ? "EN 1995-1-1 6.1.4 (6.2)" : "EN 1995-1-1 6.3.2 (6.23)");
            t.Add("uz", "compression, buckling about z", $"{sc} / (kc,z {fc})", o.UZ, StepUnit.None, o.LambdaRelZ <= 0.3 ? "EN 1995-1-1 6.1.4 (6.2)" : "EN 1995-1-1 6.3.2 (6.24)");
        }

        if (o.LtbChecked)
        {
            t.Add("Lef,LT", "effective length for lateral torsional buckling", "K,twist × longest segment free to twist", i.LefLtbM, StepUnit.Length, "EN 1995-1-1 6.3.3 Table 6.1 (user's restraint)");
            if (i.UseSoftwoodLtbFormula)
                t.Add("σm,crit", "critical bending stress", "0.78 b² E0,05 / (h Lef,LT)", o.SigmaMCritPa, StepUnit.Stress, "EN 1995-1-1 6.3.3 (6.32)");
            else
            {
                t.Add("G0,05", "fifth-percentile shear modulus", "Gmean × E0,05 / E0,mean (common practice)", o.G005Pa, StepUnit.Stress, "EN 1995-1-1 6.3.3(2)");
                t.Add("Itor", "torsion constant", "rectangle (Roark)", i.TorsionM4, StepUnit.SecondMoment, "section");
                t.Add("σm,crit", "critical bending stress", "π √(E0,05 Iz G0,05 Itor) / (Lef,LT Wy)", o.SigmaMCritPa, StepUnit.Stress, "EN 1995-1-1 6.3.3 (6.31)");
            }
            t.Add("λrel,m", "relative slenderness for bending", "√(fm,k / σm,crit)", o.LambdaRelM, StepUnit.None, "EN 1995-1-1 6.3.3 (6.30)");
            t.Add("kcrit", "lateral buckling factor", o.LambdaRelM <= 0.75 ? "1 (λrel,m ≤ 0.75)" : o.LambdaRelM <= 1.4 ? "1.56 − 0.75 λrel,m" : "1 / λrel,m²", o.KCrit, StepUnit.None, "EN 1995-1-1 6.3.3 (6.34)");
            t.Add("u(6.35)", "compression with lateral torsional buckling", $"(σm,d{fi} / (kcrit fm,d{fi}))² + σc,d{fi} / (kc,z {fc})", o.ULtb, StepUnit.None, "EN 1995-1-1 6.3.3 (6.35)");
        }

        t.Add("Nc,Rd" + fi, "design buckling resistance in pure compression", $"min(kc,y, kc,z) {fc} A{fi}", o.ResistanceN, StepUnit.Force, "EN 1995-1-1 6.3.2");
        t.Add("u", "utilisation (governing check)", "max of the checks above", o.Utilisation, StepUnit.None, Ec5Kernel.CheckName(o));
    }
}
