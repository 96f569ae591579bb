using CutSheet.Language.Semantics;
using CutSheet.Language.Text;

namespace CutSheet.Language.Evaluation;

/// <summary>
/// Where an expression is being evaluated: the scope its names resolve in, function locals,
/// the call depth, and the place in the evaluated sheet where problems inside another sheet's
/// function surface (<see cref="CallSite"/>).
/// </summary>
internal sealed class EvalFrame
{
    public required SheetScope Scope { get; init; }
    public Dictionary<string, Value>? Locals { get; init; }
    public int Depth { get; init; }

    /// <summary>Only dimensions matter (a function body's check, a branch not taken): no cautions, no value errors.</summary>
    public bool CheckOnly { get; init; }

    private TextSpan _callSite;
    private bool _recordDependencies;

    /// <summary>The span in the evaluated sheet that stands for this evaluation (a call, or the statement).</summary>
    public TextSpan CallSite { get => _callSite; init => _callSite = value; }

    /// <summary>True when spans belong to another sheet than the one being evaluated.</summary>
    public bool Foreign { get; init; }

    /// <summary>The function being evaluated, for messages and cautions.</summary>
    public FunctionSymbol? Function { get; init; }

    /// <summary>Set when the statement refers to a definition of the evaluated sheet (so it is not an input).</summary>
    public bool RecordDependencies { get => _recordDependencies; init => _recordDependencies = value; }

    public bool DependsOnSheet { get; set; }

    /// <summary>
    /// Readies a top-level frame for the next statement. The evaluator keeps one such frame for
    /// all of a sheet's statements (no frame outlives the statement it was made for), so a
    /// sheet does not allocate a frame per line.
    /// </summary>
    public void StartStatement(TextSpan callSite, bool recordDependencies)
    {
        _callSite = callSite;
        _recordDependencies = recordDependencies;
        DependsOnSheet = false;
    }
}
