using Fractions;
using PathFinder.Algebra;
using PathFinder.Chemistry;
using PathFinder.Routes;
using PathFinder.Solving;

namespace PathFinder.Analysis;

/// <summary>Finds and explains every Hess's-law route from the measurements of a network to a target reaction.</summary>
public static class RouteAnalysis
{
    /// <summary>Searches the routes to <paramref name="target"/> and explains each one.</summary>
    /// <param name="model">The property model (its measurements are the candidate steps).</param>
    /// <param name="target">The target equation (element-balanced).</param>
    /// <param name="options">Search bounds; defaults to 6 steps and the best 100 routes.</param>
    /// <param name="networkEstimate">The joint solution's estimate of the target (<see cref="NetworkSolutions.Estimate"/>), shown beside the routes; optional.</param>
    public static RouteReport Find(PropertyModel model, ChemicalEquation target, RouteSearchOptions? options = null, DerivedEstimate? networkEstimate = null)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(target);
        options ??= new RouteSearchOptions();
        SparseVector vector = model.VectorOf(target, out IReadOnlyList<Species> missing);
        DerivedEstimate? estimate = networkEstimate is { IsEstimable: true } ? networkEstimate : null;
        if (missing.Count > 0 || vector.IsZero)
        {
            // A species no measurement mentions cannot be reached; a target of reference states only is zero by definition.
            return new RouteReport(target, model.Family, [], 0, SearchCut.None, 0, missing, estimate, options.MaxSteps, options.MaxSteps);
        }

        RouteSearchResult result = FindRoutes.To(model.ToRouteNetwork(), vector, options);
        var routes = result.Routes.Select((route, position) => Explain(model, target, route, position + 1)).ToArray();
        Species[] unreachable = result.UnreachableSpecies.Select(index => model.Unknowns[index]).ToArray();
        return new RouteReport(target, model.Family, routes, result.RoutesFound, result.Cut, result.IndependentRouteCount, unreachable, estimate, options.MaxSteps, result.CompleteUpToSteps);
    }

    /// <summary>Spells out one route: each step transformed, the intermediates that cancel, and the sum.</summary>
    public static ExplainedRoute Explain(PropertyModel model, ChemicalEquation target, Route route, int number)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(route);
        var steps = new List<RouteStep>(route.Steps);
        ChemicalEquation sum = ChemicalEquation.FromTerms([]);
        var seen = new List<Species>();
        for (int i = 0; i < route.Steps; i++)
        {
            PreparedMeasurement measurement = model.Measurements[route.Measurements[i]];
            Fraction factor = route.Factors[i];
            ChemicalEquation scaled = measurement.Equation.Scale(factor);
            double c = factor.ToDouble();
            steps.Add(new RouteStep(measurement, factor, scaled, c * measurement.Value, Math.Abs(c) * measurement.Uncertainty));
            sum = sum.Add(scaled);
            foreach (EquationTerm term in scaled.Terms)
            {
                if (!seen.Contains(term.Species))
                {
                    seen.Add(term.Species);
                }
            }
        }

        Species[] cancelled = seen.Where(species => sum.CoefficientOf(species).IsZero).ToArray();

        // The sum equals the target term by term; show it in the target's order, as the user wrote it.
        if (sum.Terms.Count == target.Terms.Count && target.Terms.All(term => sum.CoefficientOf(term.Species) == term.Coefficient))
        {
            sum = target;
        }

        return new ExplainedRoute(number, steps, route.Value, route.Uncertainty, route.IsIndependent, cancelled, sum);
    }
}
