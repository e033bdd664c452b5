using System.Collections.Immutable;
using System.Globalization;
using CanopyAdvisor.Core.Advice.Labour;
using CanopyAdvisor.Core.Geometry;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Validation;
using NodaTime;
using NodaTime.Text;

namespace CanopyAdvisor.Core.Sites;

/// <summary>Checks a site for values out of range and for parts that do not fit together, reporting every problem.</summary>
/// <remarks>
/// <para>
/// Two kinds of check: the range of each value (sizes &gt; 0, fractions in [0, 1], latitude within ±90°, …) and the
/// geometry of the parts together (benches inside the structure and under its gutters or ceiling, lamps inside
/// the structure and outside every canopy, benches apart, bays filling the structure's width, unique ids), plus the crop
/// lots against their benches and dates, the temperature setpoints, the tariff and the labour settings
/// (<see cref="LabourValidator.CheckSettings"/>). Paths use the site
/// file's names (see <see cref="SitePaths"/>). The same problem reported for several lamps that share a type or
/// several surfaces that share a cover is listed once.
/// </para>
/// <para>
/// Lamps must hang inside the structure (decided here, documented in the site file reference): the light model
/// passes lamp light to the benches without any cover in between, so a lamp outside a glasshouse would shine
/// through the glass with no loss and one above an indoor room's ceiling would shine through it. Side lamps hang
/// inside, next to a wall. The check allows <see cref="GeometryToleranceM"/> of slack.
/// </para>
/// <para>Pure and thread-safe.</para>
/// </remarks>
public static class SiteValidator
{
    /// <summary>Slack allowed in geometric checks (containment, bays filling the width), 0.01 m.</summary>
    public const double GeometryToleranceM = 0.01;

    /// <summary>Largest allowed difference of blue + green + red from 1, 0.01.</summary>
    public const double BandSumTolerance = 0.01;

    /// <summary>Fewest sample points along each side of a bench, 1.</summary>
    public const int MinSamplesPerSide = 1;

    /// <summary>Most sample points along each side of a bench, 400 (keeps a bench to at most 160,000 points).</summary>
    public const int MaxSamplesPerSide = 400;

    /// <summary>Lowest allowed site elevation, −500 m (the lowest dry land, by the Dead Sea, is about −430 m; from memory).</summary>
    public const double MinElevationM = -500;

    /// <summary>Highest allowed site elevation, 9,000 m (above the highest summit).</summary>
    public const double MaxElevationM = 9000;

    /// <summary>
    /// Smallest Linke turbidity, 1: the value of a clean, dry (Rayleigh-only) atmosphere by the definition of the
    /// Linke turbidity factor (Ineichen &amp; Perez 2002).
    /// </summary>
    public const double MinLinkeTurbidity = 1;

    /// <summary>Largest Linke turbidity accepted, 10 (very hazy air is about 6–7; from memory).</summary>
    public const double MaxLinkeTurbidity = 10;

    /// <summary>Lowest temperature setpoint accepted, −10 °C.</summary>
    public const double MinSetpointC = -10;

    /// <summary>The highest electricity price accepted, per kWh in the tariff's currency (a guard against unit slips).</summary>
    public const double MaxPricePerKWh = 100;

    /// <summary>Highest temperature setpoint accepted, 45 °C.</summary>
    public const double MaxSetpointC = 45;

    /// <summary>Most the night setpoint may exceed the day setpoint, 10 °C (a negative DIF deeper than this is not a setting in use).</summary>
    public const double MaxNightAboveDayC = 10;

    /// <summary>Deepest pre-dawn drop accepted, 15 °C.</summary>
    public const double MaxPreDawnDropC = 15;

    /// <summary>Longest pre-dawn drop accepted, 12 h.</summary>
    public const double MaxPreDawnDropHours = 12;

    /// <summary>Tallest plant height accepted, 3,000 mm (exclusive).</summary>
    public const double MaxLotHeightMm = 3000;

    /// <summary>Widest pot spacing accepted, 5 m (exclusive).</summary>
    public const double MaxLotSpacingM = 5;

    /// <summary>
    /// How far the pots' square cells (pots × spacing²) may exceed the bench area, as a factor: 1.05, which allows
    /// pots overhanging the bench edge a little (common practice).
    /// </summary>
    public const double PotsFitFactor = 1.05;

    /// <summary>The glasshouse surface names, in the order they appear in the site file.</summary>
    public static IReadOnlyList<string> GlasshouseSurfaces { get; } = ["roof", "leftWall", "rightWall", "frontWall", "backWall"];

