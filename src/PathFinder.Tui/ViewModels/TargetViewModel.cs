using PathFinder.Chemistry;
using PathFinder.Diagnostics;
using PathFinder.Quantities;
using PathFinder.Tui.Analysis;

namespace PathFinder.Tui.ViewModels;

/// <summary>The target screen: a typed equation or a picked species, its validation, and routes best first.</summary>
public sealed class TargetViewModel
{
    /// <summary>At most this many routes are asked for.</summary>
    public const int MaxRoutes = 20;

    /// <summary>The longest target accepted, in characters (a reaction written out is far shorter; longer text is a paste gone wrong).</summary>
    public const int MaxInputLength = 2000;

    private readonly ExplorerViewModel _owner;

    internal TargetViewModel(ExplorerViewModel owner) => _owner = owner;

    /// <summary>The column headers of the routes table.</summary>
    public static IReadOnlyList<string> Headers { get; } = ["#", "value ± u", "steps", "measurements"];

    /// <summary>The text typed: an equation, or one species for its formation.</summary>
    public string Input { get; private set; } = "";

    /// <summary>The property wanted.</summary>
    public ThermoProperty Property { get; private set; } = ThermoProperty.Enthalpy;

    /// <summary>Why the input is not usable (shown under the input), or empty.</summary>
    public string Error { get; private set; } = "";

    /// <summary>The 0-based offset in <see cref="Input"/> where the problem is, or null.</summary>
    public int? ErrorOffset { get; private set; }

    /// <summary>The result of the last search, or null.</summary>
    public TargetReport? Report { get; private set; }

    /// <summary>Whether a search is running.</summary>
    public bool IsSearching { get; private set; }

    /// <summary>Whether a valid target waits for the analysis, which is still computing; the search starts when it is ready.</summary>
    public bool IsWaitingForAnalysis { get; private set; }

    /// <summary>The routes found, best first.</summary>
    public IReadOnlyList<RouteReport> Routes => Report?.Routes ?? [];

    /// <summary>The species that can be picked (network species other than element reference states).</summary>
    public IReadOnlyList<string> SpeciesChoices =>
        _owner.Data.Network.Species.Where(s => !ReferenceStates.HasZeroFormationProperties(s)).Select(s => s.Name).ToArray();

    /// <summary>The line under the routes: the network estimate and any message.</summary>
    public string EstimateText
    {
        get
        {
            if (IsSearching)
            {
                return "searching routes…";
            }

            if (IsWaitingForAnalysis)
            {
                return "computing… the routes are searched as soon as the analysis is ready";
            }

            if (Report is null)
            {
                return "type a reaction or a species and press Enter, or Tab to the species list; Ctrl+P changes the property";
            }

            string unit = Report.Property.CanonicalUnit().Symbol;
            string estimate = $"network estimate {Report.Property.Code()} = {Display.ValueWithUncertainty(Report.NetworkValue, Report.NetworkUncertainty)} {unit}";
            return Report.Message.Length > 0 ? $"{estimate}; {Report.Message}" : estimate;
        }
    }

    /// <summary>Cycles the property (dH → dG → dS → dU → dH).</summary>
    public void NextProperty()
    {
        ThermoProperty[] order = [ThermoProperty.Enthalpy, ThermoProperty.GibbsEnergy, ThermoProperty.Entropy, ThermoProperty.InternalEnergy];
        int i = Array.IndexOf(order, Property);
        Property = order[(i + 1) % order.Length];
        Report = null;
    }

    /// <summary>Picks a species: its formation becomes the target and the search starts.</summary>
    public void PickSpecies(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        Submit(name);
    }

    /// <summary>Validates <paramref name="input"/>; when valid, searches routes in the background.</summary>
    /// <returns>Whether the input was valid (the search started).</returns>
    public bool Submit(string input)
    {
        Input = input ?? "";
        Report = null;
        IsWaitingForAnalysis = false;
        if (Input.Length > MaxInputLength)
        {
            SetError(null, string.Create(System.Globalization.CultureInfo.InvariantCulture, $"the target is {Input.Length:N0} characters long; at most {MaxInputLength:N0} are accepted (type one reaction, or one species)"));
            return false;
        }

        ChemicalEquation? target = Validate(Input);
        if (target is null)
        {
            return false;
        }

        if (_owner.Analysis is not { } analysis)
        {
            // Not an error in the input: the search starts by itself when the first analysis arrives (AnalysisReady).
            IsWaitingForAnalysis = true;
            return false;
        }

        IsSearching = true;
        ThermoProperty property = Property;
        _owner.RunInBackground(
            $"searching routes to {target}",
            token => analysis.FindRoutes(target, property, MaxRoutes, token),
            report =>
            {
                IsSearching = false;
                Report = report;
            },
            () => IsSearching = false);
        return true;
    }

    /// <summary>Called when an analysis has arrived: a target that waited for it is searched now.</summary>
    internal void AnalysisReady()
    {
        if (IsWaitingForAnalysis)
        {
            Submit(Input);
        }
    }

