#!/usr/bin/env bash
# Runs every strip-packing instance of the shared benchmark folder through `bench strip` at each given time and
# writes a Markdown table to bench/strip-results.md (or --out FILE).
#
# usage: bench/run-strip-benchmarks.sh [--times 10,60] [--seed N] [--dir DIR] [--jar JAR] [--only a,b] [--out FILE]
#        [--no-overlap-search]   (bottom-left order search alone, without the overlap-minimising search)
# CI smoke: bench/run-strip-benchmarks.sh --times 2 --only fu --out /tmp/strip-smoke.md
set -euo pipefail

here="$(cd "$(dirname "$0")" && pwd)"
root="$(dirname "$here")"
times="10,60"
seed=1
# the shared folder: $SHEETWRIGHT_SHARED, else ../shared beside the repository, else /work/shared
shared="${SHEETWRIGHT_SHARED:-$root/../shared}"
[ -d "$shared" ] || shared=/work/shared
dir="$shared/nesting-benchmarks"
jar="$root/cli/target/sheetwright.jar"
only=""
out="$here/strip-results.md"
java="${JAVA:-/usr/bin/java}"
extra=()

while [ $# -gt 0 ]; do
  case "$1" in
    --times) times="$2"; shift 2 ;;
    --seed) seed="$2"; shift 2 ;;
    --dir) dir="$2"; shift 2 ;;
    --jar) jar="$2"; shift 2 ;;
    --only) only="$2"; shift 2 ;;
    --out) out="$2"; shift 2 ;;
    --overlap-search|--no-overlap-search) extra+=("$1"); shift ;;
    -h|--help) sed -n '2,7p' "$0"; exit 0 ;;
    *) echo "unknown argument: $1" >&2; exit 2 ;;
  esac
done

[ -r "$jar" ] || { echo "jar not found: $jar (build with: mvn -B -q -pl cli -am package -DskipTests)" >&2; exit 2; }
[ -d "$dir" ] || { echo "benchmark folder not found: $dir" >&2; exit 2; }

run=("$java" -jar "$jar" bench strip)

# The 2025 record density per instance, read at run time from section B2 of $dir/README.md (the table of
# "2025 record density" rows: | name | 89.821 % | name | 92.015 % |); nothing of it is kept in this project.
declare -A best=()
while read -r name value; do
  best[$name]="$value"
done < <(awk '
  /^### B2/ { inb2 = 1; next }
  /^### / && inb2 { inb2 = 0 }
  inb2 && /^\|/ {
    n = split($0, c, "|")
    for (i = 2; i + 1 <= n; i += 2) {
      name = c[i]; val = c[i + 1]
      gsub(/[ \t]/, "", name); gsub(/[ \t%]/, "", val)
      if (name != "" && name != "name" && val ~ /^[0-9.]+$/) printf "%s %.5f\n", name, val / 100
    }
  }' "$dir/README.md")
[ "${#best[@]}" -gt 0 ] || echo "warning: no 2025 record densities found in $dir/README.md (section B2)" >&2

IFS=',' read -r -a tlist <<< "$times"
tmp="$(mktemp)"
trap 'rm -f "$tmp"' EXIT

failed=0
for f in "$dir"/*.json; do
  name="$(basename "$f" .json)"
  case "$name" in anchors|published-layouts) continue ;; esac
  if [ -n "$only" ] && [[ ",$only," != *",$name,"* ]]; then continue; fi
  row="$name"
  pieces=""
  for t in "${tlist[@]}"; do
    # a failed run (violations: exit 1; a failure: exit 1 with no line) is recorded in the table, and the
    # remaining instances still run; the script then exits 1
    rc=0
    line="$("${run[@]}" "$f" --time "$t" --seed "$seed" "${extra[@]}")" || rc=$?
    if [[ "$line" != *'"density"'* ]]; then
      echo "$name at ${t}s: no result line (exit $rc)" >&2
      failed=1
      row="$row|0|exit $rc"
      continue
    fi
    [ "$rc" -eq 0 ] || failed=1
    echo "$line" >&2
    pieces="$(sed -E 's/.*"pieces":([0-9]+).*/\1/' <<< "$line")"
    dens="$(sed -E 's/.*"density":([0-9.]+).*/\1/' <<< "$line")"
    viol="$(sed -E 's/.*"violations":([0-9]+).*/\1/' <<< "$line")"
    row="$row|$dens|$viol"
  done
  echo "$pieces|$row" >> "$tmp"
done

{
  echo "# Strip benchmark results"
  echo
  echo "Run $(date -u +%Y-%m-%dT%H:%MZ) on $(nproc) cores (load average at end: $(cut -d' ' -f1-3 /proc/loadavg)), seed $seed,"
  echo "with \`${run[*]} FILE --time S${extra[*]:+ ${extra[*]}}\`. Density = item area / (strip height x length). 'viol.' = violations found by"
  echo "NestChecker (0 = valid layout). Ratio = density / the 2025 record density (section B2 of the benchmark"
  echo "folder's README.md, read at run time)."
  echo
  header="| instance | pieces"
  sep="| --- | ---:"
  for t in "${tlist[@]}"; do header="$header | density ${t}s | viol. | ratio ${t}s"; sep="$sep | ---: | ---: | ---:"; done
  echo "$header | 2025 record |"
  echo "$sep | ---: |"
  declare -A sum cnt
  worst=()
  while IFS='|' read -r pieces name rest; do
    IFS='|' read -r -a vals <<< "$rest"
    b="${best[$name]:-}"
    line="| $name | $pieces"
    for i in "${!tlist[@]}"; do
      d="${vals[$((2*i))]}"; v="${vals[$((2*i+1))]}"
      if [ -n "$b" ]; then
        r="$(awk -v d="$d" -v b="$b" 'BEGIN{printf "%.3f", d/b}')"
        sum[$i]="$(awk -v s="${sum[$i]:-0}" -v r="$r" 'BEGIN{print s+r}')"; cnt[$i]=$(( ${cnt[$i]:-0} + 1 ))
        worst[$i]="$(awk -v w="${worst[$i]:-9}" -v r="$r" 'BEGIN{print (r<w)?r:w}')"
      else
        r="n/a"
      fi
      line="$line | $(awk -v d="$d" 'BEGIN{printf "%.2f %%", 100*d}') | $v | $r"
    done
    echo "$line | ${b:+$(awk -v b="$b" 'BEGIN{printf "%.2f %%", 100*b}')} |"
  done < "$tmp"
  echo
  for i in "${!tlist[@]}"; do
    if [ "${cnt[$i]:-0}" -gt 0 ]; then
      echo "- ${tlist[$i]} s: mean ratio to the 2025 record $(awk -v s="${sum[$i]}" -v c="${cnt[$i]}" 'BEGIN{printf "%.3f", s/c}') over ${cnt[$i]} instances, lowest ${worst[$i]}"
    fi
  done
} > "$out"
echo "wrote $out" >&2
exit "$failed"
