using System;
using System.Numerics;
using CompressionMembers.Batch;
using CompressionMembers.Methods.Aluminium;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Methods.Timber;
using CompressionMembers.Tests.Support;

namespace CompressionMembers.Tests.Performance;

/// <summary>
/// The vectorised batch kernels against the scalar kernels of the methods they mirror. Tolerance: 0 ulp (bit-identical),
/// because both evaluate the same expression in the same order with correctly rounded +, −, ×, ÷ and √ and no fused
/// multiply-add. Lengths of 0 to 3 × Vector&lt;double&gt;.Count + 3 exercise the vector lanes and every remainder lane.
/// </summary>
public class BatchKernelTests
{
    private const long ZeroUlp = 0; // the stated tolerance of every comparison here

    private static readonly int[] Lengths = Build();

    private static int[] Build()
    {
        int w = Vector<double>.Count;
        var l = new int[3 * w + 4 + 1];
        for (int i = 0; i < l.Length - 1; i++) l[i] = i;   // 0 … 3w + 3: every remainder count with 0 to 3 full vectors
        l[^1] = 1001;                                       // a long run
        return l;
    }

    private static long Ulps(double a, double b)
    {
        if (a == b) return 0;
        long x = BitConverter.DoubleToInt64Bits(a), y = BitConverter.DoubleToInt64Bits(b);
        return Math.Abs(x - y);
    }

    private static void Bitwise(double expected, double actual, int index, string what)
    {
        long u = Ulps(expected, actual);
        Assert.True(u <= ZeroUlp, $"{what}[{index}]: scalar {expected:R}, batch {actual:R} ({u} ulp apart; tolerance {ZeroUlp} ulp)");
    }

    private static double[] Random(Random r, int n, double lo, double hi)
    {
        var a = new double[n];
        for (int i = 0; i < n; i++) a[i] = lo + (hi - lo) * r.NextDouble();
        return a;
    }

    [Fact]
    public void EulerCriticalForce_RandomInputs_BitIdenticalToScalarAxisFormula()
    {
        var rnd = new Random(1);
        foreach (int n in Lengths)
        {
            var i4 = Random(rnd, n, 1e-9, 1e-3);
            var l = Random(rnd, n, 0.2, 12);
            const double e = 70e9;
            var dst = new double[n];
            BatchKernels.EulerCriticalForce(i4, l, e, dst);
            for (int k = 0; k < n; k++)
                Bitwise(Math.PI * Math.PI * e * i4[k] / (l[k] * l[k]), dst[k], k, "Ncr"); // the expression of AxisData (Euler, Timoshenko & Gere §2.2)
        }
    }

    [Fact]
    public void JohnsonCriticalStress_RandomInputsAcrossCc_BitIdenticalToJohnsonParabola()
    {
        var rnd = new Random(2);
        const double e = 200e9, f = 250e6;   // Cc ≈ 126 (Shigley, columns): the range covers both branches
        foreach (int n in Lengths)
        {
            var lam = Random(rnd, n, 1, 300);
            var dst = new double[n];
            BatchKernels.JohnsonCriticalStress(lam, e, f, dst);
            for (int k = 0; k < n; k++)
                Bitwise(JohnsonParabola.CriticalStress(lam[k], e, f, out _), dst[k], k, "σcr");
        }
    }

    [Fact]
    public void JohnsonCriticalStress_AtTransition_BothBranchesMeetAtHalfStrength()
    {
        const double e = 200e9, f = 250e6;
        double cc = JohnsonParabola.TransitionSlenderness(e, f);
        var dst = new double[2];
        BatchKernels.JohnsonCriticalStress([cc * (1 - 1e-12), cc], e, f, dst);
        Near.Relative(f / 2, dst[0], 1e-9, "Johnson parabola at λ = Cc: σcr = f/2 (Shigley, columns)");
        Near.Relative(f / 2, dst[1], 1e-9, "Euler hyperbola at λ = Cc: σcr = f/2 (Shigley, columns)");
    }

    [Theory]
    [InlineData(0.2)] // solid timber, EN 1995-1-1 (6.29)
    [InlineData(0.1)] // glulam and LVL, EN 1995-1-1 (6.29)
    public void Ec5InstabilityFactor_RandomInputsWithPlateau_BitIdenticalToEc5Kernel(double betaC)
    {
        var rnd = new Random(3);
        foreach (int n in Lengths)
        {
            var lr = Random(rnd, n, 0, 4);
            if (n > 2) { lr[0] = 0.3; lr[1] = 0; }  // the plateau edge and λrel = 0 (kc = 1, EN 1995-1-1 6.3.2(2))
            var dst = new double[n];
            BatchKernels.Ec5InstabilityFactor(lr, betaC, dst);
            for (int k = 0; k < n; k++)
                Bitwise(Ec5Kernel.Kc(lr[k], betaC), dst[k], k, "kc");
        }
    }

