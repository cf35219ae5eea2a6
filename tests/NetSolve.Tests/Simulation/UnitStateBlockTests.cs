using System.Runtime.CompilerServices;
using NetSolve.Simulation;

namespace NetSolve.Tests.Simulation;

/// <summary>
/// <see cref="UnitStateBlock"/> keeps each unit's state on a cache-line boundary. The 64-byte line is common practice
/// on x64 and Arm64 processors (the processor makers' optimisation manuals); the states must also stay apart and start
/// at zero, as an array's would.
/// </summary>
public sealed class UnitStateBlockTests
{
    [Fact]
    public void A_state_is_two_cache_lines_of_64_bytes()
    {
        Assert.Equal(128, Unsafe.SizeOf<UnitState>());
    }

    [Theory]
    [InlineData(1)]
    [InlineData(7)]
    [InlineData(1000)]
    public void Every_state_starts_on_a_64_byte_boundary_even_after_a_full_collection(int units)
    {
        var block = new UnitStateBlock(units);
        GC.Collect(2, GCCollectionMode.Forced, blocking: true, compacting: true);
        for (int u = 0; u < units; u++)
        {
            // The distance from address 0 is the state's address: the pinned block never moves, so it stays valid.
            nint address = Unsafe.ByteOffset(ref Unsafe.NullRef<UnitState>(), ref block[u]);
            Assert.Equal(0, address % 64);
        }
    }

    [Fact]
    public void States_start_at_zero_and_keep_their_own_counts()
    {
        // Exact by hand: unit u is given u accepted patients and u + 1 servers; neighbours must not overlap.
        var block = new UnitStateBlock(50);
        Assert.All(Enumerable.Range(0, 50), u => Assert.Equal(default, block[u]));
        for (int u = 0; u < 50; u++)
        {
            block[u].Accepted = u;
            block[u].Servers = u + 1;
            block[u].Diverted = -u;
        }

        for (int u = 0; u < 50; u++)
        {
            Assert.Equal(u, block[u].Accepted);
            Assert.Equal(u + 1, block[u].Servers);
            Assert.Equal(-u, block[u].Diverted);
        }
    }

    [Fact]
    public void A_unit_outside_the_block_is_refused()
    {
        var block = new UnitStateBlock(3);
        Assert.Throws<ArgumentOutOfRangeException>(() => block[3].Busy);
        Assert.Throws<ArgumentOutOfRangeException>(() => block[-1].Busy);
    }
}
