using PathFinder.Chemistry;
using PathFinder.Routes;
using PathFinder.Solving;

namespace PathFinder.Analysis;

/// <summary>Every route found to a target, best first, with the network's own best estimate beside them.</summary>
/// <param name="Target">The target equation.</param>
/// <param name="Family">The property family searched.</param>
/// <param name="Routes">The routes, sorted by uncertainty then number of steps.</param>
/// <param name="RoutesFound">How many routes the search found (may exceed <see cref="Routes"/> when the list is cut to the top K).</param>
/// <param name="Cut">What stopped the search short, if anything.</param>
/// <param name="IndependentRoutes">How many of the listed routes are linearly independent.</param>
/// <param name="UnreachableSpecies">Species of the target that no measurement contains.</param>
/// <param name="NetworkEstimate">The least-squares estimate of the target from the whole network, when it was computed and is estimable.</param>
/// <param name="MaxSteps">The step bound used.</param>
/// <param name="CompleteUpToSteps">Every route of at most this many steps was found (<see cref="RouteSearchResult.CompleteUpToSteps"/>).</param>
public sealed record RouteReport(
    ChemicalEquation Target,
    PropertyFamily Family,
    IReadOnlyList<ExplainedRoute> Routes,
    long RoutesFound,
    SearchCut Cut,
    int IndependentRoutes,
    IReadOnlyList<Species> UnreachableSpecies,
    DerivedEstimate? NetworkEstimate,
    int MaxSteps,
    int CompleteUpToSteps)
{
    /// <summary>Whether the enumeration is complete within its bound (nothing was cut).</summary>
    public bool Complete => Cut == SearchCut.None;

    /// <summary>Why the enumeration is incomplete, in words; empty when complete.</summary>
    /// <remarks>Routes are searched by increasing size, so a budget or a stop is reported with the size it reached:
    /// "all routes up to 3 steps were found; the time budget ran out while searching 4-step routes".</remarks>
    public string IncompleteReason
    {
        get
        {
            if (Cut == SearchCut.None)
            {
                return "";
            }

            if (Cut == SearchCut.StepBound)
            {
                return $"longer routes than {MaxSteps} steps may exist (raise --max-steps)";
            }

            var reasons = new List<string>();
            if (Cut.HasFlag(SearchCut.TimeBudget))
            {
                reasons.Add("the time budget ran out");
            }

            if (Cut.HasFlag(SearchCut.WorkBudget))
            {
                reasons.Add("the work budget ran out");
            }

            if (Cut.HasFlag(SearchCut.Cancelled))
            {
                reasons.Add("the search was cancelled");
            }

            if (Cut.HasFlag(SearchCut.StoppedEarly))
            {
                reasons.Add("the search stopped after the requested number of routes");
            }

            string what = string.Join(" and ", reasons);
            int next = CompleteUpToSteps + 1;
            return CompleteUpToSteps > 0
                ? $"all routes up to {CompleteUpToSteps} step{(CompleteUpToSteps == 1 ? "" : "s")} were found; {what} while searching {next}-step routes"
                : $"{what} while searching {next}-step routes";
        }
    }
}
