using System;
using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using CompressionMembers.Internal;

namespace CompressionMembers.Batch;

/// <summary>
/// Vectorised closed-form kernels for parametric studies of many cases: Euler critical force, the Johnson parabola with
/// the Euler hyperbola, the EN 1995-1-1 instability factor kc and the EN 1999-1-1 reduction factor χ. Inputs are SI
/// doubles in spans (one value per case); results are written into the caller's span, so nothing is allocated.
/// </summary>
/// <remarks>
/// <para>Each kernel evaluates the same expression, in the same order of operations, as the scalar method it mirrors
/// (<c>EulerBuckling</c>, <c>JohnsonParabola</c>, <c>Ec5ColumnStability</c>, <c>Eurocode9Compression</c>), with
/// <see cref="Vector{T}"/> lanes for the bulk and the scalar formula for the remainder. Multiplication, division and
/// square root are correctly rounded in both, and no fused multiply-add is used, so the results are bit-identical to the
/// scalar kernels (0 ulp; the tests check it on random inputs, remainder lanes included).</para>
/// <para>Validation: every input span must have the destination's length, every value must be finite and in range
/// (lengths, moduli, strengths and second moments greater than 0; slenderness not negative); otherwise an
/// <see cref="ArgumentException"/> (or <see cref="ArgumentOutOfRangeException"/>) names the parameter, the index and the
/// value. Inputs are validated before anything is written. The destination may be the same span as an input, but must
/// not partially overlap one. These kernels do not check applicability (material, section, load case): they are the
/// formulas alone. Thread safety: stateless.</para>
/// </remarks>
public static class BatchKernels
{
    private const double PiSquared = Math.PI * Math.PI;

    /// <summary>Euler critical forces Ncr = π² E I / Lcr² (Timoshenko &amp; Gere §2.2), one per case.</summary>
    /// <param name="secondMomentM4">Second moments of area I about the buckling axis, m⁴ (greater than 0).</param>
    /// <param name="effectiveLengthM">Effective lengths Lcr, m (greater than 0).</param>
    /// <param name="elasticModulusPa">Elastic modulus E, Pa (greater than 0), common to every case.</param>
    /// <param name="criticalForceN">Destination for Ncr, N; same length as the inputs.</param>
    /// <exception cref="ArgumentException">The lengths differ, or the destination partially overlaps an input.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or not greater than 0.</exception>
    public static void EulerCriticalForce(ReadOnlySpan<double> secondMomentM4, ReadOnlySpan<double> effectiveLengthM, double elasticModulusPa, Span<double> criticalForceN)
    {
        SameLength(secondMomentM4, criticalForceN, nameof(secondMomentM4), nameof(criticalForceN));
        SameLength(effectiveLengthM, criticalForceN, nameof(effectiveLengthM), nameof(criticalForceN));
        NoPartialOverlap(secondMomentM4, criticalForceN, nameof(criticalForceN));
        NoPartialOverlap(effectiveLengthM, criticalForceN, nameof(criticalForceN));
        Guard.Positive(elasticModulusPa, nameof(elasticModulusPa), "Pa", "Elastic modulus E");
        AllPositive(secondMomentM4, nameof(secondMomentM4), "m⁴", "Second moment of area I");
        AllPositive(effectiveLengthM, nameof(effectiveLengthM), "m", "Effective length Lcr");

        int n = criticalForceN.Length, i = 0;
        if (Vector.IsHardwareAccelerated && n >= Vector<double>.Count)
        {
            var pe = new Vector<double>(PiSquared * elasticModulusPa);
            ref double iRef = ref MemoryMarshal.GetReference(secondMomentM4);
            ref double lRef = ref MemoryMarshal.GetReference(effectiveLengthM);
            ref double oRef = ref MemoryMarshal.GetReference(criticalForceN);
            for (; i <= n - Vector<double>.Count; i += Vector<double>.Count)
            {
                var iv = Load(ref iRef, i);
                var lv = Load(ref lRef, i);
                Store(pe * iv / (lv * lv), ref oRef, i);
            }
        }
        for (; i < n; i++)
        {
            double l = effectiveLengthM[i];
            criticalForceN[i] = PiSquared * elasticModulusPa * secondMomentM4[i] / (l * l);
        }
    }

