using System;
using CompressionMembers.Members;

namespace CompressionMembers.Methods;

/// <summary>Thrown when a method is asked to check a member or actions it does not cover (a non-timber material for a
/// timber method, a section the clause does not address, bending for a concentric-only method).</summary>
public sealed class MethodNotApplicableException : ArgumentException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="method">The method that refused.</param>
    /// <param name="member">The member it refused.</param>
    /// <param name="reason">Why.</param>
    public MethodNotApplicableException(IResistanceMethod method, Member member, string reason)
        : base($"{method?.Identity.Name ?? "The method"} does not apply to \"{member?.Name}\": {reason}", nameof(method))
    {
        Method = method;
        Member = member;
        Reason = reason;
    }

    /// <summary>The method that refused.</summary>
    public IResistanceMethod? Method { get; }
    /// <summary>The member it refused.</summary>
    public Member? Member { get; }
    /// <summary>Why.</summary>
    public string Reason { get; }
}
