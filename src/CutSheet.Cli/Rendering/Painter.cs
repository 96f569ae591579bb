namespace CutSheet.Cli.Rendering;

/// <summary>Wraps text in ANSI SGR sequences for its <see cref="Tone"/>, or leaves it alone when colour is off.</summary>
internal sealed class Painter(bool enabled)
{
    private const string Reset = "\u001b[0m";

    public string Paint(string text, Tone tone)
    {
        if (!enabled || tone == Tone.Plain || text.Length == 0) return text;
        return Start(tone) + text + Reset;
    }

    private static string Start(Tone tone) => tone switch
    {
        Tone.Strong => "\u001b[1m",
        Tone.Faint => "\u001b[2m",
        Tone.Good => "\u001b[32m",
        Tone.Bad => "\u001b[1;31m",
        Tone.Attention => "\u001b[33m",
        Tone.Notice => "\u001b[36m",
        _ => "",
    };
}
