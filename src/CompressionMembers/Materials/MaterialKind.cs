namespace CompressionMembers.Materials;

/// <summary>The family a material belongs to; a method states which families it applies to.</summary>
/// <remarks>The default value, <see cref="Isotropic"/>, is the general metal or user-defined material.</remarks>
public enum MaterialKind
{
    /// <summary>A general isotropic material (any metal, or a user's own), described by E, G, strength and density.</summary>
    Isotropic = 0,

    /// <summary>Structural timber: solid, glued laminated or engineered wood products.</summary>
    Timber = 1,

    /// <summary>Structural aluminium alloys.</summary>
    Aluminium = 2,
}