    /// <summary>Critical stresses of the Johnson parabola below the transition slenderness Cc = √(2π² E / f),
    /// σcr = f − (f λ / 2π)² / E, and of the Euler hyperbola σcr = π² E / λ² from Cc on (Shigley, columns).</summary>
    /// <param name="slenderness">Slenderness ratios λ = Lcr / i (greater than 0).</param>
    /// <param name="elasticModulusPa">Elastic modulus E, Pa (greater than 0).</param>
    /// <param name="strengthPa">Compressive (yield) strength f, Pa (greater than 0).</param>
    /// <param name="criticalStressPa">Destination for σcr, Pa; same length as <paramref name="slenderness"/>.</param>
    /// <exception cref="ArgumentException">The lengths differ, or the destination partially overlaps the input.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or not greater than 0.</exception>
    public static void JohnsonCriticalStress(ReadOnlySpan<double> slenderness, double elasticModulusPa, double strengthPa, Span<double> criticalStressPa)
    {
        SameLength(slenderness, criticalStressPa, nameof(slenderness), nameof(criticalStressPa));
        NoPartialOverlap(slenderness, criticalStressPa, nameof(criticalStressPa));
        Guard.Positive(elasticModulusPa, nameof(elasticModulusPa), "Pa", "Elastic modulus E");
        Guard.Positive(strengthPa, nameof(strengthPa), "Pa", "Compressive strength f");
        AllPositive(slenderness, nameof(slenderness), "", "Slenderness λ");

        double e = elasticModulusPa, f = strengthPa;
        double cc = Math.Sqrt(2 * Math.PI * Math.PI * e / f);   // as JohnsonParabola.TransitionSlenderness
        int n = criticalStressPa.Length, i = 0;
        if (Vector.IsHardwareAccelerated && n >= Vector<double>.Count)
        {
            var ccV = new Vector<double>(cc);
            var fV = new Vector<double>(f);
            var eV = new Vector<double>(e);
            var twoPi = new Vector<double>(2 * Math.PI);
            var pe = new Vector<double>(Math.PI * Math.PI * e);
            ref double sRef = ref MemoryMarshal.GetReference(slenderness);
            ref double oRef = ref MemoryMarshal.GetReference(criticalStressPa);
            for (; i <= n - Vector<double>.Count; i += Vector<double>.Count)
            {
                var lam = Load(ref sRef, i);
                var k = fV * lam / twoPi;
                var johnson = fV - k * k / eV;
                var euler = pe / (lam * lam);
                Store(Vector.ConditionalSelect(Vector.LessThan(lam, ccV), johnson, euler), ref oRef, i);
            }
        }
        for (; i < n; i++)
        {
            double lam = slenderness[i];
            if (lam < cc)
            {
                double k = f * lam / (2 * Math.PI);
                criticalStressPa[i] = f - k * k / e;
            }
            else
                criticalStressPa[i] = Math.PI * Math.PI * e / (lam * lam);
        }
    }

