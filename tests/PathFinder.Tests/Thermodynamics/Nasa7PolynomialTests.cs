using MathNet.Numerics;
using PathFinder.Quantities;
using PathFinder.Thermodynamics;

namespace PathFinder.Tests.Thermodynamics;

public class Nasa7PolynomialTests
{
    [Fact]
    public void IntegratedCp_N2From298To1000K_MatchesJanaf()
    {
        // Given the two-range NASA polynomials for N2 (GRI-Mech 3.0, from memory)
        PiecewiseHeatCapacity n2 = ReferenceHeatCapacities.NitrogenNasa7();

        // When Cp is integrated from 298.15 K to 1000 K
        double increment = n2.IntegrateHeatCapacity(298.15, 1000.0);

        // Then H°(1000) − H°(298.15) = 21.463 kJ/mol (NIST-JANAF 4th ed. 1998, from memory), within 0.05 kJ/mol
        Assert.InRange(increment / 1000.0, 21.463 - 0.05, 21.463 + 0.05);
    }

    [Fact]
    public void AbsoluteEnthalpyAndEntropy_N2At298K_MatchElementReferenceAndJanaf()
    {
        // Given the low range of N2 (GRI-Mech 3.0, from memory)
        var low = (Nasa7Polynomial)ReferenceHeatCapacities.NitrogenNasa7().Pieces[0];

        // Then H°(298.15) ≈ 0 (element in its reference state) and S°(298.15) = 191.609 J/(mol K)
        // (NIST-JANAF 4th ed. 1998, from memory), within the fit's 0.2 J/(mol K)
        Assert.InRange(low.Enthalpy(298.15), -20.0, 20.0);
        Assert.InRange(low.Entropy(298.15), 191.609 - 0.2, 191.609 + 0.2);
    }

    [Fact]
    public void Integrals_AgreeWithAbsoluteFormsAndQuadrature()
    {
        // Given the high range of N2
        var high = (Nasa7Polynomial)ReferenceHeatCapacities.NitrogenNasa7().Pieces[1];

        // Then ∫Cp dT = H(T2) − H(T1), ∫Cp/T dT = S(T2) − S(T1), and both match Math.NET quadrature
        Assert.Equal(high.Enthalpy(3000) - high.Enthalpy(1200), high.IntegrateHeatCapacity(1200, 3000), 1e-6);
        Assert.Equal(high.Entropy(3000) - high.Entropy(1200), high.IntegrateHeatCapacityOverTemperature(1200, 3000), 1e-9);
        Assert.Equal(Integrate.OnClosedInterval(high.HeatCapacity, 1200, 3000), high.IntegrateHeatCapacity(1200, 3000), 1e-6);
    }

    [Fact]
    public void HeatCapacity_IsRTimesPolynomial()
    {
        // Given a polynomial with only a1 = 3.5 (an ideal diatomic gas, Cp = 7R/2)
        var model = new Nasa7Polynomial([3.5, 0, 0, 0, 0, 0, 0], new TemperatureRange(200, 1000));

        // Then Cp = 3.5 R (CODATA 2018 R)
        Assert.Equal(3.5 * PhysicalConstants.GasConstant, model.HeatCapacity(500), 1e-12);
    }

    [Fact]
    public void Constructor_WithWrongCoefficientCount_Throws()
    {
        Assert.Throws<ArgumentException>(() => new Nasa7Polynomial([1, 2, 3], new TemperatureRange(300, 1000)));
    }
}
