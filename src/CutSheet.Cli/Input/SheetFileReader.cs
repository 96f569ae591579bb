using System.Text;
using CutSheet.Cli.Output;

namespace CutSheet.Cli.Input;

/// <summary>Reads sheets as UTF-8 text; every way of failing becomes a <see cref="CliUsageException"/>.</summary>
internal static class SheetFileReader
{
    // Strict: a sheet with invalid UTF-8 would otherwise be evaluated with U+FFFD in a name or a unit.
    private static readonly UTF8Encoding StrictUtf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true);

    public static SheetFile Read(string fullPath, string workingDirectory)
    {
        string shown = DisplayPaths.ForUser(fullPath, workingDirectory);
        if (Directory.Exists(fullPath)) throw new CliUsageException($"{shown}: is a directory, not a sheet file");
        if (!File.Exists(fullPath)) throw new CliUsageException($"{shown}: no such file");
        try
        {
            byte[] bytes = File.ReadAllBytes(fullPath);
            return new SheetFile(fullPath, shown, Decode(bytes));
        }
        catch (DecoderFallbackException)
        {
            throw new CliUsageException($"{shown}: not valid UTF-8 text");
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException)
        {
            throw new CliUsageException($"{shown}: cannot read: {e.Message}");
        }
    }

    /// <summary>Decodes UTF-8, dropping a byte-order mark if the editor wrote one.</summary>
    public static string Decode(byte[] bytes)
    {
        ReadOnlySpan<byte> span = bytes;
        if (span.StartsWith((ReadOnlySpan<byte>)[0xEF, 0xBB, 0xBF])) span = span[3..];
        return StrictUtf8.GetString(span);
    }
}
