// The boathouse demo: the posts and struts of a small lakeside boathouse, checked one by one.
// Every number here is a scenario of our own invention, not a published example.
using System;
using System.IO;
using CompressionMembers;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Methods;
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
            ("01-davit-prop.txt", DavitProp()),
            ("02-eccentric-bracket-post.txt", EccentricBracketPost()),
            ("03-roof-strut-angle.txt", RoofStrutAngle()),
        };

        Console.WriteLine("Summary");
        Console.WriteLine("-------");
        foreach (var (file, r) in reports)
            Console.WriteLine($"  {r.Member.Name,-34} {r.Method.Identity.Name,-48} u = {NumberFormat.Number(r.Utilisation),7}  {(r.Passed ? "passes" : "FAILS")}");
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
