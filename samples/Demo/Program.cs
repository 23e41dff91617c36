// The boathouse demo: the posts and struts of a small lakeside boathouse, checked one by one.
// Every number here is a scenario of our own invention, not a published example.
using System;
using System.IO;
using CompressionMembers;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Aluminium;
using CompressionMembers.Methods.Timber;
using CompressionMembers.Reporting;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Demo;

internal static class Program
{
    private static int Main(string[] args)
    {
        string? outDir = args.Length > 0 ? args[0] : null;
        Console.WriteLine("Boathouse on the north shore: compression members");
        Console.WriteLine("==================================================");
        Console.WriteLine();

        var reports = new (string File, CheckResult Result)[]
        {
            ("01-glulam-ridge-column.txt", GlulamRidgeColumn()),
            ("02-glulam-ridge-column-fire-r30.txt", GlulamRidgeColumnFire()),
            ("03-jetty-post-with-rail-bracket.txt", JettyPost()),
            ("04-welded-aluminium-gangway-strut.txt", GangwayStrut()),
            ("05-aluminium-angle-brace.txt", AngleBrace()),
            ("06-steel-davit-prop.txt", DavitProp()),
            ("07-steel-canoe-rack-post.txt", EccentricBracketPost()),
            ("08-steel-roof-strut-angle.txt", RoofStrutAngle()),
            ("09-steel-door-post-on-footing-springs.txt", DoorPost()),
        };

        Console.WriteLine("Summary");
        Console.WriteLine("-------");
        foreach (var (file, r) in reports)
            Console.WriteLine($"  {r.Member.Name,-34} {r.Method.Identity.Name,-58} u = {NumberFormat.Number(r.Utilisation),7}  {(r.Passed ? "passes" : "FAILS")}");
        Console.WriteLine();

        foreach (var (file, r) in reports)
        {
            string text = TextReport.Render(r);
            Console.WriteLine(text);
            if (outDir is not null)
            {
                Directory.CreateDirectory(outDir);
                File.WriteAllText(Path.Combine(outDir, file), text);
            }
        }
        return 0;
    }

    private static Length Mm(double v) => Length.FromMillimeters(v);

    /// <summary>The glulam column under the ridge beam: 4.2 m, pinned both ends, snow governs (medium-term), heated
    /// store but open to the lake in summer: service class 2.</summary>
    private static Member RidgeColumn() => Member.Create(new RectangleSection(Mm(160), Mm(200)), TimberGrades.GL24h, Length.FromMeters(4.2),
        Restraint.PinnedBothAxes, "G1 glulam ridge column");

    private static CheckResult GlulamRidgeColumn() => Check.EvaluateWithTrace(RidgeColumn(),
        DesignActions.Compression(Force.FromKilonewtons(148), "snow on the whole roof").WithLoadDuration(LoadDurationClass.MediumTerm),
        ResistanceMethods.Ec5ColumnServiceClass2);

    /// <summary>The same column in a 30-minute fire, exposed on four sides; the fire design load is smaller.</summary>
    private static CheckResult GlulamRidgeColumnFire() => Check.EvaluateWithTrace(RidgeColumn(),
        DesignActions.Compression(Force.FromKilonewtons(62), "fire: permanent + reduced snow").WithLoadDuration(LoadDurationClass.Instantaneous),
        ResistanceMethods.Ec5FireR30);

    /// <summary>The sawn jetty post that carries the hand-rail bracket 70 mm off its face: compression with bending,
    /// outdoors (service class 3), the railing load is short-term.</summary>
    private static CheckResult JettyPost() => Check.EvaluateWithTrace(
        Member.Create(new RectangleSection(Mm(125), Mm(125)), TimberGrades.C24, Length.FromMeters(2.1),
            Restraint.Same(AxisRestraint.FromEndConditions(EndCondition.Fixed, EndCondition.Free, EffectiveLengthBasis.Recommended)),
            "J3 jetty post"),
        DesignActions.Compression(Force.FromKilonewtons(14), "crowd on the jetty, rail load").WithEccentricity(Mm(70), Length.Zero)
            .WithLoadDuration(LoadDurationClass.ShortTerm),
        ResistanceMethods.Ec5ColumnServiceClass3);

