namespace CompressionMembers.Materials.Aluminium;

/// <summary>The buckling class of an aluminium alloy and temper in EN 1999-1-1 (Table 3.2): class A for heat-treated
/// (artificially aged) alloys, class B for the others. It sets the class limits (Table 6.2), the local buckling
/// constants (Table 6.3) and the column curve (Table 6.6).</summary>
/// <remarks>The default value, <see cref="A"/>, is the class of the heat-treated tempers (T5 excepted in some tables).</remarks>
public enum BucklingClass
{
    /// <summary>Class A: heat-treated (artificially aged) alloys.</summary>
    A = 0,
    /// <summary>Class B: non-heat-treated alloys and some T5 tempers.</summary>
    B = 1,
}
