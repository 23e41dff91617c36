namespace CompressionMembers.Workflows.Schedules;

/// <summary>What became of a schedule row.</summary>
/// <remarks>The default value, <see cref="Passed"/>, is a row whose utilisation is at most 1.</remarks>
public enum RowStatus
{
    /// <summary>Checked; utilisation at most 1.</summary>
    Passed = 0,
    /// <summary>Checked; utilisation above 1.</summary>
    Failed,
    /// <summary>Not checked: the row could not be read, or the method does not apply; the reason is given.</summary>
    Error,
}
