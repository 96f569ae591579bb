namespace CutSheet.Editing.Completion;

/// <summary>What a completion inserts; decides its icon.</summary>
public enum CompletionCategory { Definition, Function, Option, Table, Choice, Kind, Namespace, Constant, Unit, Keyword, Letter, Parameter }
