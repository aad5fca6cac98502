using System.Text.RegularExpressions;
using DocumentFormat.OpenXml.Packaging;

namespace OutputForge.Rendering.Excel;

/// <summary>
/// ClosedXML 0.95.4 writes the rows repeated on each printed page as "'Sheet'!1:6"; LibreOffice
/// ignores that relative form and prints the titles on the first page only. Excel itself writes
/// "'Sheet'!$1:$6" (ECMA-376 Part 1, 18.2.5 definedName, _xlnm.Print_Titles), which both accept,
/// so the saved package is rewritten to that form.
/// </summary>
public static partial class ExcelPrintTitles
{
    private const string DefinedName = "_xlnm.Print_Titles";

    [GeneratedRegex(@"!\$?(\d+):\$?(\d+)$")]
    private static partial Regex RowRange();

    public static void MakeAbsolute(SpreadsheetDocument document)
    {
        var names = document.WorkbookPart?.Workbook.DefinedNames;
        if (names is null)
            return;
        foreach (var name in names.Elements<DocumentFormat.OpenXml.Spreadsheet.DefinedName>())
        {
            if (name.Name?.Value == DefinedName)
                name.Text = RowRange().Replace(name.Text, "!$$$1:$$$2");
        }
        document.WorkbookPart!.Workbook.Save();
    }
}
