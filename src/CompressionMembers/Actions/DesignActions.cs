using System;
using CompressionMembers.Internal;
using CompressionMembers.Resolution;
using UnitsNet;

namespace CompressionMembers.Actions;

/// <summary>
/// The design actions on a member for one action case: the design axial compression, eccentricities, end moments,
/// an optional initial bow and the load-duration class. Design values are given by the user (load combinations are
/// outside this library).
/// </summary>
/// <remarks>
/// <para>Sign and axis conventions: compression is positive. <see cref="EccentricityY"/> is the offset of the load
/// that bends the member about the y axis (the offset is measured along z); likewise <see cref="EccentricityZ"/>
/// bends it about z. End moments about an axis have the same sign when they bend the member in single curvature.
/// <see cref="InitialBowY"/> is the mid-length bow that adds to buckling about y.</para>
/// <para>Thread safety: immutable reference type.</para>
/// </remarks>
[Immutable]
public sealed class DesignActions
{
    private DesignActions(string name, Force axial, Length ey, Length ez, Torque myTop, Torque myBottom, Torque mzTop, Torque mzBottom,
        Length? bowY, Length? bowZ, LoadDurationClass duration)
    {
        Name = name;
        AxialCompression = axial;
        EccentricityY = ey;
        EccentricityZ = ez;
        EndMomentYTop = myTop;
        EndMomentYBottom = myBottom;
        EndMomentZTop = mzTop;
        EndMomentZBottom = mzBottom;
        InitialBowY = bowY;
        InitialBowZ = bowZ;
        LoadDuration = duration;
        InSi = new SiValues(axial.Newtons, ey.Meters, ez.Meters, myTop.NewtonMeters, myBottom.NewtonMeters, mzTop.NewtonMeters, mzBottom.NewtonMeters,
            bowY?.Meters ?? 0, bowZ?.Meters ?? 0);
        _resolved = new ResolvedActions(this);   // resolved once: every check reads these SI doubles
    }

    private readonly ResolvedActions _resolved;

    /// <summary>The actions in SI doubles, resolved once at construction (read by reference: no copy per check).</summary>
    internal ref readonly ResolvedActions Resolved => ref _resolved;

    // SI values converted once at construction, so that resolving the actions costs no unit conversion.
    internal readonly record struct SiValues(double AxialForceN, double EccentricityYM, double EccentricityZM, double EndMomentYTopNm,
        double EndMomentYBottomNm, double EndMomentZTopNm, double EndMomentZBottomNm, double InitialBowYM, double InitialBowZM);

    internal SiValues InSi { get; }

    /// <summary>Concentric design compression only.</summary>
    /// <param name="axialCompression">Design axial compression, N_Ed, greater than 0.</param>
    /// <param name="name">A name for reports ("action case" if null).</param>
    /// <returns>The actions.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The force is not finite or not greater than 0.</exception>
    public static DesignActions Compression(Force axialCompression, string? name = null)
    {
        Si.Newtons(axialCompression, nameof(axialCompression), "Design axial compression");
        return new DesignActions(Nm(name), axialCompression, Length.Zero, Length.Zero, Torque.Zero, Torque.Zero, Torque.Zero, Torque.Zero, null, null, LoadDurationClass.Unspecified);
    }

    private static string Nm(string? name) => string.IsNullOrWhiteSpace(name) ? DefaultName : name;

    /// <summary>The name a case gets when none is given (part of the input fingerprint, so it stays "action case").</summary>
    internal const string DefaultName = "action case";

    /// <summary>Whether the case was given a name of its own (reports then show it; an unnamed case reads "not named").</summary>
    internal bool IsNamed => !string.Equals(Name, DefaultName, StringComparison.Ordinal);

    /// <summary>Case name.</summary>
    public string Name { get; }

    /// <summary>Design axial compression, N_Ed (positive).</summary>
    public Force AxialCompression { get; }

    /// <summary>Load eccentricity that bends the member about y (measured along z).</summary>
    public Length EccentricityY { get; }

    /// <summary>Load eccentricity that bends the member about z (measured along y).</summary>
    public Length EccentricityZ { get; }

    /// <summary>Design end moment about y at the top end.</summary>
    public Torque EndMomentYTop { get; }

    /// <summary>Design end moment about y at the bottom end.</summary>
    public Torque EndMomentYBottom { get; }

