using System;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Materials.Timber;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Timber;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using CsCheck;
using UnitsNet;

namespace CompressionMembers.Tests.Timber;

public class Ec5ColumnStabilityTests
{
    private static readonly Ec5ColumnStability Method = ResistanceMethods.Ec5Column;

    [Fact]
    public void Evaluate_C24SquarePost_MatchesHandCalculation()
    {
        // Hand calculation of EN 1995-1-1 6.3.2 (6.21), (6.25), (6.27) and 2.4.1 (2.14), C24 of EN 338:2009 Table 1
        // (from memory: fc,0,k 21 MPa, E0,05 7400 MPa), 100 × 100 mm, L = 3000 mm pinned, medium-term, service class 1:
        // i = 100/√12 = 28.868 mm, λ = 103.92, λrel = 103.92/π √(21/7400) = 1.7622, kc = 0.28457 (βc = 0.2),
        // kmod = 0.8 (Table 3.1), γM = 1.3 (Table 2.3), fc,0,d = 12.923 MPa, Nc,Rd = kc fc,0,d A = 36.775 kN.
        var r = Check.Evaluate(TimberFixtures.Post(100, 100, 3000, TimberGrades.C24), TimberFixtures.Load(20), Method);
        Near.Relative(1.7622024168974508, r.AboutY.RelativeSlenderness, 1e-12, "hand calculation of (6.21)");
        Near.Relative(0.2845664913473406, r.AboutZ.ReductionFactor, 1e-12, "hand calculation of (6.25)/(6.27)");
        Near.Relative(36774.74657411785, r.DesignResistanceN, 1e-12, "hand calculation kc kmod fc,0,k A / γM");
        Near.Relative(20000 / 36774.74657411785, r.Utilisation, 1e-12, "NEd / Nc,Rd");
        Assert.Equal(FailureMode.FlexuralBuckling, r.GoverningMode);
        Assert.True(r.Passed);
    }

    [Fact]
    public void Evaluate_GlulamRectangle_UsesBetaC01AndWeakAxisGoverns()
    {
        // GL28h (EN 14080:2013 Table 5, from memory: fc,0,g,k 28, E0,g,05 10 500 MPa), 140 wide × 280 deep, L = 3000 mm:
        // about z, i = 140/√12, λz = 74.231, λrel,z = 1.22016; βc = 0.1 (6.29) → kc,z = 0.584674 (hand calculation);
        // kmod 0.8, γM 1.25 (Table 2.3 glulam) → fc,0,d = 17.92 MPa; Nc,Rd = 0.584674 × 17.92 × 39 200 = 410.72 kN.
        var r = Check.Evaluate(TimberFixtures.Post(140, 280, 3000, TimberGrades.GL28h), TimberFixtures.Load(100), Method);
        Assert.Equal(BucklingAxis.Z, r.GoverningAxis);
        Near.Relative(0.584674419599308, r.AboutZ.ReductionFactor, 1e-12, "hand calculation of (6.26)/(6.28), βc = 0.1");
        Near.Relative(0.584674419599308 * 0.8 * 28e6 / 1.25 * 0.14 * 0.28, r.DesignResistanceN, 1e-12, "kc,z kmod fc,0,k A / γM");
    }

    [Theory]
    [InlineData(0.05)]   // near zero length
    [InlineData(0.2)]
    [InlineData(0.3)]    // the limit itself (6.3.2(2))
    public void Evaluate_RelativeSlendernessAtMost03_KcIsOne(double lambdaRel)
    {
        // EN 1995-1-1 6.3.2(2): no reduction for λrel ≤ 0.3 (fact of the trade). Length chosen to give the λrel wanted:
        // L = λrel π √(E0,05/fc,0,k) i.
        double i = 100 / Math.Sqrt(12);
        double l = lambdaRel * Math.PI * Math.Sqrt(7400 / 21.0) * i * (1 - 1e-12);
        var r = Check.Evaluate(TimberFixtures.Post(100, 100, l, TimberGrades.C24), TimberFixtures.Load(20), Method);
        Assert.Equal(1.0, r.AboutY.ReductionFactor);
        Assert.Equal(1.0, r.AboutZ.ReductionFactor);
        Assert.Equal(FailureMode.Yielding, r.GoverningMode);
        Assert.Contains("(6.2)", r.GoverningCheck);
    }

