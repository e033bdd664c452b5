using CanopyAdvisor.Core.Plants;
using NodaTime;

namespace CanopyAdvisor.Core.Tests.Plants;

/// <summary>Crop (file units) to stem parameters (model units), and parameter access by key.</summary>
public class CropConversionsTests
{
    [Fact]
    public void Stem_parameters_convert_mm_hours_and_degrees()
    {
        // SI definitions: 1 m = 1000 mm; 1 h = 3600 s; 180° = π rad.
        StemParameters stem = CropValidatorTests.Sample().ToStemParameters();
        Assert.Equal(3, stem.BalanceNumber);
        Assert.Equal(1.5, stem.ProprioceptiveSensitivity);
        Assert.Equal(0.8, stem.PhotoCoefficient);
        Assert.Equal(0.3, stem.PhotoExponent);
        Assert.Equal(0.020, stem.GrowthZoneLengthM, 12);
        Assert.Equal(Duration.FromSeconds(7200), stem.NutationPeriod);
        Assert.Equal(5 * Math.PI / 180, stem.NutationAmplitude.Radians, 12);
        Assert.Equal(1, stem.NutationSense);
        Assert.Equal(Duration.FromSeconds(1800), stem.GravitropicDelay);
    }

    [Fact]
    public void Clockwise_nutation_gives_minus_one()
    {
        Crop crop = CropValidatorTests.Sample().WithParameter("nutationSense", new CropParameter(-1, "1", -1, 1, "demo"));
        Assert.Equal(-1, crop.ToStemParameters().NutationSense);
    }

    [Fact]
    public void Parameter_keys_are_the_record_properties_in_camel_case()
    {
        string[] properties = typeof(Crop).GetProperties()
            .Where(p => p.PropertyType == typeof(CropParameter))
            .Select(p => char.ToLowerInvariant(p.Name[0]) + p.Name[1..])
            .ToArray();
        Assert.Equal(properties.Order(StringComparer.Ordinal), CropConversions.ParameterKeys.Order(StringComparer.Ordinal));
    }

    [Fact]
    public void Get_and_with_parameter_round_trip_for_every_key()
    {
        Crop crop = CropValidatorTests.Sample();
        foreach (string key in CropConversions.ParameterKeys)
        {
            var changed = new CropParameter(7, "x", 1, 9, "demo");
            Crop updated = crop.WithParameter(key, changed);
            Assert.Same(changed, updated.GetParameter(key));
            foreach (string other in CropConversions.ParameterKeys.Where(k => k != key))
            {
                Assert.Same(crop.GetParameter(other), updated.GetParameter(other));
            }
        }
    }

    [Fact]
    public void Extremes_move_one_parameter_to_an_end_of_its_range()
    {
        Crop crop = CropValidatorTests.Sample();
        Assert.Equal(2, crop.WithParameterAtMinimum("balanceNumber").BalanceNumber.Value);
        Assert.Equal(6, crop.WithParameterAtMaximum("balanceNumber").BalanceNumber.Value);
        Assert.Equal(crop.BalanceNumber.Provenance, crop.WithParameterAtMaximum("balanceNumber").BalanceNumber.Provenance);
        Assert.Equal(crop.DliTarget, crop.WithParameterAtMaximum("balanceNumber").DliTarget);
        foreach (string key in CropConversions.ParameterKeys)
        {
            Assert.Empty(CropValidator.Validate(crop.WithParameterAtMinimum(key)));
            Assert.Empty(CropValidator.Validate(crop.WithParameterAtMaximum(key)));
        }
    }

    [Fact]
    public void With_parameter_value_changes_only_the_value_of_that_parameter()
    {
        // The calibration sets fitted values this way: unit, range and provenance stay until it writes its own.
        Crop crop = CropValidatorTests.Sample();
        foreach (string key in CropConversions.ParameterKeys)
        {
            CropParameter before = crop.GetParameter(key);
            Crop updated = crop.WithParameter(key, 0.123);
            Assert.Equal(before with { Value = 0.123 }, updated.GetParameter(key));
            foreach (string other in CropConversions.ParameterKeys.Where(k => k != key))
            {
                Assert.Same(crop.GetParameter(other), updated.GetParameter(other));
            }
        }

        Assert.Throws<ArgumentOutOfRangeException>(() => crop.WithParameter("colour", 1.0));
    }

    [Fact]
    public void An_unknown_key_is_a_programming_error()
    {
        Assert.False(CropConversions.IsParameterKey("colour"));
        Assert.Throws<ArgumentOutOfRangeException>(() => CropValidatorTests.Sample().GetParameter("colour"));
    }
}
