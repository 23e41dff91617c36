using System;
using System.Collections.Generic;
using System.Globalization;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Materials.Aluminium;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Aluminium;
using CompressionMembers.Methods.Numerical;
using CompressionMembers.Methods.Timber;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using UnitsNet;
using Xunit.Abstractions;

namespace CompressionMembers.Tests.Robustness;

/// <summary>
/// Feeds NaN, ±infinity, zero, negative, subnormal, tiny and huge values to every public constructor and factory of
/// the timber and aluminium materials, the method options and the restraints. Not-a-number and infinities must be refused;
/// any other value must either build or be refused with an ArgumentException-family error whose ParamName is the parameter
/// given (or a parameter it is checked against). Whatever builds must give a finite check or a typed refusal.
/// </summary>
public class PublicApiBadInputTests(ITestOutputHelper output)
{
    private static readonly double[] Values =
        [double.NaN, double.PositiveInfinity, double.NegativeInfinity, 0, -0.0, -1, double.Epsilon, 1e-310, 1e-30, 1e30, 1e300, double.MaxValue];

    private static readonly int[] Ints = [0, -1, int.MinValue, int.MaxValue, 1_000_000];

    /// <summary>A case: a name, the parameter names acceptable in the error (the first is the one varied), whether +∞ is a
    /// meaningful input (an ideal rigid spring), and the factory.</summary>
    private sealed record Case(string Name, string[] Params, bool InfinityMeans, Func<double, object?> Make);

    private sealed record IntCase(string Name, string Param, Func<int, object?> Make);

    // A value the parameter's own check accepts may still make the load reach the Euler load: then the error names
    // "load" (secant formula), which is the refusal the user can act on.
    private static Pressure Pa(double v) => Pressure.FromPascals(v);
    private static Density Kg(double v) => Density.FromKilogramsPerCubicMeter(v);
    private static Length M(double v) => Length.FromMeters(v);
    private static Length Mm(double v) => Length.FromMillimeters(v);

    private static TimberMaterial Timber(double fc = 21e6, double fm = 24e6, double ft = 14.5e6, double fv = 4e6, double e = 11e9,
        double e05 = 7.4e9, double g = 0.69e9, double rk = 350, double rm = 420) =>
        TimberMaterial.Create("sweep timber", TimberProduct.SolidSoftwood, Pa(fc), Pa(fm), Pa(ft), Pa(fv), Pa(e), Pa(e05), Pa(g), Kg(rk), Kg(rm), "test values");

    private static TimberMaterial Lvl(double s) =>
        TimberMaterial.Lvl("sweep LVL", Pa(35e6), Pa(44e6), Pa(36e6), Pa(4.2e6), Pa(13.8e9), Pa(11.6e9), Pa(0.6e9), Kg(480), Kg(510), s, "test values");

    private static NdsTimberMaterial Nds(double fc = 9.3e6, double fb = 6.2e6, double e = 11e9, double emin = 4e9, double sg = 500) =>
        new("sweep NDS", NdsProduct.SawnLumber, Pa(fc), Pa(fb), Pa(e), Pa(emin), Kg(sg), "test values");

    private static AluminiumAlloy Alloy(double f0 = 250e6, double fu = 290e6, double tmin = 0, double tmax = 5e-3, double rho0 = 0.5,
        double rhou = 0.64, double rho0t = 0.6, double rhout = 0.7, double? e = null, double? g = null) =>
        AluminiumAlloy.Create("sweep alloy", "EN AW-6082", "T6", AluminiumProductForm.Extrusion, Pa(f0), Pa(fu), M(tmin), M(tmax),
            BucklingClass.A, rho0, rhou, rho0t, rhout, "test values", e is null ? null : Pa(e.Value), g is null ? null : Pa(g.Value));

    private static readonly EndSpring Pin = EndSpring.FromEndCondition(EndCondition.Pinned);

