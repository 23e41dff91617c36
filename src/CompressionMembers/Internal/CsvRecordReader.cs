using System;
using System.Collections.Generic;
using System.IO;

namespace CompressionMembers.Internal;

/// <summary>Reads CSV records (RFC 4180, comma separated) one at a time from a <see cref="TextReader"/>, through a fixed
/// buffer, so that memory does not grow with the length of the input.</summary>
/// <remarks>
/// <para>What it accepts, beyond RFC 4180 (which it reads as written: quoted fields, doubled quotes, commas and line
/// breaks inside quotes):</para>
/// <list type="bullet">
/// <item>Line breaks are LF, CR LF or a lone CR, inside and outside quotes; every one counts as a line for the line
/// numbers, which are 1-based and name the line where a record starts.</item>
/// <item>A line whose first character is <c>#</c> is a comment, and a line holding nothing but spaces and tabs is
/// skipped, both only where a record would start (a <c>#</c> inside a quoted field that spans lines is text).</item>
/// <item>Spaces and tabs around a field are removed; inside quotes they are kept. A quote after leading blanks still
/// opens a quoted field.</item>
/// <item>Lenient with bad quoting rather than refusing the file: a quote inside an unquoted field is a character, text
/// after a closing quote is appended to the field as it stands, and a quote that is never closed runs to the end of
/// the input, less trailing blanks (the record-size limit stops a runaway quote).</item>
/// <item>One byte order mark at the very start is dropped; a lone UTF-16 surrogate becomes U+FFFD.</item>
/// </list>
/// <para>A record longer than <see cref="MaxRecordChars"/> throws <see cref="FormatException"/> naming its line.</para>
/// <para>Thread safety: not thread-safe (one reader per input).</para>
/// </remarks>
[Mutable]
internal sealed class CsvRecordReader
{
    /// <summary>The default largest record, in characters (1 MiB).</summary>
    internal const int DefaultMaxRecordChars = 1 << 20;

    private const int EndOfInput = -1;
    private readonly TextReader _text;
    private readonly char[] _buffer;
    private int _pos, _len;
    private bool _atEnd, _started, _hasCarry;
    private char _carry;
    private long _line = 1;
    private char[] _field = new char[256];
    private readonly string?[] _previous = new string?[32];
    private int _fieldLen;
    private long _recordChars;
    private long _recordLine;

    internal CsvRecordReader(TextReader text, int maxRecordChars = DefaultMaxRecordChars, int bufferChars = 1 << 16)
    {
        ArgumentNullException.ThrowIfNull(text);
        _text = text;
        MaxRecordChars = maxRecordChars;
        _buffer = new char[Math.Max(2, bufferChars)]; // room for a carried surrogate and one more character
    }

    /// <summary>The largest record accepted, in characters.</summary>
    internal int MaxRecordChars { get; }

    /// <summary>The line that the next character is on (1-based).</summary>
    internal long Line => _line;

    /// <summary>Reads the next record.</summary>
    /// <param name="fields">Cleared, then filled with the record's fields.</param>
    /// <param name="line">The 1-based line where the record starts.</param>
    /// <returns>False at the end of the input (and <paramref name="fields"/> is empty).</returns>
    /// <exception cref="FormatException">The record is longer than <see cref="MaxRecordChars"/>.</exception>
    internal bool Read(List<string> fields, out long line)
    {
        fields.Clear();
        if (!_started)
        {
            _started = true;
            if (Peek() == '\uFEFF') _pos++;
        }
        while (true)
        {
            int c = Peek();
            line = _line;
            if (c == EndOfInput) return false;
            if (c == '#') { SkipLine(); continue; }
            _recordLine = _line;
            _recordChars = 0;
            bool blank = true;
            while (true)
            {
                bool end = ReadField(out bool quoted);
                if (quoted || _fieldLen > 0 || !end || fields.Count > 0) blank = false;
                fields.Add(FieldText(fields.Count));
                if (end) break;
            }
            if (!blank) return true;
            fields.Clear();
        }
    }

