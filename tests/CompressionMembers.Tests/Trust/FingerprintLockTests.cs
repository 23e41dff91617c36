using System.Collections.Generic;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Reporting;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using UnitsNet;
using Xunit.Abstractions;

namespace CompressionMembers.Tests.Trust;

/// <summary>
/// Locked input fingerprints, one per material family and per section kind: an unchanged input must keep its
/// fingerprint in every later release (docs/reproducibility.md). A change here is a change of the canonical form and
/// must come with a new prefix ("c2-") and a CHANGELOG entry, never with a silently edited value.
/// </summary>
public class FingerprintLockTests(ITestOutputHelper output)
{
    private static Length Mm(double v) => Length.FromMillimeters(v);

    private static readonly DesignActions Actions = DesignActions.Compression(Force.FromKilonewtons(25), "locked case").WithLoadDuration(LoadDurationClass.MediumTerm);

    private static Member Pinned(Section s, Material m) => Member.Create(s, m, Mm(2500), Restraint.PinnedBothAxes, "locked member");

    public static IEnumerable<object[]> Locked()
    {
        var steel = IsotropicMaterial.GenericStructuralSteel;
        // Material families, each on a 100 × 150 rectangle (the aluminium on a tube), with a method of its family.
        yield return ["isotropic", Pinned(new RectangleSection(Mm(100), Mm(150)), steel), ResistanceMethods.Euler, "c1-08f29b665ed05203"];
        // C24 and GL28h: relocked when their material source text changed to say which values were checked against
        // published copies (the source enters the canonical form; the numbers did not change).
        yield return ["timber EN 338", Pinned(new RectangleSection(Mm(100), Mm(150)), TimberGrades.C24), ResistanceMethods.Ec5Column, "c1-be241615dd32dcf9"];
        yield return ["timber glulam", Pinned(new RectangleSection(Mm(100), Mm(150)), TimberGrades.GL28h), ResistanceMethods.Ec5FireR30, "c1-019ad511d88c0c62"];
        yield return ["timber NDS", Pinned(new RectangleSection(Mm(100), Mm(150)), NdsGrades.DouglasFirLarchNo2), ResistanceMethods.NdsColumnAsd, "c1-c3f7d6605d0ee1f2"];
        yield return ["aluminium", Pinned(new RectangularHollowSection(Mm(100), Mm(100), Mm(4)), AluminiumAlloys.EnAw6082T6Extrusion), ResistanceMethods.Eurocode9, "c1-ba2fee92fde5bc36"];
        // 6061-T6: relocked when its thickness band was corrected to t ≤ 20 mm (EN 1999-1-1 Table 3.2b) and its source text
        // changed; f0, fu and the HAZ factors did not change.
        yield return ["aluminium buckling constants", Pinned(new RectangularHollowSection(Mm(100), Mm(100), Mm(4)), AluminiumAlloys.EnAw6061T6Extrusion), ResistanceMethods.AluminiumBucklingConstantsAsd, "c1-a39933f44198c339"];
        // Method settings whose report wording changed after 0.1.0 (Perry–Robertson's imperfection under its own symbol, the
        // tangent modulus's n shown as "—" when each material gives it, EN 1999-1-1's weld area as Ahaz): locked at the values computed by the build
        // before the rewording (whose canonical form was 0.1.0's), so that earlier reports keep their fingerprints.
        var tube = new RectangularHollowSection(Mm(100), Mm(100), Mm(4));
        var alu = AluminiumAlloys.EnAw6082T6Extrusion;
        yield return ["Perry–Robertson, Robertson default", Pinned(tube, steel), ResistanceMethods.PerryRobertsonDefault, "c1-64b42fc3e0e27b6a"];
        yield return ["Perry–Robertson, Robertson a = 0.005", Pinned(tube, steel), ResistanceMethods.PerryRobertson(PerryImperfection.Robertson(0.005)), "c1-1014f11a2a4d6689"];
        yield return ["Perry–Robertson, η = 0.2", Pinned(tube, steel), ResistanceMethods.PerryRobertson(PerryImperfection.Constant(0.2)), "c1-c02238c64f9a70d5"];
        yield return ["Perry–Robertson, bow L/1000", Pinned(tube, steel), ResistanceMethods.PerryRobertson(PerryImperfection.FromBowRatio(1000)), "c1-f2cce3948d4f29c0"];
        yield return ["Perry–Robertson, bow from the actions", Pinned(tube, steel), ResistanceMethods.PerryRobertson(PerryImperfection.FromActions), "c1-42c2d27701bf1eae"];
        yield return ["tangent modulus, n from the material", Pinned(tube, alu), ResistanceMethods.TangentModulusRambergOsgood, "c1-ccc0d900143a12e0"];
        yield return ["tangent modulus, n = 20", Pinned(tube, alu), CompressionMembers.Methods.Aluminium.TangentModulusColumn.WithExponent(20), "c1-8f2b6c926ae7f5e9"];
        // EN 1999-1-1 with welds: the heat-affected area shown as Ahaz after 0.1.0 (0.1.0 printed "weld : 0 mm²").
        yield return ["EN 1999-1-1, welds at the ends", Pinned(tube, alu), ResistanceMethods.Eurocode9With(CompressionMembers.Methods.Aluminium.AluminiumWelding.AtEnds(WeldingProcess.Mig)), "c1-b6e75df852cf8158"];
        yield return ["EN 1999-1-1, longitudinal welds", Pinned(tube, alu), ResistanceMethods.Eurocode9With(CompressionMembers.Methods.Aluminium.AluminiumWelding.Longitudinal(WeldingProcess.Tig, Area.FromSquareMillimeters(300))), "c1-11bfc5ba828b8c74"];
        // Section kinds, all in the same steel under Euler.
        yield return ["rectangle", Pinned(new RectangleSection(Mm(60), Mm(90)), steel), ResistanceMethods.Euler, "c1-577d75ff798c8ace"];
        yield return ["circle", Pinned(new CircleSection(Mm(60)), steel), ResistanceMethods.Euler, "c1-ed8479cbf0f34d45"];
        yield return ["round tube", Pinned(new CircularHollowSection(Mm(88.9), Mm(4)), steel), ResistanceMethods.Euler, "c1-42b562c6a311a18e"];
        yield return ["box tube", Pinned(new RectangularHollowSection(Mm(120), Mm(80), Mm(5)), steel), ResistanceMethods.Euler, "c1-1b0fb7a14e11d7f2"];
        yield return ["I", Pinned(new ISection(Mm(200), Mm(100), Mm(8.5), Mm(5.6), Mm(12)), steel), ResistanceMethods.Euler, "c1-f6b92ebb337ce503"];
        yield return ["channel", Pinned(new ChannelSection(Mm(150), Mm(75), Mm(10), Mm(6)), steel), ResistanceMethods.Euler, "c1-a5095755da844e27"];
        yield return ["angle", Pinned(new AngleSection(Mm(80), Mm(60), Mm(8)), steel), ResistanceMethods.Euler, "c1-976592c4a6b25b8f"];
        yield return ["tee", Pinned(new TeeSection(Mm(100), Mm(100), Mm(10), Mm(8)), steel), ResistanceMethods.Euler, "c1-5b535c6395ae3a22"];
        yield return ["polygon", Pinned(new PolygonSection([new SectionPoint(Mm(0), Mm(0)), new SectionPoint(Mm(80), Mm(0)), new SectionPoint(Mm(0), Mm(60))]), steel), ResistanceMethods.Euler, "c1-d6e632722c283a0f"];
        yield return ["by properties", Pinned(new SectionByProperties("user section", Area.FromSquareMillimeters(2000), AreaMomentOfInertia.FromMillimetersToTheFourth(4e6),
            AreaMomentOfInertia.FromMillimetersToTheFourth(1.5e6), Mm(75), Mm(40)), steel), ResistanceMethods.Euler, "c1-de03d62bd8d684b7"];
    }

