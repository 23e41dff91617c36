using System;
using System.Collections.Generic;
using System.Linq;
using CompressionMembers.Internal;
using CompressionMembers.Restraints;
using UnitsNet;

namespace CompressionMembers.Methods.Numerical;

/// <summary>
/// A straight member for linear (eigenvalue) buckling analysis about one axis: segments stacked from the bottom
/// (uniform, stepped or tapered), a restraint at each end, supports, braces and springs at intermediate levels, and
/// the axial loads whose common multiplier λ is sought (point loads at levels and self-weight).
/// </summary>
/// <remarks>
/// <para>Positions are measured from the bottom end. The axial force at a level is the sum of the point loads at and
/// above it plus the self-weight above it, so the axial force may vary along the member. Without any load, a
/// reference compression of 1 N at the top is used, and λ is then the critical load in newtons.</para>
/// <para>The mesh is chosen automatically (about 48 Euler–Bernoulli elements, at least 2 between any two points of
/// interest) unless <see cref="WithElementCount"/> sets it.</para>
/// <para>Thread safety: immutable reference type; every <c>With…</c> method returns a new model.</para>
/// </remarks>
[Immutable]
public sealed class BucklingModel
{
    private readonly MemberSegment[] _segments;
    private readonly ModelSupport[] _supports;
    private readonly AxialPointLoad[] _loads;

    private BucklingModel(string name, MemberSegment[] segments, EndSpring bottom, EndSpring top, ModelSupport[] supports,
        AxialPointLoad[] loads, ForcePerLength selfWeight, int? elementCount)
    {
        Name = name;
        _segments = segments;
        Bottom = bottom;
        Top = top;
        _supports = supports;
        _loads = loads;
        SelfWeight = selfWeight;
        ElementCount = elementCount;
        double l = 0;
        foreach (var s in segments) l += s.LengthM;
        LengthM = l;
    }

    /// <summary>A uniform member.</summary>
    /// <param name="length">Length L, greater than 0.</param>
    /// <param name="elasticModulus">E, greater than 0.</param>
    /// <param name="secondMoment">I about the buckling axis, greater than 0.</param>
    /// <param name="bottom">Restraint at the bottom end.</param>
    /// <param name="top">Restraint at the top end.</param>
    /// <returns>The model (no loads yet: a reference 1 N at the top unless loads are added).</returns>
    /// <exception cref="ArgumentNullException">An end restraint is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or not positive.</exception>
    public static BucklingModel Uniform(Length length, Pressure elasticModulus, AreaMomentOfInertia secondMoment, EndSpring bottom, EndSpring top) =>
        FromSegments([MemberSegment.Uniform(length, elasticModulus, secondMoment)], bottom, top);

    /// <summary>A member made of segments stacked from the bottom (stepped or tapered).</summary>
    /// <param name="segmentsFromBottom">The segments, bottom first; at least one.</param>
    /// <param name="bottom">Restraint at the bottom end.</param>
    /// <param name="top">Restraint at the top end.</param>
    /// <returns>The model.</returns>
    /// <exception cref="ArgumentNullException">An argument or a segment is null.</exception>
    /// <exception cref="ArgumentException">There are no segments.</exception>
    public static BucklingModel FromSegments(IEnumerable<MemberSegment> segmentsFromBottom, EndSpring bottom, EndSpring top)
    {
        ArgumentNullException.ThrowIfNull(segmentsFromBottom);
        ArgumentNullException.ThrowIfNull(bottom);
        ArgumentNullException.ThrowIfNull(top);
        var segs = segmentsFromBottom.ToArray();
        if (segs.Length == 0) throw new ArgumentException("A buckling model needs at least one segment.", nameof(segmentsFromBottom));
        foreach (var s in segs) ArgumentNullException.ThrowIfNull(s, nameof(segmentsFromBottom));
        return new BucklingModel("member", segs, bottom, top, [], [], ForcePerLength.Zero, null);
    }

    /// <summary>A name for reports.</summary>
    public string Name { get; }
    /// <summary>The segments, bottom first.</summary>
    public IReadOnlyList<MemberSegment> Segments => _segments;
    /// <summary>Restraint at the bottom end.</summary>
    public EndSpring Bottom { get; }
    /// <summary>Restraint at the top end.</summary>
    public EndSpring Top { get; }
    /// <summary>Supports, braces and springs at intermediate levels, in ascending order.</summary>
    public IReadOnlyList<ModelSupport> Supports => _supports;
    /// <summary>Axial point loads, in ascending order of level.</summary>
    public IReadOnlyList<AxialPointLoad> Loads => _loads;
    /// <summary>Self-weight per unit length (zero if none).</summary>
    public ForcePerLength SelfWeight { get; }
    /// <summary>The number of elements the user asked for, or null for the automatic mesh.</summary>
    public int? ElementCount { get; }
    /// <summary>Total length.</summary>
    public Length Length => Length.FromMeters(LengthM);
    /// <summary>Whether any load was given (otherwise a reference 1 N at the top is used).</summary>
    public bool HasLoads => _loads.Length > 0 || SelfWeight.NewtonsPerMeter > 0;

    internal double LengthM { get; }
    internal MemberSegment[] SegmentArray => _segments;
    internal ModelSupport[] SupportArray => _supports;
    internal AxialPointLoad[] LoadArray => _loads;

