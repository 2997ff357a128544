namespace GemIndex.Bench.Independent;

/// <summary>
/// Draws a stone's magnification: the method of its origin from <see cref="MagnificationHabits"/>, the features it
/// holds, and for a share of stones a look: the examiner picks 4–10 words of the vocabulary at random to look for and
/// writes each as seen or not seen by <see cref="LoupeVisibility"/>. Uses its own random stream, so the other bench
/// readings of a seed stay as they were without magnification.
/// </summary>
internal sealed class LoupeExaminer(Random random, double lookShare)
{
    /// <summary>The share of stones that get a look when none is asked for: half (the brief's figure).</summary>
    public const double DefaultLookShare = 0.5;

    public const int FewestLooks = 4, MostLooks = 10;

    /// <summary>The stone's magnification; null when the table has no row for its species and origin (the run reports those).</summary>
    public MagnificationLook? Examine(SpeciesProperties species, string origin, string hue)
    {
        var rows = MagnificationHabits.For(species.Name, origin, hue);
        if (rows.Count == 0) return null;
        var habit = Pick(rows, random.NextDouble());
        // Every draw below happens whatever its outcome, so each stone takes the same count of numbers.
        bool clean = random.NextDouble() < habit.Clean;
        var held = new Dictionary<string, double>(StringComparer.Ordinal);
        foreach (var feature in habit.Features)
        {
            double chance = random.NextDouble(), extent = 0.6 + 0.8 * random.NextDouble();
            if (!clean && chance < feature.Held) held[feature.Word] = extent;
        }
        bool looked = random.NextDouble() < lookShare;
        bool microscope = random.NextDouble() < LoupeVisibility.MicroscopeShare;
        bool mounted = random.NextDouble() < LoupeVisibility.MountedShare;
        int count = FewestLooks + random.Next(MostLooks - FewestLooks + 1);
        var order = LoupeVisibility.Words.Select(w => (Word: w, Key: random.NextDouble())).OrderBy(x => x.Key).Select(x => x.Word).ToList();
        var sightings = order.Select(_ => random.NextDouble()).ToList();
        var look = new MagnificationLook { Habit = habit, Held = [.. held.Keys] };
        if (!looked) return look;

        bool opaque = species.Opaque || hue == "black";
        var present = new List<string>();
        var absent = new List<string>();
        for (int i = 0; i < count; i++)
        {
            string word = order[i];
            double seen = held.TryGetValue(word, out double extent) ? LoupeVisibility.Sighting(word, microscope, mounted, opaque, extent) : 0;
            double falsely = LoupeVisibility.FalseSighting(word, held, microscope, mounted, opaque);
            (sightings[i] < seen + (1 - seen) * falsely ? present : absent).Add(word);
        }
        return look with { Looked = true, Microscope = microscope, Mounted = mounted, Present = present, Absent = absent };
    }

    private static MagnificationHabit Pick(IReadOnlyList<MagnificationHabit> rows, double u)
    {
        double x = u * rows.Sum(r => r.Share);
        foreach (var row in rows)
            if ((x -= row.Share) <= 0) return row;
        return rows[^1];
    }
}
