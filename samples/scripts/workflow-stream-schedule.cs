#:project ../../src/CompressionMembers/CompressionMembers.csproj
#:package UnitsNet@5.75.1
// Stream a schedule too large to hold: ScheduleChecker.CheckCsvStreaming reads a CSV schedule in chunks, checks each
// chunk across the cores and writes the results CSV as it goes, so memory does not grow with the number of rows. With a
// file it is one call:
//     using var input = File.OpenText("schedule.csv"); using var output = new StreamWriter("results.csv");
//     var summary = ScheduleChecker.CheckCsvStreaming(input, output, options: new BatchOptions(2));
// Here the schedule is invented row by row as it is read (steel posts and struts, Euler and Johnson, four sections, a
// bad row in every thousand), checked on 1 core and on 2, twice over; the script prints rows per second, the speed-up,
// the peak managed heap and the summary, and checks that every run wrote the same bytes.
// Rows: the first argument (100,000 by default). The figures in docs/workflows.md come from
//     dotnet run -c Release workflow-stream-schedule.cs -- 1000000
using System;
using System.Diagnostics;
using System.Globalization;
using System.IO;
using System.Security.Cryptography;
using System.Text;
using CompressionMembers.Workflows.Batch;
using CompressionMembers.Workflows.Schedules;

int rows = args.Length > 0 ? int.Parse(args[0], CultureInfo.InvariantCulture) : 100_000;
ScheduleChecker.CheckCsvStreaming(new InventedSchedule(20_000), TextWriter.Null); // warm up (JIT) before timing

// Two rounds of 1 core then 2 cores; the speed-up is taken from the second round, when the JIT has settled.
string? firstHash = null;
var rate = new double[3];
for (int round = 1; round <= 2; round++)
{
    foreach (int cores in new[] { 1, 2 })
    {
        GC.Collect();
        var heap = new HeapPeak();
        var output = new HashingWriter();
        var clock = Stopwatch.StartNew();
        var summary = ScheduleChecker.CheckCsvStreaming(new InventedSchedule(rows), output, options: new BatchOptions(cores, heap));
        clock.Stop();
        rate[cores] = rows / clock.Elapsed.TotalSeconds;
        string hash = output.Hash();
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"round {round}, {cores} core{(cores == 1 ? " " : "s")}: {summary}; {rate[cores],9:0} rows/s; peak managed heap {heap.PeakBytes / (1 << 20)} MiB; results SHA-256 {hash[..16]}"));
        if (!summary.AllRowsAccountedFor || summary.RowsRead != rows) { Console.WriteLine("rows went missing"); return 1; }
        firstHash ??= hash;
        if (hash != firstHash) { Console.WriteLine("the runs wrote different results"); return 1; }
    }
}
Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"2 cores / 1 core: {rate[2] / rate[1]:0.00}x (round 2)"));
Console.WriteLine(CompressionMembers.LibraryInfo.Caution);
return 0;

/// <summary>A CSV schedule made one line at a time as it is read; only the current line is ever held.</summary>
sealed class InventedSchedule(int rows) : TextReader
{
    private static readonly string[] Sections = ["CHS 76x3", "SHS 60x60x3", "rect 60x100", "chs 60x3"];
    private string _line = "member,case,material,section,method,length_mm,K_y,K_z,N_kN\n";
    private int _pos, _made;

    private bool More()
    {
        if (_pos < _line.Length) return true;
        if (_made == rows) return false;
        int i = _made++;
        string load = i % 1000 == 999 ? "ninety" : (5 + i % 120).ToString(CultureInfo.InvariantCulture); // a bad row in every thousand
        _line = string.Create(CultureInfo.InvariantCulture,
            $"M{i / 4},case {i % 4},generic-steel,{Sections[i % 4]},{(i % 2 == 0 ? "euler" : "johnson")},{1000 + i % 97 * 25},1,1,{load}\n");
        _pos = 0;
        return true;
    }

    public override int Read(char[] buffer, int index, int count) => Read(buffer.AsSpan(index, count));

    public override int Read(Span<char> buffer)
    {
        int n = 0;
        while (n < buffer.Length && More())
        {
            int k = Math.Min(buffer.Length - n, _line.Length - _pos);
            _line.AsSpan(_pos, k).CopyTo(buffer[n..]);
            _pos += k;
            n += k;
        }
        return n;
    }

    public override int Peek() => More() ? _line[_pos] : -1;
    public override int Read() => More() ? _line[_pos++] : -1;
}

/// <summary>A results writer that keeps nothing but a SHA-256 of the UTF-8 bytes.</summary>
sealed class HashingWriter : TextWriter
{
    private readonly IncrementalHash _hash = IncrementalHash.CreateHash(HashAlgorithmName.SHA256);
    private readonly Encoder _utf8 = new UTF8Encoding(false).GetEncoder();
    private readonly byte[] _bytes = new byte[3 * 4096 + 4];

    public override Encoding Encoding => Encoding.UTF8;
    public string Hash() => Convert.ToHexStringLower(_hash.GetCurrentHash());
    public override void Write(char value) => Write([value]);
    public override void Write(char[] buffer, int index, int count) => Write(buffer.AsSpan(index, count));
    public override void Write(string? value) => Write(value.AsSpan());

    public override void Write(ReadOnlySpan<char> text)
    {
        while (!text.IsEmpty)
        {
            var piece = text[..Math.Min(text.Length, 4096)];
            _hash.AppendData(_bytes, 0, _utf8.GetBytes(piece, _bytes, flush: false));
            text = text[piece.Length..];
        }
    }
}

/// <summary>Samples the managed heap at each progress report (once per chunk).</summary>
sealed class HeapPeak : IProgress<BatchProgress>
{
    public long PeakBytes { get; private set; }
    public void Report(BatchProgress value) => PeakBytes = Math.Max(PeakBytes, GC.GetTotalMemory(false));
}
