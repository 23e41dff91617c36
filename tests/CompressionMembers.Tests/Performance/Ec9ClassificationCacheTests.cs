using System;
using System.Linq;
using System.Threading.Tasks;
using CompressionMembers.Actions;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Aluminium;
using CompressionMembers.Reporting;
using CompressionMembers.Resolution;
using CompressionMembers.Results;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Tests.Performance;

/// <summary>
/// The per-section EN 1999-1-1 classification cache: a cached entry is bit-identical to a fresh classification, a check
/// gives the same result (values, governing mode and every trace step) with and without the cache, and checks from many
/// threads at once (racing misses on fresh sections and hits on shared ones) give bit-identical results.
/// Dimensions are invented for the tests.
/// </summary>
public class Ec9ClassificationCacheTests
{
    private static Length Mm(double v) => Length.FromMillimeters(v);

    private static Section[] Sections() =>
    [
        new RectangularHollowSection(Mm(100), Mm(100), Mm(5)),   // class 3 walls
        new RectangularHollowSection(Mm(150), Mm(150), Mm(3)),   // class 4 walls: effective section
        new RectangularHollowSection(Mm(120), Mm(60), Mm(4)),
        new CircularHollowSection(Mm(100), Mm(2)),
        new ISection(Mm(160), Mm(100), Mm(8), Mm(5), Mm(6)),
        new ChannelSection(Mm(120), Mm(50), Mm(5), Mm(4)),
        new AngleSection(Mm(80), Mm(40), Mm(4)),
        new TeeSection(Mm(80), Mm(80), Mm(6), Mm(6)),
        new RectangleSection(Mm(40), Mm(30)),
        new CircleSection(Mm(40)),
    ];

    private static readonly AluminiumAlloy[] Alloys = [AluminiumAlloys.EnAw6082T6Extrusion, AluminiumAlloys.EnAw6060T5Extrusion];

    private static Ec9SectionEntry Fresh(Section s, AluminiumAlloy a, bool welded)
    {
        Ec9ClassificationCache.BypassOnThisThread = true;
        try { return Ec9ClassificationCache.Get(s, a, welded); }
        finally { Ec9ClassificationCache.BypassOnThisThread = false; }
    }

    private static void SameBits(double expected, double actual, string what) =>
        Assert.True(BitConverter.DoubleToInt64Bits(expected) == BitConverter.DoubleToInt64Bits(actual), $"{what}: {expected:R} uncached, {actual:R} cached");

    private static void SameEntry(Ec9SectionEntry x, Ec9SectionEntry y)
    {
        Ec9Classified a = x.Result, b = y.Result;
        Assert.Equal(a.Count, b.Count);
        Assert.Equal(a.Class, b.Class);
        Assert.Equal(a.GoverningPart, b.GoverningPart);
        Assert.Equal(a.IsTube, b.IsTube);
        Assert.Equal(a.IsSolid, b.IsSolid);
        SameBits(a.TubeBeta, b.TubeBeta, "β tube"); SameBits(a.TubeRho, b.TubeRho, "ρc tube");
        SameBits(a.AreaEffM2, b.AreaEffM2, "Aeff"); SameBits(a.IyEffM4, b.IyEffM4, "Ieff,y"); SameBits(a.IzEffM4, b.IzEffM4, "Ieff,z");
        SameBits(a.MinThicknessM, b.MinThicknessM, "tmin"); SameBits(a.MaxThicknessM, b.MaxThicknessM, "tmax");
        Assert.Equal(x.ThicknessCovered, y.ThicknessCovered);
        SameBits(x.UltimateStrengthPa, y.UltimateStrengthPa, "fu");
        for (int i = 0; i < Math.Max(0, a.Count); i++)
        {
            Ec9Plate p = x.Plates[i], q = y.Plates[i];
            SameBits(p.Beta, q.Beta, "β"); SameBits(p.Rho, q.Rho, "ρc"); Assert.Equal(p.Class, q.Class);
            SameBits(p.WidthM, q.WidthM, "b"); SameBits(p.ThicknessM, q.ThicknessM, "t");
        }
    }

    [Fact]
    public void Get_EverySectionKindAlloyAndWelding_BitIdenticalToFreshClassification()
    {
        foreach (var s in Sections())
            foreach (var a in Alloys)
                foreach (bool welded in new[] { false, true })
                {
                    var first = Ec9ClassificationCache.Get(s, a, welded);
                    var again = Ec9ClassificationCache.Get(s, a, welded);
                    Assert.Same(first, again);                  // a hit returns the stored entry
                    SameEntry(Fresh(s, a, welded), again);
                }
    }

    [Fact]
    public void Get_SameSectionOtherAlloyOrWelding_KeepsSeparateEntries()
    {
        var s = new RectangularHollowSection(Mm(150), Mm(150), Mm(3));
        var a = Ec9ClassificationCache.Get(s, AluminiumAlloys.EnAw6082T6Extrusion, false);
        var b = Ec9ClassificationCache.Get(s, AluminiumAlloys.EnAw6060T5Extrusion, false);
        var c = Ec9ClassificationCache.Get(s, AluminiumAlloys.EnAw6082T6Extrusion, true);
        Assert.NotSame(a, b);
        Assert.NotSame(a, c);
        Assert.Same(a, Ec9ClassificationCache.Get(s, AluminiumAlloys.EnAw6082T6Extrusion, false));
    }

