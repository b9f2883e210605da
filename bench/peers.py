#!/usr/bin/env python3
"""Side-by-side benchmark of `lodestep resonance sweep` against the Python peers a practitioner would reach for, plus
the speed targets of the README's Benchmarks section. Run through bench/peers.sh, which builds the jar, makes the
private virtual environment and calls this with its Python.

Everything is process to process: each run is a fresh process, timed from outside (wall clock; user + system CPU and
peak resident memory of that process from wait4). Runs alternate between the tools, round after round, with the order
rotated each round, so a change of load hits every tool alike; the tables give medians.

Environment (set by peers.sh): LODESTEP_HOME (repository), BENCH_DIR (data and raw results), RUNS, FRAMES, HOUR
(1 = also the one-hour bound), SMALL_RUNS.
"""
import json
import os
import platform
import re
import shlex
import statistics
import subprocess
import sys
import time
from datetime import datetime, timezone

HOME = os.environ["LODESTEP_HOME"]
WORK = os.environ["BENCH_DIR"]
RUNS = int(os.environ.get("RUNS", "5"))
FRAMES = int(os.environ.get("FRAMES", "10000000"))
HOUR = os.environ.get("HOUR", "1") == "1"
SMALL_RUNS = int(os.environ.get("SMALL_RUNS", str(max(RUNS, 5))))
RATE_HZ = 51200
LAUNCHER = os.path.join(HOME, "lodestep")
JAR = os.path.join(HOME, "target", "lodestep.jar")
# The jar first: the class-data archive was made for it, and a class path that only appends to it keeps it in use.
BENCH_CP = JAR + os.pathsep + os.path.join(HOME, "target", "test-classes")
PY = sys.executable
PEER = os.path.join(HOME, "bench", "peer_sweep.py")
SAMPLE_LEADS = os.path.join(HOME, "sample-captures", "leads", "kl-03-microscope-stage-6lead.tsv")


def log(msg):
    print(msg, file=sys.stderr, flush=True)


def measure(argv, env=None, out_path=os.devnull):
    """Runs argv once; returns wall s, CPU s (user + system), peak RSS MB. Fails loudly on a non-zero exit."""
    with open(out_path, "wb") as out:
        t0 = time.perf_counter()
        p = subprocess.Popen(argv, stdout=out, stderr=subprocess.PIPE, env=env, cwd=HOME)
        err = p.stderr.read()
        _, status, ru = os.wait4(p.pid, 0)
        wall = time.perf_counter() - t0
    p.returncode = os.waitstatus_to_exitcode(status)
    if p.returncode != 0:
        raise SystemExit(f"{shlex.join(argv)} exited {p.returncode}: {err.decode(errors='replace')[-2000:]}")
    return {"wall": wall, "cpu": ru.ru_utime + ru.ru_stime, "rss_mb": ru.ru_maxrss / 1024}


def medians(samples):
    return {k: statistics.median(s[k] for s in samples) for k in samples[0]}


def alternate(cases, runs, env=None, out_dir=None):
    """cases: {name: argv or (argv, env)}. Round-robin, order rotated each round. Returns {name: [samples]}; with
    out_dir, each run's output is kept there as NAME-ROUND.out."""
    names = list(cases)
    res = {n: [] for n in names}
    for r in range(runs):
        order = names[r % len(names):] + names[:r % len(names)]
        for n in order:
            argv, e = cases[n] if isinstance(cases[n], tuple) else (cases[n], env)
            out = os.path.join(out_dir, f"{n}-{r}.out") if out_dir else os.devnull
            res[n].append(measure(argv, e, out))
        log(f"  round {r + 1}/{runs} done, load {os.getloadavg()[0]:.1f}")
    return res


def launcher_java_command(args=("--version",)):
    """The JVM options the launcher chooses for args (its dry run), so the bench classes use the same ones."""
    env = dict(os.environ, LODESTEP_DRY_RUN="1")
    out = subprocess.run([LAUNCHER, *args], env=env, capture_output=True, text=True, check=True).stdout
    argv = shlex.split(out.strip().splitlines()[-1])
    jar_at = argv.index("-cp")
    return argv[1:jar_at]


