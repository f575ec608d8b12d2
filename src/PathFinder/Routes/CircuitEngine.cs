using PathFinder.Algebra;

namespace PathFinder.Routes;

/// <summary>Depth-first enumeration of the circuits {t} ∪ S of the class vector matroid, with |S| bounded, each set once.</summary>
/// <remarks>
/// <para>The set T = {t} ∪ S grows from {t}. A species held by exactly one member of T must be cancelled by a further
/// member, so the search branches over the classes holding the species with the fewest available classes; when no
/// species is unmatched but t is not yet in span(S), it branches over classes sharing a species with T (a circuit is
/// connected). Branch i includes candidate i and excludes candidates 0..i−1 in its subtree, so every set is reached at
/// most once. A class making S dependent is pruned (a circuit has no dependent proper subset); once t ∈ span(S) the
/// set is reported iff every factor is nonzero, and never grown further.</para>
/// <para>Linear algebra is an incremental echelon form modulo p = 2^61 − 1 over the local species of T. "Independent"
/// and "nonzero" modulo p imply the same over ℚ; the converse holds whenever every minor is below p in absolute value,
/// which the caller certifies with the Hadamard bound (product of the integer row norms).</para>
/// </remarks>
internal sealed class CircuitEngine
{
    /// <summary>Called with the classes of S (in order of addition) and the relation over T (index 0 = t); returns false to stop.</summary>
    public delegate bool CircuitFound(ReadOnlySpan<int> classes, ReadOnlySpan<ulong> relation);

    private readonly RouteNetwork _network;
    private readonly SearchBudget _budget;
    private readonly bool[] _inSet;
    private readonly int[] _excluded;
    private readonly int[] _stamp;
    private readonly int[] _speciesCount;
    private readonly int[] _localColumn;
    private readonly List<int> _speciesList = [];
    private readonly List<ulong[]> _rows = [];
    private readonly List<ulong[]> _combinations = [];
    private readonly List<List<int>> _candidateBuffers = [];
    private readonly List<int> _unmatched = [];

    // Per-member storage grows with the depth the search actually reaches (at most rank + 1 members) and the species
    // it actually meets, never with the step bound: a bound of 10,000 on a small network costs what a bound of 10 does.
    private int[] _members = new int[8];
    private int[] _newSpeciesOfMember = new int[8];
    private int[] _pivot = new int[8];
    private int[] _rowExtent = new int[8];
    private ulong[] _work = new ulong[16];
    private ulong[] _workCombination = new ulong[8];
    private int _stampValue;
    private int _memberCount;
    private int _minClass;
    private int _maxSteps;
    private int _minSteps;
    private CircuitFound _onFound = (_, _) => true;
    private int[] _targetSpecies = [];

    public CircuitEngine(RouteNetwork network, SearchBudget budget)
    {
        _network = network;
        _budget = budget;
        int classes = network.ClassCount;
        _inSet = new bool[classes];
        _excluded = new int[classes];
        _stamp = new int[classes];
        _speciesCount = new int[network.SpeciesIds.Length];
        _localColumn = new int[network.SpeciesIds.Length];
    }

    /// <summary>True when the last <see cref="Run"/> stopped a branch that could still grow at the step bound (longer circuits may exist).</summary>
    public bool CutByStepBound { get; private set; }

    /// <summary>Enumerates circuits {t} ∪ S with S among classes ≥ <paramref name="minClass"/> and |S| ≤ <paramref name="maxSteps"/>.</summary>
    /// <param name="targetSpecies">Internal species indices of the target, ascending.</param>
    /// <param name="targetValues">Target coefficients modulo p, nonzero.</param>
    /// <param name="minClass">Smallest class number allowed in S.</param>
    /// <param name="maxSteps">Largest |S|.</param>
    /// <param name="minSteps">Report only circuits with |S| ≥ this (one round of iterative deepening; 1 reports all).</param>
    /// <param name="onFound">Receives each circuit.</param>
    /// <remarks>The walk, and so the number of budget steps it takes, depends on <paramref name="maxSteps"/> only, not on
    /// <paramref name="minSteps"/>.</remarks>
    public void Run(int[] targetSpecies, ulong[] targetValues, int minClass, int maxSteps, int minSteps, CircuitFound onFound)
    {
        _minClass = minClass;
        _maxSteps = maxSteps;
        _minSteps = minSteps;
        CutByStepBound = false;
        _onFound = onFound;
        _targetSpecies = targetSpecies;
        _memberCount = 0;
        AddMember(-1, targetSpecies, targetValues, out _);
        Node(0);
        RemoveMember();
    }

