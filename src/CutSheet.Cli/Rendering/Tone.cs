namespace CutSheet.Cli.Rendering;

/// <summary>What a piece of output means, which decides its colour on a terminal.</summary>
internal enum Tone
{
    Plain,
    Strong,
    Faint,
    Good,
    Bad,
    Attention,
    Notice,
}
