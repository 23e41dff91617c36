using System;
using System.Collections.Generic;
using System.Globalization;
using System.Runtime.CompilerServices;
using CompressionMembers.Actions;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Resolution;
using UnitsNet;

namespace CompressionMembers.Results;

/// <summary>
/// The one result type of every method: design resistance, utilisation for the given actions, pass or fail, the
/// governing axis, mode and check, what was found about each axis, the method's identity, and — when tracing was
/// on — the ordered calculation steps. It carries the member and actions it was computed from, so a report can
/// be rebuilt from the result alone.
/// </summary>
/// <remarks>
/// <para><see cref="Utilisation"/> is demand over resistance for a pure compression check (N_Ed / N_Rd) and the
/// value of the governing interaction expression where bending is present; the member passes when it is at most 1.
/// A NaN utilisation never passes.</para>
/// <para>Equality: none is defined (results hold doubles); compare with <see cref="AgreesWith"/> and an explicit
/// tolerance, or order with <see cref="ByUtilisation"/>.</para>
/// <para>The default value has a null <see cref="Member"/>; it is never returned by a method. Thread safety: immutable value type.</para>
/// </remarks>
public readonly struct CheckResult
{
    private static readonly CalculationStep[] NoSteps = [];

    /// <summary>Creates a result (for method authors).</summary>
    /// <param name="member">The resolved member the method evaluated.</param>
    /// <param name="actions">The resolved actions.</param>
    /// <param name="method">The method.</param>
    /// <param name="designResistanceN">Design axial resistance of the governing check, N.</param>
    /// <param name="utilisation">Governing utilisation.</param>
    /// <param name="governingAxis">Governing axis.</param>
    /// <param name="governingMode">Governing mode.</param>
    /// <param name="governingCheck">The governing check in words, such as "EN 1995-1-1 Eq. (6.24)" (a constant string).</param>
    /// <param name="aboutY">Outcome about y (default if not checked).</param>
    /// <param name="aboutZ">Outcome about z (default if not checked).</param>
    /// <param name="torsional">Outcome for torsional or flexural-torsional buckling (default if not checked).</param>
    /// <param name="trace">The trace the steps were written to, or null.</param>
    /// <exception cref="InvalidOperationException">The resistance is negative or not finite, or the utilisation is negative
    /// or NaN: the method that builds such a result is broken. (Checked here, once, so that <see cref="Check"/> can hand the
    /// result on without copying it.)</exception>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]   // a call would copy three outcomes and pass five references through write barriers
    public CheckResult(in ResolvedMember member, in ResolvedActions actions, IResistanceMethod method,
        double designResistanceN, double utilisation, BucklingAxis governingAxis, FailureMode governingMode, string governingCheck,
        AxisOutcome aboutY, AxisOutcome aboutZ, AxisOutcome torsional, CalculationTrace? trace)
    {
        Member = member.Member;
        Actions = actions.Actions;
        Method = method;
        DesignResistanceN = designResistanceN;
        Utilisation = utilisation;
        GoverningAxis = governingAxis;
        GoverningMode = governingMode;
        GoverningCheck = governingCheck ?? "";
        AboutY = aboutY;
        AboutZ = aboutZ;
        Torsional = torsional;
        Steps = trace is null ? NoSteps : trace.Steps;
        if (IsBroken(designResistanceN, utilisation)) ThrowBroken(method, member.Member, designResistanceN, utilisation);
    }

    // From the numbers of a built-in method's straight-line path, which checked them with IsBroken before returning them
    // (CheckNumbers.Validate), so that no call sits between the numbers and the caller's use of the result.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal CheckResult(in ResolvedMember member, in ResolvedActions actions, IResistanceMethod method, in CheckNumbers numbers,
        string governingCheck, CalculationTrace? trace)
    {
        Member = member.Member;
        Actions = actions.Actions;
        Method = method;
        DesignResistanceN = numbers.DesignResistanceN;
        Utilisation = numbers.Utilisation;
        GoverningAxis = numbers.GoverningAxis;
        GoverningMode = numbers.GoverningMode;
        GoverningCheck = governingCheck;
        AboutY = numbers.AboutY;
        AboutZ = numbers.AboutZ;
        Torsional = numbers.Torsional;
        Steps = trace is null ? NoSteps : trace.Steps;
    }

    /// <summary>Whether a resistance and utilisation are those of a broken method: the resistance negative, NaN or
    /// infinite, or the utilisation negative or NaN.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static bool IsBroken(double designResistanceN, double utilisation) =>
        !(designResistanceN >= 0) || double.IsPositiveInfinity(designResistanceN) || !(utilisation >= 0);

    [MethodImpl(MethodImplOptions.NoInlining)]
    internal static void ThrowBroken(IResistanceMethod method, Member member, double resistanceN, double utilisation) =>
        throw new InvalidOperationException(string.Create(CultureInfo.InvariantCulture,
            $"{method?.Identity.Name ?? "A method"} returned resistance {resistanceN} N and utilisation {utilisation} for \"{member?.Name}\": a method must return a finite, non-negative resistance and a utilisation that is neither negative nor NaN."));

    /// <summary>The member checked.</summary>
    public Member Member { get; }
    /// <summary>The actions checked.</summary>
    public DesignActions Actions { get; }
    /// <summary>The method used.</summary>
    public IResistanceMethod Method { get; }
    /// <summary>Design axial resistance of the governing check, N.</summary>
    public double DesignResistanceN { get; }
    /// <summary>Design axial resistance of the governing check.</summary>
    public Force DesignResistance => Force.FromKilonewtons(DesignResistanceN / 1e3);
    /// <summary>Governing utilisation (demand / resistance, or the interaction value).</summary>
    public double Utilisation { get; }
    /// <summary>Whether the utilisation is at most 1 (false for NaN).</summary>
    public bool Passed => Utilisation <= 1.0;
    /// <summary>Governing axis.</summary>
    public BucklingAxis GoverningAxis { get; }
    /// <summary>Governing mode.</summary>
    public FailureMode GoverningMode { get; }
    /// <summary>The governing check in words (branch, equation).</summary>
    public string GoverningCheck { get; }
    /// <summary>What was found about y.</summary>
    public AxisOutcome AboutY { get; }
    /// <summary>What was found about z.</summary>
    public AxisOutcome AboutZ { get; }
    /// <summary>What was found for torsional or flexural-torsional buckling.</summary>
    public AxisOutcome Torsional { get; }
    /// <summary>The ordered calculation steps; empty when tracing was off.</summary>
    public IReadOnlyList<CalculationStep> Steps { get; }
    /// <summary>Whether the steps were recorded.</summary>
    public bool IsTraced => Steps.Count > 0;

    /// <summary>Whether two results agree: same governing axis and mode, and resistance and utilisation within a relative tolerance.</summary>
    /// <param name="other">The other result.</param>
    /// <param name="relativeTolerance">Relative tolerance, such as 1e-12.</param>
    /// <returns>Whether they agree.</returns>
    public bool AgreesWith(in CheckResult other, double relativeTolerance) =>
        GoverningAxis == other.GoverningAxis && GoverningMode == other.GoverningMode
        && Close(DesignResistanceN, other.DesignResistanceN, relativeTolerance) && Close(Utilisation, other.Utilisation, relativeTolerance);

    private static bool Close(double a, double b, double tol) =>
        a.Equals(b) || Math.Abs(a - b) <= tol * Math.Max(Math.Abs(a), Math.Abs(b));

    /// <summary>One line for a script's output or a debugger — member, utilisation and verdict, resistance and demand, the
    /// governing check and the method — in the same text on every machine and culture (numbers to six significant
    /// figures, kN). Not a calculation: render the result with a report for its derivation.</summary>
    /// <returns>Such as <c>post: utilisation 0.408122, passes; NRd = 245.036 kN, NEd = 100 kN; EN 1995-1-1 6.3.2 (6.26) … [EN 1995-1-1 timber column]</c>,
    /// or <c>(no result)</c> for the default value.</returns>
    // Never throws: a result a user's method built from default resolved actions or without a method still prints.
    public override string ToString() => Member is null ? "(no result)" :
        $"{Member.Name}: utilisation {Internal.Guard.Show(Utilisation)}, {(Passed ? "passes" : "FAILS")}; NRd = {Internal.Guard.Show(DesignResistanceN / 1e3)} kN, " +
        $"NEd = {(Actions is null ? "—" : Internal.Guard.Show(Actions.Resolved.AxialForceN / 1e3))} kN; {GoverningCheck} [{Method?.Identity?.Name ?? "method without a name"}]";

    /// <summary>Orders results by utilisation, lowest first (NaN last).</summary>
    public static IComparer<CheckResult> ByUtilisation { get; } =
        Comparer<CheckResult>.Create((a, b) => (double.IsNaN(a.Utilisation), double.IsNaN(b.Utilisation)) switch
        {
            (true, true) => 0,
            (true, false) => 1,
            (false, true) => -1,
            _ => a.Utilisation.CompareTo(b.Utilisation),
        });
}
