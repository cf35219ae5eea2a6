using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Staffing;

/// <summary>Columns that show a metric of another registry before and after servers are added.</summary>
/// <remarks>
/// The metric keeps its own accessor and dimension, so a wait in a staffing answer is converted and shown exactly as
/// in <c>solve</c>. The contract names the pair <c>ID_before</c> and <c>ID_after</c>; people read <c>HEADER now</c> and
/// <c>HEADER after</c>.
/// </remarks>
public static class BeforeAndAfter
{
    /// <summary>The metric read from the network as given.</summary>
    public static Column<TRow> Before<TRow, TResult>(Column<TResult> metric, Func<TRow, TResult> before)
    {
        ArgumentNullException.ThrowIfNull(metric);
        ArgumentNullException.ThrowIfNull(before);
        return new Column<TRow>(metric.Id + "_before", metric.Header + " now", metric.Dimension, row => metric.Read(before(row)), metric.Audience);
    }

    /// <summary>The metric read from the network with the servers added; absent when there is no such network.</summary>
    public static Column<TRow> After<TRow, TResult>(Column<TResult> metric, Func<TRow, TResult?> after)
        where TResult : class
    {
        ArgumentNullException.ThrowIfNull(metric);
        ArgumentNullException.ThrowIfNull(after);
        return new Column<TRow>(
            metric.Id + "_after",
            metric.Header + " after",
            metric.Dimension,
            row => after(row) is TResult result ? metric.Read(result) : Cell.Of(null, metric.Dimension),
            metric.Audience);
    }
}
