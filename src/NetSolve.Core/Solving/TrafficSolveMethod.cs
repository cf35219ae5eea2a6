namespace NetSolve.Solving;

/// <summary>Which linear solver the traffic equations use; production code always uses <see cref="Automatic"/>.</summary>
internal enum TrafficSolveMethod
{
    /// <summary>Dense LU up to <see cref="TrafficEquations.DenseLimit"/> reached units, sparse above.</summary>
    Automatic,

    /// <summary>Dense LU whatever the size (memory grows with units squared).</summary>
    Dense,

    /// <summary>Sparse iterative solve whatever the size.</summary>
    Sparse,
}
