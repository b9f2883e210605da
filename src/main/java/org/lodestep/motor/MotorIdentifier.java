package org.lodestep.motor;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

import org.lodestep.motor.PhaseAssignment.OrientedCoil;
import org.lodestep.wiring.Connection;
import org.lodestep.wiring.Finding;
import org.lodestep.wiring.Topology;

/**
 * Combines whatever is known about a motor (resistances, step responses, back-EMF) into a {@link MotorCard}, and says
 * what remains unknown. Each number comes from the formula class that owns it; this class only chooses and combines,
 * in named steps: phase the coils, gather per-coil values, apply the step responses, plan the wiring, build the phase
 * cards, then the motor-wide figures (step angle, constants, ratings, drive limits).
 */
public final class MotorIdentifier {
    /** What the full-current rate asks of the drive, the start of its basis. */
    private static final String FULL_STEP_REVERSAL = "full stepping: each current reversal within two full steps, "
            + "against the inductance";

    private MotorIdentifier() {
    }

    /** What the steps find along the way: findings in the order found, and what stays unknown. */
    private record Notes(List<Finding> findings, List<Unknown> unknowns) {
        Notes() {
            this(new ArrayList<>(), new ArrayList<>());
        }
    }

    /** Per-coil values keyed by the unordered lead pair, and the coils of the assigned phases. */
    private record CoilValues(Map<Set<String>, Double> resistanceOhm, Map<Set<String>, Double> inductanceH,
                              Map<Set<String>, Double> keVsPerRad, List<Set<String>> phaseCoils) {
    }

    /** The phase cards and which phases had their coupling assumed. */
    private record Phases(List<PhaseCard> cards, List<String> kappaAssumedIn, Double sharedKappa) {
    }

    /** Identifies the motor described by {@code request}. */
    public static MotorCard identify(IdentifyRequest request) {
        Notes notes = new Notes();
        WindingInput windings = request.windings();
        BackEmfResult emf = request.backEmf();
        inputFindings(windings, emf, notes);
        PhaseAssignment.Result phases = PhaseAssignment.assign(windings, emf);
        notes.findings().addAll(phases.findings());
        Topology topology = phases.topology();

        CoilValues coils = coilValues(windings, emf, phases);
        Map<String, Double> fullPhaseL = applyStepResponses(request.stepResponses(), phases, coils, notes);
        Connection connection = request.connection() != null ? request.connection() : switch (topology) {
            case FIVE_LEAD -> Connection.UNIPOLAR;
            default -> Connection.SERIES;
        };
        Wiring wiring = planWiring(connection, phases, windings, emf, notes);
        Phases cards = phaseCards(connection, phases, coils, fullPhaseL, notes);
        if (!cards.kappaAssumedIn().isEmpty()) {
            notes.unknowns().add(cards.sharedKappa() == null
                    ? new Unknown(Unknown.What.COUPLING_ASSUMED_FULL, cards.kappaAssumedIn(), null)
                    : new Unknown(Unknown.What.COUPLING_FROM_OTHER_PHASE, cards.kappaAssumedIn(), cards.sharedKappa()));
        }
        return card(request, topology, phases, connection, wiring, cards.cards(), emf, notes);
    }

    /** The findings of the inputs themselves: the lead identification's, then the back-EMF analysis's. */
    private static void inputFindings(WindingInput windings, BackEmfResult emf, Notes notes) {
        if (windings != null) {
            notes.findings().addAll(windings.findings());
        }
        if (emf != null) {
            emf.findings().forEach(f -> notes.findings().add(f.at("back-EMF")));
        }
    }

    /** Resistances from the matrix and Ke from the back-EMF, per coil of the assigned phases. */
    private static CoilValues coilValues(WindingInput windings, BackEmfResult emf, PhaseAssignment.Result phases) {
        Map<Set<String>, Double> coilR = new HashMap<>();
        Map<Set<String>, Double> coilKe = new HashMap<>();
        List<Set<String>> coilKeys = new ArrayList<>();
        phases.phaseA().forEach(c -> coilKeys.add(c.key()));
        phases.phaseB().forEach(c -> coilKeys.add(c.key()));
        if (windings != null) {
            windings.coils().forEach(c -> coilR.put(key(c.leads()), c.resistanceOhm()));
        }
        if (emf != null) {
            for (EmfCoil ec : emf.coils()) {
                if (ec.keVsPerRad() == null) {
                    continue;
                }
                Set<String> k = key(ec.measured());
                if (coilKeys.contains(k)) {
                    coilKe.put(k, ec.keVsPerRad());
                } else {
                    // across a centre-tapped winding: two coils in series, each half the voltage
                    for (Set<String> ck : coilKeys) {
                        if (ck.contains(ec.measured().first()) ^ ck.contains(ec.measured().second())) {
                            coilKe.putIfAbsent(ck, ec.keVsPerRad() / 2);
                        }
                    }
                }
            }
        }
        return new CoilValues(coilR, new HashMap<>(), coilKe, coilKeys);
    }

