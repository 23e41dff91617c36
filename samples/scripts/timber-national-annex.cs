#:project ../../src/CompressionMembers/CompressionMembers.csproj
#:package UnitsNet@5.75.1
// A glulam column checked to EN 1995-1-1 twice: with the recommended γM of Table 2.3 (1.25 for glulam) and with a
// national annex's value (here an invented γM = 1.30 and a fixed kmod, to show the override). Demo numbers only.
using System;
using System.Globalization;
using CompressionMembers;
using CompressionMembers.Actions;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Timber;
using CompressionMembers.Reporting;
using CompressionMembers.Restraints;
using UnitsNet;

var column = Member.Create(
    TimberSizes.Glulam(Length.FromMillimeters(140), laminations: 6),           // 140 × 270 mm
    TimberGrades.GL28h,
    Length.FromMeters(3.6),
    Restraint.PinnedBothAxes,
    "C1 glulam column");

var actions = DesignActions.Compression(Force.FromKilonewtons(180))
    .WithEccentricity(Length.FromMillimeters(30), Length.Zero)
    .WithLoadDuration(LoadDurationClass.MediumTerm);

var recommended = ResistanceMethods.Ec5ColumnServiceClass2;                            // γM from Table 2.3
var annex = ResistanceMethods.Ec5ColumnWith(ServiceClass.Class2, materialFactor: 1.30); // national annex γM
var annexKmod = ResistanceMethods.Ec5ColumnWith(ServiceClass.Class2, materialFactor: 1.30, modificationFactor: 0.75);

foreach (var (label, method) in new[] { ("recommended γM", (IResistanceMethod)recommended), ("annex γM = 1.30", annex), ("annex γM, kmod = 0.75", annexKmod) })
{
    var r = Check.Evaluate(column, actions, method);
    Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
        $"{label,-24} Nc,Rd = {r.DesignResistance.Kilonewtons,7:0.0} kN   utilisation = {r.Utilisation:0.000}   {r.GoverningCheck}"));
}

Console.WriteLine();
Console.WriteLine(TextReport.Render(Check.EvaluateWithTrace(column, actions, annex)));