    private bool Available(int c) => c >= _minClass && !_inSet[c] && _excluded[c] == 0;

    private void Node(int depth)
    {
        if (_budget.ShouldStop())
        {
            return;
        }

        if (depth == _candidateBuffers.Count)
        {
            _candidateBuffers.Add([]);
        }

        List<int> candidates = _candidateBuffers[depth];
        candidates.Clear();
        if (!CollectCandidates(candidates))
        {
            return;
        }

        if (depth == _maxSteps)
        {
            CutByStepBound = true;
            return;
        }

        bool lastStep = depth + 1 == _maxSteps;
        int processed = 0;
        foreach (int c in candidates)
        {
            if (_budget.Stopped)
            {
                break;
            }

            NetworkClass cls = _network.Classes[c];
            if (lastStep && IntroducesSpecies(cls, c))
            {
                // Adding c brings a species no other member can cancel within the bound: needs more steps.
                CutByStepBound = true;
            }
            else
            {
                _inSet[c] = true;
                bool independent = AddMember(c, cls.Species, cls.Modular, out bool targetInvolved);
                if (independent)
                {
                    Node(depth + 1);
                }
                else if (targetInvolved && depth + 1 >= _minSteps && AllNonzero())
                {
                    if (!_onFound(_members.AsSpan(1, _memberCount - 1), _workCombination.AsSpan(0, _memberCount)))
                    {
                        _budget.Stop(SearchCut.StoppedEarly);
                    }
                }

                RemoveMember();
                _inSet[c] = false;
            }

            _excluded[c]++;
            processed++;
        }

        for (int k = 0; k < processed; k++)
        {
            _excluded[candidates[k]]--;
        }
    }

    // True if the class brings a species not yet in T that some other available class could cancel (a cut by the
    // bound); false if it brings none, or brings one nothing can cancel (a dead branch, not a cut).
    private bool IntroducesSpecies(NetworkClass cls, int self)
    {
        bool any = false;
        foreach (int s in cls.Species)
        {
            if (_speciesCount[s] > 0)
            {
                continue;
            }

            any = true;
            bool cancellable = false;
            foreach (int c in _network.ClassesOfSpecies[s])
            {
                if (c != self && Available(c))
                {
                    cancellable = true;
                    break;
                }
            }

            if (!cancellable)
            {
                return false;
            }
        }

        return any;
    }

    // Fills the branching candidates; returns false for a dead end (an unmatched species with no available class).
    private bool CollectCandidates(List<int> candidates)
    {
        _unmatched.Clear();
        foreach (int s in _speciesList)
        {
            if (_speciesCount[s] == 1)
            {
                _unmatched.Add(s);
            }
        }

        if (_unmatched.Count == 0)
        {
            _stampValue++;
            foreach (int s in _speciesList)
            {
                foreach (int c in _network.ClassesOfSpecies[s])
                {
                    if (_stamp[c] != _stampValue && Available(c))
                    {
                        _stamp[c] = _stampValue;
                        candidates.Add(c);
                    }
                }
            }

            candidates.Sort();
            return candidates.Count > 0;
        }

        int best = -1, bestCount = int.MaxValue;
        foreach (int s in _unmatched)
        {
            int n = 0;
            foreach (int c in _network.ClassesOfSpecies[s])
            {
                if (Available(c) && ++n >= bestCount)
                {
                    break;
                }
            }

            if (n == 0)
            {
                return false;
            }

            if (n < bestCount)
            {
                bestCount = n;
                best = s;
            }
        }

        foreach (int c in _network.ClassesOfSpecies[best])
        {
            if (Available(c))
            {
                candidates.Add(c);
            }
        }

        return true;
    }

    private bool AllNonzero()
    {
        for (int k = 1; k < _memberCount; k++)
        {
            if (_workCombination[k] == 0)
            {
                return false;
            }
        }

        return true;
    }

