using System.Globalization;
using System.Text;

namespace Layers.Core.Files;

/// <summary>
/// The one way the tool reads a text file it is given (case files, the data files they name, shard summaries): only
/// a regular file, checked before it is opened so that a FIFO never blocks; at most a set number of bytes, so that
/// /dev/zero or a huge file cannot exhaust memory; strictly UTF-8, so that a file in another encoding is reported
/// at its first bad byte instead of read with replacement characters. Messages name the file and never quote its
/// content.
/// </summary>
public static class InputFile
{
    /// <summary>Largest case file or data file a case names, bytes (64 MiB: far above any real case or measurement series).</summary>
    public const long CaseLimitBytes = 64L << 20;

    /// <summary>Largest shard summary read by <c>layers merge</c>, bytes (1 GiB: some million rows).</summary>
    public const long SummaryLimitBytes = 1L << 30;

    private static readonly UTF8Encoding StrictUtf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true);

    /// <summary>The text of the file, or null with the reason in <paramref name="problem"/> (without the file's name, which the caller gives).</summary>
    /// <param name="path">The file.</param>
    /// <param name="limitBytes">The largest size accepted.</param>
    /// <param name="problem">Why the file was not read.</param>
    public static string? ReadText(string path, long limitBytes, out string? problem)
    {
        ArgumentNullException.ThrowIfNull(path);
        problem = null;
        var kind = FileKind.Of(path);
        if (kind == FileKind.Kind.Missing)
        {
            problem = "no such file";
            return null;
        }

        if (kind is not (FileKind.Kind.Regular or FileKind.Kind.Unknown))
        {
            problem = $"not a regular file but {FileKind.Describe(kind)}; only regular files are read";
            return null;
        }

        byte[] bytes;
        try
        {
            bytes = ReadAtMost(path, limitBytes);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            problem = $"cannot read the file: {exception.Message}";
            return null;
        }

        if (bytes.LongLength > limitBytes)
        {
            problem = $"larger than the limit of {Size(limitBytes)} for this kind of file";
            return null;
        }

        var start = bytes.AsSpan().StartsWith(StrictUtf8.Preamble) ? StrictUtf8.Preamble.Length : 0;
        try
        {
            return StrictUtf8.GetString(bytes, start, bytes.Length - start);
        }
        catch (DecoderFallbackException exception)
        {
            var offset = start + Math.Max(0, exception.Index);
            var line = 1 + bytes.AsSpan(0, Math.Min(offset, bytes.Length)).Count((byte)'\n');
            var value = exception.BytesUnknown is { Length: > 0 } unknown ? string.Create(CultureInfo.InvariantCulture, $"0x{unknown[0]:X2}") : "?";
            problem = string.Create(CultureInfo.InvariantCulture, $"not UTF-8: byte {value} at offset {offset} (line {line}) is not valid UTF-8; save the file as UTF-8");
            return null;
        }
    }

    /// <summary>A size limit for messages: in MiB when it is a whole number of them.</summary>
    public static string Size(long bytes) => bytes >= 1L << 20 && bytes % (1L << 20) == 0
        ? string.Create(CultureInfo.InvariantCulture, $"{bytes >> 20} MiB")
        : string.Create(CultureInfo.InvariantCulture, $"{bytes} bytes");

    /// <summary>Up to <paramref name="limitBytes"/> + 1 bytes: one more than allowed tells a file over the limit.</summary>
    private static byte[] ReadAtMost(string path, long limitBytes)
    {
        using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, bufferSize: 1, FileOptions.SequentialScan);
        using var memory = new MemoryStream();
        var buffer = new byte[81920];
        while (memory.Length <= limitBytes)
        {
            var wanted = (int)Math.Min(buffer.Length, limitBytes + 1 - memory.Length);
            var read = stream.Read(buffer, 0, wanted);
            if (read == 0)
            {
                break;
            }

            memory.Write(buffer, 0, read);
        }

        return memory.ToArray();
    }
}