    /// <summary>A copy with a support or spring at an intermediate level.</summary>
    /// <param name="position">Level above the bottom, strictly inside the member.</param>
    /// <param name="restraint">The support's stiffness (for example <see cref="EndSpring.Pinned"/> for a rigid lateral brace).</param>
    /// <returns>The copy.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="restraint"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The position is not strictly inside the member.</exception>
    /// <exception cref="ArgumentException">There is already a support at that level.</exception>
    public BucklingModel WithSupportAt(Length position, EndSpring restraint)
    {
        ArgumentNullException.ThrowIfNull(restraint);
        double x = Si.Meters(position, nameof(position), "Support position");
        if (x >= LengthM)
            throw new ArgumentOutOfRangeException(nameof(position), position.Value,
                $"A support must lie strictly inside the member of length {Guard.Show(LengthM * 1e3)} mm; got {Si.Given(position)}.");
        foreach (var s in _supports)
            if (s.Position.Meters == x) throw new ArgumentException($"There is already a support at {Si.Given(position)}.", nameof(position));
        var list = _supports.Append(new ModelSupport(position, restraint)).OrderBy(s => s.Position.Meters).ToArray();
        return new BucklingModel(Name, _segments, Bottom, Top, list, _loads, SelfWeight, ElementCount);
    }

    /// <summary>A copy with a rigid lateral brace (translation held, rotation free) at an intermediate level.</summary>
    /// <param name="position">Level above the bottom, strictly inside the member.</param>
    /// <returns>The copy.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The position is not strictly inside the member.</exception>
    /// <exception cref="ArgumentException">There is already a support at that level.</exception>
    public BucklingModel WithBraceAt(Length position) => WithSupportAt(position, EndSpring.Pinned);

    /// <summary>A copy with an elastic lateral brace of the given stiffness at an intermediate level.</summary>
    /// <param name="position">Level above the bottom, strictly inside the member.</param>
    /// <param name="stiffness">Brace stiffness kt, not negative.</param>
    /// <returns>The copy.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The position is not strictly inside, or the stiffness is not finite or negative.</exception>
    /// <exception cref="ArgumentException">There is already a support at that level.</exception>
    public BucklingModel WithBraceAt(Length position, ForcePerLength stiffness) => WithSupportAt(position, EndSpring.Translational(stiffness));

    /// <summary>A copy with an axial compression applied at a level (it compresses the member below that level).</summary>
    /// <param name="position">Level above the bottom, 0 &lt; position ≤ L (L is the top end).</param>
    /// <param name="compression">The load, greater than 0.</param>
    /// <returns>The copy.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The position or the load is out of range.</exception>
    public BucklingModel WithAxialLoadAt(Length position, Force compression)
    {
        double x = Si.Meters(position, nameof(position), "Load position");
        Si.Newtons(compression, nameof(compression), "Axial load");
        if (x > LengthM * (1 + 1e-12))
            throw new ArgumentOutOfRangeException(nameof(position), position.Value,
                $"A load must lie on the member of length {Guard.Show(LengthM * 1e3)} mm; got {Si.Given(position)}.");
        var list = _loads.Append(new AxialPointLoad(position, compression)).OrderBy(p => p.Position.Meters).ToArray();
        return new BucklingModel(Name, _segments, Bottom, Top, _supports, list, SelfWeight, ElementCount);
    }

    /// <summary>A copy with an axial compression at the top end.</summary>
    /// <param name="compression">The load, greater than 0.</param>
    /// <returns>The copy.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The load is not finite or not positive.</exception>
    public BucklingModel WithAxialLoadAtTop(Force compression) => WithAxialLoadAt(Length, compression);

    /// <summary>A copy with self-weight (a uniformly distributed axial load; the axial force grows linearly towards the bottom).</summary>
    /// <param name="weightPerLength">Weight per unit length, not negative.</param>
    /// <returns>The copy.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The value is not finite or is negative.</exception>
    public BucklingModel WithSelfWeight(ForcePerLength weightPerLength)
    {
        Si.NewtonsPerMeter(weightPerLength, nameof(weightPerLength), "Self-weight per unit length");
        return new BucklingModel(Name, _segments, Bottom, Top, _supports, _loads, weightPerLength, ElementCount);
    }

    /// <summary>A copy with a chosen number of elements (a target: every interval between points of interest gets at least one).</summary>
    /// <param name="count">Number of elements, 2 to 2000.</param>
    /// <returns>The copy.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The count is outside 2 to 2000.</exception>
    public BucklingModel WithElementCount(int count)
    {
        if (count < 2 || count > 2000)
            throw new ArgumentOutOfRangeException(nameof(count), count, $"Element count must be between 2 and 2000; got {count}.");
        return new BucklingModel(Name, _segments, Bottom, Top, _supports, _loads, SelfWeight, count);
    }

    /// <summary>A copy with the automatic mesh.</summary>
    /// <returns>The copy.</returns>
    public BucklingModel WithAutomaticMesh() => new(Name, _segments, Bottom, Top, _supports, _loads, SelfWeight, null);

    /// <summary>A copy with another name.</summary>
    /// <param name="name">The name ("member" if empty).</param>
    /// <returns>The copy.</returns>
    public BucklingModel WithName(string name) =>
        new(string.IsNullOrWhiteSpace(name) ? "member" : name, _segments, Bottom, Top, _supports, _loads, SelfWeight, ElementCount);
}
