package org.lodestep.drive;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

/**
 * Plans a move from standstill to a cruise rate and back whose acceleration never asks for more than the torque
 * with margin at any speed, never dwells in a band, and crosses each band at no less than its least crossing
 * acceleration.
 *
 * <p>Outside the bands the acceleration is one base level, the least that the torque with margin allows anywhere
 * below the cruise rate ({@code a(v) = ((1 − m)·T_po(v) − T_load)/J} in full steps/s², the shaft's law of motion
 * {@code J·dω/dt = T − T_load}); inside a band it is raised to the band's crossing acceleration where the torque at
 * the band's top allows it. An S-curve reaches each raised level before the band at the jerk limit and lands on the
 * cruise rate with zero acceleration. The deceleration is the acceleration played backwards (friction, which helps
 * braking, is not counted on: conservative; a gravity load is taken to oppose both ways).
 */
public final class MotionPlanner {
    /** Integration steps per table step for an S-curve. */
    static final int SUBSTEPS = 20;

    private final TorqueCurve curve;
    private final Load load;
    private final double margin;
    private final double limit;

    private MotionPlanner(TorqueCurve curve, Load load, double margin, double limit) {
        this.curve = curve;
        this.load = load;
        this.margin = margin;
        this.limit = limit;
    }

    /** Plans the profile; throws {@link PlanningException} when no profile meets the constraints. */
    public static Profile plan(TorqueCurve curve, Load load, List<Band> bands, ProfileSettings s) {
        return new MotionPlanner(curve, load, s.margin(), s.maxAccelerationFullStepsPerS2()).run(bands, s);
    }

    /** Acceleration the torque with margin allows at a rate, full steps/s² (capped by the user's limit; ≤ 0 when none). */
    public static double allowedAcceleration(TorqueCurve curve, Load load, double margin, double rateFullStepsPerS) {
        PhaseModel m = curve.motor();
        double j = m.rotorInertiaKgM2() + load.inertiaKgM2();
        double t = Margin.usableNm(curve.torqueNm(rateFullStepsPerS), margin) - load.steadyTorqueNm();
        return t / j / (2 * Math.PI / m.fullStepsPerRev());
    }

    private double allowed(double rate) {
        return Math.min(limit, allowedAcceleration(curve, load, margin, rate));
    }