    /**
     * Per-coil inductance (and resistance where the matrix has none) from the step responses across one coil; the
     * inductance of whole phases in series, by phase name, from the others.
     */
    private static Map<String, Double> applyStepResponses(List<StepInput> steps, PhaseAssignment.Result phases,
                                                          CoilValues coils, Notes notes) {
        Map<Set<String>, Double> coilR = coils.resistanceOhm();
        Map<String, Double> fullPhaseL = new HashMap<>();
        for (StepInput s : steps) {
            String where = "step response " + s.leads();
            s.fit().findings().forEach(f -> notes.findings().add(f.at(where)));
            Set<String> k = key(s.leads());
            if (s.joinedLeads().isEmpty() && (coils.phaseCoils().contains(k) || coils.phaseCoils().isEmpty())) {
                if (s.fit().inductanceH() != null) {
                    coils.inductanceH().put(k, s.fit().inductanceH());
                } else {
                    notes.unknowns().add(Unknown.of(Unknown.What.STEP_INDUCTANCE, s.leads().toString()));
                }
                Double fromStep = s.fit().windingResistanceOhm();
                if (!coilR.containsKey(k) && fromStep != null && fromStep > 0) {
                    coilR.put(k, fromStep);
                } else if (coilR.containsKey(k) && fromStep != null
                        && Math.abs(fromStep - coilR.get(k)) > Math.max(0.05 * coilR.get(k), 0.05)) {
                    // 5 % or 50 mOhm: meter and probe scatter (common practice); beyond that the loop is misdescribed
                    notes.findings().add(Finding.info(MotorFindingCode.STEP_RESISTANCE, String.format(Locale.ROOT,
                            "%s gives %.3g ohm for the coil, the resistance matrix %.3g ohm: the series resistance or "
                                    + "the step voltage may be stated wrongly (the inductance uses the loop as "
                                    + "measured)", where, fromStep, coilR.get(k))));
                }
                continue;
            }
            SeriesMatch match = seriesPhaseOf(s, phases);
            if (match != null && s.fit().inductanceH() != null && match.aiding()) {
                fullPhaseL.put(match.phase(), s.fit().inductanceH());
            } else if (match != null && s.fit().inductanceH() != null) {
                notes.findings().add(Finding.warning(MotorFindingCode.SERIES_OPPOSING, where + ": the two coils of "
                        + "phase " + match.phase() + " were joined start to start (or end to end), so their fluxes "
                        + "cancel; join the end of one to the start of the other (see the series wiring) to measure "
                        + "the coupling"));
            } else {
                notes.findings().add(Finding.warning(MotorFindingCode.STEP_UNMATCHED, where + " is not across one "
                        + "coil or one whole phase in series; ignored"));
            }
        }
        return fullPhaseL;
    }

    /** The driver wiring when both phases are known; otherwise null, with what is missing noted. */
    private static Wiring planWiring(Connection connection, PhaseAssignment.Result phases, WindingInput windings,
                                     BackEmfResult emf, Notes notes) {
        Topology topology = phases.topology();
        Wiring wiring = null;
        if (phases.complete()) {
            wiring = WiringPlanner.plan(connection, phases.phaseA(), phases.phaseB(), notes.findings());
        } else if (topology == Topology.EIGHT_LEAD && emf == null) {
            notes.unknowns().add(Unknown.of(Unknown.What.PHASES_OF_EIGHT_LEAD));
        } else if (topology == Topology.FIVE_LEAD && emf == null) {
            notes.unknowns().add(Unknown.of(Unknown.What.PHASES_OF_FIVE_LEAD));
        } else if (windings != null && topology == Topology.UNKNOWN) {
            notes.unknowns().add(Unknown.of(Unknown.What.PHASES_NO_LAYOUT));
        } else {
            notes.unknowns().add(Unknown.of(Unknown.What.PHASES_NO_DATA));
        }
        if (phases.complete() && !phases.polarityKnown()) {
            notes.unknowns().add(Unknown.of(Unknown.What.POLARITY, topology.label()));
        }
        return wiring;
    }

