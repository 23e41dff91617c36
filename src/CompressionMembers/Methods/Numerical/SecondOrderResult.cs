using System.Collections.Generic;
using CompressionMembers.Actions;
using CompressionMembers.Internal;
using CompressionMembers.Members;
using CompressionMembers.Results;
using UnitsNet;

namespace CompressionMembers.Methods.Numerical;

/// <summary>The result of a second-order (P-δ) analysis of an eccentric or imperfect member: the load–deflection path,
/// the final deflected shape as data, and the largest moment and stress at the design load.</summary>
/// <remarks>Thread safety: immutable reference type.</remarks>
[Immutable]
public sealed class SecondOrderResult
{
    private readonly SecondOrderPoint[] _path;
    private readonly double[] _positions;
    private readonly double[] _deflections;

    internal SecondOrderResult(Member member, DesignActions actions, BucklingAxis axis, double ncrN, double eBottomM, double eTopM, double bowM,
        int elements, SecondOrderPoint[] path, double[] positionsM, double[] deflectionsM, double areaM2, double iM4, double cPosM, double cNegM)
    {
        Member = member;
        Actions = actions;
        Axis = axis;
        CriticalForceN = ncrN;
        EccentricityBottomM = eBottomM;
        EccentricityTopM = eTopM;
        BowM = bowM;
        ElementCount = elements;
        _path = path;
        _positions = positionsM;
        _deflections = deflectionsM;
        AreaM2 = areaM2;
        SecondMomentM4 = iM4;
        FibrePositiveM = cPosM;
        FibreNegativeM = cNegM;
    }

    /// <summary>The member analysed.</summary>
    public Member Member { get; }
    /// <summary>The actions analysed.</summary>
    public DesignActions Actions { get; }
    /// <summary>The axis of bending.</summary>
    public BucklingAxis Axis { get; }
    /// <summary>The elastic critical load of the member about that axis (finite elements, same mesh).</summary>
    public Force CriticalForce => Force.FromKilonewtons(CriticalForceN / 1e3);
    /// <summary>Offset of the load line from the axis at the bottom end (eccentricity + end moment / N).</summary>
    public Length EccentricityBottom => Length.FromMillimeters(EccentricityBottomM * 1e3);
    /// <summary>Offset of the load line from the axis at the top end.</summary>
    public Length EccentricityTop => Length.FromMillimeters(EccentricityTopM * 1e3);
    /// <summary>Amplitude of the half-sine initial bow used (its sign adds to the eccentricity).</summary>
    public Length InitialBow => Length.FromMillimeters(BowM * 1e3);
    /// <summary>The number of elements.</summary>
    public int ElementCount { get; }
    /// <summary>The load–deflection path, from the first load step to the design load.</summary>
    public IReadOnlyList<SecondOrderPoint> Path => _path;
    /// <summary>The state at the design load (the last point of the path).</summary>
    public SecondOrderPoint AtDesignLoad => _path[^1];
    /// <summary>Node positions of the deflected shape from the bottom end, m.</summary>
    public IReadOnlyList<double> PositionsM => _positions;
    /// <summary>Additional (second-order) deflection at each node at the design load, m.</summary>
    public IReadOnlyList<double> DeflectionsM => _deflections;

    internal double CriticalForceN { get; }
    internal double EccentricityBottomM { get; }
    internal double EccentricityTopM { get; }
    internal double BowM { get; }
    internal double AreaM2 { get; }
    internal double SecondMomentM4 { get; }
    internal double FibrePositiveM { get; }
    internal double FibreNegativeM { get; }

    /// <summary>A plain-text report (invariant culture, the same bytes on any machine).</summary>
    /// <returns>The report.</returns>
    public string ToReport() => NumericalReport.SecondOrder(this);
}
