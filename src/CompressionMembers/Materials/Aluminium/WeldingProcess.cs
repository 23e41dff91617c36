namespace CompressionMembers.Materials.Aluminium;

/// <summary>The arc-welding process, which sets the softening (ρo,haz, ρu,haz) and extent (bhaz) of the heat-affected zone.</summary>
/// <remarks>The default value, <see cref="Mig"/>, is the usual process for structural aluminium.</remarks>
public enum WeldingProcess
{
    /// <summary>Metal inert gas (MIG) welding.</summary>
    Mig = 0,
    /// <summary>Tungsten inert gas (TIG) welding.</summary>
    Tig = 1,
}