    /// <summary>Validates a site built in code, with the default paths (<see cref="SitePaths.Default"/>).</summary>
    /// <returns>Every problem found; empty when the site is sound.</returns>
    public static IReadOnlyList<ValidationError> Validate(Site site) => Validate(site, SitePaths.Default);

    /// <summary>Validates a site, naming its parts with the given paths.</summary>
    /// <returns>Every problem found, each once; empty when the site is sound.</returns>
    public static IReadOnlyList<ValidationError> Validate(Site site, SitePaths paths)
    {
        ArgumentNullException.ThrowIfNull(site);
        ArgumentNullException.ThrowIfNull(paths);
        var errors = new List<ValidationError>();

        if (string.IsNullOrWhiteSpace(site.Id))
        {
            errors.Add(new("id", "must not be empty"));
        }

        if (string.IsNullOrWhiteSpace(site.Name))
        {
            errors.Add(new("name", "must not be empty"));
        }

        errors.AddRange(CheckLocation(site.Location, "location"));
        errors.AddRange(CheckWeather(site.Weather, "weather"));
        errors.AddRange(CheckStructure(site.Structure, "structure", paths.Cover));

        for (int i = 0; i < site.Benches.Length; i++)
        {
            errors.AddRange(CheckBench(site.Benches[i], paths.Bench(i)));
            errors.AddRange(CheckBenchFits(site.Benches[i], paths.Bench(i), site.Structure));
        }

        errors.AddRange(CheckBenchesApart(site.Benches, paths.Bench));

        for (int i = 0; i < site.Lamps.Length; i++)
        {
            Lamp lamp = site.Lamps[i];
            errors.AddRange(CheckLampOutput(lamp.PpfMicromolesPerSecond, lamp.Watts, lamp.Bands, paths.LampType(i)));
            errors.AddRange(CheckLampSettings(lamp, paths.Lamp(i)));
            errors.AddRange(CheckLampPlace(lamp, paths.Lamp(i), site.Structure, site.Benches));
        }

        for (int i = 0; i < site.Obstructions.Length; i++)
        {
            errors.AddRange(CheckObstruction(site.Obstructions[i], paths.Obstruction(i)));
        }

        errors.AddRange(CheckUniqueIds(site.Benches.Select(b => b.Id), paths.Bench, "bench"));
        errors.AddRange(CheckUniqueIds(site.Lamps.Select(l => l.Id), paths.Lamp, "lamp"));
        errors.AddRange(CheckUniqueIds(site.Obstructions.Select(o => o.Id), paths.Obstruction, "obstruction"));

        errors.AddRange(CheckTemperatures(site.Temperatures, "temperatures"));
        errors.AddRange(CheckTariff(site.Tariff, "tariff"));
        errors.AddRange(LabourValidator.CheckSettings(site.Labour, "labour"));
        for (int i = 0; i < site.Lots.Length; i++)
        {
            errors.AddRange(CheckLot(site.Lots[i], LotPath(i), site.Benches, site.Zone));
        }

        errors.AddRange(CheckUniqueIds(site.Lots.Select(l => l.Id), LotPath, "lot"));
        errors.AddRange(CheckOneLotPerBench(site.Lots, LotPath));

        return errors.Distinct().ToList();
    }

    /// <summary>Latitude within [−90°, 90°], longitude within [−180°, 180°], elevation within [−500, 9000] m.</summary>
    public static IEnumerable<ValidationError> CheckLocation(GeoLocation location, string path)
    {
        ArgumentNullException.ThrowIfNull(location);
        return Collect(
            Within(location.Latitude.Degrees, -90, 90, $"{path}.latitudeDeg"),
            Within(location.Longitude.Degrees, -180, 180, $"{path}.longitudeDeg"),
            Within(location.ElevationM, MinElevationM, MaxElevationM, $"{path}.elevationM"));
    }

    /// <summary>Linke turbidity within [1, 10]; daily clearness within (0, 1].</summary>
    public static IEnumerable<ValidationError> CheckWeather(WeatherSettings weather, string path)
    {
        ArgumentNullException.ThrowIfNull(weather);
        return Collect(
            Within(weather.LinkeTurbidity, MinLinkeTurbidity, MaxLinkeTurbidity, $"{path}.linkeTurbidity"),
            weather.DailyClearness > 0 && weather.DailyClearness <= 1
                ? null
                : new ValidationError($"{path}.dailyClearness", $"must be within (0, 1], got {Format(weather.DailyClearness)}"));
    }

