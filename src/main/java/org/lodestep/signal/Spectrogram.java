package org.lodestep.signal;

import java.util.ArrayList;
import java.util.List;

/**
 * Short-time power spectra over time, in bounded memory: each column averages whole segments, and when the column
 * count would pass its limit, neighbouring columns are merged in pairs and later columns average twice as many
 * segments. A one-hour capture therefore costs the same memory as a one-minute one, at coarser time resolution.
 *
 * <p>Columns hold mean |X_k|², scaled on request with a {@link SpectrumScaling}; a column's time is the centre of
 * the segments it averages.
 */
public final class Spectrogram implements SegmentSpectra.Listener {
    private final SegmentSpectra framer;
    private final int maxColumns;
    private final List<float[]> columns = new ArrayList<>();
    private final List<double[]> columnTimes = new ArrayList<>();
    private int segmentsPerColumn = 1;
    private float[] pending;
    private int pendingCount;
    private double pendingTimeSum;

    /**
     * @param framer     shared segmenter this spectrogram listens to
     * @param maxColumns column limit, at least 2; memory is about maxColumns × (segmentLength/2 + 1) × 4 bytes
     */
    public Spectrogram(SegmentSpectra framer, int maxColumns) {
        if (maxColumns < 2) {
            throw new IllegalArgumentException("a spectrogram needs at least 2 columns, got " + maxColumns);
        }
        this.framer = framer;
        this.maxColumns = maxColumns;
        framer.addListener(this);
    }

    @Override
    public void segment(long firstSample, double[] magnitudeSquared, double meanSquare) {
        if (pending == null) {
            pending = new float[magnitudeSquared.length];
        }
        for (int k = 0; k < magnitudeSquared.length; k++) {
            pending[k] += (float) magnitudeSquared[k];
        }
        pendingCount++;
        pendingTimeSum += (firstSample + framer.settings().segmentLength() / 2.0) / framer.sampleRateHz();
        if (pendingCount == segmentsPerColumn) {
            closePending();
        }
    }

    private void closePending() {
        float inv = 1f / pendingCount;
        for (int k = 0; k < pending.length; k++) {
            pending[k] *= inv;
        }
        columns.add(pending);
        columnTimes.add(new double[] {pendingTimeSum / pendingCount, pendingCount});
        pending = null;
        pendingCount = 0;
        pendingTimeSum = 0;
        if (columns.size() == maxColumns) {
            mergePairs();
        }
    }

    private void mergePairs() {
        List<float[]> merged = new ArrayList<>();
        List<double[]> times = new ArrayList<>();
        for (int c = 0; c + 1 < columns.size(); c += 2) {
            float[] a = columns.get(c);
            float[] b = columns.get(c + 1);
            double na = columnTimes.get(c)[1];
            double nb = columnTimes.get(c + 1)[1];
            for (int k = 0; k < a.length; k++) {
                a[k] = (float) ((a[k] * na + b[k] * nb) / (na + nb));
            }
            merged.add(a);
            times.add(new double[] {(columnTimes.get(c)[0] * na + columnTimes.get(c + 1)[0] * nb) / (na + nb),
                na + nb});
        }
        if (columns.size() % 2 == 1) {
            merged.add(columns.get(columns.size() - 1));
            times.add(columnTimes.get(columns.size() - 1));
        }
        columns.clear();
        columns.addAll(merged);
        columnTimes.clear();
        columnTimes.addAll(times);
        segmentsPerColumn *= 2;
    }

    /** Number of finished columns (a column still filling is not counted). */
    public int columnCount() {
        return columns.size();
    }

    /** Segments averaged per column for columns closed from now on. */
    public int segmentsPerColumn() {
        return segmentsPerColumn;
    }

    /** Time of column c's centre, in seconds from the first sample. */
    public double columnTimeS(int c) {
        return columnTimes.get(c)[0];
    }

    /** Frequency step between rows, in Hz. */
    public double binHz() {
        return framer.binHz();
    }

    /** Column c scaled to {@code scaling}'s unit. */
    public double[] column(int c, SpectrumScaling scaling) {
        float[] raw = columns.get(c);
        double[] v = new double[raw.length];
        for (int k = 0; k < v.length; k++) {
            v[k] = framer.scale(raw[k], k, scaling);
        }
        return v;
    }
}
