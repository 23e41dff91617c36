using System;
using System.Collections.Generic;
using CompressionMembers.Actions;
using CompressionMembers.Internal;
using CompressionMembers.Members;

namespace CompressionMembers.Workflows.Selection;

/// <summary>One member to size: the member (its section is only a placeholder, replaced by each candidate) and all of
/// its action cases; the chosen section must pass every case.</summary>
/// <remarks>Thread safety: immutable reference type.</remarks>
[Immutable]
public sealed class SizingRequest
{
    private readonly DesignActions[] _cases;

    /// <summary>Creates a request.</summary>
    /// <param name="member">The member: material, length, restraint and name (the section is replaced).</param>
    /// <param name="cases">The action cases, at least one.</param>
    /// <exception cref="ArgumentNullException">The member, the list or a case is null.</exception>
    /// <exception cref="ArgumentException">There is no case.</exception>
    public SizingRequest(Member member, IEnumerable<DesignActions> cases)
    {
        ArgumentNullException.ThrowIfNull(member);
        ArgumentNullException.ThrowIfNull(cases);
        var list = new List<DesignActions>();
        foreach (var c in cases) list.Add(c ?? throw new ArgumentNullException(nameof(cases), $"Action case {list.Count + 1} of \"{member.Name}\" is null."));
        if (list.Count == 0) throw new ArgumentException($"Member \"{member.Name}\" has no action case to size for.", nameof(cases));
        Member = member;
        _cases = list.ToArray();
    }

    /// <summary>Creates a request with a single action case.</summary>
    /// <param name="member">The member.</param>
    /// <param name="actions">The action case.</param>
    public SizingRequest(Member member, DesignActions actions) : this(member, [actions]) { }

    /// <summary>The member (its section is replaced by each candidate).</summary>
    public Member Member { get; }

    /// <summary>The action cases.</summary>
    public IReadOnlyList<DesignActions> Cases => _cases;

    /// <summary>The cases as the request keeps them (never handed out: the selector reads each case's resolved values in
    /// place, without copying them into an array of its own per search).</summary>
    internal DesignActions[] CaseArray => _cases;
}
