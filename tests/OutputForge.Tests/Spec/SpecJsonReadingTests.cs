using System.Text;
using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Spec;

/// <summary>
/// Reading a spec file's JSON: a key given twice in one object is a located error (the JSON readers would keep the
/// last one without a word), a UTF-8 byte-order mark is accepted as in the data files, and a syntax error, nesting too
/// deep included, names the JSON path where it stands.
/// </summary>
public sealed class SpecJsonReadingTests
{
    private static SpecProblem Fails(MiniStudy study) => Assert.Throws<SpecException>(() => SpecLoader.Load(study.Folder)).Problems[0];

    [Fact]
    public void A_key_given_twice_is_an_error_at_its_second_place()
    {
        using var study = new MiniStudy(table: MiniStudy.TableJson.Replace("\"kind\": \"responders\",", "\"kind\": \"responders\",\n  \"population\": \"itt\","));
        var problem = Fails(study);
        Assert.EndsWith("t1.json", problem.File);
        Assert.Equal("$.population", problem.JsonPath);
        Assert.Equal(6, problem.Line);
        Assert.Equal(3, problem.Column);
        Assert.Equal("the key 'population' is given twice in this object (first on line 4); keep one", problem.Message);
    }

    [Fact]
    public void A_nested_key_given_twice_names_its_path()
    {
        using var study = new MiniStudy(study: MiniStudy.StudyJson.Replace("\"where\": \"ITTFL = 'Y'\"", "\"where\": \"ITTFL = 'Y'\", \"where\": \"ITTFL = 'N'\""));
        var problem = Fails(study);
        Assert.EndsWith("study.json", problem.File);
        Assert.Equal("$.populations.itt.where", problem.JsonPath);
        Assert.Contains("the key 'where' is given twice", problem.Message);
    }

    [Fact]
    public void Equal_keys_in_different_objects_are_fine()
    {
        using var study = new MiniStudy();
        Assert.Single(SpecLoader.Load(study.Folder).Tables);
    }

    [Fact]
    public void A_byte_order_mark_is_accepted_and_positions_stay_as_the_editor_shows_them()
    {
        using var study = new MiniStudy();
        var bom = new byte[] { 0xEF, 0xBB, 0xBF };
        File.WriteAllBytes(study.StudyFile, [.. bom, .. Encoding.UTF8.GetBytes(MiniStudy.StudyJson)]);
        File.WriteAllBytes(Path.Combine(study.Folder, "t1.json"), [.. bom, .. Encoding.UTF8.GetBytes(MiniStudy.TableJson.Replace("\"itt\"", "\"it\""))]);
        var problem = Fails(study);
        Assert.Equal("$.population", problem.JsonPath);
        Assert.Equal(4, problem.Line);
        Assert.Equal(17, problem.Column);
    }

    [Fact]
    public void A_utf16_spec_is_named_as_such()
    {
        using var study = new MiniStudy();
        File.WriteAllBytes(Path.Combine(study.Folder, "t1.json"), [0xFF, 0xFE, .. Encoding.Unicode.GetBytes(MiniStudy.TableJson)]);
        Assert.Contains("UTF-16 encoded", Fails(study).Message);
    }

    [Fact]
    public void Nesting_too_deep_names_the_path_where_it_stops()
    {
        using var study = new MiniStudy(table: "{ \"id\": \"1\", \"title\": " + new string('[', 70) + new string(']', 70) + " }");
        var problem = Fails(study);
        Assert.Equal("$.title" + string.Concat(Enumerable.Repeat("[0]", 62)), problem.JsonPath);
        Assert.Contains("invalid JSON: the objects and arrays are nested more than 64 levels deep", problem.Message);
    }

    [Fact]
    public void A_syntax_error_names_the_path_of_the_value_it_stands_in()
    {
        using var study = new MiniStudy(table: MiniStudy.TableJson.Replace("\"Week 4\"", "Week 4"));
        var problem = Fails(study);
        Assert.Equal("$.endpoint.visit", problem.JsonPath);
        Assert.Contains("invalid JSON", problem.Message);
    }
}