    private static Member Strut(Section s, AluminiumAlloy a, double lengthMm) =>
        Member.Create(s, a, Mm(lengthMm), Restraint.PinnedBothAxes, "cache test strut");

    private static void SameResult(in CheckResult x, in CheckResult y)
    {
        SameBits(x.DesignResistanceN, y.DesignResistanceN, "NRd");
        SameBits(x.Utilisation, y.Utilisation, "u");
        Assert.Equal(x.GoverningAxis, y.GoverningAxis);
        Assert.Equal(x.GoverningMode, y.GoverningMode);
        Assert.Equal(x.GoverningCheck, y.GoverningCheck);
        foreach (var (p, q) in new[] { (x.AboutY, y.AboutY), (x.AboutZ, y.AboutZ), (x.Torsional, y.Torsional) })
        {
            SameBits(p.RelativeSlenderness, q.RelativeSlenderness, "λ̄");
            SameBits(p.ReductionFactor, q.ReductionFactor, "χ");
            SameBits(p.ResistanceN, q.ResistanceN, "N");
        }
        Assert.Equal(x.Steps.Count, y.Steps.Count);
        for (int i = 0; i < x.Steps.Count; i++)
        {
            Assert.Equal(x.Steps[i].Symbol, y.Steps[i].Symbol);
            Assert.Equal(x.Steps[i].Expression, y.Steps[i].Expression);
            SameBits(x.Steps[i].Value, y.Steps[i].Value, x.Steps[i].Symbol);
        }
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void Evaluate_WithAndWithoutCache_SameResultAndSteps(bool traced)
    {
        var welds = new[] { AluminiumWelding.None, AluminiumWelding.AtEnds(WeldingProcess.Mig), AluminiumWelding.LongitudinalSeams(WeldingProcess.Mig, 2, Mm(3)) };
        foreach (var s in Sections())
            foreach (var w in welds)
            {
                var method = new Eurocode9Compression(w);
                var m = Strut(s, AluminiumAlloys.EnAw6082T6Extrusion, 1800);
                var act = DesignActions.Compression(Force.FromKilonewtons(20));
                if (!method.AppliesTo(ResolvedMember.From(m), ResolvedActions.From(act)).IsApplicable)
                {
                    // The verdict itself must not depend on the cache either.
                    Ec9ClassificationCache.BypassOnThisThread = true;
                    try { Assert.False(method.AppliesTo(ResolvedMember.From(m), ResolvedActions.From(act)).IsApplicable); }
                    finally { Ec9ClassificationCache.BypassOnThisThread = false; }
                    continue;
                }
                CheckResult cached = traced ? Check.EvaluateWithTrace(m, act, method) : Check.Evaluate(m, act, method);
                CheckResult uncached;
                Ec9ClassificationCache.BypassOnThisThread = true;
                try { uncached = traced ? Check.EvaluateWithTrace(m, act, method) : Check.Evaluate(m, act, method); }
                finally { Ec9ClassificationCache.BypassOnThisThread = false; }
                SameResult(uncached, cached);
                if (traced) Assert.Equal(TextReport.Render(uncached), TextReport.Render(cached));
            }
    }

    [Fact]
    public void Evaluate_ManyThreadsRacingOnFreshAndSharedSections_BitIdenticalResults()
    {
        const int n = 4000;
        var shared = Sections();
        var act = ResolvedActions.From(DesignActions.Compression(Force.FromKilonewtons(15)));
        IResistanceMethod method = ResistanceMethods.Eurocode9;
        // Reference, sequential and uncached.
        var expected = new double[n];
        var members = new ResolvedMember[n];
        for (int i = 0; i < n; i++)
        {
            // Every fourth case gets a section of its own, so that misses race; the others share ten sections.
            Section s = i % 4 == 0 ? new RectangularHollowSection(Mm(60 + i % 50), Mm(60 + i % 50), Mm(3 + i % 3)) : shared[i % shared.Length];
            members[i] = ResolvedMember.From(Strut(s, AluminiumAlloys.EnAw6082T6Extrusion, 1000 + i % 2000));
        }
        Ec9ClassificationCache.BypassOnThisThread = true;
        try
        {
            for (int i = 0; i < n; i++)
                expected[i] = method.AppliesTo(members[i], act).IsApplicable ? Check.Evaluate(members[i], act, method, null).Utilisation : double.NaN;
        }
        finally { Ec9ClassificationCache.BypassOnThisThread = false; }

        for (int round = 0; round < 3; round++)
        {
            var actual = new double[n];
            Parallel.For(0, n, new ParallelOptions { MaxDegreeOfParallelism = 8 }, i =>
                actual[i] = method.AppliesTo(members[i], act).IsApplicable ? Check.Evaluate(members[i], act, method, null).Utilisation : double.NaN);
            for (int i = 0; i < n; i++) SameBits(expected[i], actual[i], $"case {i}, round {round}");
        }
        Assert.True(expected.Count(double.IsFinite) > n / 2);
    }
}