    // Adds a member to T and reduces it against the echelon rows. Returns true if independent (a new row was stored);
    // otherwise leaves the relation over T in _workCombination and sets targetInvolved when its t-factor is nonzero.
    private bool AddMember(int classNumber, int[] species, ulong[] values, out bool targetInvolved)
    {
        int index = _memberCount++;
        EnsureMemberCapacity(index + 1);
        _members[index] = classNumber;
        int newSpecies = 0;
        foreach (int s in species)
        {
            if (_speciesCount[s]++ == 0)
            {
                _localColumn[s] = _speciesList.Count;
                _speciesList.Add(s);
                newSpecies++;
            }
        }

        _newSpeciesOfMember[index] = newSpecies;
        int cols = _speciesList.Count;
        if (_work.Length < cols)
        {
            _work = new ulong[Math.Max(cols, 2 * _work.Length)];
        }

        ulong[] w = _work;
        Array.Clear(w, 0, cols);
        for (int k = 0; k < species.Length; k++)
        {
            w[_localColumn[species[k]]] = values[k];
        }

        ulong[] comb = _workCombination;
        Array.Clear(comb, 0, index + 1);
        comb[index] = 1;
        int rows = index; // T before this member is independent: one row per earlier member.
        for (int r = 0; r < rows; r++)
        {
            ulong f = w[_pivot[r]];
            if (f == 0)
            {
                continue;
            }

            ulong g = Mersenne61.Negate(f);
            ulong[] row = _rows[r];
            int extent = _rowExtent[r];
            for (int k = 0; k < extent; k++)
            {
                if (row[k] != 0)
                {
                    w[k] = Mersenne61.Add(w[k], Mersenne61.Multiply(g, row[k]));
                }
            }

            ulong[] rc = _combinations[r];
            for (int k = 0; k <= r; k++)
            {
                if (rc[k] != 0)
                {
                    comb[k] = Mersenne61.Add(comb[k], Mersenne61.Multiply(g, rc[k]));
                }
            }
        }

        int pivot = -1;
        for (int k = 0; k < cols; k++)
        {
            if (w[k] != 0)
            {
                pivot = k;
                break;
            }
        }

        if (pivot < 0)
        {
            targetInvolved = comb[0] != 0;
            return false;
        }

        ulong inverse = Mersenne61.Inverse(w[pivot]);
        if (index == _rows.Count)
        {
            _rows.Add(new ulong[Math.Max(cols, 16)]);
            _combinations.Add(new ulong[index + 1]);
        }
        else if (_rows[index].Length < cols)
        {
            _rows[index] = new ulong[Math.Max(cols, 2 * _rows[index].Length)];
        }

        ulong[] newRow = _rows[index];
        for (int k = 0; k < cols; k++)
        {
            newRow[k] = Mersenne61.Multiply(w[k], inverse);
        }

        ulong[] newComb = _combinations[index];
        for (int k = 0; k <= index; k++)
        {
            newComb[k] = Mersenne61.Multiply(comb[k], inverse);
        }

        _pivot[index] = pivot;
        _rowExtent[index] = cols;
        targetInvolved = false;
        return true;
    }

    private void EnsureMemberCapacity(int count)
    {
        if (_members.Length >= count)
        {
            return;
        }

        int size = Math.Max(count, 2 * _members.Length);
        Array.Resize(ref _members, size);
        Array.Resize(ref _newSpeciesOfMember, size);
        Array.Resize(ref _pivot, size);
        Array.Resize(ref _rowExtent, size);
        Array.Resize(ref _workCombination, size);
    }

    // Rows are a stack indexed by member position, so only the species bookkeeping needs undoing.
    private void RemoveMember()
    {
        int index = --_memberCount;
        int classNumber = _members[index];
        NetworkClass? cls = classNumber >= 0 ? _network.Classes[classNumber] : null;
        int[] species = cls?.Species ?? _targetSpecies;
        foreach (int s in species)
        {
            _speciesCount[s]--;
        }

        _speciesList.RemoveRange(_speciesList.Count - _newSpeciesOfMember[index], _newSpeciesOfMember[index]);
    }
}