    [Theory]
    [MemberData(nameof(Locked))]
    public void Fingerprint_OfAnUnchangedInput_IsLocked(string family, Member member, IResistanceMethod method, string expected)
    {
        string actual = InputFingerprint.Compute(member, Actions, method);
        output.WriteLine($"{family}: {actual}");
        output.WriteLine(InputFingerprint.CanonicalText(member, Actions, method));
        Assert.Equal(expected, actual);
    }
    // The canonical lines of a material, section, restraint and method identity are formed on first use and kept with
    // the object: sixteen threads fingerprinting the same fresh member at once (racing to form its section's lines) must
    // all get the locked value, and so must a second pass that reads the kept lines.
    [Theory]
    [MemberData(nameof(Locked))]
    public void Fingerprint_FirstUseOnManyThreadsAndKeptLines_GiveTheLockedValue(string family, Member member, IResistanceMethod method, string expected)
    {
        var fresh = Member.Create(member.Section, member.Material, member.Length, member.Restraint, member.Name);
        var results = new string[16];
        System.Threading.Tasks.Parallel.For(0, results.Length, new System.Threading.Tasks.ParallelOptions { MaxDegreeOfParallelism = 16 },
            k => results[k] = InputFingerprint.Compute(fresh, Actions, method));
        Assert.All(results, r => Assert.Equal(expected, r));
        Assert.Equal(expected, InputFingerprint.Compute(fresh, Actions, method));
        output.WriteLine($"{family}: {expected} on 16 threads and again");
    }
}
