namespace NetSolve.Fitting.Reading;

/// <summary>
/// What followed a stay, when it was not a move to another unit (a move is the next unit's number, 0 or more).
/// </summary>
internal static class StayOutcome
{
    /// <summary>The patient left the hospital: the journey ended.</summary>
    public const int Exit = -1;

    /// <summary>Still running at the extract's end: where the patient goes next is not known.</summary>
    public const int StillRunning = -2;

    /// <summary>A side visit inside another stay of the patient (an X-ray while the ward bed is kept): not routed.</summary>
    public const int SideVisit = -3;
}