def versions():
    v = {"java": subprocess.run(["java", "-version"], capture_output=True, text=True).stderr.splitlines()[0],
         "python": platform.python_version()}
    out = subprocess.run([PY, "-c", "import numpy, scipy, polars, pyarrow; print(numpy.__version__, scipy.__version__,"
                          " polars.__version__, pyarrow.__version__)"], capture_output=True, text=True, check=True)
    v["numpy"], v["scipy"], v["polars"], v["pyarrow"] = out.stdout.split()
    v["lodestep"] = subprocess.run([LAUNCHER, "--version"], capture_output=True, text=True).stdout.splitlines()[0]
    return v


def machine():
    model = "unknown CPU"
    with open("/proc/cpuinfo") as f:
        for line in f:
            if line.startswith("model name"):
                model = line.split(":", 1)[1].strip()
                break
    with open("/proc/meminfo") as f:
        mem = int(re.search(r"MemTotal:\s+(\d+)", f.read()).group(1)) / 1048576
    return f"{os.cpu_count()} cores ({model}), {mem:.0f} GiB, {platform.system()} {platform.release()}"


def generate():
    csv, wav = os.path.join(WORK, "sweep.csv"), os.path.join(WORK, "sweep.wav")
    stamp = os.path.join(WORK, f"frames-{FRAMES}")
    if not (os.path.exists(stamp) and os.path.exists(csv) and os.path.exists(wav)):
        log(f"generating {FRAMES} frames at 51.2 kS/s as CSV and WAV in {WORK} ...")
        for f in os.listdir(WORK):
            if f.startswith("frames-"):
                os.remove(os.path.join(WORK, f))
        subprocess.run(["java", "-cp", BENCH_CP, "org.lodestep.bench.BenchData", WORK, str(FRAMES)], check=True)
        open(stamp, "w").close()
    return csv, wav


def fmt(x, d=2):
    return f"{x:.{d}f}"