    /// <summary>Instability factors kc of EN 1995-1-1 6.3.2: k = 0.5 (1 + βc (λrel − 0.3) + λrel²) (6.27, 6.28),
    /// kc = 1 / (k + √(k² − λrel²)) (6.25, 6.26), and kc = 1 for λrel ≤ 0.3.</summary>
    /// <param name="relativeSlenderness">Relative slenderness λrel (6.21, 6.22), not negative.</param>
    /// <param name="betaC">βc (6.29): 0.2 for solid timber, 0.1 for glulam and LVL; greater than 0 and at most 1.</param>
    /// <param name="kc">Destination for kc; same length as <paramref name="relativeSlenderness"/>.</param>
    /// <exception cref="ArgumentException">The lengths differ, or the destination partially overlaps the input.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or out of range.</exception>
    public static void Ec5InstabilityFactor(ReadOnlySpan<double> relativeSlenderness, double betaC, Span<double> kc)
    {
        SameLength(relativeSlenderness, kc, nameof(relativeSlenderness), nameof(kc));
        NoPartialOverlap(relativeSlenderness, kc, nameof(kc));
        Guard.Positive(betaC, nameof(betaC), "", "Straightness factor βc");
        Guard.InRange(betaC, 0, 1, nameof(betaC), "", "Straightness factor βc");
        AllNonNegative(relativeSlenderness, nameof(relativeSlenderness), "Relative slenderness λrel");
        ReductionCurve(relativeSlenderness, betaC, 0.3, 0.3, capAtOne: false, kc);
    }

    /// <summary>Reduction factors χ for flexural (or torsional) buckling of EN 1999-1-1 6.3.1.2:
    /// φ = 0.5 [1 + α (λ̄ − λ̄0) + λ̄²], χ = 1 / (φ + √(φ² − λ̄²)) at most 1, and χ = 1 for λ̄ ≤ λ̄0.</summary>
    /// <param name="relativeSlenderness">Relative slenderness λ̄ = √(Aeff f0 / Ncr), not negative.</param>
    /// <param name="alpha">Imperfection factor α of Table 6.6 (0.20 class A, 0.32 class B flexural); greater than 0, at most 1.</param>
    /// <param name="lambda0">Limit of the plateau λ̄0 of Table 6.6 (0.10 class A, 0 class B flexural); from 0 to 1.</param>
    /// <param name="chi">Destination for χ (without κ); same length as <paramref name="relativeSlenderness"/>.</param>
    /// <exception cref="ArgumentException">The lengths differ, or the destination partially overlaps the input.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or out of range.</exception>
    public static void Ec9ReductionFactor(ReadOnlySpan<double> relativeSlenderness, double alpha, double lambda0, Span<double> chi)
    {
        SameLength(relativeSlenderness, chi, nameof(relativeSlenderness), nameof(chi));
        NoPartialOverlap(relativeSlenderness, chi, nameof(chi));
        Guard.Positive(alpha, nameof(alpha), "", "Imperfection factor α");
        Guard.InRange(alpha, 0, 1, nameof(alpha), "", "Imperfection factor α");
        Guard.InRange(lambda0, 0, 1, nameof(lambda0), "", "Plateau limit λ̄0");
        AllNonNegative(relativeSlenderness, nameof(relativeSlenderness), "Relative slenderness λ̄");
        ReductionCurve(relativeSlenderness, alpha, lambda0, lambda0, capAtOne: true, chi);
    }

