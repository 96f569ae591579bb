namespace CutSheet.Cli.Rendering;

/// <summary>Pads number texts on the left so that their decimal points (or where one would be) line up.</summary>
internal static class DecimalAligner
{
    public static IReadOnlyList<string> Align(IReadOnlyList<string> numbers)
    {
        int widest = numbers.Select(IntegerPartWidth).DefaultIfEmpty(0).Max();
        return numbers.Select(n => new string(' ', widest - IntegerPartWidth(n)) + n).ToList();
    }

    /// <summary>The width before the decimal point, or before the exponent or the end when there is none.</summary>
    private static int IntegerPartWidth(string number)
    {
        int end = number.IndexOfAny(['.', 'e', 'E', '×']);
        return DisplayWidth.Of(end < 0 ? number : number[..end]);
    }
}
