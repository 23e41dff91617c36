using System;
using CompressionMembers.Methods;
using CompressionMembers.Resolution;

namespace CompressionMembers.Tests.Support;

/// <summary>How many bytes untraced checks allocate on the calling thread (DESIGN.md "two speeds, one code path": none).</summary>
public static class Allocations
{
    /// <summary>
    /// Bytes allocated by <paramref name="count"/> warm, untraced checks. After the warm-up (JIT tiers, thread statics) a full
    /// blocking collection runs, so that anything the check keeps only weakly — the runtime's per-type caches, which it drops
    /// under memory pressure and rebuilds on next use (Enum.IsDefined reads one) — is gone and shows as an allocation here,
    /// every time, instead of now and then in a loaded test run. One batch is measured, not the least of several, so that an
    /// occasional allocation is not hidden.
    /// </summary>
    public static long OfChecks(in ResolvedMember member, in ResolvedActions actions, IResistanceMethod method, int count = 1000)
    {
        double sink = 0;
        for (int k = 0; k < 2000; k++) sink += Check.Evaluate(member, actions, method, null).Utilisation;
        GC.Collect(GC.MaxGeneration, GCCollectionMode.Forced, blocking: true, compacting: true);
        GC.WaitForPendingFinalizers();
        GC.Collect(GC.MaxGeneration, GCCollectionMode.Forced, blocking: true, compacting: true);
        long before = GC.GetAllocatedBytesForCurrentThread();
        for (int k = 0; k < count; k++) sink += Check.Evaluate(member, actions, method, null).Utilisation;
        long allocated = GC.GetAllocatedBytesForCurrentThread() - before;
        GC.KeepAlive(sink);
        return allocated;
    }
}
