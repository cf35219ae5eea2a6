namespace NetSolve.Tests.Support;

/// <summary>Networks of published worked examples, shared by the solver and command-line checks.</summary>
internal static class PublishedNetworks
{
    // Source: FabTime Inc., "M/M/1 Queues in Series with Rework", www.fabtime.com/MM1Rework.shtml. Three single-machine
    // workstations processing 2.0 lots per hour, 1.0 lot per hour in, 20% of lots leaving workstation one reworked and
    // sent back to it. Published: expected system cycle time "2.81 hours".
    public const string ReworkLoop = """
        name: Published rework loop
        units:
          step_one:
            servers: 1
            service: 30min
          rework:
            servers: 1
            service: 30min
          step_two:
            servers: 1
            service: 30min
        arrivals:
          step_one: 1/h
        routes:
          step_one:
            rework: 0.2
            step_two: 0.8
          rework:
            step_one: 1
        """;
}
