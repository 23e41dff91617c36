using System;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Timber;
using CompressionMembers.Results;
using CompressionMembers.Tests.Support;
using CsCheck;
using UnitsNet;

namespace CompressionMembers.Tests.Timber;

public class Ec5FireReducedSectionTests
{
    private static DesignActions Fire(double kN) => DesignActions.Compression(Force.FromKilonewtons(kN));

    [Fact]
    public void Evaluate_GlulamR60FourSides_MatchesHandCalculation()
    {
        // GL24h 200 × 200, L = 3000 pinned, R60, four sides (EN 1995-1-2 4.2.2): βn = 0.7 mm/min (Table 3.1, glulam),
        // def = 0.7 × 60 + 1.0 × 7 = 49 mm (3.2), (4.1); residual 102 × 102 mm. kfi = 1.15 (Table 2.1), γM,fi = 1.0,
        // kmod,fi = 1.0 → fc,0,d,fi = 1.15 × 24 = 27.6 MPa. λ = 3000 / (102/√12), λrel = λ/π √(24/9600), βc = 0.1.
        var m = TimberFixtures.Post(200, 200, 3000, TimberGrades.GL24h);
        var r = Check.Evaluate(m, Fire(50), ResistanceMethods.Ec5FireR60);
        double lr = 3000 / (102 / Math.Sqrt(12)) / Math.PI * Math.Sqrt(24 / 9600.0);
        double kc = TimberFixtures.HandKc(lr, 0.1);
        Near.Relative(kc * 27.6e6 * 0.102 * 0.102, r.DesignResistanceN, 1e-12, "hand calculation, EN 1995-1-2 4.2.2 with EN 1995-1-1 6.3.2");
        Near.Relative(lr, r.AboutY.RelativeSlenderness, 1e-12, "hand calculation of (6.21) on the residual section");
        Near.Relative(50e3 / (kc * 27.6e6 * 0.102 * 0.102), r.Utilisation, 1e-12, "NEd,fi / Nc,Rd,fi");
        // Elastic critical force of the residual section with the 20 % fractile modulus kfi E0,05 (EN 1995-1-2 2.3 (2.1)):
        // Euler's π² E I / Lef² (Timoshenko & Gere §2.2) with I = 102⁴ / 12 mm⁴.
        Near.Relative(Math.PI * Math.PI * 1.15 * 9600e6 * (Math.Pow(0.102, 4) / 12) / (3.0 * 3.0), r.AboutY.CriticalForceN, 1e-12,
            "π² kfi E0,05 Iy,fi / Lef², hand calculation");
    }

    [Fact]
    public void CriticalForce_AnyRectangle_IsEulersPiSquaredEIOverLefSquared()
    {
        // Ncr = π² E I / Lef² (Euler; Timoshenko & Gere §2.2). The method forms π² E A / λ² with λ = Lef √12 / h — the same
        // quantity, as λ² = Lef² A / I for any section — in one division instead of two. The two forms must agree to
        // rounding (a few ulp).
        Gen.Select(Gen.Double[0.005, 2.0], Gen.Double[0.005, 2.0], Gen.Double[0.1, 30.0], Gen.Double[1e9, 2e10]).Sample((b, h, lef, e) =>
        {
            double expected = Math.PI * Math.PI * e * (b * h * h * h / 12) / (lef * lef);
            double actual = Ec5FireReducedSection.CriticalForce(e, b * h, Ec5FireReducedSection.ResidualSlenderness(lef, h));
            return Math.Abs(actual - expected) <= 1e-14 * expected;
        }, seed: Trust.PropertyTests.Seed);
    }

    [Fact]
    public void RelativeSlenderness_EveryGrade_IsLambdaOverPiTimesTheRootOfFcOverE()
    {
        // λrel = λ / π √(fc,0,k / E0,05) (EN 1995-1-1 (6.21), (6.22)); the fire method multiplies λ by the material's
        // √(fc,0,k / E0,05) / π, formed once. Both orders must agree to rounding for every grade of the library.
        foreach (var mat in TimberGrades.All)
            Gen.Double[1, 300].Sample(lam =>
            {
                double expected = lam / Math.PI * Math.Sqrt(mat.CompressionStrength.Pascals / mat.FifthPercentileModulus.Pascals);
                return Math.Abs(lam * mat.SlendernessRootOverPi - expected) <= 1e-15 * expected;
            }, seed: Trust.PropertyTests.Seed, iter: 200);
    }

