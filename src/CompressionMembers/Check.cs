using System;
using System.Diagnostics;
using System.Runtime.CompilerServices;
using CompressionMembers.Actions;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Methods.Aluminium;
using CompressionMembers.Methods.Classical;
using CompressionMembers.Methods.Timber;
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
        // The result checked its own values when it was built, so it is handed on as it is (no copy).
        return Run(in member.Resolved, in actions.Resolved, method, null);
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
        return Run(member, actions, method, trace);
    }

    // The applicability test, then the method. Through the interface, the runtime devirtualises the two calls by guessing
    // the method's class from a profile of this call site, which every caller of Check shares: in a process that had
    // checked several methods, a loop over one timber or aluminium method ran with the wrong guess (measured: EN 1995-1-2
    // 2.4x and NDS 2.1x the hand-written loop, against 1.5x and 1.2x alone; docs/performance.md). Those methods (sealed
    // classes) are therefore recognised by a type test and called directly. The classical methods stay on the interface
    // path, written first so that the JIT spends its inlining budget there first: their short checks gain most from
    // being inlined whole into the caller's loop, and a type switch over every method left them as calls.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static CheckResult Run(in ResolvedMember rm, in ResolvedActions ra, IResistanceMethod method, CalculationTrace? trace)
    {
        Applicability verdict;
        if (method is not (Ec5ColumnStability or Ec5FireReducedSection or NdsColumnStability or Eurocode9Compression or BucklingConstantMethod))
        {
            if ((verdict = method.AppliesTo(rm, ra)).IsApplicable) return method.Evaluate(rm, ra, trace);
            return ThrowNotApplicable(method, rm.Member, verdict.Reason!);
        }
        switch (method)
        {
            case Ec5ColumnStability m: if ((verdict = m.AppliesTo(rm, ra)).IsApplicable) return m.Evaluate(rm, ra, trace); break;
            case Ec5FireReducedSection m: if ((verdict = m.AppliesTo(rm, ra)).IsApplicable) return m.Evaluate(rm, ra, trace); break;
            case NdsColumnStability m: if ((verdict = m.AppliesTo(rm, ra)).IsApplicable) return m.Evaluate(rm, ra, trace); break;
            case Eurocode9Compression m: if ((verdict = m.AppliesTo(rm, ra)).IsApplicable) return m.Evaluate(rm, ra, trace); break;
            case BucklingConstantMethod m: if ((verdict = m.AppliesTo(rm, ra)).IsApplicable) return m.Evaluate(rm, ra, trace); break;
            default: throw new UnreachableException();   // the type test above admitted only these five
        }
        return ThrowNotApplicable(method, rm.Member, verdict.Reason!);
    }

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static CheckResult ThrowNotApplicable(IResistanceMethod method, Member member, string reason) =>
        throw new MethodNotApplicableException(method, member, reason);

}
