namespace NetSolve.Analysis;

/// <summary>Strongly connected components of the routing graph (Tarjan, SIAM J. Comput. 1(2), 1972, pp. 146–160), without recursion so large networks cannot overflow the stack.</summary>
internal static class StronglyConnected
{
    /// <summary>Every component, as unit indices.</summary>
    public static List<int[]> Components(List<(int To, double Probability)>[] next)
    {
        int n = next.Length;
        var order = new int[n];
        var low = new int[n];
        var onStack = new bool[n];
        Array.Fill(order, -1);
        var stack = new Stack<int>();
        var components = new List<int[]>();
        int counter = 0;
        var work = new Stack<(int Unit, int Edge)>();
        for (int root = 0; root < n; root++)
        {
            if (order[root] >= 0)
            {
                continue;
            }

            work.Push((root, 0));
            while (work.Count > 0)
            {
                var (unit, edge) = work.Pop();
                if (edge == 0)
                {
                    order[unit] = low[unit] = counter++;
                    stack.Push(unit);
                    onStack[unit] = true;
                }
                else
                {
                    int child = next[unit][edge - 1].To;
                    low[unit] = Math.Min(low[unit], low[child]);
                }

                bool descended = false;
                for (int e = edge; e < next[unit].Count; e++)
                {
                    int to = next[unit][e].To;
                    if (order[to] < 0)
                    {
                        work.Push((unit, e + 1));
                        work.Push((to, 0));
                        descended = true;
                        break;
                    }

                    if (onStack[to])
                    {
                        low[unit] = Math.Min(low[unit], order[to]);
                    }
                }

                if (descended || low[unit] != order[unit])
                {
                    continue;
                }

                var component = new List<int>();
                int member;
                do
                {
                    member = stack.Pop();
                    onStack[member] = false;
                    component.Add(member);
                }
                while (member != unit);
                component.Reverse();
                components.Add([.. component]);
            }
        }

        return components;
    }
}
