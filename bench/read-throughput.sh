#!/usr/bin/env bash
# Reader throughput of Lodestep's CSV and WAV readers on a generated 10-million-sample sweep recording.
#
#   bench/read-throughput.sh            # JMH (in-process) + fresh-process runs + numpy/scipy reading the same files
#   HOUR=1 bench/read-throughput.sh     # also stream one hour of 51.2 kS/s CSV through the reader with -Xmx256m
#   FRAMES=1000000 RUNS=3 bench/read-throughput.sh   # smaller and quicker
#
# Data go to a temporary folder that is removed at the end; nothing is committed. Needs Java 17, Maven (offline is
# fine once dependencies are cached) and, for the reference lines, python3 with numpy and scipy.
set -euo pipefail
cd "$(dirname "$0")/.."
FRAMES=${FRAMES:-10000000}
RUNS=${RUNS:-5}

echo "building test classes ..." >&2
mkdir -p target
mvn -q -B -o test-compile >target/bench-build.log 2>&1 || { cat target/bench-build.log; exit 1; }
mvn -q -B -o dependency:build-classpath -Dmdep.outputFile=target/bench-classpath.txt -Dmdep.includeScope=test \
    >target/bench-build.log 2>&1 || { cat target/bench-build.log; exit 1; }
CP="target/classes:target/test-classes:$(cat target/bench-classpath.txt)"

work=$(mktemp -d "${TMPDIR:-/tmp}/lodestep-read-bench.XXXXXX")
trap 'rm -rf "$work"' EXIT
echo "generating $FRAMES frames of CSV and WAV in $work ..." >&2
java -cp "$CP" org.lodestep.bench.BenchData "$work" "$FRAMES"
ls -l "$work" >&2

echo "machine: $(nproc) cores, $(awk '/MemTotal/ {printf "%.0f GiB", $2/1048576}' /proc/meminfo), load average $(cut -d' ' -f1-3 /proc/loadavg)"
echo "java: $(java -version 2>&1 | head -n1)"

echo
echo "== JMH, in-process, warmed up (single-shot full reads, 7 measured) =="
java -cp "$CP" org.openjdk.jmh.Main ReaderThroughputBenchmark -p frames="$FRAMES" -rf json -rff "$work/jmh.json" \
    > "$work/jmh.log" 2>&1 || { cat "$work/jmh.log"; exit 1; }
python3 - "$work/jmh.json" "$FRAMES" <<'PY'
import json, statistics, sys
runs = json.load(open(sys.argv[1])); frames = int(sys.argv[2])
for r in runs:
    ms = [x for fork in r["primaryMetric"]["rawData"] for x in fork]
    med = statistics.median(ms)
    print(f'{r["benchmark"].rsplit(".", 1)[1]:8s} median {med:8.1f} ms  -> {frames / med * 1e3 / 1e6:7.1f} M samples/s'
          f'  (min {min(ms):.1f} ms, max {max(ms):.1f} ms)')
PY

echo
echo "== fresh JVM per read (java -Xmx256m, process to process, median of $RUNS) =="
for kind in csv wav; do
  for i in $(seq "$RUNS"); do
    /usr/bin/time -f "%e %U %S" -o "$work/time.txt" java -Xmx256m -cp "$CP" org.lodestep.bench.ReadOnce "$work/sweep.$kind" >/dev/null
    cat "$work/time.txt" >> "$work/java-$kind.txt"
  done
done

if python3 -c 'import numpy, scipy' 2>/dev/null; then
  for i in $(seq "$RUNS"); do
    /usr/bin/time -f "%e %U %S" -o "$work/time.txt" python3 -c "
import numpy as np, sys
d = np.loadtxt(sys.argv[1], delimiter=',', comments='#', skiprows=7)
assert d.shape[0] == $FRAMES" "$work/sweep.csv"
    cat "$work/time.txt" >> "$work/numpy-csv.txt"
    /usr/bin/time -f "%e %U %S" -o "$work/time.txt" python3 -c "
import numpy as np, sys
from scipy.io import wavfile
rate, d = wavfile.read(sys.argv[1]); x = d.astype(np.float64) / 32768.0
assert x.shape[0] == $FRAMES" "$work/sweep.wav"
    cat "$work/time.txt" >> "$work/numpy-wav.txt"
  done
fi

python3 - "$work" "$FRAMES" <<'PY'
import os, statistics, sys
work, frames = sys.argv[1], int(sys.argv[2])
rows = [("Lodestep CSV", "java-csv"), ("numpy.loadtxt CSV", "numpy-csv"),
        ("Lodestep WAV", "java-wav"), ("scipy.io.wavfile WAV", "numpy-wav")]
print(f'{"reader":22s} {"wall s":>8s} {"cpu s":>8s} {"M samples/s (wall)":>20s}')
med = {}
for label, name in rows:
    path = os.path.join(work, name + ".txt")
    if not os.path.exists(path):
        continue
    t = [tuple(map(float, l.split())) for l in open(path) if l.strip()]
    wall = statistics.median(x[0] for x in t); cpu = statistics.median(x[1] + x[2] for x in t)
    med[name] = wall
    print(f'{label:22s} {wall:8.2f} {cpu:8.2f} {frames / wall / 1e6:20.1f}')
for kind in ("csv", "wav"):
    if f"java-{kind}" in med and f"numpy-{kind}" in med:
        print(f'{kind.upper()}: Lodestep process is {med[f"numpy-{kind}"] / med[f"java-{kind}"]:.1f}x faster than numpy/scipy reading alone')
PY

if [ "${HOUR:-0}" = "1" ]; then
  echo
  echo "== one hour of one channel at 51.2 kS/s (184,320,000 rows, generated on the fly) with -Xmx256m =="
  java -Xmx256m -cp "$CP" org.lodestep.bench.ReadOnce --generated-hours 1
fi
