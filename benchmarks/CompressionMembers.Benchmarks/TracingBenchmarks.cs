using BenchmarkDotNet.Attributes;
using CompressionMembers.Actions;
using CompressionMembers.Materials;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Reporting;
using CompressionMembers.Restraints;
using CompressionMembers.Results;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Benchmarks;

/// <summary>The cost of one check with tracing off and on, and of rendering its text and Markdown reports.</summary>
[MemoryDiagnoser]
public class TracingBenchmarks
{
    private Member _member = null!;
    private DesignActions _actions = null!;
    private CheckResult _traced, _ec9Traced;
    private Member _tube = null!;
    private DesignActions _tubeLoad = null!;

    [GlobalSetup]
    public void Setup()
    {
        _member = Member.Create(new CircularHollowSection(Length.FromMillimeters(60.3), Length.FromMillimeters(4)), IsotropicMaterial.GenericStructuralSteel,
            Length.FromMeters(1.6), Restraint.PinnedBothAxes, "T1 prop");
        _actions = DesignActions.Compression(Force.FromKilonewtons(85));
        _traced = Check.EvaluateWithTrace(_member, _actions, ResistanceMethods.Johnson);
        _tube = Member.Create(new RectangularHollowSection(Length.FromMillimeters(80), Length.FromMillimeters(100), Length.FromMillimeters(4)),
            CompressionMembers.Materials.Aluminium.AluminiumAlloys.EnAw6082T6Extrusion, Length.FromMeters(2.8), Restraint.PinnedBothAxes, "A1 strut");
        _tubeLoad = DesignActions.Compression(Force.FromKilonewtons(60));
        _ec9Traced = Check.EvaluateWithTrace(_tube, _tubeLoad, ResistanceMethods.Eurocode9);
        System.Console.WriteLine($"// steps: Johnson {_traced.Steps.Count}, EN 1999-1-1 {_ec9Traced.Steps.Count}");
    }

    [Benchmark(Baseline = true)] public double JohnsonUntraced() => Check.Evaluate(_member, _actions, ResistanceMethods.Johnson).Utilisation;
    [Benchmark] public int JohnsonTraced() => Check.EvaluateWithTrace(_member, _actions, ResistanceMethods.Johnson).Steps.Count;
    [Benchmark] public int RenderText() => TextReport.Render(_traced).Length;
    [Benchmark] public int RenderMarkdown() => MarkdownReport.Render(_traced).Length;
    [Benchmark] public double Ec9Untraced() => Check.Evaluate(_tube, _tubeLoad, ResistanceMethods.Eurocode9).Utilisation;
    [Benchmark] public int Ec9Traced() => Check.EvaluateWithTrace(_tube, _tubeLoad, ResistanceMethods.Eurocode9).Steps.Count;
    [Benchmark] public int Ec9RenderText() => TextReport.Render(_ec9Traced).Length;
}
