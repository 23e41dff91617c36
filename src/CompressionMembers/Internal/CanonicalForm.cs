using System.Globalization;
using System.Text;

namespace CompressionMembers.Internal;

/// <summary>
/// A canonical, culture-invariant text form of an input, one <c>key=value</c> line each, with every number in SI
/// written in round-trip form. The input fingerprint is a hash of it, so the same input always gives the same
/// fingerprint whatever units it was given in.
/// </summary>
internal sealed class CanonicalForm
{
    private readonly StringBuilder _text = new();

    internal CanonicalForm Add(string key, double siValue)
    {
        // Normalise -0 to 0 so that a sign of zero never changes a fingerprint.
        if (siValue == 0) siValue = 0;
        _text.Append(key).Append('=').Append(siValue.ToString("R", CultureInfo.InvariantCulture)).Append('\n');
        return this;
    }

    internal CanonicalForm Add(string key, string value)
    {
        _text.Append(key).Append('=').Append(value.Replace("\n", " ")).Append('\n');
        return this;
    }

    internal CanonicalForm Add(string key, bool value) => Add(key, value ? "true" : "false");

    public override string ToString() => _text.ToString();
}
