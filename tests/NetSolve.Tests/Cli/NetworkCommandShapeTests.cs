using static NetSolve.Tests.Support.CliRun;
using NetSolve.Presentation;

namespace NetSolve.Tests.Cli;

/// <summary>What the shared shape of network commands adds: the caution under advice tables only, and nothing half-written.</summary>
public sealed class NetworkCommandShapeTests
{
    private static readonly string Millbrook = Path.Combine(AppContext.BaseDirectory, "networks", "millbrook-clinic.yaml");

    private static readonly string Ending = "\n\n" + Caution.Text + "\n";

    [Theory]
    [InlineData("solve")]
    [InlineData("growth")]
    [InlineData("staff", "--max-util", "0.8")]
    public void An_advice_table_ends_with_the_planning_caution_once(params string[] args)
    {
        var (code, output, _) = Run([args[0], Millbrook, .. args[1..]]);

        Assert.Equal(0, code);
        Assert.EndsWith(Ending, output, StringComparison.Ordinal);
        Assert.Equal(output.IndexOf(Caution.Text, StringComparison.Ordinal), output.LastIndexOf(Caution.Text, StringComparison.Ordinal));
    }

    [Theory]
    [InlineData("json", "solve")]
    [InlineData("csv", "solve")]
    [InlineData("json", "growth")]
    [InlineData("csv", "staff", "--budget", "2")]
    [InlineData("csv", "simulate", "-r", "2", "--duration", "2d", "--warmup", "0")]
    [InlineData("table", "pathway", "--from", "reception")]
    public void Json_csv_and_the_pathway_table_carry_no_caution(string format, params string[] args)
    {
        var (code, output, _) = Run([args[0], Millbrook, "--format", format, .. args[1..]]);

        Assert.Equal(0, code);
        Assert.NotEmpty(output);
        Assert.DoesNotContain(Caution.Text, output, StringComparison.Ordinal);
    }

    [Fact]
    public void Help_lists_the_shared_options_on_every_network_command()
    {
        foreach (string command in new[] { "solve", "growth", "staff", "pathway", "simulate" })
        {
            var (code, output, _) = Run(command, "--help");

            Assert.Equal(0, code);
            Assert.Contains("<FILE>", output, StringComparison.Ordinal);
            Assert.Contains("--format", output, StringComparison.Ordinal);
            Assert.Contains("--strain", output, StringComparison.Ordinal);
            Assert.Contains("--set", output, StringComparison.Ordinal);
        }
    }

}
