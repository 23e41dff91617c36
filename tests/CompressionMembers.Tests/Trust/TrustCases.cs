using System;
using System.Collections.Generic;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Numerical;
using CompressionMembers.Reporting;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Tests.Trust;

/// <summary>One check per method family (dimensions and loads invented for the tests), used by the reproducibility and
/// concurrency tests.</summary>
internal static class TrustCases
{
    private static Length Mm(double v) => Length.FromMillimeters(v);

    internal static DesignActions Timber(double kN) => DesignActions.Compression(Force.FromKilonewtons(kN), "trust case").WithLoadDuration(LoadDurationClass.MediumTerm);

    internal static DesignActions Kn(double kN) => DesignActions.Compression(Force.FromKilonewtons(kN), "trust case");

    /// <summary>(name, member, actions, method) for every family.</summary>
    internal static IReadOnlyList<(string Name, Member Member, DesignActions Actions, IResistanceMethod Method)> All { get; } =
    [
        ("Euler", Member.Create(new RectangleSection(Mm(40), Mm(60)), IsotropicMaterial.GenericStructuralSteel, Mm(2400), Restraint.PinnedBothAxes, "rod"), Kn(50), ResistanceMethods.Euler),
        ("Johnson", Member.Create(new CircularHollowSection(Mm(60), Mm(4)), IsotropicMaterial.GenericStructuralSteel, Mm(1200), Restraint.PinnedBothAxes, "tube"), Kn(80), ResistanceMethods.Johnson),
        ("Secant", Member.Create(new ISection(Mm(200), Mm(100), Mm(8.5), Mm(5.6), Mm(12)), IsotropicMaterial.GenericStructuralSteel, Mm(3000), Restraint.PinnedBothAxes, "I strut"),
            Kn(150).WithEccentricity(Mm(20), Mm(5)), ResistanceMethods.Secant),
        ("Perry-Robertson", Member.Create(new AngleSection(Mm(80), Mm(60), Mm(8)), IsotropicMaterial.GenericStructuralSteel, Mm(1800), Restraint.PinnedBothAxes, "angle"), Kn(60), ResistanceMethods.PerryRobertsonDefault),
        ("EC5", Member.Create(new RectangleSection(Mm(115), Mm(180)), TimberGrades.GL24h, Mm(3600), Restraint.PinnedBothAxes, "glulam post"),
            Timber(120).WithEccentricity(Mm(15), Length.Zero), ResistanceMethods.Ec5Column),
        ("EC5 fire", Member.Create(new RectangleSection(Mm(160), Mm(200)), TimberGrades.C24, Mm(3000), Restraint.PinnedBothAxes, "post in fire"), Timber(60), ResistanceMethods.Ec5FireR30),
        ("NDS", Member.Create(TimberSizes.UsNominal(6, 6), NdsGrades.DouglasFirLarchNo2, Length.FromFeet(10), Restraint.PinnedBothAxes, "6x6 post"), Timber(80), ResistanceMethods.NdsColumnAsd),
        ("EC9", Member.Create(new RectangularHollowSection(Mm(100), Mm(80), Mm(4)), AluminiumAlloys.EnAw6082T6Extrusion, Mm(2500), Restraint.PinnedBothAxes, "aluminium strut"), Kn(90), ResistanceMethods.Eurocode9),
        ("buckling constants", Member.Create(new CircularHollowSection(Mm(76), Mm(4)), AluminiumAlloys.EnAw6061T6Extrusion, Mm(2000), Restraint.PinnedBothAxes, "aluminium tube"), Kn(40), ResistanceMethods.AluminiumBucklingConstantsLrfd),
        ("tangent modulus", Member.Create(new CircularHollowSection(Mm(76), Mm(4)), AluminiumAlloys.EnAw6082T6Extrusion, Mm(900), Restraint.PinnedBothAxes, "short tube"), Kn(40), ResistanceMethods.TangentModulusRambergOsgood),
        ("FE", Member.Create(new RectangleSection(Mm(50), Mm(80)), IsotropicMaterial.GenericStructuralSteel, Mm(2500),
            new Restraint(AxisRestraint.FromEndConditions(EndCondition.Fixed, EndCondition.Pinned, EffectiveLengthBasis.Theoretical), AxisRestraint.PinnedPinned), "propped strut"), Kn(100), ResistanceMethods.FiniteElementCritical),
        ("second order", Member.Create(new CircularHollowSection(Mm(88.9), Mm(5)), IsotropicMaterial.GenericStructuralSteel, Mm(3200), Restraint.PinnedBothAxes, "bowed tube"),
            Kn(120).WithEccentricity(Mm(10), Length.Zero), ResistanceMethods.SecondOrderElastic),
    ];

    /// <summary>Every report the library renders for the cases: text, Markdown, and the numerical analyses' own reports.</summary>
    internal static string RenderAll()
    {
        var sb = new System.Text.StringBuilder();
        foreach (var (name, m, a, method) in All)
        {
            var r = Check.EvaluateWithTrace(m, a, method);
            sb.Append("=== ").Append(name).Append('\n').Append(TextReport.Render(r)).Append(MarkdownReport.Render(r))
              .Append(InputFingerprint.CanonicalText(m, a, method)).Append(InputFingerprint.Compute(m, a, method)).Append('\n');
        }
        var bar = All[10].Member;
        sb.Append(BucklingAnalysis.Solve(BucklingAnalysis.ModelOf(bar, BucklingAxis.Y)).ToReport());
        sb.Append(SecondOrderAnalysis.Analyse(All[11].Member, All[11].Actions, BucklingAxis.Y).ToReport());
        return sb.ToString();
    }
}
