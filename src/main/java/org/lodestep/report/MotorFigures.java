package org.lodestep.report;

import java.util.List;
import java.util.Locale;

import org.lodestep.motor.BackEmfTrace;
import org.lodestep.motor.NormalisedStep;
import org.lodestep.motor.StepInput;
import org.lodestep.report.html.Chart;
import org.lodestep.report.html.Status;
import org.lodestep.report.html.XyChart;

/** The motor card's measurement figures: the back-EMF of both phases, and the step responses overlaid. */
final class MotorFigures {
    private MotorFigures() {
    }

    /** Every coil's back-EMF, start lead positive, over a few cycles, with the rising zero crossings of A and B. */
    static Chart backEmf(BackEmfTrace t) {
        double[] ms = t.timeMs();
        XyChart.Builder c = XyChart.builder("", "time from phase A's rising zero crossing (ms)", "back-EMF (V)");
        for (BackEmfTrace.Wave w : t.waves()) {
            c.line("phase " + w.phase() + ": coil " + w.coil().first() + " \u2192 " + w.coil().second(), ms,
                    w.voltageV());
        }
        c.verticalLine(0, "A \u2191", Status.INFO);
        if (Double.isFinite(t.bRisingMs())) {
            c.verticalLine(t.bRisingMs(), "B \u2191", Status.INFO);
        }
        c.topAxis("electrical angle (\u00B0 el., at " + MotorHtml.num(t.periodMs()) + " ms per cycle)",
                t::electricalDeg, 90);
        return c.size(760, 360).describe("Back-EMF of every coil over " + BackEmfTrace.CYCLES + " electrical cycles"
                + (Double.isFinite(t.lagDeg()) ? ", " + lagText(t) : "") + ".").build();
    }

    static String backEmfCaption(BackEmfTrace t) {
        String head = Double.isFinite(t.lagDeg())
                ? capitalised(lagText(t)) + " (measured over the whole capture): while the shaft turns the way it"
                + " was turned for the capture, phase A leads, and a driver whose B current lags its A current turns"
                + " it that way. "
                : "Only one phase was recorded: no phase lag. ";
        return head + "Each coil is drawn start lead positive, over " + BackEmfTrace.CYCLES + " electrical cycles"
                + " where the shaft turned fastest (" + MotorHtml.num(t.periodMs()) + " ms per cycle); the dashed lines"
                + " mark the rising zero crossings of A and B.";
    }

    private static String lagText(BackEmfTrace t) {
        return String.format(Locale.ROOT, "phase B lags phase A by %.1f\u00B0 electrical", t.lagDeg());
    }

    private static String capitalised(String s) {
        return Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    /**
     * The recorded step responses normalised ({@link NormalisedStep}) on one chart with the first-order curve they
     * share, and their residuals in a panel below.
     *
     * @param traces the recordings in the order of {@code steps}; may be shorter
     */
    static Chart steps(List<StepInput> steps, List<MotorHtml.Trace> traces) {
        int n = Math.min(steps.size(), traces.size());
        NormalisedStep[] ns = new NormalisedStep[n];
        int longest = 0;
        for (int k = 0; k < n; k++) {
            MotorHtml.Trace tr = traces.get(k);
            ns[k] = NormalisedStep.of(steps.get(k).fit(), tr.timeS(), tr.currentA());
            if (ns[k].timeConstants().length > ns[longest].timeConstants().length) {
                longest = k;
            }
        }
        XyChart.Builder c = XyChart.builder("", "time since the step, t/\u03C4 (time constants)",
                "current rise, i/I\u221E");
        for (int k = 0; k < n; k++) {
            c.points(MotorHtml.stepName(steps.get(k)), ns[k].timeConstants(), ns[k].measured());
        }
        c.referenceLine("first-order fit, 1 \u2212 e^(\u2212t/\u03C4)", ns[longest].timeConstants(),
                ns[longest].fitted());
        c.panel("residual (of I\u221E)").horizontalLine(0, "", Status.INFO);
        for (int k = 0; k < n; k++) {
            c.line(MotorHtml.stepName(steps.get(k)), ns[k].timeConstants(), ns[k].residual());
        }
        return c.size(760, 480).describe(n + " step responses normalised to their fits, with the first-order curve"
                + " and each residual.").build();
    }
}
