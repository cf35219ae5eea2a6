using System.Globalization;

namespace NetSolve.Tests.Support;

/// <summary>Sets the current culture and UI culture for a block and restores both when disposed.</summary>
/// <remarks>
/// Culture is per thread and flows with async work, so this does not change other threads; tests that use it still
/// belong to the <see cref="CultureSensitiveCollection"/>, which runs alone, so nothing else can see a changed culture.
/// </remarks>
internal sealed class CultureScope : IDisposable
{
    private readonly CultureInfo _culture = CultureInfo.CurrentCulture;
    private readonly CultureInfo _uiCulture = CultureInfo.CurrentUICulture;

    public CultureScope(CultureInfo culture)
    {
        CultureInfo.CurrentCulture = culture;
        CultureInfo.CurrentUICulture = culture;
    }

    public void Dispose()
    {
        CultureInfo.CurrentCulture = _culture;
        CultureInfo.CurrentUICulture = _uiCulture;
    }
}
