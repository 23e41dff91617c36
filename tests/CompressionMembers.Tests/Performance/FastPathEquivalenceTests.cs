using System;
using CompressionMembers.Actions;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Timber;
using CompressionMembers.Resolution;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CsCheck;
using UnitsNet;

namespace CompressionMembers.Tests.Performance;

/// <summary>
/// The straight-line pure-compression path of the EN 1995-1-1 column method (the path of parametric sweeps) against the
/// general kernel <see cref="Ec5Kernel.Run"/> that handles bending and fire: for the same member and load they must agree to
/// the last bit — both implement EN 1995-1-1 (6.21)–(6.28) and (2.14) with the same operations in the same order. Inputs
/// are random (CsCheck); the expected values are the kernel's own, so this is a consistency check, not a reference check
/// (the reference checks are in Timber/ and Published/).
/// </summary>
public class FastPathEquivalenceTests
{
    private static readonly TimberMaterial[] Classes = [TimberGrades.C16, TimberGrades.C24, TimberGrades.C30, TimberGrades.GL24h, TimberGrades.GL32h];
    private static readonly LoadDurationClass[] Durations =
        [LoadDurationClass.Permanent, LoadDurationClass.LongTerm, LoadDurationClass.MediumTerm, LoadDurationClass.ShortTerm, LoadDurationClass.Instantaneous];

    [Fact]
    public void Ec5Compression_RandomMembers_BitIdenticalToGeneralKernel()
    {
        Gen.Select(Gen.Double[20, 400], Gen.Double[20, 600], Gen.Double[100, 12000], Gen.Int[0, Classes.Length - 1], Gen.Int[0, Durations.Length - 1],
                Gen.Double[0.5, 2.0], Gen.Bool)
            .Sample((b, h, l, ci, di, k, circle) =>
            {
                var mat = Classes[ci];
                Section s = circle ? new CircleSection(Length.FromMillimeters(b)) : new RectangleSection(Length.FromMillimeters(b), Length.FromMillimeters(h));
                var member = Member.Create(s, mat, Length.FromMillimeters(l),
                    new Restraint(AxisRestraint.FromBucklingFactor(k), AxisRestraint.FromBucklingFactor(1), AxisRestraint.FromBucklingFactor(1)));
                var actions = DesignActions.Compression(Force.FromKilonewtons(50)).WithLoadDuration(Durations[di]);
                var method = new Ec5ColumnStability(ServiceClass.Class2);
                var r = Check.Evaluate(member, actions, method);

                // The general kernel on the same member and actions.
                ref readonly var rm = ref member.Resolved;
                var i = default(Ec5Input);
                Ec5ColumnStability.Geometry(rm, mat, ref i);
                i.Kmod = En1995Factors.KmodUnchecked(ServiceClass.Class2, Durations[di]);
                i.GammaM = En1995Factors.GammaMUnchecked(mat.Product);
                i.NEdN = actions.Resolved.AxialForceN;
                i.KhY = i.KhZ = 1.0;
                Ec5Kernel.Run(i, out var o);

                return r.Utilisation.Equals(o.Utilisation) && r.DesignResistanceN.Equals(o.ResistanceN)
                    && r.AboutY.ReductionFactor.Equals(o.KcY) && r.AboutZ.ReductionFactor.Equals(o.KcZ)
                    && r.AboutY.RelativeSlenderness.Equals(o.LambdaRelY) && r.AboutZ.RelativeSlenderness.Equals(o.LambdaRelZ)
                    && r.AboutY.ResistanceN.Equals(o.KcY * o.Fc0dPa * i.AreaM2) && r.GoverningAxis == Ec5Kernel.Axis(o)
                    && r.GoverningMode == Ec5Kernel.Mode(o) && r.GoverningCheck == Ec5Kernel.CheckName(o);
            }, seed: Trust.PropertyTests.Seed, threads: 1);
    }

