using System.Text.Json;
using PathFinder.Cli.Output;

namespace PathFinder.Cli.Tests.Output;

public sealed class JsonTests
{
    [Fact]
    public void Write_TurnsNonFiniteNumbersIntoNull_Anywhere()
    {
        // Given a crafted result with NaN and infinities as plain, nullable, nested and array numbers
        var result = new
        {
            value = double.NaN,
            uncertainty = double.PositiveInfinity,
            chiSquared = (double?)double.NegativeInfinity,
            missing = (double?)null,
            finite = -41.16,
            species = new[] { new { name = "CO(g)", estimate = double.NaN, covariance = new[] { 1.0, double.PositiveInfinity } } },
        };
        using var writer = new StringWriter();

        // When it is written
        Json.Write(writer, result);

        // Then it is valid JSON: finite numbers stay numbers, the others are null
        using JsonDocument document = JsonDocument.Parse(writer.ToString());
        JsonElement root = document.RootElement;
        Assert.Equal(JsonValueKind.Null, root.GetProperty("value").ValueKind);
        Assert.Equal(JsonValueKind.Null, root.GetProperty("uncertainty").ValueKind);
        Assert.Equal(JsonValueKind.Null, root.GetProperty("chiSquared").ValueKind);
        Assert.Equal(JsonValueKind.Null, root.GetProperty("missing").ValueKind);
        Assert.Equal(-41.16, root.GetProperty("finite").GetDouble());
        JsonElement species = root.GetProperty("species")[0];
        Assert.Equal(JsonValueKind.Null, species.GetProperty("estimate").ValueKind);
        Assert.Equal(1.0, species.GetProperty("covariance")[0].GetDouble());
        Assert.Equal(JsonValueKind.Null, species.GetProperty("covariance")[1].ValueKind);
    }
}
