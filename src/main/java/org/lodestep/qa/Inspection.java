package org.lodestep.qa;

import org.lodestep.wiring.InsulationReading;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.lodestep.wiring.PhaseImbalance;

/**
 * Judges one motor's measurements against a part spec: one {@link CheckResult} per measured value and spec limit,
 * and the overall verdict.
 *
 * <p>Phase resistance is referred to the spec's reference temperature with the copper formula before judging;
 * without a winding temperature it is judged as measured and the note says so. Insulation is judged on the raw
 * reading (references §9, small-motor practice) and its 40 °C value (IEEE 43 clause 6.3) is noted for
 * trending. A reading at another test voltage than the spec's leaves the check incomplete.
 */
public final class Inspection {

    /** Test voltages within this fraction of the spec's are accepted (tester setting tolerance). */
    static final double TEST_VOLTAGE_TOLERANCE = 0.05;

    /** Phases of a two-phase hybrid stepper. */
    static final int PHASES = 2;

    private Inspection() {
    }

    /** The judgement of one motor. */
    public record Judgement(Verdict verdict, List<CheckResult> checks) {
        public Judgement {
            checks = List.copyOf(checks);
        }
    }

    /** Judges every check the spec asks for. */
    public static Judgement judge(PartSpec spec, Measurements m) {
        List<CheckResult> out = new ArrayList<>();
        for (Limit limit : spec.limits()) {
            switch (limit.parameter()) {
                case Parameters.PHASE_RESISTANCE -> resistance(spec, m, limit, out);
                case Parameters.PHASE_IMBALANCE -> imbalance(m, limit, out);
                case Parameters.PHASE_INDUCTANCE -> perPhase(m.phaseInductancesH(), limit, "phase inductance", out);
                case Parameters.INSULATION_RESISTANCE -> insulation(spec, m, limit, out);
                case Parameters.BACK_EMF_CONSTANT -> single(m.backEmfConstantVsPerRad(), limit, "back-EMF constant", out);
                case Parameters.STEP_ANGLE -> single(m.stepAngleDeg(), limit, "step angle", out);
                default -> throw new IllegalStateException("no check for parameter " + limit.parameter());
            }
        }
        return new Judgement(Verdict.overall(out.stream().map(CheckResult::verdict).toList()), out);
    }

    /** Phase balance in per cent, by the one definition in {@link PhaseImbalance}. */
    static double imbalancePct(List<Double> values) {
        return PhaseImbalance.percent(values.stream().mapToDouble(Double::doubleValue).toArray());
    }

    private static void resistance(PartSpec spec, Measurements m, Limit limit, List<CheckResult> out) {
        if (m.phaseResistancesOhm().isEmpty()) {
            out.add(missing(limit, "phase resistance not measured"));
            return;
        }
        double t = m.windingTemperatureC();
        double ref = spec.referenceTemperatureC();
        for (int i = 0; i < m.phaseResistancesOhm().size(); i++) {
            double raw = m.phaseResistancesOhm().get(i);
            double judged;
            String note;
            if (Double.isNaN(t)) {
                judged = raw;
                note = "no winding temperature given: judged as measured, not corrected to " + fmt(ref) + " °C";
            } else {
                judged = WindingResistance.toReference(raw, t, ref);
                note = fmt(raw) + " \u03A9 at " + fmt(t) + " °C = " + fmt(judged) + " \u03A9 at " + fmt(ref) + " °C ("
                        + WindingResistance.STANDARD + ")";
            }
            out.add(judgedResult(limit, phaseLabel(i), raw, judged, note));
        }
        // A two-phase hybrid has two phase windings; fewer found in a complete reading means an open winding.
        for (int i = m.phaseResistancesOhm().size(); i < PHASES; i++) {
            out.add(new CheckResult(limit.parameter(), phaseLabel(i), Double.NaN, Double.NaN, limit, Verdict.FAIL,
                    "phase winding " + phaseLabel(i) + " not found: open winding or broken lead"));
        }
    }

    private static void imbalance(Measurements m, Limit limit, List<CheckResult> out) {
        if (m.phaseResistancesOhm().size() < 2) {
            out.add(missing(limit, "phase balance needs the resistance of at least two phases"));
            return;
        }
        double pct = imbalancePct(m.phaseResistancesOhm());
        out.add(judgedResult(limit, "", pct, pct, "100·(max − min)/mean of " + m.phaseResistancesOhm().size()
                + " phases (common practice)"));
    }

    private static void perPhase(List<Double> values, Limit limit, String what, List<CheckResult> out) {
        if (values.isEmpty()) {
            out.add(missing(limit, what + " not measured"));
            return;
        }
        for (int i = 0; i < values.size(); i++) {
            out.add(judgedResult(limit, phaseLabel(i), values.get(i), values.get(i), ""));
        }
    }

    private static void single(double value, Limit limit, String what, List<CheckResult> out) {
        if (Double.isNaN(value)) {
            out.add(missing(limit, what + " not measured"));
        } else {
            out.add(judgedResult(limit, "", value, value, ""));
        }
    }

    private static void insulation(PartSpec spec, Measurements m, Limit limit, List<CheckResult> out) {
        if (m.insulation().isEmpty()) {
            out.add(missing(limit, "insulation resistance not measured (spec: " + fmt(spec.insulationTestVoltageV())
                    + " V DC)"));
            return;
        }
        double specV = spec.insulationTestVoltageV();
        for (InsulationReading r : m.insulation()) {
            if (Math.abs(r.testVoltageV() - specV) > TEST_VOLTAGE_TOLERANCE * specV) {
                out.add(new CheckResult(limit.parameter(), r.label(), r.resistanceOhm(), Double.NaN, limit,
                        Verdict.INCOMPLETE, "tested at " + fmt(r.testVoltageV()) + " V DC but the spec asks for "
                        + fmt(specV) + " V DC (IEEE 43 Table 1): repeat at " + fmt(specV) + " V"));
                continue;
            }
            String note = "raw reading judged (small-motor practice)";
            if (Double.isInfinite(r.resistanceOhm())) {
                note = "above the tester's range";
            } else if (r.resistanceOhm() > 0 && !Double.isNaN(m.windingTemperatureC())) {
                // a dead short (0 Ω) fails as it reads; there is nothing to refer to 40 °C
                note += "; " + fmt(InsulationResistance.correctedTo40C(r.resistanceOhm(), m.windingTemperatureC()) / 1e6)
                        + " M\u03A9 at 40 °C for trending (IEEE 43 clause 6.3)";
            }
            out.add(judgedResult(limit, r.label(), r.resistanceOhm(), r.resistanceOhm(), note));
        }
    }

    private static CheckResult judgedResult(Limit limit, String label, double measured, double judged, String note) {
        Verdict v = limit.contains(judged) ? Verdict.PASS : Verdict.FAIL;
        return new CheckResult(limit.parameter(), label, measured, judged, limit, v, note);
    }

    private static CheckResult missing(Limit limit, String note) {
        return new CheckResult(limit.parameter(), "", Double.NaN, Double.NaN, limit, Verdict.INCOMPLETE, note);
    }

    static String phaseLabel(int i) {
        return i < 26 ? String.valueOf((char) ('A' + i)) : "P" + (i + 1);
    }

    /** Four significant digits, without a trailing ".0" on whole numbers (500 V, not 500.0 V). */
    static String fmt(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e7) {
            return String.valueOf((long) v);
        }
        String s = String.format(Locale.ROOT, "%.4g", v);
        return s.contains(".") && !s.contains("e") ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
    }
}
