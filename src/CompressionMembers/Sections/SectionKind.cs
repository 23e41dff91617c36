namespace CompressionMembers.Sections;

/// <summary>The shape family of a cross-section; a method states which families it applies to.</summary>
/// <remarks>The default value, <see cref="SolidRectangle"/>, is the solid rectangle.</remarks>
public enum SectionKind
{
    /// <summary>A solid rectangle (sawn timber, glulam, a flat bar).</summary>
    SolidRectangle = 0,
    /// <summary>A solid circle (a round bar, a pole).</summary>
    SolidCircle,
    /// <summary>A circular hollow section (a round tube).</summary>
    CircularHollow,
    /// <summary>A rectangular hollow section (a box tube), sharp corners.</summary>
    RectangularHollow,
    /// <summary>A doubly symmetric I or H section, optionally with root fillets.</summary>
    DoublySymmetricI,
    /// <summary>A channel (C or U) section, symmetric about its major axis.</summary>
    Channel,
    /// <summary>An equal or unequal angle (L) section.</summary>
    Angle,
    /// <summary>A tee section.</summary>
    Tee,
    /// <summary>A general polygon with holes, properties by Green's theorem.</summary>
    Polygon,
    /// <summary>A section given directly by its properties.</summary>
    ByProperties,
}
