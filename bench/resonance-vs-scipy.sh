#!/usr/bin/env bash
# Lodestep's sweep analysis (read + Welch + spectrogram + response curve + bands) against numpy/scipy's Welch and
# spectrogram on the same 10-million-sample CSV and WAV, process to process, in one run; prints the ratio.
# Needs python3 with numpy and scipy (Debian: apt-get install python3-numpy python3-scipy).
# Usage: bench/resonance-vs-scipy.sh [RUNS]   (data goes to ${BENCH_DIR:-/tmp/lodestep-bench}, ~200 MB)
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
jar="${LODESTEP_JAR:-$here/target/lodestep.jar}"
if [ ! -f "$jar" ]; then
  (cd "$here" && mvn -q -B -o -DskipTests package)
fi
# The launcher's default JVM options (see ./lodestep), so the figures are what a user's command costs.
export JAVA_OPTS="${JAVA_OPTS--XX:TieredStopAtLevel=1}"
python3 "$here/bench/resonance_bench.py" "$jar" "${BENCH_DIR:-/tmp/lodestep-bench}" "${1:-3}"