    /// <summary>Sizes of a glasshouse or indoor room, its covers, and that the bays fill the glasshouse's width.</summary>
    /// <param name="structure">The structure.</param>
    /// <param name="path">Path of the structure, usually <c>structure</c>.</param>
    /// <param name="coverPath">Path prefix of the cover of a glasshouse surface, by surface name.</param>
    public static IEnumerable<ValidationError> CheckStructure(Structure structure, string path, Func<string, string> coverPath)
    {
        ArgumentNullException.ThrowIfNull(structure);
        ArgumentNullException.ThrowIfNull(coverPath);
        var errors = new List<ValidationError>();
        switch (structure)
        {
            case Glasshouse g:
                errors.AddRange(CheckFootprint(g.Footprint, $"{path}.footprint"));
                if (g.BayCount < 1)
                {
                    errors.Add(new($"{path}.bayCount", $"must be ≥ 1, got {g.BayCount}"));
                }

                AddIf(errors, Positive(g.BayWidthM, $"{path}.bayWidthM"));
                AddIf(errors, Positive(g.GutterHeightM, $"{path}.gutterHeightM"));
                if (!(g.RoofSlope.Degrees >= 0 && g.RoofSlope.Degrees < 90))
                {
                    errors.Add(new($"{path}.roofSlopeDeg", $"must be within [0, 90), got {Format(g.RoofSlope.Degrees)}"));
                }

                if (!(g.StructuralShading >= 0 && g.StructuralShading < 1))
                {
                    errors.Add(new($"{path}.structuralShading", $"must be within [0, 1), got {Format(g.StructuralShading)}"));
                }

                double baysWidth = g.BayCount * g.BayWidthM;
                if (g.BayCount >= 1 && g.BayWidthM > 0 && g.Footprint.WidthM > 0
                    && Math.Abs(baysWidth - g.Footprint.WidthM) > GeometryToleranceM)
                {
                    errors.Add(new(
                        $"{path}.bayWidthM",
                        $"bayCount × bayWidthM = {Format(baysWidth)} m must equal footprint.widthM = {Format(g.Footprint.WidthM)} m (±{Format(GeometryToleranceM)} m)"));
                }

                Cover[] covers = [g.Roof, g.LeftWall, g.RightWall, g.FrontWall, g.BackWall];
                for (int i = 0; i < covers.Length; i++)
                {
                    errors.AddRange(CheckCover(covers[i], coverPath(GlasshouseSurfaces[i])));
                }

                break;
            case IndoorRoom room:
                errors.AddRange(CheckFootprint(room.Footprint, $"{path}.footprint"));
                AddIf(errors, Positive(room.HeightM, $"{path}.heightM"));
                break;
            default:
                errors.Add(new(path, $"unknown structure kind {structure.GetType().Name}"));
                break;
        }

        return errors;
    }

    /// <summary>A cover: opaque, or refractive index ≥ 1, extinction ≥ 0, thickness &gt; 0 and at least one layer.</summary>
    public static IEnumerable<ValidationError> CheckCover(Cover cover, string path)
    {
        ArgumentNullException.ThrowIfNull(cover);
        if (cover.Opaque)
        {
            return [];
        }

        return Collect(
            cover.RefractiveIndex >= 1 ? null : new ValidationError($"{path}.refractiveIndex", $"must be ≥ 1, got {Format(cover.RefractiveIndex)}"),
            cover.ExtinctionPerM >= 0 ? null : new ValidationError($"{path}.extinctionPerM", $"must be ≥ 0, got {Format(cover.ExtinctionPerM)}"),
            Positive(cover.ThicknessM, $"{path}.thicknessM"),
            cover.Layers >= 1 ? null : new ValidationError($"{path}.layers", $"must be ≥ 1 for a cover that is not opaque, got {cover.Layers}"));
    }

    /// <summary>A bench on its own: id, sizes, canopy and sample counts.</summary>
    public static IEnumerable<ValidationError> CheckBench(Bench bench, string path)
    {
        ArgumentNullException.ThrowIfNull(bench);
        var errors = new List<ValidationError>();
        if (string.IsNullOrWhiteSpace(bench.Id))
        {
            errors.Add(new($"{path}.id", "must not be empty"));
        }

        errors.AddRange(CheckFootprint(bench.Footprint, $"{path}.footprint"));
        AddIf(errors, NotNegative(bench.SurfaceHeightM, $"{path}.surfaceHeightM"));
        AddIf(errors, Positive(bench.Canopy.HeightM, $"{path}.canopy.heightM"));
        AddIf(errors, NotNegative(bench.Canopy.SensingDepthM, $"{path}.canopy.sensingDepthM"));
        if (bench.Canopy.SensingDepthM > bench.Canopy.HeightM && bench.Canopy.HeightM > 0)
        {
            errors.Add(new(
                $"{path}.canopy.sensingDepthM",
                $"must be ≤ canopy.heightM = {Format(bench.Canopy.HeightM)} m, got {Format(bench.Canopy.SensingDepthM)} m"));
        }

        AddIf(errors, NotNegative(bench.Canopy.LeafAreaDensityM2PerM3, $"{path}.canopy.leafAreaDensityM2PerM3"));
        AddIf(errors, SampleCount(bench.SamplesAlongLength, $"{path}.samplesAlongLength"));
        AddIf(errors, SampleCount(bench.SamplesAcrossWidth, $"{path}.samplesAcrossWidth"));
        return errors;
    }

