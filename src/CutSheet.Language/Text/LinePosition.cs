namespace CutSheet.Language.Text;

/// <summary>A zero-based line and a zero-based column counted in UTF-16 code units.</summary>
public readonly record struct LinePosition(int Line, int Column)
{
    public override string ToString() => $"{Line + 1}:{Column + 1}";
}
