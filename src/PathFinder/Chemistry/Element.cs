namespace PathFinder.Chemistry;

/// <summary>A chemical element (or the hydrogen isotopes D and T, which are balanced separately).</summary>
/// <param name="Symbol">The case-sensitive symbol, such as <c>Fe</c>.</param>
/// <param name="AtomicNumber">The number of protons.</param>
/// <param name="Name">The IUPAC name in English.</param>
public sealed record Element(string Symbol, int AtomicNumber, string Name)
{
    /// <inheritdoc/>
    public override string ToString() => Symbol;
}
