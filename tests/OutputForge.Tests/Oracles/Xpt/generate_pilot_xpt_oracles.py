"""Per-variable digests of the public CDISC pilot XPT files as pandas reads them (the XPT reader's oracle).

Run from the repository root with the shared data beside it:
    python3 tests/OutputForge.Tests/Oracles/Xpt/generate_pilot_xpt_oracles.py > tests/OutputForge.Tests/Oracles/Xpt/pilot_xpt_oracles.json

Reads each file with pandas.read_sas(format="xport") (pandas 1.5.3, Debian bookworm python3-pandas) and writes, per
variable, its type, label, display format, count of non-missing values and a SHA-256 digest of its values, so the
test can check every value without the data being committed. The digest is over the values in row order, one line
each, joined by "\n": "-" for a missing value (NaN, or a blank character value), "=" followed by the IEEE 754 bits of
the double (16 lower-case hex digits, big-endian) for a number, "=" followed by the text (trailing blanks removed)
for a character value; the lines' UTF-8 bytes are hashed.

One correction is made to pandas' values: pandas reads an IBM zero (eight zero bytes) as 16**-65 =
5.397605346934028e-79, the smallest IBM number, a known open pandas bug (pandas-dev/pandas issue 50670, first
reported as issue 30051). The script maps exactly that value back to 0.0; the smallest IBM number itself does not
occur in these files (it would need a fraction of 0x10000000000000 with exponent byte 0, a value no analysis dataset
holds).
"""
import hashlib
import json
import os
import struct
import sys

import pandas as pd
from pandas.io.sas.sas_xport import XportReader

FOLDER = os.path.join("..", "shared", "data", "cdiscpilot01", "xpt")
FILES = ["adsl", "adae", "adqscibc", "adtte"]


def line(value, numeric):
    if numeric:
        if value != value:  # NaN
            return "-"
        if value == 16.0 ** -65:  # pandas-dev/pandas issue 50670: an IBM zero read as 16**-65
            value = 0.0
        return "=" + struct.pack(">d", float(value)).hex()
    text = value.decode("utf-8").rstrip(" ")
    return "-" if text == "" else "=" + text


def main():
    out = {"source": f"pandas {pd.__version__} read_sas(format=\"xport\")", "files": {}}
    for name in FILES:
        path = os.path.join(FOLDER, name + ".xpt")
        frame = pd.read_sas(path, format="xport")
        fields = XportReader(path).fields
        variables = []
        for field in fields:
            column = field["name"].decode("ascii").strip() if isinstance(field["name"], bytes) else field["name"].strip()
            numeric = field["ntype"] == "numeric"
            lines = [line(v, numeric) for v in frame[column]]
            label = field["label"].decode("latin-1").rstrip(" \0") if isinstance(field["label"], bytes) else field["label"]
            form = field["nform"].decode("ascii").strip() if isinstance(field["nform"], bytes) else field["nform"]
            variables.append({
                "name": column,
                "numeric": numeric,
                "label": label,
                "format": form,
                "present": sum(1 for l in lines if l != "-"),
                "digest": hashlib.sha256("\n".join(lines).encode("utf-8")).hexdigest(),
            })
        out["files"][name] = {"rows": len(frame), "variables": variables}
    json.dump(out, sys.stdout, indent=1)
    sys.stdout.write("\n")


if __name__ == "__main__":
    main()
