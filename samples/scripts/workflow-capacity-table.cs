#:project ../../src/CompressionMembers/CompressionMembers.csproj
#:package UnitsNet@5.75.1
// Print a capacity table: design resistance against effective length for the 3 mm square tubes of the generic
// aluminium-shape catalogue in EN AW-6082 T6, checked to EN 1999-1-1 (recommended γM1), as Markdown and CSV.
// A demo of the workflow; the catalogue's dimensions are our own.
using System;
using System.Linq;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Methods;
using CompressionMembers.Workflows.Catalogues;
using CompressionMembers.Workflows.Tables;
using UnitsNet;

var sections = SectionCatalogues.AluminiumGenericShapes.OnlyFamily("SHS").Entries.Where(e => e.Designation.EndsWith("x3", StringComparison.Ordinal));
var lengths = new[] { 1.0, 1.5, 2.0, 2.5, 3.0, 4.0, 5.0 }.Select(m => Length.FromMeters(m));
var table = CapacityTable.Compute(sections, AluminiumAlloys.EnAw6082T6Extrusion, ResistanceMethods.Eurocode9, lengths);
Console.WriteLine(table.ToMarkdown());
Console.WriteLine("CSV:");
Console.Write(table.ToCsv());
return table.Sections.Count > 0 ? 0 : 1;
