namespace CutSheet.Language.Syntax.Nodes;

/// <summary>Hazard signal levels after ISO 3864-2 / ANSI Z535, lowest first.</summary>
public enum CautionLevel { Notice, Caution, Warning }
