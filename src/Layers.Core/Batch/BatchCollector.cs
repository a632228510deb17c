using Layers.Core.Cases;
using Layers.Core.Files;
using Layers.Core.Results;
using Layers.Core.Studies;

namespace Layers.Core.Batch;

/// <summary>
/// Turns the paths given to <c>layers run</c> into the list of cases to run: a folder stands for every <c>*.json</c>
/// in it (in its sub-folders too when recursive), a sweep file for its sub-cases. A file that cannot be read or a
/// sweep that cannot be expanded becomes a case with its errors, so that it gets its own row like any other bad
/// case. The list is ordered by name, so everything derived from it is independent of the order of the paths.
/// </summary>
public static class BatchCollector
{
    /// <summary>Collects the cases.</summary>
    /// <param name="paths">Case files and folders as given.</param>
    /// <param name="recursive">Look into sub-folders of the folders given.</param>
    public static BatchCollection Collect(IEnumerable<string> paths, bool recursive)
    {
        var files = new List<string>();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var path in paths)
        {
            var found = Directory.Exists(path)
                ? JsonFilesIn(path, recursive).Order(StringComparer.Ordinal).ToList()
                : new List<string> { path };
            files.AddRange(found.Where(file => seen.Add(Path.GetFullPath(file))));
        }

        var items = new List<BatchItem>();
        var sweeps = new List<SweepGroup>();
        foreach (var file in files)
        {
            items.AddRange(Expand(file, sweeps));
        }

        return new BatchCollection(WithVariedInputs(MarkDuplicates(items)), sweeps.OrderBy(sweep => sweep.Name, StringComparer.Ordinal).ToList());
    }

    /// <summary>
    /// The *.json in a folder and, when recursive, in its sub-folders, entering each real folder once: a symbolic
    /// link back to a folder already entered (a loop, or a second way to the same cases) is not followed again,
    /// where the system's own walk would follow a loop until the path grows 40 links deep.
    /// </summary>
    private static List<string> JsonFilesIn(string root, bool recursive)
    {
        var files = new List<string>();
        var entered = new HashSet<string>(StringComparer.Ordinal);
        var pending = new Stack<string>([root]);
        while (pending.Count > 0)
        {
            var folder = pending.Pop();
            if (RealPath.Of(folder) is not { } real || !entered.Add(real))
            {
                continue;
            }

            files.AddRange(Directory.EnumerateFiles(folder, "*.json"));
            if (recursive)
            {
                // Pushed last-first, so that of two ways to one folder the first by name is the one kept.
                foreach (var sub in Directory.EnumerateDirectories(folder).Order(StringComparer.Ordinal).Reverse())
                {
                    pending.Push(sub);
                }
            }
        }

        return files;
    }

    private static IEnumerable<BatchItem> Expand(string file, List<SweepGroup> sweeps)
    {
        var name = Path.GetFileNameWithoutExtension(file);
        if (CaseReader.ReadDocument(file, out var error) is not { } text)
        {
            return [new BatchItem(name, file, null, [error!], [])];
        }

        if (!SweepExpander.Declares(text))
        {
            return [new BatchItem(name, file, text, [], [])];
        }

        var expansion = SweepExpander.Expand(text, file);
        if (!expansion.IsValid || expansion.Result is not { } result)
        {
            return [new BatchItem(name, file, null, expansion.Errors, [])];
        }

        sweeps.Add(new SweepGroup(name, file, result, expansion.Variants.Select(variant => variant.Name).ToList()) { ResultPeriod = expansion.ResultPeriod });
        var figure = NamedResults.IsReadInPeriod(result) ? new ResultMeasure(result) { Period = expansion.ResultPeriod } : null;
        return expansion.Variants.Select(variant => new BatchItem(variant.Name, file, variant.Json, [], variant.Values) { PeriodFigure = figure });
    }

    /// <summary>
    /// The plain case files with the inputs that differ between them, found over the whole batch before it is
    /// sharded, so that every shard writes the same input columns and merged shards match one unsharded run.
    /// </summary>
    private static List<BatchItem> WithVariedInputs(List<BatchItem> items)
    {
        var plain = Enumerable.Range(0, items.Count).Where(position => items[position].Parameters.Count == 0).ToList();
        var inputs = VariedInputs.Of(plain.Select(position => items[position].Json).ToList());
        var result = items.ToList();
        for (var i = 0; i < plain.Count; i++)
        {
            result[plain[i]] = items[plain[i]] with { Inputs = inputs[i] };
        }

        return result;
    }

    /// <summary>
    /// Two cases with one name would write the same results folder: the first by file path keeps the name, the
    /// others are refused with a message naming the file that has it.
    /// </summary>
    private static List<BatchItem> MarkDuplicates(List<BatchItem> items)
    {
        var ordered = items.OrderBy(item => item.Name, StringComparer.Ordinal).ThenBy(item => item.File, StringComparer.Ordinal).ToList();
        for (var i = 1; i < ordered.Count; i++)
        {
            var first = ordered.FindIndex(item => item.Name == ordered[i].Name);
            if (first < i)
            {
                var error = new CaseError("$", $"the case name '{ordered[i].Name}' is already used by {ordered[first].File}; results folders are named after the case, so rename one file");
                ordered[i] = ordered[i] with { Json = null, Errors = [.. ordered[i].Errors, error] };
            }
        }

        return ordered;
    }
}
