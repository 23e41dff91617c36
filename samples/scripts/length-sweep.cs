#:project ../../src/CompressionMembers/CompressionMembers.csproj
#:package UnitsNet@5.75.1
// Composing checks in a script: capacity of one section against length by three methods, and the
// longest length at which a given load still passes (found by bisection on the library's checks).
// The section and load are our own invention (a ladder-frame upright).
using System;
using CompressionMembers;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Reporting;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using UnitsNet;

var upright = Member.Create(new RectangularHollowSection(Length.FromMillimeters(50), Length.FromMillimeters(30), Length.FromMillimeters(2.5)),
    IsotropicMaterial.GenericStructuralSteel, Length.FromMeters(1), Restraint.PinnedBothAxes, "ladder-frame upright");
var load = DesignActions.Compression(Force.FromKilonewtons(45));
IResistanceMethod[] methods = [ResistanceMethods.Euler, ResistanceMethods.Johnson, ResistanceMethods.PerryRobertson(PerryImperfection.FromBowRatio(1000))];

Console.WriteLine($"Capacity of {upright.Section.Designation}, pinned both ends (kN)");
Console.WriteLine($"{"L (m)",6} {"Euler",10} {"Johnson",10} {"Perry L/1000",13}");
for (double l = 0.5; l <= 4.001; l += 0.5)
{
    var m = upright.WithLength(Length.FromMeters(l));
    Console.Write($"{l,6:0.0}");
    foreach (var method in methods)
        Console.Write($" {Check.Evaluate(m, load, method).DesignResistanceN / 1e3,10:0.00}");
    Console.WriteLine();
}

// Longest length that still carries 45 kN by the Perry–Robertson check: bisection on utilisation = 1.
double lo = 0.1, hi = 6.0;
for (int i = 0; i < 60; i++)
{
    double mid = 0.5 * (lo + hi);
    if (Check.Evaluate(upright.WithLength(Length.FromMeters(mid)), load, methods[2]).Passed) lo = mid; else hi = mid;
}
var atLimit = Check.Evaluate(upright.WithLength(Length.FromMeters(lo)), load, methods[2]);
Console.WriteLine();
Console.WriteLine($"Longest length carrying {NumberFormat.Quantity(load.AxialCompression.Newtons, StepUnit.Force)}: {lo:0.000} m " +
    $"(utilisation {NumberFormat.Number(atLimit.Utilisation)}, {Words.Mode(atLimit.GoverningMode, atLimit.GoverningAxis)})");
return atLimit.Passed ? 0 : 1;
