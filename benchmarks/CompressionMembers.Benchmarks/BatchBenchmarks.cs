using System;
using BenchmarkDotNet.Attributes;
using CompressionMembers.Batch;
using CompressionMembers.Methods.Aluminium;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Methods.Timber;

namespace CompressionMembers.Benchmarks;

/// <summary>
/// The vectorised <see cref="BatchKernels"/> against a loop of the scalar kernel each mirrors, over 100,000 cases
/// (validation of the inputs included in the batch timings). Results are bit-identical (tested).
/// </summary>
[MemoryDiagnoser]
public class BatchBenchmarks
{
    private const int N = 100_000;
    private double[] _i = [], _l = [], _lambda = [], _lrel = [], _dst = [];
    private const double E = 70e9, F = 250e6;

    [GlobalSetup]
    public void Setup()
    {
        var r = new Random(9);
        _i = new double[N]; _l = new double[N]; _lambda = new double[N]; _lrel = new double[N]; _dst = new double[N];
        for (int k = 0; k < N; k++)
        {
            _i[k] = 1e-7 + 1e-5 * r.NextDouble(); _l[k] = 0.5 + 5 * r.NextDouble();
            _lambda[k] = 5 + 200 * r.NextDouble(); _lrel[k] = 3 * r.NextDouble();
        }
    }

    [Benchmark(Baseline = true)] public double EulerScalar() { for (int k = 0; k < N; k++) _dst[k] = Math.PI * Math.PI * E * _i[k] / (_l[k] * _l[k]); return _dst[N - 1]; }
    [Benchmark] public double EulerBatch() { BatchKernels.EulerCriticalForce(_i, _l, E, _dst); return _dst[N - 1]; }
    [Benchmark] public double JohnsonScalar() { for (int k = 0; k < N; k++) _dst[k] = JohnsonParabola.CriticalStress(_lambda[k], E, F, out _); return _dst[N - 1]; }
    [Benchmark] public double JohnsonBatch() { BatchKernels.JohnsonCriticalStress(_lambda, E, F, _dst); return _dst[N - 1]; }
    [Benchmark] public double KcScalar() { for (int k = 0; k < N; k++) _dst[k] = Ec5Kernel.Kc(_lrel[k], 0.2); return _dst[N - 1]; }
    [Benchmark] public double KcBatch() { BatchKernels.Ec5InstabilityFactor(_lrel, 0.2, _dst); return _dst[N - 1]; }
    [Benchmark] public double ChiScalar() { for (int k = 0; k < N; k++) _dst[k] = Ec9Rules.Chi(_lrel[k], 0.2, 0.1); return _dst[N - 1]; }
    [Benchmark] public double ChiBatch() { BatchKernels.Ec9ReductionFactor(_lrel, 0.2, 0.1, _dst); return _dst[N - 1]; }
}
