using System.Globalization;

namespace PathFinder.Benchmarks;

/// <summary>One line of the summary table: a measured figure beside its target.</summary>
/// <param name="Name">What was measured.</param>
/// <param name="Target">The requirement in words ("≤ 0.5 s"), or "–" when the figure is informative only.</param>
/// <param name="Measured">The measured value with its unit.</param>
/// <param name="Pass">Whether the target is met; null when there is no target.</param>
public sealed record Figure(string Name, string Target, string Measured, bool? Pass)
{
    private const string Prefix = "@figure\t";

    /// <summary>A timed figure against a limit in seconds.</summary>
    public static Figure Seconds(string name, double seconds, double limit) =>
        new(name, string.Create(CultureInfo.InvariantCulture, $"≤ {limit:0.###} s"), string.Create(CultureInfo.InvariantCulture, $"{seconds:0.000} s"), seconds <= limit);

    /// <summary>A memory figure against a limit in MB (10⁶ bytes).</summary>
    public static Figure Megabytes(string name, double megabytes, double limit) =>
        new(name, string.Create(CultureInfo.InvariantCulture, $"< {limit:0} MB"), string.Create(CultureInfo.InvariantCulture, $"{megabytes:0} MB"), megabytes < limit);

    /// <summary>An informative figure without a target.</summary>
    public static Figure Info(string name, string measured) => new(name, "–", measured, null);

    /// <summary>The machine-readable line a child process writes so the parent can collect the figure.</summary>
    public string ToLine() => Prefix + string.Join('\t', Name, Target, Measured, Pass switch { true => "pass", false => "FAIL", null => "" });

    /// <summary>Reads a line written by <see cref="ToLine"/>; null for any other line.</summary>
    public static Figure? TryParse(string line)
    {
        ArgumentNullException.ThrowIfNull(line);
        if (!line.StartsWith(Prefix, StringComparison.Ordinal))
        {
            return null;
        }

        string[] parts = line[Prefix.Length..].Split('\t');
        return parts.Length != 4 ? null : new Figure(parts[0], parts[1], parts[2], parts[3] switch { "pass" => true, "FAIL" => false, _ => null });
    }

    /// <summary>Prints a table of figures (Markdown, so it can be pasted into BASELINE.md).</summary>
    public static void WriteTable(TextWriter output, IEnumerable<Figure> figures)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(figures);
        Figure[] rows = figures.ToArray();
        int name = Math.Max(6, rows.Select(row => row.Name.Length).DefaultIfEmpty().Max());
        int target = Math.Max(6, rows.Select(row => row.Target.Length).DefaultIfEmpty().Max());
        int measured = Math.Max(8, rows.Select(row => row.Measured.Length).DefaultIfEmpty().Max());
        output.WriteLine($"| {"figure".PadRight(name)} | {"target".PadRight(target)} | {"measured".PadRight(measured)} | result |");
        output.WriteLine($"|-{new string('-', name)}-|-{new string('-', target)}-|-{new string('-', measured)}-|--------|");
        foreach (Figure row in rows)
        {
            string result = row.Pass switch { true => "pass", false => "FAIL", null => "" };
            output.WriteLine($"| {row.Name.PadRight(name)} | {row.Target.PadRight(target)} | {row.Measured.PadRight(measured)} | {result,-6} |");
        }
    }
}
