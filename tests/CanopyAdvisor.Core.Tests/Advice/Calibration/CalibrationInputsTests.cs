using CanopyAdvisor.Core.Advice.Calibration;
using CanopyAdvisor.Core.Validation;

namespace CanopyAdvisor.Core.Tests.Advice.Calibration;

/// <summary>The parameter names the calibrate command and the service accept.</summary>
public sealed class CalibrationInputsTests
{
    [Theory]
    // The symbols of the lean model's parameters (MODEL.md: M photo-coefficient, γ proprioceptive sensitivity, B balance
    // number) and their crop-file keys (crops/README.md), any case.
    [InlineData("M", "photoCoefficient")]
    [InlineData("m", "photoCoefficient")]
    [InlineData("gamma", "proprioceptiveSensitivity")]
    [InlineData("γ", "proprioceptiveSensitivity")]
    [InlineData("B", "balanceNumber")]
    [InlineData("balanceNumber", "balanceNumber")]
    public void A_name_maps_to_its_crop_file_key(string name, string key) =>
        Assert.Equal(new[] { key }, CalibrationInputs.ParameterKeys([name], "parameters").ToArray());

    [Fact]
    public void Every_unknown_name_is_reported_and_none_at_all_is_an_error()
    {
        var e = Assert.Throws<InvalidInputException>(() => CalibrationInputs.ParameterKeys(["M", "delta", "k"], "parameters"));
        Assert.Equal(2, e.Errors.Count);
        Assert.All(e.Errors, x => Assert.Equal("parameters", x.Path));
        Assert.Throws<InvalidInputException>(() => CalibrationInputs.ParameterKeys([], "parameters"));
    }
}
