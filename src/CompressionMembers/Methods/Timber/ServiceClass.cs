namespace CompressionMembers.Methods.Timber;

/// <summary>The service class of EN 1995-1-1 §2.3.1.3: the moisture environment of the member in use.</summary>
/// <remarks>The default value, <see cref="Class1"/>, is heated indoor use.</remarks>
public enum ServiceClass
{
    /// <summary>Service class 1: moisture content matching 20 °C and 65 % relative humidity exceeded only a few weeks a year (heated interiors).</summary>
    Class1 = 0,
    /// <summary>Service class 2: 20 °C and 85 % relative humidity exceeded only a few weeks a year (covered, unheated).</summary>
    Class2,
    /// <summary>Service class 3: wetter than service class 2 (exposed to the weather).</summary>
    Class3,
}
