using System;
using System.Collections.Generic;
using System.Threading;
using System.Threading.Tasks;
using CompressionMembers.Actions;
using CompressionMembers.Members;
using CompressionMembers.Methods;
using CompressionMembers.Results;
using UnitsNet;
using Xunit.Abstractions;

namespace CompressionMembers.Tests.Trust;

/// <summary>Shared members of every family checked from many threads at once give bit-identical results to one thread
/// (the methods are documented stateless; the secant root and the FE solver use thread-static scratch).</summary>
public class ConcurrencyTests(ITestOutputHelper output)
{
    private static IEnumerable<(Member Member, DesignActions Actions, IResistanceMethod Method)> Work()
    {
        foreach (var (_, m, a, method) in TrustCases.All)
            for (int i = 0; i < 6; i++)
            {
                var longer = m.WithLength(m.Length * (0.8 + 0.1 * i));
                yield return (longer, a.WithAxialCompression(a.AxialCompression * (0.5 + 0.1 * i)), method);
            }
    }

    private static long[] Bits(in CheckResult r) =>
    [
        BitConverter.DoubleToInt64Bits(r.DesignResistanceN), BitConverter.DoubleToInt64Bits(r.Utilisation),
        BitConverter.DoubleToInt64Bits(r.AboutY.ResistanceN), BitConverter.DoubleToInt64Bits(r.AboutZ.ResistanceN),
        BitConverter.DoubleToInt64Bits(r.AboutY.CriticalForceN), BitConverter.DoubleToInt64Bits(r.AboutZ.CriticalForceN),
        (long)r.GoverningAxis, (long)r.GoverningMode,
    ];

    [Fact]
    public void SharedMembersOfEveryFamily_CheckedFromManyThreads_AreBitIdenticalToOneThread()
    {
        var work = new List<(Member, DesignActions, IResistanceMethod)>(Work());
        var serial = new long[work.Count][];
        var serialTraced = new int[work.Count];
        for (int i = 0; i < work.Count; i++)
        {
            var (m, a, method) = work[i];
            serial[i] = Bits(Check.Evaluate(m, a, method));
            serialTraced[i] = Check.EvaluateWithTrace(m, a, method).Steps.Count;
        }
        int compared = 0;
        for (int round = 0; round < 4; round++)
        {
            var parallel = new long[work.Count * 4][];
            var traced = new int[work.Count * 4];
            Parallel.For(0, parallel.Length, new ParallelOptions { MaxDegreeOfParallelism = 8 }, j =>
            {
                var (m, a, method) = work[(j * 7 + round) % work.Count];
                parallel[j] = Bits(Check.Evaluate(m, a, method));
                traced[j] = Check.EvaluateWithTrace(m, a, method).Steps.Count;
            });
            for (int j = 0; j < parallel.Length; j++)
            {
                int i = (j * 7 + round) % work.Count;
                Assert.Equal(serial[i], parallel[j]);
                Assert.Equal(serialTraced[i], traced[j]);
                compared++;
            }
        }
        output.WriteLine($"{work.Count} distinct checks over {TrustCases.All.Count} families; {compared} parallel results compared bit for bit");
    }
}
