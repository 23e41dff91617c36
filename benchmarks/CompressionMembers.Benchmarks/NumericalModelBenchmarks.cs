using BenchmarkDotNet.Attributes;
using CompressionMembers.Methods.Numerical;
using CompressionMembers.Restraints;
using UnitsNet;

namespace CompressionMembers.Benchmarks;

/// <summary>K from end springs (the characteristic equation, root found with MathNet) and a finite-element eigen solution
/// of a 6 m pinned column with 20 elements, with the allocations each makes.</summary>
[MemoryDiagnoser]
public class NumericalModelBenchmarks
{
    private static readonly EndSpring Bottom = EndSpring.Rotational(RotationalStiffness.FromKilonewtonMetersPerRadian(5000));
    private static readonly EndSpring Top = EndSpring.Elastic(RotationalStiffness.FromKilonewtonMetersPerRadian(800), ForcePerLength.FromKilonewtonsPerMeter(300));
    private static readonly Pressure E = Pressure.FromGigapascals(210);
    private static readonly AreaMomentOfInertia I = AreaMomentOfInertia.FromCentimetersToTheFourth(8356);
    private static readonly Length L = Length.FromMeters(6);
    private BucklingModel _twenty = null!, _auto = null!;

    [GlobalSetup]
    public void Setup()
    {
        _twenty = BucklingModel.Uniform(L, E, I, EndSpring.Pinned, EndSpring.Pinned).WithElementCount(20);
        _auto = BucklingModel.Uniform(L, E, I, EndSpring.Pinned, EndSpring.Pinned);
    }

    /// <summary>K of a column on elastic end springs, through the public typed API (quantities validated each call).</summary>
    [Benchmark(Baseline = true)] public double KFromEndSprings() => EffectiveLength.BucklingFactorFromEndSprings(Bottom, Top, E, I, L);

    /// <summary>First buckling mode of a 20-element model (Cholesky reduction + symmetric EVD, MathNet).</summary>
    [Benchmark] public double EigenTwentyElements() => BucklingAnalysis.Solve(_twenty, 1).Modes[0].LoadFactor;

    /// <summary>Three modes with the automatic mesh.</summary>
    [Benchmark] public double EigenAutomaticMeshThreeModes() => BucklingAnalysis.Solve(_auto, 3).Modes[0].LoadFactor;
}
