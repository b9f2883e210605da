package org.lodestep.report;

import java.util.ArrayList;
import java.util.List;

import org.lodestep.wiring.DriverWiring;
import org.lodestep.wiring.Finding;
import org.lodestep.wiring.Identification;
import org.lodestep.wiring.LeadPair;
import org.lodestep.wiring.ReadingUse;
import org.lodestep.wiring.TemperatureCorrection;
import org.lodestep.wiring.Winding;

/**
 * The JSON contract of {@code leads identify --json} and {@code leads probe --json}, as records whose components
 * become snake_case keys (see the README's "Identifying leads" section).
 */
public final class LeadsJsonView {

    /** One motor. */
    public record MotorJson(String source, String motor, String topology, boolean determined, List<String> leads,
                            List<WindingJson> windings, List<FindingJson> findings, List<DriverWiring> connections,
                            List<List<String>> missingPairs, TemperatureCorrection temperature,
                            List<ReadingJson> readings, int measuredPairs, int totalPairs, ProbeJson probe) {
    }

    /**
     * A winding; {@code resistanceAtReferenceOhm} is null without a measurement temperature. A value whose
     * measured flag is false was inferred from other readings, not read.
     */
    public record WindingJson(List<String> ends, String tap, double resistanceOhm, List<Double> halfResistancesOhm,
                              boolean halfWinding, boolean resistanceMeasured, List<Boolean> halfResistancesMeasured,
                              Double resistanceAtReferenceOhm) {
    }

    /** A finding. */
    public record FindingJson(String code, String severity, String message, List<String> leads) {
    }

    /** A reading: {@code resistance_ohm} null means open; {@code measured} false for a pair inferred, not read. */
    public record ReadingJson(List<String> leads, double resistanceOhm, String kind, boolean measured) {
    }

    /** How a guided measurement went. */
    public record ProbeJson(int readingsTaken, int allPairs) {
    }

    private LeadsJsonView() {
    }

    /** The view of one identification; {@code motor} and {@code probe} may be null. */
    public static MotorJson of(String source, String motor, Identification id, ProbeJson probe) {
        List<WindingJson> windings = new ArrayList<>();
        for (int i = 0; i < id.windings().size(); i++) {
            Winding w = id.windings().get(i);
            Double atRef = id.windingsAtReferenceOhm().isEmpty() ? null : meter(id.windingsAtReferenceOhm().get(i));
            windings.add(new WindingJson(w.ends(), w.tap(), meter(w.resistanceOhm()),
                    w.halfResistancesOhm().stream().map(LeadsJsonView::meter).toList(), w.halfWinding(),
                    w.resistanceMeasured(), w.halvesMeasured(), atRef));
        }
        List<FindingJson> findings = new ArrayList<>();
        for (Finding f : id.findings()) {
            findings.add(new FindingJson(f.code().code(), f.severity().label(), f.message(), f.leads()));
        }
        List<ReadingJson> readings = new ArrayList<>();
        for (ReadingUse u : id.readings()) {
            readings.add(new ReadingJson(pair(u.pair()), meter(u.resistanceOhm()), u.kind(), u.measured()));
        }
        // The phase resistance of a connection is a mean or sum of readings: to the meter's resolution too.
        List<DriverWiring> connections = id.connections().stream().map(c -> new DriverWiring(c.name(), c.terminals(),
                c.jumpers(), c.insulate(), meter(c.phaseResistanceOhm()), c.resistanceFactor(), c.inductanceFactor(),
                c.currentFactor(), c.tradeoff(), c.verified(), c.note())).toList();
        return new MotorJson(source, motor, id.topology().label(), id.determined(), id.leads(), windings, findings,
                connections, id.missingPairs().stream().map(LeadsJsonView::pair).toList(), id.temperature(),
                readings, id.measuredPairs(), id.totalPairs(), probe);
    }

    /** JSON text: one object, or an array when there are several motors. */
    public static String write(List<MotorJson> motors) {
        return Json.write(motors.size() == 1 ? motors.get(0) : motors);
    }

    /**
     * Ohms to the meter's resolution (1 mΩ): a sum of two readings must not print binary noise such as
     * 2.0199999999999996. Open (infinite) stays as it is.
     */
    static double meter(double ohms) {
        return Double.isFinite(ohms) && Math.abs(ohms) < 1e12 ? Math.round(ohms * 1000.0) / 1000.0 : ohms;
    }

    private static List<String> pair(LeadPair p) {
        return List.of(p.a(), p.b());
    }

}
