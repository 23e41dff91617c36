using System;
using System.Runtime.CompilerServices;
using CompressionMembers.Results;

namespace CompressionMembers.Methods.Timber;

/// <summary>The inputs of the EN 1995-1-1 column and interaction kernel, in SI doubles (m, m², m³, m⁴, Pa, N, N·m).</summary>
internal struct Ec5Input
{
    internal bool Rectangular;
    internal double BM, HM;                 // width b (along y) and depth h (along z); both = d for a circle
    internal double AreaM2, IyM4, IzM4, WyM3, WzM3, TorsionM4;
    internal double LefYM, LefZM, LefLtbM;
    internal double LambdaY, LambdaZ;       // Lef / i, resolved with the member (or with the residual section in fire)
    internal double LambdaRelY, LambdaRelZ; // λ/π √(fc,0,k / E0,05) (6.21, 6.22), resolved with the member (or in fire)
    internal double Fc0kPa, FmkPa, E005Pa, GMeanPa, E0MeanPa;
    internal double Kmod, GammaM, KhY, KhZ, BetaC, Km;
    internal double NEdN, MyEdNm, MzEdNm;   // design compression and first-order design moments at the governing section
    internal bool CheckLtb, UseSoftwoodLtbFormula;
}

/// <summary>What the kernel found.</summary>
internal struct Ec5Output
{
    internal double LambdaY, LambdaZ, LambdaRelY, LambdaRelZ, KY, KZ, KcY, KcZ;
    internal double Fc0dPa, FmydPa, FmzdPa, SigmaCPa, SigmaMyPa, SigmaMzPa;
    internal bool Bending, Stocky;          // Stocky: λrel,y ≤ 0.3 and λrel,z ≤ 0.3 (6.19/6.20)
    internal double UY, UZ;                 // (6.23)/(6.24) or (6.19)/(6.20), or the axial check alone without bending
    internal bool LtbChecked;
    internal double G005Pa, SigmaMCritPa, LambdaRelM, KCrit, ULtb;
    internal double Utilisation, ResistanceN;
    internal Governing Governs;
}

internal enum Governing { AboutY, AboutZ, Ltb }

/// <summary>
/// EN 1995-1-1:2004+A2:2014 §6.3.2 and §6.3.3 on doubles: relative slenderness (6.21, 6.22), instability factors k and kc
/// (6.25 – 6.28) with βc (6.29), the interaction expressions (6.19, 6.20, 6.23, 6.24) with km (6.1.6), and lateral
/// torsional stability σm,crit (6.31/6.32), λrel,m (6.30), kcrit (6.34) and (6.35). Pure; allocates nothing.
/// </summary>
internal static class Ec5Kernel
{
    /// <summary>Relative slenderness λrel = λ/π √(fc,0,k / E0,05) (6.21, 6.22).</summary>
    internal static double RelativeSlenderness(double lambda, double fc0kPa, double e005Pa) =>
        lambda / Math.PI * Math.Sqrt(fc0kPa / e005Pa);

    /// <summary>k = 0.5 (1 + βc (λrel − 0.3) + λrel²) (6.27, 6.28).</summary>
    internal static double K(double lambdaRel, double betaC) => 0.5 * (1 + betaC * (lambdaRel - 0.3) + lambdaRel * lambdaRel);

    /// <summary>kc = 1 / (k + √(k² − λrel²)) (6.25, 6.26); 1 for λrel ≤ 0.3 (6.3.2(2): no reduction).</summary>
    internal static double Kc(double lambdaRel, double betaC)
    {
        if (lambdaRel <= 0.3) return 1.0;
        return 1 / InverseKc(lambdaRel, K(lambdaRel, betaC));
    }

    /// <summary>kcrit of (6.34) from λrel,m.</summary>
    internal static double KCrit(double lambdaRelM) =>
        lambdaRelM <= 0.75 ? 1.0 : lambdaRelM <= 1.4 ? 1.56 - 0.75 * lambdaRelM : 1 / (lambdaRelM * lambdaRelM);

