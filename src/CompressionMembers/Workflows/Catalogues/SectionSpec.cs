using System;
using System.Globalization;
using CompressionMembers.Sections;
using UnitsNet;

namespace CompressionMembers.Workflows.Catalogues;

/// <summary>A one-line text form of a section's shape and dimensions, used by catalogue files and member schedules:
/// a shape word, then the dimensions joined by "x", in millimetres unless the text ends in " in".</summary>
/// <remarks>
/// <para>Forms (dimensions in the order of the section's constructor):
/// <c>rect B x H</c> (width × depth), <c>round D</c>, <c>chs D x t</c>, <c>rhs B x H x t</c>,
/// <c>angle H x B x t</c> (vertical leg × horizontal leg × thickness), <c>channel H x B x tf x tw</c>,
/// <c>i H x B x tf x tw</c> or <c>i H x B x tf x tw x r</c>. Shape words ignore case; "×" may stand for "x".
/// Examples: <c>rect 90x140</c>, <c>chs 60x3</c>, <c>rect 1.5x3.5 in</c>.</para>
/// <para>Thread safety: stateless.</para>
/// </remarks>
public static class SectionSpec
{
    /// <summary>Parses a section spec.</summary>
    /// <param name="text">The spec, such as "rhs 100x50x4".</param>
    /// <returns>The section.</returns>
    /// <exception cref="FormatException">The text is not a spec; the message says which form was expected.</exception>
    /// <exception cref="ArgumentException">The dimensions do not make a valid section (the section's own message).</exception>
    public static Section Parse(string text)
    {
        if (!TryParseParts(text, out var shape, out var dims, out var inches, out var error)) throw new FormatException(error);
        Length L(int i) => inches ? Length.FromInches(dims[i]) : Length.FromMillimeters(dims[i]);
        return shape switch
        {
            "rect" => Need(2) ?? new RectangleSection(L(0), L(1)),
            "round" => Need(1) ?? new CircleSection(L(0)),
            "chs" => Need(2) ?? new CircularHollowSection(L(0), L(1)),
            "rhs" => Need(3) ?? new RectangularHollowSection(L(0), L(1), L(2)),
            "angle" => Need(3) ?? new AngleSection(L(0), L(1), L(2)),
            "channel" => Need(4) ?? new ChannelSection(L(0), L(1), L(2), L(3)),
            "i" => dims.Length == 5 ? new ISection(L(0), L(1), L(2), L(3), L(4)) : Need(4) ?? new ISection(L(0), L(1), L(2), L(3)),
            _ => throw new FormatException($"Unknown section shape \"{shape}\" in \"{text}\"; use one of {Forms}."),
        };

        Section? Need(int n) => dims.Length == n ? null
            : throw new FormatException($"A \"{shape}\" section takes {n} dimension{(n == 1 ? "" : "s")}; \"{text}\" gives {dims.Length}. Forms: {Forms}.");
    }

    /// <summary>The accepted forms, for messages and documentation.</summary>
    public const string Forms = "rect BxH, round D, chs Dxt, rhs BxHxt, angle HxBxt, channel HxBxtfxtw, i HxBxtfxtw[xr] (mm, or add \" in\")";

    private static bool TryParseParts(string text, out string shape, out double[] dims, out bool inches, out string error)
    {
        shape = ""; dims = []; inches = false; error = "";
        if (string.IsNullOrWhiteSpace(text)) { error = $"A section spec must not be empty; use one of {Forms}."; return false; }
        var t = text.Trim();
        if (t.EndsWith(" in", StringComparison.OrdinalIgnoreCase)) { inches = true; t = t[..^3].TrimEnd(); }
        else if (t.EndsWith(" mm", StringComparison.OrdinalIgnoreCase)) t = t[..^3].TrimEnd();
        int sp = t.IndexOf(' ', StringComparison.Ordinal);
        if (sp <= 0) { error = $"\"{text}\" is not a section spec: expected a shape word and dimensions, such as \"rect 90x140\"; forms: {Forms}."; return false; }
        shape = t[..sp].ToLowerInvariant();
        var parts = t[(sp + 1)..].Replace('×', 'x').Replace('X', 'x').Split('x', StringSplitOptions.TrimEntries);
        dims = new double[parts.Length];
        for (int i = 0; i < parts.Length; i++)
        {
            if (!double.TryParse(parts[i], NumberStyles.Float, CultureInfo.InvariantCulture, out dims[i]))
            {
                error = $"\"{parts[i]}\" in \"{text}\" is not a number (use a point as the decimal separator).";
                return false;
            }
        }
        return true;
    }
}
