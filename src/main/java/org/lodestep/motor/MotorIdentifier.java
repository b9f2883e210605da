package org.lodestep.motor;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.lodestep.motor.PhaseAssignment.OrientedCoil;
import org.lodestep.wiring.Connection;
import org.lodestep.wiring.Topology;
import org.lodestep.wiring.Finding;

/**
 * Combines whatever is known about a motor (resistances, step responses, back-EMF) into a {@link MotorCard}, and says
 * what remains unknown. Each number comes from the formula class that owns it; this class only chooses and combines.
 */
public final class MotorIdentifier {
    private MotorIdentifier() {
    }

    /** Identifies the motor described by {@code request}. */
    public static MotorCard identify(IdentifyRequest request) {
        List<Finding> findings = new ArrayList<>();
        List<String> unknowns = new ArrayList<>();
        WindingInput windings = request.windings();
        BackEmfResult emf = request.backEmf();
        if (windings != null) {
            findings.addAll(windings.findings());
        }
        if (emf != null) {
            emf.findings().forEach(f -> findings.add(prefixed("back-EMF", f)));
        }
        PhaseAssignment.Result phases = PhaseAssignment.assign(windings, emf);
        findings.addAll(phases.findings());
        Topology topology = phases.topology();

        // Per-coil values keyed by the unordered lead pair.
        Map<Set<String>, Double> coilR = new HashMap<>();
        Map<Set<String>, Double> coilL = new HashMap<>();
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
        Map<String, Double> fullPhaseL = new HashMap<>();
        for (StepInput s : request.stepResponses()) {
            String where = "step response " + s.leads();
            s.fit().findings().forEach(f -> findings.add(prefixed(where, f)));
            Set<String> k = key(s.leads());
            if (s.joinedLeads().isEmpty() && (coilKeys.contains(k) || coilKeys.isEmpty())) {
                if (s.fit().inductanceH() != null) {
                    coilL.put(k, s.fit().inductanceH());
                } else {
                    unknowns.add(where + ": inductance needs the supply voltage (--supply-v or '# supply_v=') or "
                            + "the coil resistance");
                }
                Double fromStep = s.fit().windingResistanceOhm();
                if (!coilR.containsKey(k) && fromStep != null && fromStep > 0) {
                    coilR.put(k, fromStep);
                } else if (coilR.containsKey(k) && fromStep != null
                        && Math.abs(fromStep - coilR.get(k)) > Math.max(0.05 * coilR.get(k), 0.05)) {
                    // 5 % or 50 mOhm: meter and probe scatter (common practice); beyond that the loop is misdescribed
                    findings.add(Finding.info(MotorFindingCode.STEP_RESISTANCE, String.format(java.util.Locale.ROOT, "%s gives "
                            + "%.3g ohm for the coil, the resistance matrix %.3g ohm: the series resistance or the "
                            + "step voltage may be stated wrongly (the inductance uses the loop as measured)", where,
                            fromStep, coilR.get(k))));
                }
                continue;
            }
            SeriesMatch match = seriesPhaseOf(s, phases);
            if (match != null && s.fit().inductanceH() != null && match.aiding()) {
                fullPhaseL.put(match.phase(), s.fit().inductanceH());
            } else if (match != null && s.fit().inductanceH() != null) {
                findings.add(Finding.warning(MotorFindingCode.SERIES_OPPOSING, where + ": the two coils of phase " + match.phase()
                        + " were joined start to start (or end to end), so their fluxes cancel; join the end of one "
                        + "to the start of the other (see the series wiring) to measure the coupling"));
            } else {
                findings.add(Finding.warning(MotorFindingCode.STEP_UNMATCHED, where + " is not across one coil or one whole "
                        + "phase in series; ignored"));
            }
        }

        Connection connection = request.connection() != null ? request.connection() : switch (topology) {
            case FIVE_LEAD -> Connection.UNIPOLAR;
            default -> Connection.SERIES;
        };
        Wiring wiring = null;
        if (phases.complete()) {
            wiring = WiringPlanner.plan(connection, phases.phaseA(), phases.phaseB(), findings);
        } else if (topology == Topology.EIGHT_LEAD && emf == null) {
            unknowns.add("which coils share a phase, and their polarity: an 8-lead motor needs a back-EMF capture "
                    + "(--back-emf) before it can be wired in series or parallel");
        } else if (topology == Topology.FIVE_LEAD && emf == null) {
            unknowns.add("which coils form phases A and B: the four coils of a 5-lead motor share one lead, so only a "
                    + "back-EMF capture can pair them");
        } else if (windings != null && topology == Topology.UNKNOWN) {
            unknowns.add("the phases: the resistances fit no 4-, 5-, 6- or 8-lead layout (see the findings)");
        } else {
            unknowns.add("the phases: give a resistance matrix and/or a back-EMF capture");
        }
        if (phases.complete() && !phases.polarityKnown()) {
            unknowns.add("coil polarity: not needed to wire a " + topology.label() + " motor, it only sets the "
                    + "direction (swap A+ and A- to reverse); a back-EMF capture fixes it");
        }

        // A coupling measured on one phase stands for the other (same construction); kappa = 1 is the upper bound.
        List<String> kappaAssumedIn = new ArrayList<>();
        Double sharedKappa = null;
        for (String name : fullPhaseL.keySet()) {
            List<OrientedCoil> coils = name.equals("A") ? phases.phaseA() : phases.phaseB();
            Double lc = mean(coils.stream().map(c -> coilL.get(c.key())).toList());
            if (lc != null) {
                sharedKappa = CoupledCoils.couplingFactor(lc, fullPhaseL.get(name));
            }
        }
        List<PhaseCard> cards = new ArrayList<>();
        for (String name : List.of("A", "B")) {
            List<OrientedCoil> coils = name.equals("A") ? phases.phaseA() : phases.phaseB();
            if (coils.isEmpty()) {
                continue;
            }
            List<HalfWinding> hws = new ArrayList<>();
            for (OrientedCoil c : coils) {
                hws.add(new HalfWinding(c.start(), c.end(), coilR.get(c.key()), coilL.get(c.key()),
                        coilKe.get(c.key())));
            }
            Double r = mean(hws.stream().map(HalfWinding::resistanceOhm).toList());
            Double lc = mean(hws.stream().map(HalfWinding::inductanceH).toList());
            Double ke = mean(hws.stream().map(HalfWinding::keVsPerRad).toList());
            Double kappa = null;
            if (fullPhaseL.containsKey(name) && lc != null) {
                kappa = CoupledCoils.couplingFactor(lc, fullPhaseL.get(name));
                if (kappa < 0.5 || kappa > 1.05) {
                    findings.add(Finding.warning(MotorFindingCode.COUPLING, String.format("phase %s: coupling factor %.3f from the "
                            + "series response; below 0.5 the coils were joined in opposition, above 1 the "
                            + "responses disagree", name, kappa)));
                }
            }
            Double phaseR = null;
            Double phaseL = null;
            Double phaseKe = null;
            boolean two = coils.size() == 2;
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
        if (!kappaAssumedIn.isEmpty()) {
            String phasesText = "phase" + (kappaAssumedIn.size() > 1 ? "s " : " ") + String.join(" and ",
                    kappaAssumedIn);
            unknowns.add(sharedKappa == null
                    ? "coupling of the two coils of a phase: the " + connection.name().toLowerCase(java.util.Locale.ROOT)
                            + " inductance of " + phasesText + " assumes kappa = 1 (an upper bound); a step response "
                            + "across a whole phase in series measures it"
                    : String.format(java.util.Locale.ROOT, "coupling of %s not measured: the coupling %.3f of the "
                            + "other phase is used", phasesText, sharedKappa));
        }

        Integer teeth = emf == null ? null : emf.rotorTeeth();
        Integer steps = teeth == null ? null : StepGeometry.fullStepsPerRevolution(teeth);
        Double angle = teeth == null ? null : StepGeometry.stepAngleDeg(teeth);
        if (teeth == null) {
            unknowns.add("step angle: needs a back-EMF capture with the number of revolutions turned "
                    + "(--revolutions or '# revolutions=') or an index channel");
        }
        Double keHalf = mean(cards.stream().flatMap(p -> p.halfWindings().stream())
                .map(HalfWinding::keVsPerRad).toList());
        Double kt = mean(cards.stream().map(PhaseCard::keVsPerRad).toList());
        if (keHalf == null) {
            unknowns.add("Ke, Kt and torque: need a back-EMF capture with a known number of revolutions");
        }
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
            unknowns.add("rated current: needs the phases and their coil resistances");
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
        if (supply != null && phaseR != null && phaseL != null && current != null) {
            rate = DriveLimits.fullCurrentRateFullStepsPerS(supply, phaseR, phaseL, current);
            if (rate == 0.0) {
                findings.add(Finding.error(MotorFindingCode.SUPPLY_TOO_LOW, String.format("%.3g V cannot drive %.3g A through "
                        + "%.3g ohm", supply, current, phaseR)));
            }
        } else if (phaseL == null) {
            unknowns.add("inductance, time constant and the full-current step rate: need step responses");
        }
        Double fn = null;
        if (request.inertiaKgM2() != null) {
            if (teeth != null && torque != null) {
                fn = NaturalFrequency.naturalHz(torque, teeth, request.inertiaKgM2());
            } else {
                unknowns.add("natural frequency: needs the rotor teeth and Ke (back-EMF with revolutions)");
            }
        }

        String convention;
        if (emf != null && phases.polarityKnown() && phases.complete()) {
            convention = "phase B lags phase A by 90° electrical while the shaft turned as it was turned during the "
                    + "back-EMF capture; a driver whose B current lags its A current (A+, B+, A-, B- for full steps) "
                    + "turns it that same way; swap A+ and A- to reverse";
        } else {
            convention = "not measured: if the motor turns the wrong way, swap A+ and A-";
        }
        findings.sort(Comparator.comparing((Finding f) -> f.severity()).reversed());
        return new MotorCard(topology.label(), phases.leads(), connection.name().toLowerCase(java.util.Locale.ROOT),
                cards, wiring, convention, teeth, steps, angle, keHalf, kt, current, currentBasis, torque, iMin, iMax,
                assumption, supply, supplyBasis, suggested, rate, request.inertiaKgM2(), fn, unknowns, findings,
                emf, request.stepResponses());
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

    private static Finding prefixed(String where, Finding f) {
        return f.at(where);
    }
}
