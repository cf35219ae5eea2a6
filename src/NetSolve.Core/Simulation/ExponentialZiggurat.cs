using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace NetSolve.Simulation;

/// <summary>
/// Exponential variates with mean 1 by the ziggurat method (Marsaglia and Tsang, "The Ziggurat Method for Generating
/// Random Variables", Journal of Statistical Software 5(8), 2000), with 256 layers of equal area. About 98.9% of
/// draws take one 64-bit random word, a table read, a comparison and a multiplication, with no logarithm: every
/// simulated service and arrival gap draws one, so this is the simulator's commonest arithmetic.
/// </summary>
/// <remarks>
/// Layer i (1 to 255) is the rectangle [0, x_i] × [f(x_i), f(x_{i−1})] under f(x) = e^−x with x_0 = 0 and x_255 = r;
/// layer 0 is the base [0, r] × [0, f(r)] together with the tail beyond r, the same area v. A draw picks a layer and
/// a point u·x_i along it: left of x_{i−1} it is under the curve; otherwise a wedge test, or for layer 0 the tail,
/// which is r plus a fresh exponential because the exponential forgets its past. The layer comes from the word's low
/// 8 bits and u from its high 53, so the two are independent.
/// </remarks>
internal static class ExponentialZiggurat
{
    /// <summary>Where the tail starts, r, for 256 layers (Marsaglia and Tsang, 2000).</summary>
    internal const double TailStart = 7.697117470131487;

    /// <summary>The area of each layer, v = e^−r·(r + 1) (Marsaglia and Tsang, 2000).</summary>
    internal const double LayerArea = 3.949659822581572e-3;

    private const int LayerCount = 256;
    private const double UnitScale = 1.0 / (1UL << 53);

    /// <summary>x_0 … x_255, the right edges of the layers (x_0 = 0); tests check that the table closes.</summary>
    internal static readonly double[] RightEdges = BuildRightEdges();

    // f(x_i) per layer, with f(x_0) = 1 (x_0 = 0): the wedge test of layer i reads the heights of i and i − 1.
    private static readonly double[] Heights = [.. RightEdges.Select(x => PortableMath.Exp(-x))];

    private static readonly Layer[] Layers = BuildLayers(RightEdges);

    /// <summary>One exponential variate with mean 1.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double Next(ref Xoshiro256StarStar random)
    {
        ulong bits = random.NextUInt64();
        ref readonly var layer = ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(Layers), (nint)(bits & (LayerCount - 1)));
        ulong position = bits >> 11;
        if (position < layer.InsideBelow)
        {
            return position * layer.Scale;
        }

        return Rare(ref random, bits);
    }

    /// <summary>The wedge test and the tail: about one draw in ninety.</summary>
    private static double Rare(ref Xoshiro256StarStar random, ulong bits)
    {
        while (true)
        {
            int i = (int)(bits & (LayerCount - 1));
            ulong position = bits >> 11;
            var layer = Layers[i];
            if (position < layer.InsideBelow)
            {
                return position * layer.Scale;
            }

            if (i == 0)
            {
                return TailStart - PortableMath.Log(random.NextOpenDouble());
            }

            double x = position * layer.Scale;
            if (Heights[i] + (random.NextDouble() * (Heights[i - 1] - Heights[i])) < PortableMath.Exp(-x))
            {
                return x;
            }

            bits = random.NextUInt64();
        }
    }

    private static double[] BuildRightEdges()
    {
        // Walk down from x_255 = r: each layer has area v, so x_{i−1} solves x_i·(f(x_{i−1}) − f(x_i)) = v.
        var x = new double[LayerCount];
        x[LayerCount - 1] = TailStart;
        for (int i = LayerCount - 1; i > 1; i--)
        {
            x[i - 1] = -PortableMath.Log((LayerArea / x[i]) + PortableMath.Exp(-x[i]));
        }

        return x;
    }

    private static Layer[] BuildLayers(double[] x)
    {
        // Layer 0 is drawn as a rectangle of width q = v / f(r): the part left of r is the base, the rest the tail.
        double baseWidth = LayerArea / PortableMath.Exp(-TailStart);
        var layers = new Layer[LayerCount];
        layers[0] = new Layer(InsideBelowFraction(TailStart / baseWidth), baseWidth * UnitScale);
        for (int i = 1; i < LayerCount; i++)
        {
            layers[i] = new Layer(InsideBelowFraction(x[i - 1] / x[i]), x[i] * UnitScale);
        }

        return layers;
    }

    private static ulong InsideBelowFraction(double fraction) => (ulong)(fraction * (1UL << 53));

    /// <param name="InsideBelow">Positions (53-bit) below this are under the curve for sure.</param>
    /// <param name="Scale">x_i / 2^53: position × scale is the point along the layer.</param>
    [StructLayout(LayoutKind.Sequential)]
    private readonly record struct Layer(ulong InsideBelow, double Scale);
}
