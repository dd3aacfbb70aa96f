#!/usr/bin/env bash
# Builds the benchmark jar and runs the JMH benchmarks; ends with one RESULT line per line type.
# Usage: bash src/bench/jmh.sh [JMH include regex]
set -euo pipefail
cd "$(dirname "$0")/../.."
mvn -q -B -Pbench -DskipTests package
java -jar target/linesweep-bench.jar "$@"
