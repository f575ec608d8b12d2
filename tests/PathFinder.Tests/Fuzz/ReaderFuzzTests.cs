using CsCheck;
using PathFinder.Chemistry;
using PathFinder.Data;
using PathFinder.Diagnostics;
using PathFinder.Quantities;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Fuzz;

/// <summary>
/// Generated and mutated inputs for every reader: no exception escapes, every rejection is located, and round
/// trips hold. A failure prints a seed; replay with <c>CsCheck_Seed=&lt;seed&gt;</c> (see DEVELOPERS.md).
/// </summary>
[Trait("Category", "Fuzz")]
public sealed class ReaderFuzzTests
{
    [Fact]
    public void FormulaParser_ReturnsAValueOrALocatedFailure_AndValuesRoundTrip()
    {
        FuzzInputs.Mutated(FuzzInputs.Formula).Sample(text =>
        {
            ParseResult<Formula> result = FormulaParser.Parse(text);
            if (result.TryGetValue(out Formula? formula))
            {
                ParseResult<Formula> again = FormulaParser.Parse(formula.Text);
                Assert.True(again.Success, $"printed formula '{FuzzInputs.Show(formula.Text)}' does not re-parse: {again.Failure?.Message}");
                Assert.Equal(formula, again.Value);
            }
            else
            {
                AssertLocated(result.Failure!, text);
            }
        }, iter: 30_000, print: FuzzInputs.Show);
    }

    [Fact]
    public void EquationParser_ReturnsAValueOrALocatedFailure()
    {
        FuzzInputs.Mutated(FuzzInputs.Equation).Sample(text =>
        {
            ParseResult<ChemicalEquation> result = EquationParser.Parse(text);
            if (!result.Success)
            {
                AssertLocated(result.Failure!, text);
            }
        }, iter: 25_000, print: FuzzInputs.Show);
    }

    [Fact]
    public void CsvNumber_ReturnsAFiniteNumberOrOneLocatedError()
    {
        Gen.Select(FuzzInputs.Mutated(FuzzInputs.Number), Gen.Bool).Sample((text, decimalComma) =>
        {
            var diagnostics = new List<Diagnostic>();
            var row = new CsvRow("f.csv", 3, [text], [5]);
            double? number = CsvNumber.Read(row, 0, "value", decimalComma, diagnostics);
            if (number is double value)
            {
                Assert.True(double.IsFinite(value));
                Assert.Empty(diagnostics);
            }
            else
            {
                Diagnostic error = Assert.Single(diagnostics);
                Assert.Equal(new SourceLocation("f.csv", 3, 5, "value"), error.Location);
            }
        }, iter: 20_000, print: t => FuzzInputs.Show(t.Item1) + (t.Item2 ? " (decimal comma)" : ""));
    }

    [Fact]
    public void EnergyUnit_ParsesOrRefuses_AndParsedUnitsRoundTrip()
    {
        FuzzInputs.Mutated(FuzzInputs.Unit).Sample(text =>
        {
            if (EnergyUnit.TryParse(text, out EnergyUnit unit))
            {
                Assert.True(EnergyUnit.TryParse(unit.Symbol, out EnergyUnit again));
                Assert.Equal(unit, again);
                Assert.Equal(1.0, unit.FromCanonicalValue(unit.ToCanonicalValue(1.0)), 1e-12);
            }
        }, iter: 10_000, print: FuzzInputs.Show);
    }

    [Fact]
    public void CsvTable_ReturnsATableOrLocatedErrors()
    {
        FuzzInputs.MutatedBytes(FuzzInputs.NetworkFile).Sample(bytes =>
        {
            var diagnostics = new List<Diagnostic>();
            CsvTable? table = CsvTable.Parse(bytes, "f.csv", diagnostics);
            Assert.All(diagnostics, diagnostic => Assert.Equal("f.csv", diagnostic.Location.File));
            if (table is null)
            {
                Assert.Contains(diagnostics, diagnostic => diagnostic.Severity == Severity.Error);
            }
            else
            {
                Assert.All(table.Rows, row => Assert.True(row.Line > table.HeaderLine, $"row line {row.Line} not after the header"));
            }
        }, iter: 12_000, print: FuzzInputs.Show);
    }

    [Fact]
    public void NetworkReader_OnWholeFiles_ReturnsDiagnosticsLocatedInTheFile()
    {
        using var folder = new TempFolder();
        FuzzInputs.MutatedBytes(FuzzInputs.NetworkFile).Sample(bytes =>
        {
            string file = folder.WriteBytes($"{Guid.NewGuid():N}.csv", bytes);
            try
            {
                NetworkReadResult result = NetworkReader.Read(file);
                foreach (Diagnostic error in result.Errors)
                {
                    Assert.False(string.IsNullOrEmpty(error.Location.File), $"unlocated error {error}");
                    Assert.True(error.Location.Line >= 1 || FileLevelCodes.Contains(error.Code), $"row error without a line: {error}");
                }
            }
            finally
            {
                File.Delete(file);
            }
        }, iter: 3_000, print: FuzzInputs.Show);
    }

    private static readonly HashSet<string> FileLevelCodes = ["binary-file", "not-utf8", "empty-file", "unreadable-file", "utf16-file", "missing-column", "no-header"];

    private static void AssertLocated(ParseFailure failure, string text)
    {
        Assert.InRange(failure.Offset, 0, text.Length);
        Assert.False(string.IsNullOrWhiteSpace(failure.Message));
        Assert.False(string.IsNullOrWhiteSpace(failure.Code));
    }
}
