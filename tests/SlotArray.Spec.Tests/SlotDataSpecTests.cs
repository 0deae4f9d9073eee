using SlotArray.Spec;

namespace SlotArray.Spec.Tests;

/// <summary><c>slots.data</c> and <c>slots.extrapolate</c> in the spec: the table is read relative to the spec, and its errors come back at the key with the table's own line and column.</summary>
public class SlotDataSpecTests
{
    private static readonly string Table =
        "# provenance: test\noffset_mm,length_mm,frequency_ghz,g,b\n"
        + "1,14.76,9.41,0.0201,0.0080\n1,15.06,9.41,0.0232,-0.0001\n1,15.36,9.41,0.0204,-0.0075\n"
        + "3,15.20,9.41,0.1500,0.0700\n3,15.50,9.41,0.1800,-0.0010\n3,15.80,9.41,0.1550,-0.0650\n";

    private static SpecResult Load(string table, params (int Line, string? Text)[] edits)
    {
        string dir = Path.Combine(Path.GetTempPath(), "slotarray-tests", "slotdata-" + Guid.NewGuid().ToString("N")[..8]);
        Directory.CreateDirectory(dir);
        File.WriteAllText(Path.Combine(dir, "my-slots.csv"), table);
        string spec = Path.Combine(dir, "t.yaml");
        File.WriteAllText(spec, SpecErrorTests.With(edits));
        return SpecLoader.LoadFile(spec);
    }

    [Fact]
    public void Data_path_relative_to_the_spec_is_read_with_its_provenance_and_hash()
    {
        var r = Load(Table, (12, "  width: 1.6 mm\n  data: my-slots.csv\n  extrapolate: true"));
        Assert.True(r.IsValid, string.Join("\n", r.Errors));
        var data = r.Request!.Slots.Data!;
        Assert.Equal("my-slots.csv", data.Source);
        Assert.Equal(["provenance: test"], data.Provenance);
        Assert.Equal(SlotTableCsv.Sha256(System.Text.Encoding.UTF8.GetBytes(Table)), data.Sha256);
        Assert.Equal(6, data.Rows.Count);
        Assert.True(r.Request.Slots.Extrapolate);
    }

    [Fact]
    public void A_table_error_is_reported_at_the_data_key_with_the_tables_line_and_column()
    {
        var r = Load(Table.Replace("3,15.50,9.41", "3,15.5x,9.41"), (12, "  width: 1.6 mm\n  data: my-slots.csv"));
        var e = Assert.Single(r.Errors);
        Assert.Equal(13, e.Line);
        Assert.Contains("slot table my-slots.csv:7:3: length: '15.5x' is not a number", e.Message);
    }

    [Fact]
    public void A_missing_file_model_with_data_and_extrapolate_without_data_are_errors()
    {
        var missing = Load(Table, (12, "  width: 1.6 mm\n  data: nothere.csv"));
        Assert.Contains("cannot read the slot table 'nothere.csv'", Assert.Single(missing.Errors).Message);
        var both = Load(Table, (12, "  width: 1.6 mm\n  model: stevenson\n  data: my-slots.csv"));
        Assert.Contains("not both", Assert.Single(both.Errors).Message);
        var alone = Load(Table, (12, "  width: 1.6 mm\n  extrapolate: true"));
        Assert.Contains("'extrapolate' applies to a slot table", Assert.Single(alone.Errors).Message);
        var word = Load(Table, (12, "  width: 1.6 mm\n  data: my-slots.csv\n  extrapolate: maybe"));
        Assert.Contains("true or false", Assert.Single(word.Errors).Message);
    }
}
