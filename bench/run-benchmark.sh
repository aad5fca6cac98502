#!/usr/bin/env bash
# Speed-and-memory benchmark of the outputforge CLI against the targets of docs/performance.md.
# Publishes the CLI in Release (ReadyToRun), then measures wall clock and peak resident memory (GNU time -v) of
#   (a) the small demo package (`demo`, 18 tables), process start included, several runs (min and median),
#       and `run` of its tables without Fisher's exact r x c test (16 of them);
#   (b) writing the pooled study (`demo --size pooled --no-tables`: 20,000 subjects, about 2.06 million BDS
#       records, 200,000 adverse events, 60 table specs);
#   (c) `run` of the 58 pooled tables that do not use Fisher's exact r x c test, every output
#       (docx, xlsx, txt, combined, results.json, manifest), with --verbose stage timings;
#   (d) unless the third argument is "skip-fisher": `run` of all 60 tables (adds 14.1.2.1 disposition and
#       14.1.3.1 demographics, whose Fisher's exact r x c tests take minutes at this size);
#   (e) ingest by data format: the pooled study written also as XPT version 5 and Dataset-JSON 1.1
#       (`demo --data-format xpt|json`), and the data stage of `run --tables 14.1.1.1` (which reads every
#       dataset) on each of CSV, XPT and Dataset-JSON, in MB/s of the files' bytes.
# Usage: bench/run-benchmark.sh [SUBJECTS] [RUNS] [skip-fisher]   (defaults 20000, 3); run from anywhere.
set -euo pipefail

subjects="${1:-20000}"
runs="${2:-3}"
fisher="${3:-with-fisher}"
timestamp="2026-12-01T00:00:00Z"
cd "$(dirname "$0")/.."

if [ ! -x /usr/bin/time ]; then
    echo "GNU time is missing: installing it (apt-get install -y time)" >&2
    apt-get install -y time >/dev/null
fi

work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
bin="$work/bin"

echo "publishing the CLI in Release (ReadyToRun)" >&2
dotnet publish src/OutputForge.Cli/OutputForge.Cli.csproj -c Release -r linux-x64 --self-contained false -o "$bin" -nologo -v quiet >"$work/build.log" 2>&1 \
    || { cat "$work/build.log" >&2; exit 1; }
cli="$bin/outputforge"

# Runs a command under GNU time; prints "<wall s> <peak RSS MB> <user+sys CPU s>"; its stderr goes to $work/last.err.
measure() {
    /usr/bin/time -v -o "$work/time.txt" "$@" >"$work/last.out" 2>"$work/last.err" \
        || { cat "$work/last.err" >&2; exit 1; }
    awk -F': ' '
        /Elapsed \(wall clock\) time/ { n = split($2, p, ":"); s = 0; for (i = 1; i <= n; i++) s = s * 60 + p[i]; wall = s }
        /Maximum resident set size/ { rss = $2 / 1024 }
        /User time/ { cpu += $2 }
        /System time/ { cpu += $2 }
        END { printf "%.2f %.0f %.2f\n", wall, rss, cpu }' "$work/time.txt"
}

median() { sort -n | awk '{ v[NR] = $1 } END { print (NR % 2) ? v[(NR + 1) / 2] : (v[NR / 2] + v[NR / 2 + 1]) / 2 }'; }
status() { awk -v v="$1" -v t="$2" 'BEGIN { print (v + 0 <= t + 0) ? "met" : "not met" }'; }

echo "(a) small demo package, $runs runs" >&2
: >"$work/small.txt"
for i in $(seq "$runs"); do
    rm -rf "$work/small"
    measure "$cli" demo --out "$work/small" --timestamp "$timestamp" --quiet >>"$work/small.txt"
