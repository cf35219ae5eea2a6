using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.TimeVarying;

public class TurnedAwayFlowTests
{
    // An invented minor-injuries room of 1 cubicle and no waiting places, 1 patient an hour, stays of 1 hour
    // (exponential), sending every admitted patient on to an unlimited observation bay (or, in the second network,
    // diverting patients who find it full to a walk-in centre with 0.5 arrivals an hour of its own).
    private static Network Read(string whenFull) => NetworkReader.ReadText($"""
        units:
          minors:
            servers: 1
            service: 1h
            capacity: 1
            when_full: {whenFull}
          observation:
            servers: unlimited
            service: 2h
          walk_in:
            servers: unlimited
            service: 30min
        arrivals:
          minors: 1/h
          walk_in: 0.5/h
        routes:
          minors:
            observation: 100%
        """, "minors.yaml").Network!;

    // Exact by hand: Erlang B with 1 server at load 1 is 1/(1 + 1) = 0.5, so half the patients are turned away and
    // the observation bay receives 0.5 an hour (offered load 1), where the infinite-server view would send it 1.
    [Fact]
    public void Only_the_admitted_share_of_a_full_unit_moves_on_downstream()
    {
        var solution = TimeVaryingSolver.Solve(Read("turn_away"));

        for (int h = 0; h < 24; h++)
        {
            Assert.Equal(0.5, solution.Units[0].TurnedAwayShareByHour[h], 1e-6);
            Assert.Equal(1.0, solution.Traffic.Units[0].ArrivalsPerHourByHour[h], 1e-9);
            Assert.Equal(0.5, solution.Traffic.Units[1].ArrivalsPerHourByHour[h], 1e-4);
            Assert.Equal(1.0, solution.Traffic.Units[1].OfferedLoadByHour[h], 2e-4);
            Assert.Equal(0.5, solution.Traffic.Units[2].ArrivalsPerHourByHour[h], 1e-9);
        }
    }

    // Exact by hand: as above, the 0.5 an hour turned away by the full room now arrive at the walk-in centre, on top
    // of its own 0.5 an hour.
    [Fact]
    public void Patients_diverted_by_a_full_unit_arrive_at_the_unit_they_are_diverted_to()
    {
        var solution = TimeVaryingSolver.Solve(Read("divert to walk_in"));

        for (int h = 0; h < 24; h++)
        {
            Assert.Equal(0.5, solution.Traffic.Units[1].ArrivalsPerHourByHour[h], 1e-4);
            Assert.Equal(1.0, solution.Traffic.Units[2].ArrivalsPerHourByHour[h], 1e-4);
        }
    }

    // Common practice: a unit that never fills passes everyone on, so the load below it is the infinite-server one.
    [Fact]
    public void A_unit_without_a_capacity_reports_no_one_turned_away()
    {
        var network = TimeVaryingTestNetworks.SingleUnit(4, 1.0, 2.0, TimeVaryingTestNetworks.EmergencyDay());

        var solution = TimeVaryingSolver.Solve(network);

        Assert.True(solution.Units[0].TurnedAwayShareByHour.IsDefaultOrEmpty);
    }
}
