using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Text;
using System.Threading;
using CompressionMembers.Workflows.Batch;
using CompressionMembers.Workflows.Schedules;

namespace CompressionMembers.Tests.Workflows;

/// <summary>The streamed check of a CSV schedule gives the same bytes as the in-memory path, whatever the chunk size and
/// the number of cores, and accounts for every row.</summary>
public class ScheduleStreamingTests
{
    private const string Header = "member,case,material,section,method,length_mm,K_y,K_z,K_t,N_kN,ey_mm,ez_mm,My_top_kNm,My_bottom_kNm,Mz_top_kNm,Mz_bottom_kNm,bow_y_mm,bow_z_mm,duration";

    internal static string InMemory(string csv) =>
        ScheduleChecker.Check(MemberSchedule.ReadCsv(new StringReader(csv), "test"), BatchOptions.Serial).ToCsv();

    internal static (string Text, ScheduleStreamSummary Summary) Streamed(string csv, BatchOptions? options = null, int chunkRows = 2048)
    {
        var output = new StringWriter(CultureInfo.InvariantCulture);
        var summary = ScheduleChecker.CheckCsvStreamingInChunks(new StringReader(csv), output, null, options, chunkRows);
        return (output.ToString(), summary);
    }

    /// <summary>A random schedule (seeded) mixing good rows of every family with every kind of bad row and CSV quirk.
    /// <paramref name="records"/> is the number of records it holds (comment and blank lines are not records).</summary>
    internal static string RandomSchedule(int seed, int rows, out int records)
    {
        var rnd = new Random(seed);
        var sb = new StringBuilder();
        string eol = rnd.Next(2) == 0 ? "\n" : "\r\n";
        sb.Append("# random schedule, seed ").Append(seed).Append(eol).Append(Header).Append(eol);
        records = 0;
        string[] steelSections = ["CHS 76x3", "SHS 60x60x3", "rect 60x100", "chs 60x3", "angle 50x50x5", "i 150x150x9x6", "rect 1.5x3.5 in"];
        string[] classical = ["euler", "johnson", "secant", "perry-robertson"];
        for (int i = 0; i < rows; i++)
        {
            if (rnd.Next(40) == 0) sb.Append(rnd.Next(2) == 0 ? "# a comment" : "   ").Append(eol); // not records
            string member = rnd.Next(12) switch
            {
                0 => "\"post, with comma\"",
                1 => "\"post \"\"quoted\"\"\"",
                2 => "\"two\nlines\"",
                3 => "=HYPERLINK(\"x\")",
                4 => "-5 strut",
                5 => "",
                6 => "\t padded \t",
                _ => "P" + i.ToString(CultureInfo.InvariantCulture),
            };
            string row = rnd.Next(10) switch
            {
                0 => $"{member},ULS,GL28h,glulam 140x180,ec5-column,{2000 + rnd.Next(3000)},1,1,1,{20 + rnd.Next(150)},,,,,,,,,{(rnd.Next(3) == 0 ? "MediumTerm" : rnd.Next(2) == 0 ? "" : "Sometimes")}",
                1 => $"{member},ULS,6082-T6,CHS 60x4,ec9,{1000 + rnd.Next(3000)},1,1,1,{10 + rnd.Next(60)},,,,,,,,,",
                2 => $"{member},ULS,ship-oak,rect 140x140,euler,1200,1,1,1,60,,,,,,,,,",                      // unknown material
                3 => $"{member},ULS,generic-steel,rect 0x10,euler,1200,1,1,1,60,,,,,,,,,",                     // impossible section
                4 => $"{member},ULS,generic-steel,CHS 90x4,euler,2400,1,1,1,45,8,0,,,,,,,",                    // method does not apply
                5 => $"{member},ULS,generic-steel,CHS 76x3,johnson,{(rnd.Next(2) == 0 ? "-5" : "seventy")},1,1,1,60,,,,,,,,,", // bad length
                6 => $"{member},ULS,generic-steel,CHS 76x3,johnson,3200,1,1,1,60,,,,,,,,,,extra",             // more fields than the header
                7 => $"{member},ULS,generic-steel,CHS 76x3",                                                 // too few fields
                _ => $"{member},case {rnd.Next(5)},generic-steel,{steelSections[rnd.Next(steelSections.Length)]},{classical[rnd.Next(classical.Length)]}," +
                     $"{500 + rnd.Next(5000)},{(rnd.Next(4) == 0 ? "0.7" : "1")},1,,{1 + rnd.Next(300)},{(rnd.Next(3) == 0 ? "5" : "")},,{(rnd.Next(5) == 0 ? "2" : "")},,,,{(rnd.Next(5) == 0 ? "3" : "")},,",
            };
            sb.Append(row).Append(eol);
            records++;
        }
        return sb.ToString();
    }

