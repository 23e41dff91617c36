namespace CompressionMembers;

/// <summary>Facts about this build of the library that reports print.</summary>
public static class LibraryInfo
{
    /// <summary>The package version (semantic versioning), as printed in every report. A test holds it equal to the assembly version.</summary>
    public const string Version = "0.1.0";

    /// <summary>The caution every report and the README carry.</summary>
    public const string Caution =
        "CAUTION: This calculation supports, and does not replace, the judgement of a licensed structural engineer. " +
        "Verify it against the governing local code, its national annex and the current edition before relying on it.";
}
