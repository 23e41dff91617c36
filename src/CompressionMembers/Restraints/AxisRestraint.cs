using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using CompressionMembers.Internal;
using UnitsNet;

namespace CompressionMembers.Restraints;

/// <summary>
/// How a member is restrained against buckling about one axis: an effective length factor K (from ideal end
/// conditions, the user, or — in later methods — end springs and frame stiffness) and optional intermediate
/// lateral bracing. The governing effective length is K times the longest braced segment.
/// </summary>
/// <remarks>
/// <para>Ideal end conditions give K from a table of common practice (e.g. the commentary tables of steel and timber
/// design codes): fixed–fixed 0.5 (recommended 0.65), fixed–pinned 0.699 (0.80), fixed–guided 1.0 (1.2),
/// pinned–pinned 1.0 (1.0), fixed–free 2.0 (2.1), pinned–guided 2.0 (2.0). The fixed–pinned theoretical value is
/// π/x with x = 4.4934…, the first positive root of tan x = x (Timoshenko &amp; Gere, Theory of Elastic
/// Stability, §2.2). The caller chooses theoretical or recommended explicitly.</para>
/// <para>With bracing, K applies to each segment between braces: for segments that are pinned at the braces
/// take K = 1 (the usual assumption), which is what <see cref="PinnedPinned"/> with bracing gives.</para>
/// <para>Thread safety: immutable reference type.</para>
/// </remarks>
[Immutable]
public sealed class AxisRestraint
{
    /// <summary>The first positive root of tan x = x, which gives the fixed–pinned buckling load π²EI/(L/ x·π)².</summary>
    internal const double FixedPinnedRoot = 4.493409457909064175307880927276;

    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;
    private readonly Length[] _bracing;

    internal AxisRestraint(double bucklingFactor, string basisText, EndCondition? bottom, EndCondition? top,
        EffectiveLengthBasis? basis, Length[] bracing)
    {
        BucklingFactor = bucklingFactor;
        BasisText = basisText;
        BottomEnd = bottom;
        TopEnd = top;
        Basis = basis;
        _bracing = bracing;
    }

    /// <summary>The effective length factor K.</summary>
    public double BucklingFactor { get; }

    /// <summary>How K was obtained, in words, for reports.</summary>
    public string BasisText { get; }

    /// <summary>The bottom end condition, when K came from ideal end conditions.</summary>
    public EndCondition? BottomEnd { get; }

    /// <summary>The top end condition, when K came from ideal end conditions.</summary>
    public EndCondition? TopEnd { get; }

    /// <summary>Theoretical or recommended, when K came from ideal end conditions.</summary>
    public EffectiveLengthBasis? Basis { get; }

    /// <summary>Positions of intermediate lateral braces, measured from the bottom end, in ascending order.</summary>
    public IReadOnlyList<Length> BracingPositions => _bracing;

    /// <summary>Pinned at both ends, K = 1 (theoretical and recommended alike).</summary>
    public static AxisRestraint PinnedPinned { get; } = FromEndConditions(EndCondition.Pinned, EndCondition.Pinned, EffectiveLengthBasis.Theoretical);

    /// <summary>K for a pair of ideal end conditions.</summary>
    /// <param name="bottom">Condition at the bottom end.</param>
    /// <param name="top">Condition at the top end.</param>
    /// <param name="basis">Theoretical or recommended design value.</param>
    /// <returns>The theoretical or recommended K, or throws for a combination that is a mechanism.</returns>
    /// <exception cref="ArgumentException">The pair forms a mechanism (free–free, free–pinned, free–guided, guided–guided).</exception>
    /// <exception cref="ArgumentOutOfRangeException">An enum value is undefined.</exception>
    public static double BucklingFactorFor(EndCondition bottom, EndCondition top, EffectiveLengthBasis basis)
    {
        CheckDefined(bottom, nameof(bottom));
        CheckDefined(top, nameof(top));
        if (!Enum.IsDefined(basis)) throw new ArgumentOutOfRangeException(nameof(basis), basis, $"Unknown effective length basis {(int)basis}.");
        bool rec = basis == EffectiveLengthBasis.Recommended;
        var (a, b) = ((int)bottom <= (int)top) ? (bottom, top) : (top, bottom);
        return (a, b) switch
        {
            (EndCondition.Fixed, EndCondition.Fixed) => rec ? 0.65 : 0.5,
            (EndCondition.Pinned, EndCondition.Fixed) => rec ? 0.80 : Math.PI / FixedPinnedRoot,
            (EndCondition.Fixed, EndCondition.Guided) => rec ? 1.2 : 1.0,
            (EndCondition.Pinned, EndCondition.Pinned) => 1.0,
            (EndCondition.Fixed, EndCondition.Free) => rec ? 2.1 : 2.0,
            (EndCondition.Pinned, EndCondition.Guided) => 2.0,
            _ => throw new ArgumentException(
                $"End conditions {Word(bottom)} (bottom) and {Word(top)} (top) form a mechanism: the member can move without bending. At least one end must be fixed, or both held against translation.",
                nameof(top)),
        };
    }

