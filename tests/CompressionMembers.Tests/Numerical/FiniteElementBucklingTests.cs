using System;
using CompressionMembers.Actions;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Numerical;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using UnitsNet;

namespace CompressionMembers.Tests.Numerical;

/// <summary>The finite-element buckling model against the closed forms of the elastic column.</summary>
public class FiniteElementBucklingTests
{
    // A check member of common practice: E = 200 GPa, I = 8e-6 m⁴, L = 5 m → EI = 1.6e6 N·m².
    internal const double E = 200e9, I = 8e-6, L = 5.0, EI = E * I;
    internal static double Euler(double k) => Math.PI * Math.PI * EI / (k * L * k * L);

    internal static BucklingModel Model(EndSpring bottom, EndSpring top) =>
        BucklingModel.Uniform(Length.FromMeters(L), Pressure.FromPascals(E), AreaMomentOfInertia.FromMetersToTheFourth(I), bottom, top);

    internal static double Ncr(BucklingModel m) => BucklingAnalysis.Solve(m, 1).Lowest.CriticalForce.Newtons;

    public static TheoryData<string, string, double, string> ClassicalCases => new()
    {
        // bottom, top, theoretical K, source of the closed form
        { "pinned", "pinned", 1.0, "Euler; Timoshenko & Gere §2.2" },
        { "fixed", "free", 2.0, "flagpole, Timoshenko & Gere §2.1" },
        { "fixed", "fixed", 0.5, "Timoshenko & Gere §2.2" },
        { "fixed", "pinned", Math.PI / 4.493409457909064, "tan u = u, Timoshenko & Gere §2.2" },
        { "fixed", "guided", 1.0, "sway with rotation held, Timoshenko & Gere §2.2 (common practice table)" },
        { "pinned", "guided", 2.0, "common practice table (commentary tables of steel codes)" },
    };

    private static EndSpring End(string s) => s switch
    {
        "pinned" => EndSpring.Pinned,
        "fixed" => EndSpring.Fixed,
        "free" => EndSpring.Free,
        _ => EndSpring.Guided,
    };

    [Theory]
    [MemberData(nameof(ClassicalCases))]
    public void Solve_ClassicalEndConditions_MatchesClosedFormK(string bottom, string top, double k, string source)
    {
        Near.Relative(Euler(k), Ncr(Model(End(bottom), End(top))), 1e-6, source);
        // Reversed ends give the same load (symmetry of the problem).
        Near.Relative(Euler(k), Ncr(Model(End(top), End(bottom))), 1e-6, source + ", ends swapped");
    }

    [Theory]
    [MemberData(nameof(ClassicalCases))]
    public void Solve_ClassicalEndConditions_AgreesWithAxisRestraintTable(string bottom, string top, double k, string source)
    {
        // The library's table of theoretical K (AxisRestraint.BucklingFactorFor) against the independent FE model.
        var cb = End(bottom).Description switch { "pinned" => EndCondition.Pinned, "fixed" => EndCondition.Fixed, "free" => EndCondition.Free, _ => EndCondition.Guided };
        var ct = End(top).Description switch { "pinned" => EndCondition.Pinned, "fixed" => EndCondition.Fixed, "free" => EndCondition.Free, _ => EndCondition.Guided };
        double kTable = AxisRestraint.BucklingFactorFor(cb, ct, EffectiveLengthBasis.Theoretical);
        Near.Relative(k, kTable, 1e-12, source);
        Near.Relative(Euler(kTable), Ncr(Model(End(bottom), End(top))), 1e-6, "AxisRestraint table vs FE; " + source);
    }

    [Fact]
    public void Solve_SixteenElements_PinnedEulerWithinPointOnePercent()
    {
        // Issue #5 acceptance: 16 elements give π²EI/L² within 0.1 % (Euler; Timoshenko & Gere §2.2).
        var m = Model(EndSpring.Pinned, EndSpring.Pinned).WithElementCount(16);
        Near.Relative(Euler(1), Ncr(m), 1e-3, "Euler pinned–pinned");
        Assert.Equal(16, BucklingAnalysis.Solve(m).ElementCount);
    }

