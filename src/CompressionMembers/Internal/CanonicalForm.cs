using System.Globalization;
using System.Text;

namespace CompressionMembers.Internal;

/// <summary>
/// A canonical, culture-invariant text form of an input, one <c>key=value</c> line each, with every number in SI
/// written to twelve significant digits. The input fingerprint is a hash of it, so the same input always gives the same
/// fingerprint whatever units it was given in.
/// </summary>
internal sealed class CanonicalForm
{
    private readonly StringBuilder _text;

    internal CanonicalForm() => _text = new StringBuilder();

    /// <summary>A form that writes into <paramref name="text"/> (a builder reused from check to check).</summary>
    internal CanonicalForm(StringBuilder text) => _text = text;

    internal CanonicalForm Add(string key, double siValue)
    {
        // Twelve significant digits absorb the last-bit noise of unit conversion (25.4 mm per inch, 6894.757 Pa per
        // psi), so the same member typed in other units gives the same fingerprint; -0 is written as 0. (The same
        // text as siValue.ToString("G12", invariant), formatted in place.)
        if (siValue == 0) siValue = 0;
        _text.Append(key).Append('=').Append(CultureInfo.InvariantCulture, $"{siValue:G12}").Append('\n');
        return this;
    }

    internal CanonicalForm Add(string key, string value)
    {
        _text.Append(key).Append('=').Append(value.Replace("\n", " ")).Append('\n');
        return this;
    }

    internal CanonicalForm Add(string key, bool value) => Add(key, value ? "true" : "false");

    /// <summary>Appends lines formed earlier by <see cref="Segment"/>: the same text as writing them again.</summary>
    internal CanonicalForm AddSegment(string lines)
    {
        _text.Append(lines);
        return this;
    }

    /// <summary>The lines <paramref name="write"/> adds, as one string, for an immutable object to keep: a schedule
    /// fingerprints every row, and most rows share their material, section, restraint and method, whose numbers then
    /// need not be formatted again.</summary>
    internal static string Segment(System.Action<CanonicalForm> write)
    {
        var form = new CanonicalForm();
        write(form);
        return form.ToString();
    }

    public override string ToString() => _text.ToString();
}
