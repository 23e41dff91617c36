using System.Linq;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using CompressionMembers.Workflows.Catalogues;
using CompressionMembers.Workflows.Selection;
using CsCheck;
using UnitsNet;

namespace CompressionMembers.Tests.Workflows;

/// <summary>The pruned search against brute force with the timber and aluminium methods, which the selector knows
/// nothing about: it must give the same choices (falling back where a method is not monotone in size).</summary>
public class FamilySelectionTests
{
    private static void Same(SectionCatalogue catalogue, Material material, IResistanceMethod method, LoadDurationClass duration, string seed)
    {
        var sel = new SizeSelector(catalogue, method, SelectionObjective.Mass, candidateCount: 3);
        var placeholder = catalogue.Entries[0].Section;
        Gen.Select(Gen.Double[500, 6000], Gen.Double[1, 300]).Sample((lMm, nKn) =>
        {
            var m = Member.Create(placeholder, material, Length.FromMillimeters(lMm), Restraint.PinnedBothAxes, "m");
            var a = DesignActions.Compression(Force.FromKilonewtons(nKn)).WithLoadDuration(duration);
            var req = new SizingRequest(m, a);
            var p = sel.Select(req);
            var b = sel.SelectExhaustively(req);
            Assert.True(b.Candidates.Select(c => c.Entry.Designation).SequenceEqual(p.Candidates.Select(c => c.Entry.Designation)),
                $"{method.Identity.Name}: L = {lMm} mm, N = {nKn} kN: brute {string.Join(", ", b.Candidates.Select(c => c.Entry.Designation))}; pruned {string.Join(", ", p.Candidates.Select(c => c.Entry.Designation))} (fell back: {p.FellBackToExhaustive})");
        }, iter: 40);
    }

    [Fact]
    public void Ec5_Glulam_PrunedEqualsExhaustive() =>
        Same(SectionCatalogues.Glulam, TimberGrades.GL28h, ResistanceMethods.Ec5Column, LoadDurationClass.MediumTerm, "0N0XIzNsQ0O2");

    [Fact]
    public void Ec5_MetricSawn_PrunedEqualsExhaustive() =>
        Same(SectionCatalogues.MetricSawnTimber, TimberGrades.C24, ResistanceMethods.Ec5Column, LoadDurationClass.ShortTerm, "0N0XIzNsQ0O2");

    [Fact]
    public void Nds_UsDressed_PrunedEqualsExhaustive() =>
        Same(SectionCatalogues.UsDressedLumber, NdsGrades.DouglasFirLarchNo2, ResistanceMethods.NdsColumnAsd, LoadDurationClass.MediumTerm, "0N0XIzNsQ0O2");

    [Fact]
    public void Ec9_AluminiumShapes_PrunedEqualsExhaustive() =>
        Same(SectionCatalogues.AluminiumGenericShapes, AluminiumAlloys.EnAw6082T6Extrusion, ResistanceMethods.Eurocode9, LoadDurationClass.Unspecified, "0N0XIzNsQ0O2");
}
