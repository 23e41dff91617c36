using System;
using Xunit.Sdk;

namespace CompressionMembers.Tests.Support;

/// <summary>Assertions with explicit tolerances; every call names where the expected value comes from.</summary>
public static class Near
{
    /// <summary>Asserts |actual − expected| ≤ rel·|expected|.</summary>
    public static void Relative(double expected, double actual, double rel, string source)
    {
        if (double.IsNaN(actual) || Math.Abs(actual - expected) > rel * Math.Abs(expected))
            throw new XunitException($"Expected {expected:R} (±{rel:P4} relative; source: {source}) but got {actual:R} (off by {(actual - expected) / expected:P4}).");
    }

    /// <summary>Asserts |actual − expected| ≤ abs.</summary>
    public static void Absolute(double expected, double actual, double abs, string source)
    {
        if (double.IsNaN(actual) || Math.Abs(actual - expected) > abs)
            throw new XunitException($"Expected {expected:R} (±{abs:R}; source: {source}) but got {actual:R}.");
    }
}