    [Theory]
    [InlineData(0.20, 0.10)] // class A flexural, EN 1999-1-1 Table 6.6 (from memory)
    [InlineData(0.32, 0.00)] // class B flexural
    [InlineData(0.35, 0.40)] // torsional, general sections
    public void Ec9ReductionFactor_RandomInputsWithPlateau_BitIdenticalToEc9Rules(double alpha, double lambda0)
    {
        var rnd = new Random(4);
        foreach (int n in Lengths)
        {
            var lb = Random(rnd, n, 0, 3);
            if (n > 1) lb[0] = lambda0;
            var dst = new double[n];
            BatchKernels.Ec9ReductionFactor(lb, alpha, lambda0, dst);
            for (int k = 0; k < n; k++)
                Bitwise(Ec9Rules.Chi(lb[k], alpha, lambda0), dst[k], k, "χ");
        }
    }

    [Fact]
    public void Ec5InstabilityFactor_Limits_OneOnPlateauAndInverseSquareWhenSlender()
    {
        var dst = new double[2];
        BatchKernels.Ec5InstabilityFactor([0.1, 50], 0.2, dst);
        Assert.Equal(1.0, dst[0]); // λrel ≤ 0.3: kc = 1 (EN 1995-1-1 6.3.2(2))
        // λrel → ∞: k ≈ λ²/2 so kc → 1/λ² (the Euler limit of (6.25); common practice)
        Near.Relative(1 / (50.0 * 50.0), dst[1], 0.01, "EN 1995-1-1 (6.25) as λrel → ∞");
    }

    [Fact]
    public void InPlace_SameSpan_GivesSameResultAsSeparateDestination()
    {
        var rnd = new Random(5);
        var lb = Random(rnd, 37, 0, 3);
        var separate = new double[37];
        BatchKernels.Ec9ReductionFactor(lb, 0.2, 0.1, separate);
        BatchKernels.Ec9ReductionFactor(lb, 0.2, 0.1, lb);
        Assert.Equal(separate, lb);
    }

    [Fact]
    public void EulerCriticalForce_LengthMismatch_ThrowsNamingTheInput()
    {
        var ex = Assert.Throws<ArgumentException>(() => BatchKernels.EulerCriticalForce(new double[3], new double[4], 70e9, new double[4]));
        Assert.Equal("secondMomentM4", ex.ParamName);
        Assert.Contains("has 3 values but criticalForceN has 4", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Ec5InstabilityFactor_NaNInput_ThrowsNamingParameterAndIndex()
    {
        var lr = new double[9];
        lr[7] = double.NaN;
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => BatchKernels.Ec5InstabilityFactor(lr, 0.2, new double[9]));
        Assert.Equal("relativeSlenderness", ex.ParamName);
        Assert.Contains("at index 7", ex.Message, StringComparison.Ordinal);
        Assert.Contains("got NaN", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void JohnsonCriticalStress_InfiniteOrZeroSlenderness_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => BatchKernels.JohnsonCriticalStress([10, double.PositiveInfinity], 200e9, 250e6, new double[2]));
        Assert.Equal("slenderness", ex.ParamName);
        Assert.Contains("+infinity", ex.Message, StringComparison.Ordinal);
        ex = Assert.Throws<ArgumentOutOfRangeException>(() => BatchKernels.JohnsonCriticalStress([0.0], 200e9, 250e6, new double[1]));
        Assert.Equal("slenderness", ex.ParamName);
    }

    [Fact]
    public void EulerCriticalForce_NonFiniteModulus_ThrowsNamingIt()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => BatchKernels.EulerCriticalForce([1e-6], [2.0], double.NaN, new double[1]));
        Assert.Equal("elasticModulusPa", ex.ParamName);
    }

    [Fact]
    public void Ec9ReductionFactor_PartialOverlap_Throws()
    {
        var buf = new double[10];
        var ex = Assert.Throws<ArgumentException>(() => BatchKernels.Ec9ReductionFactor(buf.AsSpan(0, 8), 0.2, 0.1, buf.AsSpan(1, 8)));
        Assert.Equal("chi", ex.ParamName);
    }

    [Fact]
    public void Ec9ReductionFactor_InvalidInput_WritesNothing()
    {
        var lb = new double[] { 0.5, 0.7, -1 };
        var dst = new double[] { 7, 7, 7 };
        Assert.Throws<ArgumentOutOfRangeException>(() => BatchKernels.Ec9ReductionFactor(lb, 0.2, 0.1, dst));
        Assert.Equal(new double[] { 7, 7, 7 }, dst);
    }

    [Fact]
    public void BatchKernels_WarmCalls_AllocateNothing()
    {
        var lb = new double[1000];
        var dst = new double[1000];
        for (int i = 0; i < lb.Length; i++) lb[i] = 0.001 * i;
        for (int w = 0; w < 3; w++) BatchKernels.Ec5InstabilityFactor(lb, 0.2, dst);
        long before = GC.GetAllocatedBytesForCurrentThread();
        for (int w = 0; w < 10; w++)
        {
            BatchKernels.Ec5InstabilityFactor(lb, 0.2, dst);
            BatchKernels.Ec9ReductionFactor(lb, 0.2, 0.1, dst);
        }
        Assert.Equal(0, GC.GetAllocatedBytesForCurrentThread() - before);
    }
}