    [Fact]
    public void ResidualSlenderness_AnyRectangle_IsLefOverTheRadiusOfGyration()
    {
        // λ = Lef / i with i = √(I / A): for a rectangle I = b h³ / 12 and A = b h, so i = h / √12 (the rectangle's radius of
        // gyration; common practice, in every strength-of-materials table). The method forms Lef √12 / h; it must agree
        // with √(I / A) computed the long way to rounding (a few ulp).
        Gen.Select(Gen.Double[0.005, 2.0], Gen.Double[0.005, 2.0], Gen.Double[0.1, 30.0]).Sample((b, h, lef) =>
        {
            double i = Math.Sqrt(b * h * h * h / 12 / (b * h));
            double expected = lef / i, actual = Ec5FireReducedSection.ResidualSlenderness(lef, h);
            return Math.Abs(actual - expected) <= 1e-15 * 4 * expected;
        }, seed: Trust.PropertyTests.Seed);
    }

    [Fact]
    public void EffectiveDepth_Before20Minutes_UsesK0OfTimeOver20()
    {
        // EN 1995-1-2 Table 4.1: k0 = t/20 for t < 20 min; def = βn t + k0 d0, d0 = 7 mm.
        double beta = 0.8 / 60000;
        Near.Relative(0.8 * 10 + 0.5 * 7, Ec5FireReducedSection.EffectiveDepth(600, beta) * 1e3, 1e-12, "EN 1995-1-2 (4.1), Table 4.1");
        Near.Relative(0.8 * 30 + 7, Ec5FireReducedSection.EffectiveDepth(1800, beta) * 1e3, 1e-12, "EN 1995-1-2 (4.1), k0 = 1");
        Near.Relative(0.8 * 20 + 7, Ec5FireReducedSection.EffectiveDepth(1200, beta) * 1e3, 1e-12, "continuous at 20 min");
    }

    [Fact]
    public void Factors_KfiAndCharringRates_AreTheTabledValues()
    {
        // EN 1995-1-2 Table 2.1: kfi 1.25 solid, 1.15 glulam, 1.1 LVL; Table 3.1: βn 0.8 solid softwood, 0.7 glulam, β0 0.65.
        Assert.Equal(1.25, En1995Factors.Kfi(TimberProduct.SolidSoftwood));
        Assert.Equal(1.15, En1995Factors.Kfi(TimberProduct.GlulamHomogeneous));
        Assert.Equal(1.1, En1995Factors.Kfi(TimberProduct.Lvl));
        Near.Relative(0.8, En1995Factors.NotionalCharringRate(TimberGrades.C24) * 60000, 1e-12, "EN 1995-1-2 Table 3.1");
        Near.Relative(0.7, En1995Factors.NotionalCharringRate(TimberGrades.GL28h) * 60000, 1e-12, "EN 1995-1-2 Table 3.1");
        Near.Relative(0.65, En1995Factors.OneDimensionalCharringRate(TimberGrades.GL28h) * 60000, 1e-12, "EN 1995-1-2 Table 3.1");
        // Hardwood ρk ≥ 450: βn 0.55, β0 0.50 (D30 ρk = 530 kg/m³).
        Near.Relative(0.55, En1995Factors.NotionalCharringRate(TimberGrades.D30) * 60000, 1e-12, "EN 1995-1-2 Table 3.1");
        Near.Relative(0.50, En1995Factors.OneDimensionalCharringRate(TimberGrades.D30) * 60000, 1e-12, "EN 1995-1-2 Table 3.1");
    }

    [Fact]
    public void Evaluate_ThreeSidesWidthFaceProtected_ReducesDepthOnceAndAddsShiftMoment()
    {
        // C24 140 × 240, R30, βn = 0.8: def = 31 mm → b,fi = 78, h,fi = 209 mm; centroid shift 15.5 mm along z → My = N × 15.5 mm.
        var m = TimberFixtures.Post(140, 240, 2500, TimberGrades.C24);
        var method = new Ec5FireReducedSection(Duration.FromMinutes(30), FireExposure.ThreeSidesWidthFaceProtected);
        var r = Check.EvaluateWithTrace(m, Fire(40), method);
        Assert.Contains(r.Steps, s => s.Symbol == "b,fi" && Math.Abs(s.Value - 0.078) < 1e-12);
        Assert.Contains(r.Steps, s => s.Symbol == "h,fi" && Math.Abs(s.Value - 0.209) < 1e-12);
        Assert.Contains(r.Steps, s => s.Symbol == "My,Ed,fi" && Math.Abs(s.Value - 40e3 * 0.0155) < 1e-9);
        Assert.Equal(FailureMode.CombinedCompressionAndBending, r.GoverningMode);
        var noShift = new Ec5FireReducedSection(Duration.FromMinutes(30), FireExposure.ThreeSidesWidthFaceProtected, includeCentroidShift: false);
        Assert.True(Check.Evaluate(m, Fire(40), noShift).Utilisation < r.Utilisation);
    }

