package org.lodestep.motor;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.lodestep.signal.LoneSamples;
import org.lodestep.signal.LoneSamples.LoneSample;
import org.lodestep.wiring.Finding;

/**
 * Phases the coils of a motor from a multi-channel back-EMF capture taken while the shaft is turned by hand, tracks
 * the electrical frequency through the varying speed, and counts rotor teeth.
 *
 * <p>Model (Acarnley, <i>Stepping Motors</i>, 4th ed., hybrid-motor chapters; references §14, from memory
 * there): {@code eA = -Ke·omega·sin(Nr·theta)}, {@code eB = Ke·omega·cos(Nr·theta)}. Coils of one phase are in phase
 * or in antiphase; the two phases are 90° apart and which one leads depends on the direction turned. Method:
 * <ol>
 *   <li>the analytic signal of each channel ({@link AnalyticSignal}) gives an amplitude and phase that follow the
 *       speed; the normalised correlation of two channels is the cosine of their phase difference and does not depend
 *       on the direction, so it groups channels into phases and gives each coil's polarity;</li>
 *   <li>phase B is oriented to lag phase A while the shaft turned the way it turned most of the time, so a driver whose
 *       B current lags its A current turns the shaft that same way;</li>
 *   <li>with both phases present the electrical angle is {@code atan2(eA, -eB)}; {@link ToothCounter} reads it only
 *       where the EMF stands well above the idle noise, bridges slow stretches and reversals, and gives the tooth
 *       count only when one whole number fits the count and its bound; with one phase the analytic phase is used;</li>
 *   <li>Ke (peak volts per electrical rad/s) is the least-squares slope through the origin of each channel's
 *       envelope against the electrical angular speed, block by block (20 ms blocks).</li>
 * </ol>
 */
public final class BackEmfAnalyzer {
    /** A channel with less than this fraction of the strongest channel's RMS is taken as dead. */
    static final double DEAD_FRACTION = 0.05;
    /** Length of the blocks for frequency and Ke, s. */
    static final double BLOCK_S = 0.020;

    private final double sampleRateHz;

    /** @param sampleRateHz sample rate of every channel, Hz */
    public BackEmfAnalyzer(double sampleRateHz) {
        Checks.positive(sampleRateHz, "sample rate", "Hz");
        this.sampleRateHz = sampleRateHz;
    }

    /**
     * Analyses one capture.
     *
     * @param channels            back-EMF channels of equal length; at least one
     * @param revolutions         mechanical revolutions turned during the capture, or null
     * @param indexChannel        samples of an index or tachometer channel of the same length, or null
     * @param pulsesPerRevolution pulses of that channel per revolution (1 for an index mark)
     */
    public BackEmfResult analyze(List<EmfChannel> channels, Double revolutions, double[] indexChannel,
                                 int pulsesPerRevolution) {
        int n = checkedLength(channels, revolutions, indexChannel, pulsesPerRevolution);
        List<Finding> findings = new ArrayList<>();
        Centred c = centred(bridged(channels, findings), n);
        List<Integer> live = liveChannels(channels, c, findings);
        int m = live.size();
        double[][][] z = new double[m][][];
        for (int j = 0; j < m; j++) {
            z[j] = AnalyticSignal.of(c.x()[live.get(j)]);
        }
        int margin = Math.max(1, n / 50); // FFT-based analytic signals are distorted at the record ends
        Span span = new Span(margin, n - margin, n);
        Grouping g = group(z, span);
        Phasing ph = phase(channels, z, live, c.rms(), g, span, findings);
        Angle angle = electricalAngle(ph, span);
        Speed speed = speedAndKe(z, angle, span, findings);
        Revolutions revs = revolutions(indexChannel, revolutions, pulsesPerRevolution, angle, findings);
        Teeth teeth = teeth(revs, angle.track(), findings);

        List<EmfCoil> coils = new ArrayList<>();
        for (int j = 0; j < m; j++) {
            OrientedLeads measured = channels.get(live.get(j)).pair();
            OrientedLeads oriented = g.polarity()[j] >= 0 ? measured : measured.reversed();
            double keElec = speed.den() > 0 ? speed.num()[j] / speed.den() : 0;
            Double keMech = teeth.teeth() != null && keElec > 0 ? keElec * teeth.teeth() : null;
            coils.add(new EmfCoil(measured, g.group()[j] == 0 ? "A" : "B", oriented, g.group()[j] == 0 ? 0.0 : -90.0,
                    c.rms()[live.get(j)], keElec, keMech));
        }
        return new BackEmfResult(coils, angle.cycles(), speed.movingS(), speed.meanF(), speed.minF(), speed.maxF(),
                revs.revolutions(), revs.source(), teeth.perRevolution(), teeth.teeth(), ph.lagDeg(), ph.reversals(),
                teeth.count(), findings);
    }

