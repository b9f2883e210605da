#!/usr/bin/env python3
"""One peer run of the side-by-side sweep benchmark: read the capture the way a Python user would, then the same
spectral work as `lodestep resonance sweep` (Welch PSD and spectrogram, periodic Hann window, 4096-sample segments,
50 % overlap, mean removed per segment, density scaling) with scipy.signal.

Usage: peer_sweep.py READER FILE [SEGMENT]
  READER: polars   polars.read_csv (multi-threaded), column accel_g
          pyarrow  pyarrow.csv.read_csv (multi-threaded), column accel_g
          numpy    numpy.loadtxt (C parser since NumPy 1.23), column 1
          wavfile  scipy.io.wavfile.read, first channel, 16-bit PCM scaled to +-1.0 full scale as Lodestep does
Prints one line with the sample count and a few results, so a run that read nothing is caught.
"""
import sys

import numpy as np


def header_lines(path):
    """Number of '#' metadata lines before the column header, and the sample rate they state."""
    fs = None
    skip = 0
    with open(path, "r", encoding="utf-8") as f:
        for line in f:
            if not line.startswith("#"):
                break
            skip += 1
            if "sample_rate_hz=" in line:
                fs = float(line.split("=", 1)[1])
    return skip, fs


def read(reader, path):
    if reader == "wavfile":
        import scipy.io.wavfile
        fs, x = scipy.io.wavfile.read(path)
        if x.ndim > 1:
            x = x[:, 0]
        return float(fs), x.astype(np.float64) / 32768.0
    skip, fs = header_lines(path)
    if reader == "polars":
        import polars as pl
        df = pl.read_csv(path, skip_rows=skip, columns=["accel_g"], schema_overrides={"accel_g": pl.Float64})
        return fs, df["accel_g"].to_numpy()
    if reader == "pyarrow":
        import pyarrow.csv as pacsv
        t = pacsv.read_csv(path, read_options=pacsv.ReadOptions(skip_rows=skip),
                           convert_options=pacsv.ConvertOptions(include_columns=["accel_g"]))
        return fs, t.column("accel_g").to_numpy()
    if reader == "numpy":
        return fs, np.loadtxt(path, delimiter=",", skiprows=skip + 1, usecols=1, dtype=np.float64)
    raise SystemExit(f"unknown reader {reader}")


def main():
    reader, path = sys.argv[1], sys.argv[2]
    n = int(sys.argv[3]) if len(sys.argv) > 3 else 4096
    fs, x = read(reader, path)
    import scipy.signal
    f, p = scipy.signal.welch(x, fs=fs, window="hann", nperseg=n, noverlap=n // 2, detrend="constant",
                              scaling="density")
    _, _, s = scipy.signal.spectrogram(x, fs=fs, window="hann", nperseg=n, noverlap=n // 2, detrend="constant",
                                       scaling="density", mode="psd")
    k = int(np.argmax(p[2:])) + 2
    print(f"samples={x.size} psd_peak_hz={f[k]:.3f} spectrogram={s.shape[0]}x{s.shape[1]}")


if __name__ == "__main__":
    main()
