namespace NetSolve.Simulation;

/// <summary>The patient pool and the per-unit FCFS ring buffers: both grow by doubling and are then reused.</summary>
internal sealed partial class SimulationEngine
{
    private int AllocatePatient()
    {
        if (_freeCount > 0)
        {
            return _freePatients[--_freeCount];
        }

        if (_patientsAllocated == _patients.Length)
        {
            Array.Resize(ref _patients, _patients.Length * 2);
            Array.Resize(ref _freePatients, _patients.Length);
        }

        return _patientsAllocated++;
    }

    private void ReleasePatient(int patient) => _freePatients[_freeCount++] = patient;

    private void Enqueue(int unit, int patient)
    {
        var queue = _queues[unit];
        int count = _queued[unit];
        if (count == queue.Length)
        {
            var grown = new int[queue.Length * 2];
            int head = _queueHead[unit];
            for (int i = 0; i < count; i++)
            {
                grown[i] = queue[(head + i) & (queue.Length - 1)];
            }

            _queues[unit] = queue = grown;
            _queueHead[unit] = 0;
        }

        queue[(_queueHead[unit] + count) & (queue.Length - 1)] = patient;
        _queued[unit] = count + 1;
    }

    private int Dequeue(int unit)
    {
        var queue = _queues[unit];
        int head = _queueHead[unit];
        int patient = queue[head];
        _queueHead[unit] = (head + 1) & (queue.Length - 1);
        _queued[unit]--;
        return patient;
    }
}
