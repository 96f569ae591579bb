using System.Globalization;

namespace CutSheet.Language.Tests.Support;

/// <summary>
/// Sets the current, UI and default thread cultures for the scope of a <c>using</c> and puts
/// the previous ones back. The default thread culture is process-wide, so tests that use this
/// run in the non-parallel "Culture" collection.
/// </summary>
public sealed class CultureScope : IDisposable
{
    private readonly CultureInfo _culture, _ui;
    private readonly CultureInfo? _defaultCulture, _defaultUi;

    public CultureScope(CultureInfo culture)
    {
        _culture = CultureInfo.CurrentCulture;
        _ui = CultureInfo.CurrentUICulture;
        _defaultCulture = CultureInfo.DefaultThreadCurrentCulture;
        _defaultUi = CultureInfo.DefaultThreadCurrentUICulture;
        CultureInfo.CurrentCulture = culture;
        CultureInfo.CurrentUICulture = culture;
        CultureInfo.DefaultThreadCurrentCulture = culture;
        CultureInfo.DefaultThreadCurrentUICulture = culture;
    }

    public void Dispose()
    {
        CultureInfo.CurrentCulture = _culture;
        CultureInfo.CurrentUICulture = _ui;
        CultureInfo.DefaultThreadCurrentCulture = _defaultCulture;
        CultureInfo.DefaultThreadCurrentUICulture = _defaultUi;
    }
}
