using System;
using CompressionMembers.Actions;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Reporting;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using CompressionMembers.Workflows.Json;
using CompressionMembers.Workflows.Registry;
using UnitsNet;

namespace CompressionMembers.Tests.Workflows;

public class ResultJsonTests
{
    public static TheoryData<string> Cases => new() { "euler-rect", "johnson-chs", "secant-channel", "perry-i-braced", "perry-angle" };

    private static CheckResult Make(string which)
    {
        var steel = Fixtures.Steel;
        var pinned = Restraint.PinnedBothAxes;
        return which switch
        {
            "euler-rect" => Check.EvaluateWithTrace(Member.Create(new RectangleSection(Length.FromMillimeters(40), Length.FromMillimeters(60)), steel, Length.FromMeters(1.8), pinned, "rod"),
                DesignActions.Compression(Force.FromKilonewtons(20), "ULS"), ResistanceMethods.Euler),
            "johnson-chs" => Check.EvaluateWithTrace(Member.Create(new CircularHollowSection(Length.FromInches(3), Length.FromInches(0.125)), steel, Length.FromFeet(8), pinned, "tube"),
                DesignActions.Compression(Force.FromKilopoundsForce(9)), ResistanceMethods.Johnson),
            "secant-channel" => Check.EvaluateWithTrace(Member.Create(new ChannelSection(Length.FromMillimeters(100), Length.FromMillimeters(50), Length.FromMillimeters(6), Length.FromMillimeters(4)), steel, Length.FromMillimeters(2400), pinned, "strut"),
                DesignActions.Compression(Force.FromKilonewtons(30)).WithEccentricity(Length.FromMillimeters(10), Length.FromMillimeters(-3)).WithEndMomentsAboutY(Torque.FromKilonewtonMeters(0.2), Torque.FromKilonewtonMeters(0.2)), ResistanceMethods.Secant),
            "perry-i-braced" => Check.EvaluateWithTrace(Member.Create(new ISection(Length.FromMillimeters(150), Length.FromMillimeters(150), Length.FromMillimeters(9), Length.FromMillimeters(6), Length.FromMillimeters(8)), steel, Length.FromMillimeters(4200),
                    new Restraint(AxisRestraint.FromEndConditions(EndCondition.Fixed, EndCondition.Pinned, EffectiveLengthBasis.Recommended), AxisRestraint.PinnedPinned.WithBracingAt(Length.FromMillimeters(2100))), "column"),
                DesignActions.Compression(Force.FromKilonewtons(200)).WithInitialBow(Length.FromMillimeters(4), null).WithLoadDuration(LoadDurationClass.MediumTerm), ResistanceMethods.PerryRobertsonDefault),
            _ => Check.Evaluate(Member.Create(AngleSection.Equal(Length.FromMillimeters(50), Length.FromMillimeters(5)), steel, Length.FromMillimeters(1900), pinned, "brace"),
                DesignActions.Compression(Force.FromKilonewtons(30)), ResistanceMethods.PerryRobertsonDefault),
        };
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void WriteThenRead_RendersTheSameReport(string which)
    {
        var original = Make(which);
        string json = ResultJson.Write(original);
        var back = ResultJson.Read(json);
        Assert.Equal(TextReport.Render(original), TextReport.Render(back));
        Assert.Equal(MarkdownReport.Render(original), MarkdownReport.Render(back));
        Assert.Equal(InputFingerprint.Compute(original.Member, original.Actions, original.Method), InputFingerprint.Compute(back.Member, back.Actions, back.Method));
        Assert.True(original.AgreesWith(back, 0)); // bit-for-bit: shortest round-trip doubles
        Assert.Equal(original.Steps, back.Steps);
        Assert.Equal(json, ResultJson.Write(back)); // and writing again gives the same bytes
    }

    [Theory]
    [InlineData("GL28h", "ec5-column", "glulam 140x180", "MediumTerm")]
    [InlineData("6082-T6", "ec9", "CHS 60x4", "")]
    [InlineData("DF-L-No2", "nds-asd", "4x6", "MediumTerm")]
    public void WriteThenRead_TimberAndAluminium_ByRegistryName(string material, string method, string section, string duration)
    {
        var reg = NameRegistry.Default;
        var actions = DesignActions.Compression(Force.FromKilonewtons(20), "ULS");
        if (duration.Length > 0) actions = actions.WithLoadDuration(Enum.Parse<LoadDurationClass>(duration));
        var m = Member.Create(reg.Section(section), reg.Material(material), Length.FromMillimeters(2400), Restraint.PinnedBothAxes, "post");
        var original = Check.EvaluateWithTrace(m, actions, reg.Method(method));
        string json = ResultJson.Write(original);
        Assert.Contains($"\"registry_name\": \"{material}\"", json);
        var back = ResultJson.Read(json);
        Assert.Equal(TextReport.Render(original), TextReport.Render(back));
    }

    [Fact]
    public void Write_CarriesVersionAndFingerprint()
    {
        var r = Make("euler-rect");
        string json = ResultJson.Write(r);
        Assert.Contains($"\"library_version\": \"{LibraryInfo.Version}\"", json);
        Assert.Contains($"\"input_fingerprint\": \"{InputFingerprint.Compute(r.Member, r.Actions, r.Method)}\"", json);
    }

    [Fact]
    public void Read_EditedValue_FingerprintMismatchIsReported()
    {
        string json = ResultJson.Write(Make("euler-rect")).Replace("\"value\": 1.8", "\"value\": 1.9", StringComparison.Ordinal);
        var ex = Assert.Throws<FormatException>(() => ResultJson.Read(json));
        Assert.Contains("not the stored", ex.Message);
    }

    [Fact]
    public void Read_UnknownField_IsRejected()
    {
        string json = ResultJson.Write(Make("euler-rect")).Replace("\"passed\":", "\"extra\": 1, \"passed\":", StringComparison.Ordinal);
        Assert.Throws<FormatException>(() => ResultJson.Read(json));
    }

    [Fact]
    public void Write_UnregisteredMethod_SaysHowToRegisterIt()
    {
        var r = Check.Evaluate(Fixtures.PinnedBar(40, 60, 1800), DesignActions.Compression(Force.FromKilonewtons(20)), ResistanceMethods.PerryRobertson(CompressionMembers.Methods.Classical.PerryImperfection.Robertson()));
        var ex = Assert.Throws<ArgumentException>(() => ResultJson.Write(r));
        Assert.Contains("add it with NameRegistry.WithMethod", ex.Message);
        var reg = NameRegistry.Default.WithMethod("my-perry", r.Method);
        Assert.Equal(TextReport.Render(r), TextReport.Render(ResultJson.Read(ResultJson.Write(r, reg), reg)));
    }
}
