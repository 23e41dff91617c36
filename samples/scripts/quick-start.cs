#:project ../../src/CompressionMembers/CompressionMembers.csproj
#:package UnitsNet@5.75.1
// The README's quick start, verbatim (a test holds the two equal).
using System;
using CompressionMembers;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Reporting;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using UnitsNet;

var prop = Member.Create(
    new CircularHollowSection(Length.FromMillimeters(76.1), Length.FromMillimeters(4)),
    IsotropicMaterial.GenericStructuralSteel,
    Length.FromMeters(2.4),
    Restraint.Same(AxisRestraint.FromEndConditions(EndCondition.Fixed, EndCondition.Pinned, EffectiveLengthBasis.Recommended)),
    "P1 davit prop");

var result = Check.EvaluateWithTrace(prop, DesignActions.Compression(Force.FromKilonewtons(62)), ResistanceMethods.Johnson);

Console.WriteLine($"{result.DesignResistance.Kilonewtons:0.0} kN, utilisation {result.Utilisation:0.000}, passes: {result.Passed}");
Console.WriteLine(TextReport.Render(result));   // or MarkdownReport.Render(result); add ReportUnits.UsCustomary for in, lb, psi
