using CompressionMembers.Results;

namespace CompressionMembers.Methods;

/// <summary>One setting a method was created with, such as a partial factor, with whether it is the standard's
/// recommended value and a note of where it comes from.</summary>
/// <remarks>The default value has empty strings and a zero value. Thread safety: immutable value type.</remarks>
/// <param name="Symbol">Symbol as the standard writes it, such as "γM1".</param>
/// <param name="Meaning">What it is.</param>
/// <param name="Value">Value in SI; NaN when the setting has no single value (it is taken per member, from the
/// material or the design actions, as <paramref name="Meaning"/> says). Reports show NaN as "—".</param>
/// <param name="Unit">Kind of quantity.</param>
/// <param name="IsRecommendedValue">Whether this is the standard's recommended value (false when overridden).</param>
/// <param name="Note">Where it comes from, such as "EN 1999-1-1 §6.1.3 recommended; a national annex may change it".</param>
public readonly record struct MethodSetting(string Symbol, string Meaning, double Value, StepUnit Unit, bool IsRecommendedValue, string Note);