    [Fact]
    public void Kc_JustAboveLimit_IsContinuousAtOne()
    {
        // (6.25) at λrel = 0.3: k = 0.5 (1 + 0.09) = 0.545, kc = 1/(0.545 + √(0.545² − 0.09)) = 1 (hand calculation).
        Near.Relative(1.0, Ec5Kernel.Kc(0.3 + 1e-9, 0.2), 1e-8, "hand calculation of (6.25) at λrel = 0.3");
    }

    [Fact]
    public void Kc_BetaCValues_AreTwoTenthsSolidAndOneTenthGlulamAndLvl()
    {
        // EN 1995-1-1 (6.29): βc = 0.2 solid timber, 0.1 glued laminated timber and LVL (fact of the trade).
        Assert.Equal(0.2, En1995Factors.BetaC(TimberProduct.SolidSoftwood));
        Assert.Equal(0.2, En1995Factors.BetaC(TimberProduct.SolidHardwood));
        Assert.Equal(0.1, En1995Factors.BetaC(TimberProduct.GlulamHomogeneous));
        Assert.Equal(0.1, En1995Factors.BetaC(TimberProduct.GlulamCombined));
        Assert.Equal(0.1, En1995Factors.BetaC(TimberProduct.Lvl));
    }

    [Fact]
    public void Kc_GlulamAboveSolid_AtEqualSlenderness()
    {
        // Fact of the trade: the straighter glulam (βc = 0.1) keeps a higher kc than solid timber (βc = 0.2) for λrel > 0.3.
        Gen.Double[0.31, 5].Sample(l => Ec5Kernel.Kc(l, 0.1) > Ec5Kernel.Kc(l, 0.2));
    }

    [Fact]
    public void Kc_Property_InUnitIntervalAndFallingWithSlenderness()
    {
        // Property of (6.25): 0 < kc ≤ 1 and kc does not rise with λrel (common practice / the curve's shape).
        Gen.Select(Gen.Double[0, 6], Gen.Double[0.001, 1], Gen.Bool.Select(g => g ? 0.1 : 0.2)).Sample((l, dl, bc) =>
        {
            double a = Ec5Kernel.Kc(l, bc), b = Ec5Kernel.Kc(l + dl, bc);
            return a > 0 && a <= 1 && b <= a;
        });
    }

    [Theory]
    [InlineData(0.2)]
    [InlineData(0.1)]
    public void Kc_VerySlender_TendsToEulerBranch(double betaC)
    {
        // For λrel → ∞, kc fc,0,k → π² E0,05/λ², i.e. kc λrel² → 1 (the Euler hyperbola; limit of (6.25)).
        double l = 2000;
        Near.Relative(1.0, Ec5Kernel.Kc(l, betaC) * l * l, 1e-3, "limit of (6.25), Euler branch");
    }

    [Fact]
    public void Kc_RecomputedOnRandomInputs_MatchesIndependentFormula()
    {
        Gen.Select(Gen.Double[0, 4], Gen.Bool.Select(g => g ? 0.1 : 0.2)).Sample((l, bc) =>
            Math.Abs(Ec5Kernel.Kc(l, bc) - TimberFixtures.HandKc(l, bc)) < 1e-14);
    }

    [Fact]
    public void Utilisation_PureCompression_IsLinearInTheLoad()
    {
        var m = TimberFixtures.Post(90, 140, 2700, TimberGrades.C18);
        Gen.Double[1, 200].Sample(kN =>
        {
            double u1 = Check.Evaluate(m, TimberFixtures.Load(kN), Method).Utilisation;
            double u2 = Check.Evaluate(m, TimberFixtures.Load(2 * kN), Method).Utilisation;
            return Math.Abs(u2 - 2 * u1) <= 1e-12 * u2;
        });
    }

