#!/usr/bin/env python3
"""Runs Lodestep's sweep analysis and the numpy/scipy reference on the same 10-million-sample CSV and WAV, process to
process, alternating, and reports the median wall time of each, samples/s and the ratio.

Usage: resonance_bench.py JAR WORKDIR [RUNS]
Environment: JAVA_OPTS, extra JVM options for the Lodestep runs (printed with the results; default none).
"""
import os
import resource
import statistics
import subprocess
import sys
import time

import numpy as np

N = 10_000_000
FS = 51_200.0
SEGMENT = 4096  # what `lodestep resonance sweep` picks at 51.2 kS/s (a power of two near 0.1 s)
START, END = 20.0, 2000.0


def signal():
    t = np.arange(N) / FS
    dur = N / FS
    rate = START + (END - START) * t / dur
    phase = 2 * np.pi * np.cumsum(rate) / FS
    rng = np.random.default_rng(5)
    # A tone at the step rate, a resonance bump near 300 full steps/s, and noise.
    amp = 0.2 + 0.6 * np.exp(-0.5 * ((rate - 300) / 25) ** 2)
    return amp * np.sin(phase) + 0.05 * rng.standard_normal(N), dur


def write_files(workdir):
    csv = os.path.join(workdir, "bench-sweep.csv")
    wav = os.path.join(workdir, "bench-sweep.wav")
    if os.path.exists(csv) and os.path.exists(wav):
        return csv, wav, N / FS
    x, dur = signal()
    with open(csv, "w", encoding="utf-8") as f:
        f.write(f"# sample_rate_hz={FS:.0f}\n# sweep=linear\n# sweep_start_full_steps_per_s={START}\n"
                f"# sweep_end_full_steps_per_s={END}\n# sweep_duration_s={dur}\naccel_g\n")
        np.savetxt(f, x, fmt="%.5f")
    pcm = np.clip(np.round(x / 1.2 * 32767), -32768, 32767).astype("<i2")
    with open(wav, "wb") as f:
        data = pcm.tobytes()
        f.write(b"RIFF" + (36 + len(data)).to_bytes(4, "little") + b"WAVE")
        f.write(b"fmt " + (16).to_bytes(4, "little") + (1).to_bytes(2, "little") + (1).to_bytes(2, "little"))
        f.write(int(FS).to_bytes(4, "little") + int(FS * 2).to_bytes(4, "little"))
        f.write((2).to_bytes(2, "little") + (16).to_bytes(2, "little"))
        f.write(b"data" + len(data).to_bytes(4, "little") + data)
    return csv, wav, dur


def cpu_children():
    u = resource.getrusage(resource.RUSAGE_CHILDREN)
    return u.ru_utime + u.ru_stime


def timed(cmd):
    """Wall time and CPU time (user + system, all threads) of one process run."""
    c0 = cpu_children()
    t0 = time.perf_counter()
    r = subprocess.run(cmd, stdout=subprocess.PIPE, stderr=subprocess.PIPE, text=True)
    dt = time.perf_counter() - t0
    if r.returncode != 0:
        sys.exit(f"failed ({r.returncode}): {' '.join(cmd)}\n{r.stderr}")
    return dt, cpu_children() - c0


def main():
    jar, workdir = sys.argv[1], sys.argv[2]
    runs = int(sys.argv[3]) if len(sys.argv) > 3 else 3
    os.makedirs(workdir, exist_ok=True)
    csv, wav, dur = write_files(workdir)
    here = os.path.dirname(os.path.abspath(__file__))
    ref = os.path.join(here, "resonance_scipy.py")
    java_opts = os.environ.get("JAVA_OPTS", "").split()
    print(f"JVM options for Lodestep: {' '.join(java_opts) or '(none)'}")
    print(f"{N} samples at {FS:.0f} Hz ({dur:.1f} s); segment {SEGMENT}, 50 % overlap, Hann; median of {runs} runs")
    print("wall = elapsed time of the process; cpu = user + system time of all its threads")
    print(f"{'input':6} {'lodestep wall s':>16} {'scipy wall s':>13} {'lodestep MS/s':>14} {'scipy MS/s':>11} "
          f"{'wall ratio':>11} {'lodestep cpu s':>15} {'scipy cpu s':>12} {'cpu ratio':>10}")
    for name, path, extra in (("CSV", csv, []),
                              ("WAV", wav, ["--sweep", "linear", "--start", str(START), "--end", str(END),
                                            "--duration", str(dur)])):
        lj, py = [], []
        for _ in range(runs):
            lj.append(timed(["java"] + java_opts + ["-jar", jar, "resonance", "sweep", path] + extra))
            py.append(timed([sys.executable, ref, path, str(SEGMENT)]))
        a = statistics.median(t for t, _ in lj)
        b = statistics.median(t for t, _ in py)
        ca = statistics.median(c for _, c in lj)
        cb = statistics.median(c for _, c in py)
        print(f"{name:6} {a:16.2f} {b:13.2f} {N / a / 1e6:14.2f} {N / b / 1e6:11.2f} {b / a:10.1f}x "
              f"{ca:15.2f} {cb:12.2f} {cb / ca:9.1f}x")
    print(f"load average at the end: {os.getloadavg()[0]:.1f} on {os.cpu_count()} cores")


if __name__ == "__main__":
    main()
