using System.Collections.Immutable;
using System.Globalization;
using CanopyAdvisor.Core.Glazing;
using CanopyAdvisor.Core.Sites;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Structures;

/// <summary>Builds the <see cref="IEnclosure"/> of a site: a <see cref="GlasshouseEnclosure"/> or an <see cref="IndoorEnclosure"/>.</summary>
/// <remarks>
/// Input is checked first and every problem is reported at once (<see cref="InvalidInputException"/>); nothing is
/// built from invalid input. Error paths use the site file's field names (<c>structure.bayWidthM</c>,
/// <c>obstructions[2].topHeightM</c>).
/// </remarks>
public static class EnclosureBuilder
{
    // Footprint width must equal bayCount × bayWidthM to this relative tolerance.
    private const double WidthRelativeTolerance = 1e-6;

    // More bays than this is not a glasshouse range but an input error (and keeps the per-ray stack buffer small).
    private const int MaximumBayCount = 500;

    /// <summary>Builds the enclosure of a site from its structure and obstructions.</summary>
    /// <param name="site">The site.</param>
    /// <returns>The enclosure, ready for repeated queries.</returns>
    /// <exception cref="InvalidInputException">The structure or an obstruction is invalid (all problems listed).</exception>
    public static IEnclosure Build(Site site)
    {
        ArgumentNullException.ThrowIfNull(site);
        return Build(site.Structure, site.Obstructions);
    }

    /// <summary>Builds the enclosure of a structure with its obstructions.</summary>
    /// <param name="structure">A <see cref="Glasshouse"/> or an <see cref="IndoorRoom"/>.</param>
    /// <param name="obstructions">Opaque boxes inside or outside the structure (default or empty for none).</param>
    /// <returns>The enclosure, ready for repeated queries.</returns>
    /// <exception cref="InvalidInputException">The structure or an obstruction is invalid (all problems listed).</exception>
    public static IEnclosure Build(Structure structure, ImmutableArray<Obstruction> obstructions)
    {
        IReadOnlyList<ValidationError> errors = Validate(structure, obstructions);
        if (errors.Count > 0)
        {
            throw new InvalidInputException(errors);
        }

        var boxes = new ObstructionBoxes(obstructions);
        return structure switch
        {
            Glasshouse glasshouse => new GlasshouseEnclosure(glasshouse, boxes),
            IndoorRoom room => new IndoorEnclosure(room, boxes),
            _ => throw new InvalidInputException("structure", "unknown structure kind"), // unreachable: Validate rejects it
        };
    }

    /// <summary>Checks a structure and its obstructions without building anything.</summary>
    /// <param name="structure">The structure.</param>
    /// <param name="obstructions">The obstructions (default or empty for none).</param>
    /// <returns>Every problem found; empty when the input can be built.</returns>
    public static IReadOnlyList<ValidationError> Validate(Structure? structure, ImmutableArray<Obstruction> obstructions)
    {
        var errors = new List<ValidationError>();
        switch (structure)
        {
            case null:
                errors.Add(new ValidationError("structure", "is required"));
                break;
            case Glasshouse glasshouse:
                ValidateGlasshouse(glasshouse, errors);
                break;
            case IndoorRoom room:
                ValidateFootprint(room.Footprint, "structure.footprint", errors);
                Positive(room.HeightM, "structure.heightM", errors);
                break;
            default:
                errors.Add(new ValidationError("structure", "unknown structure kind"));
                break;
        }

        if (!obstructions.IsDefault)
        {
            for (int i = 0; i < obstructions.Length; i++)
            {
                string path = "obstructions[" + i.ToString(CultureInfo.InvariantCulture) + "]";
                Obstruction? o = obstructions[i];
                if (o is null)
                {
                    errors.Add(new ValidationError(path, "is required"));
                    continue;
                }

                ValidateFootprint(o.Footprint, path + ".footprint", errors);
                if (!double.IsFinite(o.BaseHeightM))
                {
                    errors.Add(new ValidationError(path + ".baseHeightM", "must be a finite number"));
                }

                if (!double.IsFinite(o.TopHeightM) || !(o.TopHeightM > o.BaseHeightM))
                {
                    errors.Add(new ValidationError(path + ".topHeightM", "must be a finite number above baseHeightM"));
                }
            }
        }

        return errors;
    }

    private static void ValidateGlasshouse(Glasshouse g, List<ValidationError> errors)
    {
        ValidateFootprint(g.Footprint, "structure.footprint", errors);
        if (g.BayCount < 1 || g.BayCount > MaximumBayCount)
        {
            errors.Add(new ValidationError("structure.bayCount", "must be between 1 and " + MaximumBayCount.ToString(CultureInfo.InvariantCulture)));
        }

        bool bayWidthOk = Positive(g.BayWidthM, "structure.bayWidthM", errors);
        Positive(g.GutterHeightM, "structure.gutterHeightM", errors);
        if (!(g.RoofSlope.Degrees >= 0 && g.RoofSlope.Degrees < 90))
        {
            errors.Add(new ValidationError("structure.roofSlopeDeg", "must be at least 0° and below 90°"));
        }

        if (!(g.StructuralShading >= 0 && g.StructuralShading < 1))
        {
            errors.Add(new ValidationError("structure.structuralShading", "must be at least 0 and below 1"));
        }

        if (g.Footprint is not null && bayWidthOk && g.BayCount >= 1 && double.IsFinite(g.Footprint.WidthM))
        {
            double expected = g.BayCount * g.BayWidthM;
            if (Math.Abs(g.Footprint.WidthM - expected) > WidthRelativeTolerance * Math.Max(1, expected))
            {
                errors.Add(new ValidationError(
                    "structure.footprint.widthM",
                    FormattableString.Invariant($"must equal bayCount × bayWidthM = {expected:0.###} m")));
            }
        }

        errors.AddRange(CoverOptics.Validate(g.Roof, "structure.roof"));
        errors.AddRange(CoverOptics.Validate(g.LeftWall, "structure.leftWall"));
        errors.AddRange(CoverOptics.Validate(g.RightWall, "structure.rightWall"));
        errors.AddRange(CoverOptics.Validate(g.FrontWall, "structure.frontWall"));
        errors.AddRange(CoverOptics.Validate(g.BackWall, "structure.backWall"));
    }

    private static void ValidateFootprint(Footprint? footprint, string path, List<ValidationError> errors)
    {
        if (footprint is null)
        {
            errors.Add(new ValidationError(path, "is required"));
            return;
        }

        if (!double.IsFinite(footprint.CornerXM))
        {
            errors.Add(new ValidationError(path + ".cornerXM", "must be a finite number"));
        }

        if (!double.IsFinite(footprint.CornerYM))
        {
            errors.Add(new ValidationError(path + ".cornerYM", "must be a finite number"));
        }

        if (!double.IsFinite(footprint.AxisAzimuth.Radians))
        {
            errors.Add(new ValidationError(path + ".axisAzimuthDeg", "must be a finite number"));
        }

        Positive(footprint.LengthM, path + ".lengthM", errors);
        Positive(footprint.WidthM, path + ".widthM", errors);
    }

    private static bool Positive(double value, string path, List<ValidationError> errors)
    {
        if (double.IsFinite(value) && value > 0)
        {
            return true;
        }

        errors.Add(new ValidationError(path, "must be a finite number > 0"));
        return false;
    }
}
