using System;
using CompressionMembers.Actions;
using CompressionMembers.Methods;
using CompressionMembers.Results;
using CompressionMembers.Tests.Support;
using UnitsNet;

namespace CompressionMembers.Tests.Methods.Classical;

public class EulerBucklingTests
{
    [Fact]
    public void Evaluate_SlenderSquareBar_GivesPiSquaredEIOverLSquared()
    {
        // Hand calculation of Euler's formula, Ncr = π² E I / L² (Timoshenko & Gere §2.1):
        // 20 × 20 mm bar, I = 20⁴/12 = 13 333.3 mm⁴, L = 1000 mm, E = 200 000 MPa → Ncr = 26 318.9 N.
        var member = Fixtures.PinnedBar(20, 20, 1000);
        var r = Check.Evaluate(member, DesignActions.Compression(Force.FromKilonewtons(10)), ResistanceMethods.Euler);
        double expected = Math.PI * Math.PI * 200e9 * (0.02 * 0.02 * 0.02 * 0.02 / 12) / 1.0;
        Near.Relative(expected, r.DesignResistanceN, 1e-12, "Euler's formula, hand calculation");
        Assert.Equal(FailureMode.FlexuralBuckling, r.GoverningMode);
        Assert.True(r.Passed);
    }
}
