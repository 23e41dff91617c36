namespace CompressionMembers.Restraints;

/// <summary>The condition at one end of a member, for buckling about one axis.</summary>
/// <remarks>The default value, <see cref="Pinned"/>, holds translation and leaves rotation free.</remarks>
public enum EndCondition
{
    /// <summary>Translation held, rotation free.</summary>
    Pinned = 0,
    /// <summary>Translation and rotation held.</summary>
    Fixed,
    /// <summary>Translation and rotation free.</summary>
    Free,
    /// <summary>Rotation held, translation free (a sliding, or guided, end).</summary>
    Guided,
}
