using System;
using System.Globalization;
using System.Text;
using CompressionMembers.Internal;

namespace CompressionMembers.Methods.Numerical;

/// <summary>Plain-text reports of the numerical analyses: invariant culture, fixed formats, no timestamps.</summary>
internal static class NumericalReport
{
    internal const string Caution = LibraryInfo.Caution;
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    internal static string N(double v) => Guard.Show(Math.Abs(v) < 1e-300 ? 0 : v);
    internal static string F(double v, string format) => (Math.Abs(v) < 0.5 * Math.Pow(10, -Decimals(format)) ? 0.0 : v).ToString(format, Inv);
    private static int Decimals(string format) { int i = format.IndexOf('.'); return i < 0 ? 0 : format.Length - i - 1; }
    internal static string Mm(double m) => N(m * 1e3) + " mm";
    internal static string Kn(double n) => N(n / 1e3) + " kN";

    internal static string Buckling(BucklingResult r)
    {
        var m = r.Model;
        var sb = new StringBuilder();
        Line(sb, $"Linear buckling analysis by finite elements: {m.Name}");
        Line(sb, $"CompressionMembers {LibraryInfo.Version}");
        Line(sb, "");
        Line(sb, "Model");
        Line(sb, $"  length L = {Mm(m.LengthM)}; segments from the bottom:");
        double x = 0;
        for (int i = 0; i < m.SegmentArray.Length; i++)
        {
            var s = m.SegmentArray[i];
            string iText = s.IsTapered
                ? $"I = {N(s.SecondMomentBottomM4 * 1e12)} to {N(s.SecondMomentTopM4 * 1e12)} mm⁴ (tapered, linear)"
                : $"I = {N(s.SecondMomentBottomM4 * 1e12)} mm⁴";
            Line(sb, $"    {i + 1}: {N(x * 1e3)} to {N((x + s.LengthM) * 1e3)} mm, E = {N(s.ElasticModulusPa / 1e6)} MPa, {iText}");
            x += s.LengthM;
        }
        Line(sb, $"  bottom end: {m.Bottom.Description}");
        Line(sb, $"  top end: {m.Top.Description}");
        foreach (var s in m.SupportArray) Line(sb, $"  support at {Mm(s.Position.Meters)}: {s.Restraint.Description}");
        if (!m.HasLoads) Line(sb, "  loads: reference compression 1 N at the top (λ is the critical load in N)");
        foreach (var p in m.LoadArray) Line(sb, $"  axial load {Kn(p.Compression.Newtons)} at {Mm(p.Position.Meters)}");
        if (m.SelfWeight.NewtonsPerMeter > 0) Line(sb, $"  self-weight {N(m.SelfWeight.NewtonsPerMeter / 1e3)} kN/m");
        Line(sb, $"  mesh: {r.ElementCount} Euler–Bernoulli elements ({(m.ElementCount is null ? "automatic" : "set by the user")}), consistent elastic and geometric stiffness");
        Line(sb, "");
        Line(sb, "Buckling modes (K φ = λ Kg φ: Cholesky reduction and symmetric eigenvalue decomposition)");
        bool uniformTopLoaded = m.SegmentArray.Length == 1 && !m.SegmentArray[0].IsTapered && m.SelfWeight.NewtonsPerMeter == 0
            && m.SupportArray.Length == 0 && (m.LoadArray.Length == 0 || (m.LoadArray.Length == 1 && m.LoadArray[0].Position.Meters >= m.LengthM * (1 - 1e-12)));
        foreach (var mode in r.Modes)
        {
            string k = "";
            if (uniformTopLoaded)
            {
                var s = m.SegmentArray[0];
                double keq = Math.PI * Math.Sqrt(s.ElasticModulusPa * s.SecondMomentBottomM4 / mode.CriticalForceN) / m.LengthM;
                k = $", equivalent K = π √(EI / Ncr) / L = {F(keq, "0.0000")}";
            }
            Line(sb, $"  mode {mode.Number}: λ = {N(mode.LoadFactor)}, largest axial force at buckling Ncr = {Kn(mode.CriticalForceN)}{k}");
        }
        Line(sb, "");
        Line(sb, "Mode 1 shape (level from the bottom: normalised deflection)");
        var lo = r.Lowest;
        int stride = Math.Max(1, lo.PositionsM.Count / 16);
        for (int i = 0; i < lo.PositionsM.Count; i++)
            if (i % stride == 0 || i == lo.PositionsM.Count - 1)
                Line(sb, $"  {N(lo.PositionsM[i] * 1e3),10} mm: {F(lo.Deflections[i], "0.0000"),8}");
        Line(sb, "");
        Line(sb, "Sources: Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., ch. 2; consistent geometric stiffness of the beam element (Przemieniecki 1968).");
        Line(sb, "Range: linear elastic, small deflections, no shear deformation, flexural buckling in one plane.");
        Line(sb, Caution);
        return sb.ToString();
    }

