namespace CompressionMembers.Materials.Timber;

/// <summary>The kind of timber product: it sets the factors that EN 1995 gives per product (βc, γM, kmod row, kh,
/// charring rate, kfi).</summary>
/// <remarks>The default value, <see cref="SolidSoftwood"/>, is strength-graded sawn softwood.</remarks>
public enum TimberProduct
{
    /// <summary>Solid (sawn) softwood graded to EN 14081-1, strength classes C of EN 338.</summary>
    SolidSoftwood = 0,
    /// <summary>Solid (sawn) hardwood graded to EN 14081-1, strength classes D of EN 338.</summary>
    SolidHardwood,
    /// <summary>Homogeneous glued laminated timber to EN 14080 (GL..h).</summary>
    GlulamHomogeneous,
    /// <summary>Combined glued laminated timber to EN 14080 (GL..c).</summary>
    GlulamCombined,
    /// <summary>Laminated veneer lumber to EN 14374 with declared values.</summary>
    Lvl,
}