def main():
    os.makedirs(WORK, exist_ok=True)
    started = datetime.now(timezone.utc)
    load0 = os.getloadavg()
    csv, wav = generate()
    seconds = FRAMES / RATE_HZ
    mb_csv = os.path.getsize(csv) / 1e6
    mb_wav = os.path.getsize(wav) / 1e6
    lode = [LAUNCHER, "resonance", "sweep"]
    cases = {
        "csv:Lodestep": lode + [csv],
        "csv:polars": [PY, PEER, "polars", csv],
        "csv:pyarrow": [PY, PEER, "pyarrow", csv],
        "csv:numpy": [PY, PEER, "numpy", csv],
        "wav:Lodestep": lode + [wav, "--sweep", "linear", "--start", "20", "--end", "2000"],
        "wav:scipy": [PY, PEER, "wavfile", wav],
    }
    log("warm-up: one untimed run of each (file cache, first-run effects) ...")
    for name, argv in cases.items():
        measure(argv, out_path=os.path.join(WORK, name.replace(":", "-") + ".out"))
    log(f"sweep analysis, {RUNS} alternating rounds ...")
    sweep = alternate(cases, RUNS)

    java_opts = launcher_java_command()
    # Each bench class runs with the options the launcher gives a command on the same file: what a user gets.
    csv_opts = launcher_java_command(("resonance", "sweep", csv))
    wav_opts = launcher_java_command(("resonance", "sweep", wav))
    log("CSV ingest and spectral work in fresh processes ...")
    fresh = alternate({
        "ingest": ["java"] + csv_opts + ["-cp", BENCH_CP, "org.lodestep.bench.ReadOnce", csv],
        "spectral": ["java"] + wav_opts + ["-cp", BENCH_CP, "org.lodestep.bench.SpectralOnce", wav, "4096", "5"],
    }, RUNS, out_dir=WORK)
    # The spectral rates are the medians of what those fresh runs printed, not of one extra run.
    runs_out = []
    for r in range(RUNS):
        with open(os.path.join(WORK, f"spectral-{r}.out")) as f:
            runs_out.append(dict(kv.split("=") for kv in f.read().split()))
    sp = dict(runs_out[0])
    for key in ("first_s", "first_gflops", "best_s", "best_gflops"):
        sp[key] = str(statistics.median(float(o[key]) for o in runs_out))

    log(f"small commands, {SMALL_RUNS} alternating rounds ...")
    small = {"bare `java -version`": ["java", "-version"],
             "`lodestep --version`": [LAUNCHER, "--version"],
             "`lodestep --help`": [LAUNCHER, "--help"],
             "`lodestep leads identify` (sample)": [LAUNCHER, "leads", "identify", SAMPLE_LEADS]}
    for cmd in ["demo", "leads identify", "leads probe", "motor identify", "resonance sweep", "resonance ringdown",
                "resonance predict", "qa check", "qa report", "qa export", "qa certificate", "rig ports", "rig info",
                "rig measure", "rig capture", "rig serve", "rig conformance", "drive curve", "drive plan",
                "station"]:
        small[f"`lodestep {cmd} --help`"] = [LAUNCHER] + cmd.split() + ["--help"]
    small_res = alternate(small, SMALL_RUNS)
    check = alternate({"bash": ["bash", "-c", ":"],
                       "launcher": ([LAUNCHER, "--version"], dict(os.environ, LODESTEP_DRY_RUN="1"))},
                      max(SMALL_RUNS, 10))

    hour = None
    if HOUR:
        hour_wav = os.path.join(WORK, "hour-51k2.wav")
        if not os.path.exists(hour_wav):
            log("generating one hour at 51.2 kS/s (368 MB WAV) ...")
            subprocess.run(["java", "-cp", BENCH_CP, "org.lodestep.bench.BenchData", "--wav", hour_wav, "3600"],
                           check=True)
        log("one hour with a 256 MiB heap ...")
        env = dict(os.environ, JDK_JAVA_OPTIONS="-Xmx256m")
        hour_argv = lode + [hour_wav, "--sweep", "linear", "--start", "20", "--end", "2000"]
        hour = medians([measure(hour_argv, env, os.path.join(WORK, "hour.out")) for _ in range(max(1, min(RUNS, 3)))])
        hour["opts"] = " ".join(launcher_java_command(hour_argv[1:]))

    load1 = os.getloadavg()
    raw = {"sweep": sweep, "fresh": fresh, "small": small_res, "check": check, "hour": hour, "spectral": sp}
    with open(os.path.join(WORK, "results.json"), "w") as f:
        json.dump(raw, f, indent=1)

    v = versions()
    blas = ", ".join(f"`{k}={os.environ[k]}`" for k in sorted(os.environ) if k.startswith("OPENBLAS")) or "none"
    print(f"Measured {started:%Y-%m-%d %H:%M} UTC on {machine()}; load average {load0[0]:.1f} at the start, "
          f"{load1[0]:.1f} at the end. {v['lodestep']}, {v['java']}, JVM options from `./lodestep`: "
          f"`{' '.join(java_opts)}`; Python {v['python']}, numpy {v['numpy']}, scipy {v['scipy']}, polars "
          f"{v['polars']}, pyarrow {v['pyarrow']}; OpenBLAS variables set: {blas}. Capture: {FRAMES:,} samples at "
          f"51.2 kS/s ({seconds:.1f} s), CSV `time_s,accel_g` {mb_csv:.0f} MB, 16-bit WAV {mb_wav:.0f} MB. "
          f"Medians of {RUNS} alternating process-to-process runs.")
    print()
    print("| input | tool | wall s | CPU s | peak memory MB | Lodestep faster, wall (lowest-highest of the rounds) | CPU "
          "| Lodestep memory share |")
    print("|---|---|---:|---:|---:|---:|---:|---:|")
    labels = {"Lodestep": "Lodestep `resonance sweep`", "polars": "polars `read_csv` + scipy",
              "pyarrow": "pyarrow `csv.read_csv` + scipy", "numpy": "`numpy.loadtxt` + scipy",
              "scipy": "`scipy.io.wavfile` + scipy"}
    verdicts = []
    for kind in ("csv", "wav"):
        ours = medians(sweep[f"{kind}:Lodestep"])
        for name in [n for n in cases if n.startswith(kind + ":")]:
            m = medians(sweep[name])
            tool = name.split(":")[1]
            if tool == "Lodestep":
                ratio = ("", "", "")
            else:
                # Each round ran every case once, in turn: the ratio of one round's pair shows how far runs vary.
                paired = [p["wall"] / o["wall"] for o, p in zip(sweep[f"{kind}:Lodestep"], sweep[name])]
                ratio = (f"{m['wall'] / ours['wall']:.1f}× ({min(paired):.1f}-{max(paired):.1f})",
                         f"{m['cpu'] / ours['cpu']:.1f}×",
                         f"{ours['rss_mb'] / m['rss_mb'] * 100:.0f} %")
                verdicts.append((f"{kind.upper()} against {tool}", m["wall"] / ours["wall"], 3.0, "×"))
            print(f"| {kind.upper()} | {labels[tool]} | {fmt(m['wall'])} | {fmt(m['cpu'])} | {m['rss_mb']:.0f} | "
                  f"{ratio[0]} | {ratio[1]} | {ratio[2]} |")
    print()
    ing = medians(fresh["ingest"])
    spec_proc = medians(fresh["spectral"])
    print("| target | measured | goal | met |")
    print("|---|---|---|---|")
    for what, value, goal, unit in verdicts:
        print(f"| whole sweep analysis, {what} | {value:.1f}{unit} faster (wall) | ≥ {goal:.0f}{unit} | "
              f"{'yes' if value >= goal else 'no'} |")
    if hour:
        print(f"| one hour at 51.2 kS/s (184,320,000 samples, 16-bit WAV), `-Xmx256m` | {hour['wall']:.1f} s wall, "
              f"{hour['cpu']:.1f} s CPU, peak {hour['rss_mb']:.0f} MB (launcher's JVM options here: `{hour['opts']}`) | < 4 s | {'yes' if hour['wall'] < 4 else 'no'} |")
    ingest_mbs = mb_csv / ing["wall"]
    print(f"| CSV ingest, fresh process (`ReadOnce`, JVM start included; launcher's options for this file: "
          f"`{' '.join(csv_opts)}`) | {ingest_mbs:.0f} MB/s ({ing['wall']:.2f} s "
          f"wall, {ing['cpu']:.2f} s CPU) | ≥ 400 MB/s | {'yes' if ingest_mbs >= 400 else 'no'} |")
    first = float(sp["first_gflops"])
    print(f"| spectral work, effective (2.5·N·log2 N per 4096-point transform, {sp['segments']} segments; Welch + "
          f"spectrogram; `SpectralOnce` on the WAV, launcher's options for that file: `{' '.join(wav_opts)}`) | "
          f"{first:.2f} GFLOP/s first pass in a fresh process, {float(sp['best_gflops']):.2f} warmed | "
          f"≥ 3 GFLOP/s | {'yes' if first >= 3 else 'no'} |")
    bare = medians(small_res["bare `java -version`"])["wall"]
    for name, goal in (("`lodestep --version`", 4), ("`lodestep leads identify` (sample)", 5)):
        m = medians(small_res[name])["wall"]
        print(f"| {name} against bare `java -version` ({bare:.3f} s) | {m:.3f} s, {m / bare:.1f}× | ≤ {goal}× | "
              f"{'yes' if m / bare <= goal else 'no'} |")
    helps = [n for n in small if n.endswith("--help`")]
    worst = max(helps, key=lambda n: medians(small_res[n])["wall"])
    wm = medians(small_res[worst])["wall"]
    print(f"| `--help` of every command (slowest: {worst}) | {wm:.3f} s, {wm / bare:.1f}× | ≤ 4× | "
          f"{'yes' if wm / bare <= 4 else 'no'} |")
    cost = (medians(check["launcher"])["wall"] - medians(check["bash"])["wall"]) * 1000
    print(f"| launcher's own checks (dry run less a bare `bash -c :`) | {cost:.1f} ms | a few ms | "
          f"{'yes' if cost <= 5 else 'no'} |")
    print()
    print("| small command | wall s | CPU s | × bare JVM (wall) |")
    print("|---|---:|---:|---:|")
    for name in small:
        m = medians(small_res[name])
        print(f"| {name} | {m['wall']:.3f} | {m['cpu']:.3f} | {m['wall'] / bare:.1f}× |")


if __name__ == "__main__":
    main()
