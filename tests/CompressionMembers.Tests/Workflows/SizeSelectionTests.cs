using System;
using System.Collections.Generic;
using System.Linq;
using CompressionMembers.Actions;
using CompressionMembers.Methods;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using CompressionMembers.Workflows.Batch;
using CompressionMembers.Workflows.Catalogues;
using CompressionMembers.Workflows.Selection;
using CsCheck;
using UnitsNet;

namespace CompressionMembers.Tests.Workflows;

public class SizeSelectionTests
{
    private static SectionCatalogue SquareBars() => SectionCatalogue.Create("square bars", "invented for tests",
        new[] { 40.0, 20, 25, 30 }.Select(b => new CatalogueEntry($"bar {b}", new RectangleSection(Length.FromMillimeters(b), Length.FromMillimeters(b)), "bar")));

    [Fact]
    public void Select_EulerSquareBars_ChoosesTheLightestThatPasses()
    {
        // Hand calculation (Euler, Timoshenko & Gere §2.2): Ncr = π² E b⁴/12 / L², E = 200 GPa, L = 2 m, NEd = 20 kN.
        static double Ncr(double bMm) => Math.PI * Math.PI * 200e9 * Math.Pow(bMm * 1e-3, 4) / 12 / (2.0 * 2.0);
        Assert.True(Ncr(25) < 20e3 && Ncr(30) > 20e3); // 25 mm fails (16.1 kN), 30 mm passes (33.3 kN); squash 225 kN does not govern
        var sel = new SizeSelector(SquareBars(), ResistanceMethods.Euler);
        var r = sel.Select(new SizingRequest(WorkflowFixtures.Column(2000), DesignActions.Compression(Force.FromKilonewtons(20))));
        Assert.Equal("bar 30", r.Chosen!.Entry.Designation);
        Near.Relative(20e3 / Ncr(30), r.Chosen.Utilisation, 1e-12, "hand calculation: NEd / (π² E I / L²)");
        Assert.Equal(["bar 30", "bar 40"], r.Candidates.Select(c => c.Entry.Designation));
    }

    [Fact]
    public void Select_NothingPasses_ReturnsNoChoice()
    {
        var sel = new SizeSelector(SquareBars(), ResistanceMethods.Euler);
        var r = sel.Select(new SizingRequest(WorkflowFixtures.Column(2000), DesignActions.Compression(Force.FromKilonewtons(5000))));
        Assert.False(r.Found);
        Assert.Null(r.Chosen);
        Assert.Contains("no section of the catalogue passes", r.ToString());
    }

    [Fact]
    public void Select_SeveralCases_EveryCaseMustPass()
    {
        var cases = new[] { DesignActions.Compression(Force.FromKilonewtons(10), "light"), DesignActions.Compression(Force.FromKilonewtons(30), "heavy") };
        var r = new SizeSelector(SquareBars(), ResistanceMethods.Euler).Select(new SizingRequest(WorkflowFixtures.Column(2000), cases));
        // 30 mm: Ncr = 33.3 kN ≥ 30 kN (hand calculation as above), so it still passes; the heavy case governs.
        Assert.Equal("bar 30", r.Chosen!.Entry.Designation);
        Assert.Equal("heavy", r.Chosen.GoverningCase);
    }

    public static TheoryData<string> Methods => new() { "Euler", "Johnson", "Perry", "Secant" };

    private static IResistanceMethod MethodNamed(string n) => n switch
    {
        "Euler" => ResistanceMethods.Euler,
        "Johnson" => ResistanceMethods.Johnson,
        "Perry" => ResistanceMethods.PerryRobertsonDefault,
        _ => ResistanceMethods.Secant,
    };

    [Theory]
    [MemberData(nameof(Methods))]
    public void Select_RandomCases_PrunedEqualsExhaustive(string methodName)
    {
        var method = MethodNamed(methodName);
        var catalogue = SectionCatalogues.AluminiumGenericShapes;
        var mass = new SizeSelector(catalogue, method, SelectionObjective.Mass, candidateCount: 3);
        var area = new SizeSelector(catalogue, method, SelectionObjective.Area, candidateCount: 1);
        Gen.Select(Gen.Double[300, 6000], Gen.Double[1, 400], Gen.Double[1, 20], Gen.Double[1.0, 2.0]).Sample((lMm, nKn, eMm, k) =>
        {
            var member = WorkflowFixtures.Column(lMm).WithRestraint(CompressionMembers.Restraints.Restraint.Same(CompressionMembers.Restraints.AxisRestraint.FromBucklingFactor(k)));
            var a = DesignActions.Compression(Force.FromKilonewtons(nKn));
            // Eccentricities of at least 1 mm: the secant formula is for eccentric loads.
            if (methodName == "Secant") a = a.WithEccentricity(Length.FromMillimeters(eMm), Length.FromMillimeters(eMm / 2));
            var req = new SizingRequest(member, a);
            foreach (var sel in new[] { mass, area })
            {
                var p = sel.Select(req);
                var b = sel.SelectExhaustively(req);
                Assert.False(p.FellBackToExhaustive, $"{methodName}: L = {lMm} mm, N = {nKn} kN, e = {eMm} mm, K = {k}");
                Assert.True(b.Candidates.Select(c => c.Entry.Designation).SequenceEqual(p.Candidates.Select(c => c.Entry.Designation)),
                    $"{methodName}: L = {lMm} mm, N = {nKn} kN, e = {eMm} mm, K = {k}: brute {string.Join(", ", b.Candidates.Select(c => c.Entry.Designation))}; pruned {string.Join(", ", p.Candidates.Select(c => c.Entry.Designation))}");
                Assert.Equal(b.Candidates.Select(c => c.Utilisation), p.Candidates.Select(c => c.Utilisation));
                Assert.True(p.Evaluations <= b.Evaluations);
            }
        }, iter: 60);
    }

