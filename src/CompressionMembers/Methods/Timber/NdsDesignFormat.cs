namespace CompressionMembers.Methods.Timber;

/// <summary>The NDS design format: allowable stress design or load and resistance factor design.</summary>
/// <remarks>The default value, <see cref="Asd"/>, is allowable stress design.</remarks>
public enum NdsDesignFormat
{
    /// <summary>Allowable stress design: reference values × CD × the other factors; actions are ASD load combinations.</summary>
    Asd = 0,
    /// <summary>Load and resistance factor design: reference values × KF × φ × λ × the other factors; actions are factored.</summary>
    Lrfd,
}