    /// <summary>1 / kc = k + √(k² − λrel²) (6.25, 6.26) from λrel and the k already computed for it, 1 for λrel ≤ 0.3: the
    /// divisor of <see cref="Kc"/> (1 / 1 = 1 exactly, so 1 / this is kc to the bit either way).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static double InverseKc(double lambdaRel, double k) =>
        lambdaRel <= 0.3 ? 1.0 : k + Math.Sqrt(k * k - lambdaRel * lambdaRel);

    /// <summary>The pure compression check on scalars — (6.25)–(6.28) about both axes, then σc,0,d ≤ kc fc,0,d — shared
    /// by the straight-line compression paths of the column and fire methods; the same operations as <see cref="Run"/>.
    /// The utilisation σc,0,d / (kc fc,0,d) is formed as σc,0,d / fc,0,d × (1 / kc), from the divisor of kc: so the last
    /// steps of a check's chain of dependent operations are a multiplication, not two divisions after kc's (the utilisation
    /// agrees with the standard's order to rounding, TimberPropertyTests; kc and the resistance are unchanged).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static void Compression(double lrY, double lrZ, double betaC, double fc0dPa, double sigmaCPa, double areaM2,
        out double kY, out double kZ, out double kcY, out double kcZ, out double uY, out double uZ, out double resistanceN)
    {
        kY = K(lrY, betaC);
        kZ = K(lrZ, betaC);
        double rY = InverseKc(lrY, kY), rZ = InverseKc(lrZ, kZ);
        kcY = 1 / rY;
        kcZ = 1 / rZ;
        double s = sigmaCPa / fc0dPa;
        uY = s * rY;
        uZ = s * rZ;
        resistanceN = Math.Min(kcY, kcZ) * fc0dPa * areaM2;
    }

    internal static void Run(in Ec5Input i, out Ec5Output o)
    {
        o = default;
        o.LambdaY = i.LambdaY;
        o.LambdaZ = i.LambdaZ;
        o.LambdaRelY = i.LambdaRelY;                                 // (6.21)
        o.LambdaRelZ = i.LambdaRelZ;                                 // (6.22)
        o.KY = K(o.LambdaRelY, i.BetaC);
        o.KZ = K(o.LambdaRelZ, i.BetaC);
        double rY = InverseKc(o.LambdaRelY, o.KY), rZ = InverseKc(o.LambdaRelZ, o.KZ);   // 1 / kc, kept for the utilisation
        o.KcY = 1 / rY;                                              // (6.25), as Kc
        o.KcZ = 1 / rZ;                                              // (6.26)

        o.Fc0dPa = i.Kmod * i.Fc0kPa / i.GammaM;                       // 2.4.1 (2.14)
        o.SigmaCPa = i.NEdN / i.AreaM2;
        o.Bending = i.MyEdNm != 0 || i.MzEdNm != 0;
        o.Stocky = o.LambdaRelY <= 0.3 && o.LambdaRelZ <= 0.3;

        if (!o.Bending)
        {
            // Pure compression: σc,0,d ≤ kc fc,0,d, linear in the load ((6.2) with kc = 1 in the stocky range); formed as in
            // Compression, σc,0,d / fc,0,d × (1 / kc).
            double s = o.SigmaCPa / o.Fc0dPa;
            o.UY = s * rY;
            o.UZ = s * rZ;
            o.Governs = o.UY >= o.UZ ? Governing.AboutY : Governing.AboutZ;
            o.Utilisation = Math.Max(o.UY, o.UZ);
        }
        else Bending(i, ref o);
        o.ResistanceN = Math.Min(o.KcY, o.KcZ) * o.Fc0dPa * i.AreaM2;
    }

    // Compression with bending (6.19/6.20 or 6.23/6.24) and lateral torsional stability (6.35).
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Bending(in Ec5Input i, ref Ec5Output o)
    {
        o.FmydPa = i.Kmod * i.KhY * i.FmkPa / i.GammaM;
        o.FmzdPa = i.Kmod * i.KhZ * i.FmkPa / i.GammaM;
        o.SigmaMyPa = Math.Abs(i.MyEdNm) / i.WyM3;
        o.SigmaMzPa = Math.Abs(i.MzEdNm) / i.WzM3;
        double my = o.SigmaMyPa / o.FmydPa, mz = o.SigmaMzPa / o.FmzdPa;
        if (o.Stocky)
        {
            double c = o.SigmaCPa / o.Fc0dPa;
            o.UY = c * c + my + i.Km * mz;                           // (6.19)
            o.UZ = c * c + i.Km * my + mz;                           // (6.20)
        }
        else
        {
            o.UY = o.SigmaCPa / (o.KcY * o.Fc0dPa) + my + i.Km * mz; // (6.23)
            o.UZ = o.SigmaCPa / (o.KcZ * o.Fc0dPa) + i.Km * my + mz; // (6.24)
        }

        o.LtbChecked = i.CheckLtb && i.Rectangular && o.SigmaMyPa > 0;
        if (o.LtbChecked)
        {
            if (i.UseSoftwoodLtbFormula)
                o.SigmaMCritPa = 0.78 * i.BM * i.BM * i.E005Pa / (i.HM * i.LefLtbM);                     // (6.32)
            else
            {
                o.G005Pa = i.GMeanPa * i.E005Pa / i.E0MeanPa;           // G0,05 = Gmean E0,05 / E0,mean (common practice)
                o.SigmaMCritPa = Math.PI * Math.Sqrt(i.E005Pa * i.IzM4 * o.G005Pa * i.TorsionM4) / (i.LefLtbM * i.WyM3); // (6.31)
            }
            o.LambdaRelM = Math.Sqrt(i.FmkPa / o.SigmaMCritPa);       // (6.30)
            o.KCrit = KCrit(o.LambdaRelM);                           // (6.34)
            double m = o.SigmaMyPa / (o.KCrit * o.FmydPa);
            o.ULtb = m * m + o.SigmaCPa / (o.KcZ * o.Fc0dPa);         // (6.35)
        }

        o.Governs = o.UY >= o.UZ ? Governing.AboutY : Governing.AboutZ;
        o.Utilisation = Math.Max(o.UY, o.UZ);
        if (o.LtbChecked && o.ULtb > o.Utilisation)
        {
            o.Utilisation = o.ULtb;
            o.Governs = Governing.Ltb;
        }
    }

    /// <summary>The governing check of pure compression, about y or z.</summary>
    internal static string CompressionCheckName(bool aboutY, double lambdaRel) => aboutY
        ? lambdaRel <= 0.3 ? "EN 1995-1-1 6.1.4 (6.2): compression, λrel,y ≤ 0.3" : "EN 1995-1-1 6.3.2 (6.23): column buckling about y"
        : lambdaRel <= 0.3 ? "EN 1995-1-1 6.1.4 (6.2): compression, λrel,z ≤ 0.3" : "EN 1995-1-1 6.3.2 (6.24): column buckling about z";

    internal static string CheckName(in Ec5Output o) => o.Governs switch
    {
        Governing.Ltb => "EN 1995-1-1 6.3.3 (6.35): compression with lateral torsional buckling",
        Governing.AboutY when !o.Bending => CompressionCheckName(true, o.LambdaRelY),
        Governing.AboutZ when !o.Bending => CompressionCheckName(false, o.LambdaRelZ),
        Governing.AboutY => o.Stocky ? "EN 1995-1-1 6.2.4 (6.19): compression and bending, λrel ≤ 0.3" : "EN 1995-1-1 6.3.2 (6.23): compression and bending, buckling about y",
        _ => o.Stocky ? "EN 1995-1-1 6.2.4 (6.20): compression and bending, λrel ≤ 0.3" : "EN 1995-1-1 6.3.2 (6.24): compression and bending, buckling about z",
    };

    internal static BucklingAxis Axis(in Ec5Output o) => o.Governs switch
    {
        Governing.AboutY => BucklingAxis.Y,
        _ => BucklingAxis.Z,
    };

    internal static FailureMode Mode(in Ec5Output o)
    {
        if (o.Governs == Governing.Ltb) return FailureMode.LateralTorsionalBuckling;
        if (o.Bending) return FailureMode.CombinedCompressionAndBending;
        double kc = o.Governs == Governing.AboutY ? o.KcY : o.KcZ;
        return kc >= 1.0 ? FailureMode.Yielding : FailureMode.FlexuralBuckling;
    }
}