    [Fact]
    public void Select_LargeScaledCatalogue_TakesAtLeastTwentyTimesFewerEvaluations()
    {
        var catalogue = SyntheticCatalogue.Scaled(1000);
        var counting = new CountingMethod(ResistanceMethods.Johnson);
        var sel = new SizeSelector(catalogue, counting, candidateCount: 1);
        var rnd = new Random(7);
        var requests = Enumerable.Range(0, 40).Select(i => new SizingRequest(WorkflowFixtures.Column(500 + rnd.NextDouble() * 5500, $"m{i}"),
            DesignActions.Compression(Force.FromKilonewtons(1 + rnd.NextDouble() * 2000)))).ToArray();
        var pruned = sel.SelectAll(requests, BatchOptions.Serial);
        int prunedCount = counting.Count;
        var brute = sel.SelectAllExhaustively(requests, BatchOptions.Serial);
        int bruteCount = counting.Count - prunedCount;
        Assert.Equal(prunedCount, pruned.Sum(p => p.Evaluations)); // the selector's counter agrees with the wrapper's
        Assert.Equal(bruteCount, brute.Sum(p => p.Evaluations));
        Assert.Equal(brute.Select(b => b.Chosen?.Entry.Designation), pruned.Select(p => p.Chosen?.Entry.Designation));
        Assert.True(bruteCount >= 20 * prunedCount, $"brute force {bruteCount} evaluations, pruned {prunedCount}");
    }

    [Fact]
    public void Select_MethodNotMonotone_VerificationFallsBackToExhaustive()
    {
        var catalogue = SectionCatalogues.AluminiumGenericShapes.OnlyFamily("SHS");
        var sel = new SizeSelector(catalogue, new NonMonotoneMethod(), candidateCount: 3);
        var req = new SizingRequest(WorkflowFixtures.Column(1000), DesignActions.Compression(Force.FromKilonewtons(60)));
        var p = sel.Select(req);
        var b = sel.SelectExhaustively(req);
        Assert.Equal(b.Candidates.Select(c => c.Entry.Designation), p.Candidates.Select(c => c.Entry.Designation));
        Assert.All(p.Candidates, c => Assert.True(c.Utilisation <= 1));
    }

    [Fact]
    public void SelectAll_ParallelAndSerial_GiveTheSameChoicesInOrder()
    {
        var sel = new SizeSelector(SectionCatalogues.AluminiumGenericShapes, ResistanceMethods.PerryRobertsonDefault);
        var requests = Enumerable.Range(0, 200).Select(i => new SizingRequest(WorkflowFixtures.Column(800 + 20 * i, $"m{i}"),
            DesignActions.Compression(Force.FromKilonewtons(5 + i)))).ToArray();
        var serial = sel.SelectAll(requests, BatchOptions.Serial);
        var parallel = sel.SelectAll(requests, new BatchOptions(2));
        Assert.Equal(serial.Select(s => s.ToString()), parallel.Select(s => s.ToString()));
        Assert.Equal(requests.Select(r => r.Member.Name), parallel.Select(p => p.Request.Member.Name));
    }

    [Fact]
    public void Select_MethodThrowsForSomeSections_SkipsAndReportsThem()
    {
        var sel = new SizeSelector(SectionCatalogues.AluminiumGenericShapes, new PartlyThrowingMethod(), candidateCount: 3);
        var req = new SizingRequest(WorkflowFixtures.Column(2000), DesignActions.Compression(Force.FromKilonewtons(30)));
        var p = sel.Select(req);
        var b = sel.SelectExhaustively(req);
        Assert.Equal(b.Candidates.Select(c => c.Entry.Designation), p.Candidates.Select(c => c.Entry.Designation));
        Assert.All(b.Candidates, c => Assert.False(c.Entry.Section.Area.SquareMillimeters is > 400 and < 600));
        Assert.True(b.MethodFailures > 0);
        Assert.Contains("partly throwing test method failed for", b.FirstMethodFailure);
        Assert.Contains("InvalidOperationException: no convergence (test)", b.FirstMethodFailure);
    }

    [Fact]
    public void SizeSelector_ZeroCandidates_IsRejected()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => new SizeSelector(SquareBars(), ResistanceMethods.Euler, candidateCount: 0));
        Assert.Equal("candidateCount", ex.ParamName);
        Assert.StartsWith("The candidate count must be at least 1; got 0.", ex.Message);
    }

    [Fact]
    public void CustomObjective_CostPerMetre_ChoosesTheCheapestPassing()
    {
        // invented costs: the 40 mm bar is "on offer" and cheaper than the 30 mm bar.
        var cost = SelectionObjective.Custom("cost", "EUR/m", (e, _) => e.Designation == "bar 40" ? 1 : e.Section.Area.SquareMillimeters);
        var r = new SizeSelector(SquareBars(), ResistanceMethods.Euler, cost).Select(new SizingRequest(WorkflowFixtures.Column(2000), DesignActions.Compression(Force.FromKilonewtons(20))));
        Assert.Equal("bar 40", r.Chosen!.Entry.Designation);
    }
}
