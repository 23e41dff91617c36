using System;
using System.Globalization;
using System.Threading;
using CompressionMembers.Methods.Numerical;
using CompressionMembers.Restraints;
using UnitsNet;

namespace CompressionMembers.Tests.Numerical;

/// <summary>Reports are culture-invariant; K from springs allocates nothing after the first call on a thread.</summary>
public class NumericalDeterminismTests
{
    [Fact]
    public void ToReport_UnderGermanAndRussianCultures_GivesSameBytes()
    {
        string Render() => BucklingAnalysis.Solve(NumericalReportSnapshotTests.SteppedColumn(), 2).ToReport();
        var saved = CultureInfo.CurrentCulture;
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.InvariantCulture;
            string inv = Render();
            CultureInfo.CurrentCulture = new CultureInfo("de-DE");
            Assert.Equal(inv, Render());
            CultureInfo.CurrentCulture = new CultureInfo("ru-RU");
            Assert.Equal(inv, Render());
        }
        finally { CultureInfo.CurrentCulture = saved; }
    }

    [Fact]
    public void Factor_FromSprings_AllocatesNothingAfterWarmUp()
    {
        // House rule: the numerical kernel of K from springs allocates nothing (thread-static Brent delegate).
        var bottom = EndSpring.Rotational(RotationalStiffness.FromKilonewtonMetersPerRadian(5000));
        var top = EndSpring.Elastic(RotationalStiffness.FromKilonewtonMetersPerRadian(800), ForcePerLength.FromKilonewtonsPerMeter(300));
        double k = EffectiveLength.Factor(bottom, top, 1.75e7, 6.0);
        long before = GC.GetAllocatedBytesForCurrentThread();
        for (int i = 0; i < 10; i++) k += EffectiveLength.Factor(bottom, top, 1.75e7, 6.0 + i * 0.1);
        long after = GC.GetAllocatedBytesForCurrentThread();
        Assert.Equal(0, after - before);
        Assert.True(k > 0);
        double c = AlignmentChart.BucklingFactorSway(JointRestraintFactor.Of(1), JointRestraintFactor.Of(2));
        before = GC.GetAllocatedBytesForCurrentThread();
        c += AlignmentChart.BucklingFactorSway(JointRestraintFactor.Of(1.5), JointRestraintFactor.Of(2)) + AlignmentChart.BucklingFactorBraced(JointRestraintFactor.Of(1.5), JointRestraintFactor.Of(2));
        Assert.Equal(0, GC.GetAllocatedBytesForCurrentThread() - before);
        Assert.True(c > 0);
    }

    [Fact]
    public void Solve_SameModelOnManyThreads_GivesIdenticalLoads()
    {
        double expected = BucklingAnalysis.Solve(NumericalReportSnapshotTests.SpringPost()).Lowest.LoadFactor;
        var results = new double[8];
        var threads = new Thread[8];
        for (int t = 0; t < threads.Length; t++)
        {
            int i = t;
            threads[t] = new Thread(() => results[i] = BucklingAnalysis.Solve(NumericalReportSnapshotTests.SpringPost()).Lowest.LoadFactor);
            threads[t].Start();
        }
        foreach (var th in threads) th.Join();
        foreach (double r in results) Assert.Equal(expected, r);
    }
}
