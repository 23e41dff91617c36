#:project ../../src/CompressionMembers/CompressionMembers.csproj
#:project ../../src/CompressionMembers.Plotting/CompressionMembers.Plotting.csproj
#:package UnitsNet@5.75.1
// Draw a curve: the column curve (stress against slenderness, Euler and Johnson, the method's curve and the member's
// points) of an invented jetty post, its buckling modes, and an HTML report with the plot embedded. Files go to the
// temporary folder; open the .html in a browser.
using System;
using System.IO;
using CompressionMembers;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Numerical;
using CompressionMembers.Plotting;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using UnitsNet;

var post = Member.Create(new CircularHollowSection(Length.FromMillimeters(76), Length.FromMillimeters(3)), IsotropicMaterial.GenericStructuralSteel,
    Length.FromMeters(3.2), Restraint.PinnedBothAxes, "jetty post P1");
var result = Check.EvaluateWithTrace(post, DesignActions.Compression(Force.FromKilonewtons(85), "dead + live"), ResistanceMethods.Johnson);

string outDir = Path.Combine(Path.GetTempPath(), "compression-members-demo");
Directory.CreateDirectory(outDir);
var curve = ColumnCurvePlot.Create(result);
curve.SaveSvg(Path.Combine(outDir, "jetty-post-curve.svg"));
curve.SavePng(Path.Combine(outDir, "jetty-post-curve.png"));
var modes = BucklingAnalysis.Solve(BucklingAnalysis.ModelOf(post, BucklingAxis.Y), 3);
BucklingModePlot.Create(modes, post.Name).SavePng(Path.Combine(outDir, "jetty-post-modes.png"));
string html = Path.Combine(outDir, "jetty-post-report.html");
File.WriteAllText(html, HtmlReport.Render(result));

Console.WriteLine($"{post.Name}: utilisation {result.Utilisation:0.000} ({(result.Passed ? "passes" : "fails")}), λ_y = {result.AboutY.Slenderness:0.0}");
Console.WriteLine($"first buckling load from the element model: {modes.Lowest.CriticalForce.Kilonewtons:0.0} kN");
Console.WriteLine($"column curve: {Path.Combine(outDir, "jetty-post-curve.svg")} (+ .png)");
Console.WriteLine($"HTML report: {html}");
Console.WriteLine(LibraryInfo.Caution);
return 0;
