using System;
using System.Collections.Generic;
using System.IO;
using System.Runtime.ExceptionServices;
using System.Text;
using System.Threading;
using System.Threading.Tasks;
using CompressionMembers.Internal;
using CompressionMembers.Workflows.Batch;
using CompressionMembers.Workflows.Registry;

namespace CompressionMembers.Workflows.Schedules;

/// <summary>The streamed check of a CSV schedule behind <see cref="ScheduleChecker.CheckCsvStreaming"/>: rows are read in
/// chunks of a fixed size, each chunk is checked across cores in slices, and the result lines are written in input
/// order, so memory holds two chunks whatever the length of the schedule.</summary>
/// <remarks>
/// <para>The pipeline: while the cores check chunk k, the calling thread reads chunk k + 1 and then writes the results of
/// chunk k. Each chunk is cut into <see cref="SlicesPerChunk"/> slices; slice s of every chunk uses its own name memory
/// (<see cref="ScheduleNames"/>) and its own output text, so nothing on the hot path is shared or locked, and the bytes
/// are the same whatever the number of cores or the order in which slices finish.</para>
/// <para>A row is read, checked and written by exactly the code of the in-memory path (<see cref="MemberSchedule"/>,
/// <see cref="ScheduleChecker.CheckRow(ScheduleItem, out string?, out string?)"/>, <see cref="ScheduleOutcome"/>'s CSV
/// row), so both give the same bytes.</para>
/// </remarks>
internal static class StreamedScheduleCheck
{
    /// <summary>Rows per chunk: big enough that a chunk's slices outweigh the cost of starting them, small enough that
    /// the two chunks alive at a time (a few megabytes) die young. Measured: 8,192-row chunks lived long enough to be
    /// promoted and cost gen-2 collections, and ran 15–25 % slower than 2,048 (docs/workflows.md).</summary>
    internal const int DefaultChunkRows = 2048;

    /// <summary>Slices per chunk: several per core, so a slow slice does not hold up the chunk.</summary>
    internal const int SlicesPerChunk = 16;

    internal static ScheduleStreamSummary Run(TextReader schedule, TextWriter results, NameRegistry registry, BatchOptions options, int chunkRows)
    {
        var reader = new CsvRecordReader(schedule);
        var header = MemberSchedule.ReadCsvHeader(reader);
        var run = new StreamRun(reader, header, registry, options, chunkRows, results);
        return run.Execute();
    }

    /// <summary>One streamed check: the reader, two chunks in turn, the per-slice name memories and the counts.</summary>
    private sealed class StreamRun
    {
        private readonly CsvRecordReader _reader;
        private readonly int[] _columns;
        private readonly ScheduleNames[] _names = new ScheduleNames[SlicesPerChunk];
        private readonly Chunk[] _chunks;
        private readonly int _chunkRows;
        private readonly TextWriter _results;
        private readonly CancellationToken _token;
        private readonly IProgress<BatchProgress>? _progress;
        private readonly ParallelOptions? _parallel;
        private readonly List<string> _record = [];
        private ExceptionDispatchInfo? _readError;
        private long _read, _written, _passed, _failed, _errors;

        internal StreamRun(CsvRecordReader reader, string[] header, NameRegistry registry, BatchOptions options, int chunkRows, TextWriter results)
        {
            _reader = reader;
            _columns = MemberSchedule.ColumnIndex(header);
            for (int s = 0; s < SlicesPerChunk; s++) _names[s] = new ScheduleNames(registry);
            _chunkRows = chunkRows;
            _chunks = [new Chunk(chunkRows, header.Length), new Chunk(chunkRows, header.Length)];
            _results = results;
            _token = options.CancellationToken;
            _progress = options.Progress;
            if (options.MaxDegreeOfParallelism != 1)
                _parallel = new ParallelOptions { MaxDegreeOfParallelism = options.MaxDegreeOfParallelism, CancellationToken = _token };
        }

        internal ScheduleStreamSummary Execute()
        {
            _token.ThrowIfCancellationRequested();
            var head = new StringBuilder();
            ScheduleOutcome.WriteCsvHeader(new CsvRecordWriter(head));
            _results.Write(head);
            var (current, next) = (_chunks[0], _chunks[1]);
            if (_parallel is null)
            {
                // One core: read, check and write in turn on the calling thread.
                while (Fill(current) > 0)
                {
                    for (int s = 0; s < SlicesPerChunk; s++) CheckSlice(current, s);
                    Emit(current);
                }
            }
            else
            {
                Task? checking = null;
                try
                {
                    if (Fill(current) > 0)
                    {
                        checking = Start(current);
                        while (true)
                        {
                            int more = Fill(next); // read the next chunk while the cores check this one
                            var done = checking!;
                            checking = null;
                            done.GetAwaiter().GetResult();
                            if (more > 0) checking = Start(next);
                            Emit(current); // write this chunk's results while the cores check the next
                            if (more == 0) break;
                            (current, next) = (next, current);
                        }
                    }
                }
                finally
                {
                    // Leave no check running behind an exception (a refused record, a cancellation).
                    if (checking is not null)
                    {
                        try { checking.Wait(CancellationToken.None); }
                        catch (AggregateException) { }
                    }
                }
            }
            _results.Flush();
            _readError?.Throw();
            return new ScheduleStreamSummary(_read, _written, _passed, _failed, _errors);
        }