    [Fact]
    public void Solve_TwentyElements_PinnedEulerToOneInAMillion()
    {
        // STACK.md fact: 20 Hermite elements give π²EI/L² to 1e-6.
        Near.Relative(Euler(1), Ncr(Model(EndSpring.Pinned, EndSpring.Pinned).WithElementCount(20)), 1e-6, "Euler pinned–pinned");
    }

    [Fact]
    public void Solve_RefiningTheMesh_ConvergesFromAbove()
    {
        // Conforming elements bound the load from above (Rayleigh–Ritz, common practice).
        double prev = double.PositiveInfinity;
        foreach (int n in new[] { 2, 4, 8, 16 })
        {
            double p = Ncr(Model(EndSpring.Pinned, EndSpring.Pinned).WithElementCount(n));
            Assert.True(p >= Euler(1) * (1 - 1e-12) && p <= prev, $"n = {n}: {p}");
            prev = p;
        }
    }

    [Fact]
    public void Solve_PinnedPinned_HigherModesAreNSquaredEuler()
    {
        // Pinned–pinned modes: P_n = n² π² EI / L², shapes sin(nπx/L) (Timoshenko & Gere §2.2).
        var r = BucklingAnalysis.Solve(Model(EndSpring.Pinned, EndSpring.Pinned).WithElementCount(64), 3);
        for (int n = 1; n <= 3; n++) Near.Relative(n * n * Euler(1), r.Modes[n - 1].CriticalForce.Newtons, 1e-5, $"mode {n}, n² Pcr");
        var mode = r.Lowest;
        for (int i = 0; i < mode.PositionsM.Count; i++)
            Near.Absolute(Math.Sin(Math.PI * mode.PositionsM[i] / L), mode.Deflections[i], 1e-5, "half sine (Timoshenko & Gere §2.2)");
    }

    [Fact]
    public void Solve_CantileverMode_IsNormalisedWithTipAtOne()
    {
        // Flagpole shape 1 − cos(πx/2L), largest at the tip (Timoshenko & Gere §2.1).
        var mode = BucklingAnalysis.Solve(Model(EndSpring.Fixed, EndSpring.Free)).Lowest;
        Assert.Equal(1.0, mode.Deflections[^1], 12);
        for (int i = 0; i < mode.PositionsM.Count; i++)
            Near.Absolute(1 - Math.Cos(Math.PI * mode.PositionsM[i] / (2 * L)), mode.Deflections[i], 1e-5, "1 − cos(πx/2L)");
    }

    [Theory]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    public void Solve_EquallySpacedRigidBraces_GiveSegmentEulerLoad(int segments)
    {
        // Pinned ends and rigid braces at L/n: the mode has nodes at the braces, P = π² EI / (L/n)²: the K = 1 segment
        // rule of AxisRestraint.WithBracingAt is exact here (Timoshenko & Gere §2.2, common practice).
        var m = Model(EndSpring.Pinned, EndSpring.Pinned).WithElementCount(16 * segments);
        for (int i = 1; i < segments; i++) m = m.WithBraceAt(Length.FromMeters(L * i / segments));
        Near.Relative(Euler(1.0 / segments), Ncr(m), 1e-5, "Euler load of one segment");
    }

    [Fact]
    public void Solve_UnequalBraceSpacing_LiesBetweenLongestAndShortestSegmentLoads()
    {
        // Continuity over a brace helps the longer span: the true load exceeds the longest-segment Euler load that
        // the closed form (K = 1 × longest segment) assumes, and is below that of the shorter segment (common practice).
        var m = Model(EndSpring.Pinned, EndSpring.Pinned).WithBraceAt(Length.FromMeters(2.0));
        double p = Ncr(m);
        double longest = Math.PI * Math.PI * EI / (3.0 * 3.0), shortest = Math.PI * Math.PI * EI / (2.0 * 2.0);
        Assert.InRange(p, longest * 1.01, shortest * 0.99);
    }

