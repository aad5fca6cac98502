#!/usr/bin/env bash
# Speed-and-memory benchmark of the outputforge CLI (see docs/performance.md).
# Builds the CLI in Release, then measures wall clock and peak resident memory (GNU time -v) of
#   (a) the small demo package, process start included, several runs (min and median);
#   (b) a scaled invented study (demo --subjects N), then `run --verbose` on its data to read the
#       stage timings (data reading, table building) and compute the CSV ingest throughput.
# Usage: bench/run-benchmark.sh [SUBJECTS] [RUNS] [LOAD_COPIES]   (defaults 20000, 3, 0); run from anywhere.
# LOAD_COPIES > 0 passes --load-copies to the scaled demo: extra copies of the itch-score records in
# adeff.csv (19 at 20000 subjects gives about 1.9 million BDS rows) that no demo table reads.
set -euo pipefail

subjects="${1:-20000}"
runs="${2:-3}"
load_copies="${3:-0}"
timestamp="2026-12-01T00:00:00Z"
cd "$(dirname "$0")/.."

if [ ! -x /usr/bin/time ]; then
    echo "GNU time is missing: installing it (apt-get install -y time)" >&2
    apt-get install -y time >/dev/null
fi

work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
bin="$work/bin"

echo "building the CLI in Release" >&2
dotnet build src/OutputForge.Cli/OutputForge.Cli.csproj -c Release -o "$bin" -nologo -v quiet >"$work/build.log" 2>&1 \
    || { cat "$work/build.log" >&2; exit 1; }
cli="$bin/outputforge"

# Runs a command under GNU time; prints "<wall seconds> <peak RSS MB>"; its stderr goes to $work/last.err.
measure() {
    /usr/bin/time -v -o "$work/time.txt" "$@" >"$work/last.out" 2>"$work/last.err" \
        || { cat "$work/last.err" >&2; exit 1; }
    awk -F': ' '
        /Elapsed \(wall clock\) time/ { n = split($2, p, ":"); s = 0; for (i = 1; i <= n; i++) s = s * 60 + p[i]; wall = s }
        /Maximum resident set size/ { rss = $2 / 1024 }
        END { printf "%.2f %.0f\n", wall, rss }' "$work/time.txt"
}

median() { sort -n | awk '{ v[NR] = $1 } END { print (NR % 2) ? v[(NR + 1) / 2] : (v[NR / 2] + v[NR / 2 + 1]) / 2 }'; }

echo "(a) small demo package, $runs runs" >&2
: >"$work/small.txt"
for i in $(seq "$runs"); do
    rm -rf "$work/small"
    measure "$cli" demo --out "$work/small" --timestamp "$timestamp" --quiet >>"$work/small.txt"
done
small_wall_min="$(cut -d' ' -f1 "$work/small.txt" | sort -n | head -1)"
small_wall_median="$(cut -d' ' -f1 "$work/small.txt" | median)"
small_rss_max="$(cut -d' ' -f2 "$work/small.txt" | sort -n | tail -1)"
small_tables="$(ls "$work/small/output"/*.docx 2>/dev/null | wc -l)"

echo "(b) scaled study: demo --subjects $subjects --load-copies $load_copies (writes the data and runs every demo table)" >&2
read -r big_demo_wall big_demo_rss < <(measure "$cli" demo --out "$work/big" --subjects "$subjects" --load-copies "$load_copies" --timestamp "$timestamp" --verbose)
cp "$work/last.err" "$work/big-demo.err"
spec="$(find "$work/big/specs" -name study.json | head -1)"
read -r big_run_wall big_run_rss < <(measure "$cli" run --spec "$spec" --data "$work/big/data" --out "$work/big/rerun" --timestamp "$timestamp" --verbose)
cp "$work/last.err" "$work/big-run.err"

csv_bytes="$(cat "$work/big/data"/*.csv | wc -c)"
data_ms="$(sed -n 's/.*data: .* read in \([0-9]*\) ms.*/\1/p' "$work/big-run.err" | head -1)"
tables_line="$(grep -m1 'tables: ' "$work/big-run.err" || true)"
specs_line="$(grep -m1 'specs: ' "$work/big-run.err" || true)"
big_tables="$(ls "$work/big/rerun"/*.docx 2>/dev/null | wc -l)"
if [ -n "$data_ms" ] && [ "$data_ms" -gt 0 ]; then
    ingest="$(awk -v b="$csv_bytes" -v ms="$data_ms" 'BEGIN { printf "%.1f", b / 1e6 / (ms / 1000) }')"
else
    ingest="n/a (no data timing line)"
fi

echo
echo "## outputforge benchmark ($(date -u +%Y-%m-%dT%H:%MZ), $(nproc) cores)"
echo
echo "| Measurement | Value |"
echo "|---|---|"
echo "| (a) small demo package ($small_tables tables), wall, min of $runs | $small_wall_min s |"
echo "| (a) small demo package, wall, median of $runs | $small_wall_median s |"
echo "| (a) small demo package, peak RSS (max of runs) | $small_rss_max MB |"
echo "| (b) demo --subjects $subjects --load-copies $load_copies (write data + all tables), wall | $big_demo_wall s |"
echo "| (b) demo --subjects $subjects --load-copies $load_copies, peak RSS | $big_demo_rss MB |"
echo "| (b) run on the scaled data ($big_tables tables, every output), wall | $big_run_wall s |"
echo "| (b) run on the scaled data, peak RSS | $big_run_rss MB |"
echo "| (b) CSV data: bytes | $csv_bytes |"
echo "| (b) CSV ingest throughput | $ingest MB/s |"
echo
echo "Dataset rows (run): $(grep -m1 'read .* datasets from' "$work/big-run.err" | sed 's/.*: //')"
echo "Stage timings (run): $specs_line | $(grep -m1 'data: ' "$work/big-run.err" || true) | $tables_line"
echo
echo "Slowest tables (run --verbose):"
grep 'table .*: built in' "$work/big-run.err" | sed 's/.*table \(.*\): built in \([0-9]*\) ms.*/\2 ms \1/' | sort -rn | head -10