    internal static string SecondOrder(SecondOrderResult r)
    {
        var sb = new StringBuilder();
        string ax = r.Axis == Results.BucklingAxis.Y ? "y" : "z";
        var m = r.Member;
        Line(sb, $"Second-order (P-δ) elastic analysis about {ax}: {m.Name}");
        Line(sb, $"CompressionMembers {LibraryInfo.Version}");
        Line(sb, "");
        Line(sb, "Member and actions");
        Line(sb, $"  {m.Material.Name}; {m.Section.Designation}; L = {Mm(m.Length.Meters)}, pinned at both ends about {ax}");
        Line(sb, $"  A = {N(r.AreaM2 * 1e6)} mm², I{ax} = {N(r.SecondMomentM4 * 1e12)} mm⁴, extreme fibres {N(r.FibrePositiveM * 1e3)} mm (+) and {N(r.FibreNegativeM * 1e3)} mm (−)");
        Line(sb, $"  design load N = {Kn(r.AtDesignLoad.LoadN)}" + (r.Actions.IsNamed ? $" ({r.Actions.Name})" : ""));
        Line(sb, $"  load-line offset: bottom e = {Mm(r.EccentricityBottomM)}, top e = {Mm(r.EccentricityTopM)} (eccentricity + end moment / N)");
        Line(sb, $"  initial bow e0 = {Mm(r.BowM)} (half sine, on the unfavourable side)");
        Line(sb, $"  mesh: {r.ElementCount} Euler–Bernoulli elements");
        Line(sb, $"  elastic critical load Ncr = {Kn(r.CriticalForceN)} (same mesh); N / Ncr = {F(r.AtDesignLoad.FractionOfCritical, "0.0000")}");
        Line(sb, "");
        Line(sb, "Load–deflection path ((K − P Kg) v = P (Kg v0 + m) at each step)");
        Line(sb, "         P [kN]   P/Ncr    δmax [mm]   Mmax [kN·m]   σmax [MPa]   at [mm]");
        foreach (var p in r.Path)
            Line(sb, $"  {F(p.LoadN / 1e3, "0.000"),13}  {F(p.FractionOfCritical, "0.0000"),6}  {F(p.DeflectionM * 1e3, "0.0000"),11}  {F(p.MomentNm / 1e3, "0.0000"),12}  {F(p.StressPa / 1e6, "0.000"),11}  {F(p.StressAtM * 1e3, "0"),8}");
        var d = r.AtDesignLoad;
        Line(sb, "");
        Line(sb, "At the design load");
        Line(sb, $"  largest additional deflection δmax = {F(d.DeflectionM * 1e3, "0.000")} mm");
        Line(sb, $"  largest moment Mmax = P (e(x) + v0(x) + v(x)) = {F(d.MomentNm / 1e3, "0.0000")} kN·m");
        Line(sb, $"  largest compressive stress σmax = P/A + Mmax c / I = {F(d.StressPa / 1e6, "0.000")} MPa at {F(d.StressAtM * 1e3, "0")} mm from the bottom");
        Line(sb, "");
        Line(sb, "Sources: Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., §1.3–1.4 and §1.11 (beam-column); equal end offsets reproduce the secant formula.");
        Line(sb, "Range: linear elastic, small deflections, pinned ends, one plane of bending; stresses above the proportional limit are not valid.");
        Line(sb, Caution);
        return sb.ToString();
    }

    internal static void Line(StringBuilder sb, string text) => sb.Append(text).Append('\n');
}
