namespace Layers.Cli;

/// <summary>
/// The exit codes of <c>layers</c>, documented in the README and docs/cli.md. 0, 1 and 2 are the outcomes of the
/// cases (for one case or a batch); 3 and 4 say more precisely what went wrong with a single case; usage errors
/// have their own code so that 1 can only mean a limit was exceeded.
/// </summary>
public static class ExitCodes
{
    /// <summary>Every case succeeded (and was within its limit, where one is given).</summary>
    public const int Success = 0;

    /// <summary>
    /// Some case exceeded its limit: the food's concentration at the end is above its specific migration limit.
    /// </summary>
    public const int LimitExceeded = 1;

    /// <summary>
    /// A case file is invalid (unreadable, not JSON, or breaking a rule of the format); in a batch, some case was
    /// invalid or failed.
    /// </summary>
    public const int InvalidInput = 2;

    /// <summary>The solver stopped before the end of the duration (a single case).</summary>
    public const int SolverFailed = 3;

    /// <summary>The results (or a batch's summary files) could not be written.</summary>
    public const int OutputFailed = 4;

    /// <summary><c>layers verify</c>: at least one benchmark is outside its tolerance.</summary>
    public const int VerificationFailed = 5;

    /// <summary>
    /// A study finished without a trustworthy answer: <c>layers design</c> found no value of the input in the allowed
    /// range that gives the target (the message names the results found); <c>layers fit</c> wrote its results, but some
    /// estimate is not identifiable from the data or the search stopped at its iteration limit.
    /// </summary>
    public const int NoTrustworthyAnswer = 6;

    /// <summary>The command line itself was wrong (unknown option, missing argument): EX_USAGE of sysexits.h.</summary>
    public const int Usage = 64;

    /// <summary>Interrupted (Ctrl+C or SIGTERM): 128 + SIGINT, the shell convention; nothing new is written for the cases not finished.</summary>
    public const int Cancelled = 130;
}
