using UnitsNet;

namespace CompressionMembers.Methods.Numerical;

/// <summary>One point of a second-order load–deflection path: the load, and the largest deflection, moment and stress at it.</summary>
/// <remarks>The default value is the unloaded state (all zero). Thread safety: immutable value type.</remarks>
public readonly struct SecondOrderPoint
{
    internal SecondOrderPoint(double loadN, double fraction, double deflectionM, double momentNm, double stressPa, double stressAtM)
    {
        LoadN = loadN;
        FractionOfCritical = fraction;
        DeflectionM = deflectionM;
        MomentNm = momentNm;
        StressPa = stressPa;
        StressAtM = stressAtM;
    }

    /// <summary>The axial load P.</summary>
    public Force Load => Force.FromKilonewtons(LoadN / 1e3);
    /// <summary>P / Ncr.</summary>
    public double FractionOfCritical { get; }
    /// <summary>The largest additional (second-order) lateral deflection, measured from the initial shape.</summary>
    public Length MaximumDeflection => Length.FromMillimeters(DeflectionM * 1e3);
    /// <summary>The largest bending moment magnitude, P × (load-line offset + initial bow + deflection).</summary>
    public Torque MaximumMoment => Torque.FromKilonewtonMeters(MomentNm / 1e3);
    /// <summary>The largest compressive stress P/A + M c / I.</summary>
    public Pressure MaximumStress => Pressure.FromMegapascals(StressPa / 1e6);
    /// <summary>Where the largest stress occurs, from the bottom end.</summary>
    public Length MaximumStressPosition => Length.FromMillimeters(StressAtM * 1e3);

    internal double LoadN { get; }
    internal double DeflectionM { get; }
    internal double MomentNm { get; }
    internal double StressPa { get; }
    internal double StressAtM { get; }
}
