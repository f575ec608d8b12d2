namespace PathFinder.Solving;

/// <summary>Undetermined unknowns that are known relative to each other (e.g. only X → Y was measured).</summary>
/// <remarks>
/// Each member's value is unknown, but for every member j the combination x_j − Ratios[j]·x_anchor is estimable,
/// where the anchor is <c>Members[0]</c> (ratio 1). For a pair linked only by differences the ratios are 1: the
/// group is known up to a common additive constant. Found by comparing the rows of an orthonormal null-space
/// basis Q: members have parallel rows, Q_j = ratio·Q_anchor, within <see cref="SolverOptions.EstimabilityTolerance"/>.
/// </remarks>
public sealed class RelativeGroup
{
    internal RelativeGroup(int component, int[] members, double[] ratios)
    {
        Component = component;
        Members = members;
        Ratios = ratios;
    }

    /// <summary>The connected component the group belongs to.</summary>
    public int Component { get; }

    /// <summary>The unknowns, anchor first, the rest ascending.</summary>
    public IReadOnlyList<int> Members { get; }

    /// <summary>For each member, the ratio r such that x_member − r·x_anchor is estimable.</summary>
    public IReadOnlyList<double> Ratios { get; }

    /// <summary>The estimable combination x_member − r·x_anchor for the member at <paramref name="position"/> (≥ 1).</summary>
    public SparseRow RelativeCombination(int position)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(position, 1);
        return SparseRow.Of((Members[position], 1.0), (Members[0], -Ratios[position]));
    }
}
