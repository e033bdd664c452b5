using System.CommandLine;
using System.Globalization;
using CanopyAdvisor.Core.Plants;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Crops;

namespace CanopyAdvisor.Cli;

/// <summary><c>canopy crops list</c> and <c>canopy crops show ID</c>: the crop library with units, ranges and provenance.</summary>
internal static class CropsCommand
{
    /// <summary>The option that adds the grower's own crop folders to the built-in library (shared with forecast).</summary>
    public static Option<string[]> CropFoldersOption() => new("--crops")
    {
        Description = "A folder of your own crop files (*.toml) and variants, added to the built-in library; may be given more than once.",
        AllowMultipleArgumentsPerToken = false,
    };

    public static CropLibrary Load(string[]? folders) => CropLibrary.Load(folders ?? []);

    public static Command Create(TextWriter output)
    {
        Option<string[]> foldersForList = CropFoldersOption();
        var list = new Command("list", "List the crops and variants in the library.") { foldersForList };
        list.SetAction(parse =>
        {
            CropLibrary library = Load(parse.GetValue(foldersForList));
            var table = new TextTable("id", "name", "group", "variant of");
            foreach (Crop crop in library.All)
            {
                table.Add(crop.Id, crop.Name, crop.Group.ToString(), crop.BaseId ?? "");
            }

            output.Write(table.ToString());
            foreach (string note in library.Notes)
            {
                output.WriteLine($"note: {note}");
            }

            return 0;
        });

        Option<string[]> foldersForShow = CropFoldersOption();
        var id = new Argument<string>("id") { Description = "Crop or variant id, as listed by 'canopy crops list'." };
        var show = new Command("show", "Show one crop's parameters with unit, range and provenance.") { id, foldersForShow };
        show.SetAction(parse =>
        {
            CropLibrary library = Load(parse.GetValue(foldersForShow));
            string key = parse.GetValue(id)!;
            if (!library.TryGet(key, out Crop? crop))
            {
                throw new InvalidInputException("id", $"unknown crop '{key}'; 'canopy crops list' shows the library");
            }

            output.WriteLine($"{crop.Name} ({crop.Id}), {crop.Group}{(crop.BaseId is null ? "" : $", variant of {crop.BaseId}")}");
            var table = new TextTable("parameter", ">value", "unit", "range", "source");
            foreach (string parameter in CropConversions.ParameterKeys)
            {
                CropParameter p = crop.GetParameter(parameter);
                table.Add(parameter, Number(p.Value), p.Unit, $"{Number(p.Minimum)}–{Number(p.Maximum)}", p.Provenance);
            }

            output.Write(table.ToString());
            return 0;
        });

        return new Command("crops", "The crop library: parameters of the lean and stretch model per crop.") { list, show };
    }

    private static string Number(double value) => value.ToString("0.####", CultureInfo.InvariantCulture);
}