    /// <summary>A bench against its structure: inside the footprint, and its canopy top under the gutters or ceiling.</summary>
    public static IEnumerable<ValidationError> CheckBenchFits(Bench bench, string path, Structure structure)
    {
        ArgumentNullException.ThrowIfNull(bench);
        ArgumentNullException.ThrowIfNull(structure);
        var errors = new List<ValidationError>();
        (Footprint outer, double ceilingM, string ceilingName) = structure switch
        {
            Glasshouse g => (g.Footprint, g.GutterHeightM, "structure.gutterHeightM"),
            IndoorRoom r => (r.Footprint, r.HeightM, "structure.heightM"),
            _ => (null!, 0.0, string.Empty),
        };
        if (outer is null)
        {
            return errors;
        }

        if (!Corners(bench.Footprint).All(c => outer.Contains(c, GeometryToleranceM)))
        {
            errors.Add(new($"{path}.footprint", $"bench '{bench.Id}' reaches outside the structure's footprint"));
        }

        double topM = bench.SurfaceHeightM + bench.Canopy.HeightM;
        if (topM > ceilingM + GeometryToleranceM)
        {
            errors.Add(new(
                $"{path}.canopy.heightM",
                $"bench top + canopy = {Format(topM)} m is above {ceilingName} = {Format(ceilingM)} m"));
        }

        return errors;
    }

    /// <summary>
    /// No two benches take up the same space: benches whose footprints overlap by more than
    /// <see cref="GeometryToleranceM"/> must be at different heights (rack tiers), with one's canopy top at or below
    /// the other's surface.
    /// </summary>
    public static IEnumerable<ValidationError> CheckBenchesApart(IReadOnlyList<Bench> benches, Func<int, string> path)
    {
        ArgumentNullException.ThrowIfNull(benches);
        ArgumentNullException.ThrowIfNull(path);
        for (int j = 1; j < benches.Count; j++)
        {
            for (int i = 0; i < j; i++)
            {
                Bench a = benches[i];
                Bench b = benches[j];
                bool apartInHeight = a.SurfaceHeightM + a.Canopy.HeightM <= b.SurfaceHeightM + GeometryToleranceM
                    || b.SurfaceHeightM + b.Canopy.HeightM <= a.SurfaceHeightM + GeometryToleranceM;
                if (!apartInHeight && FootprintsOverlap(a.Footprint, b.Footprint, GeometryToleranceM))
                {
                    yield return new($"{path(j)}.footprint", $"bench '{b.Id}' overlaps bench '{a.Id}' ({path(i)}) at the same height");
                }
            }
        }
    }

    /// <summary>The photon output of a lamp (or lamp type): PPF &gt; 0, watts ≥ 0, bands ≥ 0 with blue + green + red = 1 (±0.01).</summary>
    public static IEnumerable<ValidationError> CheckLampOutput(double ppfMicromolesPerSecond, double watts, BandFractions bands, string path)
    {
        ArgumentNullException.ThrowIfNull(bands);
        var errors = new List<ValidationError>();
        AddIf(errors, Positive(ppfMicromolesPerSecond, $"{path}.ppfUmolPerS"));
        AddIf(errors, NotNegative(watts, $"{path}.watts"));
        AddIf(errors, NotNegative(bands.Blue, $"{path}.bands.blue"));
        AddIf(errors, NotNegative(bands.Green, $"{path}.bands.green"));
        AddIf(errors, NotNegative(bands.Red, $"{path}.bands.red"));
        AddIf(errors, NotNegative(bands.FarRed, $"{path}.bands.farRed"));
        double sum = bands.Blue + bands.Green + bands.Red;
        if (Math.Abs(sum - 1) > BandSumTolerance)
        {
            errors.Add(new($"{path}.bands", $"blue + green + red must be 1 (±{Format(BandSumTolerance)}), got {Format(sum)}"));
        }

        return errors;
    }

