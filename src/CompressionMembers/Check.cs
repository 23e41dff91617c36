using System;
using CompressionMembers.Actions;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Resolution;
using CompressionMembers.Results;

namespace CompressionMembers;

/// <summary>
/// The front door: checks a member under design actions with a resistance method. <see cref="Evaluate(Member, DesignActions, IResistanceMethod)"/>
/// is the fast path (no trace, no allocation in the method); <see cref="EvaluateWithTrace"/> records every step for a report.
/// </summary>
/// <remarks>Thread safety: stateless; safe from any number of threads.</remarks>
public static class Check
{
    /// <summary>Checks a member without recording the steps.</summary>
    /// <param name="member">The member.</param>
    /// <param name="actions">The design actions.</param>
    /// <param name="method">The resistance method.</param>
    /// <returns>The result (Passed false with the utilisation when the member fails).</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="MethodNotApplicableException">The method does not cover the member or actions.</exception>
    /// <exception cref="InvalidOperationException">The method built a result with a non-finite or negative resistance, or a
    /// negative or NaN utilisation (a broken method; the <see cref="CheckResult"/> constructor refuses it).</exception>
    public static CheckResult Evaluate(Member member, DesignActions actions, IResistanceMethod method)
    {
        ArgumentNullException.ThrowIfNull(member);
        ArgumentNullException.ThrowIfNull(actions);
        ArgumentNullException.ThrowIfNull(method);
        ref readonly var rm = ref member.Resolved;
        ref readonly var ra = ref actions.Resolved;
        var verdict = method.AppliesTo(rm, ra);
        if (!verdict.IsApplicable) ThrowNotApplicable(method, member, verdict.Reason!);
        // The result checked its own values when it was built, so it is handed on as it is (no copy).
        return method.Evaluate(rm, ra, null);
    }

    /// <summary>Checks a member and records every step, for a report.</summary>
    /// <param name="member">The member.</param>
    /// <param name="actions">The design actions.</param>
    /// <param name="method">The resistance method.</param>
    /// <returns>The result with its steps.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="MethodNotApplicableException">The method does not cover the member or actions.</exception>
    /// <exception cref="InvalidOperationException">The method built a result with a non-finite or negative resistance, or a
    /// negative or NaN utilisation.</exception>
    public static CheckResult EvaluateWithTrace(Member member, DesignActions actions, IResistanceMethod method)
    {
        ArgumentNullException.ThrowIfNull(member);
        ArgumentNullException.ThrowIfNull(actions);
        ArgumentNullException.ThrowIfNull(method);
        return Evaluate(in member.Resolved, in actions.Resolved, method, new CalculationTrace());
    }

    /// <summary>Checks an already resolved member: the path for sweeps that resolve once and evaluate many times.</summary>
    /// <param name="member">The resolved member.</param>
    /// <param name="actions">The resolved actions.</param>
    /// <param name="method">The resistance method.</param>
    /// <param name="trace">Where to record steps, or null.</param>
    /// <returns>The result.</returns>
    /// <exception cref="ArgumentException">A resolved value is <c>default</c>.</exception>
    /// <exception cref="ArgumentNullException"><paramref name="method"/> is null.</exception>
    /// <exception cref="MethodNotApplicableException">The method does not cover the member or actions.</exception>
    /// <exception cref="InvalidOperationException">The method built a result with a non-finite or negative resistance, or a
    /// negative or NaN utilisation.</exception>
    public static CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, IResistanceMethod method, CalculationTrace? trace)
    {
        ArgumentNullException.ThrowIfNull(method);
        if (!member.IsValid) throw new ArgumentException("The resolved member is default; use ResolvedMember.From(member).", nameof(member));
        if (!actions.IsValid) throw new ArgumentException("The resolved actions are default; use ResolvedActions.From(actions).", nameof(actions));
        var verdict = method.AppliesTo(member, actions);
        if (!verdict.IsApplicable) ThrowNotApplicable(method, member.Member, verdict.Reason!);
        return method.Evaluate(member, actions, trace);
    }

    private static void ThrowNotApplicable(IResistanceMethod method, Member member, string reason) =>
        throw new MethodNotApplicableException(method, member, reason);

}
