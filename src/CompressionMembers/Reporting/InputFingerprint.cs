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
        // A schedule computes one fingerprint per row, so the text, its UTF-8 bytes and the hash live in buffers kept per
        // thread; only the result string is allocated. (Taken out of the slot while in use, in case a user's material
        // computes a fingerprint of its own while being written.)
        var text = t_text ?? new StringBuilder(2048);
        t_text = null;
        try
        {
            text.Clear();
            Write(new CanonicalForm(text), member, actions, method);
            var chars = t_chars is { } c && c.Length >= text.Length ? c : (t_chars = new char[Math.Max(2048, text.Length)]);
            text.CopyTo(0, chars, 0, text.Length);
            int maxBytes = Encoding.UTF8.GetMaxByteCount(text.Length);
            var bytes = t_bytes is { } b && b.Length >= maxBytes ? b : (t_bytes = new byte[Math.Max(6144, maxBytes)]);
            int n = Encoding.UTF8.GetBytes(chars, 0, text.Length, bytes, 0);
            Span<byte> hash = stackalloc byte[32];
            SHA256.HashData(bytes.AsSpan(0, n), hash);
            Span<char> hex = stackalloc char[16];
            if (!Convert.TryToHexStringLower(hash[..8], hex, out _)) throw new InvalidOperationException("16 hex digits did not fit");
            return string.Concat("c1-", hex);
        }
        finally
        {
            if (text.Capacity <= 1 << 16) t_text = text;
        }
    }

    [ThreadStatic] private static StringBuilder? t_text;
    [ThreadStatic] private static char[]? t_chars;
    [ThreadStatic] private static byte[]? t_bytes;

    private static void Write(CanonicalForm form, Member member, DesignActions actions, IResistanceMethod method)
    {
        ArgumentNullException.ThrowIfNull(member);
        ArgumentNullException.ThrowIfNull(actions);
        ArgumentNullException.ThrowIfNull(method);
        member.AddCanonical(form);
        actions.AddCanonical(form);
        form.Add("method.type", method.GetType().FullName ?? method.GetType().Name);
        form.AddSegment(method.Identity.CanonicalSegment);
    }

    /// <summary>The canonical text the fingerprint hashes, for inspection.</summary>
    /// <param name="member">The member.</param>
    /// <param name="actions">The actions.</param>
    /// <param name="method">The method.</param>
    /// <returns>One key=value line per defining value.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    public static string CanonicalText(Member member, DesignActions actions, IResistanceMethod method)
    {
        var form = new CanonicalForm();
        Write(form, member, actions, method);
        return form.ToString();
    }
}
