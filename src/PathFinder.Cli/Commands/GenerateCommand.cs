using System.CommandLine;
using System.Globalization;
using PathFinder.Cli.Output;
using PathFinder.Synthetic;

namespace PathFinder.Cli.Commands;

/// <summary><c>pathfinder generate --species N --measurements M</c>: writes a synthetic test network with its ground truth.</summary>
/// <remarks>
/// The folder receives <c>measurements.csv</c> (readable by every other command) and <c>truth.txt</c> (the true
/// formation enthalpies, absolute entropies when asked for, and the ids of the injected outliers), from <see cref="SyntheticNetworkGenerator"/>.
/// The same options and seed always give the same files.
/// </remarks>
public sealed class GenerateCommand
{
    private readonly Option<int> _species = new("--species") { Description = $"Number of species besides the element reference states, 3 to {SyntheticNetworkGenerator.MaxSpeciesCount} (the distinct formulas the generator makes).", Required = true };
    private readonly Option<int> _measurements = new("--measurements") { Description = $"Number of ΔH measurements, 1 to {SyntheticNetworkGenerator.MaxMeasurementCount}; S° and --gibbs data come on top.", Required = true };
    private readonly Option<int> _seed = new("--seed") { Description = "Seed of the generator; the same seed gives the same network (default 1).", DefaultValueFactory = _ => 1 };
    private readonly Option<double> _outliers = new("--outliers") { Description = "Fraction of measurements given a gross error of 8–30 σ, from 0 to 1 (default 0).", DefaultValueFactory = _ => 0.0 };
    private readonly Option<double> _entropies = new("--entropies") { Description = "Fraction of species given a true S° and an S° datum, from 0 to 1; element reference states, CO2(g) and H2O(l) get one too when above 0 (default 0: ΔH data only).", DefaultValueFactory = _ => 0.0 };
    private readonly Option<int> _gibbs = new("--gibbs") { Description = $"Number of ΔG, ln K and log10 K data at 298.15–1000 K over species with S°, 0 to {SyntheticNetworkGenerator.MaxMeasurementCount} (needs --entropies; default 0).", DefaultValueFactory = _ => 0 };
    private readonly Option<string> _out = new("--out", "-o") { Description = "Folder to write measurements.csv and truth.txt into (default ./synthetic-network).", DefaultValueFactory = _ => "synthetic-network" };
    private readonly Option<bool> _force = new("--force") { Description = "Write into the folder even when it is not empty (measurements.csv and truth.txt are replaced, even when read-only)." };

    /// <summary>Builds the command bound to <paramref name="context"/>.</summary>
    public Command Build(CommandContext context)
    {
        var command = new Command("generate", "Write a synthetic, element-balanced test network of a chosen size with known true values and outliers (invented numbers, for testing and benchmarks only).")
        {
            _species, _measurements, _seed, _outliers, _entropies, _gibbs, _out, _force,
        };
        command.SetAction(parse => Run(
            new SyntheticNetworkOptions
            {
                SpeciesCount = parse.GetValue(_species),
                MeasurementCount = parse.GetValue(_measurements),
                Seed = parse.GetValue(_seed),
                OutlierFraction = parse.GetValue(_outliers),
                EntropyFraction = parse.GetValue(_entropies),
                GibbsCount = parse.GetValue(_gibbs),
            },
            parse.GetValue(_out)!,
            parse.GetValue(_force),
            context));
        return command;
    }

    /// <summary>Generates and writes the network; exit 0, or <see cref="UserInputException"/> (exit 2) for bad options or a non-empty folder.</summary>
    /// <param name="options">What to generate: species (3 to <see cref="SyntheticNetworkGenerator.MaxSpeciesCount"/>), ΔH measurements (1 to <see cref="SyntheticNetworkGenerator.MaxMeasurementCount"/>), seed, outlier fraction and entropy fraction in [0, 1], Gibbs-energy data count (0 to the same bound, only with entropies).</param>
    /// <param name="folder">Destination folder; created when missing.</param>
    /// <param name="force">Whether a non-empty folder may be written into.</param>
    /// <param name="context">Where the summary goes.</param>
    public static int Run(SyntheticNetworkOptions options, string folder, bool force, CommandContext context)
    {
        ArgumentNullException.ThrowIfNull(options);
        ArgumentNullException.ThrowIfNull(folder);
        ArgumentNullException.ThrowIfNull(context);
        OptionParsing.InRange(options.SpeciesCount, 3, SyntheticNetworkGenerator.MaxSpeciesCount, "--species", "the generator makes no more distinct C/H/N/O formulas");
        OptionParsing.InRange(options.MeasurementCount, 1, SyntheticNetworkGenerator.MaxMeasurementCount, "--measurements", "a bound on memory; generate several networks for more");
        if (!double.IsFinite(options.OutlierFraction) || options.OutlierFraction < 0.0 || options.OutlierFraction > 1.0)
        {
            throw new UserInputException("--outliers must be a fraction from 0 to 1 (for example 0.02)");
        }

        if (!double.IsFinite(options.EntropyFraction) || options.EntropyFraction < 0.0 || options.EntropyFraction > 1.0)
        {
            throw new UserInputException("--entropies must be a fraction from 0 to 1 (for example 0.5)");
        }

        OptionParsing.InRange(options.GibbsCount, 0, SyntheticNetworkGenerator.MaxMeasurementCount, "--gibbs", "a bound on memory");

        if (options.GibbsCount > 0 && options.EntropyFraction <= 0.0)
        {
            throw new UserInputException("--gibbs needs species with S°: add --entropies (for example --entropies 0.5)");
        }

        if (string.IsNullOrWhiteSpace(folder))
        {
            throw new UserInputException("--out is empty; name a folder");
        }

        if (File.Exists(folder))
        {
            throw new UserInputException($"--out names a file, not a folder: {folder}");
        }

        if (!force && Directory.Exists(folder) && Directory.EnumerateFileSystemEntries(folder).Any())
        {
            throw new UserInputException($"the folder {folder} is not empty; choose another --out or add --force to write into it");
        }

        if (Directory.Exists(folder))
        {
            // Before the work: a FIFO, device or read-only file in place of either file is refused now, not after generating.
            OutputPaths.Check(Path.Combine(folder, SyntheticNetworkGenerator.MeasurementsFileName), "--out", force);
            OutputPaths.Check(Path.Combine(folder, SyntheticNetworkGenerator.TruthFileName), "--out", force);
        }

        SyntheticNetwork network = SyntheticNetworkGenerator.Generate(options);
        SyntheticNetworkGenerator.Write(network, folder, replaceReadOnly: force);
        context.Out.WriteLine(string.Create(
            CultureInfo.InvariantCulture,
            $"Wrote {network.Network.Measurements.Count} measurement(s) over {network.Network.Species.Count} species ({network.OutlierIds.Count} injected outlier(s), seed {options.Seed}) to {folder}"));
        context.Out.WriteLine($"  {Path.Combine(folder, "measurements.csv")}");
        context.Out.WriteLine($"  {Path.Combine(folder, "truth.txt")}  (true formation enthalpies{(network.TrueEntropy.Count > 0 ? ", absolute entropies" : "")} and outlier ids)");
        context.Out.WriteLine("The values are invented for testing; they are not data for design.");
        return ExitCodes.Success;
    }
}