    [Fact]
    public void Solve_WeakElasticBrace_BelowRigidBraceAndAboveUnbraced()
    {
        // Mid-height brace of a pinned column: the ideal stiffness that forces the second mode is k = 2 P2 / Lb with
        // Lb = L/2 and P2 = 4 π² EI / L², i.e. 16 π² EI / L³ (Winter's ideal brace stiffness, common practice, from memory).
        double kIdeal = 2 * 4 * Euler(1) / (L / 2);
        double weak = Ncr(Model(EndSpring.Pinned, EndSpring.Pinned).WithBraceAt(Length.FromMeters(L / 2), ForcePerLength.FromNewtonsPerMeter(0.25 * kIdeal)));
        double enough = Ncr(Model(EndSpring.Pinned, EndSpring.Pinned).WithBraceAt(Length.FromMeters(L / 2), ForcePerLength.FromNewtonsPerMeter(1.01 * kIdeal)));
        Assert.InRange(weak, Euler(1) * 1.01, 4 * Euler(1) * 0.99);
        Near.Relative(4 * Euler(1), enough, 1e-5, "brace above the ideal stiffness: second mode, P = 4 π² EI / L²");
    }

    [Fact]
    public void Solve_SelfWeightOnly_MatchesGreenhillHeavyColumn()
    {
        // Heavy flagpole under its own weight: (q L)cr = 7.837 EI / L² (Greenhill; Timoshenko & Gere §2.10).
        double q = 1000; // N/m, only the ratio matters
        var m = Model(EndSpring.Fixed, EndSpring.Free).WithSelfWeight(ForcePerLength.FromNewtonsPerMeter(q)).WithElementCount(64);
        var r = BucklingAnalysis.Solve(m, 1);
        Near.Relative(7.837 * EI / (L * L), r.Lowest.CriticalForce.Newtons, 2e-4, "Greenhill 7.837 EI/L² (Timoshenko & Gere §2.10)");
        Near.Relative(r.Lowest.CriticalForce.Newtons / (q * L), r.Lowest.LoadFactor, 1e-9, "λ × qL is the critical total weight");
    }

    [Fact]
    public void Solve_FlagpoleWithTopAndMidHeightLoads_LiesBetweenBounds()
    {
        // A cantilever loaded P at the top and P at mid-height buckles at a larger load than 2P at the top and a smaller one
        // than 2P at mid-height alone; bounds of common practice for varying axial force.
        var topOnly = Ncr(Model(EndSpring.Fixed, EndSpring.Free).WithAxialLoadAtTop(Force.FromNewtons(2)));
        var mixed = BucklingAnalysis.Solve(Model(EndSpring.Fixed, EndSpring.Free)
            .WithAxialLoadAtTop(Force.FromNewtons(1)).WithAxialLoadAt(Length.FromMeters(L / 2), Force.FromNewtons(1)), 1).Lowest.LoadFactor * 2;
        double midOnly = Math.PI * Math.PI * EI / (4 * (L / 2) * (L / 2)); // flagpole of length L/2
        Assert.InRange(mixed, topOnly * 1.01, midOnly * 0.99);
    }

