using static OutputForge.Tests.BadInput.BadInputCase;
using static OutputForge.Tests.Support.MiniStudy;

namespace OutputForge.Tests.BadInput;

/// <summary>The battery of malformed inputs: specs (syntax, types, keys, references, conditions) and data (CSV encoding, structure, ADaM conventions).</summary>
public static class BadInputCases
{
    private static BadInputCase T(string name, string from, string to, params string[] expect) =>
        new(name, ["t1.json", .. expect]) { Table = [(from, to)] };

    private static BadInputCase S(string name, string from, string to, params string[] expect) =>
        new(name, ["study.json", .. expect]) { Study = [(from, to)] };

    private static BadInputCase A(string name, string content, params string[] expect) =>
        new(name, ["adsl.csv", .. expect]) { Adsl = Utf8(content) };

    private static BadInputCase AB(string name, byte[] content, params string[] expect) =>
        new(name, ["adsl.csv", .. expect]) { Adsl = content };

    private static BadInputCase E(string name, string content, params string[] expect) =>
        new(name, ["adeff.csv", .. expect]) { Adeff = Utf8(content) };

    /// <summary>Creates a symbolic link at <paramref name="path"/> (replacing a file there).</summary>
    private static void Link(string path, string target)
    {
        File.Delete(path);
        File.CreateSymbolicLink(path, target);
    }

    /// <summary>Replaces <paramref name="path"/> with a named pipe that nothing writes.</summary>
    private static void Fifo(string path)
    {
        File.Delete(path);
        using var mkfifo = System.Diagnostics.Process.Start("mkfifo", [path]);
        mkfifo.WaitForExit();
    }

    private const string AdslHeader = "STUDYID,USUBJID,TRT01P,TRT01PN,ITTFL,AGE\n";