    /// <summary>A lamp's own settings: id, dimming within [0, 1], tilt within [0°, 180°], daylight threshold ≥ 0.</summary>
    public static IEnumerable<ValidationError> CheckLampSettings(Lamp lamp, string path)
    {
        ArgumentNullException.ThrowIfNull(lamp);
        var errors = new List<ValidationError>();
        if (string.IsNullOrWhiteSpace(lamp.Id))
        {
            errors.Add(new($"{path}.id", "must not be empty"));
        }

        AddIf(errors, Within(lamp.Dimming, 0, 1, $"{path}.dimming"));
        AddIf(errors, Within(lamp.Aim.Tilt.Degrees, 0, 180, $"{path}.aim.tiltDeg"));
        if (lamp.Schedule.OffAboveOutsidePpfd is double threshold)
        {
            AddIf(errors, NotNegative(threshold, $"{path}.schedule.offAboveOutsidePpfd"));
        }

        return errors;
    }

    /// <summary>A lamp against the structure and benches: inside the structure, and not inside any bench's canopy.</summary>
    public static IEnumerable<ValidationError> CheckLampPlace(Lamp lamp, string path, Structure structure, IReadOnlyList<Bench> benches)
    {
        ArgumentNullException.ThrowIfNull(lamp);
        ArgumentNullException.ThrowIfNull(structure);
        ArgumentNullException.ThrowIfNull(benches);
        var errors = new List<ValidationError>();
        Vector3 p = lamp.Position;
        string where = $"lamp '{lamp.Id}' at ({Format(p.X)}, {Format(p.Y)}, {Format(p.Z)}) m";
        double? ceilingM = structure switch
        {
            Glasshouse g when g.Footprint.Contains(p, GeometryToleranceM) => RoofHeightM(g, p),
            IndoorRoom r when r.Footprint.Contains(p, GeometryToleranceM) => r.HeightM,
            _ => null,
        };
        // A structure of a kind this validator does not know cannot be checked against; CheckStructure reports it.
        if (structure is Glasshouse or IndoorRoom)
        {
            if (ceilingM is null)
            {
                errors.Add(new(path, $"{where} is outside the structure's footprint; lamps must hang inside the structure"));
            }
            else if (p.Z < -GeometryToleranceM || p.Z > ceilingM + GeometryToleranceM)
            {
                errors.Add(new(path, $"{where} is not between the floor and the {(structure is Glasshouse ? "roof" : "ceiling")} ({Format(ceilingM.Value)} m there)"));
            }
        }

        foreach (Bench bench in benches)
        {
            double bottom = bench.SurfaceHeightM;
            double top = bench.SurfaceHeightM + bench.Canopy.HeightM;
            if (bench.Footprint.Contains(p, 0) && p.Z >= bottom && p.Z <= top)
            {
                errors.Add(new(path, $"{where} is inside the canopy of bench '{bench.Id}' ({Format(bottom)}–{Format(top)} m)"));
            }
        }

        return errors;
    }

    /// <summary>An obstruction: id, footprint sizes, base ≥ 0 and top above base.</summary>
    public static IEnumerable<ValidationError> CheckObstruction(Obstruction obstruction, string path)
    {
        ArgumentNullException.ThrowIfNull(obstruction);
        var errors = new List<ValidationError>();
        if (string.IsNullOrWhiteSpace(obstruction.Id))
        {
            errors.Add(new($"{path}.id", "must not be empty"));
        }

        errors.AddRange(CheckFootprint(obstruction.Footprint, $"{path}.footprint"));
        AddIf(errors, NotNegative(obstruction.BaseHeightM, $"{path}.baseHeightM"));
        if (!(obstruction.TopHeightM > obstruction.BaseHeightM))
        {
            errors.Add(new(
                $"{path}.topHeightM",
                $"must be above baseHeightM = {Format(obstruction.BaseHeightM)} m, got {Format(obstruction.TopHeightM)} m"));
        }

        return errors;
    }

    /// <summary>A footprint: length and width &gt; 0.</summary>
    public static IEnumerable<ValidationError> CheckFootprint(Footprint footprint, string path)
    {
        ArgumentNullException.ThrowIfNull(footprint);
        return Collect(Positive(footprint.LengthM, $"{path}.lengthM"), Positive(footprint.WidthM, $"{path}.widthM"));
    }

    /// <summary>The path of the lot at an index of <see cref="Site.Lots"/>: <c>lots[i]</c> (the same in code and in the site file).</summary>
    public static string LotPath(int index) => string.Create(CultureInfo.InvariantCulture, $"lots[{index}]");

