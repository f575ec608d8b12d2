using System.Text.Json;
using PathFinder.Cli.Output;

namespace PathFinder.Cli.Tests.Output;

public sealed class VisibleTextWriterTests
{
    [Fact]
    public void Write_ShowsControlCharactersAndKeepsLines()
    {
        // Given a wrapped writer
        using var inner = new StringWriter { NewLine = "\n" };
        using var writer = new VisibleTextWriter(inner);

        // When text with escapes is written through every overload
        writer.WriteLine("source \u001b]0;pwned\u0007");
        writer.Write('\u001b');
        writer.Write("[2J\tok".ToCharArray(), 0, 6);
        writer.WriteLine();
        writer.Write($"{"\u009b"}x\r\n");

        // Then no control character but line breaks and tabs arrives
        Assert.Equal("source \\u001B]0;pwned\\u0007\n\\u001B[2J\tok\n\\u009Bx\r\n", inner.ToString());
    }

    [Fact]
    public void Write_KeepsJsonValidAndItsMeaning()
    {
        // Given JSON whose encoder left a bidirectional override raw
        string json = JsonSerializer.Serialize(new { name = "a\u202eb\u001b" }, Json.Options);
        using var inner = new StringWriter();
        using var writer = new VisibleTextWriter(inner);

        // When it goes through the writer
        writer.Write(json);

        // Then it still parses to the same text
        using JsonDocument document = JsonDocument.Parse(inner.ToString());
        Assert.Equal("a\u202eb\u001b", document.RootElement.GetProperty("name").GetString());
        Assert.DoesNotContain(inner.ToString(), c => char.IsControl(c) && c is not ('\n' or '\r'));
    }
}
