using System;
using System.Diagnostics;
using System.Globalization;
using System.IO;
using System.Security.Cryptography;
using System.Text;
using CompressionMembers.Workflows.Batch;
using CompressionMembers.Workflows.Schedules;
using Xunit.Abstractions;

namespace CompressionMembers.Tests.Trust;

/// <summary>Tests that sample the process's managed heap run alone: other tests running beside them would allocate into
/// the same heap.</summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class HeapSensitiveCollection
{
    /// <summary>The collection's name.</summary>
    public const string Name = "heap-sensitive (runs alone)";
}

/// <summary>A million-row schedule is checked in bounded memory, streamed from a reader that makes rows as they are read
/// into a writer that only counts and hashes, with every row accounted for.</summary>
[Collection(HeapSensitiveCollection.Name)]
public class MillionRowScheduleTests(ITestOutputHelper output)
{
    private const int Rows = 1_000_000;

    /// <summary>The managed heap may not pass this at any point of the run, whatever the row count: two chunks of rows
    /// and their results are a few megabytes, and the rest is garbage awaiting a gen-0 collection. (Reading the whole
    /// schedule into memory and checking it keeps about 1.1 KB a row instead: 1.1 GB for a million rows, measured.)</summary>
    private const long HeapBoundBytes = 128L << 20;

    [Fact]
    public void CheckCsvStreaming_AMillionRows_InBoundedMemory_EveryRowAccountedFor()
    {
        GC.Collect();
        GC.WaitForPendingFinalizers();
        GC.Collect();
        long before = GC.GetTotalMemory(false);
        var heap = new HeapSampler();
        var schedule = new GeneratedSchedule(Rows);
        var results = new CountingHashWriter();
        var clock = Stopwatch.StartNew();
        var summary = ScheduleChecker.CheckCsvStreaming(schedule, results, null, new BatchOptions(-1, heap));
        clock.Stop();

        Assert.Equal(Rows, schedule.RowsMade);
        Assert.Equal(Rows, summary.RowsRead);
        Assert.Equal(Rows, summary.RowsWritten);
        Assert.Equal(Rows + 1, results.Lines); // the header and one line per row
        Assert.Equal(Rows, summary.PassedCount + summary.FailedCount + summary.ErrorCount);
        Assert.Equal(GeneratedSchedule.ErrorRows(Rows), summary.ErrorCount); // the rows made bad on purpose, no more
        Assert.True(summary.AllRowsAccountedFor);
        Assert.True(heap.Samples >= Rows / 2048, $"{heap.Samples} heap samples"); // one per chunk
        Assert.True(heap.PeakTotalBytes < HeapBoundBytes, $"managed heap peaked at {heap.PeakTotalBytes >> 20} MiB");

        output.WriteLine($"{summary} in {clock.Elapsed.TotalSeconds:0.0} s: {Rows / clock.Elapsed.TotalSeconds:0} rows/s on {Environment.ProcessorCount} cores");
        output.WriteLine($"managed heap: {before >> 20} MiB before; peak {heap.PeakTotalBytes >> 20} MiB (GC.GetTotalMemory), {heap.PeakHeapSizeBytes >> 20} MiB (GCMemoryInfo.HeapSizeBytes); bound {HeapBoundBytes >> 20} MiB; {heap.Samples} samples");
        output.WriteLine($"results CSV: {results.Lines} lines, {results.Bytes} bytes UTF-8, SHA-256 {results.Hash()}");
    }

    /// <summary>Samples the heap on every progress report (once per chunk, on the calling thread).</summary>
    private sealed class HeapSampler : IProgress<BatchProgress>
    {
        public long PeakTotalBytes, PeakHeapSizeBytes;
        public int Samples;

        public void Report(BatchProgress value)
        {
            Samples++;
            PeakTotalBytes = Math.Max(PeakTotalBytes, GC.GetTotalMemory(false));
            PeakHeapSizeBytes = Math.Max(PeakHeapSizeBytes, GC.GetGCMemoryInfo().HeapSizeBytes);
        }
    }
}

/// <summary>A CSV schedule made row by row as it is read: only the current row is ever held as text. Cheap classical
/// methods (Euler, Johnson) on a few distinct sections, lengths and loads varying with the row; every 1000th row is
/// made bad on purpose (a load that is not a number, or an unknown material).</summary>
internal sealed class GeneratedSchedule(int rows) : TextReader
{
    private static readonly string[] Sections = ["CHS 76x3", "SHS 60x60x3", "rect 60x100", "chs 60x3"];
    private string _current = "member,case,material,section,method,length_mm,K_y,K_z,N_kN\n";
    private int _pos;

    public int RowsMade { get; private set; }

    public static long ErrorRows(int rows) => rows / 1000;

    private bool Next()
    {
        if (_pos < _current.Length) return true;
        if (RowsMade == rows) return false;
        int i = RowsMade++;
        var inv = CultureInfo.InvariantCulture;
        string n = i % 1000 == 999 ? (i % 2000 == 999 ? "many" : "85") : (5 + i % 120).ToString(inv);
        string material = i % 2000 == 1999 ? "unobtainium" : "generic-steel";
        _current = string.Create(inv, $"M{i / 4},case {i % 4},{material},{Sections[i % Sections.Length]},{(i % 2 == 0 ? "euler" : "johnson")},{1000 + i % 97 * 25},1,1,{n}\n");
        _pos = 0;
        return true;
    }

    public override int Read(char[] buffer, int index, int count) => Read(buffer.AsSpan(index, count));

    public override int Read(Span<char> buffer)
    {
        int written = 0;
        while (written < buffer.Length && Next())
        {
            int n = Math.Min(buffer.Length - written, _current.Length - _pos);
            _current.AsSpan(_pos, n).CopyTo(buffer[written..]);
            _pos += n;
            written += n;
        }
        return written;
    }

    public override int Peek() => Next() ? _current[_pos] : -1;

    public override int Read() => Next() ? _current[_pos++] : -1;
}

/// <summary>A results writer that keeps nothing: it counts lines and UTF-8 bytes and hashes them.</summary>
internal sealed class CountingHashWriter : TextWriter
{
    private readonly IncrementalHash _hash = IncrementalHash.CreateHash(HashAlgorithmName.SHA256);
    private readonly byte[] _bytes = new byte[3 * 4096 + 4];
    private readonly Encoder _utf8 = new UTF8Encoding(false).GetEncoder();

    public long Lines { get; private set; }
    public long Bytes { get; private set; }
    public override Encoding Encoding => Encoding.UTF8;

    public string Hash() => Convert.ToHexStringLower(_hash.GetCurrentHash());

    public override void Write(char value) => Write([value]);

    public override void Write(char[] buffer, int index, int count) => Write(buffer.AsSpan(index, count));

    public override void Write(string? value) => Write(value.AsSpan());

    public override void Write(ReadOnlySpan<char> buffer)
    {
        while (!buffer.IsEmpty)
        {
            var piece = buffer[..Math.Min(buffer.Length, 4096)];
            Lines += piece.Count('\n');
            int n = _utf8.GetBytes(piece, _bytes, flush: false);
            _hash.AppendData(_bytes, 0, n);
            Bytes += n;
            buffer = buffer[piece.Length..];
        }
    }

    protected override void Dispose(bool disposing)
    {
        if (disposing) _hash.Dispose();
        base.Dispose(disposing);
    }
}
