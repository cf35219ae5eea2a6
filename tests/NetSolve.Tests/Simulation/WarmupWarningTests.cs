using NetSolve.Tests.Support;

namespace NetSolve.Tests.Simulation;

public sealed class WarmupWarningTests
{
    [Fact]
    public void The_planned_warm_up_of_the_clinic_is_not_warned_about()
    {
        var result = CliRun.Run("simulate", TestFiles.Network("millbrook-clinic"), "--threads", "1");

        Assert.Equal(0, result.ExitCode);
        Assert.DoesNotContain("MSER-5", result.Error, StringComparison.Ordinal);
    }
}