    [Fact]
    public void Evaluate_EccentricLoad_Equation624MatchesHandCalculation()
    {
        // C24 100 wide × 200 deep, L = 3000, NEd = 40 kN at ey = 30 mm (bends about y), short-term, service class 2:
        // kmod = 0.9 (Table 3.1), γM = 1.3; My,Ed = 1.2 kN·m; Wy = 100 × 200²/6 = 666 667 mm³ → σm,y,d = 1.8 MPa;
        // kh,y = 1 (h = 200 ≥ 150); kh,z = (150/100)^0.2 = 1.08447 (3.2 (3.1)); σc,0,d = 2.0 MPa.
        // λz = 3000/(100/√12) = 103.92 → kc,z as in the first test (0.284566); λy = 51.96 → λrel,y = 0.88110.
        // (6.24): 2.0/(kc,z fc,0,d) + km σm,y,d/fm,y,d, km = 0.7, fc,0,d = 0.9 × 21/1.3, fm,y,d = 0.9 × 24/1.3.
        var m = TimberFixtures.Post(100, 200, 3000, TimberGrades.C24);
        var a = TimberFixtures.Load(40, LoadDurationClass.ShortTerm).WithEccentricity(Length.FromMillimeters(30), Length.Zero);
        var r = Check.Evaluate(m, a, ResistanceMethods.Ec5ColumnServiceClass2);
        double fc0d = 0.9 * 21 / 1.3, fmd = 0.9 * 24 / 1.3;
        double lrY = 3000 / (200 / Math.Sqrt(12)) / Math.PI * Math.Sqrt(21 / 7400.0);
        double kcY = TimberFixtures.HandKc(lrY, 0.2);
        double u623 = 2.0 / (kcY * fc0d) + 1.8 / fmd;
        double u624 = 2.0 / (0.2845664913473406 * fc0d) + 0.7 * 1.8 / fmd;
        // Lateral torsional buckling (6.32): σm,crit = 0.78 × 100² × 7400/(200 × 3000) = 96.2 MPa, λrel,m = 0.4995 → kcrit 1;
        // (6.35) = (1.8/fmd)² + 2.0/(kc,z fc,0,d) is below (6.24).
        Assert.Equal(FailureMode.CombinedCompressionAndBending, r.GoverningMode);
        Assert.Equal(BucklingAxis.Z, r.GoverningAxis);
        Near.Relative(Math.Max(u623, u624), r.Utilisation, 1e-12, "hand calculation of EN 1995-1-1 (6.23)/(6.24)");
        Assert.Contains("(6.24)", r.GoverningCheck);
        Near.Relative(1.0, r.Torsional.ReductionFactor, 0, "(6.34): kcrit = 1 for λrel,m ≤ 0.75");
    }

    [Fact]
    public void Evaluate_StockyWithBiaxialBending_UsesSquaredCompressionTerm()
    {
        // C24 150 × 150, L = 600 (λrel = 600/43.30/π × 0.05327 = 0.235 ≤ 0.3), NEd = 100 kN, My = 2, Mz = 1 kN·m end moments,
        // medium-term SC1: fc,0,d = 12.923, fm,d = 14.769 MPa (kh = 1 at 150 mm); W = 562 500 mm³; σc = 4.444, σm,y = 3.556,
        // σm,z = 1.778 MPa. (6.19) = (4.444/12.923)² + 3.556/14.769 + 0.7 × 1.778/14.769 (hand calculation).
        var m = TimberFixtures.Post(150, 150, 600, TimberGrades.C24);
        var a = TimberFixtures.Load(100).WithEndMomentsAboutY(Torque.FromKilonewtonMeters(2), Torque.FromKilonewtonMeters(2))
            .WithEndMomentsAboutZ(Torque.FromKilonewtonMeters(1), Torque.FromKilonewtonMeters(-0.5));
        var r = Check.Evaluate(m, a, Method);
        double fc0d = 0.8 * 21 / 1.3, fmd = 0.8 * 24 / 1.3, w = 150.0 * 150 * 150 / 6;
        double sc = 100e3 / (150.0 * 150), smy = 2e6 / w, smz = 1e6 / w;
        double u619 = Math.Pow(sc / fc0d, 2) + smy / fmd + 0.7 * smz / fmd;
        Near.Relative(u619, r.Utilisation, 1e-12, "hand calculation of EN 1995-1-1 (6.19)");
        Assert.Contains("(6.19)", r.GoverningCheck);
    }

    [Fact]
    public void Evaluate_SmallDepthSolidTimber_RaisesBendingStrengthByKh()
    {
        // kh = min((150/h)^0.2, 1.3) for solid timber (EN 1995-1-1 3.2 (3.1)): h = 100 → 1.084472.
        var mat = TimberGrades.C24;
        Near.Relative(Math.Pow(1.5, 0.2), Ec5ColumnStability.SizeFactor(mat, true, 0.100), 1e-14, "EN 1995-1-1 (3.1)");
        Near.Relative(1.3, Ec5ColumnStability.SizeFactor(mat, true, 0.010), 1e-14, "EN 1995-1-1 (3.1) cap 1.3");
        // Glulam: min((600/h)^0.1, 1.1) (3.3 (3.2)): h = 300 → 2^0.1 = 1.071773.
        Near.Relative(Math.Pow(2, 0.1), Ec5ColumnStability.SizeFactor(TimberGrades.GL24h, true, 0.300), 1e-14, "EN 1995-1-1 (3.2)");
        Assert.Equal(1.0, Ec5ColumnStability.SizeFactor(TimberGrades.GL24h, true, 0.700));
    }

