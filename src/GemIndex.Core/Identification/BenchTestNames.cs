namespace GemIndex.Core.Identification;

/// <summary>The bench tests' keys (as in the batch format) and their names in plain words for people.</summary>
public static class BenchTestNames
{
    /// <summary>The test in plain words: "absorption_nm" → "hand spectroscope (absorption lines)".</summary>
    public static string Describe(string test) => test switch
    {
        "refractometer" => "refractometer",
        "sg" => "specific gravity (hydrostatic weighing)",
        "heavy_liquids" => "heavy liquids",
        "polariscope" => "polariscope",
        "pleochroism" => "dichroscope (pleochroism)",
        "dispersion" => "dispersion (fire)",
        "thermal_probe" => "thermal probe",
        "electrical" => "electrical conductivity tester",
        "uv_long" => "long-wave UV lamp (365 nm)",
        "uv_short" => "short-wave UV lamp (254 nm)",
        "absorption_nm" => "hand spectroscope (absorption lines)",
        "colour" => "colour",
        _ => test,
    };
}