    [Fact]
    public void TimeToFailure_UtilisationIsOneAtThatTime()
    {
        var m = TimberFixtures.Post(200, 200, 3000, TimberGrades.GL24h);
        var a = Fire(150);
        var t = ResistanceMethods.Ec5FireR60.TimeToFailure(m, a);
        Assert.InRange(t.Minutes, 1, 120);
        var at = new Ec5FireReducedSection(t);
        Near.Relative(1.0, Check.Evaluate(m, a, at).Utilisation, 1e-5, "definition of the root u(t) = 1");
        var traced = Check.EvaluateWithTrace(m, a, ResistanceMethods.Ec5FireR60);
        Assert.Contains(traced.Steps, s => s.Symbol == "t(u=1)" && Math.Abs(s.Value - t.Seconds) < 1e-6);
    }

    [Fact]
    public void Utilisation_Property_RisesWithFireDuration()
    {
        var m = TimberFixtures.Post(160, 240, 3200, TimberGrades.GL28h);
        Gen.Double[1, 80].Sample(min =>
        {
            double u1 = Check.Evaluate(m, Fire(60), new Ec5FireReducedSection(Duration.FromMinutes(min))).Utilisation;
            double u2 = Check.Evaluate(m, Fire(60), new Ec5FireReducedSection(Duration.FromMinutes(min + 1))).Utilisation;
            return u2 > u1;
        });
    }

    [Fact]
    public void Evaluate_SectionBurntAway_FailsWithZeroResistance()
    {
        // 60 × 60 C24 at R90: def = 0.8 × 90 + 7 = 79 mm > 30 mm: nothing is left.
        var r = Check.Evaluate(TimberFixtures.Post(60, 60, 2000, TimberGrades.C24), Fire(1), ResistanceMethods.Ec5FireR90);
        Assert.False(r.Passed);
        Assert.Equal(0, r.DesignResistanceN);
    }

    [Fact]
    public void AppliesTo_CircleSection_Refuses()
    {
        var ex = Assert.Throws<MethodNotApplicableException>(() =>
            Check.Evaluate(TimberFixtures.Round(200, 3000, TimberGrades.C24), Fire(10), ResistanceMethods.Ec5FireR30));
        Assert.Contains("addresses solid rectangular timber sections", ex.Message);
    }

    [Fact]
    public void AppliesTo_LowDensityWithoutRate_RefusesWithHowToFix()
    {
        var c = TimberGrades.C16;
        var light = TimberMaterial.Create("light", TimberProduct.SolidSoftwood, c.CompressionStrength, c.BendingStrength, c.TensionStrength, c.ShearStrength,
            c.MeanModulus, c.FifthPercentileModulus, c.MeanShearModulus, Density.FromKilogramsPerCubicMeter(270), Density.FromKilogramsPerCubicMeter(320), "user-defined");
        var m = TimberFixtures.Post(100, 100, 2000, light);
        var ex = Assert.Throws<MethodNotApplicableException>(() => Check.Evaluate(m, Fire(10), ResistanceMethods.Ec5FireR30));
        Assert.Contains("ρk ≥ 290 kg/m³", ex.Message);
        var withRate = new Ec5FireReducedSection(Duration.FromMinutes(30), notionalCharringRate: Speed.FromMillimetersPerMinutes(0.9));
        Assert.True(Check.Evaluate(m, Fire(10), withRate).DesignResistanceN > 0);
    }

