using System;

namespace CompressionMembers.Results;

/// <summary>One step of a calculation as a checker reads it: symbol, meaning, expression, value with unit, and the
/// clause or source it comes from.</summary>
/// <remarks>The value is stored in SI (see <see cref="StepUnit"/>); renderers convert for display.
/// Thread safety: immutable reference type.</remarks>
[CompressionMembers.Internal.Immutable]
public sealed class CalculationStep : IEquatable<CalculationStep>
{
    /// <summary>Creates a step.</summary>
    /// <param name="symbol">The symbol as the standard writes it, such as "λrel,z".</param>
    /// <param name="meaning">What it is, in words.</param>
    /// <param name="expression">The expression that gives it, as text ("input" for an input).</param>
    /// <param name="value">The value in SI.</param>
    /// <param name="unit">The kind of quantity.</param>
    /// <param name="reference">The clause, equation or source.</param>
    public CalculationStep(string symbol, string meaning, string expression, double value, StepUnit unit, string reference)
    {
        Symbol = symbol ?? "";
        Meaning = meaning ?? "";
        Expression = expression ?? "";
        Value = value;
        Unit = unit;
        Reference = reference ?? "";
    }

    /// <summary>The symbol.</summary>
    public string Symbol { get; }
    /// <summary>What it is.</summary>
    public string Meaning { get; }
    /// <summary>The expression that gives it.</summary>
    public string Expression { get; }
    /// <summary>The value in SI.</summary>
    public double Value { get; }
    /// <summary>The kind of quantity.</summary>
    public StepUnit Unit { get; }
    /// <summary>The clause, equation or source.</summary>
    public string Reference { get; }

    /// <summary>Field-by-field equality (the value compared exactly, bit for bit).</summary>
    /// <param name="other">The other step.</param>
    /// <returns>Whether all fields are equal.</returns>
    public bool Equals(CalculationStep? other) =>
        other is not null && Symbol == other.Symbol && Meaning == other.Meaning && Expression == other.Expression
        && Value.Equals(other.Value) && Unit == other.Unit && Reference == other.Reference;

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as CalculationStep);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Symbol, Meaning, Expression, Value, Unit, Reference);

    /// <summary>The step in one line: symbol, value in SI units (the shortest text that reads back as the same double) and
    /// meaning, written the same in every culture.</summary>
    /// <returns>The line.</returns>
    public override string ToString() => string.Create(System.Globalization.CultureInfo.InvariantCulture, $"{Symbol} = {Value} ({Meaning})");
}
