using CompressionMembers.Internal;

namespace CompressionMembers.Methods.Timber;

/// <summary>
/// The NDS adjustment factors that depend on the member's use and the user's reading of the Supplement: wet service CM,
/// temperature Ct, size CF, incising Ci, flat use Cfu and repetitive member Cr, each for the design values it applies
/// to (Fc, Fb, Emin). Load duration CD (ASD), time effect λ (LRFD), format conversion KF, resistance factor φ, column
/// stability Cp and beam stability CL are set by the NDS method itself.
/// </summary>
/// <remarks>
/// <para>Every factor defaults to 1.0 (dry service, normal temperature, size already in the reference value, not incised).
/// Values must be greater than 0 and at most 2. For glulam, give the volume factor CV in place of CF for Fb (the NDS
/// applies the lesser of CL and CV; the method applies both, which is conservative). Thread safety: immutable.</para>
/// <para>Source: ANSI/AWC NDS 2018 Table 4.3.1 (sawn lumber) and Table 5.3.1 (glulam), from memory.</para>
/// </remarks>
[Immutable]
public sealed class NdsAdjustments
{
    private NdsAdjustments(double cmFc, double cmFb, double cmE, double ctFc, double ctFb, double ctE, double cfFc, double cfFb,
        double ciFc, double ciFb, double ciE, double cfu, double cr)
    {
        WetServiceFc = cmFc; WetServiceFb = cmFb; WetServiceEmin = cmE;
        TemperatureFc = ctFc; TemperatureFb = ctFb; TemperatureEmin = ctE;
        SizeFc = cfFc; SizeFb = cfFb;
        IncisingFc = ciFc; IncisingFb = ciFb; IncisingEmin = ciE;
        FlatUse = cfu; Repetitive = cr;
    }

    /// <summary>No adjustment: every factor 1.0.</summary>
    public static NdsAdjustments None { get; } = new(1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1);

    /// <summary>Wet service factor CM on Fc.</summary>
    public double WetServiceFc { get; }
    /// <summary>Wet service factor CM on Fb.</summary>
    public double WetServiceFb { get; }
    /// <summary>Wet service factor CM on Emin.</summary>
    public double WetServiceEmin { get; }
    /// <summary>Temperature factor Ct on Fc.</summary>
    public double TemperatureFc { get; }
    /// <summary>Temperature factor Ct on Fb.</summary>
    public double TemperatureFb { get; }
    /// <summary>Temperature factor Ct on Emin.</summary>
    public double TemperatureEmin { get; }
    /// <summary>Size factor CF on Fc.</summary>
    public double SizeFc { get; }
    /// <summary>Size factor CF on Fb (or the glulam volume factor CV).</summary>
    public double SizeFb { get; }
    /// <summary>Incising factor Ci on Fc.</summary>
    public double IncisingFc { get; }
    /// <summary>Incising factor Ci on Fb.</summary>
    public double IncisingFb { get; }
    /// <summary>Incising factor Ci on Emin.</summary>
    public double IncisingEmin { get; }
    /// <summary>Flat-use factor Cfu on Fb for bending about z (the flatwise axis); 1.0 is conservative.</summary>
    public double FlatUse { get; }
    /// <summary>Repetitive-member factor Cr on Fb.</summary>
    public double Repetitive { get; }

    private static double V(double x, string p, string what) => Guard.InRange(Guard.Positive(x, p, "", what), 0, 2, p, "", what);

    /// <summary>A copy with wet service factors CM (NDS Supplement table footnotes give them per product and value).</summary>
    /// <param name="fc">CM on Fc.</param>
    /// <param name="fb">CM on Fb.</param>
    /// <param name="eMin">CM on Emin.</param>
    /// <returns>The copy.</returns>
    /// <exception cref="System.ArgumentOutOfRangeException">A factor is not in (0, 2].</exception>
    public NdsAdjustments WithWetService(double fc, double fb, double eMin) =>
        new(V(fc, nameof(fc), "Wet service factor CM on Fc"), V(fb, nameof(fb), "Wet service factor CM on Fb"), V(eMin, nameof(eMin), "Wet service factor CM on Emin"),
            TemperatureFc, TemperatureFb, TemperatureEmin, SizeFc, SizeFb, IncisingFc, IncisingFb, IncisingEmin, FlatUse, Repetitive);

