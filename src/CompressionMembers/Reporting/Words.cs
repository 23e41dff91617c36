using CompressionMembers.Actions;
using CompressionMembers.Results;

namespace CompressionMembers.Reporting;

/// <summary>The words reports use for enum values.</summary>
public static class Words
{
    /// <summary>A mode and its axis in words, such as "flexural buckling about z".</summary>
    /// <param name="mode">The mode.</param>
    /// <param name="axis">The axis.</param>
    /// <returns>The words.</returns>
    public static string Mode(FailureMode mode, BucklingAxis axis)
    {
        string about = axis switch
        {
            BucklingAxis.Y => " about y",
            BucklingAxis.Z => " about z",
            BucklingAxis.Both => " about both axes",
            _ => "",
        };
        return mode switch
        {
            FailureMode.FlexuralBuckling => "flexural buckling" + about,
            FailureMode.TorsionalBuckling => "torsional buckling",
            FailureMode.FlexuralTorsionalBuckling => "flexural-torsional buckling",
            FailureMode.LocalBuckling => "local buckling" + about,
            FailureMode.Yielding => "yielding (squash load) of the cross-section",
            FailureMode.LateralTorsionalBuckling => "lateral-torsional buckling" + about,
            FailureMode.CombinedCompressionAndBending => "compression with bending" + about,
            FailureMode.ExtremeFibreStress => "extreme-fibre stress under eccentric load" + about,
            _ => mode.ToString(),
        };
    }

    /// <summary>A load-duration class in words.</summary>
    /// <param name="d">The class.</param>
    /// <returns>The words.</returns>
    public static string Duration(LoadDurationClass d) => DesignActions.DurationText(d);
}