    /// <summary>Design end moment about z at the top end.</summary>
    public Torque EndMomentZTop { get; }

    /// <summary>Design end moment about z at the bottom end.</summary>
    public Torque EndMomentZBottom { get; }

    /// <summary>Initial mid-length bow adding to buckling about y, if given.</summary>
    public Length? InitialBowY { get; }

    /// <summary>Initial mid-length bow adding to buckling about z, if given.</summary>
    public Length? InitialBowZ { get; }

    /// <summary>Load-duration class of the case (timber methods need it).</summary>
    public LoadDurationClass LoadDuration { get; }

    /// <summary>Whether any eccentricity or end moment is present.</summary>
    public bool HasBending => EccentricityY.Meters != 0 || EccentricityZ.Meters != 0
        || EndMomentYTop.NewtonMeters != 0 || EndMomentYBottom.NewtonMeters != 0 || EndMomentZTop.NewtonMeters != 0 || EndMomentZBottom.NewtonMeters != 0;

    /// <summary>A copy with another design axial compression.</summary>
    /// <param name="axialCompression">N_Ed, greater than 0.</param>
    /// <returns>The copy.</returns>
    public DesignActions WithAxialCompression(Force axialCompression)
    {
        Si.Newtons(axialCompression, nameof(axialCompression), "Design axial compression");
        return new(Name, axialCompression, EccentricityY, EccentricityZ, EndMomentYTop, EndMomentYBottom, EndMomentZTop, EndMomentZBottom, InitialBowY, InitialBowZ, LoadDuration);
    }

    /// <summary>A copy with load eccentricities (either may be zero; the sign says to which side).</summary>
    /// <param name="aboutY">Eccentricity bending the member about y.</param>
    /// <param name="aboutZ">Eccentricity bending the member about z.</param>
    /// <returns>The copy.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite.</exception>
    public DesignActions WithEccentricity(Length aboutY, Length aboutZ)
    {
        Si.Meters(aboutY, nameof(aboutY), "Eccentricity about y", Si.Sign.Any);
        Si.Meters(aboutZ, nameof(aboutZ), "Eccentricity about z", Si.Sign.Any);
        return new(Name, AxialCompression, aboutY, aboutZ, EndMomentYTop, EndMomentYBottom, EndMomentZTop, EndMomentZBottom, InitialBowY, InitialBowZ, LoadDuration);
    }

    /// <summary>A copy with design end moments about y.</summary>
    /// <param name="top">Moment at the top end.</param>
    /// <param name="bottom">Moment at the bottom end (same sign as <paramref name="top"/> for single curvature).</param>
    /// <returns>The copy.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite.</exception>
    public DesignActions WithEndMomentsAboutY(Torque top, Torque bottom)
    {
        Si.NewtonMeters(top, nameof(top), "End moment about y (top)");
        Si.NewtonMeters(bottom, nameof(bottom), "End moment about y (bottom)");
        return new(Name, AxialCompression, EccentricityY, EccentricityZ, top, bottom, EndMomentZTop, EndMomentZBottom, InitialBowY, InitialBowZ, LoadDuration);
    }

    /// <summary>A copy with design end moments about z.</summary>
    /// <param name="top">Moment at the top end.</param>
    /// <param name="bottom">Moment at the bottom end (same sign as <paramref name="top"/> for single curvature).</param>
    /// <returns>The copy.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite.</exception>
    public DesignActions WithEndMomentsAboutZ(Torque top, Torque bottom)
    {
        Si.NewtonMeters(top, nameof(top), "End moment about z (top)");
        Si.NewtonMeters(bottom, nameof(bottom), "End moment about z (bottom)");
        return new(Name, AxialCompression, EccentricityY, EccentricityZ, EndMomentYTop, EndMomentYBottom, top, bottom, InitialBowY, InitialBowZ, LoadDuration);
    }

    /// <summary>A copy with initial mid-length bows (null for none about that axis).</summary>
    /// <param name="aboutY">Bow adding to buckling about y.</param>
    /// <param name="aboutZ">Bow adding to buckling about z.</param>
    /// <returns>The copy.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A value is not finite or negative.</exception>
    public DesignActions WithInitialBow(Length? aboutY, Length? aboutZ)
    {
        if (aboutY is { } y) Si.Meters(y, nameof(aboutY), "Initial bow about y", Si.Sign.NonNegative);
        if (aboutZ is { } z) Si.Meters(z, nameof(aboutZ), "Initial bow about z", Si.Sign.NonNegative);
        return new(Name, AxialCompression, EccentricityY, EccentricityZ, EndMomentYTop, EndMomentYBottom, EndMomentZTop, EndMomentZBottom, aboutY, aboutZ, LoadDuration);
    }

