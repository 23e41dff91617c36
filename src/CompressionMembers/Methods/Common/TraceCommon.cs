using CompressionMembers.Resolution;
using CompressionMembers.Results;

namespace CompressionMembers.Methods.Common;

/// <summary>Trace steps that many methods share: the member's inputs and the per-axis slenderness.</summary>
internal static class TraceCommon
{
    internal const string Input = "input";

    /// <summary>Records the section and length inputs every method uses.</summary>
    internal static void SectionAndLengths(CalculationTrace t, in ResolvedMember m)
    {
        t.Add("A", "cross-sectional area", Input, m.AreaM2, StepUnit.Area, "section");
        t.Add("Iy", "second moment of area about y", Input, m.SecondMomentYM4, StepUnit.SecondMoment, "section");
        t.Add("Iz", "second moment of area about z", Input, m.SecondMomentZM4, StepUnit.SecondMoment, "section");
        t.Add("iy", "radius of gyration about y", "√(Iy / A)", m.RadiusYM, StepUnit.Length, "section");
        t.Add("iz", "radius of gyration about z", "√(Iz / A)", m.RadiusZM, StepUnit.Length, "section");
        t.Add("L", "system length", Input, m.LengthM, StepUnit.Length, "member");
        t.Add("Ky", "effective length factor about y", m.Member.Restraint.AboutY.BasisText, m.Member.Restraint.AboutY.BucklingFactor, StepUnit.None, "restraint");
        t.Add("Kz", "effective length factor about z", m.Member.Restraint.AboutZ.BasisText, m.Member.Restraint.AboutZ.BucklingFactor, StepUnit.None, "restraint");
        t.Add("Lcr,y", "effective length about y", m.Member.Restraint.AboutY.BracingPositions.Count > 0 ? "Ky × longest braced segment" : "Ky × L",
            m.EffectiveLengthYM, StepUnit.Length, "restraint");
        t.Add("Lcr,z", "effective length about z", m.Member.Restraint.AboutZ.BracingPositions.Count > 0 ? "Kz × longest braced segment" : "Kz × L",
            m.EffectiveLengthZM, StepUnit.Length, "restraint");
    }

    /// <summary>Records slenderness and Euler load about one axis.</summary>
    internal static void Slenderness(CalculationTrace t, in AxisData a, string reference)
    {
        bool y = a.Axis == BucklingAxis.Y;
        t.Add(y ? "λy" : "λz", "slenderness ratio about " + a.Sub, y ? "Lcr,y / iy" : "Lcr,z / iz", a.Slenderness, StepUnit.None, reference);
        t.Add(y ? "Ncr,y" : "Ncr,z", "elastic critical (Euler) force about " + a.Sub, y ? "π² E Iy / Lcr,y²" : "π² E Iz / Lcr,z²",
            a.CriticalForceN, StepUnit.Force, reference);
    }
}
