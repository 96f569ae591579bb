namespace CutSheet.Editing.Signatures;

/// <summary>A call's signature: its label, one label per parameter, the parameter being typed, and documentation.</summary>
public sealed record SignatureInfo(string Label, IReadOnlyList<string> Parameters, int ActiveParameter, string? Documentation);