    /// <summary>A copy with temperature factors Ct (NDS Table 2.3.3).</summary>
    /// <param name="fc">Ct on Fc.</param>
    /// <param name="fb">Ct on Fb.</param>
    /// <param name="eMin">Ct on Emin.</param>
    /// <returns>The copy.</returns>
    /// <exception cref="System.ArgumentOutOfRangeException">A factor is not in (0, 2].</exception>
    public NdsAdjustments WithTemperature(double fc, double fb, double eMin) =>
        new(WetServiceFc, WetServiceFb, WetServiceEmin,
            V(fc, nameof(fc), "Temperature factor Ct on Fc"), V(fb, nameof(fb), "Temperature factor Ct on Fb"), V(eMin, nameof(eMin), "Temperature factor Ct on Emin"),
            SizeFc, SizeFb, IncisingFc, IncisingFb, IncisingEmin, FlatUse, Repetitive);

    /// <summary>A copy with size factors CF (NDS Supplement Table 4A footnotes, by grade and size).</summary>
    /// <param name="fc">CF on Fc.</param>
    /// <param name="fb">CF on Fb.</param>
    /// <returns>The copy.</returns>
    /// <exception cref="System.ArgumentOutOfRangeException">A factor is not in (0, 2].</exception>
    public NdsAdjustments WithSize(double fc, double fb) =>
        new(WetServiceFc, WetServiceFb, WetServiceEmin, TemperatureFc, TemperatureFb, TemperatureEmin,
            V(fc, nameof(fc), "Size factor CF on Fc"), V(fb, nameof(fb), "Size factor CF on Fb"),
            IncisingFc, IncisingFb, IncisingEmin, FlatUse, Repetitive);

    /// <summary>A copy with incising factors Ci (NDS Table 4.3.8: 0.80 on Fc and Fb, 0.95 on E and Emin, from memory).</summary>
    /// <param name="fc">Ci on Fc.</param>
    /// <param name="fb">Ci on Fb.</param>
    /// <param name="eMin">Ci on Emin.</param>
    /// <returns>The copy.</returns>
    /// <exception cref="System.ArgumentOutOfRangeException">A factor is not in (0, 2].</exception>
    public NdsAdjustments WithIncising(double fc = 0.80, double fb = 0.80, double eMin = 0.95) =>
        new(WetServiceFc, WetServiceFb, WetServiceEmin, TemperatureFc, TemperatureFb, TemperatureEmin, SizeFc, SizeFb,
            V(fc, nameof(fc), "Incising factor Ci on Fc"), V(fb, nameof(fb), "Incising factor Ci on Fb"), V(eMin, nameof(eMin), "Incising factor Ci on Emin"),
            FlatUse, Repetitive);

    /// <summary>A copy with the flat-use factor Cfu on Fb about z and the repetitive-member factor Cr on Fb.</summary>
    /// <param name="flatUse">Cfu.</param>
    /// <param name="repetitive">Cr.</param>
    /// <returns>The copy.</returns>
    /// <exception cref="System.ArgumentOutOfRangeException">A factor is not in (0, 2].</exception>
    public NdsAdjustments WithBendingFactors(double flatUse, double repetitive) =>
        new(WetServiceFc, WetServiceFb, WetServiceEmin, TemperatureFc, TemperatureFb, TemperatureEmin, SizeFc, SizeFb,
            IncisingFc, IncisingFb, IncisingEmin, V(flatUse, nameof(flatUse), "Flat-use factor Cfu"), V(repetitive, nameof(repetitive), "Repetitive-member factor Cr"));
}
