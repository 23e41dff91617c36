namespace CompressionMembers.Methods.Aluminium;

/// <summary>Where a member is welded, which decides how the heat-affected zone enters the check.</summary>
/// <remarks>The default value, <see cref="None"/>, is an unwelded member.</remarks>
public enum WeldLocation
{
    /// <summary>No welds.</summary>
    None = 0,
    /// <summary>Transverse welds at the ends only (end plates, gussets): the section at each end is heat-affected over its whole area.</summary>
    EndsOnly = 1,
    /// <summary>Longitudinal welds along the member (a built-up section): a part of the section is heat-affected over the whole length.</summary>
    Longitudinal = 2,
}
