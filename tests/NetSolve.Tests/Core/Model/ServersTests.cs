using NetSolve.Model;

namespace NetSolve.Tests.Core.Model;

public class ServersTests
{
    [Fact]
    public void Default_servers_are_not_valid_and_every_reading_of_them_throws()
    {
        var unset = default(Servers);

        Assert.False(unset.IsValid);
        Assert.Throws<InvalidOperationException>(() => unset.Count);
        Assert.Throws<InvalidOperationException>(() => unset.IsUnlimited);
        var error = Assert.Throws<InvalidOperationException>(unset.ToString);
        Assert.Contains("Servers.Of(count) or Servers.Unlimited", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Default_servers_are_neither_unlimited_nor_any_count()
    {
        Assert.NotEqual(Servers.Unlimited, default);
        Assert.NotEqual(Servers.Of(1), default);
        Assert.NotEqual(Servers.Of(Servers.MaxCount), default);
    }

    [Fact]
    public void Unlimited_servers_are_valid_count_zero_and_read_unlimited()
    {
        Assert.True(Servers.Unlimited.IsValid);
        Assert.True(Servers.Unlimited.IsUnlimited);
        Assert.Equal(0, Servers.Unlimited.Count);
        Assert.Equal("unlimited", Servers.Unlimited.ToString());
    }

    [Theory]
    [InlineData(1)]
    [InlineData(32)]
    [InlineData(Servers.MaxCount)]
    public void A_count_from_one_to_the_largest_is_kept_as_given(int count)
    {
        var servers = Servers.Of(count);

        Assert.True(servers.IsValid);
        Assert.False(servers.IsUnlimited);
        Assert.Equal(count, servers.Count);
        Assert.Equal(count.ToString(System.Globalization.CultureInfo.InvariantCulture), servers.ToString());
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-3)]
    [InlineData(Servers.MaxCount + 1)]
    [InlineData(int.MinValue)]
    public void A_count_below_one_or_above_the_largest_is_refused(int count)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => Servers.Of(count));
    }

    [Fact]
    public void A_unit_cannot_be_built_with_default_servers()
    {
        var error = Assert.Throws<ArgumentException>(() => new Unit("ward", "Ward", default, 72.0));

        Assert.Equal("servers", error.ParamName);
    }

    [Fact]
    public void A_unit_cannot_be_given_default_servers_in_a_what_if()
    {
        var ward = new Unit("ward", "Ward", Servers.Of(300), 72.0);

        Assert.Throws<ArgumentException>(() => ward with { Servers = default });
        Assert.Equal(Servers.Of(320), (ward with { Servers = Servers.Of(320) }).Servers);
    }
}