    /// <summary>0.5 (1 + a (λ − shift) + λ²), 1 / (φ + √(φ² − λ²)) and 1 for λ ≤ plateau, as Ec5Kernel.Kc and Ec9Rules.Chi.</summary>
    private static void ReductionCurve(ReadOnlySpan<double> lambda, double a, double shift, double plateau, bool capAtOne, Span<double> dst)
    {
        int n = dst.Length, i = 0;
        if (Vector.IsHardwareAccelerated && n >= Vector<double>.Count)
        {
            var one = Vector<double>.One;
            var half = new Vector<double>(0.5);
            var aV = new Vector<double>(a);
            var shiftV = new Vector<double>(shift);
            var plateauV = new Vector<double>(plateau);
            ref double lRef = ref MemoryMarshal.GetReference(lambda);
            ref double oRef = ref MemoryMarshal.GetReference(dst);
            for (; i <= n - Vector<double>.Count; i += Vector<double>.Count)
            {
                var l = Load(ref lRef, i);
                var l2 = l * l;
                var phi = half * (one + aV * (l - shiftV) + l2);
                var r = one / (phi + Vector.SquareRoot(phi * phi - l2));
                if (capAtOne) r = Vector.Min(one, r);
                // Lanes on the plateau take 1 (their φ² − λ² may be negative there, giving NaN, which is discarded).
                Store(Vector.ConditionalSelect(Vector.LessThanOrEqual(l, plateauV), one, r), ref oRef, i);
            }
        }
        for (; i < n; i++)
        {
            double l = lambda[i];
            if (l <= plateau) { dst[i] = 1.0; continue; }
            double phi = 0.5 * (1 + a * (l - shift) + l * l);
            double r = 1 / (phi + Math.Sqrt(phi * phi - l * l));
            dst[i] = capAtOne ? Math.Min(1.0, r) : r;
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static Vector<double> Load(ref double start, int i) =>
        Unsafe.ReadUnaligned<Vector<double>>(ref Unsafe.As<double, byte>(ref Unsafe.Add(ref start, i)));

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Store(Vector<double> v, ref double start, int i) =>
        Unsafe.WriteUnaligned(ref Unsafe.As<double, byte>(ref Unsafe.Add(ref start, i)), v);

    private static void SameLength(ReadOnlySpan<double> input, Span<double> destination, string inputName, string destinationName)
    {
        if (input.Length != destination.Length)
            throw new ArgumentException(
                $"{inputName} has {input.Length} values but {destinationName} has {destination.Length}; give one value per case in every span.", inputName);
    }

    private static void NoPartialOverlap(ReadOnlySpan<double> input, Span<double> destination, string destinationName)
    {
        if (input.Overlaps(destination, out int offset) && offset != 0)
            throw new ArgumentException(
                $"{destinationName} partially overlaps an input span; use the same span (in place) or separate memory.", destinationName);
    }

    private static void AllPositive(ReadOnlySpan<double> values, string paramName, string unit, string what)
    {
        // Vector lanes first (NaN fails both comparisons); the scalar scan finds the offending index and the remainder.
        if (!AllInRange(values, strictlyPositive: true))
        {
            for (int i = 0; i < values.Length; i++)
            {
                double v = values[i];
                if (!(v > 0) || !double.IsFinite(v)) ThrowBad(v, i, paramName, unit, what, "a finite number greater than 0");
            }
        }
    }

    private static void AllNonNegative(ReadOnlySpan<double> values, string paramName, string what)
    {
        if (!AllInRange(values, strictlyPositive: false))
        {
            for (int i = 0; i < values.Length; i++)
            {
                double v = values[i];
                if (!(v >= 0) || !double.IsFinite(v)) ThrowBad(v, i, paramName, "", what, "a finite number not less than 0");
            }
        }
    }

    /// <summary>Whether every value is finite and &gt; 0 (or ≥ 0): vector lanes, then the scalar remainder.</summary>
    private static bool AllInRange(ReadOnlySpan<double> values, bool strictlyPositive)
    {
        int n = values.Length, i = 0;
        if (Vector.IsHardwareAccelerated && n >= Vector<double>.Count)
        {
            var zero = Vector<double>.Zero;
            var inf = new Vector<double>(double.PositiveInfinity);
            var ok = Vector<long>.AllBitsSet;
            ref double r = ref MemoryMarshal.GetReference(values);
            for (; i <= n - Vector<double>.Count; i += Vector<double>.Count)
            {
                var v = Load(ref r, i);
                var low = strictlyPositive ? Vector.GreaterThan(v, zero) : Vector.GreaterThanOrEqual(v, zero);
                ok &= low & Vector.LessThan(v, inf);
            }
            if (!Vector.EqualsAll(ok, Vector<long>.AllBitsSet)) return false;
        }
        for (; i < n; i++)
        {
            double v = values[i];
            if (!(strictlyPositive ? v > 0 : v >= 0) || !(v < double.PositiveInfinity)) return false;
        }
        return true;
    }

    private static void ThrowBad(double v, int index, string paramName, string unit, string what, string rule) =>
        throw new ArgumentOutOfRangeException(paramName, v, $"{what} at index {index} must be {rule}; got {Guard.Show(v, unit)}.");
}
