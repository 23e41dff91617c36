using System;
using CompressionMembers.Actions;
using CompressionMembers.Internal;

namespace CompressionMembers.Resolution;

/// <summary>Design actions resolved once into SI doubles (N, m, N·m): what a method kernel reads.</summary>
/// <remarks>Conventions as <see cref="DesignActions"/>: compression positive; eccentricity "Y" bends about y.
/// A missing initial bow is 0 with <see cref="HasInitialBowY"/> false. Actions are resolved once, when they are created;
/// <see cref="From"/> returns that value. The default value has a null
/// <see cref="Actions"/>; methods reject it. Thread safety: immutable value type.</remarks>
[Immutable]
public readonly struct ResolvedActions
{
    internal ResolvedActions(DesignActions a)
    {
        Actions = a;
        var si = a.InSi;
        AxialForceN = si.AxialForceN;
        EccentricityYM = si.EccentricityYM;
        EccentricityZM = si.EccentricityZM;
        EndMomentYTopNm = si.EndMomentYTopNm;
        EndMomentYBottomNm = si.EndMomentYBottomNm;
        EndMomentZTopNm = si.EndMomentZTopNm;
        EndMomentZBottomNm = si.EndMomentZBottomNm;
        HasInitialBowY = a.InitialBowY is not null;
        HasInitialBowZ = a.InitialBowZ is not null;
        InitialBowYM = si.InitialBowYM;
        InitialBowZM = si.InitialBowZM;
        LoadDuration = a.LoadDuration;
        HasEndMoments = EndMomentYTopNm != 0 || EndMomentYBottomNm != 0 || EndMomentZTopNm != 0 || EndMomentZBottomNm != 0;
        HasEccentricity = EccentricityYM != 0 || EccentricityZM != 0;
    }

    /// <summary>Resolves design actions to SI doubles.</summary>
    /// <param name="actions">The actions.</param>
    /// <returns>The resolved actions.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="actions"/> is null.</exception>
    public static ResolvedActions From(DesignActions actions)
    {
        ArgumentNullException.ThrowIfNull(actions);
        return actions.Resolved;
    }

    /// <summary>The actions this was resolved from.</summary>
    public DesignActions Actions { get; }
    /// <summary>Design axial compression, N (positive).</summary>
    public double AxialForceN { get; }
    /// <summary>Eccentricity bending about y, m.</summary>
    public double EccentricityYM { get; }
    /// <summary>Eccentricity bending about z, m.</summary>
    public double EccentricityZM { get; }
    /// <summary>End moment about y at the top, N·m.</summary>
    public double EndMomentYTopNm { get; }
    /// <summary>End moment about y at the bottom, N·m.</summary>
    public double EndMomentYBottomNm { get; }
    /// <summary>End moment about z at the top, N·m.</summary>
    public double EndMomentZTopNm { get; }
    /// <summary>End moment about z at the bottom, N·m.</summary>
    public double EndMomentZBottomNm { get; }
    /// <summary>Whether an initial bow about y was given.</summary>
    public bool HasInitialBowY { get; }
    /// <summary>Whether an initial bow about z was given.</summary>
    public bool HasInitialBowZ { get; }
    /// <summary>Initial bow about y, m (0 if none).</summary>
    public double InitialBowYM { get; }
    /// <summary>Initial bow about z, m (0 if none).</summary>
    public double InitialBowZM { get; }
    /// <summary>Load-duration class.</summary>
    public LoadDurationClass LoadDuration { get; }

    /// <summary>Whether any end moment is non-zero.</summary>
    public bool HasEndMoments { get; }
    /// <summary>Whether any eccentricity is non-zero.</summary>
    public bool HasEccentricity { get; }
    /// <summary>Whether this value came from <see cref="From"/> (false for <c>default</c>).</summary>
    public bool IsValid => Actions is not null;
}
