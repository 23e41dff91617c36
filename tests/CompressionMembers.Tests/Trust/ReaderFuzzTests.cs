using System;
using System.Diagnostics;
using System.IO;
using System.Text;
using CompressionMembers.Workflows.Schedules;
using Xunit.Abstractions;

namespace CompressionMembers.Tests.Trust;

/// <summary>
/// Mutation fuzzing of the schedule readers (seeded, bounded in time): random byte flips, deletions, insertions,
/// duplications and truncations of a valid CSV and JSON schedule. Each input must either read — and then check with
/// one result or error row per item — or be refused with the documented FormatException/ArgumentException. No other
/// exception, no hang (each run is bounded by its own time budget), no unbounded memory (the JSON size limit). Each CSV
/// input is also checked by the streamed path, which must write the same bytes or refuse it the same way.
/// </summary>
public class ReaderFuzzTests(ITestOutputHelper output)
{
    private const string Csv = """
        member,case,material,section,method,length_mm,K_y,K_z,N_kN,ey_mm,ez_mm,duration
        P1 jetty post,dead + live,generic-steel,CHS 76x3,johnson,3200,1,1,85,,,
        P2 hall column,dead + live,generic-steel,I 150x150x9x6,perry-robertson,4200,1,0.7,260,,,
        P3 gable strut,wind,generic-steel,RHS 60x60x3,secant,2400,1,1,40,8,,
        """;

    private const string Json = """
        {
          "format": "compression-members/schedule@1",
          "members": [
            { "member": "C1", "material": "generic-steel", "section": "CHS 76x3", "method": "johnson", "length_mm": 3000,
              "cases": [ { "case": "ULS 1", "N_kN": 50 }, { "case": "ULS 2", "N_kN": 90 } ] },
            { "member": "C2", "material": "generic-steel", "section": "rect 50x50", "method": "euler", "length_mm": 1000,
              "cases": [ { "case": "ULS 1", "N_kN": 5 } ] }
          ]
        }
        """;

    private static byte[] Mutate(byte[] source, Random rnd)
    {
        var b = new System.Collections.Generic.List<byte>(source);
        int edits = 1 + rnd.Next(6);
        const string alphabet = ",\"{}[]:\n\r-.0123456789eE+ xX;\\\u00e9\0";
        for (int k = 0; k < edits && b.Count > 0; k++)
        {
            int i = rnd.Next(b.Count);
            switch (rnd.Next(6))
            {
                case 0: b[i] = (byte)rnd.Next(256); break;
                case 1: b.RemoveAt(i); break;
                case 2: b.Insert(i, (byte)alphabet[rnd.Next(alphabet.Length)]); break;
                case 3: b.InsertRange(i, b.GetRange(i, Math.Min(b.Count - i, 1 + rnd.Next(40)))); break;
                case 4: b.RemoveRange(i, b.Count - i); break; // truncation
                default: b.InsertRange(i, Encoding.UTF8.GetBytes(rnd.Next(3) switch { 0 => "1e308", 1 => "-0", _ => "NaN" })); break;
            }
        }
        return b.ToArray();
    }

    private (int read, int refused) Fuzz(bool json, int seed, TimeSpan budget)
    {
        var rnd = new Random(seed);
        byte[] valid = Encoding.UTF8.GetBytes(json ? Json : Csv);
        int read = 0, refused = 0;
        var clock = Stopwatch.StartNew();
        while (clock.Elapsed < budget)
        {
            byte[] input = Mutate(valid, rnd);
            MemberSchedule schedule;
            try
            {
                schedule = json
                    ? MemberSchedule.ReadJson(new MemoryStream(input), "fuzz")
                    : MemberSchedule.ReadCsv(new StringReader(Encoding.UTF8.GetString(input)), "fuzz");
            }
            catch (Exception e) when (e is FormatException or ArgumentException)
            {
                // The streamed check refuses the same CSV inputs, with the same type of error, before writing anything.
                if (!json)
                {
                    var nothing = new StringWriter();
                    Assert.ThrowsAny<FormatException>(() => ScheduleChecker.CheckCsvStreamingInChunks(new StringReader(Encoding.UTF8.GetString(input)), nothing, null, null, 2));
                    Assert.Equal("", nothing.ToString());
                }
                refused++;
                continue;
            }
            catch (Exception e) { throw new Xunit.Sdk.XunitException($"seed {seed}: undocumented {e.GetType().Name} for input «{Encoding.UTF8.GetString(input)}»: {e.Message}"); }
            var outcome = ScheduleChecker.Check(schedule);
            Assert.Equal(schedule.Items.Count, outcome.Rows.Count); // every row accounted for
            if (!json)
            {
                // The streamed check of the same text (chunks of 2 rows) writes the same bytes and counts every row.
                var streamed = new StringWriter();
                var summary = ScheduleChecker.CheckCsvStreamingInChunks(new StringReader(Encoding.UTF8.GetString(input)), streamed, null, null, 2);
                Assert.Equal(outcome.ToCsv(), streamed.ToString());
                Assert.Equal(schedule.Items.Count, summary.RowsRead);
                Assert.True(summary.AllRowsAccountedFor);
            }
            read++;
        }
        return (read, refused);
    }

    [Theory]
    [InlineData(false, 20261201)]
    [InlineData(true, 20261201)]
    public void MutatedSchedules_ReadOrAreRefusedWithDocumentedErrors(bool json, int seed)
    {
        var (read, refused) = Fuzz(json, seed, TimeSpan.FromSeconds(2));
        output.WriteLine($"{(json ? "JSON" : "CSV")} reader fuzz (seed {seed}): {read + refused} mutated inputs, {read} read and checked, {refused} refused");
        Assert.True(read + refused > 50, "the fuzz ran");
    }

    [Fact]
    public void OversizedJson_IsRefusedWithoutReadingItAll()
    {
        // A stream that never ends: the size limit must stop the reader (bounded memory).
        var ex = Assert.ThrowsAny<Exception>(() => MemberSchedule.ReadJson(new EndlessStream(), "huge", maxBytes: 1 << 20));
        Assert.True(ex is FormatException or ArgumentException, ex.GetType().Name);
    }

    private sealed class EndlessStream : Stream
    {
        public override bool CanRead => true;
        public override bool CanSeek => false;
        public override bool CanWrite => false;
        public override long Length => throw new NotSupportedException();
        public override long Position { get => 0; set => throw new NotSupportedException(); }
        public override void Flush() { }
        public override int Read(byte[] buffer, int offset, int count) { Array.Fill(buffer, (byte)' ', offset, count); return count; }
        public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();
        public override void SetLength(long value) => throw new NotSupportedException();
        public override void Write(byte[] buffer, int offset, int count) => throw new NotSupportedException();
    }
}
