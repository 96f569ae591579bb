using CutSheet.Language.Text;

namespace CutSheet.Editing.Symbols;

/// <summary>A name written in the sheet (<see cref="Span"/>) and what it refers to; <see cref="IsDeclaration"/> at the place that declares it.</summary>
public sealed record SymbolOccurrence(TextSpan Span, SymbolTarget Target, bool IsDeclaration);
