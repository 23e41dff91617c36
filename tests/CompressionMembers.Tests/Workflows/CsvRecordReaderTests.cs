using System;
using System.Collections.Generic;
using System.IO;
using System.Text;
using CompressionMembers.Internal;

namespace CompressionMembers.Tests.Workflows;

/// <summary>The library's own CSV reader: RFC 4180 as written, plus the documented leniencies (comments, blank lines,
/// trimmed blanks, forgiving quotes), read through buffers of any size.</summary>
public class CsvRecordReaderTests
{
    internal static List<(long Line, string[] Fields)> ReadAll(string text, int bufferChars = 1 << 16, int maxRecordChars = CsvRecordReader.DefaultMaxRecordChars)
    {
        var reader = new CsvRecordReader(new StringReader(text), maxRecordChars, bufferChars);
        var records = new List<(long, string[])>();
        var fields = new List<string>();
        while (reader.Read(fields, out long line)) records.Add((line, fields.ToArray()));
        return records;
    }

    private static void Records(string text, params string[][] expected)
    {
        var actual = ReadAll(text);
        Assert.Equal(expected.Length, actual.Count);
        for (int i = 0; i < expected.Length; i++) Assert.Equal(expected[i], actual[i].Fields);
    }

    // RFC 4180, section 2 (the definition of the format), each rule's own example. CRLF as the RFC writes it.
    public static TheoryData<string, string, string[][]> Rfc4180Examples => new()
    {
        { "2.1 each record on its own line, ended by CRLF", "aaa,bbb,ccc\r\nzzz,yyy,xxx\r\n", [["aaa", "bbb", "ccc"], ["zzz", "yyy", "xxx"]] },
        { "2.2 the last record may have no line break", "aaa,bbb,ccc\r\nzzz,yyy,xxx", [["aaa", "bbb", "ccc"], ["zzz", "yyy", "xxx"]] },
        { "2.3 an optional header line of the same form", "field_name,field_name,field_name\r\naaa,bbb,ccc\r\nzzz,yyy,xxx\r\n",
            [["field_name", "field_name", "field_name"], ["aaa", "bbb", "ccc"], ["zzz", "yyy", "xxx"]] },
        { "2.4 fields separated by commas; the last field has no comma after it", "aaa,bbb,ccc", [["aaa", "bbb", "ccc"]] },
        { "2.5 fields may be enclosed in double quotes", "\"aaa\",\"bbb\",\"ccc\"\r\nzzz,yyy,xxx", [["aaa", "bbb", "ccc"], ["zzz", "yyy", "xxx"]] },
        { "2.6 line breaks, double quotes and commas inside quotes", "\"aaa\",\"b\r\nbb\",\"ccc\"\r\nzzz,yyy,xxx", [["aaa", "b\r\nbb", "ccc"], ["zzz", "yyy", "xxx"]] },
        { "2.7 a double quote inside quotes is doubled", "\"aaa\",\"b\"\"bb\",\"ccc\"", [["aaa", "b\"bb", "ccc"]] },
    };

    [Theory]
    [MemberData(nameof(Rfc4180Examples))]
    public void Read_Rfc4180Examples_GiveTheRecordsTheRfcDescribes(string rule, string text, string[][] expected)
    {
        Assert.False(string.IsNullOrEmpty(rule));
        Records(text, expected);
    }

    [Theory]
    [InlineData("\n")]
    [InlineData("\r\n")]
    [InlineData("\r")] // a lone CR ends a line too (old Mac files)
    public void Read_AnyLineEnd_GivesTheSameRecordsAndLines(string eol)
    {
        string text = string.Join(eol, "a,b", "1,\"x" + eol + "y\"", "", "# note", "2,3", "");
        var records = ReadAll(text);
        Assert.Equal(3, records.Count);
        Assert.Equal([1L, 2L, 6L], [records[0].Line, records[1].Line, records[2].Line]); // lines inside quotes, blank lines and comments all count
        Assert.Equal(["1", "x" + eol + "y"], records[1].Fields); // a line break inside quotes is kept as written
        Assert.Equal(["2", "3"], records[2].Fields);
    }

    [Fact]
    public void Read_CommentsAndBlankLines_AreSkippedOnlyWhereARecordStarts()
    {
        var records = ReadAll("# first\na,b\n\n   \n\t\n#,x\n  # not a comment\n\"q\n# text inside quotes\",2\n\"\"\n");
        Assert.Equal(4, records.Count);
        Assert.Equal(["a", "b"], records[0].Fields);
        Assert.Equal(7, records[1].Line);
        Assert.Equal(["# not a comment"], records[1].Fields); // '#' counts only as the line's first character
        Assert.Equal(["q\n# text inside quotes", "2"], records[2].Fields);
        Assert.Equal(10, records[3].Line);
        Assert.Equal([""], records[3].Fields); // a quoted empty field is a record, not a blank line
    }

