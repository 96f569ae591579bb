using CutSheet.Language.Text;

namespace CutSheet.Editing.Outline;

/// <summary>An entry of the sheet's outline: a section (heading) holding its definitions, functions and checks.</summary>
public sealed record OutlineItem(string Name, string? Detail, OutlineCategory Category, TextSpan Span, TextSpan SelectionSpan, IReadOnlyList<OutlineItem> Children);

public enum OutlineCategory { Section, Definition, Function, Check, Choice, Table, Kind, Import }
