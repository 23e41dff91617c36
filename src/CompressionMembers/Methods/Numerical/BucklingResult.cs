using System.Collections.Generic;
using CompressionMembers.Internal;

namespace CompressionMembers.Methods.Numerical;

/// <summary>The result of a linear buckling analysis: the model, the mesh used and the lowest modes, with a text report.</summary>
/// <remarks>Thread safety: immutable reference type.</remarks>
[Immutable]
public sealed class BucklingResult
{
    private readonly BucklingMode[] _modes;

    internal BucklingResult(BucklingModel model, int elementCount, BucklingMode[] modes)
    {
        Model = model;
        ElementCount = elementCount;
        _modes = modes;
    }

    /// <summary>The model analysed.</summary>
    public BucklingModel Model { get; }

    /// <summary>The number of elements in the mesh.</summary>
    public int ElementCount { get; }

    /// <summary>The modes found, lowest first (at least one).</summary>
    public IReadOnlyList<BucklingMode> Modes => _modes;

    /// <summary>The lowest mode.</summary>
    public BucklingMode Lowest => _modes[0];

    /// <summary>A plain-text report (invariant culture, the same bytes on any machine).</summary>
    /// <returns>The report.</returns>
    public string ToReport() => NumericalReport.Buckling(this);
}
