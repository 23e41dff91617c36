namespace CompressionMembers.Materials.Timber;

/// <summary>The product family of US reference design values (NDS): it sets the column-stability constant c of NDS 3.7.1.</summary>
/// <remarks>The default value, <see cref="SawnLumber"/>, is visually or machine graded sawn lumber.</remarks>
public enum NdsProduct
{
    /// <summary>Sawn lumber (dimension lumber and timbers): c = 0.8.</summary>
    SawnLumber = 0,
    /// <summary>Round timber poles and piles: c = 0.85.</summary>
    RoundTimberPole,
    /// <summary>Structural glued laminated timber: c = 0.9.</summary>
    Glulam,
    /// <summary>Structural composite lumber (LVL, PSL, LSL): c = 0.9.</summary>
    StructuralCompositeLumber,
}
