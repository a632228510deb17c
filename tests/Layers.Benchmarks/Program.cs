using BenchmarkDotNet.Running;

namespace Layers.Benchmarks;

/// <summary>
/// `dotnet run -c Release --project tests/Layers.Benchmarks -- [BenchmarkDotNet options]` runs the benchmarks
/// (for example `--filter '*'`); `-- work-precision --out FOLDER` writes the work-precision diagram and its CSV;
/// `-- export-system --out FOLDER` writes the systems and timings of the stiff-peer comparison
/// (tests/benchmarks/stiff-peers.sh).
/// </summary>
internal static class Program
{
    public static int Main(string[] args)
    {
        if (args.Length > 0 && args[0] == "work-precision")
        {
            var at = Array.IndexOf(args, "--out");
            var folder = at >= 0 && at + 1 < args.Length ? args[at + 1] : Path.Combine("docs", "performance");
            return WorkPrecision.Run(folder, Console.Out);
        }

        if (args.Length > 0 && args[0] == "export-system")
        {
            var at = Array.IndexOf(args, "--out");
            var folder = at >= 0 && at + 1 < args.Length ? args[at + 1] : "stiff-peers";
            return Peers.ExportSystemCommand.Run(folder, Console.Out);
        }

        if (args.Length > 0 && args[0] == "method-costs")
        {
            return MethodCosts.Run(Console.Out);
        }

        BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
        return 0;
    }
}