    /** Phases A and B with their half-windings and their values in the chosen connection. */
    private static Phases phaseCards(Connection connection, PhaseAssignment.Result phases, CoilValues coils,
                                     Map<String, Double> fullPhaseL, Notes notes) {
        // A coupling measured on one phase stands for the other (same construction); kappa = 1 is the upper bound.
        List<String> kappaAssumedIn = new ArrayList<>();
        Double sharedKappa = null;
        for (String name : fullPhaseL.keySet()) {
            Double lc = mean(coilsOf(phases, name).stream().map(c -> coils.inductanceH().get(c.key())).toList());
            if (lc != null) {
                sharedKappa = CoupledCoils.couplingFactor(lc, fullPhaseL.get(name));
            }
        }
        List<PhaseCard> cards = new ArrayList<>();
        for (String name : List.of("A", "B")) {
            List<OrientedCoil> phaseCoils = coilsOf(phases, name);
            if (phaseCoils.isEmpty()) {
                continue;
            }
            List<HalfWinding> hws = new ArrayList<>();
            for (OrientedCoil c : phaseCoils) {
                hws.add(new HalfWinding(c.start(), c.end(), coils.resistanceOhm().get(c.key()),
                        coils.inductanceH().get(c.key()), coils.keVsPerRad().get(c.key())));
            }
            Double r = mean(hws.stream().map(HalfWinding::resistanceOhm).toList());
            Double lc = mean(hws.stream().map(HalfWinding::inductanceH).toList());
            Double ke = mean(hws.stream().map(HalfWinding::keVsPerRad).toList());
            Double kappa = null;
            if (fullPhaseL.containsKey(name) && lc != null) {
                kappa = CoupledCoils.couplingFactor(lc, fullPhaseL.get(name));
                if (kappa < 0.5 || kappa > 1.05) {
                    notes.findings().add(Finding.warning(MotorFindingCode.COUPLING, String.format("phase %s: "
                            + "coupling factor %.3f from the series response; below 0.5 the coils were joined in "
                            + "opposition, above 1 the responses disagree", name, kappa)));
                }
            }
            Double phaseR = null;
            Double phaseL = null;
            Double phaseKe = null;
            boolean two = phaseCoils.size() == 2;
            switch (two ? connection : Connection.HALF) {
                case SERIES -> {
                    phaseR = r == null ? null : Connection.SERIES.phaseResistanceOhm(r);
                    if (fullPhaseL.containsKey(name)) {
                        phaseL = fullPhaseL.get(name);
                    } else if (lc != null) {
                        kappaAssumedIn.add(name);
                        phaseL = Connection.SERIES.phaseInductanceH(lc, sharedKappa == null ? 1.0 : sharedKappa);
                    }
                    phaseKe = ke == null ? null : 2 * ke;
                }
                case PARALLEL -> {
                    phaseR = r == null ? null : Connection.PARALLEL.phaseResistanceOhm(r);
                    if (lc != null) {
                        if (kappa == null) {
                            kappaAssumedIn.add(name);
                        }
                        double k = kappa != null ? kappa : sharedKappa != null ? sharedKappa : 1.0;
                        phaseL = Connection.PARALLEL.phaseInductanceH(lc, k);
                    }
                    phaseKe = ke;
                }
                default -> {
                    phaseR = r;
                    phaseL = lc;
                    phaseKe = ke;
                }
            }
            Double tau = phaseR != null && phaseL != null ? RlStep.timeConstantS(phaseL, phaseR) : null;
            cards.add(new PhaseCard(name, hws, phases.polarityKnown(), phaseR, phaseL, kappa, tau, phaseKe));
        }
        return new Phases(cards, kappaAssumedIn, sharedKappa);
    }

