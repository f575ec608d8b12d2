using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Quantities;
using PathFinder.Tests.TestSupport;
using Xunit.Abstractions;

namespace PathFinder.Tests.Analysis;

public sealed class SlipDiagnosisTests(ITestOutputHelper output)
{
    /// <summary>1 eV per particle in kJ/mol = e·N_A/1000 = 96.485 332 12 kJ/mol; CODATA 2018.</summary>
    private const double ElectronVoltInKilojoulePerMole = 96.48533212;

    /// <summary>The thermochemical calorie, 4.184 J exactly; NIST SP 811 (2008), appendix B.8.</summary>
    private const double Calorie = 4.184;

    /// <summary>ΔvapH°(H2O, 298.15 K) = ΔfH°(H2O, g) − ΔfH°(H2O, l) = −241.826 − (−285.830) = 44.004 ± 0.057 kJ/mol; CODATA Key Values 1989, from memory.</summary>
    private static readonly PhaseAlternative WaterVaporization = new(
        Species.Parse("H2O(l)"),
        Species.Parse("H2O(g)"),
        1.0,
        HandbookData.WaterVapour.Value - HandbookData.LiquidWater.Value,
        Math.Sqrt(2.0) * HandbookData.LiquidWater.Uncertainty);

    private static SlipQuestion Question(ThermoProperty property, double value, double uncertainty, double predicted, double predictedUncertainty, double correction = 0.0, params PhaseAlternative[] phases) =>
        new(property, value, correction, uncertainty, predicted, predictedUncertainty, phases);

    private static SlipQuestion Enthalpy(double value, double uncertainty, Tabulated rest, params PhaseAlternative[] phases) =>
        Question(ThermoProperty.Enthalpy, value, uncertainty, rest.Value, rest.Uncertainty, 0.0, phases);

    [Fact]
    public void Diagnose_NamesSignSlip_When_CombustionWrittenAsFormationWithItsOwnSign()
    {
        // Given C(graphite) + O2(g) -> CO2(g) entered as +393.40 ± 0.20 while the rest says ΔfH°(CO2, g) = −393.51 ± 0.13
        // (CODATA Key Values 1989, from memory)
        SlipQuestion question = Enthalpy(393.40, 0.20, HandbookData.CarbonDioxide);

        // When diagnosed
        LikelyCause? cause = SlipDiagnosis.Diagnose(question);

        // Then a sign slip, with the sign undone and the sentence in invariant form
        Assert.NotNull(cause);
        Assert.Equal(SlipKind.Sign, cause.Kind);
        Assert.Equal(-393.40, cause.ExplainedValue, 1e-9);
        Assert.Equal("looks like a sign slip: −393.40 would agree with the rest (−393.51 ± 0.13)", cause.Detail);
    }

    [Fact]
    public void Diagnose_NamesCalorieSlip_When_KilocaloriesTypedAsKilojoules()
    {
        // Given ΔfH°(CO2, g) typed in kcal/mol, −393.51/4.184 = −94.05 ± 0.03, under a kJ/mol header
        SlipQuestion question = Enthalpy(-94.05, 0.03, HandbookData.CarbonDioxide);

        // When diagnosed
        LikelyCause? cause = SlipDiagnosis.Diagnose(question);

        // Then ×4.184 (the thermochemical calorie, NIST SP 811) explains it
        Assert.NotNull(cause);
        Assert.Equal(SlipKind.Calorie, cause.Kind);
        Assert.Equal(-94.05 * Calorie, cause.ExplainedValue, 1e-9);
        Assert.Equal("looks like kcal/mol typed as kJ/mol: ×4.184 gives −393.51, which would agree with the rest (−393.51 ± 0.13)", cause.Detail);
    }