    /// <summary>The cells of a route row; a route that uses a suspect measurement says so ("! uses suspect C03").</summary>
    public IReadOnlyList<string> Cells(int index, RouteReport route)
    {
        ArgumentNullException.ThrowIfNull(route);
        var suspects = new HashSet<string>((_owner.Analysis?.Suspects ?? []).Select(suspect => suspect.MeasurementId), StringComparer.Ordinal);
        string[] used = route.Steps.Select(step => step.MeasurementId).Where(suspects.Contains).ToArray();
        string steps = string.Join(" ", route.Steps.Select(step => step.Factor == "1" ? step.MeasurementId : $"{step.Factor}×{step.MeasurementId}"));
        return
        [
            (index + 1).ToString(System.Globalization.CultureInfo.InvariantCulture),
            Display.ValueWithUncertainty(route.Value, route.Uncertainty),
            Display.Count(route.Steps.Count),
            used.Length > 0 ? $"! uses suspect {string.Join(", ", used)}: {steps}" : steps,
        ];
    }

    /// <summary>The step-by-step explanation of route <paramref name="index"/>: each scaled equation and its contribution, then the sum.</summary>
    public IReadOnlyList<string> Explain(int index)
    {
        if (Report is null || index < 0 || index >= Report.Routes.Count)
        {
            return ["no route selected"];
        }

        RouteReport route = Report.Routes[index];
        string unit = Report.Property.CanonicalUnit().Symbol;
        var lines = new List<string> { $"Target: {Report.Target}  ({Report.Property.Code()}, {unit})", "" };
        int n = 1;
        foreach (RouteStep step in route.Steps)
        {
            Measurement? m = _owner.Data.Network.TryGetMeasurement(step.MeasurementId, out Measurement found) ? found : null;
            string measured = Display.ValueWithUncertainty(m?.Value, m?.Uncertainty);
            lines.Add($"{n}. {step.Factor} × {step.MeasurementId}: {Transform(step.Factor)} (measured {measured})");
            if (m is not null)
            {
                lines.Add($"   as measured: {m.Equation}");
            }

            lines.Add($"   as used:     {step.Equation}");
            lines.Add($"   contributes {Display.Number(step.TransformedValue, 2)} {unit}");
            n++;
        }

        lines.Add("");
        if (route.Cancelled is { } cancelled)
        {
            lines.Add(cancelled.Count == 0
                ? "Cancelling intermediates: none"
                : $"Cancelling intermediates: {string.Join(", ", cancelled)} (appear on both sides and drop out)");
        }

        if (route.Sum is { } sum)
        {
            lines.Add($"Sum of the steps: {sum}");
        }

        lines.Add($"Sum of the values: {Display.ValueWithUncertainty(route.Value, route.Uncertainty)} {unit}");
        lines.Add($"Network estimate: {Display.ValueWithUncertainty(Report.NetworkValue, Report.NetworkUncertainty)} {unit}");
        return lines;
    }

    /// <summary>What a factor does to a measured reaction, in words: "as measured", "reversed", "scaled by 2", "reversed and scaled by 1/2".</summary>
    public static string Transform(string factor)
    {
        ArgumentNullException.ThrowIfNull(factor);
        bool reversed = factor.StartsWith('-');
        string size = reversed ? factor[1..] : factor;
        return (reversed, size == "1") switch
        {
            (false, true) => "as measured",
            (true, true) => "reversed",
            (false, false) => $"scaled by {size}",
            (true, false) => $"reversed and scaled by {size}",
        };
    }

    /// <summary>The routes table as shown (for export).</summary>
    public TableSnapshot Snapshot() => new("Routes", Headers, Routes.Select((route, i) => Cells(i, route)).ToArray(), [0, 2]);

    private ChemicalEquation? Validate(string input)
    {
        string text = input.Trim();
        int leading = input.Length - input.TrimStart().Length;
        if (text.Length == 0)
        {
            SetError(null, "type a reaction such as CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l), or one species such as CH4(g)");
            return null;
        }

        ReactionNetwork network = _owner.Data.Network;
        ParseResult<ChemicalEquation> parsed = EquationParser.Parse(text, name =>
            network.FindSpecies(name) is { } known ? ParseResult<Species>.Ok(known) : SpeciesParser.Parse(name));
        if (!parsed.TryGetValue(out ChemicalEquation? equation))
        {
            string hint = parsed.Failure.Hint.Length > 0 ? $" ({parsed.Failure.Hint})" : "";
            SetError(leading + parsed.Failure.Offset, parsed.Failure.Message + hint);
            return null;
        }

        IReadOnlyList<string> imbalances = equation.FindImbalances();
        if (imbalances.Count > 0)
        {
            SetError(null, $"not balanced: {string.Join("; ", imbalances)}");
            return null;
        }

        Species? unknown = equation.Terms
            .Select(term => term.Species)
            .FirstOrDefault(species => network.IndexOf(species) < 0 && !ReferenceStates.HasZeroFormationProperties(species));
        if (unknown is not null)
        {
            int at = input.IndexOf(unknown.Name, StringComparison.Ordinal);
            SetError(at >= 0 ? at : null, $"{unknown.Name} appears in no measurement of this network, so no route can reach it");
            return null;
        }

        Error = "";
        ErrorOffset = null;
        return equation;
    }

    private void SetError(int? offset, string message)
    {
        Error = message;
        ErrorOffset = offset;
    }
}