    [Fact]
    public void Evaluate_NationalAnnexGammaM_ScalesResistanceAndIsReported()
    {
        var m = TimberFixtures.Post(100, 100, 3000, TimberGrades.C24);
        var a = TimberFixtures.Load(20);
        var rec = Check.Evaluate(m, a, Method);
        var na = ResistanceMethods.Ec5ColumnWith(ServiceClass.Class1, materialFactor: 1.4);
        var r = Check.Evaluate(m, a, na);
        Near.Relative(rec.DesignResistanceN * 1.3 / 1.4, r.DesignResistanceN, 1e-12, "Nc,Rd ∝ 1/γM (2.14)");
        Assert.Contains(na.Identity.Settings, s => s.Symbol == "γM" && s.Value == 1.4 && !s.IsRecommendedValue);
        Assert.Contains(Method.Identity.Settings, s => s.Symbol == "γM,solid" && s.Value == 1.3 && s.IsRecommendedValue);
        var traced = Check.EvaluateWithTrace(m, a, na);
        Assert.Contains(traced.Steps, s => s.Symbol == "γM" && s.Value == 1.4 && s.Reference.Contains("user value"));
    }

    [Fact]
    public void Evaluate_FixedKmod_NeedsNoLoadDuration()
    {
        var m = TimberFixtures.Post(100, 100, 3000, TimberGrades.C24);
        var r = Check.Evaluate(m, DesignActions.Compression(Force.FromKilonewtons(20)), ResistanceMethods.Ec5ColumnWith(ServiceClass.Class1, modificationFactor: 0.8));
        Near.Relative(36774.74657411785, r.DesignResistanceN, 1e-12, "same as kmod = 0.8 from Table 3.1");
    }

    [Fact]
    public void Evaluate_SameMemberInInchesAndPsi_GivesSameAnswer()
    {
        var mm = TimberFixtures.Post(100, 200, 3000, TimberGrades.C24);
        var c = TimberGrades.C24;
        static Pressure Psi(Pressure p) => p.ToUnit(UnitsNet.Units.PressureUnit.PoundForcePerSquareInch);
        var psiMat = TimberMaterial.Create("C24 (psi)", c.Product, Psi(c.CompressionStrength), Psi(c.BendingStrength), Psi(c.TensionStrength), Psi(c.ShearStrength),
            Psi(c.MeanModulus), Psi(c.FifthPercentileModulus), Psi(c.MeanShearModulus),
            c.CharacteristicDensity.ToUnit(UnitsNet.Units.DensityUnit.PoundPerCubicFoot), c.MeanDensity.ToUnit(UnitsNet.Units.DensityUnit.PoundPerCubicFoot), c.Source);
        var inch = Members.Member.Create(new RectangleSection(Length.FromInches(100 / 25.4), Length.FromInches(200 / 25.4)), psiMat,
            Length.FromFeet(3000 / 304.8), Restraint.PinnedBothAxes);
        var aMm = TimberFixtures.Load(40).WithEccentricity(Length.FromMillimeters(30), Length.FromMillimeters(5));
        var aIn = DesignActions.Compression(Force.FromKilopoundsForce(40 / 4.4482216152605)).WithLoadDuration(LoadDurationClass.MediumTerm)
            .WithEccentricity(Length.FromInches(30 / 25.4), Length.FromInches(5 / 25.4));
        var r1 = Check.Evaluate(mm, aMm, Method);
        var r2 = Check.Evaluate(inch, aIn, Method);
        Near.Relative(r1.Utilisation, r2.Utilisation, 1e-9, "unit invariance");
        Near.Relative(r1.DesignResistanceN, r2.DesignResistanceN, 1e-9, "unit invariance");
    }

