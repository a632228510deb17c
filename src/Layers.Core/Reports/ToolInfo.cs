using System.Reflection;

namespace Layers.Core.Reports;

/// <summary>Name and version of the tool, recorded in every output.</summary>
public static class ToolInfo
{
    /// <summary>Tool name.</summary>
    public const string Name = "layers";

    /// <summary>Informational version of the core assembly (without build metadata).</summary>
    public static string Version { get; } = (typeof(ToolInfo).Assembly
        .GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion ?? "0.0.0")
        .Split('+')[0];
}
