using System;
using CompressionMembers.Actions;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Aluminium;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Methods.Timber;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using CsCheck;
using UnitsNet;

namespace CompressionMembers.Tests.Performance;

/// <summary>
/// <see cref="Check"/> dispatches the five timber and aluminium code methods and the three classical closed forms (Euler,
/// Johnson, Perry–Robertson) itself: it picks their straight-line path,
/// has it write the check's numbers and builds the result in line (docs/performance.md, third round); every other path
/// goes to the method. Whatever the path, the result must be the one the method's own <c>Evaluate</c> returns, to the
/// last bit, with the same governing check and the same steps, traced and untraced. Inputs are random (CsCheck) and
/// cover the straight-line paths and the paths beside them (bending, three-sided fire with the centroid-shift moment, a
/// section burnt away, welds, open sections); the expected values are the method's own, so this is a consistency check,
/// not a reference check.
/// </summary>
public class CheckDispatchEquivalenceTests
{
    private static readonly TimberMaterial[] Timber = [TimberGrades.C16, TimberGrades.C24, TimberGrades.GL24h, TimberGrades.GL32h];

    private static bool SameAsTheMethod(Member member, DesignActions actions, IResistanceMethod method)
    {
        if (!method.AppliesTo(member.Resolved, actions.Resolved).IsApplicable)
            return Throws(() => Check.Evaluate(member, actions, method)) && Throws(() => Check.EvaluateWithTrace(member, actions, method));
        return FastPathEquivalenceTests.SameBits(Check.Evaluate(member, actions, method), method.Evaluate(member.Resolved, actions.Resolved, null))
            && FastPathEquivalenceTests.SameBits(Check.EvaluateWithTrace(member, actions, method),
                method.Evaluate(member.Resolved, actions.Resolved, new CalculationTrace()));
    }

    private static bool Throws(Action a)
    {
        try { a(); return false; }
        catch (MethodNotApplicableException) { return true; }
    }

    [Fact]
    public void Timber_RandomMembersAndActions_CheckGivesTheMethodsOwnResult()
    {
        RandomSections.TimberCases(Timber.Length)
            .Sample((b, h, l, ci, eMm, exposure, minutes, circle) =>
            {
                var s = RandomSections.Timber(b, h, circle);
                var member = Member.Create(s, Timber[ci], Length.FromMillimeters(l), Restraint.PinnedBothAxes);
                var actions = DesignActions.Compression(Force.FromKilonewtons(25)).WithLoadDuration(LoadDurationClass.MediumTerm);
                if (eMm > 20) actions = actions.WithEccentricity(Length.FromMillimeters(eMm - 20), Length.Zero);   // about half with bending
                // Short fire times leave a residual section, long ones on small sections burn it away (the general path).
                var fire = new Ec5FireReducedSection(Duration.FromMinutes(minutes), (FireExposure)exposure);
                return SameAsTheMethod(member, actions, ResistanceMethods.Ec5Column) && SameAsTheMethod(member, actions, fire);
            }, seed: Trust.PropertyTests.Seed, threads: 1);
    }

    [Fact]
    public void Nds_RandomMembersAndActions_CheckGivesTheMethodsOwnResult()
    {
        var grades = new[] { NdsGrades.DouglasFirLarchNo2, NdsGrades.Glulam24F18E };
        Gen.Select(Gen.Double[60, 300], Gen.Double[60, 400], Gen.Double[500, 8000], Gen.Int[0, grades.Length - 1], Gen.Double[0, 40], Gen.Bool)
            .Sample((b, h, l, gi, eMm, lrfd) =>
            {
                var member = Member.Create(new RectangleSection(Length.FromMillimeters(b), Length.FromMillimeters(h)), grades[gi],
                    Length.FromMillimeters(l), Restraint.PinnedBothAxes);
                var actions = DesignActions.Compression(Force.FromKilonewtons(20)).WithLoadDuration(LoadDurationClass.MediumTerm);
                if (eMm > 20) actions = actions.WithEccentricity(Length.FromMillimeters(eMm - 20), Length.FromMillimeters(3));
                return SameAsTheMethod(member, actions, lrfd ? ResistanceMethods.NdsColumnLrfd : ResistanceMethods.NdsColumnAsd);
            }, seed: Trust.PropertyTests.Seed, threads: 1);
    }

    [Fact]
    public void Aluminium_RandomMembersAndActions_CheckGivesTheMethodsOwnResult()
    {
        var welded = new Eurocode9Compression(AluminiumWelding.AtEnds(WeldingProcess.Mig));
        Gen.Select(Gen.Double[30, 160], Gen.Double[2, 6], Gen.Double[400, 5000], Gen.Int[0, 3], Gen.Double[0, 20], Gen.Bool)
            .Sample((d, t, l, kind, eMm, weld) =>
            {
                var s = RandomSections.Aluminium(kind, d, t);
                var member = Member.Create(s, AluminiumAlloys.EnAw6082T6Extrusion, Length.FromMillimeters(l), Restraint.PinnedBothAxes);
                var actions = DesignActions.Compression(Force.FromKilonewtons(15));
                if (eMm > 10) actions = actions.WithEccentricity(Length.Zero, Length.FromMillimeters(eMm - 10));
                return SameAsTheMethod(member, actions, weld ? welded : ResistanceMethods.Eurocode9)
                    && SameAsTheMethod(member, actions, ResistanceMethods.AluminiumBucklingConstantsLrfd)
                    && SameAsTheMethod(member, actions, ResistanceMethods.AluminiumBucklingConstantsAsd);
            }, seed: Trust.PropertyTests.Seed, threads: 1);
    }

    [Fact]
    public void Classical_RandomMembersAndActions_CheckGivesTheMethodsOwnResult()
    {
        // Stocky bars (the squash load governs Euler), slender ones (the Euler hyperbola beyond Johnson's Cc), I-sections
        // and tubes of generic steel and aluminium; about a fifth eccentric, which the three methods refuse.
        var materials = new Materials.Material[] { Fixtures.Steel, Materials.Aluminium.AluminiumAlloys.EnAw6082T6Extrusion };
        var perry = new IResistanceMethod[]
        {
            ResistanceMethods.PerryRobertsonDefault, ResistanceMethods.PerryRobertson(PerryImperfection.Constant(0.3)),
            ResistanceMethods.PerryRobertson(PerryImperfection.FromBowRatio(1000)), ResistanceMethods.PerryRobertson(PerryImperfection.FromActions),
        };
        Gen.Select(Gen.Double[30, 160], Gen.Double[2, 6], Gen.Double[100, 9000], Gen.Int[0, 3], Gen.Double[0, 25], Gen.Int[0, 1], Gen.Int[0, perry.Length - 1])
            .Sample((d, t, l, kind, eMm, mi, pi) =>
            {
                var s = RandomSections.Aluminium(kind, d, t);
                var member = Member.Create(s, materials[mi], Length.FromMillimeters(l), Restraint.PinnedBothAxes);
                var actions = DesignActions.Compression(Force.FromKilonewtons(40)).WithInitialBow(Length.FromMillimeters(l / 500), Length.FromMillimeters(l / 700));
                if (eMm > 20) actions = actions.WithEccentricity(Length.FromMillimeters(eMm - 20), Length.Zero);
                return SameAsTheMethod(member, actions, ResistanceMethods.Euler)
                    && SameAsTheMethod(member, actions, ResistanceMethods.Johnson)
                    && SameAsTheMethod(member, actions, perry[pi]);
            }, seed: Trust.PropertyTests.Seed, threads: 1);
    }
}
