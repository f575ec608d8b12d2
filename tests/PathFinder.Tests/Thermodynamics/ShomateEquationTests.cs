using MathNet.Numerics;
using PathFinder.Thermodynamics;

namespace PathFinder.Tests.Thermodynamics;

public class ShomateEquationTests
{
    [Theory]
    // H°(1000 K) − H°(298.15 K) in kJ/mol: NIST-JANAF Thermochemical Tables, 4th ed. (Chase 1998), from memory.
    [InlineData("N2", 21.463)]
    [InlineData("O2", 22.703)]
    [InlineData("CO2", 33.397)]
    [InlineData("H2", 20.680)]
    public void IntegratedCp_From298To1000K_MatchesJanafEnthalpyIncrement(string species, double janafKiloJoules)
    {
        // Given Shomate coefficients (Shomate fit to NIST-JANAF 1998, from memory)
        IHeatCapacity model = Model(species);

        // When Cp is integrated analytically across the ranges
        double increment = model.IntegrateHeatCapacity(298.15, 1000.0);

        // Then it agrees with JANAF within 0.01 kJ/mol (allowing for fit and memory)
        Assert.InRange(increment / 1000.0, janafKiloJoules - 0.01, janafKiloJoules + 0.01);
    }

    [Fact]
    public void EntropyIncrement_N2From298To1000K_MatchesJanaf()
    {
        // Given N2 Shomate data (Shomate fit to NIST-JANAF 1998, from memory)
        IHeatCapacity model = ReferenceHeatCapacities.NitrogenShomate();

        // When ∫Cp/T dT is taken
        double increment = model.IntegrateHeatCapacityOverTemperature(298.15, 1000.0);

        // Then it equals S°(1000) − S°(298.15) = 228.170 − 191.609 J/(mol K) (NIST-JANAF 4th ed. 1998, from memory)
        Assert.InRange(increment, 36.561 - 0.02, 36.561 + 0.02);
    }

    [Fact]
    public void PublishedEnthalpyAndEntropyForms_AgreeWithTheIntegrals()
    {
        // Given the CO2 low range, which carries F, G and H
        var co2 = (ShomateEquation)ReferenceHeatCapacities.CarbonDioxideShomate().Pieces[0];

        // When the published H − H298 and S forms are evaluated
        double enthalpyIncrement = co2.EnthalpyIncrement(1000.0);
        double entropyDifference = co2.Entropy(1000.0) - co2.Entropy(298.15);

        // Then differences of the published forms equal the analytic integrals, and the fit's F reproduces
        // H° − H°298.15 = 0 at 298.15 K to within a few J/mol
        Assert.Equal(co2.IntegrateHeatCapacity(298.15, 1000.0), enthalpyIncrement - co2.EnthalpyIncrement(298.15), 1e-6);
        Assert.Equal(co2.IntegrateHeatCapacityOverTemperature(298.15, 1000.0), entropyDifference, 1e-9);
        Assert.InRange(co2.EnthalpyIncrement(298.15), -5.0, 5.0);
    }

    [Fact]
    public void Integrals_AgreeWithNumericalQuadrature()
    {
        // Given one Shomate range
        ShomateEquation water = ReferenceHeatCapacities.WaterShomate();

        // When integrated analytically and numerically (Math.NET adaptive quadrature as an oracle)
        double analytic = water.IntegrateHeatCapacity(600.0, 1500.0);
        double numeric = Integrate.OnClosedInterval(water.HeatCapacity, 600.0, 1500.0);
        double analyticS = water.IntegrateHeatCapacityOverTemperature(600.0, 1500.0);
        double numericS = Integrate.OnClosedInterval(t => water.HeatCapacity(t) / t, 600.0, 1500.0);

        // Then they agree to quadrature precision
        Assert.Equal(numeric, analytic, 1e-6);
        Assert.Equal(numericS, analyticS, 1e-9);
    }

    [Fact]
    public void HeatCapacity_N2At298K_MatchesJanaf()
    {
        // Then Cp(298.15) = 29.124 J/(mol K) (NIST-JANAF 4th ed. 1998, from memory)
        Assert.Equal(29.124, ReferenceHeatCapacities.NitrogenShomate().HeatCapacity(298.15), 0.005);
    }

    [Fact]
    public void EnthalpyIncrement_WithoutReferenceConstants_Throws()
    {
        // Given a set without F, G, H
        var bare = new ShomateEquation(30, 1, 0, 0, 0, new TemperatureRange(300, 1000));

        // Then the published H form is not available
        Assert.Throws<InvalidOperationException>(() => bare.EnthalpyIncrement(500));
        Assert.Throws<InvalidOperationException>(() => bare.Entropy(500));
    }

    private static IHeatCapacity Model(string species) => species switch
    {
        "N2" => ReferenceHeatCapacities.NitrogenShomate(),
        "O2" => ReferenceHeatCapacities.OxygenShomate(),
        "CO2" => ReferenceHeatCapacities.CarbonDioxideShomate(),
        _ => ReferenceHeatCapacities.HydrogenShomate(),
    };
}
