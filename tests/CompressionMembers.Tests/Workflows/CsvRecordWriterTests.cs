using System;
using System.IO;
using System.Text;
using CompressionMembers.Internal;

namespace CompressionMembers.Tests.Workflows;

/// <summary>The library's own CSV writer: RFC 4180 quoting, formula escaping, invariant numbers, "\n" line ends.</summary>
public class CsvRecordWriterTests
{
    private static string Line(params string[] fields)
    {
        var text = new StringBuilder();
        new CsvRecordWriter(text).Record(fields);
        return text.ToString();
    }

    [Theory]
    // RFC 4180, section 2, rules 6 and 7: fields with line breaks, quotes or commas are enclosed in quotes, inner quotes doubled.
    [InlineData("aaa", "aaa,z\n")]
    [InlineData("b,bb", "\"b,bb\",z\n")]
    [InlineData("b\"bb", "\"b\"\"bb\",z\n")]
    [InlineData("b\r\nbb", "\"b\r\nbb\",z\n")]
    [InlineData("b\nbb", "\"b\nbb\",z\n")]
    [InlineData("", ",z\n")]
    [InlineData(" lead", " lead,z\n")] // blanks alone do not need quotes (RFC 4180 rule 4: spaces are part of a field)
    public void Text_QuotesOnlyWhatNeedsQuotes(string field, string expected) => Assert.Equal(expected, Line(field, "z"));

    [Theory]
    // CSV injection: a cell starting with = + - @, tab or CR runs as a formula in a spreadsheet (OWASP "CSV Injection",
    // common practice); the apostrophe makes it text.
    [InlineData("=HYPERLINK(\"x\")", "\"'=HYPERLINK(\"\"x\"\")\",z\n")]
    [InlineData("+1", "\"'+1\",z\n")]
    [InlineData("-1", "\"'-1\",z\n")]
    [InlineData("@SUM(A1)", "\"'@SUM(A1)\",z\n")]
    [InlineData("\tx", "\"'\tx\",z\n")]
    [InlineData("\rx", "\"'\rx\",z\n")]
    [InlineData(" =1", " =1,z\n")] // only the first character counts
    public void Text_FormulaLike_GetsAnApostropheAndQuotes(string field, string expected) => Assert.Equal(expected, Line(field, "z"));

    [Fact]
    public void Numbers_AreInvariantShortestRoundTrip_AndNeverEscaped()
    {
        var text = new StringBuilder();
        var w = new CsvRecordWriter(text);
        foreach (var d in new[] { 0.1, -0.5, -0.0, 1e21, 1e-7, double.NaN, double.PositiveInfinity, double.NegativeInfinity, double.MaxValue }) w.Number(d);
        w.Number(-5L);
        w.EndRecord();
        // .NET's shortest round-trip "R" form in the invariant culture (common practice: what double.ToString gives).
        Assert.Equal("0.1,-0.5,-0,1E+21,1E-07,NaN,Infinity,-Infinity,1.7976931348623157E+308,-5\n", text.ToString());
    }

    [Fact]
    public void Numbers_UnderAnotherCulture_StayInvariant()
    {
        var old = System.Globalization.CultureInfo.CurrentCulture;
        try
        {
            System.Globalization.CultureInfo.CurrentCulture = new System.Globalization.CultureInfo("de-DE");
            var text = new StringBuilder();
            var w = new CsvRecordWriter(text);
            w.Number(1234.5);
            w.Number(1234567L);
            w.EndRecord();
            Assert.Equal("1234.5,1234567\n", text.ToString());
        }
        finally { System.Globalization.CultureInfo.CurrentCulture = old; }
    }

    [Fact]
    public void EndRecord_OneEmptyField_IsWrittenAsTwoQuotes()
    {
        // Otherwise the record would be an empty line, which readers skip (RFC 4180 gives no empty record form).
        Assert.Equal("\"\"\n", Line(""));
        Assert.Equal(",\n", Line("", ""));
    }

    [Fact]
    public void EndRecord_NoField_Throws() =>
        Assert.Throws<InvalidOperationException>(() => new CsvRecordWriter(new StringBuilder()).EndRecord());

    [Fact]
    public void Text_LoneSurrogate_IsWrittenAsReplacementCharacter() =>
        Assert.Equal("\uFFFDx,\uD83D\uDE00,\uFFFD\n", Line("\uD800x", "\uD83D\uDE00", "\uDC00"));

    [Fact]
    public void TextWriterTarget_ReceivesEverythingAfterFlush()
    {
        var sw = new StringWriter();
        var w = new CsvRecordWriter(sw);
        var expected = new StringBuilder();
        for (int i = 0; i < 5000; i++)
        {
            w.Number(i);
            w.Text("row \"" + i + "\"");
            w.EndRecord();
            expected.Append(i).Append(",\"row \"\"").Append(i).Append("\"\"\"\n");
        }
        w.Flush();
        Assert.Equal(expected.ToString(), sw.ToString());
    }
}