    [Theory]
    [InlineData("  x  ,\ty\t", "x", "y")]            // blanks around a field are removed
    [InlineData("\" x \",\"\ty\t\"", " x ", "\ty\t")] // ... but kept inside quotes
    [InlineData("  \"x\"  ,y", "x", "y")]            // a quote after leading blanks still opens a quoted field
    [InlineData("\"x \"  ,y", "x ", "y")]            // blanks after the closing quote go; those inside stay
    [InlineData("\u00a0x\u00a0,y", "\u00a0x\u00a0", "y")] // only space and tab are blanks (no-break space is text)
    public void Read_Blanks_AreTrimmedOutsideQuotesOnly(string line, string first, string second) =>
        Records("h1,h2\n" + line, ["h1", "h2"], [first, second]);

    [Theory]
    [InlineData("x\"y,2", "x\"y")]          // a quote inside an unquoted field is a character
    [InlineData("\"x\"y,2", "xy")]          // text after the closing quote is appended as it stands
    [InlineData("\"a\"\"b\"c\"d,2", "a\"bc\"d")]
    [InlineData("\"\" x,2", " x")]
    public void Read_BadQuoting_IsReadLeniently(string line, string first) =>
        Records("h1,h2\n" + line, ["h1", "h2"], [first, "2"]);

    [Fact]
    public void Read_QuoteNeverClosed_RunsToTheEndOfTheInput()
    {
        var records = ReadAll("h\n\"x,2\n3,4  ");
        Assert.Equal(["x,2\n3,4"], records[1].Fields); // trailing blanks trimmed, everything else kept: no row is lost silently
    }

    [Fact]
    public void Read_RecordLongerThanTheLimit_IsRefusedNamingItsLine()
    {
        var ex = Assert.Throws<FormatException>(() => ReadAll("h\n# c\n\"" + new string('x', 200), maxRecordChars: 100));
        Assert.StartsWith("Line 3: a record is longer than 100 characters", ex.Message);
    }

    [Fact]
    public void Read_ByteOrderMark_IsDroppedOnlyAtTheStart()
    {
        var records = ReadAll("\uFEFFa,b\n\uFEFF1,2");
        Assert.Equal(["a", "b"], records[0].Fields);
        Assert.Equal(["\uFEFF1", "2"], records[1].Fields);
    }

    [Fact]
    public void Read_LoneSurrogates_BecomeReplacementCharacters_PairsSurvive()
    {
        // "\uD800\"\uDC00": two halves on either side of a quote are two lone surrogates, not a pair.
        var records = ReadAll("h,i\n\uD83D\uDE00,\"\uD800\"\uDC00\n\uDC00x,y", bufferChars: 2);
        Assert.Equal(["\uD83D\uDE00", "\uFFFD\uFFFD"], records[1].Fields);
        Assert.Equal(["\uFFFDx", "y"], records[2].Fields);
    }

    [Fact]
    public void Read_AnyBufferSize_GivesTheSameRecords()
    {
        // Buffer boundaries fall inside CR LF pairs, doubled quotes, surrogate pairs and comments.
        const string text = "# c\r\nh1,h2\r\n\"a\"\"b\",\"c\r\nd\"\r\n\r\n  x  ,\uD83D\uDE00\r\n#z\r\"q\"r,\"\"\"\"\n";
        var expected = ReadAll(text);
        Assert.Equal(4, expected.Count);
        for (int size = 2; size < 12; size++)
        {
            var actual = ReadAll(text, size);
            Assert.Equal(expected.Count, actual.Count);
            for (int i = 0; i < expected.Count; i++)
            {
                Assert.Equal(expected[i].Line, actual[i].Line);
                Assert.Equal(expected[i].Fields, actual[i].Fields);
            }
        }
    }

    [Fact]
    public void Read_EmptyInput_HasNoRecord()
    {
        Assert.Empty(ReadAll(""));
        Assert.Empty(ReadAll("\n\n# only comments\n  \n"));
    }

    [Fact]
    public void WriteThenRead_RandomRecords_RoundTrip()
    {
        // Seeded (common practice for repeatable randomness). The writer leaves blanks at either end of a field unquoted
        // and escapes formula-like text, and a first field starting with '#' would read as a comment, so the generated
        // fields avoid those; everything else (commas, quotes, CR, LF, empty fields) must come back as written.
        var rnd = new Random(4180);
        const string alphabet = "ab,\"\r\n \t#=é1.";
        for (int round = 0; round < 2000; round++)
        {
            var records = new List<string[]>();
            for (int r = 0, n = 1 + rnd.Next(4); r < n; r++)
            {
                var fields = new string[1 + rnd.Next(5)];
                for (int f = 0; f < fields.Length; f++)
                {
                    var sb = new StringBuilder();
                    for (int k = rnd.Next(6); k > 0; k--) sb.Append(alphabet[rnd.Next(alphabet.Length)]);
                    string s = sb.ToString().Trim(' ', '\t');
                    while (s.Length > 0 && s[0] is '=' or '+' or '-' or '@' or '\r' or '#') s = s[1..].Trim(' ', '\t');
                    fields[f] = s;
                }
                records.Add(fields);
            }
            var text = new StringBuilder();
            var writer = new CsvRecordWriter(text);
            foreach (var rec in records) writer.Record(rec);
            var back = ReadAll(text.ToString(), bufferChars: 2 + rnd.Next(16));
            Assert.Equal(records.Count, back.Count);
            for (int r = 0; r < records.Count; r++) Assert.Equal(records[r], back[r].Fields);
        }
    }
}
