using System.Globalization;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>
/// The fuzzing harness in CI: a few hundred seeded inputs across every surface must all keep the contract. The long
/// run (<see cref="FuzzLongRunTests"/>) drives the same campaign with many more inputs.
/// </summary>
public sealed class FuzzCampaignTests
{
    /// <summary>Inputs per CI run: every surface sees forty.</summary>
    private const int Inputs = 200;

    /// <summary>Fixed so that a CI failure replays exactly.</summary>
    private const int Seed = 13;

    [Fact]
    public void A_few_hundred_mutated_inputs_across_every_surface_keep_the_contract()
    {
        var report = FuzzCampaign.Run(Inputs, Seed, _ => { }, Inputs, minimise: false, workers: Environment.ProcessorCount);

        Assert.Equal(Inputs, report.Total);
        Assert.True(report.Classes.Count == 0, "Failure classes:\n" + string.Join('\n', report.Classes.Select(entry => string.Create(CultureInfo.InvariantCulture,
            $"{entry.Key.Kind} x{entry.Value.Count}: {entry.Value.Finding.Detail} <- {CliInvariant.Shorten(string.Join(' ', entry.Value.Example.Arguments))}"))));
    }

    [Fact]
    public void The_same_seed_gives_the_same_inputs()
    {
        var seeds = SeedFiles.Load();
        var first = new InputGenerator(seeds, Seed);
        var second = new InputGenerator(seeds, Seed);

        for (int i = 0; i < 50; i++)
        {
            var surface = InputGenerator.Surfaces[i % InputGenerator.Surfaces.Length];
            var a = first.Next(surface);
            var b = second.Next(surface);
            Assert.Equal(a.Arguments, b.Arguments);
            Assert.Equal(a.Files.Select(file => file.Content), b.Files.Select(file => file.Content));
        }
    }

    [Fact]
    public void Every_option_of_every_command_has_a_value_kind_so_the_fuzzer_tries_it()
    {
        var options = OptionTable.Options();

        var missing = options.Where(entry => OptionTable.KindOf(entry.Command, entry.Option) is null).Select(entry => entry.Command + " " + entry.Option).ToList();

        Assert.Contains(("simulate", "--threads"), options);
        Assert.Contains(("staff", "--budget"), options);
        Assert.True(missing.Count == 0, "add these options to OptionTable.Kinds with the kind of value each takes: " + string.Join(", ", missing));
    }

    [Fact]
    public void Every_surface_is_generated_and_every_network_seed_is_read()
    {
        var seeds = SeedFiles.Load();
        var generator = new InputGenerator(seeds, Seed);

        Assert.All(InputGenerator.Surfaces, surface => Assert.NotEmpty(generator.Next(surface).Arguments));
        Assert.True(seeds.Networks.Count > seeds.ValidNetworks.Count);
        Assert.Equal(Directory.GetFiles(TestFiles.NetworksFolder, "*.yaml").Length, seeds.ValidNetworks.Count);
    }

    [Fact]
    public void The_unit_ids_of_a_seed_network_are_its_keys_under_units()
    {
        var ids = SeedFiles.UnitIds(File.ReadAllText(TestFiles.Network("millbrook-clinic")));

        // Exact by hand: networks/millbrook-clinic.yaml declares reception, clinician and xray.
        Assert.Equal(["reception", "clinician", "xray"], ids);
    }
}
