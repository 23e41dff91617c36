using System;
using System.Globalization;
using System.IO;
using System.Text;

namespace CompressionMembers.Internal;

/// <summary>Writes CSV records (RFC 4180, comma separated, lines ending with "\n") into a <see cref="StringBuilder"/>,
/// optionally passing the text on to a <see cref="TextWriter"/> as it fills.</summary>
/// <remarks>
/// <para>A text field is enclosed in quotes when it holds a comma, a quote, CR or LF, with each quote doubled. A text
/// field that a spreadsheet would run as a formula (starting with <c>=</c>, <c>+</c>, <c>-</c>, <c>@</c>, a tab or
/// CR) gets a leading apostrophe and is quoted. Numbers are written in the invariant culture, a <see cref="double"/>
/// in its shortest round-trip form ("NaN", "Infinity" and "-Infinity" spelt out), and are never escaped. A record
/// whose only field is empty is written as <c>""</c>, so that it does not read as an empty line. A lone UTF-16
/// surrogate is written as U+FFFD.</para>
/// <para>Thread safety: not thread-safe (one writer per output).</para>
/// </remarks>
[Mutable]
internal sealed class CsvRecordWriter
{
    private const int PassOnChars = 1 << 15;
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;
    private readonly StringBuilder _text;
    private readonly TextWriter? _target;
    private int _fieldsInRecord;
    private bool _lastFieldEmptyText;

    /// <summary>A writer into a builder of its own that is passed on to <paramref name="target"/>.</summary>
    internal CsvRecordWriter(TextWriter target)
    {
        ArgumentNullException.ThrowIfNull(target);
        _target = target;
        _text = new StringBuilder(PassOnChars + 1024);
    }

    /// <summary>A writer that only appends to <paramref name="text"/>.</summary>
    internal CsvRecordWriter(StringBuilder text)
    {
        ArgumentNullException.ThrowIfNull(text);
        _text = text;
    }

    /// <summary>The text written and not yet passed on.</summary>
    internal StringBuilder Pending => _text;

    /// <summary>Records ended since the writer was made (or <see cref="ResetCount"/>).</summary>
    internal long Records { get; private set; }

    /// <summary>Sets <see cref="Records"/> back to 0.</summary>
    internal void ResetCount() => Records = 0;

    /// <summary>Writes a text field (null is an empty field).</summary>
    internal void Text(string? value) => Text(value.AsSpan());

    /// <summary>Writes a text field.</summary>
    internal void Text(ReadOnlySpan<char> value)
    {
        Separate();
        _lastFieldEmptyText = value.IsEmpty;
        bool formula = !value.IsEmpty && value[0] is '=' or '+' or '-' or '@' or '\t' or '\r';
        bool quote = formula || value.IndexOfAny(",\"\r\n") >= 0;
        if (quote) _text.Append('"');
        if (formula) _text.Append('\'');
        if (value.IndexOfAnyInRange('\uD800', '\uDFFF') >= 0)
        {
            var copy = value.ToArray();
            CsvRecordReader.ReplaceLoneSurrogates(copy);
            value = copy;
        }
        if (quote)
        {
            int q;
            while ((q = value.IndexOf('"')) >= 0)
            {
                _text.Append(value[..(q + 1)]).Append('"');
                value = value[(q + 1)..];
            }
        }
        _text.Append(value);
        if (quote) _text.Append('"');
    }

    /// <summary>Writes a number in its shortest round-trip form, invariant culture.</summary>
    internal void Number(double value)
    {
        Separate();
        _lastFieldEmptyText = false;
        Span<char> digits = stackalloc char[32];
        if (!value.TryFormat(digits, out int n, default, Inv)) throw new InvalidOperationException("a double did not fit 32 characters");
        _text.Append(digits[..n]);
    }

    /// <summary>Writes an integer, invariant culture.</summary>
    internal void Number(long value)
    {
        Separate();
        _lastFieldEmptyText = false;
        Span<char> digits = stackalloc char[24];
        if (!value.TryFormat(digits, out int n, default, Inv)) throw new InvalidOperationException("a long did not fit 24 characters");
        _text.Append(digits[..n]);
    }

    /// <summary>Writes a record of text fields.</summary>
    internal void Record(ReadOnlySpan<string> fields)
    {
        foreach (var f in fields) Text(f);
        EndRecord();
    }

    /// <summary>Ends the record with "\n".</summary>
    internal void EndRecord()
    {
        if (_fieldsInRecord == 0) throw new InvalidOperationException("A CSV record needs at least one field.");
        if (_fieldsInRecord == 1 && _lastFieldEmptyText) _text.Append("\"\"");
        _text.Append('\n');
        _fieldsInRecord = 0;
        Records++;
        if (_target is not null && _text.Length >= PassOnChars) Flush();
    }

    /// <summary>Passes the text written so far on to the target writer (nothing without one).</summary>
    internal void Flush()
    {
        if (_target is null) return;
        _target.Write(_text);
        _text.Clear();
    }

    private void Separate()
    {
        if (_fieldsInRecord++ > 0) _text.Append(',');
    }
}
