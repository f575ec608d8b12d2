using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Data;
using PathFinder.Quantities;
using PathFinder.Tests.TestSupport;
using PathFinder.Thermodynamics;

namespace PathFinder.Tests.Analysis;

public sealed class NetworkSolutionsTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void Estimate_BombCalorimetryOfMethane_GivesTheTabulatedFormationEnthalpy()
    {
        // Given ΔfH°(CO2, g) = −393.51 and ΔfH°(H2O, l) = −285.83 kJ/mol (CODATA Key Values, Cox, Wagman, Medvedev
        // 1989, from memory) and the combustion energy of methane at constant volume, ΔcU° = −885.34 kJ/mol. That ΔcU°
        // is worked out by hand, independently of PathFinder, from ΔcH° = −890.30 kJ/mol (the same CODATA values with
        // ΔfH°(CH4, g) = −74.87 kJ/mol, NIST-JANAF 1998, from memory): Δn(gas) = 1 − 3 = −2, so
        // ΔcU° = ΔcH° − Δn(gas)·R·T = −890.30 + 2 × 8.314462618 × 298.15 / 1000 = −885.342 kJ/mol.
        const string csv =
            "id,equation,property,value,uncertainty,unit,temperature\n" +
            "F1,CO2(g),dH,-393.51,0.13,kJ/mol,\n" +
            "F2,H2O(l),dH,-285.83,0.04,kJ/mol,\n" +
            "U1,CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l),dU,-885.342,0.3,kJ/mol,\n";
        NetworkReadResult read = AnalysisNetworks.Read(_folder, csv);
        var solutions = new NetworkSolutions(read.Network);

        // When the network is solved for ΔfH°(CH4, g)
        UncertainValue? methane = solutions.Estimate(PropertyFamily.Enthalpy, ChemicalEquation.Formation(Species.Parse("CH4(g)")));

        // Then it is the tabulated −74.87 kJ/mol (NIST-JANAF 1998, from memory); without the 2RT term it would be 4.96 off
        Assert.NotNull(methane);
        Assert.Equal(-74.87, methane.Value.Value, 0.02);
        Assert.True(Math.Abs(methane.Value.Value - (-74.87 - (2 * PhysicalConstants.GasConstant * 298.15 / 1000.0))) > 4.0);
    }

    [Fact]
    public void Report_IsSolvedOnceAndShared()
    {
        // Given the solutions of an enthalpy-only network
        NetworkReadResult read = AnalysisNetworks.Read(_folder, AnalysisNetworks.Redundant);
        var solutions = new NetworkSolutions(read.Network, read.HeatCapacities);

        // When its ΔfH° view is asked for twice
        SolveReport? first = solutions.Report(PropertyFamily.Enthalpy);
        SolveReport? second = solutions.Report(PropertyFamily.Enthalpy);

        // Then both views read the one joint solution (a view is cheap, the solve is made once), and there is no ΔfG° view
        // without S° data
        Assert.NotNull(first);
        Assert.NotNull(second);
        Assert.Same(solutions.Joint, solutions.Joint);
        Assert.Same(solutions.Joint!.Solution, first.Solution);
        Assert.Same(first.Solution, second.Solution);
        Assert.Same(first.Model, second.Model);
        Assert.Null(solutions.Report(PropertyFamily.GibbsEnergy));
    }
}