        private Task Start(Chunk chunk) => Task.Run(() => { Parallel.For(0, SlicesPerChunk, _parallel!, s => CheckSlice(chunk, s)); }, CancellationToken.None);

        /// <summary>Reads up to a chunk of rows. A record the reader refuses (longer than its limit) ends the input here;
        /// the rows before it are still checked and written, then the error is thrown.</summary>
        private int Fill(Chunk chunk)
        {
            _token.ThrowIfCancellationRequested();
            chunk.Count = 0;
            if (_readError is not null) return 0;
            try
            {
                while (chunk.Count < _chunkRows && _reader.Read(_record, out long line))
                {
                    var fields = chunk.Fields[chunk.Count];
                    for (int k = 0; k < fields.Length; k++) fields[k] = k < _record.Count ? _record[k] : "";
                    chunk.Extra[chunk.Count] = _record.Count > fields.Length;
                    chunk.Lines[chunk.Count] = line;
                    chunk.Count++;
                }
            }
            catch (FormatException ex)
            {
                _readError = ExceptionDispatchInfo.Capture(ex);
            }
            _read += chunk.Count;
            return chunk.Count;
        }

        /// <summary>Reads, checks and formats the rows of one slice of a chunk into the slice's own text.</summary>
        private void CheckSlice(Chunk chunk, int slice)
        {
            var output = chunk.Output[slice];
            output.Reset();
            var names = _names[slice];
            int from = (int)((long)chunk.Count * slice / SlicesPerChunk), to = (int)((long)chunk.Count * (slice + 1) / SlicesPerChunk);
            for (int i = from; i < to; i++)
            {
                if (_token.IsCancellationRequested) return; // the chunk is then never written
                var item = MemberSchedule.CsvItem(chunk.Lines[i], chunk.Fields[i], chunk.Extra[i], _columns, names);
                var result = ScheduleChecker.CheckRow(item, out var error, out var fingerprint);
                ScheduleOutcome.WriteCsvRow(output.Csv, item, result, error, fingerprint ?? "", names);
                if (result is not { } r) output.Errors++;
                else if (r.Passed) output.Passed++;
                else output.Failed++;
            }
        }

        /// <summary>Writes a checked chunk's results in slice order and reports progress.</summary>
        private void Emit(Chunk chunk)
        {
            _token.ThrowIfCancellationRequested();
            foreach (var output in chunk.Output)
            {
                _results.Write(output.Text);
                _written += output.Csv.Records;
                _passed += output.Passed;
                _failed += output.Failed;
                _errors += output.Errors;
            }
            _progress?.Report(new BatchProgress(Clamp(_written), Clamp(_read)));
        }

        private static int Clamp(long n) => n > int.MaxValue ? int.MaxValue : (int)n;
    }

    /// <summary>The rows of one chunk (reused from chunk to chunk) and the output of each of its slices.</summary>
    private sealed class Chunk
    {
        internal Chunk(int rows, int columns)
        {
            Lines = new long[rows];
            Extra = new bool[rows];
            Fields = new string[rows][];
            for (int i = 0; i < rows; i++) Fields[i] = new string[columns];
            Output = new SliceOutput[SlicesPerChunk];
            for (int s = 0; s < SlicesPerChunk; s++) Output[s] = new SliceOutput();
        }

        internal long[] Lines { get; }
        internal bool[] Extra { get; }
        internal string[][] Fields { get; }
        internal SliceOutput[] Output { get; }
        internal int Count { get; set; }
    }

    /// <summary>The result lines of one slice and their counts.</summary>
    private sealed class SliceOutput
    {
        internal SliceOutput()
        {
            Text = new StringBuilder();
            Csv = new CsvRecordWriter(Text);
        }

        internal StringBuilder Text { get; }
        internal CsvRecordWriter Csv { get; }
        internal long Passed { get; set; }
        internal long Failed { get; set; }
        internal long Errors { get; set; }

        internal void Reset()
        {
            Text.Clear();
            Csv.ResetCount();
            Passed = Failed = Errors = 0;
        }
    }
}