    private static IEnumerable<Case> Cases()
    {
        // Materials/Timber
        yield return new("timber fc0k", ["fc0k"], false, v => Timber(fc: v));
        yield return new("timber fmk", ["fmk"], false, v => Timber(fm: v));
        yield return new("timber ft0k", ["ft0k"], false, v => Timber(ft: v));
        yield return new("timber fvk", ["fvk"], false, v => Timber(fv: v));
        yield return new("timber E0,mean", ["e0mean", "e005"], false, v => Timber(e: v));
        yield return new("timber E0,05", ["e005", "e0mean"], false, v => Timber(e05: v));
        yield return new("timber Gmean", ["gmean"], false, v => Timber(g: v));
        yield return new("timber rho k", ["rhok", "rhomean"], false, v => Timber(rk: v));
        yield return new("timber rho mean", ["rhomean", "rhok"], false, v => Timber(rm: v));
        yield return new("LVL size exponent", ["sizeEffectExponent"], false, v => Lvl(v));
        yield return new("NDS Fc", ["fc"], false, v => Nds(fc: v));
        yield return new("NDS Fb", ["fb"], false, v => Nds(fb: v));
        yield return new("NDS E", ["e", "eMin"], false, v => Nds(e: v));
        yield return new("NDS Emin", ["eMin", "e"], false, v => Nds(emin: v));
        yield return new("NDS density", ["density"], false, v => Nds(sg: v));
        yield return new("metric size thickness", ["thicknessMm", "width", "dimensions"], false, v => TimberSizes.Metric(v, 100));
        yield return new("metric size width", ["widthMm", "depth", "dimensions"], false, v => TimberSizes.Metric(45, v));
        yield return new("glulam width", ["width", "dimensions"], false, v => TimberSizes.Glulam(M(v), 10));
        yield return new("glulam lamination", ["laminationThickness", "dimensions"], false, v => TimberSizes.Glulam(Mm(140), 10, M(v)));
        // Materials/Aluminium
        yield return new("alloy f0", ["proofStrength", "ultimateStrength"], false, v => Alloy(f0: v));
        yield return new("alloy fu", ["ultimateStrength", "proofStrength"], false, v => Alloy(fu: v));
        yield return new("alloy t min", ["minimumThickness", "maximumThickness"], false, v => Alloy(tmin: v));
        yield return new("alloy t max", ["maximumThickness", "minimumThickness"], false, v => Alloy(tmax: v));
        yield return new("alloy rho o,haz MIG", ["hazProofFactorMig"], false, v => Alloy(rho0: v));
        yield return new("alloy rho u,haz MIG", ["hazUltimateFactorMig"], false, v => Alloy(rhou: v));
        yield return new("alloy rho o,haz TIG", ["hazProofFactorTig"], false, v => Alloy(rho0t: v));
        yield return new("alloy rho u,haz TIG", ["hazUltimateFactorTig"], false, v => Alloy(rhout: v));
        yield return new("alloy E", ["elasticModulus", "shearModulus"], false, v => Alloy(e: v));
        yield return new("alloy G", ["shearModulus", "elasticModulus"], false, v => Alloy(g: v));
        // Methods: timber options
        yield return new("EC5 gamma M", ["materialFactor"], false, v => new Ec5ColumnStability(materialFactor: v));
        yield return new("EC5 kmod", ["modificationFactor"], false, v => new Ec5ColumnStability(modificationFactor: v));
        yield return new("EC5 fire duration", ["requiredDuration"], false, v => new Ec5FireReducedSection(Duration.FromSeconds(v)));
        yield return new("EC5 fire gamma M,fi", ["fireMaterialFactor"], false, v => new Ec5FireReducedSection(Duration.FromMinutes(30), fireMaterialFactor: v));
        yield return new("EC5 fire beta n", ["notionalCharringRate"], false, v => new Ec5FireReducedSection(Duration.FromMinutes(30), notionalCharringRate: Speed.FromMetersPerSecond(v)));
        yield return new("EC5 fire kfi", ["kfi"], false, v => new Ec5FireReducedSection(Duration.FromMinutes(30), kfi: v));
        yield return new("NDS CD", ["loadDurationFactor"], false, v => new NdsColumnStability(loadDurationFactor: v));
        yield return new("NDS lambda", ["timeEffectFactor"], false, v => new NdsColumnStability(NdsDesignFormat.Lrfd, timeEffectFactor: v));
        yield return new("NDS CM", ["fc"], false, v => NdsAdjustments.None.WithWetService(v, 1, 1));
        yield return new("NDS Ct", ["eMin"], false, v => NdsAdjustments.None.WithTemperature(1, 1, v));
        yield return new("NDS CF", ["fb"], false, v => NdsAdjustments.None.WithSize(1, v));
        yield return new("NDS Ci", ["fc"], false, v => NdsAdjustments.None.WithIncising(fc: v));
        yield return new("NDS Cr", ["repetitive"], false, v => NdsAdjustments.None.WithBendingFactors(1, v));
        // Methods: aluminium options
        yield return new("EC9 gamma M1", ["partialFactorM1"], false, v => new Eurocode9Compression(partialFactorM1: v));
        yield return new("EC9 gamma M2", ["partialFactorM2"], false, v => new Eurocode9Compression(partialFactorM2: v));
        yield return new("buckling constants phi", ["resistanceFactor"], false, v => new BucklingConstantMethod(resistanceFactor: v));
        yield return new("buckling constants Omega", ["safetyFactor"], false, v => new BucklingConstantMethod(DesignBasis.Asd, safetyFactor: v));
        yield return new("tangent modulus n", ["exponent"], false, v => TangentModulusColumn.WithExponent(v));
        yield return new("tangent modulus f0", ["proofStrength", "otherProofStress"], false, v => TangentModulusColumn.FromProofStresses(Pa(v), Pa(230e6), 0.001));
        yield return new("tangent modulus other stress", ["otherProofStress", "proofStrength"], false, v => TangentModulusColumn.FromProofStresses(Pa(250e6), Pa(v), 0.001));
        yield return new("tangent modulus other strain", ["otherPlasticStrain"], false, v => TangentModulusColumn.FromProofStresses(Pa(250e6), Pa(230e6), v));
        yield return new("HAZ area", ["heatAffectedArea"], false, v => AluminiumWelding.Longitudinal(WeldingProcess.Mig, Area.FromSquareMeters(v)));
        yield return new("HAZ seam plate", ["plateThickness"], false, v => AluminiumWelding.LongitudinalSeams(WeldingProcess.Mig, 2, M(v)));
        yield return new("HAZ extent thickness", ["thickness"], false, v => AluminiumWelding.HeatAffectedExtent(WeldingProcess.Mig, M(v)));
        yield return new("EC9 part width", ["width"], false, v => Eurocode9Classification.PartSlenderness(M(v), Mm(5)));
        yield return new("EC9 part thickness", ["thickness"], false, v => Eurocode9Classification.PartSlenderness(Mm(100), M(v)));
        yield return new("EC9 stress ratio", ["stressRatio"], false, v => Eurocode9Classification.PartSlenderness(Mm(100), Mm(5), v));
        yield return new("EC9 tube diameter", ["outsideDiameter", "wallThickness"], false, v => Eurocode9Classification.RoundTubeSlenderness(M(v), Mm(3)));
        yield return new("EC9 tube wall", ["wallThickness", "outsideDiameter"], false, v => Eurocode9Classification.RoundTubeSlenderness(Mm(100), M(v)));
        yield return new("EC9 rho c slenderness", ["slenderness"], false, v => Eurocode9Classification.LocalBucklingFactor(v, Pa(250e6), BucklingClass.A, false, PartKind.Internal));
        yield return new("EC9 rho c f0", ["proofStrength"], false, v => Eurocode9Classification.LocalBucklingFactor(20, Pa(v), BucklingClass.A, false, PartKind.Internal));
        // Methods: classical options
        yield return new("Perry eta", ["eta"], false, v => CompressionMembers.Methods.Classical.PerryImperfection.Constant(v));
        yield return new("Perry bow ratio", ["ratio"], false, v => CompressionMembers.Methods.Classical.PerryImperfection.FromBowRatio(v));
        yield return new("Perry Robertson a", ["a"], false, v => CompressionMembers.Methods.Classical.PerryImperfection.Robertson(v));
        yield return new("secant load", ["load"], false, v => CompressionMembers.Methods.Classical.SecantFormula.MaximumStress(Force.FromNewtons(v), Area.FromSquareMillimeters(1000), Mm(5), Mm(50), Mm(30), M(2), Pa(200e9)));
        yield return new("secant area", ["area", "load"], false, v => CompressionMembers.Methods.Classical.SecantFormula.MaximumStress(Force.FromKilonewtons(10), Area.FromSquareMeters(v), Mm(5), Mm(50), Mm(30), M(2), Pa(200e9)));
        yield return new("secant eccentricity", ["eccentricity"], false, v => CompressionMembers.Methods.Classical.SecantFormula.MaximumStress(Force.FromKilonewtons(10), Area.FromSquareMillimeters(1000), M(v), Mm(50), Mm(30), M(2), Pa(200e9)));
        yield return new("secant fibre", ["extremeFibre"], false, v => CompressionMembers.Methods.Classical.SecantFormula.MaximumStress(Force.FromKilonewtons(10), Area.FromSquareMillimeters(1000), Mm(5), M(v), Mm(30), M(2), Pa(200e9)));
        yield return new("secant radius", ["radiusOfGyration", "load"], false, v => CompressionMembers.Methods.Classical.SecantFormula.MaximumStress(Force.FromKilonewtons(10), Area.FromSquareMillimeters(1000), Mm(5), Mm(50), M(v), M(2), Pa(200e9)));
        yield return new("secant length", ["effectiveLength", "load"], false, v => CompressionMembers.Methods.Classical.SecantFormula.MaximumStress(Force.FromKilonewtons(10), Area.FromSquareMillimeters(1000), Mm(5), Mm(50), Mm(30), M(v), Pa(200e9)));
        yield return new("secant E", ["elasticModulus", "load"], false, v => CompressionMembers.Methods.Classical.SecantFormula.MaximumStress(Force.FromKilonewtons(10), Area.FromSquareMillimeters(1000), Mm(5), Mm(50), Mm(30), M(2), Pa(v)));
        yield return new("secant stress limit", ["stressLimit"], false, v => CompressionMembers.Methods.Classical.SecantFormula.LoadAtStress(Pa(v), Area.FromSquareMillimeters(1000), Mm(5), Mm(50), Mm(30), M(2), Pa(200e9)));
        // Methods: numerical options
        yield return new("FE model length", ["length"], false, v => BucklingModel.Uniform(M(v), Pa(200e9), AreaMomentOfInertia.FromMetersToTheFourth(1e-6), Pin, Pin));
        yield return new("FE model E", ["elasticModulus"], false, v => BucklingModel.Uniform(M(3), Pa(v), AreaMomentOfInertia.FromMetersToTheFourth(1e-6), Pin, Pin));
        yield return new("FE model I", ["secondMoment"], false, v => BucklingModel.Uniform(M(3), Pa(200e9), AreaMomentOfInertia.FromMetersToTheFourth(v), Pin, Pin));
        yield return new("FE segment length", ["length"], false, v => MemberSegment.Uniform(M(v), Pa(200e9), AreaMomentOfInertia.FromMetersToTheFourth(1e-6)));
        yield return new("FE tapered I top", ["secondMomentTop"], false, v => MemberSegment.Tapered(M(3), Pa(200e9), AreaMomentOfInertia.FromMetersToTheFourth(1e-6), AreaMomentOfInertia.FromMetersToTheFourth(v)));
        yield return new("FE brace position", ["position"], false, v => Model().WithBraceAt(M(v)));
        yield return new("FE brace stiffness", ["stiffness"], true, v => Model().WithBraceAt(M(1), ForcePerLength.FromNewtonsPerMeter(v)));
        yield return new("FE self weight", ["weightPerLength"], false, v => Model().WithSelfWeight(ForcePerLength.FromNewtonsPerMeter(v)));
        yield return new("FE point load", ["compression"], false, v => Model().WithAxialLoadAtTop(Force.FromNewtons(v)));
        yield return new("FE point load position", ["position"], false, v => Model().WithAxialLoadAt(M(v), Force.FromKilonewtons(1)));
        yield return new("second order fraction", ["maximumFractionOfCritical", "actions"], false, v => SecondOrderAnalysis.Analyse(Support.Fixtures.PinnedBar(50, 50, 2000), DesignActions.Compression(Force.FromKilonewtons(10)), BucklingAxis.Y, 10, v));
        // Restraints
        yield return new("end spring rotational", ["stiffness"], true, v => EndSpring.Rotational(RotationalStiffness.FromNewtonMetersPerRadian(v)));
        yield return new("end spring translational", ["stiffness"], true, v => EndSpring.Translational(ForcePerLength.FromNewtonsPerMeter(v)));
        yield return new("end spring elastic rotational", ["rotational"], true, v => EndSpring.Elastic(RotationalStiffness.FromNewtonMetersPerRadian(v), ForcePerLength.Zero));
        yield return new("end spring elastic translational", ["translational"], true, v => EndSpring.Elastic(RotationalStiffness.Zero, ForcePerLength.FromNewtonsPerMeter(v)));
        yield return new("end spring guided", ["translational"], true, v => EndSpring.GuidedOnSpring(ForcePerLength.FromNewtonsPerMeter(v)));
        yield return new("K from springs E", ["elasticModulus"], false, v => EffectiveLength.BucklingFactorFromEndSprings(Pin, EndSpring.Rotational(RotationalStiffness.FromNewtonMetersPerRadian(1e5)), Pa(v), AreaMomentOfInertia.FromMetersToTheFourth(1e-6), M(3)));
        yield return new("K from springs I", ["secondMoment"], false, v => EffectiveLength.BucklingFactorFromEndSprings(Pin, Pin, Pa(200e9), AreaMomentOfInertia.FromMetersToTheFourth(v), M(3)));
        yield return new("K from springs L", ["length"], false, v => EffectiveLength.BucklingFactorFromEndSprings(Pin, Pin, Pa(200e9), AreaMomentOfInertia.FromMetersToTheFourth(1e-6), M(v)));
        yield return new("K factor", ["bucklingFactor"], false, v => AxisRestraint.FromBucklingFactor(v));
        yield return new("joint G", ["g"], false, v => JointRestraintFactor.Of(v));
        yield return new("joint G columns", ["columns"], false, v => JointRestraintFactor.FromStiffnessSums(RotationalStiffness.FromNewtonMetersPerRadian(v), RotationalStiffness.FromNewtonMetersPerRadian(1e6)));
        yield return new("joint G beams", ["beams"], true, v => JointRestraintFactor.FromStiffnessSums(RotationalStiffness.FromNewtonMetersPerRadian(1e6), RotationalStiffness.FromNewtonMetersPerRadian(v)));
        yield return new("alignment chart tau", ["stiffnessReduction"], false, v => AlignmentChart.BucklingFactorBraced(JointRestraintFactor.Of(1), JointRestraintFactor.Of(1), v));
        yield return new("alignment chart sway tau", ["stiffnessReduction"], false, v => AlignmentChart.BucklingFactorSway(JointRestraintFactor.Of(1), JointRestraintFactor.Of(1), v));
        yield return new("alignment chart alpha", ["axialLoadRatio"], false, v => AlignmentChart.StiffnessReduction(v));
    }

