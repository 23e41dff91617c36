using CompressionMembers.Internal;

namespace CompressionMembers.Restraints;

/// <summary>A member's restraint against buckling: about each principal axis, and against twisting.</summary>
/// <remarks>
/// The torsional restraint's K is the effective length factor for torsional and flexural-torsional buckling
/// (1.0 for ends held against twist but free to warp; 0.5 for ends where warping is prevented), with its own bracing.
/// Thread safety: immutable reference type.
/// </remarks>
[Immutable]
public sealed class Restraint
{
    /// <summary>Creates a restraint from one per axis and one against twisting.</summary>
    /// <param name="aboutY">Restraint for buckling about the principal axis y.</param>
    /// <param name="aboutZ">Restraint for buckling about the principal axis z.</param>
    /// <param name="torsional">Restraint against twisting; pinned–pinned (K = 1) if null.</param>
    /// <exception cref="System.ArgumentNullException"><paramref name="aboutY"/> or <paramref name="aboutZ"/> is null.</exception>
    public Restraint(AxisRestraint aboutY, AxisRestraint aboutZ, AxisRestraint? torsional = null)
    {
        AboutY = Guard.NotNull(aboutY, nameof(aboutY));
        AboutZ = Guard.NotNull(aboutZ, nameof(aboutZ));
        Torsional = torsional ?? AxisRestraint.PinnedPinned;
    }

    /// <summary>The same restraint about both axes and against twisting.</summary>
    /// <param name="both">The restraint for both axes.</param>
    /// <returns>The restraint.</returns>
    public static Restraint Same(AxisRestraint both) => new(both, both, both);

    /// <summary>Pinned at both ends about both axes, ends held against twist and free to warp.</summary>
    public static Restraint PinnedBothAxes { get; } = Same(AxisRestraint.PinnedPinned);

    /// <summary>Restraint for buckling about y.</summary>
    public AxisRestraint AboutY { get; }

    /// <summary>Restraint for buckling about z.</summary>
    public AxisRestraint AboutZ { get; }

    /// <summary>Restraint against twisting (torsional and flexural-torsional buckling).</summary>
    public AxisRestraint Torsional { get; }

    /// <summary>A copy with another restraint about y.</summary>
    /// <param name="aboutY">The new restraint.</param>
    /// <returns>The copy.</returns>
    public Restraint WithAboutY(AxisRestraint aboutY) => new(aboutY, AboutZ, Torsional);

    /// <summary>A copy with another restraint about z.</summary>
    /// <param name="aboutZ">The new restraint.</param>
    /// <returns>The copy.</returns>
    public Restraint WithAboutZ(AxisRestraint aboutZ) => new(AboutY, aboutZ, Torsional);

    /// <summary>A copy with another restraint against twisting.</summary>
    /// <param name="torsional">The new restraint.</param>
    /// <returns>The copy.</returns>
    public Restraint WithTorsional(AxisRestraint torsional) => new(AboutY, AboutZ, torsional);

    /// <summary>The three restraints in one line.</summary>
    /// <returns>Such as <c>about y: pinned–pinned, theoretical value; K = 1 | about z: … | twist: …</c>.</returns>
    public override string ToString() => $"about y: {AboutY} | about z: {AboutZ} | twist: {Torsional}";

    private string? _canonicalSegment;

    /// <summary>The restraint's canonical lines, formed on first use and kept (a restraint never changes).</summary>
    internal string CanonicalSegment => _canonicalSegment ??= CanonicalForm.Segment(AddCanonical);

    internal void AddCanonical(CanonicalForm form)
    {
        AboutY.AddCanonical(form, "restraint.y");
        AboutZ.AddCanonical(form, "restraint.z");
        Torsional.AddCanonical(form, "restraint.t");
    }
}
