using System.Buffers.Binary;
using SkiaSharp;

namespace Layers.Tests.Plotting;

/// <summary>
/// What the tests read from a PNG: the signature and IHDR size straight from the bytes (PNG specification,
/// ISO/IEC 15948, sections 5.2 and 11.2.2), and the pixels decoded by SkiaSharp for a blankness check.
/// </summary>
internal static class PngImage
{
    private static readonly byte[] Signature = [0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A];

    /// <summary>True when the bytes start with the eight-byte PNG signature.</summary>
    public static bool HasSignature(byte[] png) => png.Length >= Signature.Length && png.AsSpan(0, Signature.Length).SequenceEqual(Signature);

    /// <summary>Width and height from the IHDR chunk, which must be the first chunk.</summary>
    public static (int Width, int Height) HeaderSize(byte[] png)
    {
        // Signature (8), chunk length (4), chunk type "IHDR" (4), then width and height as big-endian 32-bit.
        Assert.True(png.Length >= 24, "too short for a PNG header");
        Assert.Equal("IHDR", System.Text.Encoding.ASCII.GetString(png, 12, 4));
        return (BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(16, 4)), BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(20, 4)));
    }

    /// <summary>Variance of the pixels' luminance, 0-255 scale (Rec. 709 weights): 0 for a blank picture.</summary>
    public static double LuminanceVariance(byte[] png)
    {
        using var bitmap = SKBitmap.Decode(png);
        Assert.NotNull(bitmap);
        double sum = 0;
        double sumOfSquares = 0;
        var pixels = bitmap.Pixels;
        foreach (var pixel in pixels)
        {
            var luminance = 0.2126 * pixel.Red + 0.7152 * pixel.Green + 0.0722 * pixel.Blue;
            sum += luminance;
            sumOfSquares += luminance * luminance;
        }

        var mean = sum / pixels.Length;
        return sumOfSquares / pixels.Length - mean * mean;
    }

    /// <summary>Width and height of the decoded picture.</summary>
    public static (int Width, int Height) DecodedSize(byte[] png)
    {
        using var bitmap = SKBitmap.Decode(png);
        Assert.NotNull(bitmap);
        return (bitmap.Width, bitmap.Height);
    }
}
