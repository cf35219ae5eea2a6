namespace NetSolve.Rendering.Map;

/// <summary>Colours of the map outside the status boxes: flow lines, markers, labels, background.</summary>
public static class MapColours
{
    /// <summary>Page background.</summary>
    public const string Background = "#FFFFFF";

    /// <summary>Body text outside boxes.</summary>
    public const string Ink = "#111111";

    /// <summary>Routes along the main direction.</summary>
    public const string ForwardLine = "#22313F";

    /// <summary>Routes back against the main direction; also dashed, so colour is never the only cue.</summary>
    public const string FeedbackLine = "#6B3FA0";

    /// <summary>Arrivals from outside and exits.</summary>
    public const string BoundaryLine = "#56616B";

    /// <summary>Fill of arrival and exit markers.</summary>
    public const string MarkerFill = "#F1F2F3";

    /// <summary>Dash pattern of feedback routes.</summary>
    public const string FeedbackDash = "9 5";

    /// <summary>Dash pattern of diversion lines, shorter than a return route's so the two read apart.</summary>
    public const string DiversionDash = "4 3";

    /// <summary>Opacity of a light flow's line on a large map: pale grey or lilac on white, still visible, never hiding a heavy flow.</summary>
    public const string FaintOpacity = "0.3";
}
