using System.Collections.Generic;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Methods.Numerical;

/// <summary>One buckling mode of a numerical model: its load factor λ, the critical force and the mode shape as data
/// (node positions and normalised deflections, ready to plot).</summary>
/// <remarks>The deflections are normalised so that the largest magnitude is 1 and positive. Thread safety: immutable reference type.</remarks>
[Immutable]
public sealed class BucklingMode
{
    private readonly double[] _positions;
    private readonly double[] _deflections;

    internal BucklingMode(int number, double loadFactor, double maxReferenceCompressionN, double[] positionsM, double[] deflections)
    {
        Number = number;
        LoadFactor = loadFactor;
        CriticalForceN = loadFactor * maxReferenceCompressionN;
        _positions = positionsM;
        _deflections = deflections;
    }

    /// <summary>Mode number, 1 for the lowest.</summary>
    public int Number { get; }

    /// <summary>The critical load factor λ: the loads of the model times λ buckle it.</summary>
    public double LoadFactor { get; }

    /// <summary>The largest axial compression in the member at buckling (λ × the largest reference compression); for a
    /// member loaded only at the top, the critical load Ncr.</summary>
    public Force CriticalForce => Force.FromKilonewtons(CriticalForceN / 1e3);

    /// <summary>The node positions from the bottom end, in m.</summary>
    public IReadOnlyList<double> PositionsM => _positions;

    /// <summary>The normalised lateral deflection at each node (largest magnitude 1).</summary>
    public IReadOnlyList<double> Deflections => _deflections;

    internal double CriticalForceN { get; }
}