    /// <summary>
    /// Temperature setpoints: day, night within [−10, 45] °C; night at most 10 °C above day; pre-dawn drop within
    /// [0, 15] °C; its length within [0, 12] h.
    /// </summary>
    public static IEnumerable<ValidationError> CheckTemperatures(TemperatureSetpoints temperatures, string path)
    {
        ArgumentNullException.ThrowIfNull(temperatures);
        var errors = Collect(
            Within(temperatures.DayC, MinSetpointC, MaxSetpointC, $"{path}.dayC"),
            Within(temperatures.NightC, MinSetpointC, MaxSetpointC, $"{path}.nightC"),
            Within(temperatures.PreDawnDropC, 0, MaxPreDawnDropC, $"{path}.preDawnDropC"),
            Within(temperatures.PreDawnDropHours, 0, MaxPreDawnDropHours, $"{path}.preDawnDropHours"));
        if (temperatures.NightC > temperatures.DayC + MaxNightAboveDayC)
        {
            errors.Add(new(
                $"{path}.nightC",
                $"must be at most {Format(MaxNightAboveDayC)} °C above dayC = {Format(temperatures.DayC)} °C, got {Format(temperatures.NightC)} °C"));
        }

        return errors;
    }

    /// <summary>A tariff: a finite price per kWh within [0, 100] and a currency of three capital letters (ISO 4217 form).</summary>
    public static IEnumerable<ValidationError> CheckTariff(EnergyTariff tariff, string path)
    {
        ArgumentNullException.ThrowIfNull(tariff);
        var errors = Collect(Within(tariff.PricePerKWh, 0, MaxPricePerKWh, $"{path}.pricePerKWh"));
        if (tariff.Currency is null || tariff.Currency.Length != 3 || !tariff.Currency.All(char.IsAsciiLetterUpper))
        {
            errors.Add(new($"{path}.currency", $"must be an ISO 4217 code of three capital letters (e.g. EUR), got '{tariff.Currency}'"));
        }

        return errors;
    }