    /**
     * The motor-wide figures (step angle, constants, the drive figures, natural frequency), each noted as unknown
     * where its inputs are missing, and the card.
     */
    private static MotorCard card(IdentifyRequest request, Topology topology, PhaseAssignment.Result phases,
                                  Connection connection, Wiring wiring, List<PhaseCard> cards, BackEmfResult emf,
                                  Notes notes) {
        List<Unknown> unknowns = notes.unknowns();
        List<Finding> findings = notes.findings();
        Integer teeth = emf == null ? null : emf.rotorTeeth();
        Integer steps = teeth == null ? null : StepGeometry.fullStepsPerRevolution(teeth);
        Double angle = teeth == null ? null : StepGeometry.stepAngleDeg(teeth);
        if (teeth == null) {
            unknowns.add(Unknown.of(Unknown.What.STEP_ANGLE));
        }
        Double keHalf = mean(cards.stream().flatMap(p -> p.halfWindings().stream())
                .map(HalfWinding::keVsPerRad).toList());
        Double kt = mean(cards.stream().map(PhaseCard::keVsPerRad).toList());
        if (keHalf == null) {
            unknowns.add(Unknown.of(Unknown.What.KE));
        }
        Drive d = drive(request, cards, kt, steps, notes);
        Double fn = null;
        if (request.inertiaKgM2() != null) {
            if (teeth != null && d.torque() != null) {
                fn = NaturalFrequency.naturalHz(d.torque(), teeth, request.inertiaKgM2());
            } else {
                unknowns.add(Unknown.of(Unknown.What.NATURAL_FREQUENCY));
            }
        }
        findings.sort(Comparator.comparing((Finding f) -> f.severity()).reversed());
        return new MotorCard(topology.label(), phases.leads(), connection.label(), cards, wiring,
                rotationConvention(emf, phases), teeth, steps, angle, keHalf, kt, d.current(), d.currentBasis(),
                d.torque(), d.ratedMinA(), d.ratedMaxA(), d.ratedAssumption(), d.supply(), d.supplyBasis(),
                d.suggestedSupply(), d.rate(), d.rateBasis(), request.inertiaKgM2(), fn, unknowns, findings, emf,
                request.stepResponses());
    }

    /** The drive figures: rated-current estimate, the current used and its torque, supply, full-current rate. */
    private record Drive(Double current, String currentBasis, Double torque, Double ratedMinA, Double ratedMaxA,
                         String ratedAssumption, Double supply, String supplyBasis, Double suggestedSupply,
                         Double rate, String rateBasis) {
    }

    /** The drive figures from the phases in the chosen connection, each noted as unknown where inputs are missing. */
    private static Drive drive(IdentifyRequest request, List<PhaseCard> cards, Double kt, Integer steps,
                               Notes notes) {
        List<Unknown> unknowns = notes.unknowns();
        List<Finding> findings = notes.findings();
        Double phaseR = mean(cards.stream().map(PhaseCard::resistanceOhm).toList());
        Double phaseL = mean(cards.stream().map(PhaseCard::inductanceH).toList());

        Double iMin = null;
        Double iMax = null;
        String assumption = null;
        if (phaseR != null) {
            iMin = DriveLimits.currentForLossA(phaseR, DriveLimits.LOW_LOSS_PER_PHASE_W);
            iMax = DriveLimits.currentForLossA(phaseR, DriveLimits.HIGH_LOSS_PER_PHASE_W);
            assumption = String.format("copper loss of %.0f to %.0f W per phase at room temperature, usual for hybrid "
                    + "motors of 35 to 60 mm frame (common practice, no published source); confirm with a "
                    + "temperature-rise test (case below about 80 °C)", DriveLimits.LOW_LOSS_PER_PHASE_W,
                    DriveLimits.HIGH_LOSS_PER_PHASE_W);
        } else {
            unknowns.add(Unknown.of(Unknown.What.RATED_CURRENT));
        }
        Double current = request.phaseCurrentA();
        String currentBasis = current != null ? "given" : null;
        if (current == null && iMin != null) {
            current = (iMin + iMax) / 2;
            currentBasis = "middle of the estimated rated range";
        }
        Double torque = kt != null && current != null ? MotorConstants.peakTorqueNm(kt, current) : null;

        Double suggested = phaseL != null ? DriveLimits.suggestedSupplyV(phaseL) : null;
        Double supply = request.supplyV();
        String supplyBasis = supply != null ? "given" : null;
        if (supply == null && suggested != null) {
            supply = suggested;
            supplyBasis = "rule-of-thumb suggestion";
        }
        Double rate = null;
        String rateBasis = null;
        if (supply != null && phaseR != null && phaseL != null && current != null) {
            rate = DriveLimits.fullCurrentRateFullStepsPerS(supply, phaseR, phaseL, current);
            if (rate == 0.0) {
                findings.add(Finding.error(MotorFindingCode.SUPPLY_TOO_LOW, String.format("%.3g V cannot drive "
                        + "%.3g A through %.3g ohm", supply, current, phaseR)));
                rateBasis = "the supply cannot drive the current through the winding resistance";
            } else if (kt != null && steps != null) {
                rate = withBackEmf(rate, supply, phaseR, phaseL, current, kt, steps, findings);
                rateBasis = FULL_STEP_REVERSAL + " and the back-EMF at its peak";
            } else {
                rateBasis = FULL_STEP_REVERSAL + " only; the back-EMF (needs Kt and the rotor teeth) would lower it";
            }
        } else if (phaseL == null) {
            unknowns.add(Unknown.of(Unknown.What.INDUCTANCE));
        }
        return new Drive(current, currentBasis, torque, iMin, iMax, assumption, supply, supplyBasis, suggested, rate,
                rateBasis);
    }

