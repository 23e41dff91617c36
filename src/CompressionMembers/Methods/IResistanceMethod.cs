using CompressionMembers.Resolution;
using CompressionMembers.Results;

namespace CompressionMembers.Methods;

/// <summary>
/// A method that gives the design resistance of a compression member and its utilisation for given actions: one
/// pure function of the resolved member and actions. Built-in methods live in <see cref="ResistanceMethods"/>;
/// users can write their own and pass them wherever a built-in one goes.
/// </summary>
/// <remarks>
/// <para>Contract: <see cref="AppliesTo"/> says whether the method covers the member (material, section, actions);
/// <see cref="Evaluate"/> is only called when it does, is deterministic, has no side effects beyond writing to the
/// trace, returns finite non-negative resistance, and allocates nothing when <c>trace</c> is null.</para>
/// <para>Thread safety: implementations must be immutable and safe to call from many threads at once.</para>
/// </remarks>
public interface IResistanceMethod
{
    /// <summary>Name, standard, edition, clause and settings.</summary>
    MethodIdentity Identity { get; }

    /// <summary>Whether the method covers this member and these actions, and if not, why.</summary>
    /// <param name="member">The resolved member.</param>
    /// <param name="actions">The resolved actions.</param>
    /// <returns>The verdict.</returns>
    Applicability AppliesTo(in ResolvedMember member, in ResolvedActions actions);

    /// <summary>Evaluates the member.</summary>
    /// <param name="member">The resolved member.</param>
    /// <param name="actions">The resolved actions.</param>
    /// <param name="trace">Where to write the steps, or null for none.</param>
    /// <returns>The result.</returns>
    CheckResult Evaluate(in ResolvedMember member, in ResolvedActions actions, CalculationTrace? trace);
}