done
small_wall_min="$(cut -d' ' -f1 "$work/small.txt" | sort -n | head -1)"
small_wall_median="$(cut -d' ' -f1 "$work/small.txt" | median)"
small_rss_max="$(cut -d' ' -f2 "$work/small.txt" | sort -n | tail -1)"
small_cpu_median="$(cut -d' ' -f3 "$work/small.txt" | median)"
small_tables="$(ls "$work/small/output"/*.docx 2>/dev/null | wc -l)"

# The same small package without its two Fisher r x c tables (14.1.2 disposition, 14.1.3 demographics), as `run`.
small_without_fisher="14.1.1,14.2.*,14.3.*"
: >"$work/small13.txt"
for i in $(seq "$runs"); do
    rm -rf "$work/small13"
    measure "$cli" run --spec "$work/small/specs/demo/study.json" --data "$work/small/data" --out "$work/small13" \
        --timestamp "$timestamp" --quiet --tables "$small_without_fisher" >>"$work/small13.txt"
done
small13_wall_min="$(cut -d' ' -f1 "$work/small13.txt" | sort -n | head -1)"
small13_wall_median="$(cut -d' ' -f1 "$work/small13.txt" | median)"
small13_cpu_median="$(cut -d' ' -f3 "$work/small13.txt" | median)"
small13_tables="$(ls "$work/small13"/*.docx 2>/dev/null | wc -l)"

echo "(b) writing the pooled study ($subjects subjects)" >&2
read -r gen_wall gen_rss gen_cpu < <(measure "$cli" demo --out "$work/big" --size pooled --subjects "$subjects" --no-tables)
spec="$work/big/specs/pooled/study.json"
csv_bytes="$(cat "$work/big/data"/*.csv | wc -c)"
bds_rows="$(($(wc -l <"$work/big/data/adeff.csv") - 1))"
ae_rows="$(($(wc -l <"$work/big/data/adae.csv") - 1))"

without_fisher="14.1.1.*,14.1.2.2,14.1.3.2,14.1.3.3,14.1.3.4,14.2.*,14.3.*"
echo "(c) run of the 58 tables without Fisher's exact r x c, every output" >&2
read -r run_wall run_rss run_cpu < <(measure "$cli" run --spec "$spec" --data "$work/big/data" --out "$work/big/out58" \
    --format docx,xlsx,txt --combined --timestamp "$timestamp" --verbose --tables "$without_fisher")
cp "$work/last.err" "$work/run58.err"
run_tables="$(ls "$work/big/out58"/*.docx | grep -vc all-tables || true)"

full_wall="not run"; full_rss="not run"; full_cpu="not run"; full_tables=0; s=""; mb=""

if [ "$fisher" != "skip-fisher" ]; then
    echo "(d) run of all 60 tables, every output (Fisher's exact r x c included: minutes)" >&2
    read -r full_wall full_rss full_cpu < <(measure "$cli" run --spec "$spec" --data "$work/big/data" --out "$work/big/out60" \
        --format docx,xlsx,txt --combined --timestamp "$timestamp" --verbose)
    cp "$work/last.err" "$work/run60.err"
    full_tables="$(ls "$work/big/out60"/*.docx | grep -vc all-tables || true)"
    s=" s"; mb=" MB"
fi

echo "(e) ingest of the pooled study as CSV, XPT and Dataset-JSON" >&2
for format in xpt json; do
    "$cli" demo --out "$work/big-$format" --size pooled --subjects "$subjects" --no-tables --data-format "$format" --quiet
done
ingest_rows=""
for format in csv xpt json; do
    folder="$work/big/data"; [ "$format" != csv ] && folder="$work/big-$format/data"
    bytes="$(cat "$folder"/*."$format" | wc -c)"
    read -r _ format_rss _ < <(measure "$cli" run --spec "${folder%/data}/specs/pooled/study.json" --data "$folder" \
        --out "$work/ingest-$format" --format txt --timestamp "$timestamp" --verbose --tables 14.1.1.1)
    ms="$(sed -n 's/.*data: .* read in \([0-9]*\) ms.*/\1/p' "$work/last.err" | head -1)"
    rate="$(awk -v b="$bytes" -v ms="$ms" 'BEGIN { printf "%.1f", b / 1e6 / (ms / 1000) }')"
    ingest_rows="$ingest_rows| $format ingest >= 150 MB/s (\`run --tables 14.1.1.1\`, data stage) | $rate MB/s ($bytes bytes in $ms ms); peak RSS $format_rss MB | | $(awk -v v="$rate" 'BEGIN { print (v + 0 >= 150) ? "met" : "not met" }') |
