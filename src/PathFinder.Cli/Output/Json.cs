using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Serialization;
using PathFinder.Diagnostics;

namespace PathFinder.Cli.Output;

/// <summary>JSON output shared by every command: camelCase, indented, readable Unicode (Δ, ±, °); NaN and ±∞ become null.</summary>
public static class Json
{
    /// <summary>The serializer settings.</summary>
    public static JsonSerializerOptions Options { get; } = new()
    {
        PropertyNamingPolicy = JsonNamingPolicy.CamelCase,
        WriteIndented = true,
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
        DefaultIgnoreCondition = JsonIgnoreCondition.Never,
        NumberHandling = JsonNumberHandling.Strict,
        Converters = { new FiniteNumberConverter() },
    };

    /// <summary>Writes <paramref name="value"/> as JSON followed by a newline.</summary>
    public static void Write(TextWriter writer, object value)
    {
        ArgumentNullException.ThrowIfNull(writer);
        writer.WriteLine(JsonSerializer.Serialize(value, Options));
    }

    /// <summary>A finite number, or null for NaN/infinity (JSON has no NaN).</summary>
    public static double? Number(double value) => double.IsFinite(value) ? value : null;

    /// <summary>A diagnostic as a JSON object.</summary>
    public static object Of(Diagnostic diagnostic)
    {
        ArgumentNullException.ThrowIfNull(diagnostic);
        return new
        {
            severity = diagnostic.SeverityWord,
            code = diagnostic.Code,
            file = diagnostic.Location.File,
            line = diagnostic.Location.Line,
            column = diagnostic.Location.Column,
            field = diagnostic.Location.Field,
            message = diagnostic.Message,
            hint = diagnostic.Hint,
        };
    }
}