    private static BucklingModel Model() =>
        BucklingModel.Uniform(M(3), Pa(200e9), AreaMomentOfInertia.FromMetersToTheFourth(1e-6), Pin, Pin);

    private static IEnumerable<IntCase> IntCases()
    {
        yield return new("FE element count", "elementCount", n => new FiniteElementBuckling(n));
        yield return new("FE model element count", "count", n => Model().WithElementCount(n));
        yield return new("HAZ seams", "seams", n => AluminiumWelding.LongitudinalSeams(WeldingProcess.Mig, n == int.MaxValue ? 1000 : n, Mm(4))); // int.MaxValue: known bug, see below
        yield return new("glulam laminations", "laminations", n => TimberSizes.Glulam(Mm(140), n));
        yield return new("US nominal thickness", "nominalThickness|nominalWidth", n => TimberSizes.UsNominal(n, 6));
        yield return new("US dressed size", "nominalInches", n => TimberSizes.UsDressedSize(n, false));
        yield return new("buckling modes", "modes", n => BucklingAnalysis.Solve(Model(), n));
        yield return new("second order steps", "steps", n => SecondOrderAnalysis.Analyse(Support.Fixtures.PinnedBar(50, 50, 2000), DesignActions.Compression(Force.FromKilonewtons(10)), BucklingAxis.Y, n));
    }

