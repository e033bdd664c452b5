using CanopyAdvisor.Core.Sky;

namespace CanopyAdvisor.Core.Tests.Sky;

public class SunlightPhotonsTests
{
    // Thimijan & Heins (1983): daylight 4.57 µmol J⁻¹ of PAR and 54 lux per µmol m⁻² s⁻¹; PAR = 0.47 of global
    // (MODEL.md §1.4). Products computed: 1000 W m⁻² global → 470 W m⁻² PAR → 2147.9 µmol m⁻² s⁻¹;
    // 2000 µmol m⁻² s⁻¹ → 108 000 lux.
    [Fact]
    public void GlobalToPpfd() => Assert.Equal(2147.9, SunlightPhotons.PpfdFromGlobal(1000.0), 1);

    [Fact]
    public void ParToPpfd() => Assert.Equal(4.57, SunlightPhotons.PpfdFromPar(1.0), 9);

    [Fact]
    public void PpfdToLux() => Assert.Equal(108000.0, SunlightPhotons.LuxFromPpfd(2000.0), 6);

    [Fact]
    public void LuxToPpfd() => Assert.Equal(2000.0, SunlightPhotons.PpfdFromLux(108000.0), 9);

    [Fact]
    public void GlobalRoundTrip() =>
        Assert.Equal(812.5, SunlightPhotons.GlobalFromPpfd(SunlightPhotons.PpfdFromGlobal(812.5)), 9);
}
