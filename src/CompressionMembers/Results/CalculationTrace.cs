using System.Collections.Generic;
using CompressionMembers.Internal;

namespace CompressionMembers.Results;

/// <summary>Collects the ordered steps of one calculation when tracing is on. A kernel writes to it with
/// <c>trace?.Add(…)</c>, so with tracing off (a null trace) nothing is built or allocated.</summary>
/// <remarks>Thread safety: mutable; one trace belongs to one calculation on one thread.</remarks>
[Mutable]
public sealed class CalculationTrace
{
    private readonly List<CalculationStep> _steps = new(48);

    /// <summary>The steps recorded so far, in order.</summary>
    public IReadOnlyList<CalculationStep> Steps => _steps;

    /// <summary>Records a step.</summary>
    /// <param name="symbol">The symbol as the standard writes it.</param>
    /// <param name="meaning">What it is.</param>
    /// <param name="expression">The expression that gives it.</param>
    /// <param name="value">The value in SI.</param>
    /// <param name="unit">The kind of quantity.</param>
    /// <param name="reference">The clause, equation or source.</param>
    public void Add(string symbol, string meaning, string expression, double value, StepUnit unit, string reference) =>
        _steps.Add(new CalculationStep(symbol, meaning, expression, value, unit, reference));

    /// <summary>Records a remark with no value (a branch taken, a limit that applies).</summary>
    /// <param name="text">The remark.</param>
    /// <param name="reference">The clause or source.</param>
    public void Note(string text, string reference) =>
        _steps.Add(new CalculationStep("", text, "", double.NaN, StepUnit.None, reference));

    /// <summary>Removes every step, so that the trace can be reused.</summary>
    public void Clear() => _steps.Clear();
}