    [Fact]
    public void CheckCsvStreaming_Boathouse_IsByteIdenticalToTheInMemoryPath()
    {
        string csv = File.ReadAllText(ScheduleTests.BoathousePath());
        string expected = InMemory(csv);
        var output = new StringWriter(CultureInfo.InvariantCulture);
        var summary = ScheduleChecker.CheckCsvStreaming(new StringReader(csv), output); // the public entry, default chunk
        Assert.Equal(expected, output.ToString());
        // The boathouse schedule: 11 rows, 3 of them errors (ScheduleTests.Check_Boathouse_BadRowsBecomeErrorRowsWithReasons).
        Assert.Equal(11, summary.RowsRead);
        Assert.Equal(11, summary.RowsWritten);
        Assert.Equal(3, summary.ErrorCount);
        Assert.True(summary.AllRowsAccountedFor);
        Assert.Equal("11 rows: 5 passed, 3 failed, 3 errors", summary.ToString());
    }

    [Theory]
    [InlineData(1, 1)]
    [InlineData(2, 3)]
    [InlineData(3, 7)]
    [InlineData(4, 64)]
    [InlineData(5, 2048)]
    public void CheckCsvStreaming_RandomSchedulesWithErrorRows_AreByteIdenticalToTheInMemoryPath(int seed, int chunkRows)
    {
        string csv = RandomSchedule(seed, 600, out int records);
        string expected = InMemory(csv);
        foreach (var options in new[] { BatchOptions.Serial, new BatchOptions(2), BatchOptions.Default })
        {
            var (text, summary) = Streamed(csv, options, chunkRows);
            Assert.Equal(expected, text);
            Assert.Equal(records, summary.RowsRead); // every generated record read ...
            Assert.Equal(records, summary.RowsWritten); // ... and written once
            Assert.True(summary.AllRowsAccountedFor);
            Assert.True(summary.ErrorCount > 0 && summary.PassedCount > 0);
        }
    }

    [Fact]
    public void CheckCsvStreaming_OneCoreAndTwoCores_GiveTheSameBytes()
    {
        string csv = RandomSchedule(20261202, 20_000, out int records);
        var (one, s1) = Streamed(csv, new BatchOptions(1), chunkRows: 512);
        var (two, s2) = Streamed(csv, new BatchOptions(2), chunkRows: 512);
        Assert.Equal(one, two);
        Assert.Equal(records, s1.RowsRead);
        Assert.Equal((s1.PassedCount, s1.FailedCount, s1.ErrorCount), (s2.PassedCount, s2.FailedCount, s2.ErrorCount));
    }

