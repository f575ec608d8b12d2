using PathFinder.Thermodynamics;

namespace PathFinder.Tests.Thermodynamics;

public class ReactionHeatCapacityTests
{
    [Fact]
    public void Kirchhoff_ConstantCp_IsExact()
    {
        // Given A + 2B → C with constant Cp 30, 20, 50 J/(mol K): ΔrCp = 50 − 30 − 40 = −20
        ReactionSpecies<string>[] species =
        [
            new("A", -1, new ConstantHeatCapacity(30)),
            new("B", -2, new ConstantHeatCapacity(20)),
            new("C", 1, new ConstantHeatCapacity(50)),
        ];

        // When ΔrH = −100 kJ/mol and ΔrS = −80 J/(mol K) are moved from 298.15 K to 700 K
        KirchhoffShift<string> h = Kirchhoff.ShiftEnthalpy(species, -100_000, 298.15, 700);
        KirchhoffShift<string> s = Kirchhoff.ShiftEntropy(species, -80, 298.15, 700);

        // Then ΔrH(T2) = ΔrH(T1) + ΔrCp (T2 − T1) and ΔrS(T2) = ΔrS(T1) + ΔrCp ln(T2/T1) (calculus)
        Assert.Equal(-20 * (700 - 298.15), h.Correction, 1e-9);
        Assert.Equal(-100_000 + (-20 * (700 - 298.15)), h.Result, 1e-9);
        Assert.Equal(-80 + (-20 * Math.Log(700 / 298.15)), s.Result, 1e-12);
        Assert.True(h.IsClean);
    }

    [Fact]
    public void Kirchhoff_LinearCp_IsExact()
    {
        // Given two species with linear Cp and coefficients −1, +2: ΔrCp = (2·8 − 12) + (2·0.03 − 0.02) T = 4 + 0.04 T
        (double, IHeatCapacity?)[] species =
        [
            (-1, new LinearHeatCapacity(12, 0.02)),
            (2, new LinearHeatCapacity(8, 0.03)),
        ];

        KirchhoffShift<int> h = Kirchhoff.ShiftEnthalpy(species, 5000, 1000, 400);
        KirchhoffShift<int> s = Kirchhoff.ShiftEntropy(species, 10, 1000, 400);

        // Then the corrections are 4(T2 − T1) + 0.02(T2² − T1²) and 4 ln(T2/T1) + 0.04(T2 − T1) (calculus)
        Assert.Equal((4 * (400 - 1000)) + (0.02 * ((400 * 400) - (1000 * 1000))), h.Correction, 1e-9);
        Assert.Equal(10 + (4 * Math.Log(400.0 / 1000)) + (0.04 * (400 - 1000)), s.Result, 1e-12);
        Assert.Equal(1000, h.FromTemperature);
        Assert.Equal(400, h.ToTemperature);
    }

    [Fact]
    public void Kirchhoff_WaterFormationAt1000K_MatchesJanaf()
    {
        // Given H2 + ½O2 → H2O(g) with Shomate data (Shomate fit to NIST-JANAF 1998, from memory) and
        // ΔfH°(H2O, g, 298.15 K) = −241.826 kJ/mol (NIST-JANAF 4th ed. 1998; CODATA Key Values 1989), from memory
        var reaction = new ReactionHeatCapacity<string>(
        [
            new("H2(g)", -1, ReferenceHeatCapacities.HydrogenShomate()),
            new("O2(g)", -0.5, ReferenceHeatCapacities.OxygenShomate()),
            new("H2O(g)", 1, ReferenceHeatCapacities.WaterShomate()),
        ]);

        // When moved to 1000 K
        KirchhoffShift<string> h = reaction.ShiftEnthalpy(-241_826, 298.15, 1000);

        // Then ΔfH°(H2O, g, 1000 K) = −247.857 kJ/mol (NIST-JANAF 4th ed. 1998, from memory), within 0.05 kJ/mol
        Assert.InRange(h.Result / 1000, -247.857 - 0.05, -247.857 + 0.05);

        // And the H2O data (valid from 500 K) are reported as extrapolated, the others not
        SpeciesRangeWarning<string> warning = Assert.Single(h.RangeWarnings);
        Assert.Equal("H2O(g)", warning.Species);
        Assert.Equal(new TemperatureRange(500, 1700), warning.Warning.ValidRange);
    }

    [Fact]
    public void KirchhoffEntropyAndGibbs_WaterFormationAt1000K_MatchJanaf()
    {
        // Given ΔfH°(298.15 K) = −241.826 kJ/mol and S°(298.15 K): H2O(g) 188.834, H2 130.680, O2 205.147 J/(mol K)
        // (NIST-JANAF 4th ed. 1998, from memory), and the Shomate data (Shomate fit to NIST-JANAF 1998, from memory)
        double entropy298 = 188.834 - 130.680 - (0.5 * 205.147);
        var reaction = new ReactionHeatCapacity<string>(
        [
            new("H2(g)", -1, ReferenceHeatCapacities.HydrogenShomate()),
            new("O2(g)", -0.5, ReferenceHeatCapacities.OxygenShomate()),
            new("H2O(g)", 1, ReferenceHeatCapacities.WaterShomate()),
        ]);

        // When ΔrH and ΔrS are moved to 1000 K and combined into K
        KirchhoffShift<string> h = reaction.ShiftEnthalpy(-241_826, 298.15, 1000);
        KirchhoffShift<string> s = reaction.ShiftEntropy(entropy298, 298.15, 1000);
        EquilibriumConstant k = GibbsRelations.EquilibriumConstant(new UncertainValue(h.Result), new UncertainValue(s.Result), 1000);

        // Then ΔrS(1000 K) = (ΔfH° − ΔfG°)/T = (−247.857 + 192.590) kJ/mol / 1000 K, and log Kf = 10.060
        // (NIST-JANAF 4th ed. 1998, H2O(g) at 1000 K, from memory)
        double expected = (-247_857 + 192_590) / 1000.0;
        Assert.InRange(s.Result, expected - 0.03, expected + 0.03);
        Assert.InRange(k.Log10K, 10.060 - 0.005, 10.060 + 0.005);
    }

    [Fact]
    public void SpeciesWithoutData_AreListed_AndContributeNothing()
    {
        // Given a reaction where one species has no Cp model
        var reaction = new ReactionHeatCapacity<string>(
        [
            new("X", -1, new ConstantHeatCapacity(30)),
            new("Y", 1, null),
            new("Z", 1, new ConstantHeatCapacity(20)),
        ]);

        // When shifting
        KirchhoffShift<string> h = reaction.ShiftEnthalpy(0, 300, 400);

        // Then Y is named, ΔrCp uses only X and Z, and the result is not clean
        Assert.Equal(["Y"], reaction.SpeciesWithoutData);
        Assert.False(reaction.IsComplete);
        Assert.Equal(["Y"], h.SpeciesWithoutData);
        Assert.Equal(-10 * 100, h.Correction, 1e-9);
        Assert.False(h.IsClean);
        Assert.Equal(-10, reaction.HeatCapacity(350), 1e-12);
    }
}
