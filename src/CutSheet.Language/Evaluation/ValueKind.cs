namespace CutSheet.Language.Evaluation;

public enum ValueKind { Unknown, Quantity, Boolean, Choice, List }
