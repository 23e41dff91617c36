using System;
using System.Collections.Generic;
using System.Threading.Tasks;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Restraints;
using CompressionMembers.Sections;
using CompressionMembers.Tests.Support;
using UnitsNet;
using Xunit.Abstractions;

namespace CompressionMembers.Tests.Robustness;

/// <summary>Tries every public constructor of the model with zero, negative, subnormal, tiny and huge values: each
/// must either build a usable object or throw a typed ArgumentException; none may give a non-finite result later.</summary>
public class BadInputSweepTests(ITestOutputHelper output)
{
    private static readonly double[] Values = [0, -1, -0.0, double.Epsilon, 1e-310, 1e-200, 1e-30, 1e30, 1e200, double.MaxValue];

    private static IEnumerable<(string Name, Func<double, object> Make)> Constructors()
    {
        Length L(double v) => Length.FromMeters(v);
        Length Ok(double mm) => Length.FromMillimeters(mm);
        yield return ("rectangle width", v => new RectangleSection(L(v), Ok(100)));
        yield return ("circle diameter", v => new CircleSection(L(v)));
        yield return ("tube wall", v => new CircularHollowSection(Ok(100), L(v)));
        yield return ("box depth", v => new RectangularHollowSection(Ok(100), L(v), Ok(4)));
        yield return ("I flange", v => new ISection(Ok(200), Ok(100), L(v), Ok(6)));
        yield return ("I fillet", v => new ISection(Ok(200), Ok(100), Ok(10), Ok(6), L(v)));
        yield return ("channel web", v => new ChannelSection(Ok(200), Ok(75), Ok(10), L(v)));
        yield return ("angle leg", v => new AngleSection(L(v), Ok(50), Ok(5)));
        yield return ("tee stem", v => new TeeSection(Ok(150), Ok(100), Ok(10), L(v)));
        yield return ("polygon scale", v => new PolygonSection([new SectionPoint(L(0), L(0)), new SectionPoint(L(v), L(0)), new SectionPoint(L(0), L(v))]));
        yield return ("member length", v => Member.Create(new RectangleSection(Ok(50), Ok(50)), Fixtures.Steel, L(v), Restraint.PinnedBothAxes));
        yield return ("material E", v => new IsotropicMaterial("m", Pressure.FromPascals(v), Pressure.FromGigapascals(80), Pressure.FromMegapascals(250), Density.FromKilogramsPerCubicMeter(7850), "test"));
        yield return ("material f", v => new IsotropicMaterial("m", Pressure.FromGigapascals(200), Pressure.FromGigapascals(80), Pressure.FromPascals(v), Density.FromKilogramsPerCubicMeter(7850), "test"));
        yield return ("compression", v => DesignActions.Compression(Force.FromNewtons(v)));
        yield return ("eccentricity", v => DesignActions.Compression(Force.FromKilonewtons(1)).WithEccentricity(L(v), Length.Zero));
        yield return ("K", v => AxisRestraint.FromBucklingFactor(v));
        yield return ("brace", v => AxisRestraint.PinnedPinned.WithBracingAt(L(v)));
        yield return ("Perry η", v => CompressionMembers.Methods.Classical.PerryImperfection.Constant(v));
    }

    [Fact]
    public void EveryConstructor_BuildsOrThrowsTyped_AndNothingBuiltGivesANonFiniteResult()
    {
        int tried = 0, refused = 0, built = 0;
        foreach (var (name, make) in Constructors())
            foreach (double v in Values)
            {
                tried++;
                object o;
                try { o = make(v); }
                catch (ArgumentException) { refused++; continue; }
                catch (Exception e) { throw new Xunit.Sdk.XunitException($"{name} = {v:R}: untyped {e.GetType().Name}: {e.Message}"); }
                built++;
                // Anything that built must give a finite, or a plainly failing, check.
                if (o is Section s) CheckFinite(Member.Create(s, Fixtures.Steel, Length.FromMeters(2), Restraint.PinnedBothAxes), name, v);
                if (o is Member m) CheckFinite(m, name, v);
            }
        output.WriteLine($"bad-input sweep: {tried} cases tried, {refused} refused with a typed error, {built} built and checked");
        Assert.True(refused > tried / 3, "most extreme values are refused");
    }

    private static void CheckFinite(Member m, string name, double v)
    {
        foreach (IResistanceMethod method in new IResistanceMethod[] { ResistanceMethods.Euler, ResistanceMethods.Johnson, ResistanceMethods.PerryRobertsonDefault })
        {
            var r = Check.Evaluate(m, DesignActions.Compression(Force.FromKilonewtons(1)), method);
            if (double.IsNaN(r.Utilisation) || r.DesignResistanceN < 0 || (r.Passed && !double.IsFinite(r.DesignResistanceN)))
                throw new Xunit.Sdk.XunitException($"{name} = {v:R}: {method.Identity.Name} gave N = {r.DesignResistanceN}, u = {r.Utilisation}");
        }
    }

    [Fact]
    public void SharedMembers_CheckedFromManyThreads_GiveTheSameResultsAsOneThread()
    {
        var members = new Member[200];
        for (int i = 0; i < members.Length; i++) members[i] = Fixtures.PinnedBar(20 + i % 37, 30 + i % 53, 500 + 17 * i);
        var actions = DesignActions.Compression(Force.FromKilonewtons(15)).WithEccentricity(Length.FromMillimeters(3), Length.FromMillimeters(1));
        IResistanceMethod[] methods = [ResistanceMethods.Euler, ResistanceMethods.Johnson, ResistanceMethods.Secant, ResistanceMethods.PerryRobertsonDefault];
        double Run(int i, IResistanceMethod method) => method == ResistanceMethods.Secant
            ? Check.Evaluate(members[i], actions, method).Utilisation
            : Check.Evaluate(members[i], DesignActions.Compression(Force.FromKilonewtons(15)), method).Utilisation;
        var serial = new double[members.Length * methods.Length];
        for (int i = 0; i < members.Length; i++) for (int k = 0; k < methods.Length; k++) serial[i * methods.Length + k] = Run(i, methods[k]);
        for (int round = 0; round < 5; round++)
        {
            var parallel = new double[serial.Length];
            Parallel.For(0, serial.Length, new ParallelOptions { MaxDegreeOfParallelism = 16 }, j => parallel[j] = Run(j / methods.Length, methods[j % methods.Length]));
            for (int j = 0; j < serial.Length; j++) Assert.Equal(BitConverter.DoubleToInt64Bits(serial[j]), BitConverter.DoubleToInt64Bits(parallel[j]));
        }
    }
}