    /// <summary>Delivery, sandbox, limits and run messages (issue 14): links, pipes, devices, sizes, output places.</summary>
    private static IEnumerable<BadInputCase> DeliverySandboxAndLimits()
    {
        // sandbox: links that leave the allowed folders are refused, and the refused file's content is never shown
        yield return new BadInputCase("template linked to a file outside the spec tree", ["title.sbn", "symbolic link", "outside the spec's folder"])
        {
            Prepare = s => { Directory.CreateDirectory(Path.Combine(s.Folder, "templates")); Link(Path.Combine(s.Folder, "templates", "title.sbn"), "/etc/passwd"); },
        };
        yield return new BadInputCase("table spec linked to a file outside the spec tree", ["study.json", "$.tables[0]", "outside the spec's folder", "(through a symbolic link)"])
        {
            Prepare = s => Link(Path.Combine(s.Folder, "t1.json"), "/etc/passwd"),
        };
        yield return new BadInputCase("data folder linked outside the spec tree", ["study.json", "$.data.folder", "outside the spec's folder"])
        {
            Study = [("\"folder\": \"data\"", "\"folder\": \"datalink\"")],
            Prepare = s => Directory.CreateSymbolicLink(Path.Combine(s.Folder, "datalink"), Path.GetTempPath()),
        };
        yield return new BadInputCase("dataset linked outside the data folder", ["adeff.csv", "symbolic link that leads outside the data folder"])
        {
            Prepare = s => Link(Path.Combine(s.DataFolder, "adeff.csv"), "/etc/passwd"),
        };

        // limits: only regular files, of a size the machine can hold
        yield return new BadInputCase("dataset is a named pipe", ["adeff.csv", "named pipe (FIFO), not a regular file"]) { Prepare = s => Fifo(Path.Combine(s.DataFolder, "adeff.csv")) };
        yield return new BadInputCase("table spec is a named pipe", ["t1.json", "named pipe (FIFO), not a regular file"]) { Prepare = s => Fifo(Path.Combine(s.Folder, "t1.json")) };
        yield return new BadInputCase("dataset linked to an endless device", ["adeff.csv", "character device, not a regular file"])
        {
            Prepare = s => Link(Path.Combine(s.DataFolder, "adeff.csv"), "/dev/zero"),
            ExtraArguments = ["--allow-folder", "/dev"],
        };
        yield return T("30,000 nested parentheses", "ANL01FL = 'Y'", new string('(', 30_000) + "ANL01FL = 'Y'" + new string(')', 30_000),
            "$.endpoint.where", "the text is 60,013 characters long");
        yield return T("10,000 nested parentheses", "ANL01FL = 'Y'", new string('(', 10_000) + "ANL01FL = 'Y'" + new string(')', 10_000),
            "$.endpoint.where", "nests '(' and 'not' more than 100 levels deep", "character 101");
        yield return T("5,000 nested nots", "ANL01FL = 'Y'", string.Concat(Enumerable.Repeat("not ", 5_000)) + "ANL01FL = 'Y'",
            "$.endpoint.where", "more than 100 levels deep", "character 401");
        yield return T("1,100 tests joined by and", "ANL01FL = 'Y'", string.Join(" and ", Enumerable.Repeat("ANL01FL = 'Y'", 1_100)),
            "$.endpoint.where", "joins more than 1000 tests");

        yield return T("JSON nested 100 levels deep", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"x\": " + new string('[', 100) + new string(']', 100) + ",",
            "invalid JSON", "64");

        // text a document cannot hold: one rule for spec text, data values and template output, in every format
        yield return T("title of 40,000 characters", "[\"Responders\"]", $"[\"{new string('L', 40_000)}\"]", "$.title[0]", "40,000 characters long, more than the 32,767");
        yield return new BadInputCase("title of 40,000 characters as text", ["t1.json", "$.title[0]", "more than the 32,767"])
        {
            Table = [("[\"Responders\"]", $"[\"{new string('L', 40_000)}\"]")],
            ExtraArguments = ["--format", "txt"],
        };
        yield return T("control character in a title", "[\"Responders\"]", "[\"Resp\\u0001onders\"]", "$.title[0]", "control character U+0001 at character 5");
        yield return T("lone surrogate in a title", "[\"Responders\"]", "[\"Resp\\ud800onders\"]", "$.title[0]", "lone UTF-16 surrogate");
        yield return T("noncharacter U+FFFE in a footnote", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"footnotes\": [\"a\\ufffe\"],", "$.footnotes[0]", "noncharacter U+FFFE");
        yield return A("noncharacter U+FFFE in a data value", AdslHeader + "T1,T1-001,Placebo,0,Y,40\nT1\uFFFE,T1-002,Placebo,0,Y,51\n", "line 3", "variable STUDYID", "noncharacter U+FFFE at character 3");
        yield return A("noncharacter U+10FFFF in a data value", AdslHeader + "T1\U0010FFFF,T1-001,Placebo,0,Y,40\n", "line 2", "noncharacter U+10FFFF");
        yield return A("noncharacter U+FDD0 in a data value", AdslHeader + "T1\uFDD0,T1-001,Placebo,0,Y,40\n", "line 2", "noncharacter U+FDD0");
        yield return A("data value of 40,000 characters", AdslHeader + new string('T', 40_000) + ",T1-001,Placebo,0,Y,40\n", "line 2", "variable STUDYID", "40,000 characters long, more than the 32,767");
        yield return new BadInputCase("template doubling a text past the cell limit", ["title.sbn", "template error", "more than the 32,767"])
        {
            Prepare = s =>
            {
                Directory.CreateDirectory(Path.Combine(s.Folder, "templates"));
                File.WriteAllText(Path.Combine(s.Folder, "templates", "title.sbn"), "{{ t = \"ab\" }}{{ for i in 1..15 }}{{ t = t + t }}{{ end }}{{ t }}\n");
            },
        };
        yield return new BadInputCase("template writing a control character", ["title.sbn", "template error", "control character U+0007"])
        {
            Prepare = s =>
            {
                Directory.CreateDirectory(Path.Combine(s.Folder, "templates"));
                File.WriteAllText(Path.Combine(s.Folder, "templates", "title.sbn"), "Table\u0007\n");
            },
        };

        // run messages: what is actually wrong, and where
        yield return T("table id of 265 characters", "\"id\": \"1\"", $"\"id\": \"{new string('9', 265)}\"", "$.id", "the table id is 265 characters long; at most 64 fit");
        yield return new BadInputCase("output folder inside the data folder", ["--out", "is inside the data folder"]) { Out = s => Path.Combine(s.DataFolder, "out") };
        yield return new BadInputCase("output folder holding the data and spec folders", ["--out", "holds the data folder"]) { Out = s => s.Folder };
        yield return new BadInputCase("output folder name too long", ["the output folder's name is 300 bytes long; at most 195 fit"]) { Out = s => Path.Combine(s.Folder, new string('o', 300)) };
        yield return new BadInputCase("output folder below a file", ["adsl.csv is a file, not a folder"]) { Out = s => Path.Combine(s.DataFolder, "adsl.csv", "out") };
    }

