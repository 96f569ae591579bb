namespace CutSheet.Cli.Rendering;

/// <summary>One cell of a listing row: its plain text (which alone decides the width), its tone, its alignment.</summary>
internal readonly record struct Cell(string Text, Tone Tone = Tone.Plain, bool AlignRight = false);