    /// <summary>A copy with a load-duration class.</summary>
    /// <param name="duration">The class of the shortest-duration action in the combination.</param>
    /// <returns>The copy.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The value is undefined.</exception>
    public DesignActions WithLoadDuration(LoadDurationClass duration)
    {
        if (!Enum.IsDefined(duration)) throw new ArgumentOutOfRangeException(nameof(duration), duration, $"Unknown load-duration class {(int)duration}.");
        return new(Name, AxialCompression, EccentricityY, EccentricityZ, EndMomentYTop, EndMomentYBottom, EndMomentZTop, EndMomentZBottom, InitialBowY, InitialBowZ, duration);
    }

    /// <summary>A copy with another name.</summary>
    /// <param name="name">The new name.</param>
    /// <returns>The copy.</returns>
    public DesignActions WithName(string name) =>
        new(Nm(name), AxialCompression, EccentricityY, EccentricityZ, EndMomentYTop, EndMomentYBottom, EndMomentZTop, EndMomentZBottom, InitialBowY, InitialBowZ, LoadDuration);

    /// <summary>The case in one line, the same in every culture: the name, NEd, and whatever else is given.</summary>
    /// <returns>Such as <c>dead + snow: NEd = 180 kN, ey = 30 mm, medium-term</c>.</returns>
    public override string ToString()
    {
        var sb = new System.Text.StringBuilder(Name).Append(": NEd = ").Append(Si.Given(AxialCompression));
        if (EccentricityY.Meters != 0) sb.Append(", ey = ").Append(Si.Given(EccentricityY));
        if (EccentricityZ.Meters != 0) sb.Append(", ez = ").Append(Si.Given(EccentricityZ));
        if (EndMomentYTop.NewtonMeters != 0 || EndMomentYBottom.NewtonMeters != 0)
            sb.Append(", My = ").Append(Si.Given(EndMomentYTop)).Append(" top, ").Append(Si.Given(EndMomentYBottom)).Append(" bottom");
        if (EndMomentZTop.NewtonMeters != 0 || EndMomentZBottom.NewtonMeters != 0)
            sb.Append(", Mz = ").Append(Si.Given(EndMomentZTop)).Append(" top, ").Append(Si.Given(EndMomentZBottom)).Append(" bottom");
        if (InitialBowY is { } by) sb.Append(", bow about y = ").Append(Si.Given(by));
        if (InitialBowZ is { } bz) sb.Append(", bow about z = ").Append(Si.Given(bz));
        if (LoadDuration != LoadDurationClass.Unspecified) sb.Append(", ").Append(DurationText(LoadDuration));
        return sb.ToString();
    }

    /// <summary>The load-duration class in words, as reports write it.</summary>
    internal static string DurationText(LoadDurationClass d) => d switch
    {
        LoadDurationClass.Permanent => "permanent",
        LoadDurationClass.LongTerm => "long-term",
        LoadDurationClass.MediumTerm => "medium-term",
        LoadDurationClass.ShortTerm => "short-term",
        LoadDurationClass.Instantaneous => "instantaneous",
        _ => "unspecified",
    };

    internal void AddCanonical(CanonicalForm form)
    {
        form.Add("actions.name", Name).Add("actions.N", AxialCompression.Newtons)
            .Add("actions.ey", EccentricityY.Meters).Add("actions.ez", EccentricityZ.Meters)
            .Add("actions.My.top", EndMomentYTop.NewtonMeters).Add("actions.My.bottom", EndMomentYBottom.NewtonMeters)
            .Add("actions.Mz.top", EndMomentZTop.NewtonMeters).Add("actions.Mz.bottom", EndMomentZBottom.NewtonMeters)
            .Add("actions.bow.y", InitialBowY?.Meters ?? double.NaN).Add("actions.bow.z", InitialBowZ?.Meters ?? double.NaN)
            .Add("actions.duration", LoadDuration.ToString());
    }
}