    private Profile run(List<Band> all, ProfileSettings s) {
        double target = s.targetFullStepsPerS();
        RateText rt = new RateText();
        if (!(allowed(target) > 0)) {
            double max = SpeedQuestion.maxRateWithMargin(curve.motor(), curve.drive(), load.steadyTorqueNm(), margin);
            throw new PlanningException(String.format(Locale.ROOT, "the target %s is beyond the torque curve with"
                    + " %.0f %% margin: the highest rate with that margin is %s; lower the target, the load or the"
                    + " margin, or change the drive (see drive curve)", rt.of(target), 100 * margin, rt.of(max)));
        }
        List<Band> bands = new ArrayList<>();
        for (Band b : all) {
            if (b.contains(target)) {
                throw new PlanningException(String.format(Locale.ROOT, "the target %s lies inside the avoid band"
                        + " %s ... %s: the axis would dwell in it; choose a cruise rate below %s or above %s",
                        rt.of(target), rt.of(b.fromFullStepsPerS()), rt.of(b.toFullStepsPerS()),
                        rt.of(b.fromFullStepsPerS()), rt.of(b.toFullStepsPerS())));
            }
            if (b.fromFullStepsPerS() < target) {
                bands.add(b);
            }
        }
        bands.sort(Comparator.comparingDouble(Band::fromFullStepsPerS));
        double base = Double.POSITIVE_INFINITY;
        for (int k = 0; k <= 400; k++) {
            base = Math.min(base, allowed(target * k / 400));
        }
        boolean sCurve = s.shape() == ProfileShape.S_CURVE;
        double jerk = !sCurve ? Double.POSITIVE_INFINITY
                : Double.isNaN(s.jerkFullStepsPerS3()) ? defaultJerk(base, target, bands) : s.jerkFullStepsPerS3();
        List<double[]> raised = new ArrayList<>();   // {from, to, level}
        for (Band b : bands) {
            double level = Math.max(base, b.minAccelerationFullStepsPerS2());
            double ramp = sCurve ? (level * level - base * base) / (2 * jerk) : 0;
            double top = Math.min(target, b.toFullStepsPerS() + ramp);
            double can = allowed(top);
            if (level > can * (1 + 1e-9)) {
                throw new PlanningException(String.format(Locale.ROOT, "the band %s ... %s needs at least %s full"
                        + " steps/s² to cross, but the torque with %.0f %% margin allows only %s full steps/s² at %s;"
                        + " lower the load inertia or the margin, raise the supply or current, or keep the cruise"
                        + " rate below the band", rt.of(b.fromFullStepsPerS()), rt.of(b.toFullStepsPerS()),
                        sig(b.minAccelerationFullStepsPerS2()), 100 * margin, sig(Math.max(0, can)), rt.of(top)));
            }
            if (level > base) {
                raised.add(new double[] {b.fromFullStepsPerS() - ramp, b.toFullStepsPerS() + ramp, level});
            }
        }
        List<Segment> up = sCurve ? sCurve(target, base, jerk, raised, s.tableStepS() / SUBSTEPS)
                : trapezoid(target, base, raised);
        double tUp = up.get(up.size() - 1).endS();
        List<BandCrossing> crossings = new ArrayList<>();
        for (Band b : bands) {
            crossings.add(crossing(up, b, base, jerk));
        }
        for (BandCrossing c : crossings) {
            if (c.accelerationFullStepsPerS2() < c.band().minAccelerationFullStepsPerS2() * (1 - 1e-3)) {
                double need = c.band().fromFullStepsPerS() <= target / 2
                        ? Math.pow(Math.max(base, c.band().minAccelerationFullStepsPerS2()), 2)
                                / (2 * Math.max(1e-9, c.band().fromFullStepsPerS()))
                        : Math.pow(Math.max(base, c.band().minAccelerationFullStepsPerS2()), 2)
                                / (2 * Math.max(1e-9, target - c.band().toFullStepsPerS()));
                throw new PlanningException(String.format(Locale.ROOT, "the band %s ... %s lies too close to %s for"
                        + " the jerk limit %s full steps/s³ to reach its crossing acceleration %s full steps/s²;"
                        + " raise the jerk limit to about %s full steps/s³ or use a trapezoidal profile",
                        rt.of(c.band().fromFullStepsPerS()), rt.of(c.band().toFullStepsPerS()),
                        c.band().fromFullStepsPerS() <= target / 2 ? "standstill" : "the cruise rate", sig(jerk),
                        sig(c.band().minAccelerationFullStepsPerS2()), sig(need)));
            }
        }
        List<Segment> all2 = new ArrayList<>(up);
        Segment last = up.get(up.size() - 1);
        double x = last.positionAt(last.endS());
        double t = tUp;
        if (s.cruiseS() > 0) {
            all2.add(new Segment(t, s.cruiseS(), target, 0, 0, x));
            x += target * s.cruiseS();
            t += s.cruiseS();
        }
        for (int k = up.size() - 1; k >= 0; k--) {
            Segment u = up.get(k);
            Segment d = new Segment(t, u.durationS(), u.rateAt(u.endS()), -u.accelAt(u.endS()), u.jerk(), x);
            all2.add(d);
            x = d.positionAt(d.endS());
            t = d.endS();
        }
        return new Profile(s, base, jerk, tUp, crossings, all2);
    }

    /**
     * Default jerk: the ramp from 0 to the base acceleration gains a tenth of the target rate ({@code a²/2j}), or
     * more where a raised band needs it to reach its level from standstill, or to come down before the target.
     */
    private static double defaultJerk(double base, double target, List<Band> bands) {
        double j = 5 * base * base / target;
        for (Band b : bands) {
            double level = Math.max(base, b.minAccelerationFullStepsPerS2());
            if (level > base) {
                double room = Math.min(b.fromFullStepsPerS(), target - b.toFullStepsPerS());
                if (room > 0) {
                    j = Math.max(j, level * level / (2 * 0.8 * room));
                }
            }
        }
        return j;
    }