    /// <summary>Unknown enum values (a cast from an out-of-range integer) at every public entry that takes an enum.</summary>
    private static IEnumerable<(string Name, string Param, Action Act)> UnknownEnums()
    {
        yield return ("timber product", "product", () => TimberMaterial.Create("x", (TimberProduct)99, Pa(21e6), Pa(24e6), Pa(14e6), Pa(4e6), Pa(11e9), Pa(7e9), Pa(0.7e9), Kg(350), Kg(420), "test"));
        yield return ("NDS product", "product", () => new NdsTimberMaterial("x", (NdsProduct)99, Pa(9e6), Pa(6e6), Pa(11e9), Pa(4e6 * 1000), Kg(500), "test"));
        yield return ("alloy product form", "productForm", () => AluminiumAlloy.Create("x", "EN AW-6082", "T6", (AluminiumProductForm)99, Pa(250e6), Pa(290e6), M(0), Mm(5), BucklingClass.A, 0.5, 0.64, 0.6, 0.7));
        yield return ("alloy buckling class", "bucklingClass", () => AluminiumAlloy.Create("x", "EN AW-6082", "T6", AluminiumProductForm.Extrusion, Pa(250e6), Pa(290e6), M(0), Mm(5), (BucklingClass)99, 0.5, 0.64, 0.6, 0.7));
        yield return ("EC5 service class", "serviceClass", () => new Ec5ColumnStability((ServiceClass)99));
        yield return ("EC5 fire exposure", "exposure", () => new Ec5FireReducedSection(Duration.FromMinutes(30), (FireExposure)99));
        yield return ("kmod product", "product", () => En1995Factors.Kmod((TimberProduct)99, ServiceClass.Class1, LoadDurationClass.MediumTerm));
        yield return ("kmod service class", "serviceClass", () => En1995Factors.Kmod(TimberProduct.SolidSoftwood, (ServiceClass)99, LoadDurationClass.MediumTerm));
        yield return ("kmod duration", "duration", () => En1995Factors.Kmod(TimberProduct.SolidSoftwood, ServiceClass.Class1, (LoadDurationClass)99));
        yield return ("gamma M product", "product", () => En1995Factors.GammaM((TimberProduct)99));
        yield return ("beta c product", "product", () => En1995Factors.BetaC((TimberProduct)99));
        yield return ("NDS format", "format", () => new NdsColumnStability((NdsDesignFormat)99));
        yield return ("NDS CD duration", "duration", () => NdsColumnStability.LoadDurationFactorFor((LoadDurationClass)99));
        yield return ("NDS lambda duration", "duration", () => NdsColumnStability.TimeEffectFactorFor((LoadDurationClass)99));
        yield return ("buckling-constant basis", "basis", () => new BucklingConstantMethod((DesignBasis)99));
        yield return ("buckling-constant temper", "temperGroup", () => new BucklingConstantMethod(DesignBasis.Lrfd, (TemperGroup)99));
        yield return ("HAZ extent process", "process", () => AluminiumWelding.HeatAffectedExtent((WeldingProcess)99, Mm(4)));
        yield return ("EC9 part kind", "kind", () => Eurocode9Classification.StressGradientFactor(1, (PartKind)99));
        yield return ("end condition spring", "condition", () => EndSpring.FromEndCondition((EndCondition)99));
        yield return ("end condition K", "bottom", () => AxisRestraint.FromEndConditions((EndCondition)99, EndCondition.Pinned, EffectiveLengthBasis.Theoretical));
        yield return ("effective length basis", "basis", () => AxisRestraint.FromEndConditions(EndCondition.Pinned, EndCondition.Pinned, (EffectiveLengthBasis)99));
        yield return ("load duration on actions", "duration", () => DesignActions.Compression(Force.FromKilonewtons(1)).WithLoadDuration((LoadDurationClass)99));
        yield return ("buckling axis", "axis", () => BucklingAnalysis.ModelOf(Support.Fixtures.PinnedBar(50, 50, 2000), (BucklingAxis)99));
    }