    /** The samples analysed, {@code from} (inclusive) to {@code to} (exclusive) of {@code n}. */
    private record Span(int from, int to, int n) {
    }

    /** Channels with their mean removed, their RMS and the largest RMS. */
    private record Centred(double[][] x, double[] rms, double maxRms) {
    }

    /** Which phase each live channel belongs to (0 = A, 1 = B), its polarity, and the first B channel (or -1). */
    private record Grouping(int[] group, double[] polarity, int firstB) {
    }

    /** The combined analytic signals of phases A and B (B null with one phase), B's lag and direction changes. */
    private record Phasing(double[][] za, double[][] zb, Double lagDeg, int reversals) {
    }

    /** The unwrapped electrical angle, where it was read directly, the track behind it, and the net cycles. */
    private record Angle(double[] angle, boolean[] moving, ToothCounter.Track track, double cycles) {
    }

    /** Block-wise electrical frequency and the Ke regression sums (per channel numerator, common denominator). */
    private record Speed(double movingS, double meanF, double minF, double maxF, double[] num, double den) {
    }

    /** Revolutions and where they came from, and the cycles counted over them. */
    private record Revolutions(Double revolutions, RevolutionSource source, double countedCycles) {
    }

    /** Cycles per revolution, the rotor tooth count and how it was read; null when unknown. */
    private record Teeth(Double perRevolution, Integer teeth, ToothCount count) {
    }

    /** The common channel length, after checking every argument. */
    private static int checkedLength(List<EmfChannel> channels, Double revolutions, double[] indexChannel,
                                     int pulsesPerRevolution) {
        if (channels.isEmpty()) {
            throw new IllegalArgumentException("no back-EMF channels (expected columns named emf_<lead>_<lead>_v)");
        }
        int n = channels.get(0).length();
        for (EmfChannel c : channels) {
            if (c.length() != n) {
                throw new IllegalArgumentException("channel " + c.pair() + " has " + c.length() + " samples, expected "
                        + n);
            }
        }
        if (n < 256) {
            throw new IllegalArgumentException("a back-EMF capture needs at least 256 samples, got " + n);
        }
        Checks.positiveOrNull(revolutions, "revolutions", "rev");
        if (indexChannel != null && indexChannel.length != n) {
            throw new IllegalArgumentException("index channel has " + indexChannel.length + " samples, expected " + n);
        }
        if (pulsesPerRevolution < 1) {
            throw new IllegalArgumentException("pulses per revolution must be at least 1, got " + pulsesPerRevolution);
        }
        return n;
    }

    /**
     * Each channel with its lone glitch samples bridged by their neighbours' mean, each bridging named in a finding:
     * one glitch would otherwise bias that coil's Ke and, at rest, look like motion.
     */
    private List<EmfChannel> bridged(List<EmfChannel> channels, List<Finding> findings) {
        List<EmfChannel> out = new ArrayList<>();
        double[] timeS = null;
        for (EmfChannel ch : channels) {
            double[] v = ch.voltageV();
            List<LoneSample> lone = LoneSamples.find(v);
            if (lone.isEmpty()) {
                out.add(ch);
                continue;
            }
            if (timeS == null) {
                timeS = new double[v.length];
                for (int i = 0; i < v.length; i++) {
                    timeS[i] = i / sampleRateHz;
                }
            }
            findings.add(Finding.warning(MotorFindingCode.GLITCH_BRIDGED, "channel " + ch.pair() + ": "
                    + LoneSamples.describe(lone, timeS, "V")));
            out.add(new EmfChannel(ch.pair(), LoneSamples.bridged(v, lone)));
        }
        return out;
    }

    /** Mean removed: a DC offset of the recorder would bias the correlations. */
    private static Centred centred(List<EmfChannel> channels, int n) {
        double[][] x = new double[channels.size()][];
        double[] rms = new double[channels.size()];
        double maxRms = 0;
        for (int k = 0; k < channels.size(); k++) {
            x[k] = channels.get(k).voltageV();
            double mean = Arrays.stream(x[k]).average().orElse(0);
            double ss = 0;
            for (int i = 0; i < n; i++) {
                x[k][i] -= mean;
                ss += x[k][i] * x[k][i];
            }
            rms[k] = Math.sqrt(ss / n);
            maxRms = Math.max(maxRms, rms[k]);
        }
        if (!(maxRms > 0)) {
            throw new IllegalArgumentException("every back-EMF channel is flat: was the shaft turned?");
        }
        return new Centred(x, rms, maxRms);
    }