    /// <summary>Every number two results carry, bit for bit, and the same words and steps.</summary>
    internal static bool SameBits(in CheckResult a, in CheckResult b)
    {
        static bool Axis(in AxisOutcome x, in AxisOutcome y) => x.IsEvaluated == y.IsEvaluated && x.EffectiveLengthM.Equals(y.EffectiveLengthM)
            && x.Slenderness.Equals(y.Slenderness) && x.RelativeSlenderness.Equals(y.RelativeSlenderness) && x.CriticalForceN.Equals(y.CriticalForceN)
            && x.ReductionFactor.Equals(y.ReductionFactor) && x.ResistanceN.Equals(y.ResistanceN);
        if (!a.Utilisation.Equals(b.Utilisation) || !a.DesignResistanceN.Equals(b.DesignResistanceN) || a.GoverningAxis != b.GoverningAxis
            || a.GoverningMode != b.GoverningMode || a.GoverningCheck != b.GoverningCheck || !Axis(a.AboutY, b.AboutY) || !Axis(a.AboutZ, b.AboutZ)
            || !Axis(a.Torsional, b.Torsional) || a.Steps.Count != b.Steps.Count)
            return false;
        for (int k = 0; k < a.Steps.Count; k++)
            if (a.Steps[k].Symbol != b.Steps[k].Symbol || !a.Steps[k].Value.Equals(b.Steps[k].Value) || a.Steps[k].Expression != b.Steps[k].Expression)
                return false;
        return true;
    }

    [Fact]
    public void Ec5Compression_RandomMembers_SameAsGeneralPathTracedAndUntraced()
    {
        Gen.Select(Gen.Double[20, 400], Gen.Double[20, 600], Gen.Double[100, 12000], Gen.Int[0, Classes.Length - 1], Gen.Int[0, Durations.Length - 1], Gen.Bool)
            .Sample((b, h, l, ci, di, circle) =>
            {
                Section s = circle ? new CircleSection(Length.FromMillimeters(b)) : new RectangleSection(Length.FromMillimeters(b), Length.FromMillimeters(h));
                var member = Member.Create(s, Classes[ci], Length.FromMillimeters(l), Restraint.PinnedBothAxes);
                var actions = DesignActions.Compression(Force.FromKilonewtons(50)).WithLoadDuration(Durations[di]);
                var method = new Ec5ColumnStability(ServiceClass.Class3);
                return SameBits(method.Evaluate(member.Resolved, actions.Resolved, null), method.EvaluateWithBending(member.Resolved, actions.Resolved, null))
                    && SameBits(method.Evaluate(member.Resolved, actions.Resolved, new CalculationTrace()),
                        method.EvaluateWithBending(member.Resolved, actions.Resolved, new CalculationTrace()));
            }, seed: Trust.PropertyTests.Seed, threads: 1);
    }

    [Fact]
    public void Ec5FireCompression_RandomMembers_SameAsGeneralPathTracedAndUntraced()
    {
        // γM,fi both at its recommended 1.0 (the compression path skips that exact division) and at a national-annex value.
        Gen.Select(Gen.Double[60, 400], Gen.Double[60, 600], Gen.Double[500, 8000], Gen.Int[0, Classes.Length - 1], Gen.Double[5, 120], Gen.Int[0, 2],
                Gen.Bool)
            .Sample((b, h, l, ci, minutes, exposure, annexGamma) =>
            {
                var member = Member.Create(new RectangleSection(Length.FromMillimeters(b), Length.FromMillimeters(h)), Classes[ci],
                    Length.FromMillimeters(l), Restraint.PinnedBothAxes);
                var actions = DesignActions.Compression(Force.FromKilonewtons(20)).WithLoadDuration(LoadDurationClass.Instantaneous);
                // Three-sided exposure without the centroid-shift moment is pure compression too.
                var method = new Ec5FireReducedSection(Duration.FromMinutes(minutes), (FireExposure)exposure, annexGamma ? 1.15 : 1.0,
                    includeCentroidShift: exposure == 0);
                return SameBits(method.Evaluate(member.Resolved, actions.Resolved, null), method.EvaluateGeneral(member.Resolved, actions.Resolved, null))
                    && SameBits(method.Evaluate(member.Resolved, actions.Resolved, new CalculationTrace()),
                        method.EvaluateGeneral(member.Resolved, actions.Resolved, new CalculationTrace()));
            }, seed: Trust.PropertyTests.Seed, threads: 1);
    }

