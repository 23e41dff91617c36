namespace CompressionMembers.Materials.Aluminium;

/// <summary>The product form of an aluminium alloy, which selects the table of characteristic values.</summary>
/// <remarks>The default value, <see cref="Extrusion"/>, is an extruded profile or tube.</remarks>
public enum AluminiumProductForm
{
    /// <summary>Extruded profile, bar or tube (EN 1999-1-1 Table 3.2b).</summary>
    Extrusion = 0,
    /// <summary>Sheet, strip or plate (EN 1999-1-1 Table 3.2a).</summary>
    SheetStripPlate = 1,
}
