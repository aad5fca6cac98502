"""Oracle for ExcelNumberDisplay: what a spreadsheet application shows for a number under a
fixed-decimals format. Writes a minimal .xlsx (one numeric cell per case, each with its custom
number format), lets LibreOffice Calc convert it to CSV (CSV export writes the displayed text),
and stores value, format and displayed text in spreadsheet_display.csv beside this script.

Run from this folder: python3 spreadsheet_display.py   (needs soffice on PATH)
"""
import csv
import os
import subprocess
import tempfile
import zipfile

CASES = [
    ("2.675", "0.00"), ("1.005", "0.00"), ("0.125", "0.00"), ("0.375", "0.00"),
    ("0.5", "0"), ("1.5", "0"), ("2.5", "0"), ("-2.5", "0"), ("-0.5", "0"),
    ("0.0005", "0.000"), ("0.00049999", "0.000"), ("0.41207", "0.000"), ("0.0045", "0.000"),
    ("22.349", "0.0"), ("29.05", "0.0"), ("40.25", "0.0"), ("162.85", "0.0"), ("-1.25", "0.0"),
    ("0.30000000000000004", "0.00"), ("1234567.895", "0.00"), ("150", "0"), ("-1", "0.0"),
    ("-0.04", "0.0"), ("-0.0004", "0.000"),
    ("0.25333", "0.0%"), ("0.0005", "0.0%"), ("0.12345", "0.00%"),
]

CONTENT_TYPES = """<?xml version="1.0" encoding="UTF-8" standalone="yes"?>
<Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types">
<Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/>
<Default Extension="xml" ContentType="application/xml"/>
<Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/>
<Override PartName="/xl/worksheets/sheet1.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/>
<Override PartName="/xl/styles.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.styles+xml"/>
</Types>"""
ROOT_RELS = """<?xml version="1.0" encoding="UTF-8" standalone="yes"?>
<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships">
<Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/officeDocument" Target="xl/workbook.xml"/>
</Relationships>"""
WORKBOOK = """<?xml version="1.0" encoding="UTF-8" standalone="yes"?>
<workbook xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" xmlns:r="http://schemas.openxmlformats.org/officeDocument/2006/relationships">
<sheets><sheet name="cases" sheetId="1" r:id="rId1"/></sheets></workbook>"""
WORKBOOK_RELS = """<?xml version="1.0" encoding="UTF-8" standalone="yes"?>
<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships">
<Relationship Id="rId1" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/worksheet" Target="worksheets/sheet1.xml"/>
<Relationship Id="rId2" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/styles" Target="styles.xml"/>
</Relationships>"""


def styles(formats):
    fmts = "".join(f'<numFmt numFmtId="{164 + i}" formatCode="{f}"/>' for i, f in enumerate(formats))
    xfs = '<xf numFmtId="0" fontId="0" fillId="0" borderId="0"/>' + "".join(
        f'<xf numFmtId="{164 + i}" fontId="0" fillId="0" borderId="0" applyNumberFormat="1"/>' for i in range(len(formats)))
    return f"""<?xml version="1.0" encoding="UTF-8" standalone="yes"?>
<styleSheet xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main">
<numFmts count="{len(formats)}">{fmts}</numFmts>
<fonts count="1"><font><sz val="11"/><name val="Calibri"/></font></fonts>
<fills count="1"><fill><patternFill patternType="none"/></fill></fills>
<borders count="1"><border/></borders>
<cellStyleXfs count="1"><xf numFmtId="0" fontId="0" fillId="0" borderId="0"/></cellStyleXfs>
<cellXfs count="{len(formats) + 1}">{xfs}</cellXfs>
</styleSheet>"""


def sheet(formats):
    rows = "".join(
        f'<row r="{r + 1}"><c r="A{r + 1}" s="{formats.index(f) + 1}"><v>{v}</v></c></row>' for r, (v, f) in enumerate(CASES))
    return f"""<?xml version="1.0" encoding="UTF-8" standalone="yes"?>
<worksheet xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main"><sheetData>{rows}</sheetData></worksheet>"""


def main():
    formats = sorted({f for _, f in CASES})
    here = os.path.dirname(os.path.abspath(__file__))
    with tempfile.TemporaryDirectory() as work:
        book = os.path.join(work, "cases.xlsx")
        with zipfile.ZipFile(book, "w") as z:
            z.writestr("[Content_Types].xml", CONTENT_TYPES)
            z.writestr("_rels/.rels", ROOT_RELS)
            z.writestr("xl/workbook.xml", WORKBOOK)
            z.writestr("xl/_rels/workbook.xml.rels", WORKBOOK_RELS)
            z.writestr("xl/styles.xml", styles(formats))
            z.writestr("xl/worksheets/sheet1.xml", sheet(formats))
        subprocess.run(["soffice", "--headless", "--norestore", f"-env:UserInstallation=file://{work}/profile",
                        "--convert-to", "csv:Text - txt - csv (StarCalc):44,34,76,1,,1033,false,true,true", "--outdir", work, book], check=True, capture_output=True)
        version = subprocess.run(["soffice", "--version"], check=True, capture_output=True, text=True).stdout.strip()
        with open(os.path.join(work, "cases.csv"), newline="", encoding="utf-8") as f:
            shown = [row[0] for row in csv.reader(f)]
    with open(os.path.join(here, "spreadsheet_display.csv"), "w", newline="", encoding="utf-8") as f:
        f.write(f"# displayed by {version}\n")
        writer = csv.writer(f, lineterminator="\n")
        writer.writerow(["value", "format", "display"])
        for (value, fmt), text in zip(CASES, shown):
            writer.writerow([value, fmt, text])


if __name__ == "__main__":
    main()
