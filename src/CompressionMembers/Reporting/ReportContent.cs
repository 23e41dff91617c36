using System.Collections.Generic;
using CompressionMembers.Internal;
using CompressionMembers.Results;

namespace CompressionMembers.Reporting;

/// <summary>What every report says, gathered once from a result; the text and Markdown renderers only lay it out.</summary>
internal sealed class ReportContent
{
    internal string Title = "";
    internal List<(string Key, string Value)> Header = [];
    internal List<(string Key, string Value)> Inputs = [];
    internal List<(string Key, string Value)> Settings = [];
    internal List<CalculationStep> Steps = [];
    internal bool Traced;
    internal List<string[]> AxisRows = [];
    internal List<(string Key, string Value)> Outcome = [];
    internal string Verdict = "";
    internal ReportUnits Units;

    internal static ReportContent From(in CheckResult r, ReportUnits units = ReportUnits.Metric)
    {
        if (units is not (ReportUnits.Metric or ReportUnits.UsCustomary))
            throw new System.ArgumentOutOfRangeException(nameof(units), units, $"Unknown report units {(int)units}.");
        var c = new ReportContent { Units = units };
        var m = r.Member;
        var a = r.Actions;
        var id = r.Method.Identity;
        c.Title = $"Compression member check: {m.Name}";
        c.Header.Add(("library", "CompressionMembers " + LibraryInfo.Version));
        c.Header.Add(("method", id.Name));
        if (id.Standard.Length > 0)
            c.Header.Add(("source", id.Standard + (id.Edition.Length > 0 ? " " + id.Edition : "") + (id.Clause.Length > 0 ? ", " + id.Clause : "")));
        c.Header.Add(("input fingerprint", InputFingerprint.Compute(m, a, r.Method)));
        if (units == ReportUnits.UsCustomary)
            c.Header.Add(("display units", "US customary (in, lb, psi, lb·ft); inputs as given; calculated in SI"));

        var mat = m.Material;
        c.Inputs.Add(("material", $"{mat.Name} ({mat.Kind.ToString().ToLowerInvariant()}); values from {mat.Source}"));
        c.Inputs.Add(("E", Si.Given(mat.ElasticModulus) + "  (modulus for stability)"));
        c.Inputs.Add(("G", Si.Given(mat.ShearModulus)));
        c.Inputs.Add(("f", Si.Given(mat.CompressiveStrength) + "  (compressive strength)"));
        c.Inputs.Add(("ρ", Si.Given(mat.Density)));
        var s = m.Section;
        c.Inputs.Add(("section", s.Designation));
        c.Inputs.Add(("A", NumberFormat.Quantity(s.Props.AreaM2, StepUnit.Area, units)));
        c.Inputs.Add(("Iy, Iz", NumberFormat.Quantity(s.Props.IyM4, StepUnit.SecondMoment, units) + ", " + NumberFormat.Quantity(s.Props.IzM4, StepUnit.SecondMoment, units)));
        if (s.Props.PrincipalAngleRad != 0)
            c.Inputs.Add(("principal axes", $"turned {NumberFormat.Quantity(s.Props.PrincipalAngleRad, StepUnit.Angle, units)} from the reference axes; y is the major (u–u), z the minor (v–v) principal axis"));
        c.Inputs.Add(("length L", Si.Given(m.Length)));
        c.Inputs.Add(("restraint about y", m.Restraint.AboutY.ToString()));
        c.Inputs.Add(("restraint about z", m.Restraint.AboutZ.ToString()));
        c.Inputs.Add(("restraint, twist", m.Restraint.Torsional.ToString()));
        c.Inputs.Add(("action case", a.IsNamed ? a.Name : "not named"));
        c.Inputs.Add(("NEd", Si.Given(a.AxialCompression) + " (design compression)"));
        if (a.EccentricityY.Meters != 0) c.Inputs.Add(("ey", Si.Given(a.EccentricityY) + " (bends about y)"));
        if (a.EccentricityZ.Meters != 0) c.Inputs.Add(("ez", Si.Given(a.EccentricityZ) + " (bends about z)"));
        if (a.EndMomentYTop.NewtonMeters != 0 || a.EndMomentYBottom.NewtonMeters != 0)
            c.Inputs.Add(("My top, bottom", Si.Given(a.EndMomentYTop) + ", " + Si.Given(a.EndMomentYBottom)));
        if (a.EndMomentZTop.NewtonMeters != 0 || a.EndMomentZBottom.NewtonMeters != 0)
            c.Inputs.Add(("Mz top, bottom", Si.Given(a.EndMomentZTop) + ", " + Si.Given(a.EndMomentZBottom)));
        if (a.InitialBowY is { } by) c.Inputs.Add(("e0,y", Si.Given(by) + " (initial bow, buckling about y)"));
        if (a.InitialBowZ is { } bz) c.Inputs.Add(("e0,z", Si.Given(bz) + " (initial bow, buckling about z)"));
        if (a.LoadDuration != Actions.LoadDurationClass.Unspecified) c.Inputs.Add(("load duration", Words.Duration(a.LoadDuration)));

        foreach (var st in id.Settings)
            c.Settings.Add((st.Symbol, NumberFormat.Quantity(st.Value, st.Unit, units) + "  " +
                (st.IsRecommendedValue ? "[recommended value] " : "[set by the user] ") + st.Meaning + (st.Note.Length > 0 ? "; " + st.Note : "")));

        c.Traced = r.IsTraced;
        c.Steps.AddRange(r.Steps);

        AddAxis(c, "y", r.AboutY);
        AddAxis(c, "z", r.AboutZ);
        AddAxis(c, "twist", r.Torsional);

        c.Outcome.Add(("governing", Words.Mode(r.GoverningMode, r.GoverningAxis) + (r.GoverningCheck.Length > 0 ? " — " + r.GoverningCheck : "")));
        c.Outcome.Add(("NRd", NumberFormat.Quantity(r.DesignResistanceN, StepUnit.Force, units) + " (resistance of the governing check)"));
        c.Outcome.Add(("NEd", NumberFormat.Quantity(a.AxialCompression.Newtons, StepUnit.Force, units)));
        c.Outcome.Add(("utilisation", NumberFormat.Number(r.Utilisation)));
        if (s.IsThinWalledOpen && !r.Torsional.IsEvaluated && s.Kind != Sections.SectionKind.DoublySymmetricI)
            c.Outcome.Add(("not checked", "torsional and flexural-torsional buckling: this section is open and thin-walled, and they can govern; use a method that checks them"));
        c.Verdict = r.Passed
            ? $"PASSES: utilisation {NumberFormat.Number(r.Utilisation)} ≤ 1"
            : $"FAILS: utilisation {NumberFormat.Number(r.Utilisation)} > 1";
        return c;
    }

    private static void AddAxis(ReportContent c, string name, in AxisOutcome o)
    {
        if (!o.IsEvaluated) return;
        c.AxisRows.Add([
            name,
            NumberFormat.Quantity(o.EffectiveLengthM, StepUnit.Length, c.Units),
            NumberFormat.Number(o.Slenderness),
            NumberFormat.Number(o.RelativeSlenderness),
            NumberFormat.Quantity(o.CriticalForceN, StepUnit.Force, c.Units),
            NumberFormat.Number(o.ReductionFactor),
            NumberFormat.Quantity(o.ResistanceN, StepUnit.Force, c.Units),
        ]);
    }

    internal static readonly string[] AxisHeader = ["axis", "Lcr", "λ", "λ̄ (relative)", "Ncr", "reduction", "resistance"];
}
