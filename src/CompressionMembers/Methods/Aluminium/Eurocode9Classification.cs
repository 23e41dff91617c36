using System;
using CompressionMembers.Internal;
using CompressionMembers.Materials.Aluminium;
using UnitsNet;

namespace CompressionMembers.Methods.Aluminium;

/// <summary>
/// The EN 1999-1-1 classification of a single flat part, for your own sections and for parts under a stress gradient:
/// the slenderness β = η b / t with the stress-gradient factor η (6.1.4.3), the class (6.1.4.4, Table 6.2) and the
/// local buckling factor ρc (6.1.5, Table 6.3). <see cref="Eurocode9Compression"/> uses the same rules under uniform
/// compression (η = 1).
/// </summary>
/// <remarks>Tables and formulas recalled from memory (EN 1999-1-1:2007+A1:2009). Thread safety: stateless.</remarks>
public static class Eurocode9Classification
{
    /// <summary>The stress-gradient factor η of 6.1.4.3 (from memory): for internal parts and outstands with the peak
    /// compression at the root, η = 0.70 + 0.30 ψ for 1 ≥ ψ ≥ −1 and η = 0.80 / (1 − ψ) for ψ &lt; −1; for outstands with
    /// the peak compression at the toe, η = 1.</summary>
    /// <param name="stressRatio">ψ, the ratio of the stress at the other edge to the peak compression (1 for uniform
    /// compression, −1 for pure bending of a web), at most 1.</param>
    /// <param name="kind">The kind of part.</param>
    /// <returns>η.</returns>
    /// <exception cref="ArgumentOutOfRangeException">ψ is not finite or greater than 1, or the kind is undefined.</exception>
    public static double StressGradientFactor(double stressRatio, PartKind kind)
    {
        Guard.Finite(stressRatio, nameof(stressRatio), "", "Stress ratio ψ");
        if (stressRatio > 1)
            throw new ArgumentOutOfRangeException(nameof(stressRatio), stressRatio, $"Stress ratio ψ must be at most 1 (ψ = 1 is uniform compression); got {Guard.Show(stressRatio)}.");
        CheckKind(kind);
        if (kind == PartKind.OutstandPeakAtToe) return 1;
        return stressRatio >= -1 ? 0.70 + 0.30 * stressRatio : 0.80 / (1 - stressRatio);
    }

    /// <summary>The slenderness β = η b / t of a flat part.</summary>
    /// <param name="width">Flat width b.</param>
    /// <param name="thickness">Thickness t.</param>
    /// <param name="stressRatio">ψ (1 for uniform compression).</param>
    /// <param name="kind">The kind of part.</param>
    /// <returns>β.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A dimension is not finite and positive, or ψ is out of range.</exception>
    public static double PartSlenderness(Length width, Length thickness, double stressRatio = 1, PartKind kind = PartKind.Internal)
    {
        double b = Si.Meters(width, nameof(width), "Width");
        double t = Si.Meters(thickness, nameof(thickness), "Thickness");
        return StressGradientFactor(stressRatio, kind) * b / t;
    }

    /// <summary>The slenderness of a round tube in uniform compression, β = 3 √(D / t) (6.1.4.3, from memory).</summary>
    /// <param name="outsideDiameter">D.</param>
    /// <param name="wallThickness">t.</param>
    /// <returns>β.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A dimension is not finite and positive.</exception>
    public static double RoundTubeSlenderness(Length outsideDiameter, Length wallThickness)
    {
        double d = Si.Meters(outsideDiameter, nameof(outsideDiameter), "Outside diameter");
        double t = Si.Meters(wallThickness, nameof(wallThickness), "Wall thickness");
        return 3 * Math.Sqrt(d / t);
    }

    /// <summary>The class (1 to 4) of a part of slenderness β (Table 6.2; round tubes as internal parts).</summary>
    /// <param name="slenderness">β.</param>
    /// <param name="proofStrength">f0 of the alloy (for ε = √(250 MPa / f0)).</param>
    /// <param name="bucklingClass">Buckling class of the alloy.</param>
    /// <param name="welded">Whether the part is welded (the welded limits).</param>
    /// <param name="kind">The kind of part.</param>
    /// <returns>The class.</returns>
    /// <exception cref="ArgumentOutOfRangeException">β or f0 is not finite and positive, or an enum is undefined.</exception>
    public static int ClassOf(double slenderness, Pressure proofStrength, BucklingClass bucklingClass, bool welded, PartKind kind)
    {
        double eps = Check(slenderness, proofStrength, bucklingClass, kind);
        return Ec9Rules.ClassOf(slenderness, eps, bucklingClass, welded, kind != PartKind.Internal);
    }

    /// <summary>The local buckling factor ρc of a part (1 unless class 4; Table 6.3, capped at 1).</summary>
    /// <param name="slenderness">β.</param>
    /// <param name="proofStrength">f0 of the alloy.</param>
    /// <param name="bucklingClass">Buckling class of the alloy.</param>
    /// <param name="welded">Whether the part is welded.</param>
    /// <param name="kind">The kind of part.</param>
    /// <returns>ρc in (0, 1].</returns>
    /// <exception cref="ArgumentOutOfRangeException">β or f0 is not finite and positive, or an enum is undefined.</exception>
    public static double LocalBucklingFactor(double slenderness, Pressure proofStrength, BucklingClass bucklingClass, bool welded, PartKind kind)
    {
        double eps = Check(slenderness, proofStrength, bucklingClass, kind);
        return Ec9Rules.RhoC(slenderness, eps, bucklingClass, welded, kind != PartKind.Internal);
    }

    private static double Check(double slenderness, Pressure proofStrength, BucklingClass bucklingClass, PartKind kind)
    {
        Guard.Positive(slenderness, nameof(slenderness), "", "Slenderness β");
        double f = Si.Pascals(proofStrength, nameof(proofStrength), "Proof strength f0");
        if (!Enum.IsDefined(bucklingClass)) throw new ArgumentOutOfRangeException(nameof(bucklingClass), bucklingClass, $"Unknown buckling class {(int)bucklingClass}.");
        CheckKind(kind);
        return Ec9Rules.Epsilon(f);
    }

    private static void CheckKind(PartKind kind)
    {
        if (!Enum.IsDefined(kind)) throw new ArgumentOutOfRangeException(nameof(kind), kind, $"Unknown part kind {(int)kind}.");
    }
}
