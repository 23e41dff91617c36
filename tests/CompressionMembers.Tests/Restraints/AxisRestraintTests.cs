using System;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using MathNet.Numerics.RootFinding;
using UnitsNet;

namespace CompressionMembers.Tests.Restraints;

public class AxisRestraintTests
{
    public static TheoryData<EndCondition, EndCondition, double, double, string> Table => new()
    {
        // bottom, top, theoretical K, recommended K — the table of common practice (the commentary tables of steel and
        // timber codes reproduce the same six cases; recommended values allow for imperfect fixity).
        { EndCondition.Fixed, EndCondition.Fixed, 0.5, 0.65, "common practice" },
        { EndCondition.Fixed, EndCondition.Pinned, Math.PI / 4.493409457909064, 0.80, "Timoshenko & Gere §2.2 (tan x = x); common practice" },
        { EndCondition.Fixed, EndCondition.Guided, 1.0, 1.2, "common practice" },
        { EndCondition.Pinned, EndCondition.Pinned, 1.0, 1.0, "common practice" },
        { EndCondition.Fixed, EndCondition.Free, 2.0, 2.1, "common practice" },
        { EndCondition.Pinned, EndCondition.Guided, 2.0, 2.0, "common practice" },
    };

    [Theory]
    [MemberData(nameof(Table))]
    public void BucklingFactorFor_IdealEnds_MatchesTheTableInEitherOrder(EndCondition a, EndCondition b, double theoretical, double recommended, string source)
    {
        Near.Relative(theoretical, AxisRestraint.BucklingFactorFor(a, b, EffectiveLengthBasis.Theoretical), 1e-15, source);
        Near.Relative(theoretical, AxisRestraint.BucklingFactorFor(b, a, EffectiveLengthBasis.Theoretical), 1e-15, source);
        Near.Relative(recommended, AxisRestraint.BucklingFactorFor(a, b, EffectiveLengthBasis.Recommended), 1e-15, source);
        Near.Relative(recommended, AxisRestraint.BucklingFactorFor(b, a, EffectiveLengthBasis.Recommended), 1e-15, source);
    }

    [Fact]
    public void FixedPinned_TheoreticalK_IsPiOverTheRootOfTanXEqualsX()
    {
        // Timoshenko & Gere, Theory of Elastic Stability, §2.2: a column fixed at one end and pinned at the other buckles
        // at kL = x with tan x = x; the first positive root lies in (π, 3π/2). Solved here independently with MathNet.
        double x = Brent.FindRoot(v => Math.Tan(v) - v, Math.PI + 1e-6, 1.5 * Math.PI - 1e-6, 1e-14, 200);
        Near.Relative(4.4934094579, x, 1e-10, "Timoshenko & Gere §2.2 (x = 4.493)");
        Near.Relative(Math.PI / x, AxisRestraint.BucklingFactorFor(EndCondition.Fixed, EndCondition.Pinned, EffectiveLengthBasis.Theoretical), 1e-13,
            "K = π / x, independent root");
        Near.Relative(0.699, Math.PI / x, 1e-3, "commonly quoted K ≈ 0.7 (common practice)");
    }

    [Theory]
    [InlineData(EndCondition.Free, EndCondition.Free)]
    [InlineData(EndCondition.Free, EndCondition.Pinned)]
    [InlineData(EndCondition.Guided, EndCondition.Free)]
    [InlineData(EndCondition.Guided, EndCondition.Guided)]
    public void FromEndConditions_Mechanism_ThrowsWithReason(EndCondition a, EndCondition b)
    {
        var ex = Assert.Throws<ArgumentException>(() => AxisRestraint.FromEndConditions(a, b, EffectiveLengthBasis.Recommended));
        Assert.Equal("top", ex.ParamName);
        Assert.Contains("form a mechanism", ex.Message);
    }

    [Theory]
    [InlineData(0.49)]
    [InlineData(0.0)]
    [InlineData(-1.0)]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void FromBucklingFactor_Invalid_Throws(double k)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => AxisRestraint.FromBucklingFactor(k));
        Assert.Equal("bucklingFactor", ex.ParamName);
        Assert.StartsWith("Buckling factor K must be a finite number of at least 0.5 (fixed–fixed); got ", ex.Message);
    }

    [Fact]
    public void Bracing_EffectiveLengthIsKTimesLongestSegment()
    {
        // Braces at 1.2 m and 2.0 m on a 3.5 m member: segments 1.2, 0.8, 1.5 m → Lcr = K × 1.5 m (common practice).
        var z = AxisRestraint.PinnedPinned.WithBracingAt(Length.FromMeters(2.0), Length.FromMeters(1.2));
        var m = Member.Create(new RectangleSection(Length.FromMillimeters(90), Length.FromMillimeters(140)), IsotropicMaterial.GenericStructuralSteel,
            Length.FromMeters(3.5), new Restraint(AxisRestraint.PinnedPinned, z));
        Near.Relative(1.5, m.EffectiveLengthZ.Meters, 1e-14, "longest segment × K");
        Near.Relative(3.5, m.EffectiveLengthY.Meters, 1e-14, "unbraced axis: K L");
        Assert.Equal(1.2, z.BracingPositions[0].Meters);
    }

    [Fact]
    public void Bracing_BraceOutsideMember_Throws()
    {
        var z = AxisRestraint.PinnedPinned.WithBracingAt(Length.FromMeters(4));
        var ex = Assert.Throws<ArgumentException>(() => Member.Create(new RectangleSection(Length.FromMillimeters(90), Length.FromMillimeters(140)),
            IsotropicMaterial.GenericStructuralSteel, Length.FromMeters(3.5), new Restraint(AxisRestraint.PinnedPinned, z)));
        Assert.Equal("restraint", ex.ParamName);
        Assert.StartsWith("A brace for buckling about z is at 4 m, which is not inside the member of length 3500 mm.", ex.Message);
    }

    [Fact]
    public void Bracing_TwoBracesAtOnePoint_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => AxisRestraint.PinnedPinned.WithBracingAt(Length.FromMeters(1), Length.FromMillimeters(1000)));
        Assert.Equal("positions", ex.ParamName);
    }
}
