namespace CompressionMembers.Methods;

/// <summary>Whether a method applies to a member and its actions, and if not, why.</summary>
/// <remarks>The default value is "applicable". Thread safety: immutable value type.</remarks>
public readonly struct Applicability
{
    private Applicability(string reason) => Reason = reason;

    /// <summary>The method applies.</summary>
    public static Applicability Applicable => default;

    /// <summary>The method does not apply, for the given reason.</summary>
    /// <param name="reason">Why not, as a sentence the user can act on.</param>
    /// <returns>The verdict.</returns>
    public static Applicability NotApplicable(string reason) => new(string.IsNullOrEmpty(reason) ? "not applicable" : reason);

    /// <summary>Whether the method applies.</summary>
    public bool IsApplicable => Reason is null;

    /// <summary>Why not, or null when it applies.</summary>
    public string? Reason { get; }

    /// <summary>The verdict in words.</summary>
    /// <returns><c>applicable</c>, or <c>not applicable: </c> and the reason.</returns>
    public override string ToString() => Reason is null ? "applicable" : "not applicable: " + Reason;
}