    public static IEnumerable<BadInputCase> All()
    {
        foreach (var item in DataFormatBadInputCases.All())
        {
            yield return item;
        }

        // JSON syntax
        yield return T("table: missing closing brace", "  }\n}", "  }\n", "invalid JSON");
        yield return T("table: text after the end", "  }\n}", "  }\n}\nmore", "invalid JSON");
        yield return new BadInputCase("table: single-quoted keys", ["t1.json", "invalid JSON", ":1:"]) { TableText = "{'id': '1'}" };
        yield return new BadInputCase("table: empty file", ["t1.json", "invalid JSON"]) { TableText = "" };
        yield return new BadInputCase("table: null", ["t1.json", "$:", "expected a value of type object"]) { TableText = "null" };
        yield return new BadInputCase("table: an array", ["t1.json", "$:", "expected a value of type object"]) { TableText = "[]" };
        yield return S("study: missing comma", "\"title\": \"Test study\" },", "\"title\": \"Test study\" }", "invalid JSON", ":3:");
        yield return new BadInputCase("study: empty file", ["study.json", "invalid JSON"]) { StudyText = "" };
        yield return T("table: unterminated string", "\"Responders\"", "\"Responders", "invalid JSON");
        yield return T("table: NaN literal", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"statistics\": { \"level\": NaN },", "invalid JSON");
        yield return T("table: a bare word", "\"itt\"", "itt", "invalid JSON", ":4:");

        // wrong types and out-of-range values
        yield return T("title is a text, not a list", "[\"Responders\"]", "\"Responders\"", "$.title", "expected a value of type array");
        yield return T("id is a number", "\"id\": \"1\"", "\"id\": 1", "$.id", "expected a value of type string");
        yield return T("level is a text", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"statistics\": { \"level\": \"0.95\" },", "$.statistics.level", "number");
        yield return T("level above 1", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"statistics\": { \"level\": 1.5 },", "$.statistics.level");
        yield return T("level 95 instead of 0.95", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"statistics\": { \"level\": 95 },", "$.statistics.level");
        yield return T("percent decimals not whole", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"statistics\": { \"percentDecimals\": 1.5 },", "$.statistics.percentDecimals");
        yield return T("percent decimals too many", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"statistics\": { \"percentDecimals\": 7 },", "$.statistics.percentDecimals");
        yield return T("p-value floor zero", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"statistics\": { \"pValueFloor\": 0 },", "$.statistics.pValueFloor");
        yield return S("total is a text", "\"control\": \"Placebo\"", "\"control\": \"Placebo\", \"total\": \"yes\"", "$.treatment.total", "boolean");
        yield return S("tables is a text", "[\"t1.json\"]", "\"t1.json\"", "$.tables", "array");
        yield return S("population condition is a number", "\"where\": \"ITTFL = 'Y'\"", "\"where\": 5", "$.populations.itt.where", "string");
        yield return T("footnote is a number", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"footnotes\": [1],", "$.footnotes[0]", "string");
        yield return T("no title lines", "[\"Responders\"]", "[]", "$.title");
        yield return T("id climbs out of the folder", "\"id\": \"1\"", "\"id\": \"../evil\"", "$.id");
        yield return T("id with a slash", "\"id\": \"1\"", "\"id\": \"a/b\"", "$.id");
        yield return T("id with a device name character", "\"id\": \"1\"", "\"id\": \"1:2\"", "$.id");
        yield return S("dataset file in another folder", "\"adsl\": \"adsl.csv\"", "\"adsl\": \"../adsl.csv\"", "$.data.datasets.adsl", "no folders");
        yield return S("dataset file of an unknown format", "\"adsl\": \"adsl.csv\"", "\"adsl\": \"adsl.sas7bdat\"", "$.data.datasets.adsl", "ending in .csv, .xpt, .json or .ndjson");
        yield return S("dataset name in upper case", "\"adeff\": \"adeff.csv\"", "\"ADEFF\": \"adeff.csv\"", "$.data.datasets");
        yield return T("kind misspelt", "\"kind\": \"responders\"", "\"kind\": \"responder\"", "$.kind", "expected one of \"responders\"");
        yield return T("proportion method misspelt", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"statistics\": { \"proportionInterval\": \"wilsn\" },", "$.statistics.proportionInterval", "\"wilson\"");
        yield return T("difference method misspelt", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"statistics\": { \"differenceInterval\": \"newcomb\" },", "$.statistics.differenceInterval", "\"newcombe\"");
        yield return T("test misspelt", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"statistics\": { \"test\": \"chisq\" },", "$.statistics.test", "\"chi-square\"");
        yield return T("missing rule misspelt", "\"response\": \"AVALC = 'Y'\"", "\"response\": \"AVALC = 'Y'\", \"missing\": \"impute\"", "$.endpoint.missing", "\"non-responder\"");
        yield return S("paper size unknown", "\"tables\"", "\"page\": { \"paper\": \"legal\" }, \"tables\"", "$.page.paper", "\"letter\"");
        yield return S("font size too large", "\"tables\"", "\"page\": { \"fontSize\": 40 }, \"tables\"", "$.page.fontSize");
        yield return S("no populations", "\"populations\": { \"itt\": { \"label\": \"ITT Population\", \"where\": \"ITTFL = 'Y'\" } }", "\"populations\": {}", "$.populations");
        yield return S("population name in upper case", "\"itt\": {", "\"ITT\": {", "$.populations");

        // unknown keys, with the likely typo
        yield return T("unknown key titel", "\"title\":", "\"titel\":", "$.titel", "unknown key 'titel' (did you mean 'title'?)");
        yield return T("unknown key paramter", "\"parameter\":", "\"paramter\":", "$.endpoint.paramter", "did you mean 'parameter'?");
        yield return T("unknown key levl", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"statistics\": { \"levl\": 0.9 },", "$.statistics.levl", "did you mean 'level'?");
        yield return T("unknown key footnote", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"footnote\": [],", "$.footnote", "did you mean 'footnotes'?");
        yield return T("unknown key respons", "\"response\":", "\"respons\":", "$.endpoint.respons", "did you mean 'response'?");
        yield return T("unknown key with no near name", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"colour\": \"red\",", "$.colour", "unknown key 'colour'");
        yield return S("unknown key populatons", "\"populations\":", "\"populatons\":", "$.populatons", "did you mean 'populations'?");
        yield return S("unknown key controll", "\"control\":", "\"controll\":", "$.treatment.controll", "did you mean 'control'?");
        yield return S("unknown key tittle", "\"title\": \"Test study\"", "\"tittle\": \"Test study\"", "$.study.tittle", "did you mean 'title'?");
        yield return S("unknown key were", "\"where\":", "\"were\":", "$.populations.itt.were", "did you mean 'where'?");
        yield return S("unknown key datasets misspelt", "\"datasets\":", "\"dataset\":", "$.data.dataset", "did you mean 'datasets'?");

        // missing required keys
        yield return T("no population", "\"population\": \"itt\",\n", "", "$:", "missing required key: 'population'");
        yield return T("no endpoint", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"x\": {", "invalid JSON");
        yield return new BadInputCase("responders without endpoint", ["t1.json", "$:", "missing required key: 'endpoint'"])
        {
            TableText = "{ \"id\": \"1\", \"title\": [\"R\"], \"population\": \"itt\", \"kind\": \"responders\" }",
        };
        yield return T("endpoint without response", ",\n    \"response\": \"AVALC = 'Y'\"", "", "$.endpoint", "missing required key: 'response'");
        yield return S("no treatment", "\"treatment\": { \"variable\": \"TRT01P\", \"order\": \"TRT01PN\", \"control\": \"Placebo\" },", "", "$:", "missing required key: 'treatment'");
        yield return S("no adsl dataset", "\"adsl\": \"adsl.csv\", ", "", "$.data.datasets", "'adsl'");
        yield return S("population without label", "\"label\": \"ITT Population\", ", "", "$.populations.itt", "missing required key: 'label'");
        yield return S("treatment without control", ", \"control\": \"Placebo\"", "", "$.treatment", "missing required key: 'control'");

        // unknown references, with the nearest valid name
        yield return T("unknown population", "\"population\": \"itt\"", "\"population\": \"it\"", "$.population", "unknown population 'it' (did you mean 'itt'?)");
        yield return T("unknown dataset", "\"dataset\": \"adeff\"", "\"dataset\": \"adef\"", "$.endpoint.dataset", "(did you mean 'adeff'?)");
        yield return T("unknown parameter", "\"RESP\"", "\"RSP\"", "$.endpoint.parameter", "PARAMCD 'RSP' (did you mean 'RESP'?)");
        yield return T("unknown visit", "\"Week 4\"", "\"Week 40\"", "$.endpoint.visit", "AVISIT 'Week 40' (did you mean 'Week 4'?)");
        yield return T("unknown variable in where", "ANL01FL = 'Y'", "ANL1FL = 'Y'", "$.endpoint.where", "no variable ANL1FL (did you mean 'ANL01FL'?)");
        yield return T("unknown variable in response", "AVALC = 'Y'", "AVALX = 'Y'", "$.endpoint.response", "no variable AVALX (did you mean 'AVALC'?)");
        yield return T("unknown variable in subset", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"subset\": \"AGEX >= 18\",", "$.subset", "no variable AGEX (did you mean 'AGE'?)");
        yield return S("unknown treatment variable", "\"variable\": \"TRT01P\"", "\"variable\": \"TRT01X\"", "$.treatment.variable", "no variable TRT01X (did you mean 'TRT01P'?)");
        yield return S("unknown order variable", "\"order\": \"TRT01PN\"", "\"order\": \"TRT01PX\"", "$.treatment.order", "no variable TRT01PX (did you mean");
        yield return S("unknown variable in population", "ITTFL = 'Y'", "ITTF = 'Y'", "$.populations.itt.where", "(did you mean 'ITTFL'?)");
        yield return S("control in the wrong case", "\"control\": \"Placebo\"", "\"control\": \"placebo\"", "$.treatment.control", "(did you mean 'Placebo'?)");
        yield return S("control not in the data", "\"control\": \"Placebo\"", "\"control\": \"Vehicle\"", "$.treatment.control", "control arm 'Vehicle' is not a value of TRT01P");
        yield return S("missing table file", "\"t1.json\"", "\"t2.json\"", "$.tables[0]", "no such table spec file 't2.json'");
        yield return S("population treatment variable unknown", "\"where\": \"ITTFL = 'Y'\"", "\"where\": \"ITTFL = 'Y'\", \"treatment\": \"TRT01AX\"", "$.populations.itt.treatment", "no variable TRT01AX");
        yield return S("order without treatment in a population", "\"where\": \"ITTFL = 'Y'\"", "\"where\": \"ITTFL = 'Y'\", \"order\": \"TRT01PN\"", "$.populations.itt.order", "'order' needs 'treatment'");
        yield return S("the same table twice", "[\"t1.json\"]", "[\"t1.json\", \"t1.json\"]", "$.tables[1]", "'t1.json' is listed twice");

        // condition syntax, pointing at the character
        yield return T("unquoted text value", "ANL01FL = 'Y'", "ANL01FL = Y", "$.endpoint.where", "put text values in quotes", "character 11");
        yield return T("double equals", "AVALC = 'Y'", "AVALC == 'Y'", "$.endpoint.response", "character 8");
        yield return T("dangling and", "ANL01FL = 'Y'", "ANL01FL = 'Y' and", "$.endpoint.where", "found the end of the condition");
        yield return T("unclosed parenthesis", "AVALC = 'Y'", "(AVALC = 'Y'", "$.endpoint.response", "expected ')'");
        yield return T("number compared with quoted text", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"subset\": \"AGE > '65'\",", "$.subset", "AGE is numeric");
        yield return S("unclosed quote", "ITTFL = 'Y'", "ITTFL = 'Y", "$.populations.itt.where", "no closing '");
        yield return T("list without parentheses", "ANL01FL = 'Y'", "ANL01FL in 'Y'", "$.endpoint.where", "expected '(' to start the list");
        yield return T("unknown operator", "AVALC = 'Y'", "AVALC # 'Y'", "$.endpoint.response", "unexpected character '#'");
        yield return T("empty condition", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"subset\": \"\",", "$.subset", "the condition is empty");
        yield return T("is without null", "ANL01FL = 'Y'", "ANL01FL is 'Y'", "$.endpoint.where", "expected 'null' or 'not null' after 'is'");
        yield return T("the old missing-value test", "ANL01FL = 'Y'", "ANL01FL is not missing", "$.endpoint.where",
            "the missing-value test is written 'is not null', not 'is not missing'", "character 16", "t1.json:10:");
        yield return T("date compared without ISO format", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"subset\": \"AGE = 1 or STUDYID = 1\",", "$.subset", "STUDYID holds text");

        // meaning
        yield return new BadInputCase("empty population", ["t1.json", "$.population", "population 'itt' (ITTFL = 'X') has no subjects"])
        {
            Study = [("ITTFL = 'Y'", "ITTFL = 'X'")],
        };
        yield return new BadInputCase("two records for one subject", ["t1.json", "$.endpoint.where", "more than one record of subject T1-001", "lines 2 and 6"])
        {
            Adeff = Utf8(Adeff + "T1,T1-001,RESP,Week 4,Y,Y\n"),
        };

        // CSV structure and encoding
        yield return A("unbalanced quote", AdslHeader + "T1,T1-001,\"Placebo,0,Y,40\n", "never closed");
        yield return A("short row", AdslHeader + "T1,T1-001,Placebo,0,Y\n", "line 2", "the row has 5 fields but the header has 6");
        yield return A("long row", AdslHeader + "T1,T1-001,Placebo,0,Y,40,extra\n", "line 2", "the row has 7 fields");
        yield return A("stray quote", AdslHeader + "T1,T1-001,Plac\"ebo,0,Y,40\n", "line 2", "quote");
        yield return A("text after closing quote", AdslHeader + "T1,T1-001,\"Placebo\"x,0,Y,40\n", "line 2", "after the closing quote");
        yield return AB("UTF-16 little endian", [0xFF, 0xFE, .. System.Text.Encoding.Unicode.GetBytes(Adsl)], "UTF-16");
        yield return AB("UTF-16 big endian", [0xFE, 0xFF, .. System.Text.Encoding.BigEndianUnicode.GetBytes(Adsl)], "UTF-16");
        yield return AB("UTF-16 without byte-order mark", System.Text.Encoding.Unicode.GetBytes(Adsl), "NUL byte");
        yield return AB("Latin-1 byte", [.. Utf8(AdslHeader + "T1,T1-001,Placebo,0,Y,40\nT1,T1-002,Plac"), 0xE9, .. Utf8("bo,0,Y,51\n")], "line 3", "not valid UTF-8");
        yield return A("empty file", "", "the file is empty");
        yield return AB("byte-order mark only", [0xEF, 0xBB, 0xBF], "no header row");
        yield return A("header only", AdslHeader, "ADSL has a header but no subjects");
        yield return A("duplicate column names", "STUDYID,USUBJID,TRT01P,TRT01PN,ITTFL,ITTFL\nT1,T1-001,Placebo,0,Y,Y\n", "line 1", "variable ITTFL", "appears twice");
        yield return A("empty column name", "STUDYID,,TRT01P\nT1,x,y\n", "line 1", "column 2 of the header has no variable name");
        yield return new BadInputCase("text in a numeric variable", ["t1.json", "$.subset", "AGE holds text ('abc' on line 3 of adsl.csv is not a number)"])
        {
            Table = [("\"kind\": \"responders\",", "\"kind\": \"responders\", \"subset\": \"AGE >= 18\",")],
            Adsl = Utf8(Adsl.Replace("T1,T1-002,Placebo,0,Y,51", "T1,T1-002,Placebo,0,Y,abc")),
        };
        yield return A("a 10 MB field", AdslHeader + "T1,T1-001,Placebo,0,Y," + new string('9', 10 * 1024 * 1024) + "\n", "line 2", "variable AGE", "more than the 1,048,576");
        yield return AB("NUL byte", [.. Utf8(AdslHeader + "T1,T1-001,Placebo,0,Y,4"), 0, .. Utf8("0\n")], "line 2", "NUL byte");
        yield return A("control character", AdslHeader + "T1,T1-001,Placebo\u0001,0,Y,40\n", "line 2", "variable TRT01P", "control character U+0001");
        yield return A("escape character", AdslHeader + "T1,T1-001,Placebo,0,Y,40\nT1,T1-002,\u001bPlacebo,0,Y,51\n", "line 3", "U+001B");

        // ADaM conventions
        yield return A("no USUBJID", "STUDYID,SUBJID,TRT01P,TRT01PN,ITTFL,AGE\nT1,1,Placebo,0,Y,4\n", "ADSL has no USUBJID");
        yield return A("empty USUBJID", AdslHeader + "T1,,Placebo,0,Y,40\n", "line 2", "USUBJID is empty");
        yield return A("duplicate subject", Adsl + "T1,T1-001,Placebo,0,Y,40\n", "line 7", "subject T1-001 has a second ADSL row (first on line 2)");
        yield return A("flag in lower case", Adsl.Replace("T1,T1-003,Active,1,Y,38", "T1,T1-003,Active,1,y,38"), "line 4", "variable ITTFL", "flag value 'y'");
        yield return A("flag as 1", Adsl.Replace("T1,T1-003,Active,1,Y,38", "T1,T1-003,Active,1,1,38"), "line 4", "flag value '1'");
        yield return E("subject not in ADSL", Adeff + "T1,T1-999,RESP,Week 4,Y,Y\n", "line 6", "subject T1-999 is not in ADSL");
        yield return E("flag YES in BDS", Adeff.Replace("RESP,Week 4,N,Y", "RESP,Week 4,N,YES"), "line 2", "variable ANL01FL", "flag value 'YES'");
        yield return E("BDS without USUBJID", "STUDYID,PARAMCD\nT1,RESP\n", "no USUBJID variable");
        yield return E("BDS unbalanced quote at the end", Adeff + "T1,T1-001,\"RESP,Week 4,Y,Y\n", "never closed");
        yield return E("BDS empty", "", "the file is empty");
        yield return new BadInputCase("BDS without PARAMCD", ["t1.json", "$.endpoint.parameter", "has no PARAMCD variable"])
        {
            Adeff = Utf8(Adeff.Replace("PARAMCD", "PARAM")),
        };

        // data integrity: values that would silently change the numbers, and how spec files are read
        const string Dates = "STUDYID,USUBJID,TRT01P,TRT01PN,ITTFL,AGE,TRTSDT\n";
        const string DateSubset = "\"kind\": \"responders\", \"subset\": \"TRTSDT >= '2025-01-01'\",";
        yield return new BadInputCase("date not in ISO form in a compared column", ["t1.json", "$.subset", "'01MAR2025' on line 3 of adsl.csv is not an ISO 8601 date (expected YYYY-MM-DD"])
        {
            Table = [("\"kind\": \"responders\",", DateSubset)],
            Adsl = Utf8(Dates + "T1,T1-001,Placebo,0,Y,40,2025-02-01\nT1,T1-002,Placebo,0,Y,51,01MAR2025\nT1,T1-003,Active,1,Y,38,2025-03-02\nT1,T1-004,Active,1,Y,66,2025-03-03\n"),
        };
        yield return T("number column compared with a date", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"subset\": \"AGE < '2025-01-01'\",", "$.subset", "AGE holds numbers, not dates");
        yield return A("subject id with a trailing blank", Adsl + "T1,T1-001 ,Placebo,0,Y,40\n", "line 7", "subject T1-001 has a second ADSL row (first on line 2)");
        yield return E("BDS subject id with a trailing blank, not in ADSL", Adeff + "T1,T1-009 ,RESP,Week 8,Y,Y\n", "line 6", "subject T1-009 is not in ADSL");
        yield return A("decimal comma in ADSL", Adsl.Replace("T1,T1-002,Placebo,0,Y,51", "T1,T1-002,Placebo,0,Y,\"51,5\""), "line 3", "variable AGE", "'51,5' is not a number: write numbers with a decimal point");
        yield return E("decimal comma in BDS", Adeff.Replace("ANL01FL\n", "ANL01FL,AVAL\n").Replace(",Y\n", ",Y,1.5\n").Replace("T1,T1-003,RESP,Week 4,Y,Y,1.5", "T1,T1-003,RESP,Week 4,Y,Y,\"1,5\""), "line 4", "variable AVAL", "'1,5' is not a number");
        yield return A("thousands separator", Adsl.Replace("T1,T1-002,Placebo,0,Y,51", "T1,T1-002,Placebo,0,Y,\"1,051\""), "line 3", "variable AGE", "'1,051' is not a number");
        yield return A("NaN in a numeric variable", Adsl.Replace("T1,T1-003,Active,1,Y,38", "T1,T1-003,Active,1,Y,NaN"), "line 4", "variable AGE", "'NaN' is not a number (leave a missing value empty");
        yield return A("infinity in a numeric variable", Adsl.Replace("T1,T1-003,Active,1,Y,38", "T1,T1-003,Active,1,Y,-Infinity"), "line 4", "variable AGE", "'-Infinity' is infinite");
        yield return A("overflowing number", Adsl.Replace("T1,T1-004,Active,1,Y,66", "T1,T1-004,Active,1,Y,1e400"), "line 5", "variable AGE", "'1e400' overflows");
        yield return A("number beyond 1e100", Adsl.Replace("T1,T1-004,Active,1,Y,66", "T1,T1-004,Active,1,Y,1e300"), "line 5", "variable AGE", "'1e300' is beyond 1e100 in magnitude");
        yield return T("key given twice", "\"kind\": \"responders\",", "\"kind\": \"responders\", \"population\": \"itt\",", "$.population", "the key 'population' is given twice in this object (first on line 4)");
        yield return S("nested key given twice", "\"where\": \"ITTFL = 'Y'\"", "\"where\": \"ITTFL = 'Y'\", \"where\": \"ITTFL = 'N'\"", "$.populations.itt.where", "the key 'where' is given twice");
        yield return new BadInputCase("nesting deeper than 64 levels", ["t1.json", "$.title[0][0]", "nested more than 64 levels deep"])
        {
            TableText = "{ \"id\": \"1\", \"title\": " + new string('[', 70) + new string(']', 70) + " }",
        };
        yield return new BadInputCase("empty table selection", ["--tables: the selection is empty"]) { ExtraArguments = ["--tables", ""] };
        yield return new BadInputCase("table selection of commas only", ["--tables: the selection is empty"]) { ExtraArguments = ["--tables", ",,"] };

        // files and folders
        yield return S("table spec outside the spec folder", "\"t1.json\"", "\"../t1.json\"", "$.tables[0]", "outside the spec's folder", "--allow-folder");
        yield return S("data folder outside the spec folder", "\"folder\": \"data\"", "\"folder\": \"../elsewhere\"", "$.data.folder", "outside the spec's folder");
        yield return new BadInputCase("no data folder anywhere", ["study.json", "$.data", "no data folder: give --data"])
        {
            Study = [("\"folder\": \"data\", ", "")],
        };
        yield return new BadInputCase("no such data folder", ["no such data folder"]) { ExtraArguments = ["--data", "nowhere"] };
        yield return S("dataset file missing", "\"adeff\": \"adeff.csv\"", "\"adeff\": \"adeff2.csv\"", "adeff2.csv", "no such file (dataset 'adeff'");
        yield return new BadInputCase("unknown format", ["unknown format 'pdf'"]) { ExtraArguments = ["--format", "pdf"] };
        yield return new BadInputCase("bad timestamp", ["--timestamp", "not an ISO 8601"]) { ExtraArguments = ["--timestamp", "yesterday"] };
        yield return new BadInputCase("bad control-character choice", ["--control-characters"]) { ExtraArguments = ["--control-characters", "strip"] };

        foreach (var item in DeliverySandboxAndLimits())
        {
            yield return item;
        }
    }
}