    [Fact]
    public void AppliesTo_Steel_Refuses()
    {
        var ex = Assert.Throws<MethodNotApplicableException>(() =>
            Check.Evaluate(TimberFixtures.Post(100, 100, 2000, IsotropicMaterial.GenericStructuralSteel), Fire(10), ResistanceMethods.Ec5FireR30));
        Assert.Contains("covers timber only", ex.Message);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-30)]
    [InlineData(300)]
    public void Constructor_DurationOutOfRange_Throws(double minutes)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => new Ec5FireReducedSection(Duration.FromMinutes(minutes)));
        Assert.Equal("requiredDuration", ex.ParamName);
        Assert.Contains("Required fire duration", ex.Message);
    }

    [Fact]
    public void Constructor_GammaMfiBelowOne_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => new Ec5FireReducedSection(Duration.FromMinutes(30), fireMaterialFactor: 0.9));
        Assert.Equal("fireMaterialFactor", ex.ParamName);
    }

    [Fact]
    public void Evaluate_FireNeedsNoLoadDuration_AndFastPathAgreesWithTrace()
    {
        var m = TimberFixtures.Post(140, 280, 3000, TimberGrades.GL28h);
        var a = Fire(60).WithEccentricity(Length.FromMillimeters(20), Length.Zero);
        var fast = Check.Evaluate(m, a, ResistanceMethods.Ec5FireR30);
        var traced = Check.EvaluateWithTrace(m, a, ResistanceMethods.Ec5FireR30);
        Assert.True(fast.AgreesWith(traced, 0));
        Assert.Contains(traced.Steps, s => s.Symbol == "kfi" && s.Value == 1.15);
        Assert.Contains(traced.Steps, s => s.Symbol == "γM,fi" && s.Value == 1.0);
    }

    private static TimberMaterial Declared(string name, TimberProduct product, double rhok)
    {
        var c = TimberGrades.C24;
        return product == TimberProduct.Lvl
            ? TimberMaterial.Lvl(name, c.CompressionStrength, c.BendingStrength, c.TensionStrength, c.ShearStrength, c.MeanModulus,
                c.FifthPercentileModulus, c.MeanShearModulus, Density.FromKilogramsPerCubicMeter(rhok), Density.FromKilogramsPerCubicMeter(rhok + 40), 0.15, "test values")
            : TimberMaterial.Create(name, product, c.CompressionStrength, c.BendingStrength, c.TensionStrength, c.ShearStrength, c.MeanModulus,
                c.FifthPercentileModulus, c.MeanShearModulus, Density.FromKilogramsPerCubicMeter(rhok), Density.FromKilogramsPerCubicMeter(rhok + 40), "test values");
    }

    // The method's applicability, restated here from its sources: a European strength class (EN 338 / EN 14080 / LVL, not
    // US reference values, not another material), a solid rectangle (the reduced cross-section of EN 1995-1-2 4.2.2 is a
    // rectangle), no initial bow in the actions (EN 1995-1-1 6.3.2 takes it through βc), and a charring rate: given by the
    // user, or from EN 1995-1-2:2004 Table 3.1, whose rows start at ρk = 290 kg/m³ for solid timber and glulam and at
    // 480 kg/m³ for LVL (both limits from memory). Which rules exist and how they combine is the method's scope (common
    // practice for a reduced cross-section check). Check takes the straight-line path only for what the method admits and
    // refuses the rest with the method's own sentence, whatever the combination.
    [Fact]
    public void AppliesTo_EveryCombinationOfTheRules_AdmitsExactlyWhatTheRulesAdmit()
    {
        (Material Material, bool Covered)[] materials =
        [
            (TimberGrades.C24, true), (TimberGrades.GL28h, true), (TimberGrades.D30, true),
            (Declared("light softwood", TimberProduct.SolidSoftwood, 280), false), (Declared("light hardwood", TimberProduct.SolidHardwood, 285), false),
            (Declared("dense LVL", TimberProduct.Lvl, 500), true), (Declared("light LVL", TimberProduct.Lvl, 470), false),
        ];
        Gen.Select(Gen.Int[0, materials.Length + 1], Gen.Bool, Gen.Bool, Gen.Bool, Gen.Bool, Gen.Double[0, 20])
            .Sample((mi, circle, bowed, rateGiven, threeSides, eMm) =>
            {
                Material mat = mi < materials.Length ? materials[mi].Material : mi == materials.Length ? NdsGrades.DouglasFirLarchNo2 : IsotropicMaterial.GenericStructuralSteel;
                bool european = mi < materials.Length;
                var member = circle ? TimberFixtures.Round(220, 3000, mat) : TimberFixtures.Post(160, 220, 3000, mat);
                var actions = Fire(40).WithEccentricity(Length.FromMillimeters(eMm), Length.Zero);
                if (bowed) actions = actions.WithInitialBow(Length.FromMillimeters(6), null);
                var method = new Ec5FireReducedSection(Duration.FromMinutes(30), threeSides ? FireExposure.ThreeSidesWidthFaceProtected : FireExposure.FourSides,
                    notionalCharringRate: rateGiven ? Speed.FromMillimetersPerMinutes(0.8) : null);
                bool expected = european && !circle && !bowed && (rateGiven || materials[mi].Covered);
                var verdict = method.AppliesTo(member.Resolved, actions.Resolved);
                if (verdict.IsApplicable != expected) return false;
                try
                {
                    var r = Check.Evaluate(member, actions, method);
                    return expected && r.Utilisation > 0;
                }
                catch (MethodNotApplicableException e)
                {
                    return !expected && e.Message.Contains(verdict.Reason!, StringComparison.Ordinal);
                }
            }, seed: Trust.PropertyTests.Seed, threads: 1);
    }
}
