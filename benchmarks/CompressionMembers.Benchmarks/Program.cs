using BenchmarkDotNet.Running;

// Run: dotnet run -c Release --project benchmarks/CompressionMembers.Benchmarks -- --filter '*' --job short
// A second opinion without BenchmarkDotNet's engine (PlainLoop.cs):
//      dotnet run -c Release --project benchmarks/CompressionMembers.Benchmarks -- --plain-loop Fire Ec5Bending --processes 6
if (args.Length > 0 && args[0] == "--plain-loop")
    return CompressionMembers.Benchmarks.PlainLoop.Run(args[1..]);
// The batches' two-core speed-up in one process, beside the machine's own ceiling (PlainBatch.cs):
//      dotnet run -c Release --project benchmarks/CompressionMembers.Benchmarks -- --plain-batch --rounds 9
if (args.Length > 0 && args[0] == "--plain-batch")
    return CompressionMembers.Benchmarks.PlainBatch.Run(args[1..]);
// Both of the machine's speeds in one long-running process, tick by tick (PlainTicks.cs):
//      dotnet run -c Release --project benchmarks/CompressionMembers.Benchmarks -- --plain-ticks --minutes 20
if (args.Length > 0 && args[0] == "--plain-ticks")
    return CompressionMembers.Benchmarks.PlainTicks.Run(args[1..]);
BenchmarkSwitcher.FromAssembly(typeof(CompressionMembers.Benchmarks.MethodBenchmarks).Assembly).Run(args);
return 0;