    /// <summary>The welded aluminium strut of the gangway frame: a square tube with end fittings welded on (MIG).</summary>
    private static CheckResult GangwayStrut() => Check.EvaluateWithTrace(
        Member.Create(new RectangularHollowSection(Mm(80), Mm(80), Mm(4)), AluminiumAlloys.EnAw6082T6Extrusion, Length.FromMeters(2.3),
            Restraint.PinnedBothAxes, "A2 gangway strut"),
        DesignActions.Compression(Force.FromKilonewtons(95), "gangway crowd load"),
        ResistanceMethods.Eurocode9With(AluminiumWelding.AtEnds(WeldingProcess.Mig)));

    /// <summary>A single aluminium angle brace of the boat-lift frame, bolted through one leg.</summary>
    private static CheckResult AngleBrace() => Check.EvaluateWithTrace(
        Member.Create(AngleSection.Equal(Mm(60), Mm(5)), AluminiumAlloys.EnAw6063T6Extrusion, Length.FromMeters(1.4),
            Restraint.PinnedBothAxes, "A5 boat-lift brace"),
        DesignActions.Compression(Force.FromKilonewtons(22), "boat on the lift"), ResistanceMethods.Eurocode9);

    /// <summary>The post beside the lake door: its base plate on a small pad footing is neither pinned nor fixed
    /// (a rotational spring of 150 kN·m/rad, estimated from the anchor bolts); the head is held by the door lintel.
    /// K about each axis comes from the elastic column's characteristic equation with those springs.</summary>
    private static CheckResult DoorPost()
    {
        var section = new RectangularHollowSection(Mm(100), Mm(100), Mm(5));
        var steel = IsotropicMaterial.GenericStructuralSteel;
        var length = Length.FromMeters(3.4);
        var footing = EndSpring.Rotational(RotationalStiffness.FromKilonewtonMetersPerRadian(150));
        var aboutY = EffectiveLength.FromEndSprings(footing, EndSpring.Pinned, steel, section, BucklingAxis.Y, length);
        var aboutZ = EffectiveLength.FromEndSprings(footing, EndSpring.Pinned, steel, section, BucklingAxis.Z, length);
        var post = Member.Create(section, steel, length, new Restraint(aboutY, aboutZ), "P4 lake-door post");
        return Check.EvaluateWithTrace(post, DesignActions.Compression(Force.FromKilonewtons(210), "roof snow + door track"),
            ResistanceMethods.PerryRobertson(Methods.Classical.PerryImperfection.FromBowRatio(1000)));
    }

    /// <summary>The steel prop under the boat davit: a round tube, fixed in the slab, pinned at the davit arm.</summary>
    private static CheckResult DavitProp() => Check.EvaluateWithTrace(
        Member.Create(new CircularHollowSection(Length.FromMillimeters(76.1), Length.FromMillimeters(4)), IsotropicMaterial.GenericStructuralSteel,
            Length.FromMeters(2.4), Restraint.Same(AxisRestraint.FromEndConditions(EndCondition.Fixed, EndCondition.Pinned, EffectiveLengthBasis.Recommended)),
            "P1 davit prop"),
        DesignActions.Compression(Force.FromKilonewtons(62), "boat hoisted, wind"), ResistanceMethods.Johnson);

    /// <summary>The post that carries the canoe-rack bracket on one face: an eccentric load.</summary>
    private static CheckResult EccentricBracketPost() => Check.EvaluateWithTrace(
        Member.Create(new RectangularHollowSection(Length.FromMillimeters(80), Length.FromMillimeters(80), Length.FromMillimeters(4)),
            IsotropicMaterial.GenericStructuralSteel, Length.FromMeters(2.9), Restraint.PinnedBothAxes, "P2 canoe-rack post"),
        DesignActions.Compression(Force.FromKilonewtons(38), "rack fully loaded").WithEccentricity(Length.FromMillimeters(95), Length.Zero),
        ResistanceMethods.Secant);

    /// <summary>A single angle strut in the roof bracing, checked about its minor principal axis.</summary>
    private static CheckResult RoofStrutAngle() => Check.EvaluateWithTrace(
        Member.Create(AngleSection.Equal(Length.FromMillimeters(45), Length.FromMillimeters(5)), IsotropicMaterial.GenericStructuralSteel,
            Length.FromMeters(1.35), Restraint.PinnedBothAxes, "S1 roof bracing strut"),
        DesignActions.Compression(Force.FromKilonewtons(18), "snow drift"), ResistanceMethods.PerryRobertson(Methods.Classical.PerryImperfection.FromBowRatio(1000)));
}
