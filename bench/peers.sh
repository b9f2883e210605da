#!/usr/bin/env bash
# Side by side: `lodestep resonance sweep` against polars, pyarrow and numpy (CSV) and scipy.io.wavfile (WAV), each
# followed by scipy's Welch and spectrogram, process to process; plus the README's speed targets (one hour in a
# 256 MiB heap, CSV ingest, spectral GFLOP/s, small commands against a bare JVM, the launcher's own checks).
# Prints Markdown tables ready for the README's Benchmarks section.
#
#   bench/peers.sh                 # RUNS=5 rounds, 10 million samples, with the one-hour bound (about 10 min idle)
#   RUNS=9 bench/peers.sh          # more rounds
#   QUICK=1 bench/peers.sh         # 1 million samples, 1 round, 3 small-command rounds, no hour: under 2 minutes
#
# Everything it makes stays under target/: the capture files (${BENCH_DIR:-target/bench-peers}) and a private Python
# virtual environment (target/bench-venv, system site packages visible) into which pip installs numpy, scipy,
# polars, pyarrow from the package registry. Nothing is installed globally. Needs Java 17, Maven and python3.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$here"
if [ "${QUICK:-0}" = "1" ]; then
  export RUNS="${RUNS:-1}" FRAMES="${FRAMES:-1000000}" HOUR="${HOUR:-0}" SMALL_RUNS="${SMALL_RUNS:-3}"
else
  export RUNS="${RUNS:-5}" FRAMES="${FRAMES:-10000000}" HOUR="${HOUR:-1}"
fi
export LODESTEP_HOME="$here"
export BENCH_DIR="${BENCH_DIR:-$here/target/bench-peers}"
mkdir -p "$BENCH_DIR"

echo "building (jar, bench classes) ..." >&2
if ! mvn -q -B -o -DskipTests package >"$BENCH_DIR/build.log" 2>&1 \
    && ! mvn -q -B -DskipTests package >"$BENCH_DIR/build.log" 2>&1; then
  cat "$BENCH_DIR/build.log" >&2
  exit 1
fi
./lodestep --version >/dev/null   # first launch after a build: the launcher prepares its class-data archive

venv="$here/target/bench-venv"
if [ ! -x "$venv/bin/python" ]; then
  python3 -m venv --system-site-packages "$venv"
fi
if ! "$venv/bin/python" -c 'import numpy, scipy, polars, pyarrow' 2>/dev/null; then
  echo "installing numpy, scipy, polars, pyarrow into $venv ..." >&2
  for attempt in 1 2 3 4 5; do
    if "$venv/bin/pip" install -q numpy scipy polars pyarrow >"$BENCH_DIR/pip.log" 2>&1; then
      break
    fi
    # A name-lookup failure is the network's hiccup, not the package's: try again; anything else stops here.
    if ! grep -qiE "name or service not known|temporary failure in name resolution|name resolution" "$BENCH_DIR/pip.log" \
        || [ "$attempt" = 5 ]; then
      cat "$BENCH_DIR/pip.log" >&2
      exit 1
    fi
    echo "pip: name lookup failed, retrying ($attempt) ..." >&2
    sleep $((attempt * 3))
  done
fi
exec "$venv/bin/python" "$here/bench/peers.py"