    [Fact]
    public void Ec9Flexural_RandomTubesAndBars_SameAsGeneralPathTracedAndUntraced()
    {
        var alloys = new[] { Materials.Aluminium.AluminiumAlloys.EnAw6082T6Extrusion, Materials.Aluminium.AluminiumAlloys.EnAw6060T6Extrusion,
            Materials.Aluminium.AluminiumAlloys.EnAw6063T5Extrusion };
        Gen.Select(Gen.Double[20, 200], Gen.Double[20, 200], Gen.Double[1.2, 5], Gen.Double[300, 6000], Gen.Int[0, alloys.Length - 1], Gen.Int[0, 2])
            .Sample((b, h, t, l, ai, kind) =>
            {
                // Thin walls give class 4 (effective area), stocky ones class 1 to 3; any section whose thickness the alloy's
                // values do not cover is refused by both paths alike, so it is skipped here.
                Section s = kind switch
                {
                    0 => new RectangularHollowSection(Length.FromMillimeters(b), Length.FromMillimeters(h), Length.FromMillimeters(t)),
                    1 => new CircularHollowSection(Length.FromMillimeters(b), Length.FromMillimeters(t)),
                    _ => new RectangleSection(Length.FromMillimeters(b / 5), Length.FromMillimeters(h / 5)),
                };
                var member = Member.Create(s, alloys[ai], Length.FromMillimeters(l), Restraint.PinnedBothAxes);
                var actions = DesignActions.Compression(Force.FromKilonewtons(10));
                var method = ResistanceMethods.Eurocode9;
                if (!method.AppliesTo(member.Resolved, actions.Resolved).IsApplicable) return true;
                return SameBits(method.Evaluate(member.Resolved, actions.Resolved, null), method.EvaluateGeneral(member.Resolved, actions.Resolved, null))
                    && SameBits(method.Evaluate(member.Resolved, actions.Resolved, new CalculationTrace()),
                        method.EvaluateGeneral(member.Resolved, actions.Resolved, new CalculationTrace()));
            }, seed: Trust.PropertyTests.Seed, threads: 1);
    }

