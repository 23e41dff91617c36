using BenchmarkDotNet.Running;

// Run: dotnet run -c Release --project benchmarks/CompressionMembers.Benchmarks -- --filter '*' --job short
BenchmarkSwitcher.FromAssembly(typeof(CompressionMembers.Benchmarks.MethodBenchmarks).Assembly).Run(args);
