using PathFinder.Solving;

namespace PathFinder.Analysis;

/// <summary>One view of the joint least-squares solution: every species' ΔfH°, S° or ΔfG°(298.15 K), all from one solution.</summary>
/// <param name="Model">The joint model solved.</param>
/// <param name="Solution">The solution (after the suspect procedure when <paramref name="Adjusted"/>).</param>
/// <param name="Family">Which species quantity this view shows: ΔfH° (enthalpy), S° (entropy) or ΔfG° (Gibbs energy, derived: ΔfH° − T·ΔfS°).</param>
/// <param name="Species">Every species the view concerns with its estimate (NaN when not determined), in model order.</param>
/// <param name="Undetermined">Species the data do not determine.</param>
/// <param name="RelativeGroups">Undetermined species known only relative to each other, described in words.</param>
/// <param name="Adjusted">Whether the suspect procedure ran.</param>
/// <param name="Adjustments">The uncertainty enlargements it made.</param>
/// <param name="Suspects">Observations it found inconsistent.</param>
public sealed record SolveReport(
    ThermoModel Model,
    LeastSquaresSolution Solution,
    PropertyFamily Family,
    IReadOnlyList<SpeciesEstimate> Species,
    IReadOnlyList<SpeciesEstimate> Undetermined,
    IReadOnlyList<string> RelativeGroups,
    bool Adjusted,
    IReadOnlyList<UncertaintyAdjustment> Adjustments,
    IReadOnlyList<OutlierSuspect> Suspects)
{
    /// <summary>The covariance of every determined species quantity of this view with every other, row by row (the diagonal is u²).</summary>
    /// <remarks>
    /// ΔfH° and S° entries are read straight from the solution; ΔfG° entries are aᵢᵀ·C·aⱼ of their combinations, one
    /// Cov·aᵢ product per species, so a view of n species costs n products and writes n² entries: ask for it on the
    /// species you need. Quantities are named as <c>ΔfH°(CO2(g))</c>, <c>S°(O2(g))</c>, <c>ΔfG°(NO(g))</c>.
    /// </remarks>
    public IEnumerable<CovarianceEntry> Covariances()
    {
        SpeciesEstimate[] determined = Species.Where(estimate => estimate.IsDetermined).ToArray();
        string[] names = determined.Select(estimate => $"{Family.SpeciesQuantity()}({estimate.Species.Name})").ToArray();
        if (Family != PropertyFamily.GibbsEnergy)
        {
            UnknownKind kind = Family == PropertyFamily.Entropy ? UnknownKind.Entropy : UnknownKind.FormationEnthalpy;
            int[] unknowns = determined.Select(estimate => Model.IndexOf(estimate.Species, kind)).ToArray();
            for (int i = 0; i < unknowns.Length; i++)
            {
                for (int j = 0; j < unknowns.Length; j++)
                {
                    yield return new CovarianceEntry(names[i], names[j], Solution.Covariance(unknowns[i], unknowns[j]));
                }
            }

            yield break;
        }

        Solving.SparseRow[] rows = determined.Select(estimate => Model.Quantity(PropertyFamily.GibbsEnergy, Chemistry.ChemicalEquation.Formation(estimate.Species)).Row).ToArray();
        for (int i = 0; i < rows.Length; i++)
        {
            double[] product = Solution.CovarianceTimes(rows[i]);
            for (int j = 0; j < rows.Length; j++)
            {
                yield return new CovarianceEntry(names[i], names[j], rows[j].Dot(product));
            }
        }
    }

    /// <summary>The ids of the measurements among <see cref="Suspects"/> (source priors left out).</summary>
    public IEnumerable<string> SuspectIds => Suspects.Where(suspect => !Model.IsPrior(suspect.ObservationIndex)).Select(suspect => Model.Measurements[suspect.ObservationIndex].Id);
}
