using CompressionMembers.Actions;
using CompressionMembers.Internal;
using CompressionMembers.Members;
using CompressionMembers.Methods;

namespace CompressionMembers.Workflows.Schedules;

/// <summary>One row of a member schedule: a member under one action case with a method, or the reason the row could not
/// be read. Every input row becomes exactly one item; none is dropped.</summary>
/// <remarks>Thread safety: immutable reference type.</remarks>
[Immutable]
public sealed class ScheduleItem
{
    internal ScheduleItem(long line, string location, string memberName, string caseName, Member? member, DesignActions? actions, IResistanceMethod? method, string? error)
    {
        Line = line;
        Location = location;
        MemberName = memberName;
        CaseName = caseName;
        Member = member;
        Actions = actions;
        Method = method;
        Error = error;
    }

    /// <summary>The 1-based line of the input where the row starts.</summary>
    public long Line { get; }

    /// <summary>Where the row is: "line 7" for CSV, "members[2].cases[0]" for JSON.</summary>
    public string Location { get; }

    /// <summary>The member's name as written (may be empty in an error row).</summary>
    public string MemberName { get; }

    /// <summary>The action case's name as written.</summary>
    public string CaseName { get; }

    /// <summary>The member, or null in an error row.</summary>
    public Member? Member { get; }

    /// <summary>The actions, or null in an error row.</summary>
    public DesignActions? Actions { get; }

    /// <summary>The method, or null in an error row.</summary>
    public IResistanceMethod? Method { get; }

    /// <summary>Why the row could not be read, or null.</summary>
    public string? Error { get; }

    /// <summary>Whether the row was read into a member, actions and method.</summary>
    public bool IsValid => Error is null;
}