    /** The channels that carry back-EMF; each dead one becomes an error finding. */
    private static List<Integer> liveChannels(List<EmfChannel> channels, Centred c, List<Finding> findings) {
        double[] rms = c.rms();
        double maxRms = c.maxRms();
        List<Integer> live = new ArrayList<>();
        for (int k = 0; k < channels.size(); k++) {
            if (rms[k] < DEAD_FRACTION * maxRms) {
                findings.add(Finding.error(MotorFindingCode.NO_EMF, String.format("channel %s shows no back-EMF (%.3g V RMS against "
                        + "%.3g V on the strongest): an open coil, a broken lead, or two leads that are not one coil",
                        channels.get(k).pair(), rms[k], maxRms)));
            } else {
                live.add(k);
            }
        }
        return live;
    }

    /** Groups into phases by the direction-independent correlation with the first live channel. */
    private static Grouping group(double[][][] z, Span span) {
        int m = z.length;
        int from = span.from();
        int to = span.to();
        int[] group = new int[m];
        double[] polarity = new double[m];
        int firstB = -1;
        for (int j = 0; j < m; j++) {
            double c = correlation(z[j], z[0], from, to);
            if (Math.abs(c) >= 0.5) {
                group[j] = 0;
                polarity[j] = Math.signum(c);
            } else {
                group[j] = 1;
                if (firstB < 0) {
                    firstB = j;
                }
                polarity[j] = Math.signum(correlation(z[j], z[firstB], from, to));
                if (polarity[j] == 0) {
                    polarity[j] = 1;
                }
            }
        }
        return new Grouping(group, polarity, firstB);
    }

    /**
     * Combines each phase's channels, orients B to lag A in the main turning direction (flipping B's polarities when
     * it led), and measures the lag and the direction changes.
     */
    private Phasing phase(List<EmfChannel> channels, double[][][] z, List<Integer> live, double[] rms, Grouping g,
                          Span span, List<Finding> findings) {
        int m = z.length;
        int n = span.n();
        int[] group = g.group();
        double[] polarity = g.polarity();
        double[][] za = combine(z, live, rms, group, polarity, 0, n);
        if (g.firstB() < 0) {
            if (m > 1) {
                findings.add(Finding.warning(MotorFindingCode.ONE_PHASE, "every live channel is in phase or antiphase "
                        + "with " + channels.get(live.get(0)).pair() + ": only one phase was recorded"));
            }
            return new Phasing(za, null, null, 0);
        }
        double[][] zb = combine(z, live, rms, group, polarity, 1, n);
        Cross cross = cross(za, zb, span);
        if (cross.sumIm() > 0) {
            // B leads A in the main direction: take the other end of every B coil as its start.
            for (int j = 0; j < m; j++) {
                if (group[j] == 1) {
                    polarity[j] = -polarity[j];
                }
            }
            for (double[] b : cross.blocks()) {
                b[0] = -b[0];
                b[1] = -b[1];
            }
            zb = combine(z, live, rms, group, polarity, 1, n);
        }
        Phasing ph = lag(za, zb, cross.blocks());
        if (Math.abs(ph.lagDeg() - 90) > 20) {
            findings.add(Finding.warning(MotorFindingCode.NOT_QUADRATURE, String.format("phase B lags phase A by "
                    + "%.0f° electrical, expected 90°: the channels may not be single coils", ph.lagDeg())));
        }
        if (ph.reversals() > 0) {
            findings.add(Finding.warning(MotorFindingCode.DIRECTION_REVERSED, "the shaft changed direction "
                    + ph.reversals() + " time(s) during the capture; the pairing is unaffected, but for a tooth count "
                    + "turn one way only"));
        }
        return ph;
    }

    /** Block-wise {@code zb·conj(za)} (re, im per block) and the sum of the imaginary parts. */
    private record Cross(List<double[]> blocks, double sumIm) {
    }

    /** The cross products of phases B and A, block by block: their angle is B's phase relative to A. */
    private Cross cross(double[][] za, double[][] zb, Span span) {
        int block = blockLength();
        List<double[]> blocks = new ArrayList<>();
        double sumIm = 0;
        for (int s = span.from(); s + block <= span.to(); s += block) {
            double re = 0;
            double im = 0;
            for (int i = s; i < s + block; i++) {
                // zb·conj(za): its angle is B's phase relative to A
                re += zb[0][i] * za[0][i] + zb[1][i] * za[1][i];
                im += zb[1][i] * za[0][i] - zb[0][i] * za[1][i];
            }
            blocks.add(new double[] {re, im});
            sumIm += im;
        }
        return new Cross(blocks, sumIm);
    }