    [Fact]
    public void EveryPublicFactory_GivenExtremeValues_BuildsOrThrowsATypedErrorNamingTheParameter()
    {
        int tried = 0, refused = 0, built = 0, atUnitBoundary = 0;
        var failures = new List<string>();
        foreach (var c in Cases())
            foreach (double v in Values)
            {
                tried++;
                string at = $"{c.Name} = {v.ToString("R", CultureInfo.InvariantCulture)}";
                bool mustRefuse = double.IsNaN(v) || double.IsNegativeInfinity(v) || (double.IsPositiveInfinity(v) && !c.InfinityMeans);
                object? o;
                try { o = c.Make(v); }
                catch (ArgumentException e) when (FromUnitsNet(e))
                {
                    // UnitsNet refuses NaN, ±infinity and overflowing conversions when the quantity is made, before the
                    // library sees it: a typed error at the unit boundary.
                    refused++; atUnitBoundary++;
                    continue;
                }
                catch (ArgumentException e)
                {
                    refused++;
                    if (mustRefuse ? e.ParamName != c.Params[0] : Array.IndexOf(c.Params, e.ParamName) < 0)
                        failures.Add($"{at}: {e.GetType().Name} names '{e.ParamName}', expected '{string.Join("' or '", c.Params)}'");
                    if (e.Message.Length < 20) failures.Add($"{at}: message too short to act on: \"{e.Message}\"");
                    continue;
                }
                catch (Exception e) { failures.Add($"{at}: untyped {e.GetType().Name}: {e.Message}"); continue; }
                built++;
                if (mustRefuse) { failures.Add($"{at}: accepted"); continue; }
                string? bad = KnownBug(c.Name, v) ? null : CheckUsable(o);
                if (bad is not null) failures.Add($"{at}: built, then {bad}");
            }
        foreach (var c in IntCases())
            foreach (int n in Ints)
            {
                tried++;
                try { c.Make(n); built++; }
                catch (ArgumentException e)
                {
                    refused++;
                    if (Array.IndexOf(c.Param.Split('|'), e.ParamName) < 0) failures.Add($"{c.Name} = {n}: {e.GetType().Name} names '{e.ParamName}', expected '{c.Param}'");
                }
                catch (Exception e) { failures.Add($"{c.Name} = {n}: untyped {e.GetType().Name}: {e.Message}"); }
            }
        foreach (var (name, param, act) in UnknownEnums())
        {
            tried++;
            try { act(); built++; failures.Add($"{name} = 99: an unknown enum value was accepted"); }
            catch (ArgumentException e)
            {
                refused++;
                if (e.ParamName != param) failures.Add($"{name} = 99: {e.GetType().Name} names '{e.ParamName}', expected '{param}'");
            }
            catch (Exception e) { failures.Add($"{name} = 99: untyped {e.GetType().Name}: {e.Message}"); }
        }
        output.WriteLine($"public-API bad-input sweep: {tried} cases tried, {refused} refused with a typed error ({atUnitBoundary} of them by UnitsNet when the quantity was made), {built} built and checked, {failures.Count} failures");
        foreach (var f in failures) output.WriteLine(f);
        Assert.True(failures.Count == 0, string.Join(Environment.NewLine, failures));
    }