    /// <summary>
    /// A lot on its own and against its bench: id, crop id of <c>[a-z0-9-/]</c>, bench known, saleOn after plantedOn,
    /// measuredOn within [plantedOn, saleOn], height within (0, 3000) mm, spacing within (0, 5) m, pots ≥ 1 and fitting
    /// the bench (pots × spacing² ≤ bench area × 1.05), rotations in time order, each from the start of plantedOn to
    /// the end of measuredOn (local days in <paramref name="zone"/>; later ones are planned, not done), each angle
    /// within (−360°, 360°) and not 0.
    /// </summary>
    /// <param name="lot">The lot.</param>
    /// <param name="path">Path of the lot, e.g. <c>lots[2]</c>.</param>
    /// <param name="benches">The site's benches (the lot's bench is looked up by id).</param>
    /// <param name="zone">The site's time zone, in which the lot's dates are local.</param>
    public static IEnumerable<ValidationError> CheckLot(Lot lot, string path, IReadOnlyList<Bench> benches, DateTimeZone zone)
    {
        ArgumentNullException.ThrowIfNull(lot);
        ArgumentNullException.ThrowIfNull(benches);
        ArgumentNullException.ThrowIfNull(zone);
        var errors = new List<ValidationError>();
        if (string.IsNullOrWhiteSpace(lot.Id))
        {
            errors.Add(new($"{path}.id", "must not be empty"));
        }

        if (string.IsNullOrEmpty(lot.CropId) || !lot.CropId.All(c => c is (>= 'a' and <= 'z') or (>= '0' and <= '9') or '-' or '/'))
        {
            errors.Add(new($"{path}.crop", $"must be a crop id of lower-case letters, digits, '-' and '/' (e.g. \"petunia-compact\"), got '{lot.CropId}'"));
        }

        Bench? bench = benches.FirstOrDefault(b => string.Equals(b.Id, lot.BenchId, StringComparison.Ordinal));
        if (bench is null)
        {
            string known = benches.Count == 0 ? "no benches defined" : "benches: " + string.Join(", ", benches.Select(b => b.Id));
            errors.Add(new($"{path}.benchId", $"unknown bench '{lot.BenchId}' ({known})"));
        }

        bool datesOrdered = lot.SaleOn > lot.PlantedOn;
        if (!datesOrdered)
        {
            errors.Add(new($"{path}.saleOn", $"must be after plantedOn ({IsoDate(lot.PlantedOn)}), got {IsoDate(lot.SaleOn)}"));
        }
        else if (lot.MeasuredOn < lot.PlantedOn || lot.MeasuredOn > lot.SaleOn)
        {
            errors.Add(new(
                $"{path}.measuredOn",
                $"must be within [plantedOn, saleOn] = [{IsoDate(lot.PlantedOn)}, {IsoDate(lot.SaleOn)}], got {IsoDate(lot.MeasuredOn)}"));
        }

        if (!(lot.HeightMm > 0 && lot.HeightMm < MaxLotHeightMm))
        {
            errors.Add(new($"{path}.heightMm", $"must be within (0, {Format(MaxLotHeightMm)}) mm, got {Format(lot.HeightMm)}"));
        }

        bool spacingOk = lot.SpacingM > 0 && lot.SpacingM < MaxLotSpacingM;
        if (!spacingOk)
        {
            errors.Add(new($"{path}.spacingM", $"must be within (0, {Format(MaxLotSpacingM)}) m, got {Format(lot.SpacingM)}"));
        }

        if (lot.Pots < 1)
        {
            errors.Add(new($"{path}.pots", $"must be ≥ 1, got {lot.Pots}"));
        }
        else if (bench is not null && spacingOk && bench.Footprint.LengthM > 0 && bench.Footprint.WidthM > 0)
        {
            double needM2 = lot.Pots * lot.SpacingM * lot.SpacingM;
            double areaM2 = bench.Footprint.LengthM * bench.Footprint.WidthM;
            // A relative slack of 1e-9 keeps a count exactly at the limit (1680 × 0.15² = 36 × 1.05) from failing on rounding.
            if (needM2 > areaM2 * PotsFitFactor * (1 + 1e-9))
            {
                int most = (int)Math.Floor((areaM2 * PotsFitFactor / (lot.SpacingM * lot.SpacingM)) + 1e-6);
                errors.Add(new(
                    $"{path}.pots",
                    $"{lot.Pots} pots at {Format(lot.SpacingM)} m spacing need {Format(needM2)} m², more than bench '{bench.Id}' holds "
                    + $"({Format(areaM2)} m² × {Format(PotsFitFactor)} = {Format(areaM2 * PotsFitFactor)} m², at most {most} pots)"));
            }
        }

        Instant? from = datesOrdered ? lot.PlantedOn.AtStartOfDayInZone(zone).ToInstant() : null;
        Instant? until = !datesOrdered ? null
            : lot.MeasuredOn < LocalDate.MaxIsoValue ? lot.MeasuredOn.PlusDays(1).AtStartOfDayInZone(zone).ToInstant()
            : Instant.MaxValue;
        ImmutableArray<RotationRecord> rotations = lot.Rotations.IsDefault ? [] : lot.Rotations;
        for (int r = 0; r < rotations.Length; r++)
        {
            RotationRecord rotation = rotations[r];
            string rp = string.Create(CultureInfo.InvariantCulture, $"{path}.rotations[{r}]");
            if (r > 0 && rotation.At < rotations[r - 1].At)
            {
                errors.Add(new($"{rp}.at", $"must not be before rotations[{r - 1}] ({IsoInstant(rotation.At)} is before {IsoInstant(rotations[r - 1].At)}); list rotations in time order"));
            }

            if (from is Instant f && rotation.At < f)
            {
                errors.Add(new($"{rp}.at", $"{IsoInstant(rotation.At)} is before the lot was planted ({IsoDate(lot.PlantedOn)})"));
            }
            else if (until is Instant u && rotation.At >= u && lot.MeasuredOn >= lot.PlantedOn && lot.MeasuredOn <= lot.SaleOn)
            {
                errors.Add(new(
                    $"{rp}.at",
                    $"{IsoInstant(rotation.At)} is after measuredOn ({IsoDate(lot.MeasuredOn)}): list only rotations already done; planned ones come from the rotation calendar"));
            }

            double deg = rotation.Angle.Degrees;
            if (!(deg > -360 && deg < 360) || deg == 0)
            {
                errors.Add(new($"{rp}.angleDeg", $"must be within (−360, 360) and not 0, got {Format(deg)}"));
            }
        }

        return errors;
    }

    /// <summary>At most one lot per bench: a second lot on a bench is an error at its <c>benchId</c>.</summary>
    public static IEnumerable<ValidationError> CheckOneLotPerBench(IReadOnlyList<Lot> lots, Func<int, string> path)
    {
        ArgumentNullException.ThrowIfNull(lots);
        ArgumentNullException.ThrowIfNull(path);
        var seen = new Dictionary<string, int>(StringComparer.Ordinal);
        for (int i = 0; i < lots.Count; i++)
        {
            string benchId = lots[i].BenchId;
            if (string.IsNullOrEmpty(benchId))
            {
                continue;
            }

            if (seen.TryGetValue(benchId, out int first))
            {
                yield return new($"{path(i)}.benchId", $"bench '{benchId}' already holds lot '{lots[first].Id}' ({path(first)}); at most one lot per bench");
            }
            else
            {
                seen[benchId] = i;
            }
        }
    }

