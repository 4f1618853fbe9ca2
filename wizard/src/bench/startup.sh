#!/usr/bin/env bash
# Start-up of `wizard/hobwright plan` on the demo job, step by step, against a hello-world JVM
# measured in the same run (interleaved, so both see the same load on the machine).
#
#   wizard/src/bench/startup.sh [RUNS]      # default 15 runs of each variant
#
# Variants: hello world; `wizard --help` (the cost of loading picocli, which a plain plan skips);
# plan with the bare jar (no class-data archive); plan through the launcher with its archive.
# Then the median time at which each phase of the launcher's plan ended (-Dhobwright.timing,
# milliseconds since the process started, the launcher script included).
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../../.." && pwd)"
runs="${1:-15}"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
export HOBWRIGHT_HOME="$work/home"
launcher="$root/wizard/hobwright"
jar="$root/wizard/target/hobwright.jar"
main=org.hobwright.wizard.cli.Main
job="$root/samples/scenario/jobs/metering-pump-gear.json"

"$launcher" --version >/dev/null          # builds the jar and the archive, untimed
mkdir -p "$work/hw"
printf 'public class Hello { public static void main(String[] a) { System.out.println("hello"); } }\n' \
  > "$work/hw/Hello.java"
javac -d "$work/hw" "$work/hw/Hello.java"

ms() { local t0 t1; t0=$(date +%s%N); "$@" >/dev/null 2>&1 || true; t1=$(date +%s%N); echo $(( (t1 - t0) / 1000000 )); }
median() { sort -n | awk '{ v[NR] = $1 } END { print (NR % 2) ? v[(NR + 1) / 2] : int((v[NR / 2] + v[NR / 2 + 1]) / 2) }'; }

names=(hello picocli-help plan-no-cds plan-launcher)
for n in "${names[@]}"; do : > "$work/$n"; done
: > "$work/phases"
for i in $(seq "$runs"); do
  ms java -cp "$work/hw" Hello >> "$work/hello"
  ms java -XX:TieredStopAtLevel=1 -XX:CICompilerCount=1 -cp "$jar" "$main" wizard --help >> "$work/picocli-help"
  ms java -XX:TieredStopAtLevel=1 -XX:CICompilerCount=1 -cp "$jar" "$main" plan "$job" --out "$work/out" >> "$work/plan-no-cds"
  ms "$launcher" plan "$job" --out "$work/out" >> "$work/plan-launcher"
  HOBWRIGHT_JAVA_OPTS=-Dhobwright.timing "$launcher" plan "$job" --out "$work/out" 2>&1 >/dev/null \
    | sed -n 's/^timing \([0-9]*\) ms \(.*\)$/\2\t\1/p' >> "$work/phases" || true
done

echo "java: $(java -version 2>&1 | head -1); $(nproc) cores; load $(cut -d' ' -f1-3 /proc/loadavg); $runs runs"
h=$(median < "$work/hello")
for n in "${names[@]}"; do
  m=$(median < "$work/$n")
  awk -v n="$n" -v m="$m" -v h="$h" 'BEGIN { printf "%-15s %6d ms  %5.1f x hello world\n", n, m, m / h }'
done
echo "phases of the launcher's plan (median end, ms since the process started):"
cut -f1 "$work/phases" | awk '!seen[$0]++' | while read -r phase; do
  printf '  %-20s %6d ms\n' "$phase" "$(awk -F'\t' -v p="$phase" '$1 == p { print $2 }' "$work/phases" | median)"
done
