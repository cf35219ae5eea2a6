using System.Collections.Immutable;
using System.Globalization;
using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>One patient group's flow through the network: its external arrivals and its traffic at every unit.</summary>
/// <remarks>
/// Immutable and thread-safe. Rates per hour, times in hours. In steady state an open network lets out what it takes
/// in, so the group's throughput is its external arrival rate.
/// </remarks>
/// <param name="Id">The group id: <see cref="GroupTraffic.DefaultGroupId"/> for the top-level arrivals and routes.</param>
/// <param name="Label">The group's display name.</param>
/// <param name="Group">The group from the file; null for the default group.</param>
/// <param name="ExternalArrivalsPerHour">Λ_g: the group's external arrivals per hour, all units together.</param>
/// <param name="Units">The group's traffic at each unit, by unit position.</param>
public sealed record GroupFlow(
    string Id,
    string Label,
    PatientGroup? Group,
    double ExternalArrivalsPerHour,
    ImmutableArray<GroupUnitFlow> Units)
{
    /// <summary>True for the group formed by the network's top-level arrivals and routes.</summary>
    public bool IsDefault => Group is null;

    /// <summary>Patients of the group leaving the network per hour: Λ_g in steady state.</summary>
    public double ThroughputPerHour => ExternalArrivalsPerHour;

    /// <summary>
    /// Mean time in the network of the group's patients, T_g = Σ_i v_g,i (W_i + m_g,i): each visit waits the unit's
    /// mean wait (first come, first served across groups) and then takes the group's own service there.
    /// </summary>
    /// <param name="waitHours">Mean wait in queue at each unit, in hours, by unit position; finite and not negative.</param>
    /// <returns>Hours; 0 for a group with no external arrivals.</returns>
    /// <exception cref="ArgumentException">The list does not have one wait per unit.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A wait is negative, NaN or infinite.</exception>
    public double MeanTimeInNetworkHours(IReadOnlyList<double> waitHours)
    {
        ArgumentNullException.ThrowIfNull(waitHours);
        CheckLength(waitHours.Count, nameof(waitHours));
        double total = 0.0;
        for (int i = 0; i < Units.Length; i++)
        {
            double wait = waitHours[i];
            if (!double.IsFinite(wait) || wait < 0.0)
            {
                throw new ArgumentOutOfRangeException(nameof(waitHours), wait, "A mean wait is finite and not negative.");
            }

            total += Units[i].VisitsPerPatient * (wait + Units[i].MeanServiceHours);
        }

        return total;
    }

    /// <summary>
    /// As <see cref="MeanTimeInNetworkHours(IReadOnlyList{double})"/>, with a missing wait (an unstable unit) allowed:
    /// null when the group visits a unit whose wait is missing; units the group never visits are ignored.
    /// </summary>
    /// <param name="waitHours">Mean wait in queue at each unit, in hours, by unit position; null where the unit has none.</param>
    /// <exception cref="ArgumentException">The list does not have one entry per unit.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A wait is negative, NaN or infinite.</exception>
    public double? MeanTimeInNetworkHours(IReadOnlyList<double?> waitHours)
    {
        ArgumentNullException.ThrowIfNull(waitHours);
        CheckLength(waitHours.Count, nameof(waitHours));
        var waits = new double[Units.Length];
        for (int i = 0; i < Units.Length; i++)
        {
            if (waitHours[i] is double wait)
            {
                waits[i] = wait;
            }
            else if (Units[i].VisitsPerPatient > 0.0)
            {
                return null;
            }
        }

        return MeanTimeInNetworkHours(waits);
    }

    /// <summary>Mean number of the group's patients in the network by Little's law, L_g = Λ_g T_g; null where T_g is.</summary>
    /// <param name="waitHours">As for <see cref="MeanTimeInNetworkHours(IReadOnlyList{double?})"/>.</param>
    public double? MeanInNetwork(IReadOnlyList<double?> waitHours) =>
        MeanTimeInNetworkHours(waitHours) is double hours ? ExternalArrivalsPerHour * hours : null;

    private void CheckLength(int count, string name)
    {
        if (count != Units.Length)
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture, $"Expected one wait per unit ({Units.Length}), got {count}."), name);
        }
    }
}