    /// <summary>Restraint from ideal end conditions, K from the table of theoretical or recommended values.</summary>
    /// <param name="bottom">Condition at the bottom end.</param>
    /// <param name="top">Condition at the top end.</param>
    /// <param name="basis">Theoretical or recommended design value.</param>
    /// <returns>The restraint.</returns>
    /// <exception cref="ArgumentException">The pair forms a mechanism.</exception>
    public static AxisRestraint FromEndConditions(EndCondition bottom, EndCondition top, EffectiveLengthBasis basis)
    {
        double k = BucklingFactorFor(bottom, top, basis);
        string why = basis == EffectiveLengthBasis.Theoretical
            ? (IsFixedPinned(bottom, top) ? "theoretical value π/4.4934 (root of tan x = x)" : "theoretical value")
            : "recommended design value (common practice)";
        return new AxisRestraint(k, $"{Word(bottom)}–{Word(top)}, {why}", bottom, top, basis, []);
    }

    /// <summary>Restraint with a K chosen by the user.</summary>
    /// <param name="bucklingFactor">K, greater than 0 (values below 0.5 are physically impossible for a single member and rejected).</param>
    /// <param name="reason">Why this K, for reports (e.g. "frame analysis, load case 3").</param>
    /// <returns>The restraint.</returns>
    /// <exception cref="ArgumentOutOfRangeException">K is not finite or below 0.5.</exception>
    public static AxisRestraint FromBucklingFactor(double bucklingFactor, string reason = "given by the user")
    {
        if (!double.IsFinite(bucklingFactor) || bucklingFactor < 0.5)
            throw new ArgumentOutOfRangeException(nameof(bucklingFactor), bucklingFactor,
                $"Buckling factor K must be a finite number of at least 0.5 (fixed–fixed); got {Guard.Show(bucklingFactor)}.");
        return new AxisRestraint(bucklingFactor, string.IsNullOrWhiteSpace(reason) ? "given by the user" : reason, null, null, null, []);
    }

    /// <summary>A copy with intermediate lateral braces at the given positions (from the bottom end).</summary>
    /// <param name="positions">Brace positions; each must lie strictly inside the member (checked when the member is made).</param>
    /// <returns>The restraint with bracing.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A position is not finite or not positive.</exception>
    /// <exception cref="ArgumentException">Two braces are at the same position.</exception>
    public AxisRestraint WithBracingAt(params Length[] positions)
    {
        ArgumentNullException.ThrowIfNull(positions);
        foreach (var p in positions) Si.Meters(p, nameof(positions), "Brace position");
        var sorted = positions.OrderBy(p => p.Meters).ToArray();
        for (int i = 1; i < sorted.Length; i++)
            if (sorted[i].Meters == sorted[i - 1].Meters)
                throw new ArgumentException($"Two braces are at the same position, {Si.Given(sorted[i])}.", nameof(positions));
        return new AxisRestraint(BucklingFactor, BasisText, BottomEnd, TopEnd, Basis, sorted);
    }

    /// <summary>A copy without intermediate bracing.</summary>
    /// <returns>The restraint without bracing.</returns>
    public AxisRestraint WithoutBracing() => new(BucklingFactor, BasisText, BottomEnd, TopEnd, Basis, []);

    /// <summary>The longest unbraced segment of a member of the given length, in metres; validates the braces.</summary>
    internal double LongestSegmentM(double lengthM, string axisName, string paramName)
    {
        double prev = 0, longest = 0;
        foreach (var p in _bracing)
        {
            double x = p.Meters;
            if (x >= lengthM)
                throw new ArgumentException(
                    $"A brace for buckling about {axisName} is at {Si.Given(p)}, which is not inside the member of length {Guard.Show(lengthM * 1e3)} mm.",
                    paramName);
            longest = Math.Max(longest, x - prev);
            prev = x;
        }
        return Math.Max(longest, lengthM - prev);
    }

    internal void AddCanonical(CanonicalForm form, string prefix)
    {
        form.Add(prefix + ".K", BucklingFactor).Add(prefix + ".basis", BasisText);
        for (int i = 0; i < _bracing.Length; i++) form.Add($"{prefix}.brace{i}", _bracing[i].Meters);
    }

    /// <summary>A sentence describing the restraint.</summary>
    /// <returns>For example "pinned–pinned, theoretical value; K = 1".</returns>
    public override string ToString() =>
        $"{BasisText}; K = {BucklingFactor.ToString("0.###", Inv)}" +
        (_bracing.Length > 0 ? "; braced at " + string.Join(", ", _bracing.Select(b => Guard.Show(b.Value) + " " + b.ToString("a", Inv))) : "");

    private static bool IsFixedPinned(EndCondition a, EndCondition b) =>
        (a == EndCondition.Fixed && b == EndCondition.Pinned) || (a == EndCondition.Pinned && b == EndCondition.Fixed);

    internal static string Word(EndCondition c) => c switch
    {
        EndCondition.Fixed => "fixed",
        EndCondition.Pinned => "pinned",
        EndCondition.Free => "free",
        EndCondition.Guided => "guided",
        _ => ((int)c).ToString(Inv),
    };

    private static void CheckDefined(EndCondition c, string paramName)
    {
        if (!Enum.IsDefined(c)) throw new ArgumentOutOfRangeException(paramName, c, $"Unknown end condition {(int)c}.");
    }
}
