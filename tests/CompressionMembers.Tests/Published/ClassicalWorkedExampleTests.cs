using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using UnitsNet;

namespace CompressionMembers.Tests.Published;

/// <summary>The classical methods against textbook worked examples, through the public API.</summary>
public class ClassicalWorkedExampleTests
{
    private static Length Mm(double v) => Length.FromMillimeters(v);

    [Fact]
    public void Euler_HibbelerExample131Tube_MatchesPublishedCriticalLoad()
    {
        // Hibbeler, Mechanics of Materials, Example 13.1 (PublishedSources.Hibbeler): a 7.2-m-long A-36 steel tube, outer
        // radius 75 mm, inner radius 70 mm, pin-ended, E = 200 GPa: "Pcr = π²EI/L² = 228.2 kN"; "σcr = 100 MPa < σY = 250 MPa,
        // application of Euler's equation is appropriate". The library's generic structural steel has exactly these
        // E = 200 GPa and fy = 250 MPa (its G and density do not enter Euler buckling).
        var steel = IsotropicMaterial.GenericStructuralSteel;
        Near.Relative(200e9, steel.ElasticModulus.Pascals, 1e-12, PublishedSources.Hibbeler + " Example 13.1 (E)");
        Near.Relative(250e6, steel.CompressiveStrength.Pascals, 1e-12, PublishedSources.Hibbeler + " Example 13.1 (σY)");
        var tube = Member.Create(new CircularHollowSection(Mm(150), Mm(5)), steel, Length.FromMeters(7.2), Restraint.PinnedBothAxes, "Hibbeler 13.1 tube");
        var r = Check.Evaluate(tube, DesignActions.Compression(Force.FromKilonewtons(100)), ResistanceMethods.Euler);
        // 228.2 kN printed to four figures (±0.05 kN).
        Near.Absolute(228.2e3, r.DesignResistanceN, 50, PublishedSources.Hibbeler + " Example 13.1 (Pcr = 228.2 kN)");
        Near.Absolute(228.2e3, r.AboutY.CriticalForceN, 50, PublishedSources.Hibbeler + " Example 13.1 (Pcr = 228.2 kN)");
        Assert.Equal(FailureMode.FlexuralBuckling, r.GoverningMode);
        // σcr = Pcr / A = 100 MPa (three figures).
        Near.Absolute(100e6, r.DesignResistanceN / (System.Math.PI * (0.075 * 0.075 - 0.070 * 0.070)), 0.5e6, PublishedSources.Hibbeler + " Example 13.1 (σcr = 100 MPa)");
    }

    [Fact]
    public void Euler_HibbelerExample132WideFlange_YieldingGovernsAtPublishedLoad()
    {
        // Hibbeler, Mechanics of Materials, Example 13.2 (PublishedSources.Hibbeler): A-36 steel W200 × 46, pin-connected,
        // 4 m long, "A = 5890 mm², Ix = 45.5 × 10⁶ mm⁴, Iy = 15.3 × 10⁶ mm⁴; buckling will occur about the y–y axis:
        // Pcr = 1887.6 kN; σcr = 320.5 N/mm², which exceeds the yield stress (250 N/mm²), so P = 250 × 5890 = 1472.5 kN".
        // The textbook's weak axis y–y is this library's z. The extreme-fibre distances are not part of the example and
        // do not enter Euler buckling: 110 mm for both (a placeholder that only satisfies the section's plausibility check).
        var w = new SectionByProperties("W200x46 (Hibbeler Example 13.2)", Area.FromSquareMillimeters(5890),
            AreaMomentOfInertia.FromMillimetersToTheFourth(45.5e6), AreaMomentOfInertia.FromMillimetersToTheFourth(15.3e6), Mm(110), Mm(110));
        var column = Member.Create(w, IsotropicMaterial.GenericStructuralSteel, Length.FromMeters(4), Restraint.PinnedBothAxes, "Hibbeler 13.2 column");
        var r = Check.Evaluate(column, DesignActions.Compression(Force.FromKilonewtons(1000)), ResistanceMethods.Euler);
        Near.Absolute(1887.6e3, r.AboutZ.CriticalForceN, 50, PublishedSources.Hibbeler + " Example 13.2 (Pcr = 1887.6 kN about the weak axis)");
        Near.Absolute(1472.5e3, r.DesignResistanceN, 50, PublishedSources.Hibbeler + " Example 13.2 (P = 1472.5 kN)");
        Assert.Equal(FailureMode.Yielding, r.GoverningMode);
    }

