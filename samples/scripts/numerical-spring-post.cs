#:project ../../src/CompressionMembers/CompressionMembers.csproj
#:package UnitsNet@5.75.1
// Effective length from the real restraint, checked by an independent finite-element model, and a P-δ analysis.
// Invented demo numbers (not from any source): a steel post on a semi-rigid base plate.
using System;
using System.Globalization;
using CompressionMembers;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Numerical;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using UnitsNet;

var inv = CultureInfo.InvariantCulture;
var steel = IsotropicMaterial.GenericStructuralSteel;
var section = new RectangleSection(Length.FromMillimeters(80), Length.FromMillimeters(120));
var length = Length.FromMillimeters(4000);

// 1. K about y from a base-plate spring of 400 kN·m/rad and a pinned top (braced).
var base_ = EndSpring.Rotational(RotationalStiffness.FromKilonewtonMetersPerRadian(400));
var aboutY = EffectiveLength.FromEndSprings(base_, EndSpring.Pinned, steel.ElasticModulus, section.SecondMomentY, length);
Console.WriteLine(aboutY.BasisText);

// 2. A frame column by the alignment chart: G = 1.5 at the base, 2.0 at the top, sway frame.
var sway = AlignmentChart.Sway(JointRestraintFactor.Of(1.5), JointRestraintFactor.Of(2.0));
Console.WriteLine(sway.BasisText);

// 3. The member, checked by the Euler closed form and by its finite-element twin: the two agree.
var post = Member.Create(section, steel, length, new Restraint(aboutY, AxisRestraint.PinnedPinned.WithBracingAt(Length.FromMillimeters(2000))), "P2 post");
var actions = DesignActions.Compression(Force.FromKilonewtons(150));
var euler = Check.Evaluate(post, actions, ResistanceMethods.Euler);
var fe = Check.Evaluate(post, actions, ResistanceMethods.FiniteElementCritical);
Console.WriteLine(string.Create(inv, $"Euler {euler.DesignResistance.Kilonewtons:0.0} kN, finite elements {fe.DesignResistance.Kilonewtons:0.0} kN, agree: {fe.AgreesWith(euler, 1e-6)}"));

// 4. The first three buckling modes about y as data (positions in m, normalised deflections) for a plot.
var modes = BucklingAnalysis.Solve(BucklingAnalysis.ModelOf(post, BucklingAxis.Y), 3);
foreach (var m in modes.Modes)
    Console.WriteLine(string.Create(inv, $"mode {m.Number}: Ncr = {m.CriticalForce.Kilonewtons:0.0} kN, {m.PositionsM.Count} points"));

// 5. Second-order (P-δ) analysis of the same post, pinned, with a 10 mm eccentricity and a 4 mm bow about z.
var pinned = post.WithRestraint(Restraint.PinnedBothAxes);
var eccentric = actions.WithEccentricity(Length.Zero, Length.FromMillimeters(10)).WithInitialBow(null, Length.FromMillimeters(4));
var pDelta = SecondOrderAnalysis.Analyse(pinned, eccentric, BucklingAxis.Z, steps: 5);
Console.WriteLine(pDelta.ToReport());
Console.WriteLine(string.Create(inv, $"capacity to first yield (P-δ): {Check.Evaluate(pinned, eccentric, ResistanceMethods.SecondOrderElastic).DesignResistance.Kilonewtons:0.0} kN"));
