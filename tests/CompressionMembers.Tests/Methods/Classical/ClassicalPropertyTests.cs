using System;
using System.Collections.Generic;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using CsCheck;
using UnitsNet;

namespace CompressionMembers.Tests.Methods.Classical;

/// <summary>Properties every classical method must have, on random members (CsCheck, fixed seeds; a failure prints its seed).</summary>
public class ClassicalPropertyTests
{
    private const string Seed = "0N0XIzNsQ0O2";

    public static IEnumerable<object[]> Methods()
    {
        yield return [ResistanceMethods.Euler, false];
        yield return [ResistanceMethods.Johnson, false];
        yield return [ResistanceMethods.PerryRobertsonDefault, false];
        yield return [ResistanceMethods.PerryRobertson(PerryImperfection.FromBowRatio(1000)), false];
        yield return [ResistanceMethods.Secant, true];
    }

    private static DesignActions Actions(bool eccentric) => eccentric
        ? DesignActions.Compression(Force.FromKilonewtons(10)).WithEccentricity(Length.FromMillimeters(4), Length.FromMillimeters(2))
        : DesignActions.Compression(Force.FromKilonewtons(10));

    [Theory]
    [MemberData(nameof(Methods))]
    public void Capacity_FallsAsLengthGrows(IResistanceMethod method, bool eccentric)
    {
        Gen.Select(Gen.Double[20, 200], Gen.Double[20, 200], Gen.Double[100, 8000], Gen.Double[1.01, 2]).Sample((b, h, l, grow) =>
        {
            var m = Fixtures.PinnedBar(b, h, l);
            double c1 = Check.Evaluate(m, Actions(eccentric), method).DesignResistanceN;
            double c2 = Check.Evaluate(m.WithLength(Length.FromMillimeters(l * grow)), Actions(eccentric), method).DesignResistanceN;
            // The secant capacity is a root found to 1e-10 relative: allow that much where the two are nearly equal.
            return c2 <= c1 * (1 + 1e-9);
        }, seed: Seed, iter: 300);
    }

    [Theory]
    [MemberData(nameof(Methods))]
    public void Capacity_NeverExceedsSquashLoad(IResistanceMethod method, bool eccentric)
    {
        Gen.Select(Gen.Double[20, 200], Gen.Double[20, 200], Gen.Double[1, 8000]).Sample((b, h, l) =>
        {
            var m = Fixtures.PinnedBar(b, h, l);
            double squash = b * h * 1e-6 * 250e6;
            double c = Check.Evaluate(m, Actions(eccentric), method).DesignResistanceN;
            return c > 0 && c <= squash * (1 + 1e-12);
        }, seed: Seed, iter: 300);
    }

    [Theory]
    [MemberData(nameof(Methods))]
    public void Result_DoesNotDependOnInputUnits(IResistanceMethod method, bool eccentric)
    {
        // The same member in mm/MPa/kN and in inches/psi/kip (conversion factors exact by definition: 25.4 mm per inch,
        // 4.4482216152605 N per lbf).
        Gen.Select(Gen.Double[1, 8], Gen.Double[1, 8], Gen.Double[20, 200]).Sample((bIn, hIn, lIn) =>
        {
            var steelUs = new IsotropicMaterial("steel (US units)", Pressure.FromPoundsForcePerSquareInch(200e9 / 6894.757293168361),
                Pressure.FromPoundsForcePerSquareInch(80e9 / 6894.757293168361), Pressure.FromPoundsForcePerSquareInch(250e6 / 6894.757293168361),
                Density.FromPoundsPerCubicFoot(490), "test");
            var steelSi = new IsotropicMaterial("steel (SI)", Pressure.FromMegapascals(200000), Pressure.FromMegapascals(80000), Pressure.FromMegapascals(250),
                Density.FromPoundsPerCubicFoot(490).ToUnit(UnitsNet.Units.DensityUnit.KilogramPerCubicMeter), "test");
            var us = Member.Create(new RectangleSection(Length.FromInches(bIn), Length.FromInches(hIn)), steelUs, Length.FromInches(lIn), Restraint.PinnedBothAxes);
            var si = Member.Create(new RectangleSection(Length.FromMillimeters(bIn * 25.4), Length.FromMillimeters(hIn * 25.4)), steelSi,
                Length.FromMillimeters(lIn * 25.4), Restraint.PinnedBothAxes);
            var aUs = eccentric
                ? DesignActions.Compression(Force.FromKilopoundsForce(2)).WithEccentricity(Length.FromInches(0.2), Length.FromInches(0.1))
                : DesignActions.Compression(Force.FromKilopoundsForce(2));
            var aSi = eccentric
                ? DesignActions.Compression(Force.FromNewtons(2000 * 4.4482216152605)).WithEccentricity(Length.FromMillimeters(5.08), Length.FromMillimeters(2.54))
                : DesignActions.Compression(Force.FromNewtons(2000 * 4.4482216152605));
            var r1 = Check.Evaluate(us, aUs, method);
            var r2 = Check.Evaluate(si, aSi, method);
            // Resistance and utilisation only: for a square section the governing axis is a tie that rounding may break either way.
            return Math.Abs(r1.DesignResistanceN - r2.DesignResistanceN) <= 1e-9 * r2.DesignResistanceN
                && Math.Abs(r1.Utilisation - r2.Utilisation) <= 1e-9 * r2.Utilisation;
        }, seed: Seed, iter: 100);
    }

    [Theory]
    [MemberData(nameof(Methods))]
    public void Utilisation_IsLinearInTheLoad_ForConcentricMethods(IResistanceMethod method, bool eccentric)
    {
        if (eccentric) return; // the secant capacity does not depend on N, but its utilisation is still N / capacity
        var m = Fixtures.PinnedBar(50, 80, 2400);
        double u1 = Check.Evaluate(m, DesignActions.Compression(Force.FromKilonewtons(10)), method).Utilisation;
        double u3 = Check.Evaluate(m, DesignActions.Compression(Force.FromKilonewtons(30)), method).Utilisation;
        Near.Relative(3 * u1, u3, 1e-14, "u = NEd / NRd");
    }

    [Fact]
    public void SymmetricSection_SwappingAxes_ChangesNothingButTheAxis()
    {
        var a = Check.Evaluate(Fixtures.PinnedBar(40, 90, 2000), DesignActions.Compression(Force.FromKilonewtons(10)), ResistanceMethods.Johnson);
        var b = Check.Evaluate(Fixtures.PinnedBar(90, 40, 2000), DesignActions.Compression(Force.FromKilonewtons(10)), ResistanceMethods.Johnson);
        Near.Relative(a.DesignResistanceN, b.DesignResistanceN, 1e-14, "symmetry");
        Assert.NotEqual(a.GoverningAxis, b.GoverningAxis);
    }
}