    private sealed class BrokenMethod(double resistanceN, double utilisation) : IResistanceMethod
    {
        public MethodIdentity Identity { get; } = new("broken on purpose (test)", "none", "", "");
        public Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions) => Applicability.Applicable;
        public CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace) =>
            new(member, actions, this, resistanceN, utilisation, BucklingAxis.Y, FailureMode.FlexuralBuckling, "none", default, default, default, trace);
    }

    [Theory]
    [InlineData(double.NaN, 0.5)]
    [InlineData(-1.0, 0.5)]
    [InlineData(double.PositiveInfinity, 0.5)]
    [InlineData(1000.0, double.NaN)]
    [InlineData(1000.0, -0.1)]
    public void Evaluate_MethodBuildsAnImpossibleResult_ThrowsInvalidOperation(double resistanceN, double utilisation)
    {
        // Contract of IResistanceMethod (common practice for plug-ins): a result with a resistance that is not a finite,
        // non-negative number, or a NaN or negative utilisation, is refused where it is built, and so never reaches a report.
        var member = Member.Create(new RectangleSection(Length.FromMillimeters(50), Length.FromMillimeters(50)), TimberGrades.C24,
            Length.FromMeters(1), Restraint.PinnedBothAxes, "test post");
        var ex = Assert.Throws<InvalidOperationException>(() =>
            Check.Evaluate(member, DesignActions.Compression(Force.FromKilonewtons(1)), new BrokenMethod(resistanceN, utilisation)));
        Assert.Contains("broken on purpose (test) returned resistance", ex.Message);
        Assert.Contains("\"test post\"", ex.Message);
    }

    [Fact]
    public void Evaluate_InfiniteUtilisation_IsAFailingResultNotAnError()
    {
        // A section burnt away in fire has no resistance: utilisation +∞, which fails (EN 1995-1-2 4.2.2; common practice).
        var member = Member.Create(new RectangleSection(Length.FromMillimeters(50), Length.FromMillimeters(50)), TimberGrades.C24,
            Length.FromMeters(1), Restraint.PinnedBothAxes);
        var r = Check.Evaluate(member, DesignActions.Compression(Force.FromKilonewtons(1)), new BrokenMethod(0, double.PositiveInfinity));
        Assert.False(r.Passed);
    }
    // kh is kept with the member after its first bending check (Member.SizeFactor): the kept value must be the formula's to
    // the bit, for every product and depth (below and above the 150, 300 and 600 mm limits of EN 1995-1-1 3.2–3.4), and a
    // member checked first on many threads at once must give every thread the same result as a fresh member on one thread.
    [Fact]
    public void Ec5SizeFactor_KeptWithTheMember_SameBitsAsTheFormulaAndAcrossThreads()
    {
        TimberMaterial[] materials = [TimberGrades.C16, TimberGrades.C24, TimberGrades.D40, TimberGrades.GL24h, TimberGrades.GL32h];
        var actions = DesignActions.Compression(Force.FromKilonewtons(20)).WithLoadDuration(LoadDurationClass.MediumTerm)
            .WithEccentricity(Length.FromMillimeters(15), Length.FromMillimeters(8));
        Gen.Select(Gen.Double[20, 700], Gen.Double[20, 700], Gen.Int[0, materials.Length - 1]).Sample((b, h, mi) =>
        {
            var mat = materials[mi];
            var member = Member.Create(new RectangleSection(Length.FromMillimeters(b), Length.FromMillimeters(h)), mat, Length.FromMeters(3), Restraint.PinnedBothAxes);
            // The depths as the method reads them (the resolved fibre distances), as the uncached path did.
            TimberRules.Dimensions(member.Resolved, out double bM, out double hM);
            double khY = Ec5ColumnStability.SizeFactor(mat, true, hM), khZ = Ec5ColumnStability.SizeFactor(mat, true, bM);
            var fresh = Check.Evaluate(Member.Create(member.Section, mat, member.Length, member.Restraint), actions, ResistanceMethods.Ec5Column);
            var results = new CheckResult[8];
            System.Threading.Tasks.Parallel.For(0, results.Length, new System.Threading.Tasks.ParallelOptions { MaxDegreeOfParallelism = 8 },
                k => results[k] = Check.Evaluate(member, actions, ResistanceMethods.Ec5Column));
            Assert.Equal(BitConverter.DoubleToInt64Bits(khY), BitConverter.DoubleToInt64Bits(member.SizeFactor(true, static (_, _) => double.NaN)));
            Assert.Equal(BitConverter.DoubleToInt64Bits(khZ), BitConverter.DoubleToInt64Bits(member.SizeFactor(false, static (_, _) => double.NaN)));
            foreach (var r in results)
            {
                Assert.Equal(BitConverter.DoubleToInt64Bits(fresh.Utilisation), BitConverter.DoubleToInt64Bits(r.Utilisation));
                Assert.Equal(fresh.GoverningCheck, r.GoverningCheck);
            }
            var again = Check.EvaluateWithTrace(member, actions, ResistanceMethods.Ec5Column);
            Assert.Equal(BitConverter.DoubleToInt64Bits(fresh.Utilisation), BitConverter.DoubleToInt64Bits(again.Utilisation));
        }, iter: 200, seed: Trust.PropertyTests.Seed, threads: 1);
    }
}
