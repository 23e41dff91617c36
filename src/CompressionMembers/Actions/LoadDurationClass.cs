namespace CompressionMembers.Actions;

/// <summary>The load-duration class of the action that governs a combination (EN 1995-1-1 §2.3.1.2, Table 2.1).</summary>
/// <remarks>The default value, <see cref="Unspecified"/>, means the actions carry no duration; a timber method then refuses them.</remarks>
public enum LoadDurationClass
{
    /// <summary>No duration given.</summary>
    Unspecified = 0,
    /// <summary>Permanent: more than 10 years (self-weight).</summary>
    Permanent,
    /// <summary>Long-term: 6 months to 10 years (storage).</summary>
    LongTerm,
    /// <summary>Medium-term: 1 week to 6 months (imposed floor load, snow in many annexes).</summary>
    MediumTerm,
    /// <summary>Short-term: less than 1 week (snow in some annexes, wind in many).</summary>
    ShortTerm,
    /// <summary>Instantaneous (wind in some annexes, accidental actions).</summary>
    Instantaneous,
}
