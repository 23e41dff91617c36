using System;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using UnitsNet;

namespace CompressionMembers.Tests.Model;

public class ModelValidationTests
{
    private static readonly Pressure Gpa200 = Pressure.FromGigapascals(200);

    [Theory]
    [InlineData(0.0, "elasticModulus", "Elastic modulus must be greater than 0; got 0 GPa.")]
    [InlineData(-200.0, "elasticModulus", "Elastic modulus must be greater than 0; got -200 GPa.")]
    public void Material_NonPositiveModulus_Throws(double eGpa, string param, string message)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => new IsotropicMaterial("x", Pressure.FromGigapascals(eGpa), Gpa200,
            Pressure.FromMegapascals(250), Density.FromKilogramsPerCubicMeter(7850), "user-defined"));
        Assert.Equal(param, ex.ParamName);
        Assert.StartsWith(message, ex.Message);
    }

    [Fact]
    public void Material_EmptyName_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => new IsotropicMaterial(" ", Gpa200, Gpa200, Pressure.FromMegapascals(250), Density.FromKilogramsPerCubicMeter(7850), "user-defined"));
        Assert.Equal("name", ex.ParamName);
    }

    [Theory]
    [InlineData(0.5)]
    [InlineData(-0.1)]
    [InlineData(double.NaN)]
    public void Material_BadPoissonRatio_Throws(double nu)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => IsotropicMaterial.FromPoissonRatio("x", Gpa200, nu, Pressure.FromMegapascals(250), Density.FromKilogramsPerCubicMeter(7850), "user-defined"));
        Assert.Equal("poissonRatio", ex.ParamName);
    }

    [Fact]
    public void GenericSteel_ShearModulusFollowsFromPoisson()
    {
        // G = E / (2 (1 + ν)) = 200 / 2.6 = 76.92 GPa (common practice).
        Near.Relative(200.0 / 2.6, IsotropicMaterial.GenericStructuralSteel.ShearModulus.Gigapascals, 1e-14, "G = E / 2(1 + ν)");
    }

    [Theory]
    [InlineData(0.0, "Member length must be greater than 0; got 0 mm.")]
    [InlineData(-3200.0, "Member length must be greater than 0; got -3200 mm.")]
    public void Member_BadLength_Throws(double mm, string message)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Fixtures.PinnedBar(50, 50, mm));
        Assert.Equal("length", ex.ParamName);
        Assert.StartsWith(message, ex.Message);
    }

    [Fact]
    public void Member_NullSection_Throws()
    {
        var ex = Assert.Throws<ArgumentNullException>(() => Member.Create(null!, Fixtures.Steel, Length.FromMeters(1), Restraint.PinnedBothAxes));
        Assert.Equal("section", ex.ParamName);
    }

    [Theory]
    [InlineData(0.0, "Design axial compression must be greater than 0; got 0 kN.")]
    [InlineData(-12.5, "Design axial compression must be greater than 0; got -12.5 kN.")]
    public void Actions_NonPositiveCompression_Throws(double kn, string message)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => DesignActions.Compression(Force.FromKilonewtons(kn)));
        Assert.Equal("axialCompression", ex.ParamName);
        Assert.StartsWith(message, ex.Message);
    }

    [Fact]
    public void Actions_NegativeBow_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => DesignActions.Compression(Force.FromKilonewtons(1)).WithInitialBow(Length.FromMillimeters(-2), null));
        Assert.Equal("aboutY", ex.ParamName);
        Assert.StartsWith("Initial bow about y must not be negative; got -2 mm.", ex.Message);
    }

    [Fact]
    public void Actions_UndefinedDuration_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => DesignActions.Compression(Force.FromKilonewtons(1)).WithLoadDuration((LoadDurationClass)42));
        Assert.Equal("duration", ex.ParamName);
    }

    [Fact]
    public void Check_DefaultResolvedMember_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => Check.Evaluate(default(CompressionMembers.Resolution.ResolvedMember),
            CompressionMembers.Resolution.ResolvedActions.From(DesignActions.Compression(Force.FromKilonewtons(1))), CompressionMembers.Methods.ResistanceMethods.Euler, null));
        Assert.Equal("member", ex.ParamName);
    }

    [Fact]
    public void Member_WithLength_KeepsEverythingElse()
    {
        var m = Fixtures.PinnedBar(50, 50, 1000);
        var n = m.WithLength(Length.FromMillimeters(2000));
        Assert.Same(m.Section, n.Section);
        Assert.Same(m.Material, n.Material);
        Assert.Equal(2000, n.Length.Millimeters);
        Assert.Equal(2000, n.EffectiveLengthY.Millimeters, 12);
    }
}