"
done

data_ms="$(sed -n 's/.*data: .* read in \([0-9]*\) ms.*/\1/p' "$work/run58.err" | head -1)"
ingest="$(awk -v b="$csv_bytes" -v ms="$data_ms" 'BEGIN { printf "%.1f", b / 1e6 / (ms / 1000) }')"

echo
echo "## outputforge benchmark ($(date -u +%Y-%m-%dT%H:%MZ), $(nproc) cores, load average before: $(cut -d' ' -f1-3 /proc/loadavg))"
echo
echo "Pooled study: $subjects subjects, $bds_rows BDS records (adeff), $ae_rows adverse events (adae), $csv_bytes bytes of CSV."
echo
echo "| Target | Measured | CPU (user+sys) | Status |"
echo "|---|---|---|---|"
echo "| (a) small demo ($small_tables tables) <= 2 s wall incl. process start | min $small_wall_min s, median $small_wall_median s of $runs; peak RSS $small_rss_max MB | median $small_cpu_median s | $(status "$small_wall_min" 2) |"
echo "| (a) small demo without its 2 Fisher r x c tables ($small13_tables tables, \`run\`) | min $small13_wall_min s, median $small13_wall_median s of $runs | median $small13_cpu_median s | $(status "$small13_wall_min" 2) |"
echo "| (b) writing the pooled study | $gen_wall s; peak RSS $gen_rss MB | $gen_cpu s | (no target) |"
echo "| (c) pooled package without Fisher r x c ($run_tables tables, every output) <= 8 s | $run_wall s | $run_cpu s | $(status "$run_wall" 8) |"
echo "| (c) peak memory <= 1.5 GB (1536 MB) | $run_rss MB | | $(status "$run_rss" 1536) |"
echo "| (d) whole pooled package ($full_tables tables, every output) <= 8 s | $full_wall$s | $full_cpu$s | $( [ "$full_wall" = "not run" ] && echo "not run" || status "$full_wall" 8) |"
echo "| (d) peak memory <= 1.5 GB | $full_rss$mb | | $( [ "$full_rss" = "not run" ] && echo "not run" || status "$full_rss" 1536) |"
echo "| CSV ingest >= 100 MB/s (run (c), data stage) | $ingest MB/s ($csv_bytes bytes in $data_ms ms) | | $(awk -v v="$ingest" 'BEGIN { print (v + 0 >= 100) ? "met" : "not met" }') |"
printf '%s' "$ingest_rows"
echo
echo "Stage timings (c): $(grep -m1 'specs: ' "$work/run58.err" || true) | $(grep -m1 'data: ' "$work/run58.err" || true) | $(grep -m1 'tables: ' "$work/run58.err" || true)"
echo
echo "Slowest tables (c):"
grep 'table .*: built in' "$work/run58.err" | sed 's/.*table \(.*\): built in \([0-9]*\) ms.*/\2 ms \1/' | sort -rn | head -10
if [ -f "$work/run60.err" ]; then
    echo
    echo "Stage timings (d): $(grep -m1 'data: ' "$work/run60.err" || true) | $(grep -m1 'tables: ' "$work/run60.err" || true)"
    echo "Slowest tables (d):"
    grep 'table .*: built in' "$work/run60.err" | sed 's/.*table \(.*\): built in \([0-9]*\) ms.*/\2 ms \1/' | sort -rn | head -5
fi
