using System.Text.Json;
using Layers.Core.Batch;
using Layers.Core.Results;

namespace Layers.Tests.Batch;

/// <summary>
/// The limit of a row of a batch summary names its result from the catalogue of named results and is read back from
/// summary.json by that name (what <c>layers merge</c> does with shard summaries).
/// </summary>
public sealed class LimitCheckSummaryTests
{
    [Fact]
    public void A_limit_written_to_summary_json_is_read_back_as_the_same_named_result_and_values()
    {
        // 60 mg/kg = 6e-5 kg/kg: a hand conversion (1 mg/kg = 1e-6 kg/kg, SI prefixes).
        var limit = new LimitCheck(NamedResult.FoodConcentration, 60e-6, 75e-6);
        var row = new BatchRow("food", "food.json", [], BatchStatus.Succeeded, string.Empty, null) { Limit = limit };

        var text = BatchSummaryJson.Write([row]);
        var back = Assert.Single(BatchSummaryJson.Read(text));

        Assert.Contains("\"quantity\": \"food concentration at the end [kg/kg]\"", text, StringComparison.Ordinal);
        Assert.Equal(limit, back.Limit);
        Assert.True(back.Limit!.Exceeded, "75 mg/kg is above 60 mg/kg");
    }

    [Fact]
    public void A_summary_json_whose_limit_names_no_known_result_is_refused()
    {
        var row = new BatchRow("food", "food.json", [], BatchStatus.Succeeded, string.Empty, null)
        {
            Limit = new LimitCheck(NamedResult.FoodConcentration, 1, 2),
        };
        var text = BatchSummaryJson.Write([row]).Replace("food concentration at the end", "food at the end", StringComparison.Ordinal);

        Assert.Throws<JsonException>(() => BatchSummaryJson.Read(text));
    }
}
