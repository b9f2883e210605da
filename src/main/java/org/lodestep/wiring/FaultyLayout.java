package org.lodestep.wiring;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * The layout of a motor with one open coil, from its lead count and what still conducts, and the connections that
 * still work on its healthy part (salvage).
 *
 * <p>Circuit topology (common practice): a two-phase motor with N leads has the groups of its healthy layout; one
 * open coil splits exactly one group. 4 leads: a winding and two loose leads (the open phase). 6 leads: a
 * centre-tapped winding, a pair and a loose lead; the pair reads half a winding when the half from the loose lead to
 * the tap is open (the tap is one of the pair), and a whole winding when the tap lead itself is broken. 8 leads:
 * three coils and two loose leads (the open coil). Derating of a salvage connection is stated against bipolar series
 * at equal copper loss: one half-winding per phase gives about 1/√2 (71 %) of its low-speed torque
 * ({@link Connection}: current ×√2 on half the turns).
 */
final class FaultyLayout {
    /** A pair reading above this fraction of the tapped winding's whole is a whole winding, not one half. */
    static final double WHOLE_WINDING_FRACTION = 0.75;
    static final String DERATED = "Salvage: about 71 % of the low-speed torque of bipolar series at equal copper loss;"
            + " repair or replace the motor when you can.";

    private FaultyLayout() {
    }

    /**
     * What the layout is.
     *
     * @param topology      the layout the lead count and the healthy groups imply
     * @param openLeads     the leads of the open coil (for a 6-lead half: the loose lead first, then the tap
     *                      candidates)
     * @param tapCandidates leads that may be the tap of the broken winding (6-lead), else empty
     * @param windings      the windings as they still read (a lone half marked as a half-winding)
     * @param salvage       connections that still work
     * @param message       what is open, for the open-winding finding
     * @param openCoils     the open coil as a schematic draws it; empty when a tap lead, not a coil, is broken
     */
    record Inference(Topology topology, List<String> openLeads, List<String> tapCandidates, List<Winding> windings,
                     List<DriverWiring> salvage, String message, List<OpenCoil> openCoils) {
    }

    static Optional<Inference> infer(int leadCount, List<List<String>> groups, List<Winding> windings) {
        List<String> loose = new ArrayList<>();
        List<List<String>> pairs = new ArrayList<>();
        List<List<String>> triples = new ArrayList<>();
        List<List<String>> fours = new ArrayList<>();
        for (List<String> g : groups) {
            switch (g.size()) {
                case 1 -> loose.add(g.get(0));
                case 2 -> pairs.add(g);
                case 3 -> triples.add(g);
                case 4 -> fours.add(g);
                default -> {
                    return Optional.empty();
                }
            }
        }
        if (leadCount == 5 && loose.size() == 1 && fours.size() == 1 && windings.size() == 3) {
            String common = windings.get(0).ends().get(0);
            String l = loose.get(0);
            List<Winding> coils = new ArrayList<>(windings);
            return Optional.of(new Inference(Topology.FIVE_LEAD, List.of(common, l), List.of(), coils, List.of(),
                    "5-lead motor, coil " + common + "-" + l + " open: " + l + " reads open to everything, and the"
                    + " other three coils share the common lead " + common + ". Unipolar drive needs all four coils,"
                    + " so no connection works until that coil is repaired.",
                    List.of(new OpenCoil(common, List.of(l)))));
        }
        if (!fours.isEmpty()) {
            return Optional.empty();
        }
        if (leadCount == 4 && loose.size() == 2 && pairs.size() == 1 && triples.isEmpty()) {
            return Optional.of(new Inference(Topology.FOUR_LEAD, loose, List.of(), windings, List.of(),
                    "4-lead motor, phase " + loose.get(0) + "-" + loose.get(1) + " open: " + loose.get(0) + " and "
                    + loose.get(1) + " read open to each other and to everything else. A two-phase motor needs both "
                    + "phases, so no connection works until that phase is repaired.",
                    List.of(new OpenCoil(loose.get(0), List.of(loose.get(1))))));
        }
        if (leadCount == 8 && loose.size() == 2 && pairs.size() == 3 && triples.isEmpty()) {
            List<Winding> coils = windings.stream()
                    .map(w -> new Winding(w.ends(), w.resistanceOhm(), true, w.resistanceMeasured()))
                    .toList();
            return Optional.of(new Inference(Topology.EIGHT_LEAD, loose, List.of(), coils,
                    List.of(onePerPhase(coils, loose)), "8-lead motor, coil " + loose.get(0) + "-" + loose.get(1)
                    + " open: three coils read healthy and those two leads read open to everything. The motor can "
                    + "still run bipolar on one healthy coil per phase (salvage connection).",
                    List.of(new OpenCoil(loose.get(0), List.of(loose.get(1))))));
        }
        if (leadCount == 6 && loose.size() == 1 && pairs.size() == 1 && triples.size() == 1) {
            Winding tapped = windings.stream().filter(w -> w.tap() != null).findFirst().orElse(null);
            Winding pair = windings.stream().filter(w -> w.tap() == null).findFirst().orElse(null);
            if (tapped == null || pair == null) {
                return Optional.empty();
            }
            String l = loose.get(0);
            if (pair.resistanceOhm() > WHOLE_WINDING_FRACTION * tapped.resistanceOhm()) {
                // The tap lead is broken: the ends still carry the whole winding, so bipolar series works.
                List<Winding> ws = List.of(tapped, pair);
                return Optional.of(new Inference(Topology.SIX_LEAD, List.of(l), List.of(l), ws,
                        List.of(seriesOnEnds(tapped, pair, l)), String.format(Locale.ROOT, "6-lead motor, the centre"
                        + " tap %s of winding %s-%s is broken off: %s-%s reads a whole winding (%s) but %s connects to"
                        + " nothing. Bipolar series on the ends still works; half-winding and unipolar need the tap.",
                        l, pair.ends().get(0), pair.ends().get(1), pair.ends().get(0), pair.ends().get(1),
                        ohm(pair.resistanceOhm()), l), List.of()));
            }
            Winding half = new Winding(pair.ends(), pair.resistanceOhm(), true, pair.resistanceMeasured());
            List<String> open = new ArrayList<>(List.of(l));
            open.addAll(pair.ends());
            return Optional.of(new Inference(Topology.SIX_LEAD, open, pair.ends(), List.of(tapped, half),
                    List.of(halfSalvage(tapped, half, l)), String.format(Locale.ROOT, "6-lead motor, one half of "
                    + "winding %s/%s/%s open: %s-%s reads one half (%s, about half of %s-%s), and %s connects to "
                    + "nothing, so the half from %s to the tap (%s or %s) is open. The motor can still run bipolar "
                    + "half-winding on its two healthy halves (salvage connection).",
                    l, pair.ends().get(0), pair.ends().get(1), pair.ends().get(0), pair.ends().get(1),
                    ohm(pair.resistanceOhm()), tapped.ends().get(0), tapped.ends().get(1), l, l,
                    pair.ends().get(0), pair.ends().get(1)), List.of(new OpenCoil(l, pair.ends()))));
        }
        return Optional.empty();
    }

