#!/usr/bin/env python3
"""Reference run for the resonance benchmark: the same Welch PSD and spectrogram work as `lodestep resonance sweep`,
done the way a practitioner would with numpy and scipy (Debian packages), on the same file.

Reading: CSV with numpy.loadtxt (NumPy >= 1.23 parses in C; measured here faster than numpy.genfromtxt, which is
pure Python per line), WAV with scipy.io.wavfile.read. Work: scipy.signal.welch and scipy.signal.spectrogram with the
same periodic Hann window, segment length and 50 % overlap, mean removed per segment, PSD scaling.

Usage: resonance_scipy.py FILE SEGMENT_LENGTH
"""
import sys

import numpy as np
import scipy.io.wavfile
import scipy.signal


def read(path):
    if path.lower().endswith(".wav"):
        fs, x = scipy.io.wavfile.read(path)
        if x.ndim > 1:
            x = x[:, 0]
        # 16-bit PCM to ±1.0 full scale, as Lodestep's reader does.
        x = x.astype(np.float64) / 32768.0
        return float(fs), x
    fs = None
    with open(path, "r", encoding="utf-8") as f:
        skip = 0
        for line in f:
            skip += 1
            if line.startswith("#"):
                if "sample_rate_hz=" in line:
                    fs = float(line.split("=", 1)[1])
                continue
            break  # header line
    x = np.loadtxt(path, delimiter=",", skiprows=skip, dtype=np.float64)
    return fs, x


def main():
    path, n = sys.argv[1], int(sys.argv[2])
    fs, x = read(path)
    f, p = scipy.signal.welch(x, fs=fs, window="hann", nperseg=n, noverlap=n // 2, detrend="constant",
                              scaling="density")
    f2, t2, s = scipy.signal.spectrogram(x, fs=fs, window="hann", nperseg=n, noverlap=n // 2, detrend="constant",
                                         scaling="density", mode="psd")
    k = int(np.argmax(p[2:])) + 2
    print(f"samples={x.size} psd_peak_hz={f[k]:.3f} psd_integral={np.sum(p) * (f[1] - f[0]):.6g} "
          f"spectrogram={s.shape[0]}x{s.shape[1]}")


if __name__ == "__main__":
    main()