    [Theory]
    // Gere & Goodno, Mechanics of Materials, 7th ed., Solution 11.4-2 (PublishedSources.Gere;
    // https://www.coursehero.com/file/6641211/870-Mechanics-…/): steel pipe column, L = 1.2 m, d2 = 40 mm, d1 = 36 mm,
    // E = 210 GPa, I = 43.22 × 10³ mm⁴: (1) pinned-pinned Pcr = π²EI/L² = 62.2 kN; (2) fixed-free π²EI/4L² = 15.6 kN;
    // (3) fixed-pinned 2.046 π²EI/L² = 127 kN; (4) fixed-fixed 4π²EI/L² = 249 kN. Each printed to three figures.
    [InlineData(EndCondition.Pinned, EndCondition.Pinned, 62.2)]
    [InlineData(EndCondition.Fixed, EndCondition.Free, 15.6)]
    [InlineData(EndCondition.Fixed, EndCondition.Pinned, 127)]
    [InlineData(EndCondition.Fixed, EndCondition.Fixed, 249)]
    public void Euler_GerePipe1142_TheoreticalEndConditionsMatchPublishedCriticalLoads(EndCondition bottom, EndCondition top, double pcrKn)
    {
        // E = 210 GPa is the example's; Poisson's ratio, the yield strength and the density are not part of it and do not
        // enter the critical force Ncr compared here (placeholders 0.3, 1 GPa, 1 kg/m³).
        var steel = IsotropicMaterial.FromPoissonRatio("steel of Gere 11.4-2", Pressure.FromGigapascals(210), 0.3, Pressure.FromGigapascals(1),
            Density.FromKilogramsPerCubicMeter(1), PublishedSources.Gere);
        var pipe = Member.Create(new CircularHollowSection(Mm(40), Mm(2)), steel, Length.FromMeters(1.2),
            Restraint.Same(AxisRestraint.FromEndConditions(bottom, top, EffectiveLengthBasis.Theoretical)), "Gere 11.4-2 pipe");
        var r = Check.Evaluate(pipe, DesignActions.Compression(Force.FromKilonewtons(1)), ResistanceMethods.Euler);
        // Three figures: half a unit of the last printed figure (0.05 kN below 100 kN, 0.5 kN above).
        double tol = pcrKn < 100 ? 50 : 500;
        Near.Absolute(pcrKn * 1e3, r.AboutY.CriticalForceN, tol, PublishedSources.Gere + " Solution 11.4-2 (three figures)");
        Near.Absolute(pcrKn * 1e3, r.AboutZ.CriticalForceN, tol, PublishedSources.Gere + " Solution 11.4-2 (three figures)");
    }

    [Fact]
    public void Secant_GereW12x87Column11611_MatchesPublishedMaximumStressAndYieldLoad()
    {
        // Gere & Goodno, Mechanics of Materials, 7th ed., Solution 11.6-11 (PublishedSources.Gere;
        // https://www.coursehero.com/file/6641231/893-Mechanics-…/): pinned-end W 12 × 87 column, L = 18 ft = 216 in.,
        // E = 29,000 ksi, P1 = 180 k at the centroid and P2 = 75 k at s = 5.0 in.: P = 255 k, e = P2 s / P = 1.471 in.,
        // A = 25.6 in.², I1 = 740 in.⁴, r = 5.376 in., d = 12.53 in., c = d/2 = 6.265 in.; (a) "σmax = 13.4 ksi";
        // (b) with σY = 36 ksi, "PY = 664.7 k" and n = PY / P = 2.61.
        var area = Area.FromSquareInches(25.6);
        var e = Length.FromInches(1.471);
        var c = Length.FromInches(6.265);
        var r = Length.FromInches(5.376);
        var l = Length.FromInches(216);
        var modulus = Pressure.FromKilopoundsForcePerSquareInch(29000);
        var smax = SecantFormula.MaximumStress(Force.FromKilopoundsForce(255), area, e, c, r, l, modulus);
        Near.Absolute(13.4, smax.KilopoundsForcePerSquareInch, 0.05, PublishedSources.Gere + " Solution 11.6-11 (σmax = 13.4 ksi)");
        var py = SecantFormula.LoadAtStress(Pressure.FromKilopoundsForcePerSquareInch(36), area, e, c, r, l, modulus);
        Near.Absolute(664.7, py.KilopoundsForce, 0.1, PublishedSources.Gere + " Solution 11.6-11 (PY = 664.7 k, to 0.1 k)");
        Near.Absolute(2.61, py.KilopoundsForce / 255, 0.005, PublishedSources.Gere + " Solution 11.6-11 (n = 2.61)");
    }
}