    [Fact]
    public void Evaluate_CircularPole_UsesKmOne()
    {
        // Circle d = 200 mm: i = d/4 = 50 mm, W = π d³/32; km = 1.0 for non-rectangular sections (6.1.6(2)).
        var m = TimberFixtures.Round(200, 4000, TimberGrades.C24);
        var a = TimberFixtures.Load(50).WithEccentricity(Length.FromMillimeters(20), Length.FromMillimeters(20));
        var r = Check.EvaluateWithTrace(m, a, Method);
        double lr = 4000 / 50.0 / Math.PI * Math.Sqrt(21 / 7400.0), kc = TimberFixtures.HandKc(lr, 0.2);
        double area = Math.PI * 200 * 200 / 4, w = Math.PI * 200 * 200 * 200 / 32;
        double u = 50e3 / area / (kc * 0.8 * 21 / 1.3) + 2 * (50e3 * 20 / w) / (0.8 * 24 / 1.3);
        Near.Relative(u, r.Utilisation, 1e-12, "hand calculation of (6.23) with km = 1, kh = 1 (circle)");
        Assert.Contains(r.Steps, s => s.Symbol == "km" && s.Value == 1.0);
        Assert.False(r.Torsional.IsEvaluated);
    }

    [Fact]
    public void Evaluate_LateralTorsionalBuckling_SoftwoodFormula632()
    {
        // C24 60 wide × 300 deep, L = 4000 pinned, free to twist over L; NEd = 10 kN, My = 6 kN·m both ends, medium-term SC1.
        // (6.32): σm,crit = 0.78 × 60² × 7400/(300 × 4000) = 17.316 MPa; λrel,m = √(24/17.316) = 1.17729;
        // kcrit = 1.56 − 0.75 × 1.17729 = 0.67203 (6.34); fm,d = 0.8 × 24/1.3 (kh = 1); σm = 6e6/(60 × 300²/6) = 6.667 MPa;
        // kc,z from λz = 4000/(60/√12) = 230.94; (6.35) = (σm/(kcrit fm,d))² + σc/(kc,z fc,0,d).
        var m = TimberFixtures.Post(60, 300, 4000, TimberGrades.C24);
        var a = TimberFixtures.Load(10).WithEndMomentsAboutY(Torque.FromKilonewtonMeters(6), Torque.FromKilonewtonMeters(6));
        var r = Check.Evaluate(m, a, Method);
        double scrit = 0.78 * 3600 * 7400 / (300.0 * 4000), lrm = Math.Sqrt(24 / scrit), kcrit = 1.56 - 0.75 * lrm;
        double lrz = 4000 / (60 / Math.Sqrt(12)) / Math.PI * Math.Sqrt(21 / 7400.0), kcz = TimberFixtures.HandKc(lrz, 0.2);
        double sm = 6e6 / (60.0 * 300 * 300 / 6), sc = 10e3 / (60.0 * 300);
        double u635 = Math.Pow(sm / (kcrit * 0.8 * 24 / 1.3), 2) + sc / (kcz * 0.8 * 21 / 1.3);
        Near.Relative(lrm, r.Torsional.RelativeSlenderness, 1e-12, "hand calculation of (6.30)/(6.32)");
        Near.Relative(kcrit, r.Torsional.ReductionFactor, 1e-12, "hand calculation of (6.34)");
        Near.Relative(u635, r.Utilisation, 1e-12, "hand calculation of (6.35)");
        Assert.Equal(FailureMode.LateralTorsionalBuckling, r.GoverningMode);
    }

    [Fact]
    public void KCrit_Branches_MatchEquation634()
    {
        // EN 1995-1-1 (6.34): 1 for λrel,m ≤ 0.75; 1.56 − 0.75 λrel,m up to 1.4; 1/λrel,m² beyond.
        Assert.Equal(1.0, Ec5Kernel.KCrit(0.75));
        Near.Relative(1.56 - 0.75, Ec5Kernel.KCrit(1.0), 1e-15, "(6.34)");
        Near.Relative(1 / 4.0, Ec5Kernel.KCrit(2.0), 1e-15, "(6.34)");
    }

    [Fact]
    public void Evaluate_GeneralLtbFormula631_ForGlulam()
    {
        // GL24h 90 × 360, L = 5000: (6.31) σm,crit = π √(E0,05 Iz G0,05 Itor)/(Lef Wy), G0,05 = Gmean E0,05/E0,mean
        // (common practice), Itor by the rectangle formula of the section (Roark), recomputed here.
        var m = TimberFixtures.Post(90, 360, 5000, TimberGrades.GL24h);
        var a = TimberFixtures.Load(10).WithEndMomentsAboutY(Torque.FromKilonewtonMeters(10), Torque.FromKilonewtonMeters(10));
        var r = Check.Evaluate(m, a, Method);
        double b = 0.09, h = 0.36, ratio = b / h;
        double it = h * b * b * b * (1.0 / 3 - 0.21 * ratio * (1 - Math.Pow(ratio, 4) / 12));
        double iz = h * b * b * b / 12, wy = b * h * h / 6, e05 = 9.6e9, g05 = 0.65e9 * 9.6 / 11.5;
        double scrit = Math.PI * Math.Sqrt(e05 * iz * g05 * it) / (5.0 * wy);
        Near.Relative(Math.Sqrt(24e6 / scrit), r.Torsional.RelativeSlenderness, 1e-12, "hand calculation of (6.30)/(6.31)");
    }

