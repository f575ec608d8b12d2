using PathFinder.Chemistry;

namespace PathFinder.Analysis;

/// <summary>One unknown of the joint model: a species' ΔfH° or S°, or a source's common offset.</summary>
/// <param name="Kind">What it stands for.</param>
/// <param name="Species">The species (for ΔfH° and S°), otherwise null.</param>
/// <param name="Source">The source (for a source offset), otherwise null.</param>
/// <param name="Systematic">The declaration of a declared source offset; null for species and for an offset the consistency check inferred (no prior).</param>
public sealed record ModelUnknown(UnknownKind Kind, Species? Species, string? Source = null, SourceSystematic? Systematic = null)
{
    /// <summary>The unknown as people write it: <c>ΔfH°(CO2(g))</c>, <c>S°(O2(g))</c> or <c>offset(group A)</c>.</summary>
    public string Name => Kind switch
    {
        UnknownKind.FormationEnthalpy => $"ΔfH°({Species!.Name})",
        UnknownKind.Entropy => $"S°({Species!.Name})",
        _ => $"offset({Source})",
    };

    /// <inheritdoc/>
    public override string ToString() => Name;
}
