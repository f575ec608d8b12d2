using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Data;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Analysis;

/// <summary>Small networks written to a temporary folder for the analysis tests of provenance, planning and temperature.</summary>
internal static class AnalysisNetworks
{
    /// <summary>A redundant C1 combustion network: formation shorthands, combustions, a hydrogenation and a vaporisation (values invented, approximate).</summary>
    public const string Redundant =
        "id,equation,property,value,uncertainty,unit,temperature,source\n" +
        "F1,CO2(g),dH,-393.5,0.2,kJ/mol,,lab-a\n" +
        "F2,H2O(l),dH,-285.8,0.1,kJ/mol,,lab-a\n" +
        "K1,CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l),dH,-890.4,0.5,kJ/mol,,lab-b\n" +
        "K2,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.1,0.3,kJ/mol,,lab-b\n" +
        "K3,CH3OH(l) + 3/2 O2(g) -> CO2(g) + 2 H2O(l),dH,-726.2,0.4,kJ/mol,,lab-b\n" +
        "R1,CO(g) + 2 H2(g) -> CH3OH(g),dH,-90.4,0.6,kJ/mol,,lab-c\n" +
        "R2,CH3OH(l) -> CH3OH(g),dH,37.6,0.3,kJ/mol,,lab-c\n" +
        "R3,CH4(g) + H2O(g) -> CO(g) + 3 H2(g),dH,206.0,0.7,kJ/mol,,lab-c\n" +
        "R4,H2O(l) -> H2O(g),dH,44.0,0.1,kJ/mol,,lab-a\n" +
        "R5,CO(g) + H2O(g) -> CO2(g) + H2(g),dH,-41.3,0.5,kJ/mol,,lab-c\n";

    /// <summary>Writes <paramref name="csv"/> as <c>lab.csv</c> (and the optional heat-capacity table beside it) and reads it.</summary>
    public static NetworkReadResult Read(TempFolder folder, string csv, string? heatCapacities = null)
    {
        string file = folder.Write("lab.csv", csv);
        if (heatCapacities is not null)
        {
            folder.Write("lab.heat-capacity.csv", heatCapacities);
        }

        NetworkReadResult result = NetworkReader.Read(file);
        Assert.Empty(result.Errors);
        return result;
    }

    /// <summary>The enthalpy solution of <see cref="Redundant"/>, as given (no suspect procedure).</summary>
    public static SolveReport SolveRedundant(TempFolder folder)
    {
        NetworkReadResult read = Read(folder, Redundant);
        return NetworkSolver.Report(NetworkSolver.Solve(ThermoModel.Build(read.Network), adjust: false), PropertyFamily.Enthalpy)!;
    }

    /// <summary>A target read against the species of a solved model.</summary>
    public static ChemicalEquation Target(SolveReport report, string text) =>
        TargetReaction.Parse(text, new ReactionNetwork("t", report.Model.Measurements.Select(item => item.Measurement))).Value;
}
