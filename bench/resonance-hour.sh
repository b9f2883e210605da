#!/usr/bin/env bash
# One hour of one channel at 51.2 kS/s (184 million samples, a 16-bit WAV of 368 MB written to
# ${BENCH_DIR:-/tmp/lodestep-bench}) analysed by `lodestep resonance sweep` with a 256 MiB heap: shows that the
# analysis streams. Prints wall time, samples/s and the peak resident memory of the process.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
jar="${LODESTEP_JAR:-$here/target/lodestep.jar}"
dir="${BENCH_DIR:-/tmp/lodestep-bench}"
mkdir -p "$dir"
wav="$dir/hour-51k2.wav"
if [ ! -f "$jar" ]; then
  (cd "$here" && mvn -q -B -o -DskipTests package)
fi
if [ ! -f "$wav" ]; then
  python3 - "$wav" <<'PY'
import sys
import numpy as np
fs, seconds = 51200, 3600
n = fs * seconds
with open(sys.argv[1], "wb") as f:
    f.write(b"RIFF" + (36 + 2 * n).to_bytes(4, "little") + b"WAVE" + b"fmt " + (16).to_bytes(4, "little")
            + (1).to_bytes(2, "little") + (1).to_bytes(2, "little") + fs.to_bytes(4, "little")
            + (2 * fs).to_bytes(4, "little") + (2).to_bytes(2, "little") + (16).to_bytes(2, "little")
            + b"data" + (2 * n).to_bytes(4, "little"))
    rng = np.random.default_rng(9)
    phase = 0.0
    for s in range(seconds):
        t = (s + np.arange(fs) / fs)
        rate = 20 + 1980 * t / seconds
        ph = phase + 2 * np.pi * np.cumsum(rate) / fs
        phase = ph[-1]
        x = 0.3 * np.sin(ph) + 0.05 * rng.standard_normal(fs)
        f.write(np.round(x * 32767).astype("<i2").tobytes())
PY
fi
start=$(date +%s.%N)
/usr/bin/time -f "peak resident memory %M KiB" java -Xmx256m ${JAVA_OPTS:-} -jar "$jar" resonance sweep "$wav" \
  --sweep linear --start 20 --end 2000 --duration 3600 > "$dir/hour.txt"
end=$(date +%s.%N)
python3 -c "import sys; s=float(sys.argv[2])-float(sys.argv[1]); print(f'{s:.1f} s, {184320000/s/1e6:.1f} million samples/s')" "$start" "$end"
grep -E "Response curve|Natural frequency" "$dir/hour.txt"
