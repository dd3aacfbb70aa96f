#!/usr/bin/env bash
# Explorer latency harness. Opens the real explorer under Xvfb, drags a geometry slider through 300 steps
# (after 60 warm-up steps) at 2,000 and 10,000 points, then does the same with the stock LineChart baseline
# in its own JVM, back to back. Also measures start-up (median of 5) and the heap after the drag (-Xmx256m).
# Ends with one RESULT line per point count.
set -euo pipefail
cd "$(dirname "$0")/../.."
if ! command -v xvfb-run >/dev/null; then
  apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq xvfb
fi
if ! ldconfig -p | grep -q libgtk-3; then
  apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq libgtk-3-0
fi
mvn -q -B -Pbench -DskipTests package
run() { # mode points
  xvfb-run -a -s "-screen 0 1600x1000x24" java -Xmx256m -cp target/linesweep-bench.jar \
    org.linesweep.bench.LatencyMain "$1" "$2" 2>/dev/null | grep '^LATENCY'
}
field() { # line name
  sed -n "s/.* $2=\([^ ]*\).*/\1/p" <<<"$1"
}
summary=()
for points in 2000 10000; do
  explorer=$(run explorer "$points"); echo "$explorer"
  baseline=$(run baseline "$points"); echo "$baseline"
  summary+=("RESULT points=$points plots=4 fx_p50_ms=$(field "$explorer" fx_p50_ms) total_p50_ms=$(field "$explorer" total_p50_ms) total_p95_ms=$(field "$explorer" total_p95_ms) baseline_fx_p50_ms=$(field "$baseline" fx_p50_ms) baseline_total_p50_ms=$(field "$baseline" total_p50_ms) baseline_total_p95_ms=$(field "$baseline" total_p95_ms)")
done
starts=()
# a fresh settings folder each run: an autosave left by earlier use would open the restore dialog and stall
for i in 1 2 3 4 5; do
  line=$(XDG_CONFIG_HOME=$(mktemp -d) xvfb-run -a -s "-screen 0 1600x1000x24" java -Dlinesweep.reportStartup=true \
    -jar target/linesweep.jar 2>/dev/null | grep '^STARTUP')
  starts+=("$(sed -n 's/.*first_curves_ms=\([0-9]*\).*/\1/p' <<<"$line")")
done
echo "STARTUP runs_ms=${starts[*]} median_ms=$(printf '%s\n' "${starts[@]}" | sort -n | sed -n 3p)"
printf '%s\n' "${summary[@]}"
