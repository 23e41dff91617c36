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
    // checked several methods, a loop over one method ran with the wrong guess (measured: EN 1995-1-2 2.4x and NDS 2.1x
    // the hand-written loop, against 1.5x and 1.2x alone; Euler 1.8-3.2x after a fire check; docs/performance.md). The
    // built-in closed forms (sealed classes) are therefore recognised by a type test and called directly, so that their
    // speed does not depend on what else the process has checked. Only the secant and tangent-modulus methods (a root
    // search of hundreds of nanoseconds, against which a call is nothing), the numerical models and a user's own methods
    // stay on the interface path.
    //
    // The straight-line paths of those eight methods write their numbers (CheckNumbers: no references) and the result is
    // built here, once for all, inlined into the caller: a method that returned the 240-byte result built it in a
    // zeroed temporary and copied it over, which cost a fire check about a fifth of its time (docs/performance.md, third
    // round). For an untraced check each of the eight calls a kernel that calls nothing (fourth round): it returns null
    // for everything it does not compute itself — a path beside the straight line, numbers a result refuses, and for
    // NDS, which tests its own applicability, a refusal — and OtherPath hands those to the method (its Evaluate or
    // general path, which write the steps, refuse or throw). Traced checks of EN 1995-1-2 and NDS go there too.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static CheckResult Run(in ResolvedMember rm, in ResolvedActions ra, IResistanceMethod method, CalculationTrace? trace)
    {
        Applicability verdict;
        if (method is not (Ec5ColumnStability or Ec5FireReducedSection or NdsColumnStability or Eurocode9Compression or BucklingConstantMethod
            or EulerBuckling or JohnsonParabola or PerryRobertson))
        {
            if ((verdict = method.AppliesTo(rm, ra)).IsApplicable) return method.Evaluate(rm, ra, trace);
            return ThrowNotApplicable(method, rm.Member, verdict.Reason!);
        }
        // Each case: the applicability test, then the method's numbers (null: a path that returns its result itself).
        Unsafe.SkipInit(out CheckNumbers numbers);
        string? check;
        switch (method)
        {
            case Ec5ColumnStability m:
                check = (verdict = m.AppliesTo(rm, ra)).IsApplicable ? trace is null ? m.UntracedNumbers(rm, ra, ref numbers) : m.Numbers(rm, ra, trace, ref numbers) : null;
                break;
            case Ec5FireReducedSection m:
                if (trace is null) check = m.ApplicableNumbers(rm, ra, ref numbers, out verdict);   // the material type-tested once
                else { verdict = m.AppliesTo(rm, ra); check = null; }
                break;
            case NdsColumnStability m: verdict = default; check = trace is null ? m.ApplicableNumbers(rm, ra, ref numbers) : null; break;
            case Eurocode9Compression m:
                if (trace is null) check = m.ApplicableNumbers(rm, ra, ref numbers, out verdict);   // the classification looked up once
                else check = (verdict = m.AppliesTo(rm, ra)).IsApplicable ? m.Numbers(rm, ra, trace, ref numbers) : null;
                break;
            case BucklingConstantMethod m:
                check = (verdict = m.AppliesTo(rm, ra)).IsApplicable ? trace is null ? m.UntracedNumbers(rm, ra, ref numbers) : m.Numbers(rm, ra, trace, ref numbers) : null;
                break;
            case EulerBuckling m:
                check = (verdict = m.AppliesTo(rm, ra)).IsApplicable ? trace is null ? m.UntracedNumbers(rm, ra, ref numbers) : m.Numbers(rm, ra, trace, ref numbers) : null;
                break;
            case JohnsonParabola m:
                check = (verdict = m.AppliesTo(rm, ra)).IsApplicable ? trace is null ? m.UntracedNumbers(rm, ra, ref numbers) : m.Numbers(rm, ra, trace, ref numbers) : null;
                break;
            case PerryRobertson m:
                check = (verdict = m.AppliesTo(rm, ra)).IsApplicable ? trace is null ? m.UntracedNumbers(rm, ra, ref numbers) : m.Numbers(rm, ra, trace, ref numbers) : null;
                break;
            default: throw new UnreachableException();   // the type test above admitted only these eight
        }
        if (!verdict.IsApplicable) return ThrowNotApplicable(method, rm.Member, verdict.Reason!);
        return check is not null ? numbers.ToResult(rm, ra, method, check, trace) : OtherPath(rm, ra, method, trace);
    }

    // What the untraced kernels leave to the method (see Run), and the traced checks of EN 1995-1-2 and NDS: the method's
    // own Evaluate (which writes the steps and throws for a broken result), or EN 1999-1-1's general path (welds, open
    // sections, bending).
    [MethodImpl(MethodImplOptions.NoInlining)]
    private static CheckResult OtherPath(in ResolvedMember rm, in ResolvedActions ra, IResistanceMethod method, CalculationTrace? trace) =>
        method switch
        {
            Ec5FireReducedSection m => m.Evaluate(rm, ra, trace),   // applicability tested in Run
            NdsColumnStability m => m.AppliesTo(rm, ra) is { IsApplicable: false } v ? ThrowNotApplicable(method, rm.Member, v.Reason!) : m.Evaluate(rm, ra, trace),
            Eurocode9Compression m => m.EvaluateGeneral(rm, ra, trace),
            Ec5ColumnStability or BucklingConstantMethod or EulerBuckling or JohnsonParabola or PerryRobertson
                => method.Evaluate(rm, ra, trace),   // numbers a result refuses
            _ => throw new UnreachableException(),
        };

    [MethodImpl(MethodImplOptions.NoInlining)]
    private static CheckResult ThrowNotApplicable(IResistanceMethod method, Member member, string reason) =>
        throw new MethodNotApplicableException(method, member, reason);

}