    [Fact]
    public void Diagnose_NamesCalorieSlip_When_KilojoulesDeclaredAsKilocalories()
    {
        // Given −393.51 typed under a kcal/mol header, which the analysis converted to −393.51·4.184 = −1646.45 kJ/mol
        SlipQuestion question = Enthalpy(-393.51 * Calorie, 0.13 * Calorie, HandbookData.CarbonDioxide);

        // When diagnosed
        LikelyCause? cause = SlipDiagnosis.Diagnose(question);

        // Then ÷4.184 explains it
        Assert.NotNull(cause);
        Assert.Equal(SlipKind.Calorie, cause.Kind);
        Assert.Equal(-393.51, cause.ExplainedValue, 1e-9);
        Assert.StartsWith("looks like kJ/mol typed as kcal/mol: ÷4.184 gives −393.51", cause.Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void Diagnose_NamesCalorieSlip_When_EntropyTypedInCaloriesPerMoleKelvin()
    {
        // Given S°(O2, g) = 205.152 ± 0.005 J/(mol·K) (CODATA Key Values 1989, from memory) typed in cal/(mol·K):
        // 205.152/4.184 = 49.03 ± 0.01
        SlipQuestion question = Question(ThermoProperty.AbsoluteEntropy, 49.03, 0.01, HandbookData.OxygenEntropy.Value, 0.05);

        // When diagnosed
        LikelyCause? cause = SlipDiagnosis.Diagnose(question);

        // Then the entropy units are named
        Assert.NotNull(cause);
        Assert.Equal(SlipKind.Calorie, cause.Kind);
        Assert.Equal("looks like cal/(mol·K) typed as J/(mol·K): ×4.184 gives +205.14, which would agree with the rest (+205.15 ± 0.05)", cause.Detail);
    }

    [Theory]
    [InlineData(2.0, "looks like the equation was scaled by 2 but the value was not: ×2 gives")]
    [InlineData(3.0, "looks like the equation was scaled by 3 but the value was not: ×3 gives")]
    [InlineData(0.5, "looks like the equation was halved but the value was not: ÷2 gives")]
    [InlineData(1.0 / 3.0, "looks like the equation was divided by 3 but the value was not: ÷3 gives")]
    public void Diagnose_NamesFactorSlip_When_EquationScaledButValueNot(double scale, string expectedStart)
    {
        // Given n H2(g) + n/2 O2(g) -> n H2O(l) with the value of one mole, ΔfH°(H2O, l) = −285.830 ± 0.040
        // (CODATA Key Values 1989, from memory), against the rest's n·ΔfH°
        Tabulated water = HandbookData.LiquidWater;
        SlipQuestion question = Enthalpy(water.Value, water.Uncertainty, new Tabulated(scale * water.Value, scale * water.Uncertainty));

        // When diagnosed
        LikelyCause? cause = SlipDiagnosis.Diagnose(question);

        // Then the factor is named
        Assert.NotNull(cause);
        Assert.Equal(SlipKind.Factor, cause.Kind);
        Assert.Equal(scale * water.Value, cause.ExplainedValue, 1e-9);
        Assert.StartsWith(expectedStart, cause.Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void Diagnose_NamesPhaseSlip_When_VapourMeasuredButLiquidWritten()
    {
        // Given H2(g) + ½ O2(g) -> H2O(l) entered with the value for water vapour, ΔfH°(H2O, g) = −241.826 ± 0.040,
        // while the rest says ΔfH°(H2O, l) = −285.830 ± 0.040 (CODATA Key Values 1989, from memory)
        SlipQuestion question = Enthalpy(HandbookData.WaterVapour.Value, HandbookData.WaterVapour.Uncertainty, HandbookData.LiquidWater, WaterVaporization);

        // When diagnosed
        LikelyCause? cause = SlipDiagnosis.Diagnose(question);

        // Then the vaporization enthalpy, 44.00 kJ/mol, is the gap
        Assert.NotNull(cause);
        Assert.Equal(SlipKind.Phase, cause.Kind);
        Assert.Equal(HandbookData.LiquidWater.Value, cause.ExplainedValue, 1e-9);
        Assert.Equal("looks like H2O(l) where H2O(g) was measured: −285.83 would agree with the rest (−285.83 ± 0.04)", cause.Detail);
    }

    [Fact]
    public void Diagnose_NamesPerParticleSlip_When_ElectronVoltsTypedAsKilojoules()
    {
        // Given H2(g) -> 2 H(g), ΔrH° = 2·ΔfH°(H, g) = 2·217.998 = 435.996 ± 0.012 kJ/mol (CODATA Key Values 1989,
        // from memory), typed as 4.5188 ± 0.0002 eV under a kJ/mol header (1 eV = 96.485 332 12 kJ/mol, CODATA 2018)
        SlipQuestion question = Enthalpy(4.5188, 0.0002, new Tabulated(435.996, 0.012));

        // When diagnosed
        LikelyCause? cause = SlipDiagnosis.Diagnose(question);

        // Then eV per particle is named
        Assert.NotNull(cause);
        Assert.Equal(SlipKind.PerParticle, cause.Kind);
        Assert.Equal(4.5188 * ElectronVoltInKilojoulePerMole, cause.ExplainedValue, 1e-6);
        Assert.Equal("looks like eV per particle typed as kJ/mol: ×96.485 gives +436.00, which would agree with the rest (+436.00 ± 0.01)", cause.Detail);
    }

    [Fact]
    public void Diagnose_NamesPerParticleSlip_When_WavenumbersTypedAsKilojoules()
    {
        // Given the dissociation energy of H2 at 0 K, D0 = 36 118.07 cm⁻¹ (Liu et al., J. Chem. Phys. 130, 174306 (2009),
        // from memory) = 432.07 kJ/mol, typed in cm⁻¹ under a kJ/mol header
        SlipQuestion question = Enthalpy(36118.07, 0.01, new Tabulated(432.07, 0.10));

        // When diagnosed
        LikelyCause? cause = SlipDiagnosis.Diagnose(question);

        // Then cm⁻¹ per particle is named
        Assert.NotNull(cause);
        Assert.Equal(SlipKind.PerParticle, cause.Kind);
        Assert.Equal(432.07, cause.ExplainedValue, 0.01);
        Assert.StartsWith("looks like cm⁻¹ per particle typed as kJ/mol: ×0.011963 gives +432.07", cause.Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void Diagnose_UndoesSignOnTypedNumberOnly_When_AnalysisAddedDeltaNRT()
    {
        // Given CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l) by bomb calorimetry: ΔcH° = −393.51 + 2·(−285.830) − (−74.87)
        // = −890.30 kJ/mol (CODATA Key Values 1989; ΔfH°(CH4, g) = −74.87 from NIST-JANAF; from memory), and
        // ΔcU° = ΔcH° − Δn·RT = −890.30 + 4.958 = −885.34, typed with the wrong sign. The analysis added
        // Δn·RT = −2·R·298.15 K = −4.958 kJ/mol to the typed +885.34.
        double deltaNRT = -2.0 * PhysicalConstants.GasConstant * PhysicalConstants.StandardTemperature / 1000.0;
        double combustion = -890.30;
        double typed = -(combustion - deltaNRT);
        SlipQuestion question = Question(ThermoProperty.InternalEnergy, typed + deltaNRT, 0.40, combustion, 0.30, deltaNRT);

        // When diagnosed
        LikelyCause? cause = SlipDiagnosis.Diagnose(question);

        // Then the sign is flipped on the typed ΔU and the correction added back: −885.34 − 4.958 = −890.30
        // (flipping the corrected value, −880.38, would miss by 9.9 kJ/mol)
        Assert.NotNull(cause);
        Assert.Equal(SlipKind.Sign, cause.Kind);
        Assert.Equal(combustion, cause.ExplainedValue, 1e-9);
    }

    [Theory]
    [InlineData(ThermoProperty.LnEquilibriumConstant)]
    [InlineData(ThermoProperty.Log10EquilibriumConstant)]
    public void Diagnose_NeverNamesUnitSlips_When_RowIsAnEquilibriumConstant(ThermoProperty property)
    {
        // Given ΔG values where ×4.184 and ×96.485 would each agree, had the row carried an energy unit
        SlipQuestion calorie = Question(property, -10.0, 0.01, -10.0 * Calorie, 0.05);
        SlipQuestion perParticle = Question(property, -1.0, 0.001, -ElectronVoltInKilojoulePerMole, 0.05);

        // When diagnosed as equilibrium-constant rows
        LikelyCause? fromCalorie = SlipDiagnosis.Diagnose(calorie);
        LikelyCause? fromPerParticle = SlipDiagnosis.Diagnose(perParticle);

        // Then nothing is named, while the same numbers on a ΔG row are unit slips
        Assert.Null(fromCalorie);
        Assert.Null(fromPerParticle);
        Assert.Equal(SlipKind.Calorie, SlipDiagnosis.Diagnose(calorie with { Property = ThermoProperty.GibbsEnergy })?.Kind);
        Assert.Equal(SlipKind.PerParticle, SlipDiagnosis.Diagnose(perParticle with { Property = ThermoProperty.GibbsEnergy })?.Kind);
    }

    [Theory]
    [InlineData(ThermoProperty.LnEquilibriumConstant)]
    [InlineData(ThermoProperty.Log10EquilibriumConstant)]
    public void Diagnose_NamesSignAndFactor_When_RowIsAnEquilibriumConstant(ThermoProperty property)
    {
        // Given ΔrG° = −RT·ln K rows that are the negative and the half of what the rest predicts
        SlipQuestion reversed = Question(property, 32.90, 0.10, -32.90, 0.20);
        SlipQuestion halved = Question(property, -16.45, 0.05, -32.90, 0.20);

        // When diagnosed
        LikelyCause? fromReversed = SlipDiagnosis.Diagnose(reversed);
        LikelyCause? fromHalved = SlipDiagnosis.Diagnose(halved);

        // Then sign and factor slips are named (they commute with the conversion from ln K)
        Assert.Equal(SlipKind.Sign, fromReversed?.Kind);
        Assert.Equal(SlipKind.Factor, fromHalved?.Kind);
    }

    [Fact]
    public void Diagnose_ReturnsNull_When_NoSlipExplainsTheGap()
    {
        // Given −380.0 ± 0.5 against ΔfH°(CO2, g) = −393.51 ± 0.13 (CODATA Key Values 1989, from memory)
        SlipQuestion question = Enthalpy(-380.0, 0.5, HandbookData.CarbonDioxide, WaterVaporization);

        // When diagnosed
        LikelyCause? cause = SlipDiagnosis.Diagnose(question);

        // Then nothing is named
        Assert.Null(cause);
    }

    [Fact]
    public void Diagnose_ReturnsNull_When_ValueAsGivenAgrees()
    {
        // Given −393.40 ± 0.20 against −393.51 ± 0.13: within 2 combined uncertainties
        SlipQuestion question = Enthalpy(-393.40, 0.20, HandbookData.CarbonDioxide);

        // When diagnosed
        LikelyCause? cause = SlipDiagnosis.Diagnose(question);

        // Then there is nothing to explain
        Assert.Null(cause);
    }

    [Fact]
    public void Diagnose_ReturnsNull_When_TransformsOfATinyValueAllLandNearThePrediction()
    {
        // Given 0.60 ± 0.10 against 0.10 ± 0.10: ÷3, ÷4.184 and ×0.012 all land within 2 σ of the prediction
        SlipQuestion question = Enthalpy(0.60, 0.10, new Tabulated(0.10, 0.10));

        // When diagnosed
        LikelyCause? cause = SlipDiagnosis.Diagnose(question);

        // Then none counts, since shrinking a value towards zero is no more specific than the noise
        Assert.Null(cause);
    }

    [Fact]
    public void Diagnose_PrefersTheClosestCandidate_When_SeveralFit()
    {
        // Given 100 ± 5 against 330 ± 40: ×3 lands on +300 (0.7 σ away) and ×4.184 on +418.4 (2.0 σ away), both within 2 σ
        SlipQuestion question = Enthalpy(100.0, 5.0, new Tabulated(330.0, 40.0));

        // When diagnosed
        LikelyCause? cause = SlipDiagnosis.Diagnose(question);

        // Then the closer ×3 wins
        Assert.NotNull(cause);
        Assert.Equal(SlipKind.Factor, cause.Kind);
        Assert.Equal(300.0, cause.ExplainedValue, 1e-9);
    }

    [Fact]
    public void Diagnose_FormatsInvariantly_When_CultureUsesDecimalComma()
    {
        // Given a comma-decimal culture
        using var culture = new CultureScope("de-DE");

        // When the sign slip of ΔfH°(CO2, g) is diagnosed
        LikelyCause? cause = SlipDiagnosis.Diagnose(Enthalpy(393.40, 0.20, HandbookData.CarbonDioxide));

        // Then the sentence uses decimal points
        Assert.Equal("looks like a sign slip: −393.40 would agree with the rest (−393.51 ± 0.13)", cause?.Detail);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(-1.0)]
    [InlineData(double.NaN)]
    public void Diagnose_Throws_When_AgreementIsNotPositive(double agreement)
    {
        SlipQuestion question = Enthalpy(393.40, 0.20, HandbookData.CarbonDioxide);

        Assert.Throws<ArgumentOutOfRangeException>(() => SlipDiagnosis.Diagnose(question, agreement));
    }

    [Fact]
    public void Diagnose_Throws_When_UncertaintyIsNegativeOrValueNotFinite()
    {
        SlipQuestion question = Enthalpy(393.40, 0.20, HandbookData.CarbonDioxide);

        Assert.Throws<ArgumentOutOfRangeException>(() => SlipDiagnosis.Diagnose(question with { Uncertainty = -0.1 }));
        Assert.Throws<ArgumentOutOfRangeException>(() => SlipDiagnosis.Diagnose(question with { Predicted = double.NaN }));
    }

    [Fact]
    public void Diagnose_NamesPlantedSlips_When_DrawnAtRandom()
    {
        // Given a few thousand realistic rows (true |value| 5–1000 kJ/mol, u 0.05–3, u_p 0.1–3 kJ/mol, uniform), a
        // prediction drawn around the true value with u_p, one planted slip each, and in half of them an unrelated
        // phase change known to the network
        var random = new Random(20250611);
        const int draws = 6000;
        var named = new Dictionary<SlipKind, (int Right, int Total)>();
        for (int i = 0; i < draws; i++)
        {
            Planted planted = Plant(random, i);

            // When diagnosed
            LikelyCause? cause = SlipDiagnosis.Diagnose(planted.Question);

            (int right, int total) = named.GetValueOrDefault(planted.Kind);
            named[planted.Kind] = (right + (cause?.Kind == planted.Kind ? 1 : 0), total + 1);
        }

        // Then the right kind is named for at least 90 % of each kind
        foreach ((SlipKind kind, (int right, int total)) in named.OrderBy(pair => pair.Key))
        {
            output.WriteLine($"{kind.Code()}: {right}/{total} = {Percent(right, total)}");
        }

        Assert.Equal(5, named.Count);
        Assert.All(named, pair => Assert.True(pair.Value.Right >= 0.9 * pair.Value.Total, $"{pair.Key.Code()}: {pair.Value.Right}/{pair.Value.Total}"));
    }

    [Fact]
    public void Diagnose_RarelyNamesASlip_When_OutliersAreNoSlip()
    {
        // Given a few thousand outliers v = p ± (5–50)·u_c in a random direction (|p| 5–1000 kJ/mol, u 0.05–3,
        // u_p 0.1–3, uniform)
        var random = new Random(20250612);
        const int draws = 6000;
        var named = new Dictionary<SlipKind, int>();
        for (int i = 0; i < draws; i++)
        {
            SlipQuestion question = Outlier(random, []);

            // When diagnosed
            LikelyCause? cause = SlipDiagnosis.Diagnose(question);
            if (cause is not null)
            {
                named[cause.Kind] = named.GetValueOrDefault(cause.Kind) + 1;
            }
        }

        // Then a slip is named for at most 5 %
        int total = named.Values.Sum();
        output.WriteLine($"named: {total}/{draws} = {Percent(total, draws)} ({Breakdown(named)})");
        Assert.True(total <= 0.05 * draws, $"{total}/{draws}");
    }

    [Fact]
    public void Diagnose_NamesAnUnrelatedPhaseChangeSeldom_When_OutliersAreNoSlip()
    {
        // Given the same outliers, each with a phase change the network knows that has nothing to do with the gap
        var random = new Random(20250613);
        const int draws = 3000;
        var named = new Dictionary<SlipKind, int>();
        for (int i = 0; i < draws; i++)
        {
            SlipQuestion question = Outlier(random, [RandomPhase(random)]);

            // When diagnosed
            LikelyCause? cause = SlipDiagnosis.Diagnose(question);
            if (cause is not null)
            {
                named[cause.Kind] = named.GetValueOrDefault(cause.Kind) + 1;
            }
        }

        // Then a slip is still seldom named; a gap that happens to equal a known phase change within 2 σ is named by
        // design, so the bound is looser than without phases
        int total = named.Values.Sum();
        output.WriteLine($"named: {total}/{draws} = {Percent(total, draws)} ({Breakdown(named)})");
        Assert.True(total <= 0.1 * draws, $"{total}/{draws}");
    }

    private readonly record struct Planted(SlipKind Kind, SlipQuestion Question);

    // Slips as the factor k that undoes them (explained = k·typed). A unit or equation slip applies to the whole row,
    // so the typed value and uncertainty are the honest ones divided by k.
    private static readonly (SlipKind Kind, double Undo)[] ScaledSlips =
    [
        (SlipKind.Sign, -1.0),
        (SlipKind.Calorie, Calorie),
        (SlipKind.Calorie, 1.0 / Calorie),
        (SlipKind.Factor, 2.0),
        (SlipKind.Factor, 3.0),
        (SlipKind.Factor, 0.5),
        (SlipKind.Factor, 1.0 / 3.0),
        (SlipKind.PerParticle, ElectronVoltInKilojoulePerMole),
        (SlipKind.PerParticle, 1.0 / ElectronVoltInKilojoulePerMole),
        (SlipKind.PerParticle, EnergyUnit.Wavenumber.ToCanonical),
        (SlipKind.PerParticle, 1.0 / EnergyUnit.Wavenumber.ToCanonical),
    ];

    private static Planted Plant(Random random, int index)
    {
        double truth = RandomSign(random) * Uniform(random, 5.0, 1000.0);
        double u = Uniform(random, 0.05, 3.0);
        double up = Uniform(random, 0.1, 3.0);
        double predicted = truth + (up * Gaussian(random));
        PhaseAlternative[] phases = random.NextDouble() < 0.5 ? [RandomPhase(random)] : [];
        int slot = index % (ScaledSlips.Length + 1);
        if (slot == ScaledSlips.Length)
        {
            // A phase slip: the measurement is of the equation with the other state, truth + the true shift, and the
            // network knows the shift to within its uncertainty
            PhaseAlternative actual = RandomPhase(random);
            double measured = truth + actual.Shift + (u * Gaussian(random));
            PhaseAlternative known = actual with { Shift = actual.Shift + (actual.ShiftUncertainty * Gaussian(random)) };
            return new Planted(SlipKind.Phase, Question(ThermoProperty.Enthalpy, measured, u, predicted, up, 0.0, [.. phases, known]));
        }

        (SlipKind kind, double undo) = ScaledSlips[slot];
        double honest = truth + (u * Gaussian(random));
        return new Planted(kind, Question(ThermoProperty.Enthalpy, honest / undo, u / Math.Abs(undo), predicted, up, 0.0, phases));
    }

    private static SlipQuestion Outlier(Random random, PhaseAlternative[] phases)
    {
        double predicted = RandomSign(random) * Uniform(random, 5.0, 1000.0);
        double u = Uniform(random, 0.05, 3.0);
        double up = Uniform(random, 0.1, 3.0);
        double combined = Math.Sqrt((u * u) + (up * up));
        double value = predicted + (RandomSign(random) * Uniform(random, 5.0, 50.0) * combined);
        return Question(ThermoProperty.Enthalpy, value, u, predicted, up, 0.0, phases);
    }

    // A phase change of ν·(10–90 kJ/mol), ν = ±1 or ±2: fusion to sublimation enthalpies of small molecules.
    private static PhaseAlternative RandomPhase(Random random)
    {
        double coefficient = RandomSign(random) * (random.NextDouble() < 0.5 ? 1.0 : 2.0);
        double shift = coefficient * Uniform(random, 10.0, 90.0);
        return new PhaseAlternative(Species.Parse("C6H6(l)"), Species.Parse("C6H6(g)"), coefficient, shift, Uniform(random, 0.05, 1.0));
    }

    private static double Uniform(Random random, double low, double high) => low + ((high - low) * random.NextDouble());

    private static double RandomSign(Random random) => random.NextDouble() < 0.5 ? -1.0 : 1.0;

    // Box–Muller.
    private static double Gaussian(Random random) =>
        Math.Sqrt(-2.0 * Math.Log(1.0 - random.NextDouble())) * Math.Cos(2.0 * Math.PI * random.NextDouble());

    private static string Percent(int count, int total) => ((double)count / total).ToString("P1", System.Globalization.CultureInfo.InvariantCulture);

    private static string Breakdown(Dictionary<SlipKind, int> named) =>
        string.Join(", ", named.OrderBy(pair => pair.Key).Select(pair => $"{pair.Key.Code()} {pair.Value}"));
}