    /** Piecewise-constant acceleration: breakpoints at the raised regions' edges. */
    private static List<Segment> trapezoid(double target, double base, List<double[]> raised) {
        List<Double> edges = new ArrayList<>(List.of(0.0, target));
        for (double[] r : raised) {
            edges.add(Math.max(0, r[0]));
            edges.add(Math.min(target, r[1]));
        }
        List<Double> cuts = edges.stream().filter(v -> v >= 0 && v <= target).distinct().sorted().toList();
        List<Segment> out = new ArrayList<>();
        double t = 0;
        double x = 0;
        for (int k = 0; k + 1 < cuts.size(); k++) {
            double v0 = cuts.get(k);
            double v1 = cuts.get(k + 1);
            if (v1 <= v0) {
                continue;
            }
            double a = level(0.5 * (v0 + v1), base, raised);
            double d = (v1 - v0) / a;
            out.add(new Segment(t, d, v0, a, 0, x));
            x += v0 * d + a * d * d / 2;
            t += d;
        }
        return out;
    }

    /** Jerk-limited: the acceleration follows the raised levels at the jerk limit and lands on the target at 0. */
    private static List<Segment> sCurve(double target, double base, double jerk, List<double[]> raised, double dt) {
        List<Segment> out = new ArrayList<>();
        double t = 0;
        double v = 0;
        double a = 0;
        double x = 0;
        for (int guard = 0; guard < 50_000_000; guard++) {
            double vNext = v + a * dt;
            if (a > 0 && target - vNext <= a * a / (2 * jerk)) {
                // land exactly: constant jerk j' = a²/(2·remaining) ≤ j brings a to 0 as v reaches the target
                double remaining = target - v;
                double j = a * a / (2 * remaining);
                double d = a / j;
                out.add(new Segment(t, d, v, a, -j, x));
                return out;
            }
            double want = level(v, base, raised);
            double aNew = a + Math.max(-jerk * dt, Math.min(jerk * dt, want - a));
            double j = (aNew - a) / dt;
            Segment seg = new Segment(t, dt, v, a, j, x);
            out.add(seg);
            x = seg.positionAt(t + dt);
            v = seg.rateAt(t + dt);
            a = aNew;
            t += dt;
        }
        throw new IllegalStateException("S-curve did not reach the target rate");
    }

    private static double level(double v, double base, List<double[]> raised) {
        double a = base;
        for (double[] r : raised) {
            if (v >= r[0] && v <= r[1]) {
                a = Math.max(a, r[2]);
            }
        }
        return a;
    }

    /** Least acceleration while the rate is inside the band, and the time spent there, on the way up. */
    private BandCrossing crossing(List<Segment> up, Band b, double base, double jerk) {
        double least = Double.POSITIVE_INFINITY;
        double time = 0;
        for (Segment s : up) {
            double v0 = s.rate();
            double v1 = s.rateAt(s.endS());
            if (v1 < b.fromFullStepsPerS() || v0 > b.toFullStepsPerS()) {
                continue;
            }
            // a stretch that only touches the band's edge counts for the part inside it
            double t0 = v0 >= b.fromFullStepsPerS() ? s.startS() : timeAtRate(s, b.fromFullStepsPerS());
            double t1 = v1 <= b.toFullStepsPerS() ? s.endS() : timeAtRate(s, b.toFullStepsPerS());
            if (t1 <= t0) {
                continue;
            }
            least = Math.min(least, Math.min(s.accelAt(t0), s.accelAt(t1)));
            time += t1 - t0;
        }
        double allowedLeast = allowed(b.toFullStepsPerS());
        return new BandCrossing(b, least, allowedLeast, time,
                Math.max(base, b.minAccelerationFullStepsPerS2()) > base);
    }

    private static double timeAtRate(Segment s, double rate) {
        double lo = s.startS();
        double hi = s.endS();
        for (int k = 0; k < 60; k++) {
            double mid = 0.5 * (lo + hi);
            if (s.rateAt(mid) < rate) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    private static String sig(double v) {
        return String.format(Locale.ROOT, "%.3g", v);
    }

    /** Rates in messages: full steps/s. */
    private static final class RateText {
        String of(double rate) {
            return String.format(Locale.ROOT, "%.1f full steps/s", rate);
        }
    }
}
