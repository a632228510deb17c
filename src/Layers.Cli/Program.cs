using System.CommandLine;
using Layers.Cli.Commands;

// Ctrl+C and SIGTERM cancel the token given to the actions (InterruptScope); a batch then stops its running cases and
// writes its summary, for which it is given more than the default two seconds.
var configuration = new InvocationConfiguration { ProcessTerminationTimeout = TimeSpan.FromSeconds(30) };
return await CliApp.InvokeAsync(CliApp.Build(Console.Out, Console.Error).Parse(args), configuration).ConfigureAwait(false);