    [Fact]
    public void AppliesTo_SteelMaterial_Refuses()
    {
        var m = TimberFixtures.Post(100, 100, 3000, IsotropicMaterial.GenericStructuralSteel);
        var ex = Assert.Throws<MethodNotApplicableException>(() => Check.Evaluate(m, TimberFixtures.Load(10), Method));
        Assert.Equal("method", ex.ParamName);
        Assert.Contains("covers timber only", ex.Message);
    }

    [Fact]
    public void AppliesTo_NdsMaterial_PointsToNdsMethod()
    {
        var m = TimberFixtures.Post(38, 89, 2400, NdsGrades.DouglasFirLarchNo2);
        var ex = Assert.Throws<MethodNotApplicableException>(() => Check.Evaluate(m, TimberFixtures.Load(10), Method));
        Assert.Contains("use the NDS column method", ex.Message);
    }

    [Fact]
    public void AppliesTo_HollowSection_Refuses()
    {
        var m = Members.Member.Create(new CircularHollowSection(Length.FromMillimeters(200), Length.FromMillimeters(20)), TimberGrades.C24,
            Length.FromMeters(3), Restraint.PinnedBothAxes);
        var ex = Assert.Throws<MethodNotApplicableException>(() => Check.Evaluate(m, TimberFixtures.Load(10), Method));
        Assert.Contains("addresses solid rectangular and circular timber sections", ex.Message);
    }

    [Fact]
    public void AppliesTo_UnspecifiedDuration_RefusesWithHowToFix()
    {
        var m = TimberFixtures.Post(100, 100, 3000, TimberGrades.C24);
        var ex = Assert.Throws<MethodNotApplicableException>(() => Check.Evaluate(m, DesignActions.Compression(Force.FromKilonewtons(10)), Method));
        Assert.Contains("needs the load-duration class", ex.Message);
        Assert.Contains("WithLoadDuration", ex.Message);
    }

    [Fact]
    public void AppliesTo_InitialBow_Refuses()
    {
        var m = TimberFixtures.Post(100, 100, 3000, TimberGrades.C24);
        var a = TimberFixtures.Load(10).WithInitialBow(Length.FromMillimeters(10), null);
        var ex = Assert.Throws<MethodNotApplicableException>(() => Check.Evaluate(m, a, Method));
        Assert.Contains("βc", ex.Message);
    }

    [Theory]
    [InlineData(0.9)]
    [InlineData(2.5)]
    [InlineData(double.NaN)]
    public void Constructor_GammaMOutOfRange_Throws(double g)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => new Ec5ColumnStability(materialFactor: g));
        Assert.Equal("materialFactor", ex.ParamName);
        Assert.Contains("Partial factor γM", ex.Message);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-0.5)]
    [InlineData(1.6)]
    public void Constructor_KmodOutOfRange_Throws(double k)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => new Ec5ColumnStability(modificationFactor: k));
        Assert.Equal("modificationFactor", ex.ParamName);
        Assert.Contains("kmod", ex.Message);
    }

    [Fact]
    public void EvaluateWithTrace_RecordsClausesAndGoverningCheck()
    {
        var m = TimberFixtures.Post(100, 200, 3000, TimberGrades.C24);
        var a = TimberFixtures.Load(40).WithEccentricity(Length.FromMillimeters(30), Length.Zero);
        var r = Check.EvaluateWithTrace(m, a, Method);
        Assert.Contains(r.Steps, s => s.Symbol == "λrel,z" && s.Reference == "EN 1995-1-1 6.3.2 (6.22)");
        Assert.Contains(r.Steps, s => s.Symbol == "kmod" && s.Reference == "EN 1995-1-1 3.1.3, Table 3.1" && s.Value == 0.8);
        Assert.Contains(r.Steps, s => s.Symbol == "u" && s.Reference == r.GoverningCheck);
        var fast = Check.Evaluate(m, a, Method);
        Assert.True(fast.AgreesWith(r, 0));
    }
}
