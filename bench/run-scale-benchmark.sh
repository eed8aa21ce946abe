#!/usr/bin/env bash
# Nests a generated job of 10,000 small pieces (an invented scenario: 3 in and 4 in collars, 5 x 4 reducer blanks,
# 3 in elbow gores on 48 x 120 sheets) through the jar with a time limit, under /usr/bin/time, and prints pieces,
# placed, sheets, wall seconds, peak memory (resident set) and whether the wall time stayed within --time + 5 s.
# The machine's load average is printed too: wall times on a busy machine are noisy.
#
# usage: bench/run-scale-benchmark.sh [--time 20] [--seed N] [--jar JAR] [--xmx SIZE] [--threads N]
set -euo pipefail

here="$(cd "$(dirname "$0")" && pwd)"
root="$(dirname "$here")"
time_s=20
seed=1
jar="$root/cli/target/sheetwright.jar"
java="${JAVA:-/usr/bin/java}"
xmx=""
threads=""

while [ $# -gt 0 ]; do
  case "$1" in
    --time) time_s="$2"; shift 2 ;;
    --seed) seed="$2"; shift 2 ;;
    --jar) jar="$2"; shift 2 ;;
    --xmx) xmx="$2"; shift 2 ;;
    --threads) threads="$2"; shift 2 ;;
    -h|--help) sed -n '2,7p' "$0"; exit 0 ;;
    *) echo "unknown argument: $1" >&2; exit 2 ;;
  esac
done

[ -r "$jar" ] || { echo "jar not found: $jar (build with: mvn -B -q -DskipTests package)" >&2; exit 2; }
[ -x /usr/bin/time ] || { echo "/usr/bin/time is needed for the peak memory (apt-get install time)" >&2; exit 2; }
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT

# 4000 + 3000 + 2000 single-piece fittings and 200 elbows of 5 gores: 10,000 pieces
cat > "$work/scale-10000.yaml" <<'YAML'
version: 1
job: Scale test, 10000 small pieces
units: in
material: {type: galvanized, gauge: 26}
dimensions: inside
allowances: {seam: none, ends: none, notch: false}
cutting: {process: plasma, kerf: 0.06, gap: 1/4, margin: 3/8, rotation: 90}
stock:
  sheets:
    - {size: 48x120, cost: 54.00}
fittings:
  - {id: COL3, type: pipe, diameter: 3, length: 2, qty: 4000}
  - {id: COL4, type: pipe, diameter: 4, length: 3, qty: 3000}
  - {id: RD5-4, type: reducer, large: 5, small: 4, height: 3, qty: 2000}
  - {id: EL3-90, type: elbow, diameter: 3, angle: 90, qty: 200}
YAML

jvm=("$java")
[ -n "$xmx" ] && jvm+=("-Xmx$xmx")
args=(nest "$work/scale-10000.yaml" -o "$work/out" --time "$time_s" --seed "$seed")
[ -n "$threads" ] && args+=(--threads "$threads")
load="$(cut -d' ' -f1-3 /proc/loadavg)"
set +e
/usr/bin/time -v -o "$work/time.txt" "${jvm[@]}" -jar "$jar" "${args[@]}" > "$work/stdout.txt" 2> "$work/stderr.txt"
rc=$?
set -e
if [ "$rc" -ne 0 ] && [ "$rc" -ne 3 ]; then
  echo "nest failed with exit $rc:" >&2
  cat "$work/stderr.txt" >&2
  exit 1
fi
python3 - "$work" "$time_s" "$load" "$rc" "${xmx:-default}" <<'PY'
import json, re, sys
work, limit, load, rc, xmx = sys.argv[1], float(sys.argv[2]), sys.argv[3], int(sys.argv[4]), sys.argv[5]
t = open(work + "/time.txt").read()
m = re.search(r"Elapsed \(wall clock\) time \(h:mm:ss or m:ss\): (?:(\d+):)?(\d+):([\d.]+)", t)
wall = (int(m.group(1) or 0) * 3600) + int(m.group(2)) * 60 + float(m.group(3))
rss = int(re.search(r"Maximum resident set size \(kbytes\): (\d+)", t).group(1)) / 1024
cpu = re.search(r"Percent of CPU this job got: (\d+)%", t).group(1)
nest = json.load(open(work + "/out/nest.json"))
sheets = nest["sheets"] if isinstance(nest.get("sheets"), list) else []
placed = sum(len(s.get("parts", [])) for s in sheets)
unplaced = len(nest.get("unplaced", []))
print(f"pieces: {placed + unplaced}, placed: {placed}, unplaced: {unplaced}, sheets: {len(sheets)}")
print(f"time limit: {limit:g} s, wall: {wall:.1f} s (within limit + 5 s: {'yes' if wall <= limit + 5 else 'NO'}),"
      f" CPU {cpu} % of one core, peak memory (RSS): {rss:.0f} MB, heap: {xmx}, exit {rc}")
print(f"load average before the run (1, 5, 15 min): {load}")
PY
