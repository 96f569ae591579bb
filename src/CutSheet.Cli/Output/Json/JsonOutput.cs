using System.Buffers;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;

namespace CutSheet.Cli.Output.Json;

/// <summary>
/// Writes a JSON document with <see cref="Utf8JsonWriter"/> (no reflection, so it survives trimming and
/// Native AOT) to a text writer. Units such as "N·m" stay readable: the output is not meant for HTML.
/// </summary>
internal static class JsonOutput
{
    private static readonly JsonWriterOptions Options = new()
    {
        Indented = true,
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
        NewLine = "\n",
    };

    public static void Write(TextWriter output, Action<Utf8JsonWriter> body)
    {
        var buffer = new ArrayBufferWriter<byte>();
        using (var writer = new Utf8JsonWriter(buffer, Options))
        {
            body(writer);
        }
        output.Write(Encoding.UTF8.GetString(buffer.WrittenSpan));
        output.WriteLine();
    }
}
