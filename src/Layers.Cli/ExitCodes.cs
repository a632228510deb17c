namespace Layers.Cli;

/// <summary>The exit codes of <c>layers</c>, documented in the README and docs/cli.md.</summary>
public static class ExitCodes
{
    /// <summary>Success.</summary>
    public const int Success = 0;

    /// <summary>The command line itself was wrong (unknown option, missing argument).</summary>
    public const int Usage = 1;

    /// <summary>A case file is invalid: unreadable, not JSON, or breaking a rule of the format.</summary>
    public const int InvalidInput = 2;

    /// <summary>The solver stopped before the end of the duration.</summary>
    public const int SolverFailed = 3;

    /// <summary>The results could not be written.</summary>
    public const int OutputFailed = 4;

    /// <summary><c>layers verify</c>: at least one benchmark is outside its tolerance.</summary>
    public const int VerificationFailed = 5;
}
