using System.Runtime.CompilerServices;

namespace NetSolve.Simulation;

/// <summary>The patient pool and the per-unit FCFS ring buffers: both grow by doubling and are then reused.</summary>
internal sealed partial class SimulationEngine
{
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private int AllocatePatient()
    {
        if (_freeCount > 0)
        {
            return _freePatients[--_freeCount];
        }

        if (_patientsAllocated == _networkEntries.Length)
        {
            Array.Resize(ref _networkEntries, _networkEntries.Length * 2);
            Array.Resize(ref _freePatients, _networkEntries.Length);
        }

        return _patientsAllocated++;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private void ReleasePatient(int patient) => _freePatients[_freeCount++] = patient;

    private void Enqueue(int unit, in QueuedPatient patient)
    {
        ref var state = ref _units[unit];
        var queue = _queues[unit];
        int count = state.Queued;
        if (count == queue.Length)
        {
            // Queues start empty and get 4 places with their first patient: most units of a large network never queue.
            var grown = new QueuedPatient[Math.Max(4, queue.Length * 2)];
            for (int i = 0; i < count; i++)
            {
                grown[i] = queue[(state.QueueHead + i) & (queue.Length - 1)];
            }

            _queues[unit] = queue = grown;
            state.QueueHead = 0;
        }

        queue[(state.QueueHead + count) & (queue.Length - 1)] = patient;
        state.Queued = count + 1;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private QueuedPatient Dequeue(int unit)
    {
        ref var state = ref _units[unit];
        var queue = _queues[unit];
        var patient = queue[state.QueueHead];
        state.QueueHead = (state.QueueHead + 1) & (queue.Length - 1);
        state.Queued--;
        return patient;
    }
}
