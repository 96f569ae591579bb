using CutSheet.Language.Diagnostics;

namespace CutSheet.Language.Units;

/// <summary>
/// Reads unit text: symbols joined by <c>·</c> (or <c>*</c>, <c>⋅</c>) and <c>/</c>, powers written
/// <c>^2</c>, <c>^-1</c> or <c>²</c>, <c>⁻¹</c>, and parentheses. Division is left-associative:
/// <c>kg/m/s</c> is <c>kg/(m·s)</c>. A whole text that is itself a symbol (<c>N·m</c>, <c>lb·in</c>,
/// <c>r/min</c>) is read as that symbol first.
/// </summary>
internal ref struct UnitExpressionParser
{
    private readonly string _text;
    private readonly UnitCatalog _catalog;
    private int _pos;
    private int _factors;
    private bool _sawOffset;
    private List<string>? _notes;
    private UnitError? _error;

    private UnitExpressionParser(string text, UnitCatalog catalog)
    {
        _text = text;
        _catalog = catalog;
    }

    public static UnitResolution Parse(string raw, UnitCatalog catalog)
    {
        string text = UnitText.Normalize(raw);
        if (text.Length == 0) return new UnitResolution(null, new UnitError(DiagnosticCodes.MalformedUnit, DiagnosticMessages.EmptyUnit, 0, 0));
        var whole = catalog.Lookup(text);
        if (whole is not null && (whole.Origin == "curated" || !IsCompound(text)))
        {
            return FromDefinition(raw, whole);
        }
        if (whole is not null)
        {
            // A compound symbol UnitsNet stores whole (lb/ft, slug/m³, mm³/kg) is read from its parts:
            // the parts' factors are exact where UnitsNet's stored products are truncated, and the parts
            // are what the text says. The whole row still lends its kind (N·m is a torque).
            var composed = ParseParts(raw, text, catalog);
            if (composed.Unit is not null) return new UnitResolution(composed.Unit with { Tag = whole.Tag }, null);
            return FromDefinition(raw, whole);
        }
        return ParseParts(raw, text, catalog);
    }

    private static bool IsCompound(string text)
    {
        foreach (char c in text)
        {
            if (c is '/' or '·' or '^' or '(' || Superscript.IsSuperscriptChar(c)) return true;
        }
        return false;
    }

    private static UnitResolution FromDefinition(string raw, UnitDefinition def) =>
        new(new ResolvedUnit(raw, def.Factor, def.Offset, def.Dimension, def.Tag, def.Note is null ? [] : [def.Note]), null);

    private static UnitResolution ParseParts(string raw, string text, UnitCatalog catalog)
    {
        var p = new UnitExpressionParser(text, catalog);
        var (factor, dim) = p.ParseProduct();
        if (p._error is null && p._pos < text.Length)
        {
            p._error = new UnitError(DiagnosticCodes.MalformedUnit, DiagnosticMessages.UnexpectedInUnit(text[p._pos].ToString(), raw), p._pos, 1);
        }
        if (p._error is not null) return new UnitResolution(null, p._error);
        if (p._sawOffset && p._factors > 1)
        {
            return new UnitResolution(null, new UnitError(DiagnosticCodes.OffsetUnitInCompound, DiagnosticMessages.OffsetUnitInCompound(raw), 0, raw.Length));
        }
        return new UnitResolution(new ResolvedUnit(raw, factor, 0, dim, null, (IReadOnlyList<string>?)p._notes ?? []), null);
    }

    private (double Factor, Dimension Dim) ParseProduct()
    {
        var (factor, dim) = ParsePowered();
        while (_error is null && _pos < _text.Length)
        {
            char c = _text[_pos];
            if (c == '·' || c == '.' || c == '/')
            {
                int at = _pos++;
                var (f, d) = ParsePowered();
                int sign = c == '/' ? -1 : 1;
                if (!Dimension.CanCombine(dim, d, sign))
                {
                    _error ??= new UnitError(DiagnosticCodes.MalformedUnit, DiagnosticMessages.ExponentLimit(Dimension.MaxExponent), at, 1);
                    return (factor, dim);
                }
                factor = sign > 0 ? factor * f : factor / f;
                dim = sign > 0 ? dim * d : dim / d;
            }
            else break;
        }
        return (factor, dim);
    }

    private (double Factor, Dimension Dim) ParsePowered()
    {
        var (factor, dim) = ParsePrimary();
        if (_error is not null) return (factor, dim);
        int? exponent = ReadExponent();
        if (exponent is int n)
        {
            if (n == 0 || Math.Abs(n) > 12)
            {
                _error ??= new UnitError(DiagnosticCodes.MalformedUnit, DiagnosticMessages.BadUnitExponent(n), _pos - 1, 1);
                return (factor, dim);
            }
            if (!dim.CanPow(n, 1))
            {
                _error ??= new UnitError(DiagnosticCodes.MalformedUnit, DiagnosticMessages.ExponentLimit(Dimension.MaxExponent), _pos - 1, 1);
                return (factor, dim);
            }
            factor = Math.Pow(factor, n);
            dim = dim.Pow(n);
            _factors++;
        }
        return (factor, dim);
    }

    private int? ReadExponent()
    {
        if (_pos >= _text.Length) return null;
        if (_text[_pos] == '^')
        {
            int start = ++_pos;
            bool negative = false;
            if (_pos < _text.Length && (_text[_pos] == '-' || _text[_pos] == '+')) { negative = _text[_pos] == '-'; _pos++; }
            int digitsStart = _pos;
            while (_pos < _text.Length && char.IsAsciiDigit(_text[_pos])) _pos++;
            if (_pos == digitsStart || _pos - digitsStart > 3)
            {
                _error ??= new UnitError(DiagnosticCodes.MalformedUnit, DiagnosticMessages.MissingUnitExponent, start - 1, Math.Max(1, _pos - start + 1));
                return null;
            }
            int v = int.Parse(_text.AsSpan(digitsStart, _pos - digitsStart), System.Globalization.CultureInfo.InvariantCulture);
            return negative ? -v : v;
        }
        if (Superscript.IsSuperscriptChar(_text[_pos]))
        {
            bool negative = false;
            if (_text[_pos] == '⁻' || _text[_pos] == '⁺') { negative = _text[_pos] == '⁻'; _pos++; }
            int v = 0, digits = 0;
            while (_pos < _text.Length && Superscript.DigitValue(_text[_pos]) >= 0 && digits < 3)
            {
                v = v * 10 + Superscript.DigitValue(_text[_pos]);
                _pos++; digits++;
            }
            if (digits == 0)
            {
                _error ??= new UnitError(DiagnosticCodes.MalformedUnit, DiagnosticMessages.MissingUnitExponent, _pos - 1, 1);
                return null;
            }
            return negative ? -v : v;
        }
        return null;
    }

    private (double Factor, Dimension Dim) ParsePrimary()
    {
        if (_pos >= _text.Length)
        {
            _error ??= new UnitError(DiagnosticCodes.MalformedUnit, DiagnosticMessages.UnitEndsEarly, _text.Length, 0);
            return (1, Dimension.None);
        }
        char c = _text[_pos];
        if (c == '(')
        {
            int open = _pos++;
            var inner = ParseProduct();
            if (_pos >= _text.Length || _text[_pos] != ')')
            {
                _error ??= new UnitError(DiagnosticCodes.MalformedUnit, DiagnosticMessages.UnclosedUnitParen, open, 1);
                return inner;
            }
            _pos++;
            return inner;
        }
        if (c == '1')
        {
            _pos++;
            _factors++;
            return (1, Dimension.None);
        }
        int start = _pos;
        while (_pos < _text.Length && IsSymbolChar(_text[_pos], _pos == start)) _pos++;
        if (_pos == start)
        {
            _error ??= new UnitError(DiagnosticCodes.MalformedUnit, DiagnosticMessages.UnexpectedInUnit(c.ToString(), _text), _pos, 1);
            _pos++;
            return (1, Dimension.None);
        }
        string symbol = _text[start.._pos];
        var def = _catalog.Lookup(symbol);
        if (def is null)
        {
            _error ??= new UnitError(DiagnosticCodes.UnknownUnit, DiagnosticMessages.UnknownUnit(symbol), start, symbol.Length, UnitSuggestions.Suggest(symbol, _catalog));
            return (1, Dimension.None);
        }
        _factors++;
        if (def.Offset != 0) _sawOffset = true;
        if (def.Note is not null) (_notes ??= []).Add(def.Note);
        return (def.Factor, def.Dimension);
    }

    private static bool IsSymbolChar(char c, bool first) =>
        char.IsLetter(c) || c is '_' or '°' or 'µ' or '%' or '‰' or 'Ω' or 'Å' or '\'' or '"' or '$'
        || (!first && char.IsAsciiDigit(c));
}