    /// <summary>Reads one field and the separator or line break after it; true when the record ends after it.</summary>
    private bool ReadField(out bool quoted)
    {
        _fieldLen = 0;
        quoted = false;
        int c;
        while ((c = Peek()) is ' ' or '\t') Take();
        int keep = 0;
        if (c == '"')
        {
            Take();
            quoted = true;
            keep = -1;
            while (true)
            {
                c = Peek();
                if (c == EndOfInput) { keep = 0; break; } // never closed: the field runs to the end of the input, trimmed
                Take();
                if (c == '"')
                {
                    if (Peek() != '"') break; // the closing quote
                    Take();
                    Append('"');
                }
                else if (c == '\r')
                {
                    Append('\r');
                    if (Peek() == '\n') { Take(); Append('\n'); }
                    _line++;
                }
                else
                {
                    if (c == '\n') _line++;
                    Append((char)c);
                }
            }
            if (keep < 0) keep = _fieldLen; // blanks inside the quotes are kept
        }
        // Unquoted text, or whatever follows a closing quote, runs to the separator or the end of the line as it stands.
        bool end;
        while (true)
        {
            c = Peek();
            if (c == EndOfInput) { end = true; break; }
            Take();
            if (c == ',') { end = false; break; }
            if (c == '\n') { _line++; end = true; break; }
            if (c == '\r')
            {
                if (Peek() == '\n') Take();
                _line++;
                end = true;
                break;
            }
            Append((char)c);
        }
        while (_fieldLen > keep && _field[_fieldLen - 1] is ' ' or '\t') _fieldLen--;
        return end;
    }

    private void SkipLine()
    {
        while (true)
        {
            int c = Peek();
            if (c == EndOfInput) return;
            _pos++;
            if (c == '\n') { _line++; return; }
            if (c == '\r')
            {
                if (Peek() == '\n') _pos++;
                _line++;
                return;
            }
        }
    }

    /// <summary>The field's text. A field equal to the same field of the previous record returns that record's string:
    /// schedules repeat materials, sections, methods and factors row after row, and this spares a string for each.</summary>
    private string FieldText(int index)
    {
        if (_fieldLen == 0) return "";
        var text = _field.AsSpan(0, _fieldLen);
        if (index < _previous.Length && _previous[index] is { } last && text.SequenceEqual(last)) return last;
        var s = new string(text);
        if (index < _previous.Length) _previous[index] = s;
        return s;
    }

    /// <summary>Replaces each UTF-16 surrogate that is not half of a pair with U+FFFD, in place.</summary>
    internal static void ReplaceLoneSurrogates(Span<char> text)
    {
        int i = text.IndexOfAnyInRange('\uD800', '\uDFFF');
        if (i < 0) return;
        for (; i < text.Length; i++)
        {
            char c = text[i];
            if (!char.IsSurrogate(c)) continue;
            if (char.IsHighSurrogate(c) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1])) { i++; continue; }
            text[i] = '\uFFFD';
        }
    }

    private void Append(char c)
    {
        if (_fieldLen == _field.Length) Array.Resize(ref _field, _field.Length * 2);
        _field[_fieldLen++] = c;
    }

    private void Take()
    {
        _pos++;
        if (++_recordChars > MaxRecordChars)
            throw new FormatException($"Line {_recordLine}: a record is longer than {MaxRecordChars} characters (a quote that is never closed?); the file is refused.");
    }

    private int Peek()
    {
        if (_pos < _len) return _buffer[_pos];
        return Fill() ? _buffer[0] : EndOfInput;
    }

    /// <summary>Refills the buffer. Lone surrogates are replaced here, on the input as it stands, so that a field built
    /// from pieces never pairs two halves that were apart; a high surrogate at the end of a read waits for the next.</summary>
    private bool Fill()
    {
        _pos = 0;
        _len = 0;
        while (!_atEnd && _len == 0)
        {
            int start = 0;
            if (_hasCarry) { _buffer[0] = _carry; _hasCarry = false; start = 1; }
            int n = _text.Read(_buffer, start, _buffer.Length - start);
            int len = start + n;
            if (n == 0) _atEnd = true;
            else if (char.IsHighSurrogate(_buffer[len - 1])) { _carry = _buffer[len - 1]; _hasCarry = true; len--; }
            ReplaceLoneSurrogates(_buffer.AsSpan(0, len));
            _len = len;
        }
        return _len > 0;
    }
}