    [Fact]
    public void Solve_SteppedColumn_MatchesExactEquationAndUniformLimit()
    {
        // Pinned–pinned column, two halves with I (bottom) and 2I (top): the load lies between those of uniform I and 2I.
        var seg1 = MemberSegment.Uniform(Length.FromMeters(L / 2), Pressure.FromPascals(E), AreaMomentOfInertia.FromMetersToTheFourth(I));
        var seg2 = MemberSegment.Uniform(Length.FromMeters(L / 2), Pressure.FromPascals(E), AreaMomentOfInertia.FromMetersToTheFourth(2 * I));
        double p = Ncr(BucklingModel.FromSegments([seg1, seg2], EndSpring.Pinned, EndSpring.Pinned));
        Assert.InRange(p, Euler(1) * 1.01, 2 * Euler(1) * 0.99);
        // Equal segments reproduce the uniform member.
        double same = Ncr(BucklingModel.FromSegments([seg1, seg1], EndSpring.Pinned, EndSpring.Pinned));
        Near.Relative(Euler(1), same, 1e-6, "two equal segments = uniform (Euler)");
        // Exact: cantilever stepped at mid-height, lower part (fixed base) 2I over a = L/2, upper part I over b = L/2, load at
        // the free top. Derived by hand from EI y'' = P(δ − y) in each part (the method of Timoshenko & Gere §2.9):
        // tan(k1 a) tan(k2 b) = k2 / k1 with k1² = P / (E·2I) (lower), k2² = P / (E I) (upper). Solved by bisection between
        // the flagpole loads of uniform I and uniform 2I.
        double F(double pp) { double k1 = Math.Sqrt(pp / (E * 2 * I)), k2 = Math.Sqrt(pp / (E * I)); return Math.Tan(k1 * L / 2) * Math.Tan(k2 * L / 2) - k2 / k1; }
        double lo = Math.PI * Math.PI * E * I / (4 * L * L), hi = Math.PI * Math.PI * E * 2 * I / (4 * L * L);
        for (int it = 0; it < 200; it++) { double mid = 0.5 * (lo + hi); if (F(mid) < 0) lo = mid; else hi = mid; }
        double exact = 0.5 * (lo + hi);
        var lower = MemberSegment.Uniform(Length.FromMeters(L / 2), Pressure.FromPascals(E), AreaMomentOfInertia.FromMetersToTheFourth(2 * I));
        var upper = MemberSegment.Uniform(Length.FromMeters(L / 2), Pressure.FromPascals(E), AreaMomentOfInertia.FromMetersToTheFourth(I));
        double fe = Ncr(BucklingModel.FromSegments([lower, upper], EndSpring.Fixed, EndSpring.Free).WithElementCount(64));
        Near.Relative(exact, fe, 1e-6, "stepped cantilever tan(k1 a) tan(k2 b) = k2/k1, hand derivation");
    }

    [Fact]
    public void Solve_TaperedSegmentWithEqualEnds_IsUniform()
    {
        var t = MemberSegment.Tapered(Length.FromMeters(L), Pressure.FromPascals(E), AreaMomentOfInertia.FromMetersToTheFourth(I), AreaMomentOfInertia.FromMetersToTheFourth(I));
        Near.Relative(Euler(1), Ncr(BucklingModel.FromSegments([t], EndSpring.Pinned, EndSpring.Pinned)), 1e-6, "Euler");
        var taper = MemberSegment.Tapered(Length.FromMeters(L), Pressure.FromPascals(E), AreaMomentOfInertia.FromMetersToTheFourth(I), AreaMomentOfInertia.FromMetersToTheFourth(2 * I));
        Assert.InRange(Ncr(BucklingModel.FromSegments([taper], EndSpring.Pinned, EndSpring.Pinned)), Euler(1) * 1.01, 2 * Euler(1) * 0.99);
    }

    [Fact]
    public void Check_RecommendedK_FiniteElementsUseTheIdealSupports()
    {
        // The FE method models the supports, not K: a fixed–fixed member with the recommended K = 0.65 (common practice)
        // is analysed with ideal fixed ends and gives the theoretical load π² EI / (0.5 L)² (Timoshenko & Gere §2.2).
        var member = Member.Create(new RectangleSection(Length.FromMillimeters(40), Length.FromMillimeters(40)), Fixtures.Steel, Length.FromMillimeters(4000),
            Restraint.Same(AxisRestraint.FromEndConditions(EndCondition.Fixed, EndCondition.Fixed, EffectiveLengthBasis.Recommended)), "bar");
        var fe = Check.Evaluate(member, DesignActions.Compression(Force.FromKilonewtons(1)), ResistanceMethods.FiniteElementCritical);
        double i = 0.04 * Math.Pow(0.04, 3) / 12;
        Near.Relative(Math.PI * Math.PI * 200e9 * i / (2.0 * 2.0), fe.AboutY.CriticalForceN, 1e-6, "fixed–fixed theoretical");
    }

