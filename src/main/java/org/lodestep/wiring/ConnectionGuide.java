package org.lodestep.wiring;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;


/**
 * The driver connections a topology allows, with the user's lead labels on the driver terminals.
 *
 * <p>Factors come from {@link Connection} (REFERENCE-CHECKS item 5). Resistance cannot tell which two
 * half-windings of an 8-lead motor form one phase, nor the polarity of any coil, nor (5-lead) which two ends belong
 * to one phase: those mappings are given as provisional and marked unverified; back-EMF phasing settles them.
 */
final class ConnectionGuide {
    static final String SERIES = "Most torque at low speed; torque falls off early as speed rises (highest inductance).";
    static final String PARALLEL = "Keeps torque to higher speeds; needs the most driver current.";
    static final String HALF = "Keeps torque to higher speeds at the rated current of one half; less torque at low"
            + " speed than series.";
    static final String UNIPOLAR = "Simplest driver; about 70 % of the low-speed torque of bipolar series at equal"
            + " copper loss.";
    static final String WHOLE = "The only way to drive a 4-lead motor; torque and speed depend on driver voltage and"
            + " current.";
    static final String PHASING = "Resistance cannot tell which half-windings form a phase nor their polarity: run"
            + " `lodestep motor identify` (back-EMF phasing) before trusting this mapping, or try it at a low current"
            + " setting (a wrong guess gives no holding torque or rough motion).";
    static final String FIVE_PAIRING = "Resistance cannot tell which two ends belong to one phase: if the motor only"
            + " shudders, swap the leads on A' and B (back-EMF phasing, `lodestep motor identify`, settles it).";

    private ConnectionGuide() {
    }

    static List<DriverWiring> connections(Topology t, List<Winding> w) {
        return switch (t) {
            case FOUR_LEAD -> List.of(four(w));
            case SIX_LEAD -> six(w);
            case FIVE_LEAD -> List.of(five(w));
            case EIGHT_LEAD -> eight(w);
            case UNKNOWN -> List.of();
        };
    }

    private static DriverWiring four(List<Winding> w) {
        Winding a = w.get(0);
        Winding b = w.get(1);
        return new DriverWiring("bipolar", terminals("A+", a.ends().get(0), "A-", a.ends().get(1),
                "B+", b.ends().get(0), "B-", b.ends().get(1)), List.of(), List.of(),
                mean(a.resistanceOhm(), b.resistanceOhm()), Connection.WHOLE.resistanceFactor(),
                Connection.WHOLE.inductanceFactor(), Connection.WHOLE.currentFactor(), WHOLE, true,
                "If the motor turns the wrong way, swap A+ and A-.");
    }

    private static List<DriverWiring> six(List<Winding> w) {
        Winding a = w.get(0);
        Winding b = w.get(1);
        double half = mean(a.halfResistancesOhm().get(0), a.halfResistancesOhm().get(1),
                b.halfResistancesOhm().get(0), b.halfResistancesOhm().get(1));
        DriverWiring series = new DriverWiring("bipolar-series", terminals("A+", a.ends().get(0), "A-", a.ends().get(1),
                "B+", b.ends().get(0), "B-", b.ends().get(1)), List.of(), List.of(a.tap(), b.tap()),
                mean(a.resistanceOhm(), b.resistanceOhm()), Connection.SERIES.resistanceFactor(),
                Connection.SERIES.inductanceFactor(), Connection.SERIES.currentFactor(), SERIES, true,
                "Taps insulated. If the motor turns the wrong way, swap A+ and A-.");
        DriverWiring halfWinding = new DriverWiring("bipolar-half-winding", terminals("A+", a.ends().get(0),
                "A-", a.tap(), "B+", b.ends().get(0), "B-", b.tap()), List.of(),
                List.of(a.ends().get(1), b.ends().get(1)), Connection.HALF.phaseResistanceOhm(half),
                Connection.HALF.resistanceFactor(), Connection.HALF.inductanceFactor(),
                Connection.HALF.currentFactor(), HALF, true,
                "The unused ends insulated. If the motor turns the wrong way, swap A+ and A-.");
        DriverWiring unipolar = unipolar(List.of(a.tap(), b.tap()), a.ends().get(0), a.ends().get(1), b.ends().get(0),
                b.ends().get(1), List.of(), half, true,
                "Both taps to the supply common. If the motor turns the wrong way, swap A and A'.");
        return List.of(series, halfWinding, unipolar);
    }

