#!/usr/bin/env bash
# Nests the duct job fixtures (the ~300-piece fixtures/riverside-300.yaml on 48 x 120 sheets and the ~170-piece
# fixtures/harbour-hall-170.yaml of large sector blanks, gores and transitions on 60 x 120 sheets) through the jar
# with a time limit and prints for each pieces, total part area, usable sheet area (sheet minus margin on every
# side), lower bound ceil(area / usable), target (bound + 1), sheets used, wall seconds and whether the target is
# met; then times a single sheet's worth of duct parts (fixtures/one-sheet-20.yaml, constructive pass only:
# --iterations 0) and prints its wall seconds. Wall times include starting the JVM, developing the patterns and
# writing the DXF/SVG/quote files. --nest-arg passes one more argument to every nest run (e.g. --sheet-search
# to measure the first engine followed by sheet elimination); --job (repeatable) replaces the fixture jobs.
#
# usage: bench/run-job-benchmark.sh [--time 30] [--seed N] [--jar JAR] [--job FILE]... [--single FILE] [--runs N]
#                                   [--nest-arg ARG]...
set -euo pipefail

here="$(cd "$(dirname "$0")" && pwd)"
root="$(dirname "$here")"
time_s=30
seed=1
runs=1
jar="$root/cli/target/sheetwright.jar"
jobs=()
nest_args=()
single="$root/fixtures/one-sheet-20.yaml"
java="${JAVA:-/usr/bin/java}"

while [ $# -gt 0 ]; do
  case "$1" in
    --time) time_s="$2"; shift 2 ;;
    --seed) seed="$2"; shift 2 ;;
    --jar) jar="$2"; shift 2 ;;
    --job) jobs+=("$2"); shift 2 ;;
    --nest-arg) nest_args+=("$2"); shift 2 ;;
    --single) single="$2"; shift 2 ;;
    --runs) runs="$2"; shift 2 ;;
    -h|--help) sed -n '2,12p' "$0"; exit 0 ;;
    *) echo "unknown argument: $1" >&2; exit 2 ;;
  esac
done

[ -r "$jar" ] || { echo "jar not found: $jar (build with: mvn -B -q install -DskipTests)" >&2; exit 2; }
command -v python3 >/dev/null || { echo "python3 is needed to read nest.json" >&2; exit 2; }
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT

# Prints wall seconds of one nest run into OUT; exit code 3 (pieces left unplaced) is reported, not fatal.
run_nest() {
  local out="$1"; shift
  local t0 t1 rc=0
  t0=$(date +%s.%N)
  "$java" -jar "$jar" nest "$@" -o "$out" --seed "$seed" ${nest_args[@]+"${nest_args[@]}"} >"$out.log" 2>&1 || rc=$?
  t1=$(date +%s.%N)
  if [ "$rc" -ne 0 ] && [ "$rc" -ne 3 ]; then
    echo "nest failed (exit $rc):" >&2; cat "$out.log" >&2; exit 1
  fi
  awk -v a="$t0" -v b="$t1" 'BEGIN{printf "%.2f", b-a}'
}

# margin of the job's cutting rules (e.g. "3/8", "0.375", "1-1/4"), read from the job file
margin_of() {
  python3 - "$1" <<'PY'
import re, sys
m = re.search(r'margin:\s*([0-9][0-9./ -]*)', open(sys.argv[1]).read())
if not m:
    print(0); sys.exit()
v = 0.0
for part in m.group(1).strip().replace(' ', '-').split('-'):
    if part:
        n, _, d = part.partition('/')
        v += float(n) / float(d) if d else float(n)
print(v)
PY
}

echo "load: $(uptime | sed 's/.*load average/load average/')"
[ ${#jobs[@]} -gt 0 ] || jobs=("$root/fixtures/riverside-300.yaml" "$root/fixtures/harbour-hall-170.yaml")
for job in "${jobs[@]}"; do
margin=$(margin_of "$job")
for r in $(seq 1 "$runs"); do
  wall=$(run_nest "$work/job$r" "$job" --time "$time_s")
  python3 - "$work/job$r" "$wall" "$margin" "$(basename "$job")" "$time_s" <<'PY'
import json, math, sys
out, wall, margin, name, limit = sys.argv[1], float(sys.argv[2]), float(sys.argv[3]), sys.argv[4], sys.argv[5]
nest = json.load(open(out + "/nest.json"))
pat = json.load(open(out + "/patterns.json"))
pieces = sum(p["count"] * p["qty"] for p in pat["pieces"])
area = nest["totals"]["partArea"]
sheets = nest["sheets"]
w, h = sheets[0]["stock"]["width"], sheets[0]["stock"]["height"]
usable = (w - 2 * margin) * (h - 2 * margin)
bound = math.ceil(area / usable - 1e-9)
target = bound + 1
used = len(sheets)
unplaced = len(nest.get("unplaced") or [])
met = used <= target and unplaced == 0 and wall <= float(limit) + 5
print(f"job {name} --time {limit}: pieces {pieces}, total part area {area:.1f}, usable sheet area {usable:.2f} "
      f"({w:g} x {h:g} minus margin {margin:g}), bound {bound}, target {target}, sheets used {used}"
      f"{', unplaced ' + str(unplaced) if unplaced else ''}, wall {wall:.2f} s, "
      f"target {'met' if met else 'NOT met'} (sheets <= target, nothing unplaced, wall <= time + 5 s)")
PY
done
done
for r in $(seq 1 "$runs"); do
  wall=$(run_nest "$work/single$r" "$single" --iterations 0)
  n=$(python3 -c 'import json,sys; d=json.load(open(sys.argv[1])); print(sum(len(s["parts"]) for s in d["sheets"]), len(d["sheets"]))' "$work/single$r/nest.json")
  echo "single sheet $(basename "$single"): parts ${n% *}, sheets ${n#* }, wall $wall s (constructive pass, whole command)"
done
echo "load: $(uptime | sed 's/.*load average/load average/')"