    [Theory]
    [InlineData("de-DE")] // decimal comma
    [InlineData("tr-TR")] // dotted and dotless i
    [InlineData("ar-SA")] // another calendar and digits
    public void CheckCsvStreaming_UnderAnyCurrentCulture_GivesTheSameBytes(string culture)
    {
        string csv = RandomSchedule(11, 300, out _);
        string invariant = Streamed(csv, new BatchOptions(2)).Text;
        var (oc, ou) = (CultureInfo.CurrentCulture, CultureInfo.CurrentUICulture);
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.CurrentUICulture = new CultureInfo(culture);
            Assert.Equal(invariant, Streamed(csv, new BatchOptions(2)).Text); // the worker threads inherit the culture
        }
        finally { (CultureInfo.CurrentCulture, CultureInfo.CurrentUICulture) = (oc, ou); }
    }

    [Fact]
    public void CheckCsvStreaming_MalformedLinesMidStream_BecomeErrorRows()
    {
        // Each line below is one record whatever is wrong with it; none may go missing.
        string[] lines =
        [
            "P1,ULS,generic-steel,CHS 76x3,johnson,3200,1,1,,85,,,,,,,,,",
            "garbage without commas",
            "P2,ULS,generic-steel,CHS 76x3,johnson,3200,1,1,,85,,,,,,,,,,,,,,,", // too many fields
            "\"P3 stray\"quote,ULS,generic-steel,CHS 76x3,johnson,3200,1,1,,85,,,,,,,,,", // read leniently as "P3 strayquote" and checked
            ",,,,,,,,,,,,,,,,,,",                                             // every field empty
            "P4,ULS,generic-steel,CHS 76x3,johnson,1e999,1,1,,85,,,,,,,,,",    // length overflows to infinity
            "P5,ULS,generic-steel,CHS 76x3,johnson,3200,0.2,1,,85,,,,,,,,,",   // K below 0.5
            "P6,ULS,generic-steel,CHS 76x3,johnson,3200,1,1,,NaN,,,,,,,,,",
            "P7,ULS,generic-steel,CHS 76x3,johnson,3200,1,1,,85,,,,,,,,,",
            "\"P8 never closed,ULS,generic-steel,CHS 76x3,johnson,3200,1,1,,85", // the last line: the quote runs to the end
        ];
        string csv = Header + "\n" + string.Join("\n", lines) + "\n";
        var (text, summary) = Streamed(csv, new BatchOptions(2), chunkRows: 3);
        Assert.Equal(InMemory(csv), text);
        Assert.Equal(lines.Length, summary.RowsRead);
        Assert.Equal(lines.Length, summary.RowsWritten);
        Assert.Equal(3, summary.PassedCount + summary.FailedCount); // P1, P3 and P7
        Assert.Equal(lines.Length - 3, summary.ErrorCount);
        var resultLines = text.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(lines.Length + 1, resultLines.Length);
        Assert.All(resultLines.Skip(1), l => Assert.Matches(@"^\d+,line \d+,", l)); // one result line per input line, in order
    }

    [Fact]
    public void CheckCsvStreaming_BadHeader_IsRefusedBeforeAnythingIsWritten()
    {
        var output = new StringWriter();
        var ex = Assert.Throws<FormatException>(() => ScheduleChecker.CheckCsvStreaming(new StringReader("member,material,section,method,length_mm,N_kN,colour\nA,generic-steel,rect 50x50,euler,1000,10,red\n"), output));
        Assert.StartsWith("Line 1: unknown column \"colour\" in the schedule CSV", ex.Message); // the message of MemberSchedule.ReadCsv
        Assert.Equal("", output.ToString());
        Assert.Throws<FormatException>(() => ScheduleChecker.CheckCsvStreaming(new StringReader(""), output));
        Assert.Equal("", output.ToString());
    }

    [Fact]
    public void CheckCsvStreaming_RecordOverTheSizeLimit_WritesEveryRowBeforeItThenThrows()
    {
        var sb = new StringBuilder(Header).Append('\n');
        for (int i = 0; i < 100; i++) sb.Append("P").Append(i).Append(",ULS,generic-steel,CHS 76x3,johnson,3200,1,1,,85,,,,,,,,,\n");
        sb.Append('"').Append('x', 1 << 21); // an unclosed quote on line 102 that would swallow 2 MiB
        var output = new StringWriter();
        var ex = Assert.Throws<FormatException>(() => ScheduleChecker.CheckCsvStreamingInChunks(new StringReader(sb.ToString()), output, null, new BatchOptions(2), 16));
        Assert.StartsWith("Line 102: a record is longer than 1048576 characters", ex.Message);
        Assert.Equal(101, output.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries).Length); // header + the 100 rows before it
    }

    [Fact]
    public void CheckCsvStreaming_Cancelled_Throws()
    {
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        string csv = RandomSchedule(7, 100, out _);
        foreach (int cores in new[] { 1, 2 })
            Assert.ThrowsAny<OperationCanceledException>(() => Streamed(csv, new BatchOptions(cores, null, cts.Token), 8));
    }

    [Fact]
    public void CheckCsvStreaming_CancelledMidway_StopsAndWritesWholeChunksOnly()
    {
        var sb = new StringBuilder(Header).Append('\n');
        for (int i = 0; i < 2000; i++) sb.Append('P').Append(i).Append(",ULS,generic-steel,CHS 76x3,johnson,3200,1,1,,").Append(1 + i % 90).Append(",,,,,,,,,\n");
        string csv = sb.ToString();
        using var cts = new CancellationTokenSource();
        var progress = new CancelAfter(cts, chunks: 3);
        var output = new StringWriter();
        Assert.ThrowsAny<OperationCanceledException>(() =>
            ScheduleChecker.CheckCsvStreamingInChunks(new StringReader(csv), output, null, new BatchOptions(2, progress, cts.Token), 50));
        int written = output.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries).Length - 1;
        Assert.True(written >= 150 && written < 2000 && written % 50 == 0, $"{written} rows written"); // whole chunks of 50
        Assert.StartsWith(InMemory(csv)[..output.ToString().Length], output.ToString());
    }

    private sealed class CancelAfter(CancellationTokenSource cts, int chunks) : IProgress<BatchProgress>
    {
        private int _seen;
        public void Report(BatchProgress value)
        {
            if (++_seen == chunks) cts.Cancel();
        }
    }

    private sealed class Collect : IProgress<BatchProgress>
    {
        public readonly List<BatchProgress> Seen = [];
        public void Report(BatchProgress value) => Seen.Add(value);
    }

    [Fact]
    public void CheckCsvStreaming_Progress_IsReportedAfterEachChunk()
    {
        string csv = RandomSchedule(9, 1000, out int records);
        var p = new Collect();
        Streamed(csv, new BatchOptions(2, p), chunkRows: 100);
        Assert.Equal(records / 100, p.Seen.Count); // reported synchronously on the calling thread, one per chunk
        Assert.Equal(new BatchProgress(records, records), p.Seen[^1]);
        Assert.True(p.Seen.Zip(p.Seen.Skip(1)).All(x => x.First.Completed < x.Second.Completed));
        Assert.All(p.Seen, x => Assert.True(x.Completed <= x.Total));
    }

    [Fact]
    public void ScheduleNames_DistinctTexts_AreResolvedOnce()
    {
        var names = new ScheduleNames(CompressionMembers.Workflows.Registry.NameRegistry.Default);
        for (int i = 0; i < 1000; i++)
        {
            names.Section(i % 2 == 0 ? "CHS 76x3" : "rect 60x100");
            names.Material("generic-steel");
            names.Method(i % 2 == 0 ? "euler" : "johnson");
            // The first time the registry's own exception; then the remembered reason, with the same message.
            var ex = Assert.ThrowsAny<Exception>(() => names.Material("ship-oak"));
            Assert.True(ScheduleNames.IsRowError(ex));
            Assert.StartsWith("Unknown material \"ship-oak\"", ex.Message);
        }
        Assert.Equal(6, names.Resolutions); // 2 sections, 2 materials (one unknown), 2 methods
    }

    [Fact]
    public void CheckCsvStreaming_NullArguments_Throw()
    {
        Assert.Equal("schedule", Assert.Throws<ArgumentNullException>(() => ScheduleChecker.CheckCsvStreaming(null!, new StringWriter())).ParamName);
        Assert.Equal("results", Assert.Throws<ArgumentNullException>(() => ScheduleChecker.CheckCsvStreaming(new StringReader(""), null!)).ParamName);
    }
}
