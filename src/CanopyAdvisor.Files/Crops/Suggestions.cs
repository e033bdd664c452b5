namespace CanopyAdvisor.Files.Crops;

/// <summary>"Did you mean" hints for misspelt keys and ids (smallest edit distance, case ignored).</summary>
internal static class Suggestions
{
    /// <summary>The hint text (<c>; did you mean 'x'?</c>) or empty when nothing is close.</summary>
    public static string Hint(string word, IEnumerable<string> candidates)
    {
        string? best = null;
        int bestDistance = int.MaxValue;
        foreach (string c in candidates)
        {
            int d = Distance(word.ToUpperInvariant(), c.ToUpperInvariant());
            if (d < bestDistance)
            {
                bestDistance = d;
                best = c;
            }
        }

        int allowed = Math.Max(2, word.Length / 3);
        return best is not null && bestDistance <= allowed ? $"; did you mean '{best}'?" : string.Empty;
    }

    /// <summary>Levenshtein distance.</summary>
    public static int Distance(string a, string b)
    {
        var previous = new int[b.Length + 1];
        var current = new int[b.Length + 1];
        for (int j = 0; j <= b.Length; j++)
        {
            previous[j] = j;
        }

        for (int i = 1; i <= a.Length; i++)
        {
            current[0] = i;
            for (int j = 1; j <= b.Length; j++)
            {
                int cost = a[i - 1] == b[j - 1] ? 0 : 1;
                current[j] = Math.Min(Math.Min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + cost);
            }

            (previous, current) = (current, previous);
        }

        return previous[b.Length];
    }
}
