using Microsoft.Playwright;

namespace NetSolve.Tests.Rendering;

/// <summary>Checks that a page element is visible and laid out at a usable size.</summary>
internal static class LocatorAssert
{
    public static async Task That(this ILocator locator, double minWidth)
    {
        Assert.True(await locator.IsVisibleAsync(), $"{locator} is not visible");
        var box = await locator.BoundingBoxAsync();
        Assert.True(box is not null && box.Width >= minWidth && box.Height > 0, FormattableString.Invariant($"{locator} is {box?.Width ?? 0} px wide"));
    }
}
