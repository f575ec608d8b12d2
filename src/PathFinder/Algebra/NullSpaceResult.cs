namespace PathFinder.Algebra;

/// <summary>The outcome of <see cref="NullSpace.Of"/>: an integer relation basis, or a note that the problem was too large.</summary>
/// <param name="TooLarge">True when the size limit stopped the computation (then <see cref="Basis"/> is empty).</param>
/// <param name="Basis">Relations over vector positions, each with coprime integer factors and a positive first factor.</param>
/// <param name="Rank">Rank of the vectors processed (all of them unless <see cref="TooLarge"/>).</param>
public sealed record NullSpaceResult(bool TooLarge, IReadOnlyList<SparseVector> Basis, int Rank);
