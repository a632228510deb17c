using Layers.Cli.Commands;

return CliApp.Build(Console.Out, Console.Error).Parse(args).Invoke();