    private static DriverWiring halfSalvage(Winding tapped, Winding half, String loose) {
        double r = (tapped.halfResistancesOhm().get(0) + half.resistanceOhm()) / 2;
        return new DriverWiring("salvage-bipolar-half-winding", terminals("A+", tapped.ends().get(0), "A-",
                tapped.tap(), "B+", half.ends().get(0), "B-", half.ends().get(1)), List.of(),
                List.of(tapped.ends().get(1), loose), Connection.HALF.phaseResistanceOhm(r),
                Connection.HALF.resistanceFactor(), Connection.HALF.inductanceFactor(),
                Connection.HALF.currentFactor(), DERATED, true,
                "Set the driver to the rated current of one half. Which of " + half.ends().get(0) + " and "
                + half.ends().get(1) + " is the tap does not matter here. If the motor turns the wrong way, swap A+ "
                + "and A-.");
    }

    private static DriverWiring seriesOnEnds(Winding tapped, Winding whole, String loose) {
        return new DriverWiring("salvage-bipolar-series", terminals("A+", tapped.ends().get(0), "A-",
                tapped.ends().get(1), "B+", whole.ends().get(0), "B-", whole.ends().get(1)), List.of(),
                List.of(tapped.tap(), loose), (tapped.resistanceOhm() + whole.resistanceOhm()) / 2,
                Connection.SERIES.resistanceFactor(), Connection.SERIES.inductanceFactor(),
                Connection.SERIES.currentFactor(), ConnectionGuide.SERIES, true,
                "Salvage: both taps insulated (one is broken off). If the motor turns the wrong way, swap A+ and A-.");
    }

    private static DriverWiring onePerPhase(List<Winding> coils, List<String> loose) {
        Winding a = coils.get(0);
        Winding b = coils.get(1);
        List<String> insulate = new ArrayList<>(coils.get(2).ends());
        insulate.addAll(loose);
        double r = (a.resistanceOhm() + b.resistanceOhm()) / 2;
        return new DriverWiring("salvage-bipolar-one-coil-per-phase", terminals("A+", a.ends().get(0), "A-",
                a.ends().get(1), "B+", b.ends().get(0), "B-", b.ends().get(1)), List.of(), insulate,
                Connection.HALF.phaseResistanceOhm(r), Connection.HALF.resistanceFactor(),
                Connection.HALF.inductanceFactor(), Connection.HALF.currentFactor(), DERATED, false,
                "The two coils must belong to different phases: resistance cannot tell which do; if the motor only "
                + "shudders, use " + coils.get(2).ends().get(0) + "-" + coils.get(2).ends().get(1) + " instead of "
                + b.ends().get(0) + "-" + b.ends().get(1) + " (back-EMF phasing, `lodestep motor identify`, settles"
                + " it). The open coil's leads stay insulated.");
    }

    private static Map<String, List<String>> terminals(String... kv) {
        Map<String, List<String>> m = new LinkedHashMap<>();
        for (int i = 0; i < kv.length; i += 2) {
            m.put(kv[i], List.of(kv[i + 1]));
        }
        return m;
    }

    private static String ohm(double v) {
        return String.format(Locale.ROOT, "%.3g Ω", v);
    }
}
