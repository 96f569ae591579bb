namespace CutSheet.Editing.Hints;

/// <summary>
/// Which value hints to show: <see cref="Enabled"/> turns them off altogether;
/// <see cref="IncludeInputs"/> also labels inputs, whose value is already written on the line.
/// </summary>
public sealed record HintOptions(bool Enabled = true, bool IncludeInputs = false)
{
    public static readonly HintOptions Default = new();
}
