namespace NetSolve.Solving;

/// <summary>An upstream-first order of units for Gauss–Seidel sweeps: the reverse postorder of a depth-first search.</summary>
/// <remarks>
/// Where patients never return this is a topological order, so one sweep is exact; inside loops it still visits a
/// unit after most of its feeders. Iterative (an explicit stack), so 100,000-unit networks cannot overflow the stack.
/// </remarks>
internal static class ArrivalVariabilityOrder
{
    /// <summary>Every unit once, upstream units first.</summary>
    public static int[] Upstream(int unitCount, IReadOnlyList<ArrivalVariabilityRoute> routes)
    {
        var start = new int[unitCount + 1];
        foreach (var route in routes)
        {
            start[route.From + 1]++;
        }

        for (int i = 0; i < unitCount; i++)
        {
            start[i + 1] += start[i];
        }

        var targets = new int[routes.Count];
        var fill = (int[])start.Clone();
        foreach (var route in routes)
        {
            targets[fill[route.From]++] = route.To;
        }

        var visited = new bool[unitCount];
        var next = new int[unitCount];
        var postorder = new int[unitCount];
        int done = 0;
        var stack = new Stack<int>();
        for (int root = 0; root < unitCount; root++)
        {
            if (visited[root])
            {
                continue;
            }

            visited[root] = true;
            next[root] = start[root];
            stack.Push(root);
            while (stack.Count > 0)
            {
                int unit = stack.Peek();
                if (next[unit] < start[unit + 1])
                {
                    int target = targets[next[unit]++];
                    if (!visited[target])
                    {
                        visited[target] = true;
                        next[target] = start[target];
                        stack.Push(target);
                    }

                    continue;
                }

                postorder[done++] = stack.Pop();
            }
        }

        Array.Reverse(postorder);
        return postorder;
    }
}
