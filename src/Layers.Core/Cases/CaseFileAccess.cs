namespace Layers.Core.Cases;

/// <summary>Which files a case may name (its measured data): the user's choice on the command line.</summary>
public enum CaseFileAccess
{
    /// <summary>
    /// Only files in the case file's folder or below it (after symbolic links are resolved): the default, so that a
    /// case from someone else cannot make the tool read, and echo into results, a file the user did not mean.
    /// </summary>
    InsideCaseFolder,

    /// <summary>Any file the user can read (<c>--allow-outside-files</c>).</summary>
    Anywhere,
}
