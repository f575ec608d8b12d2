using System.Text.Json;
using System.Text.Json.Serialization;

namespace PathFinder.Cli.Output;

/// <summary>Writes a double as a JSON number when finite and as <c>null</c> otherwise, so no JSON output can fail on NaN or ±∞.</summary>
/// <remarks>
/// JSON has no NaN or infinity, and System.Text.Json throws on them: one such number in a result once made a whole
/// <c>--json</c> run exit 3. Registered in <see cref="Json.Options"/>, it also serves <c>double?</c> (null stays null).
/// Reading accepts numbers and null (as NaN).
/// </remarks>
public sealed class FiniteNumberConverter : JsonConverter<double>
{
    /// <inheritdoc/>
    public override double Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options) =>
        reader.TokenType == JsonTokenType.Null ? double.NaN : reader.GetDouble();

    /// <inheritdoc/>
    public override void Write(Utf8JsonWriter writer, double value, JsonSerializerOptions options)
    {
        ArgumentNullException.ThrowIfNull(writer);
        if (double.IsFinite(value))
        {
            writer.WriteNumberValue(value);
        }
        else
        {
            writer.WriteNullValue();
        }
    }
}
