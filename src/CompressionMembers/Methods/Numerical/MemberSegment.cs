using System;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Methods.Numerical;

/// <summary>One length of a member in a numerical model: its length, elastic modulus and second moment of area about
/// the buckling axis, uniform or varying linearly from the bottom to the top of the segment (tapered).</summary>
/// <remarks>
/// <para>Segments are stacked from the bottom of the member upwards. A stepped column is several uniform segments; a
/// tapered one is one or more tapered segments. I varies linearly along a tapered segment; for a depth-tapered section,
/// where I follows the cube of the depth, split the taper into several segments.</para>
/// <para>Thread safety: immutable reference type.</para>
/// </remarks>
[Immutable]
public sealed class MemberSegment
{
    private MemberSegment(Length length, Pressure e, AreaMomentOfInertia iBottom, AreaMomentOfInertia iTop)
    {
        Length = length;
        ElasticModulus = e;
        SecondMomentBottom = iBottom;
        SecondMomentTop = iTop;
        LengthM = length.Meters;
        ElasticModulusPa = e.Pascals;
        SecondMomentBottomM4 = iBottom.MetersToTheFourth;
        SecondMomentTopM4 = iTop.MetersToTheFourth;
    }

    /// <summary>A uniform segment.</summary>
    /// <param name="length">Segment length, greater than 0.</param>
    /// <param name="elasticModulus">E, greater than 0.</param>
    /// <param name="secondMoment">I about the buckling axis, greater than 0.</param>
    /// <returns>The segment.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or not positive.</exception>
    public static MemberSegment Uniform(Length length, Pressure elasticModulus, AreaMomentOfInertia secondMoment)
    {
        Si.Meters(length, nameof(length), "Segment length");
        Si.Pascals(elasticModulus, nameof(elasticModulus), "Elastic modulus");
        Si.MetersToFourth(secondMoment, nameof(secondMoment), "Second moment of area");
        return new MemberSegment(length, elasticModulus, secondMoment, secondMoment);
    }

    /// <summary>A tapered segment: I varies linearly from the bottom to the top of the segment.</summary>
    /// <param name="length">Segment length, greater than 0.</param>
    /// <param name="elasticModulus">E, greater than 0.</param>
    /// <param name="secondMomentBottom">I at the bottom of the segment, greater than 0.</param>
    /// <param name="secondMomentTop">I at the top of the segment, greater than 0.</param>
    /// <returns>The segment.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or not positive.</exception>
    public static MemberSegment Tapered(Length length, Pressure elasticModulus, AreaMomentOfInertia secondMomentBottom, AreaMomentOfInertia secondMomentTop)
    {
        Si.Meters(length, nameof(length), "Segment length");
        Si.Pascals(elasticModulus, nameof(elasticModulus), "Elastic modulus");
        Si.MetersToFourth(secondMomentBottom, nameof(secondMomentBottom), "Second moment of area at the bottom");
        Si.MetersToFourth(secondMomentTop, nameof(secondMomentTop), "Second moment of area at the top");
        return new MemberSegment(length, elasticModulus, secondMomentBottom, secondMomentTop);
    }

    /// <summary>Segment length.</summary>
    public Length Length { get; }
    /// <summary>Elastic modulus E.</summary>
    public Pressure ElasticModulus { get; }
    /// <summary>I at the bottom of the segment.</summary>
    public AreaMomentOfInertia SecondMomentBottom { get; }
    /// <summary>I at the top of the segment.</summary>
    public AreaMomentOfInertia SecondMomentTop { get; }
    /// <summary>Whether I varies along the segment.</summary>
    public bool IsTapered => SecondMomentBottomM4 != SecondMomentTopM4;

    internal double LengthM { get; }
    internal double ElasticModulusPa { get; }
    internal double SecondMomentBottomM4 { get; }
    internal double SecondMomentTopM4 { get; }
}
