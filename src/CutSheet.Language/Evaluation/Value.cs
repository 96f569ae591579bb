using CutSheet.Language.Semantics;

namespace CutSheet.Language.Evaluation;

/// <summary>
/// A value during evaluation: a quantity, a boolean, a choice option, a list of quantities, or
/// unknown (after an error; dependents inherit unknown quietly).
/// </summary>
public readonly struct Value
{
    private Value(ValueKind kind, Quantity quantity, bool boolean, object? reference)
    {
        Kind = kind;
        Quantity = quantity;
        Boolean = boolean;
        Reference = reference;
    }

    public ValueKind Kind { get; }
    public Quantity Quantity { get; }
    public bool Boolean { get; }
    private object? Reference { get; }

    public static readonly Value Unknown = default;

    public static Value Of(Quantity q) => new(ValueKind.Quantity, q, false, null);
    public static Value Of(bool b) => new(ValueKind.Boolean, default, b, null);
    public static Value Of(ChoiceOption option) => new(ValueKind.Choice, default, false, option);
    public static Value Of(QuantityList list) => new(ValueKind.List, default, false, list);

    public bool IsUnknown => Kind == ValueKind.Unknown;
    public ChoiceOption? Choice => Reference as ChoiceOption;
    public QuantityList? List => Reference as QuantityList;

    public string Describe() => Kind switch
    {
        ValueKind.Quantity => "a quantity",
        ValueKind.Boolean => "true or false",
        ValueKind.Choice => $"an option of {Choice!.Type.Name}",
        ValueKind.List => "a list",
        _ => "an unknown value",
    };
}