    private static bool FromUnitsNet(ArgumentException e) => e.TargetSite?.DeclaringType?.Assembly == typeof(Length).Assembly;

    /// <summary>Cases that reproduce a known bug; they are tried in their own skipped tests below and left out here.</summary>
    private static bool KnownBug(string name, double v) =>
        v == double.MaxValue && (name == "timber fc0k" || name == "NDS Fc");

    /// <summary>Whatever an extreme value built must give a finite, non-negative resistance, or a typed refusal.</summary>
    private static string? CheckUsable(object? o)
    {
        var actions = DesignActions.Compression(Force.FromKilonewtons(10)).WithLoadDuration(LoadDurationClass.MediumTerm);
        var rect = new RectangleSection(Mm(100), Mm(100));
        (Member, IResistanceMethod)[] runs = o switch
        {
            NdsTimberMaterial n => [(Member.Create(rect, n, M(2), Restraint.PinnedBothAxes), ResistanceMethods.NdsColumnAsd)],
            TimberMaterial t => [(Member.Create(rect, t, M(2), Restraint.PinnedBothAxes), ResistanceMethods.Ec5Column),
                                 (Member.Create(new RectangleSection(Mm(140), Mm(140)), t, M(2), Restraint.PinnedBothAxes), ResistanceMethods.Ec5FireR30)],
            AluminiumAlloy a => [(Member.Create(new RectangularHollowSection(Mm(100), Mm(100), Mm(4)), a, M(2), Restraint.PinnedBothAxes), ResistanceMethods.Eurocode9),
                                 (Member.Create(new RectangularHollowSection(Mm(100), Mm(100), Mm(4)), a, M(2), Restraint.PinnedBothAxes), ResistanceMethods.AluminiumBucklingConstantsLrfd)],
            RectangleSection s => [(Member.Create(s, TimberGrades.C24, M(2), Restraint.PinnedBothAxes), ResistanceMethods.Ec5Column)],
            IResistanceMethod m => [(Member.Create(rect, MaterialFor(m), M(2), Restraint.PinnedBothAxes), m)],
            AxisRestraint r => [(Member.Create(rect, IsotropicMaterial.GenericStructuralSteel, M(2), Restraint.Same(r)), ResistanceMethods.Euler)],
            _ => [],
        };
        foreach (var (member, method) in runs)
        {
            try
            {
                var r = Check.Evaluate(member, actions, method);
                if (double.IsNaN(r.Utilisation) || r.DesignResistanceN < 0 || double.IsNaN(r.DesignResistanceN))
                    return $"{method.Identity.Name} gave N = {r.DesignResistanceN}, u = {r.Utilisation}";
            }
            catch (ArgumentException) { }
            catch (Exception e) { return $"{method.Identity.Name} threw {e.GetType().Name}: {e.Message}"; }
        }
        return null;
    }

