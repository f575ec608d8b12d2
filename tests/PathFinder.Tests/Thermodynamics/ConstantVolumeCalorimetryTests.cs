using PathFinder.Quantities;
using PathFinder.Thermodynamics;

namespace PathFinder.Tests.Thermodynamics;

public class ConstantVolumeCalorimetryTests
{
    [Fact]
    public void BenzoicAcidCombustion_BombEnergyToEnthalpy_MatchesHessValue()
    {
        // Given C7H6O2(cr) + 15/2 O2(g) → 7 CO2(g) + 3 H2O(l), Δn(gas) = 7 − 7.5 = −0.5, and the standard massic
        // energy of combustion of benzoic acid, the calorimetric reference substance, ΔcU°/m = −26.413 kJ/g
        // (standard-state value from the literature on benzoic acid calibrations, from memory), molar mass from
        // IUPAC standard atomic weights C 12.011, H 1.008, O 15.999 (conventional values)
        double molarMass = (7 * 12.011) + (6 * 1.008) + (2 * 15.999);
        double internalEnergy = -26.413e3 * molarMass;

        // When converted to an enthalpy at 298.15 K
        double enthalpy = ConstantVolumeCalorimetry.EnthalpyFromInternalEnergy(internalEnergy, -0.5, 298.15);

        // Then it matches ΔcH° by Hess's law from ΔfH°(C7H6O2, cr) = −385.2 kJ/mol (literature value, from memory; the exact primary source not verified),
        // ΔfH°(CO2, g) = −393.51 and ΔfH°(H2O, l) = −285.830 kJ/mol (CODATA Key Values, Cox, Wagman, Medvedev 1989,
        // from memory); the tolerance 0.6 kJ/mol is half the 1.24 kJ/mol correction, so a missing or reversed
        // correction fails
        double hess = ((7 * -393.51) + (3 * -285.830) - -385.2) * 1000;
        Assert.InRange(enthalpy, hess - 600, hess + 600);
        Assert.True(Math.Abs(internalEnergy - hess) > 600, "the correction must matter for this check");
    }

    [Fact]
    public void Correction_IsDeltaNTimesRT_AndRoundTrips()
    {
        // Given CH4(g) + 2 O2(g) → CO2(g) + 2 H2O(l), Δn(gas) = −2
        double correction = ConstantVolumeCalorimetry.Correction(-2, 298.15);

        // Then the correction is −2RT (CODATA 2018 R) and ΔU → ΔH → ΔU returns the start, uncertainty unchanged
        Assert.Equal(-2 * PhysicalConstants.GasConstant * 298.15, correction, 1e-9);
        var measured = new UncertainValue(-885_000, 300);
        UncertainValue h = ConstantVolumeCalorimetry.EnthalpyFromInternalEnergy(measured, -2, 298.15);
        UncertainValue back = ConstantVolumeCalorimetry.InternalEnergyFromEnthalpy(h, -2, 298.15);
        Assert.Equal(measured.Value, back.Value, 1e-6);
        Assert.Equal(300, h.StandardUncertainty, 1e-12);
        Assert.Equal(-885_000 + correction, ConstantVolumeCalorimetry.EnthalpyFromInternalEnergy(-885_000, -2, 298.15), 1e-9);
    }

    [Fact]
    public void Correction_WithNoGasChange_IsZero()
    {
        // Given C(graphite) + O2(g) → CO2(g), Δn(gas) = 0: ΔH = ΔU
        Assert.Equal(-393_510, ConstantVolumeCalorimetry.EnthalpyFromInternalEnergy(-393_510, 0, 298.15), 1e-9);
    }
}