    [Fact]
    public void Tapered_NegativeSecondMoment_ThrowsArgumentOutOfRange()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => MemberSegment.Tapered(Length.FromMeters(1), Pressure.FromGigapascals(200),
            AreaMomentOfInertia.FromCentimetersToTheFourth(100), AreaMomentOfInertia.FromCentimetersToTheFourth(-5)));
        Assert.Equal("secondMomentTop", ex.ParamName);
        Assert.Contains("Second moment of area at the top must be greater than 0; got -5 cm⁴.", ex.Message);
    }

    [Fact]
    public void WithAxialLoadAt_AboveTheTop_ThrowsArgumentOutOfRange()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Model(EndSpring.Fixed, EndSpring.Free).WithAxialLoadAt(Length.FromMeters(5.5), Force.FromKilonewtons(1)));
        Assert.Equal("position", ex.ParamName);
        Assert.Contains("on the member of length 5000 mm; got 5.5 m", ex.Message);
    }

    [Fact]
    public void Solve_Mechanism_ThrowsArgumentException()
    {
        var ex = Assert.Throws<ArgumentException>(() => BucklingAnalysis.Solve(Model(EndSpring.Free, EndSpring.Pinned)));
        Assert.Equal("model", ex.ParamName);
        Assert.Contains("mechanism", ex.Message);
    }

    [Fact]
    public void WithSupportAt_OutsideMember_ThrowsArgumentOutOfRange()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Model(EndSpring.Pinned, EndSpring.Pinned).WithBraceAt(Length.FromMeters(6)));
        Assert.Equal("position", ex.ParamName);
        Assert.Contains("strictly inside the member of length 5000 mm; got 6 m", ex.Message);
    }

    [Fact]
    public void WithElementCount_One_ThrowsArgumentOutOfRange()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Model(EndSpring.Pinned, EndSpring.Pinned).WithElementCount(1));
        Assert.Equal("count", ex.ParamName);
        Assert.Contains("between 2 and 2000; got 1", ex.Message);
    }

    [Fact]
    public void Check_FiniteElementCritical_AgreesWithEulerMethod()
    {
        // The one-line cross-check of the closed-form Euler method (Timoshenko & Gere §2.2) with the FE twin: a slender bar
        // fixed–pinned about y and pinned–pinned about z, braced at mid-height about z.
        var restraint = new Restraint(
            AxisRestraint.FromEndConditions(EndCondition.Fixed, EndCondition.Pinned, EffectiveLengthBasis.Theoretical),
            AxisRestraint.PinnedPinned.WithBracingAt(Length.FromMillimeters(1500)));
        var member = Member.Create(new RectangleSection(Length.FromMillimeters(40), Length.FromMillimeters(60)), Fixtures.Steel,
            Length.FromMillimeters(3000), restraint, "bar");
        var actions = DesignActions.Compression(Force.FromKilonewtons(10));
        var euler = Check.Evaluate(member, actions, ResistanceMethods.Euler);
        var fe = Check.Evaluate(member, actions, ResistanceMethods.FiniteElementCritical);
        Assert.True(fe.AgreesWith(euler, 1e-6), $"Euler {euler.DesignResistanceN} N, FE {fe.DesignResistanceN} N");
        Near.Relative(euler.AboutY.CriticalForceN, fe.AboutY.CriticalForceN, 1e-6, "Euler about y, fixed–pinned K = 0.699");
        Near.Relative(euler.AboutZ.CriticalForceN, fe.AboutZ.CriticalForceN, 1e-6, "Euler about z, braced at mid-height");
        var traced = Check.EvaluateWithTrace(member, actions, ResistanceMethods.FiniteElementCritical);
        Assert.True(traced.AgreesWith(fe, 0));
        Assert.Contains(traced.Steps, s => s.Symbol == "Ncr,y");
    }

    [Fact]
    public void AppliesTo_BareK_RefusesWithReason()
    {
        var member = Member.Create(new RectangleSection(Length.FromMillimeters(40), Length.FromMillimeters(60)), Fixtures.Steel,
            Length.FromMillimeters(3000), Restraint.Same(AxisRestraint.FromBucklingFactor(0.8, "frame analysis")), "bar");
        var ex = Assert.Throws<MethodNotApplicableException>(() => Check.Evaluate(member, DesignActions.Compression(Force.FromKilonewtons(1)), ResistanceMethods.FiniteElementCritical));
        Assert.Contains("given only as K (frame analysis)", ex.Message);
    }
}
