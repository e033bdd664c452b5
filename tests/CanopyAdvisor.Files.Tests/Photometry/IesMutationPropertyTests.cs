using System.Text;
using System.Text.RegularExpressions;
using CanopyAdvisor.Core.Lamps;
using CanopyAdvisor.Core.Validation;
using CanopyAdvisor.Files.Photometry;
using CsCheck;

namespace CanopyAdvisor.Files.Tests.Photometry;

// Property: whatever is done to a valid file, the reader either returns a usable photometry or throws
// InvalidInputException, never any other exception, and finishes (absurd counts are refused before allocating).
public partial class IesMutationPropertyTests
{
    private static readonly string[] Nasty =
    [
        "NaN", "-1", "1e9", "1e308", "-1e308", "0", "Infinity", "-Infinity", "abc", "1,2", "9999999999", "10001", "-0",
        "1e-320", "TILT=INCLUDE", "TILT=NONE", "[MORE] x", "360", "90", "180", "-90", "270", "2", "3", "4", "1e6",
        "2147483648", "-2147483649", "0x10", "1.", ".5", "+5", "1e", "\u00A0", "٣", "1_000", "4.9e-324", "1000000",
    ];

    private static readonly string[] Seeds = BuildSeeds();

    [GeneratedRegex(@"\S+")]
    private static partial Regex TokenPattern();

    private static string[] BuildSeeds()
    {
        var quadrant = IesWriter.SampleTypeC(new CosinePowerDistribution(3), 800, IesWriter.Range(0, 90, 15), IesWriter.Range(0, 90, 30));
        var full = IesWriter.SampleTypeC(LambertianDistribution.Instance, 500, IesWriter.Range(0, 180, 30), IesWriter.Range(0, 360, 90));
        return
        [
            "IESNA:LM-63-2002\n[TEST] demo data\n[MANUFAC] demo data\nTILT=NONE\n1 -1 1 5 1 1 2 0 0 0\n1 1 100\n0 22.5 45 67.5 90\n0\n100 90 70 40 0\n",
            "IESNA:LM-63-1995\n[TEST] demo data\nTILT=INCLUDE\n1\n3\n0 45 90\n1 0.9 0.8\n1 1000 1 3 2 1 1 0.5 0.5 0\n1 1 60\n0 45 90\n0 180\n100 70 0\n100 60 0\n",
            IesWriter.WriteTypeC(quadrant, new IesWriteSettings { Keywords = [new("TEST", "demo data", 0)] }),
            IesWriter.WriteTypeC(full, new IesWriteSettings { FormatLine = string.Empty }),
            "IES:LM-63-2019\n[TEST] demo data\nTILT=NONE\n1 -1 1 3 3 2 2 0 0 0\n1 1 0\n-90 0 90\n-90 0 90\n0 5 0\n1 9 1\n0 5 0\n",
            "IESNA91\nTILT=NONE\n1,-1,1,3,2,3,1,0,0,0,1,1,0,0,45,90,0,90,9,8,7,6,5,4\n",
        ];
    }

    private static string Mutate(string text, (int Kind, int A, int B) m)
    {
        var tokens = TokenPattern().Matches(text);
        string[] lines = text.Split('\n');
        string nasty = Nasty[m.B % Nasty.Length];
        switch (m.Kind)
        {
            case 0 when tokens.Count > 0: // delete a token
            {
                var t = tokens[m.A % tokens.Count];
                return text.Remove(t.Index, t.Length);
            }

            case 1 when tokens.Count > 0: // duplicate a token
            {
                var t = tokens[m.A % tokens.Count];
                return text.Insert(t.Index, t.Value + " ");
            }

            case 2 when tokens.Count > 0: // replace a token
            {
                var t = tokens[m.A % tokens.Count];
                return text.Remove(t.Index, t.Length).Insert(t.Index, nasty);
            }

            case 3: // delete a line
                return string.Join('\n', lines.Where((_, i) => i != m.A % lines.Length));
            case 4: // duplicate a line
            {
                int i = m.A % lines.Length;
                return string.Join('\n', lines.Take(i + 1).Append(lines[i]).Concat(lines.Skip(i + 1)));
            }

            case 5: // truncate
                return text[..(m.A % (text.Length + 1))];
            case 6: // insert garbage characters
            {
                const string Alphabet = "0123456789 ,\n\r\t.-+eE[]=TILNAaxyz\u0000\u00A0é∞";
                var garbage = new StringBuilder();
                for (int k = 0; k < 1 + (m.B % 12); k++)
                {
                    garbage.Append(Alphabet[(m.B * 31 + k * 17) % Alphabet.Length]);
                }

                return text.Insert(m.A % (text.Length + 1), garbage.ToString());
            }

            case 7: // swap two lines
            {
                int i = m.A % lines.Length;
                int j = m.B % lines.Length;
                (lines[i], lines[j]) = (lines[j], lines[i]);
                return string.Join('\n', lines);
            }

            case 8: // replace a line
                lines[m.A % lines.Length] = nasty;
                return string.Join('\n', lines);
            default: // insert a token
            {
                int at = tokens.Count > 0 ? tokens[m.A % tokens.Count].Index : 0;
                return text.Insert(at, nasty + " ");
            }
        }
    }

    [Fact]
    public void Mutated_files_either_read_or_raise_invalid_input()
    {
        var mutation = Gen.Select(Gen.Int[0, 9], Gen.Int[0, 100_000], Gen.Int[0, 100_000]);
        var gen = Gen.Select(Gen.Int[0, Seeds.Length - 1], mutation.Array[1, 4]);
        gen.Sample(
            (seed, mutations) =>
            {
                string text = Seeds[seed];
                foreach (var m in mutations)
                {
                    text = Mutate(text, m);
                }

                try
                {
                    IesPhotometry read = IesReader.Read(text, "fuzz.ies", IesReadOptions.Photon);
                    Assert.True(double.IsFinite(read.TotalPhotonFluxMicromolesPerSecond) && read.TotalPhotonFluxMicromolesPerSecond > 0);
                    for (int k = 0; k < 16; k++)
                    {
                        double i = read.Distribution.IntensityPerUnitFlux(k * 0.21, k * 0.43);
                        Assert.True(double.IsFinite(i) && i >= 0);
                    }
                }
                catch (InvalidInputException e)
                {
                    Assert.NotEmpty(e.Errors);
                    Assert.All(e.Errors, x => Assert.False(string.IsNullOrWhiteSpace(x.Message)));
                }
            },
            iter: 6000);
    }

    [Fact]
    public void Every_seed_is_valid()
    {
        foreach (string seed in Seeds)
        {
            Assert.True(IesReader.Read(seed, "seed.ies", IesReadOptions.Photon).TotalPhotonFluxMicromolesPerSecond > 0);
        }
    }
}