    /** The full-current rate lowered by the back-EMF ({@link BackEmfCurrentLimit}), with which limit binds. */
    private static double withBackEmf(double inductanceRate, double supply, double phaseR, double phaseL,
                                      double current, double ke, int steps, List<Finding> findings) {
        double rate = BackEmfCurrentLimit.rateFullStepsPerS(supply, phaseR, phaseL, current, ke, steps);
        double emfV = ke * 2 * Math.PI * rate / steps;
        boolean emfBinds = rate < (1 - BackEmfCurrentLimit.BINDING_FRACTION) * inductanceRate;
        findings.add(Finding.info(MotorFindingCode.FULL_CURRENT_LIMIT, String.format(java.util.Locale.ROOT,
                "full current up to %.4g full steps/s, limited by %s: the inductance alone would allow %.4g; there "
                + "the back-EMF is %.3g V peak against a %.3g V supply (worst-case EMF during each reversal; dead "
                + "time and saturation ignored)", rate, emfBinds ? "back-EMF" : "inductance", inductanceRate, emfV,
                supply)));
        return rate;
    }

    /** What the phase order means for the direction of rotation. */
    private static String rotationConvention(BackEmfResult emf, PhaseAssignment.Result phases) {
        if (emf != null && phases.polarityKnown() && phases.complete()) {
            return "phase B lags phase A by 90° electrical while the shaft turned as it was turned during the "
                    + "back-EMF capture; a driver whose B current lags its A current (A+, B+, A-, B- for full steps) "
                    + "turns it that same way; swap A+ and A- to reverse";
        }
        return "not measured: if the motor turns the wrong way, swap A+ and A-";
    }

    private static List<OrientedCoil> coilsOf(PhaseAssignment.Result phases, String name) {
        return name.equals("A") ? phases.phaseA() : phases.phaseB();
    }

    /** A step response across both coils of one phase: which phase, and whether the coils aided each other. */
    private record SeriesMatch(String phase, boolean aiding) {
    }

    /**
     * Matches a step response across a whole phase in series: a centre-tapped winding end to end, or two 8-lead
     * coils with one lead of each joined. Joining the end of one coil to the start of the other adds their fluxes
     * (aiding); joining two starts or two ends opposes them.
     */
    private static SeriesMatch seriesPhaseOf(StepInput s, PhaseAssignment.Result phases) {
        Set<String> across = key(s.leads());
        for (String name : List.of("A", "B")) {
            List<OrientedCoil> coils = name.equals("A") ? phases.phaseA() : phases.phaseB();
            if (coils.size() != 2) {
                continue;
            }
            OrientedCoil c1 = coils.get(0);
            OrientedCoil c2 = coils.get(1);
            if (c1.end().equals(c2.start())) {
                if (s.joinedLeads().isEmpty() && across.equals(Set.of(c1.start(), c2.end()))) {
                    return new SeriesMatch(name, true);
                }
                continue;
            }
            if (s.joinedLeads().size() != 2) {
                continue;
            }
            Set<String> joined = Set.copyOf(s.joinedLeads());
            boolean oneEach = across.stream().filter(c1.key()::contains).count() == 1
                    && across.stream().filter(c2.key()::contains).count() == 1
                    && joined.stream().filter(c1.key()::contains).count() == 1
                    && joined.stream().filter(c2.key()::contains).count() == 1
                    && across.stream().noneMatch(joined::contains);
            if (!oneEach) {
                continue;
            }
            boolean aiding = joined.equals(Set.of(c1.end(), c2.start())) || joined.equals(Set.of(c1.start(), c2.end()));
            return new SeriesMatch(name, aiding);
        }
        return null;
    }

    private static Set<String> key(OrientedLeads p) {
        return Set.of(p.first(), p.second());
    }

    private static Double mean(List<Double> values) {
        if (values.isEmpty() || values.stream().anyMatch(v -> v == null)) {
            return null;
        }
        return values.stream().mapToDouble(Double::doubleValue).average().orElseThrow();
    }

}
