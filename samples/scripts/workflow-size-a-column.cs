#:project ../../src/CompressionMembers/CompressionMembers.csproj
#:package UnitsNet@5.75.1
// Size a column: the lightest generic aluminium-shape section (by mass per metre) that passes the Perry–Robertson
// check for both action cases of a boathouse column, with the ranked runners-up and their utilisations.
// The member, loads and material choice are our own invention for the demo.
using System;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using CompressionMembers.Workflows.Catalogues;
using CompressionMembers.Workflows.Selection;
using System.Globalization;
using UnitsNet;

var inv = CultureInfo.InvariantCulture;
var column = Member.Create(new RectangleSection(Length.FromMillimeters(1), Length.FromMillimeters(1)), // placeholder: replaced by each candidate
    IsotropicMaterial.GenericStructuralSteel, Length.FromMeters(3.6), Restraint.PinnedBothAxes, "boathouse hall column C3");
var cases = new[]
{
    DesignActions.Compression(Force.FromKilonewtons(140), "dead + live"),
    DesignActions.Compression(Force.FromKilonewtons(175), "dead + snow"),
};
var selector = new SizeSelector(SectionCatalogues.AluminiumGenericShapes, ResistanceMethods.PerryRobertsonDefault, SelectionObjective.Mass, candidateCount: 5);
var choice = selector.Select(new SizingRequest(column, cases));
var brute = selector.SelectExhaustively(new SizingRequest(column, cases));

Console.WriteLine($"Sizing {column.Name}: L = 3.6 m pinned, {cases.Length} action cases, {SectionCatalogues.AluminiumGenericShapes.Count} candidate sections");
Console.WriteLine($"method: {selector.Method.Identity}");
Console.WriteLine();
Console.WriteLine("rank  section                     mass kg/m   utilisation  governing case");
int rank = 1;
foreach (var c in choice.Candidates)
    Console.WriteLine(string.Format(inv, "{0,4}  {1,-26} {2,10:0.00}   {3,11:0.000}  {4}", rank++, c.Entry.Designation, c.Objective, c.Utilisation, c.GoverningCase));
Console.WriteLine();
Console.WriteLine($"chosen: {choice.Chosen?.Entry.Designation ?? "none"}");
Console.WriteLine($"method evaluations: pruned {choice.Evaluations}, brute force {brute.Evaluations}; same choice: {brute.Chosen?.Entry.Designation == choice.Chosen?.Entry.Designation}");
if (brute.Chosen?.Entry.Designation != choice.Chosen?.Entry.Designation) return 1;
Console.WriteLine();
Console.WriteLine(CompressionMembers.LibraryInfo.Caution);
return 0;
