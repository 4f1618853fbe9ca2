#!/usr/bin/env bash
# Times `wizard/hobwright plan` on the demo job against a hello-world JVM, in the same run, on the
# same machine, interleaved so that both see the same load.
#
#   samples/src/test/sh/bench-plan.sh [RUNS]        # default 20 runs of each
#
# Prints the median, mean and fastest wall time of each command and the ratio of the medians
# (the target is a plan at most 4 times a hello-world JVM start). A third line times the same
# plan as `java -jar wizard/target/hobwright.jar` without the launcher, to show what the
# launcher's own work and JVM options add or save. With hyperfine installed,
# set HYPERFINE=1 to have hyperfine measure the same two commands instead.
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../../../.." && pwd)"
runs="${1:-20}"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
export HOBWRIGHT_HOME="$work/home"      # an empty library: the built-in machines only

job="$root/samples/scenario/jobs/metering-pump-gear.json"
launcher="$root/wizard/hobwright"

# Build the jar first (the launcher does it on first use) so no build is timed.
"$launcher" --version >/dev/null

mkdir -p "$work/hello"
cat > "$work/hello/Hello.java" <<'JAVA'
public class Hello {
    public static void main(String[] args) {
        System.out.println("hello");
    }
}
JAVA
javac -d "$work/hello" "$work/hello/Hello.java"

hello_cmd="java -cp $work/hello Hello"
plan_cmd="$launcher plan $job --out $work/out"
jar_cmd="java -jar $root/wizard/target/hobwright.jar plan $job --out $work/out"

echo "java:     $(java -version 2>&1 | head -1)"
echo "cpu:      $(nproc) cores, $(grep -m1 'model name' /proc/cpuinfo 2>/dev/null | cut -d: -f2 | sed 's/^ //')"
echo "hello:    $hello_cmd"
echo "plan:     $plan_cmd"
echo "jar:      $jar_cmd"
echo "runs:     $runs of each, after 3 warm-up runs"
echo

if [ "${HYPERFINE:-0}" = 1 ] && command -v hyperfine >/dev/null 2>&1; then
  hyperfine --warmup 3 --runs "$runs" -n hello-world "$hello_cmd" -n plan "$plan_cmd" -n jar "$jar_cmd"
  exit 0
fi

ms_now() { date +%s%N; }
time_one() {   # prints the wall time of one run of "$@" in milliseconds
  local t0 t1
  t0=$(ms_now)
  "$@" >/dev/null
  t1=$(ms_now)
  echo $(( (t1 - t0) / 1000000 ))
}

for _ in 1 2 3; do
  time_one java -cp "$work/hello" Hello >/dev/null
  time_one "$launcher" plan "$job" --out "$work/out" >/dev/null
done

: > "$work/hello.ms"
: > "$work/plan.ms"
: > "$work/jar.ms"
for _ in $(seq "$runs"); do
  time_one java -cp "$work/hello" Hello >> "$work/hello.ms"
  time_one "$launcher" plan "$job" --out "$work/out" >> "$work/plan.ms"
  time_one java -jar "$root/wizard/target/hobwright.jar" plan "$job" --out "$work/out" >> "$work/jar.ms"
done

stats() {   # median mean min of a file of numbers
  sort -n "$1" | awk '{ v[NR] = $1; s += $1 } END {
    m = (NR % 2) ? v[(NR + 1) / 2] : (v[NR / 2] + v[NR / 2 + 1]) / 2;
    printf "%.0f %.0f %.0f\n", m, s / NR, v[1] }'
}
read -r hm ha hmin < <(stats "$work/hello.ms")
read -r pm pa pmin < <(stats "$work/plan.ms")
read -r jm ja jmin < <(stats "$work/jar.ms")
printf '%-12s %8s %8s %8s\n' "" "median" "mean" "fastest"
printf '%-12s %6s ms %5s ms %5s ms\n' "hello world" "$hm" "$ha" "$hmin"
printf '%-12s %6s ms %5s ms %5s ms\n' "plan" "$pm" "$pa" "$pmin"
printf '%-12s %6s ms %5s ms %5s ms\n' "java -jar" "$jm" "$ja" "$jmin"
awk -v p="$pm" -v h="$hm" 'BEGIN { printf "plan / hello world (medians): %.2f (target at most 4)\n", p / h }'