    /// <summary>Height of a glasshouse's roof above a point inside its footprint, metres.</summary>
    /// <remarks>Each bay's roof rises symmetrically from the gutters at its sides to the ridge in its middle.</remarks>
    public static double RoofHeightM(Glasshouse glasshouse, Vector3 point)
    {
        ArgumentNullException.ThrowIfNull(glasshouse);
        Footprint f = glasshouse.Footprint;
        Vector3 d = point - f.Corner;
        double across = Math.Clamp((d.X * f.WidthDirection.X) + (d.Y * f.WidthDirection.Y), 0, f.WidthM);
        if (glasshouse.BayWidthM <= 0)
        {
            return glasshouse.GutterHeightM;
        }

        double inBay = across - (Math.Floor(across / glasshouse.BayWidthM) * glasshouse.BayWidthM);
        double fromGutter = Math.Min(inBay, glasshouse.BayWidthM - inBay);
        return glasshouse.GutterHeightM + (fromGutter * glasshouse.RoofSlope.Tan());
    }

    private static IEnumerable<ValidationError> CheckUniqueIds(IEnumerable<string> ids, Func<int, string> path, string kind)
    {
        var seen = new Dictionary<string, int>(StringComparer.Ordinal);
        int i = 0;
        foreach (string id in ids)
        {
            if (!string.IsNullOrEmpty(id))
            {
                if (seen.TryGetValue(id, out int first))
                {
                    yield return new($"{path(i)}.id", $"duplicate {kind} id '{id}' (first used at {path(first)})");
                }
                else
                {
                    seen[id] = i;
                }
            }

            i++;
        }
    }

    /// <summary>
    /// Whether two rectangles overlap by more than a tolerance, by the separating axis theorem: convex shapes are
    /// disjoint exactly when their projections onto some edge normal do not overlap (for rectangles, 4 axes).
    /// </summary>
    private static bool FootprintsOverlap(Footprint a, Footprint b, double toleranceM)
    {
        Vector3[] ca = Corners(a);
        Vector3[] cb = Corners(b);
        foreach (Vector3 axis in new[] { a.AxisDirection, a.WidthDirection, b.AxisDirection, b.WidthDirection })
        {
            (double minA, double maxA) = Project(ca, axis);
            (double minB, double maxB) = Project(cb, axis);
            if (maxA <= minB + toleranceM || maxB <= minA + toleranceM)
            {
                return false;
            }
        }

        return true;
    }

    private static (double Min, double Max) Project(Vector3[] corners, Vector3 axis)
    {
        double min = double.PositiveInfinity;
        double max = double.NegativeInfinity;
        foreach (Vector3 c in corners)
        {
            double d = Vector3.Dot(c, axis);
            min = Math.Min(min, d);
            max = Math.Max(max, d);
        }

        return (min, max);
    }

    private static Vector3[] Corners(Footprint f) =>
    [
        f.Corner,
        f.Corner + (f.AxisDirection * f.LengthM),
        f.Corner + (f.WidthDirection * f.WidthM),
        f.Corner + (f.AxisDirection * f.LengthM) + (f.WidthDirection * f.WidthM),
    ];

    private static ValidationError? Positive(double value, string path) =>
        value > 0 ? null : new ValidationError(path, $"must be > 0, got {Format(value)}");

    private static ValidationError? NotNegative(double value, string path) =>
        value >= 0 ? null : new ValidationError(path, $"must be ≥ 0, got {Format(value)}");

    private static ValidationError? Within(double value, double min, double max, string path) =>
        value >= min && value <= max ? null : new ValidationError(path, $"must be within [{Format(min)}, {Format(max)}], got {Format(value)}");

    private static ValidationError? SampleCount(int value, string path) =>
        value is >= MinSamplesPerSide and <= MaxSamplesPerSide
            ? null
            : new ValidationError(path, $"must be within [{MinSamplesPerSide}, {MaxSamplesPerSide}], got {value}");

    private static void AddIf(List<ValidationError> errors, ValidationError? error)
    {
        if (error is not null)
        {
            errors.Add(error);
        }
    }

    private static List<ValidationError> Collect(params ValidationError?[] errors) =>
        errors.Where(e => e is not null).Select(e => e!).ToList();

    private static string IsoInstant(Instant instant) => InstantPattern.General.Format(instant);

    private static string IsoDate(LocalDate date) => LocalDatePattern.Iso.Format(date);

    private static string Format(double value) => value.ToString("0.####", CultureInfo.InvariantCulture);
}
