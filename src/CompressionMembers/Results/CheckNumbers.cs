using System.Runtime.CompilerServices;
using CompressionMembers.Methods;
using CompressionMembers.Resolution;

namespace CompressionMembers.Results;

/// <summary>
/// The numbers of a check without its references: what a method's straight-line path computes, written by a kernel that
/// is not inlined, and turned into a <see cref="CheckResult"/> where the result is used (in <see cref="Check"/>, inlined
/// into the caller's loop).
/// </summary>
/// <remarks>A kernel that returns a <see cref="CheckResult"/> builds its 240 bytes, five references among them, in a zeroed
/// temporary and copies it into the caller's buffer with wide moves over narrow stores. For a fire check that hand-over
/// was about a fifth of the time (2,000 checks: 70 µs returning the result, 57–61 µs writing these numbers; plain loop,
/// fire alone in its process). A kernel that writes these numbers (no references, nothing zeroed, no block copy) leaves
/// the result to be built where the JIT keeps its fields in registers (docs/performance.md, third round).</remarks>
internal struct CheckNumbers
{
    internal double DesignResistanceN, Utilisation;
    internal BucklingAxis GoverningAxis;
    internal FailureMode GoverningMode;
    internal AxisOutcome AboutY, AboutZ, Torsional;

    /// <summary>Refuses the numbers of a broken method, as the <see cref="CheckResult"/> constructor does; the kernel calls
    /// it before it returns, so that building the result needs no test.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal readonly void Validate(IResistanceMethod method, in ResolvedMember member)
    {
        if (CheckResult.IsBroken(DesignResistanceN, Utilisation)) CheckResult.ThrowBroken(method, member.Member, DesignResistanceN, Utilisation);
    }

    /// <summary>The end of a kernel compiled for <typeparamref name="TEntry"/> (Methods/Common/KernelEntry.cs): for Check's
    /// untraced entry, whether a result would accept the numbers (the kernel returns null when not, and the method's own
    /// path throws), with no call; for the method's entry, <see cref="Validate"/>, which throws for a broken result.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal readonly bool Accepted<TEntry>(IResistanceMethod method, in ResolvedMember member) where TEntry : struct
    {
        if (typeof(TEntry) == typeof(Methods.Common.CheckEntry)) return !CheckResult.IsBroken(DesignResistanceN, Utilisation);
        Validate(method, member);
        return true;
    }

    /// <summary>The result, for the method that computed (and validated) these numbers.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal readonly CheckResult ToResult(in ResolvedMember member, in ResolvedActions actions, IResistanceMethod method, string governingCheck,
        CalculationTrace? trace) =>
        new(member, actions, method, this, governingCheck, trace);
}
