namespace CutSheet.Cli.Commands;

/// <summary>What a command writes to standard output.</summary>
public enum OutputFormat
{
    /// <summary>Aligned text for people; coloured on a terminal.</summary>
    Text,

    /// <summary>A JSON document (schemaVersion 1) for scripts.</summary>
    Json,

    /// <summary>SARIF 2.1.0 for code-scanning services (<c>check</c> only).</summary>
    Sarif,
}
