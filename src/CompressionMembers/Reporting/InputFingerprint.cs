using System;
using System.Security.Cryptography;
using System.Text;
using CompressionMembers.Actions;
using CompressionMembers.Internal;
using CompressionMembers.Members;
using CompressionMembers.Methods;

namespace CompressionMembers.Reporting;

/// <summary>
/// A short, stable hash of the canonical form of a check's input: the member (material, section, length,
/// restraint), the actions and the method with its settings. Two inputs with the same fingerprint are the same
/// calculation, whatever units they were typed in.
/// </summary>
/// <remarks>
/// The canonical form lists every defining value in SI to twelve significant digits, one <c>key=value</c> line each, in a
/// fixed order (see <see cref="CanonicalText"/>); the fingerprint is the first 16 hexadecimal digits of its SHA-256
/// hash, prefixed with the form's version "c1-". The library version is deliberately not part of it, so an unchanged
/// input keeps its fingerprint across releases; a release that changes the canonical form changes the prefix.
/// </remarks>
public static class InputFingerprint
{
    /// <summary>The fingerprint of a check's input.</summary>
    /// <param name="member">The member.</param>
    /// <param name="actions">The actions.</param>
    /// <param name="method">The method.</param>
    /// <returns>Such as "c1-3f2a91bc07de5541".</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    public static string Compute(Member member, DesignActions actions, IResistanceMethod method)
    {
        var text = CanonicalText(member, actions, method);
        var hash = SHA256.HashData(Encoding.UTF8.GetBytes(text));
        return "c1-" + Convert.ToHexStringLower(hash, 0, 8);
    }

    /// <summary>The canonical text the fingerprint hashes, for inspection.</summary>
    /// <param name="member">The member.</param>
    /// <param name="actions">The actions.</param>
    /// <param name="method">The method.</param>
    /// <returns>One key=value line per defining value.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    public static string CanonicalText(Member member, DesignActions actions, IResistanceMethod method)
    {
        ArgumentNullException.ThrowIfNull(member);
        ArgumentNullException.ThrowIfNull(actions);
        ArgumentNullException.ThrowIfNull(method);
        var form = new CanonicalForm();
        member.AddCanonical(form);
        actions.AddCanonical(form);
        form.Add("method.type", method.GetType().FullName ?? method.GetType().Name);
        method.Identity.AddCanonical(form);
        return form.ToString();
    }
}