    /**
     * B's lag behind A over the blocks that turned clearly one way, folding back the blocks turned the other way, and
     * the number of direction changes.
     */
    private static Phasing lag(double[][] za, double[][] zb, List<double[]> blocks) {
        double maxAbsIm = 0;
        for (double[] b : blocks) {
            maxAbsIm = Math.max(maxAbsIm, Math.abs(b[1]));
        }
        double sre = 0;
        double sim = 0;
        int lastSign = 0;
        int reversals = 0;
        for (double[] b : blocks) {
            if (Math.abs(b[1]) < 0.2 * maxAbsIm) {
                continue;
            }
            int sign = b[1] < 0 ? -1 : 1;
            if (lastSign != 0 && sign != lastSign) {
                reversals++;
            }
            lastSign = sign;
            // blocks turned the other way have the mirror-image relation; fold them back
            sre += b[0];
            sim += sign < 0 ? b[1] : -b[1];
        }
        return new Phasing(za, zb, -Math.toDegrees(Math.atan2(sim, sre)), reversals);
    }

    /** Electrical angle, read only where the EMF stands well above the idle noise ({@link ToothCounter}). */
    private Angle electricalAngle(Phasing ph, Span span) {
        double[][] za = ph.za();
        double[][] zb = ph.zb();
        int n = span.n();
        double[] px = new double[n];
        double[] py = new double[n];
        for (int i = 0; i < n; i++) {
            if (zb != null) {
                px[i] = -zb[0][i];
                py[i] = za[0][i];
            } else {
                px[i] = za[0][i];
                py[i] = za[1][i];
            }
        }
        ToothCounter.Track track = ToothCounter.track(px, py, sampleRateHz);
        boolean anyTrusted = false;
        for (boolean t : track.trusted()) {
            anyTrusted |= t;
        }
        if (!anyTrusted) {
            throw new IllegalArgumentException("the shaft never turned fast enough to measure");
        }
        return new Angle(track.angleRad(), track.trusted(), track, Math.abs(track.cycles()));
    }

    /** Block-wise frequency and the Ke regression of each channel's envelope on the electrical angular speed. */
    private Speed speedAndKe(double[][][] z, Angle a, Span span, List<Finding> findings) {
        int m = z.length;
        int from = span.from();
        int to = span.to();
        boolean[] moving = a.moving();
        double[] angle = a.angle();
        double cycles = a.cycles();
        int block = blockLength();
        List<Double> freqs = new ArrayList<>();
        double[] num = new double[m];
        double den = 0;
        int movingSamples = 0;
        for (boolean mv : a.track().moving()) {
            if (mv) {
                movingSamples++;
            }
        }
        for (int s = from; s + block <= to; s += block) {
            boolean all = true;
            for (int i = s; i < s + block && all; i++) {
                all = moving[i];
            }
            if (!all) {
                continue;
            }
            double omega = Math.abs(angle[s + block - 1] - angle[s]) / ((block - 1) / sampleRateHz);
            freqs.add(omega / (2 * Math.PI));
            for (int j = 0; j < m; j++) {
                double env = 0;
                for (int i = s; i < s + block; i++) {
                    env += Math.hypot(z[j][0][i], z[j][1][i]);
                }
                num[j] += env / block * omega;
            }
            den += omega * omega;
        }
        double movingS = movingSamples / sampleRateHz;
        double minF = freqs.stream().mapToDouble(Double::doubleValue).min().orElse(0);
        double maxF = freqs.stream().mapToDouble(Double::doubleValue).max().orElse(0);
        double meanF = movingS > 0 ? cycles / movingS : 0;
        if (freqs.isEmpty()) {
            findings.add(Finding.warning(MotorFindingCode.TOO_SLOW, "no 20 ms stretch of steady turning: Ke is not measured"));
        }

        return new Speed(movingS, meanF, minF, maxF, num, den);
    }