    private static Material MaterialFor(IResistanceMethod m) => m switch
    {
        NdsColumnStability => NdsGrades.DouglasFirLarchNo2,
        Ec5ColumnStability or Ec5FireReducedSection => TimberGrades.C24,
        Eurocode9Compression or BucklingConstantMethod or TangentModulusColumn => AluminiumAlloys.EnAw6082T6Extrusion,
        _ => IsotropicMaterial.GenericStructuralSteel,
    };

    [Fact]
    public void TimberMaterial_HugeStrength_FireCheckIsFiniteOrRefusedTyped()
    {
        // Fixed: stresses above 10 000 GPa are refused when the material is made (Si.Pascals).
        var a = DesignActions.Compression(Force.FromKilonewtons(10)).WithLoadDuration(LoadDurationClass.MediumTerm);
        var e = Record.Exception(() => Check.Evaluate(Member.Create(new RectangleSection(Mm(140), Mm(140)), Timber(fc: double.MaxValue), M(2), Restraint.PinnedBothAxes),
            a, ResistanceMethods.Ec5FireR30));
        Assert.True(e is null or ArgumentException, e?.ToString());
    }

    [Fact]
    public void NdsMaterial_HugeFc_CheckIsFiniteOrRefusedTyped()
    {
        var a = DesignActions.Compression(Force.FromKilonewtons(10)).WithLoadDuration(LoadDurationClass.MediumTerm);
        var e = Record.Exception(() => Check.Evaluate(Member.Create(new RectangleSection(Mm(100), Mm(100)), Nds(fc: double.MaxValue), M(2), Restraint.PinnedBothAxes),
            a, ResistanceMethods.NdsColumnAsd));
        Assert.True(e is null or ArgumentException, e?.ToString());
    }

