using System;
using CompressionMembers.Internal;

namespace CompressionMembers.Methods.Classical;

/// <summary>How the Perry–Robertson method sets the imperfection parameter η = e0 c / i² about each axis.</summary>
/// <remarks>Thread safety: immutable reference type.</remarks>
[Immutable]
public sealed class PerryImperfection
{
    internal enum Model { Constant, Robertson, BowRatio, FromActions }

    private PerryImperfection(Model model, double value, string description)
    {
        Kind = model;
        Value = value;
        Description = description;
    }

    /// <summary>The default of <see cref="Robertson"/>: a = 0.003, adopted for steel struts in BS 449 (from memory).</summary>
    internal const double RobertsonDefault = 0.003;

    internal Model Kind { get; }
    internal double Value { get; }

    /// <summary>The model in words, for reports.</summary>
    public string Description { get; }

    /// <summary>The imperfection in words: <see cref="Description"/>.</summary>
    /// <returns>The description.</returns>
    public override string ToString() => Description;

    /// <summary>The same η about both axes.</summary>
    /// <param name="eta">η ≥ 0 (0 is the perfect column).</param>
    /// <returns>The model.</returns>
    /// <exception cref="ArgumentOutOfRangeException">η is not finite or is negative.</exception>
    public static PerryImperfection Constant(double eta)
    {
        Guard.NonNegative(eta, nameof(eta), "", "Imperfection parameter η");
        return new PerryImperfection(Model.Constant, eta, $"η = {Guard.Show(eta)} (given)");
    }

    /// <summary>Robertson's proportional rule η = a λ, with a = 0.003 the constant adopted for steel struts in
    /// BS 449 (from memory).</summary>
    /// <param name="a">The constant a ≥ 0.</param>
    /// <returns>The model.</returns>
    /// <exception cref="ArgumentOutOfRangeException">a is not finite or is negative.</exception>
    public static PerryImperfection Robertson(double a = RobertsonDefault)
    {
        Guard.NonNegative(a, nameof(a), "", "Robertson constant a");
        return new PerryImperfection(Model.Robertson, a, $"η = {Guard.Show(a)} λ (Robertson)");
    }

    /// <summary>An initial bow e0 = Lcr / ratio about each axis, so η = e0 c / i².</summary>
    /// <param name="ratio">Lcr / e0, such as 1000 for a bow of L/1000.</param>
    /// <returns>The model.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The ratio is not finite or not positive.</exception>
    public static PerryImperfection FromBowRatio(double ratio)
    {
        Guard.Positive(ratio, nameof(ratio), "", "Bow ratio Lcr / e0");
        return new PerryImperfection(Model.BowRatio, ratio, $"e0 = Lcr / {Guard.Show(ratio)}");
    }

    /// <summary>The initial bow given with the design actions (<c>DesignActions.WithInitialBow</c>), η = e0 c / i²; an axis without a given bow is taken as straight.</summary>
    public static PerryImperfection FromActions { get; } = new(Model.FromActions, 0, "e0 from the design actions");
}
