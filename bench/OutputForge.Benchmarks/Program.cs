using BenchmarkDotNet.Running;

BenchmarkSwitcher.FromAssembly(typeof(OutputForge.Benchmarks.FisherBenchmarks).Assembly).Run(args);