    [Fact]
    public void LongitudinalSeams_HugeCount_IsRefusedNamingSeams()
    {
        var e = Assert.ThrowsAny<ArgumentException>(() => AluminiumWelding.LongitudinalSeams(WeldingProcess.Mig, int.MaxValue, Mm(4)));
        Assert.Equal("seams", e.ParamName);
    }

    [Fact]
    public void HazProofFactor_UnknownProcess_IsRefused()
    {
        var e = Assert.ThrowsAny<ArgumentException>(() => AluminiumAlloys.EnAw6082T6Extrusion.HazProofFactor((WeldingProcess)99));
        Assert.Equal("process", e.ParamName);
    }

    [Theory]
    [InlineData(2.5, false)] // le/d = 2500 / 50 = 50: the limit itself (NDS 2018 3.7.1.4) is allowed
    [InlineData(2.6, true)]  // le/d = 52 > 50
    public void NdsColumn_SlendernessBeyond50_IsRefusedWithTheLimitNamed(double lengthM, bool refused)
    {
        // NDS 2018 3.7.1.4: le/d shall not exceed 50 (75 during construction). Section 50 × 200 mm, pinned, K = 1.
        var m = Member.Create(new RectangleSection(Mm(50), Mm(200)), NdsGrades.DouglasFirLarchNo2, M(lengthM), Restraint.PinnedBothAxes);
        var a = DesignActions.Compression(Force.FromKilonewtons(1)).WithLoadDuration(LoadDurationClass.MediumTerm);
        if (!refused) { Assert.True(double.IsFinite(Check.Evaluate(m, a, ResistanceMethods.NdsColumnAsd).DesignResistanceN)); return; }
        var e = Assert.Throws<MethodNotApplicableException>(() => Check.Evaluate(m, a, ResistanceMethods.NdsColumnAsd));
        Assert.Contains("exceeds 50", e.Message);
        Assert.Contains("3.7.1.4", e.Message);
    }
}
