using System.Collections.Generic;
using CompressionMembers.Internal;

namespace CompressionMembers.Workflows.Selection;

/// <summary>The outcome of sizing one member: the lightest passing section (if any), the ranked lightest passing
/// candidates with their utilisations, and how many method evaluations the search took.</summary>
/// <remarks>Thread safety: immutable reference type.</remarks>
[Immutable]
public sealed class SizeSelection
{
    private readonly SizingCandidate[] _candidates;

    internal SizeSelection(SizingRequest request, SizingCandidate[] candidates, int evaluations, int notApplicable, bool fellBack, string objective,
        int methodFailures, string? firstMethodFailure)
    {
        MethodFailures = methodFailures;
        FirstMethodFailure = firstMethodFailure;
        Request = request;
        _candidates = candidates;
        Evaluations = evaluations;
        NotApplicable = notApplicable;
        FellBackToExhaustive = fellBack;
        ObjectiveName = objective;
    }

    /// <summary>The request.</summary>
    public SizingRequest Request { get; }

    /// <summary>Whether a passing section was found.</summary>
    public bool Found => _candidates.Length > 0;

    /// <summary>The lightest passing section, or null when none passes.</summary>
    public SizingCandidate? Chosen => _candidates.Length > 0 ? _candidates[0] : null;

    /// <summary>The lightest passing sections, lightest first (at most the selector's candidate count).</summary>
    public IReadOnlyList<SizingCandidate> Candidates => _candidates;

    /// <summary>Method evaluations the search made (one per section and action case evaluated).</summary>
    public int Evaluations { get; }

    /// <summary>Sections the search met that the method does not apply to (never chosen).</summary>
    public int NotApplicable { get; }

    /// <summary>Whether the pruned search found the method not monotone in size here and searched every section instead.</summary>
    public bool FellBackToExhaustive { get; }

    /// <summary>Sections for which the method threw (a defect of the method); they are never chosen.</summary>
    public int MethodFailures { get; }

    /// <summary>The first such failure in words (method, section, case, exception), or null.</summary>
    public string? FirstMethodFailure { get; }

    /// <summary>The objective's name.</summary>
    public string ObjectiveName { get; }

    /// <inheritdoc/>
    public override string ToString() => Chosen is { } c
        ? $"{Request.Member.Name}: {c.Entry.Designation} (utilisation {Guard.Show(c.Utilisation)})"
        : $"{Request.Member.Name}: no section of the catalogue passes";
}