    private static DriverWiring five(List<Winding> w) {
        String com = w.get(0).ends().get(0);
        double half = mean(w.stream().mapToDouble(Winding::resistanceOhm).toArray());
        return unipolar(List.of(com), w.get(0).ends().get(1), w.get(1).ends().get(1), w.get(2).ends().get(1),
                w.get(3).ends().get(1), List.of(), half, false, FIVE_PAIRING);
    }

    private static List<DriverWiring> eight(List<Winding> w) {
        Winding a1 = w.get(0);
        Winding a2 = w.get(1);
        Winding b1 = w.get(2);
        Winding b2 = w.get(3);
        double half = mean(w.stream().mapToDouble(Winding::resistanceOhm).toArray());
        DriverWiring series = new DriverWiring("bipolar-series", terminals("A+", a1.ends().get(0), "A-", a2.ends().get(1),
                "B+", b1.ends().get(0), "B-", b2.ends().get(1)),
                List.of(List.of(a1.ends().get(1), a2.ends().get(0)), List.of(b1.ends().get(1), b2.ends().get(0))),
                List.of(), Connection.SERIES.phaseResistanceOhm(half),
                Connection.SERIES.resistanceFactor(), Connection.SERIES.inductanceFactor(),
                Connection.SERIES.currentFactor(), SERIES, false, PHASING);
        Map<String, List<String>> par = new LinkedHashMap<>();
        par.put("A+", List.of(a1.ends().get(0), a2.ends().get(0)));
        par.put("A-", List.of(a1.ends().get(1), a2.ends().get(1)));
        par.put("B+", List.of(b1.ends().get(0), b2.ends().get(0)));
        par.put("B-", List.of(b1.ends().get(1), b2.ends().get(1)));
        DriverWiring parallel = new DriverWiring("bipolar-parallel", par, List.of(), List.of(),
                Connection.PARALLEL.phaseResistanceOhm(half),
                Connection.PARALLEL.resistanceFactor(), Connection.PARALLEL.inductanceFactor(),
                Connection.PARALLEL.currentFactor(), PARALLEL, false, PHASING);
        DriverWiring unipolar = unipolar(List.of(a1.ends().get(1), a2.ends().get(0), b1.ends().get(1), b2.ends().get(0)),
                a1.ends().get(0), a2.ends().get(1), b1.ends().get(0), b2.ends().get(1), List.of(), half, false,
                PHASING);
        return List.of(series, parallel, unipolar);
    }

    private static DriverWiring unipolar(List<String> common, String a, String a2, String b, String b2,
                                       List<List<String>> jumpers, double halfOhm, boolean verified, String note) {
        Map<String, List<String>> t = new LinkedHashMap<>();
        t.put("COM", common);
        t.put("A", List.of(a));
        t.put("A'", List.of(a2));
        t.put("B", List.of(b));
        t.put("B'", List.of(b2));
        return new DriverWiring("unipolar", t, jumpers, List.of(),
                Connection.UNIPOLAR.phaseResistanceOhm(halfOhm), Connection.UNIPOLAR.resistanceFactor(),
                Connection.UNIPOLAR.inductanceFactor(), Connection.UNIPOLAR.currentFactor(), UNIPOLAR, verified, note);
    }

    private static Map<String, List<String>> terminals(String... kv) {
        Map<String, List<String>> m = new LinkedHashMap<>();
        for (int i = 0; i < kv.length; i += 2) {
            m.put(kv[i], List.of(kv[i + 1]));
        }
        return m;
    }

    private static double mean(double... v) {
        double s = 0;
        for (double x : v) {
            s += x;
        }
        return s / v.length;
    }
}