    /** Revolutions: stated, or counted between the first and last index pulse. */
    private static Revolutions revolutions(double[] indexChannel, Double revolutions, int pulsesPerRevolution,
                                           Angle a, List<Finding> findings) {
        double[] angle = a.angle();
        double cycles = a.cycles();
        RevolutionSource source = RevolutionSource.NONE;
        double countedCycles = cycles;
        Double revs = null;
        if (indexChannel != null) {
            int[] all = risingEdges(indexChannel);
            // Only pulses where the angle was read directly count: one in a slow start or stop has no exact angle.
            boolean[] trusted = a.moving();
            int[] edges = Arrays.stream(all).filter(i -> trusted[i]).toArray();
            if (edges.length >= 2) {
                revs = (edges.length - 1) / (double) pulsesPerRevolution;
                countedCycles = Math.abs(angle[edges[edges.length - 1]] - angle[edges[0]]) / (2 * Math.PI);
                source = RevolutionSource.INDEX_CHANNEL;
                double allRevs = (all.length - 1) / (double) pulsesPerRevolution;
                if (revolutions != null && Math.abs(revolutions - allRevs) > 0.5) {
                    findings.add(Finding.warning(MotorFindingCode.REVOLUTIONS_DISAGREE, String.format("%.3g revolutions "
                            + "stated, %.3g counted on the index channel; the count is used", revolutions, allRevs)));
                }
            } else {
                findings.add(Finding.warning(MotorFindingCode.INDEX_CHANNEL, "the index channel has fewer than two pulses"));
            }
        }
        if (revs == null && revolutions != null) {
            revs = revolutions;
            source = RevolutionSource.STATED;
        }
        return new Revolutions(revs, source, countedCycles);
    }

    /**
     * The rotor tooth count from the cycles per revolution ({@link ToothCounter}): a whole number only when exactly
     * one fits the count and its bound, with findings where it is refused, preferred or unusual.
     */
    private static Teeth teeth(Revolutions r, ToothCounter.Track track, List<Finding> findings) {
        Double revs = r.revolutions();
        if (revs == null) {
            findings.add(Finding.info(MotorFindingCode.TEETH_UNKNOWN, "revolutions not given: the rotor tooth count, "
                    + "step angle and mechanical Ke stay unknown"));
            return new Teeth(null, null, null);
        }
        boolean indexed = r.source() == RevolutionSource.INDEX_CHANNEL;
        ToothCount count = ToothCounter.count(r.countedCycles(),
                indexed ? track.interiorUncertaintyCycles() + ToothCounter.ENDPOINT_ERROR_CYCLES
                        : track.uncertaintyCycles(), revs, indexed ? 0 : ToothCounter.MARK_TOLERANCE_REV,
                track.trustedFraction());
        findings.addAll(ToothFindings.of(count));
        return new Teeth(count.cyclesPerRevolution() > 0 ? count.cyclesPerRevolution() : null, count.teeth(), count);
    }

    private int blockLength() {
        return Math.max(16, (int) Math.round(BLOCK_S * sampleRateHz));
    }

    /** Normalised real correlation of two analytic signals: the cosine of their phase difference. */
    private static double correlation(double[][] a, double[][] b, int from, int to) {
        double cross = 0;
        double pa = 0;
        double pb = 0;
        for (int i = from; i < to; i++) {
            cross += a[0][i] * b[0][i] + a[1][i] * b[1][i];
            pa += a[0][i] * a[0][i] + a[1][i] * a[1][i];
            pb += b[0][i] * b[0][i] + b[1][i] * b[1][i];
        }
        return cross / Math.sqrt(pa * pb);
    }

    /** Sum of one group's analytic signals, each with its polarity and scaled to unit RMS. */
    private static double[][] combine(double[][][] z, List<Integer> live, double[] rms, int[] group,
                                      double[] polarity, int which, int n) {
        double[][] out = new double[2][n];
        for (int j = 0; j < z.length; j++) {
            if (group[j] != which) {
                continue;
            }
            double g = polarity[j] / rms[live.get(j)];
            for (int i = 0; i < n; i++) {
                out[0][i] += g * z[j][0][i];
                out[1][i] += g * z[j][1][i];
            }
        }
        return out;
    }

    private static double wrap(double a) {
        return a - 2 * Math.PI * Math.floor((a + Math.PI) / (2 * Math.PI));
    }

    /** Sample indices of rising edges, with hysteresis at 30 % and 70 % of the channel's range. */
    static int[] risingEdges(double[] s) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double v : s) {
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        double low = lo + 0.3 * (hi - lo);
        double high = lo + 0.7 * (hi - lo);
        List<Integer> edges = new ArrayList<>();
        boolean armed = s[0] < low;
        for (int i = 1; i < s.length; i++) {
            if (s[i] < low) {
                armed = true;
            } else if (armed && s[i] > high) {
                edges.add(i);
                armed = false;
            }
        }
        return edges.stream().mapToInt(Integer::intValue).toArray();
    }
}
