#!/usr/bin/env bash
# Benchmarks of the installed-style CLI, side by side in one run (record the figures in the README):
#  1. `dawn-census --help` start-up (median of 7), beside `node -e ''` on the same machine;
#  2. deriving a 20,000-object catalog with 1000 draws (four readings, the default, and one reading,
#     the notebook's work), beside the numpy + astropy notebook way in ../shared/bench (same
#     catalog, same draws), alternating, five rounds unless told otherwise.
# Needs /usr/bin/python3 with numpy and astropy. Usage: scripts/bench-cli.sh [rows] [draws] [rounds]
# (rounds: 5 unless given. The host's speed drifts by up to ±30 % within minutes, so one round says
# little; read the medians printed at the end, and run more rounds on a noisy host).
set -euo pipefail
root="$(cd "$(dirname "$0")/.." && pwd)"
bench="$root/../shared/bench"
rows="${1:-20000}"; draws="${2:-1000}"; rounds="${3:-5}"
work="$(mktemp -d)"; trap 'rm -rf "$work"' EXIT
node "$root/scripts/build-cli.mjs" --if-stale

median() { sort -n | awk '{a[NR]=$1} END {print (NR % 2) ? a[(NR+1)/2] : (a[NR/2] + a[NR/2+1]) / 2}'; }
secs() { local t0 t1; t0=$(date +%s.%N); "$@" >/dev/null 2>&1; t1=$(date +%s.%N); echo "$t1 - $t0" | bc -l; }

echo "load average: $(cut -d' ' -f1-3 /proc/loadavg); cores: $(nproc)"
help=$(for i in 1 2 3 4 5 6 7; do secs node "$root/bin/dawn-census.js" --help; done | median)
bare=$(for i in 1 2 3 4 5 6 7; do secs node -e ''; done | median)
printf 'dawn-census --help: %.3f s (median of 7); node -e "" alone: %.3f s\n' "$help" "$bare"
# CPU seconds (user + system) depend less on other load than wall time does.
cpu() { /usr/bin/time -f '%U %S' "$@" 2>&1 >/dev/null | tail -1 | awk '{print $1 + $2}'; }
printf 'CPU seconds: --help %s; node -e "" %s\n' "$(for i in 1 2 3 4 5; do cpu node "$root/bin/dawn-census.js" --help; done | median)" "$(for i in 1 2 3 4 5; do cpu node -e ''; done | median)"

/usr/bin/python3 "$bench/make_synthetic.py" "$rows" "$work/syn.csv" >/dev/null
# The notebook does the work of one reading (the standard one); the default derivation does the
# four built-in readings. Both are timed, each beside the notebook.
printf 'readings: { use: [standard] }\n' > "$work/one.yaml"
r4=(); r1=()
for round in $(seq 1 "$rounds"); do
  d=$(secs node "$root/bin/dawn-census.js" derive "$work/syn.csv" -o "$work/syn.parquet" --draws "$draws" --quiet)
  p=$(secs /usr/bin/python3 "$bench/numpy_baseline.py" "$work/syn.csv" "$work/np.npz" "$draws")
  d1=$(secs node "$root/bin/dawn-census.js" derive "$work/syn.csv" -c "$work/one.yaml" -o "$work/one.parquet" --draws "$draws" --quiet)
  printf 'round %d: %d objects x %d draws: derive (four readings) %.1f s, ratio %.2fx; derive (one reading, the same work) %.1f s, ratio %.2fx; numpy notebook %.1f s\n' \
    "$round" "$rows" "$draws" "$d" "$(echo "$p / $d" | bc -l)" "$d1" "$(echo "$p / $d1" | bc -l)" "$p"
  r4+=("$(echo "$p / $d" | bc -l)"); r1+=("$(echo "$p / $d1" | bc -l)")
done
printf 'median ratio over %d rounds: four readings %.2fx, one reading %.2fx\n' "$rounds" \
  "$(printf '%s\n' "${r4[@]}" | median)" "$(printf '%s\n' "${r1[@]}" | median)"
