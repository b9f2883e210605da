package org.lodestep.rig;

import org.lodestep.drive.DriveMode;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;

/**
 * The virtual motor on the virtual bench: its winding network, which relay position reaches which lead, and the
 * signals the rig's instruments would read. Every random draw comes from one generator seeded by the scenario.
 *
 * <p>Physics used: nodal resistance ({@link WindingNetwork}); RL step response i(t) = V/R·(1 − e^(−t/τ)), τ = L/R
 * (Alexander and Sadiku, Fundamentals of Electric Circuits, first-order circuits chapter); hand-turn back-EMF
 * e_A = −K_e·ω·sin(N_r·θ), e_B = +K_e·ω·cos(N_r·θ) (Acarnley, Stepping Motors, 4th ed., IEE 2002, hybrid-motor model);
 * rotor dynamics ({@link RotorDynamics}). Shorted turns scale a half-winding's resistance and back-EMF by (1 − f)
 * and its inductance by (1 − f)² (turns squared); the shorted loop's own eddy effect is not modelled.
 */
final class BenchMotor {
    /** Standard gravity, m/s² (CGPM 1901). */
    static final double G0_M_PER_S2 = 9.80665;
    /** Four-wire meter: noise as a fraction of reading, and a residual contact error, ohm. */
    static final double METER_NOISE_FRACTION = 0.0005;
    static final double METER_CONTACT_OHM = 0.003;
    /** Four-wire meter range, ohm: above it the rig reports over-range. */
    static final double METER_RANGE_OHM = 100_000;
    /** Insulation tester range, ohm. */
    static final double INSULATION_RANGE_OHM = 1e11;
    /** Current-sense and switch resistance in series with a step-response drive, ohm. */
    static final double DRIVE_SERIES_OHM = 0.1;
    /** Chopper supply when none is stated, V. */
    static final double CHOPPER_SUPPLY_V = 24.0;
    /** Step output level, V. */
    static final double STEP_HIGH_V = 5.0;

    private final Scenario scenario;
    private final WindingNetwork network;
    /** terminalOfPosition[k] = network node reached by relay position k (0-based). */
    private final int[] nodeOfPosition;
    private final List<String> labelOfPosition;
    private final Random random;
    private double lastHandTurnRevolutions = Double.NaN;

    BenchMotor(Scenario s) {
        this.scenario = s;
        this.random = new Random(s.seed());
        List<WindingNetwork.Half> halves = new ArrayList<>();
        int[] terminals;
        int nodes;
        double[] ohm = new double[4];
        double[] henry = new double[4];
        double[] emf = new double[4];
        boolean[] open = new boolean[4];
        for (int i = 0; i < 4; i++) {
            ohm[i] = s.halfWindingOhm();
            henry[i] = s.halfWindingH();
            emf[i] = 1.0;
        }
        for (Scenario.Fault f : s.faults()) {
            int w = windingIndex(f);
            switch (f.kind()) {
                case "open" -> open[w] = true;
                case "shorted-turns" -> {
                    ohm[w] *= 1 - f.fraction();
                    henry[w] *= (1 - f.fraction()) * (1 - f.fraction());
                    emf[w] *= 1 - f.fraction();
                }
                default -> {
                    // handled on the network below
                }
            }
        }
        // half index i = phase*2 + half
        switch (s.leads()) {
            case 8 -> {
                nodes = 9;
                for (int i = 0; i < 4; i++) {
                    halves.add(new WindingNetwork.Half(i / 2, i % 2, 2 * i, 2 * i + 1, ohm[i], henry[i], emf[i],
                            open[i]));
                }
                terminals = new int[] {0, 1, 2, 3, 4, 5, 6, 7};
            }
            case 6 -> {
                nodes = 7;
                for (int i = 0; i < 4; i++) {
                    int base = 3 * (i / 2);
                    halves.add(new WindingNetwork.Half(i / 2, i % 2, base + i % 2, base + i % 2 + 1, ohm[i],
                            henry[i], emf[i], open[i]));
                }
                terminals = new int[] {0, 1, 2, 3, 4, 5};
            }
            default -> {
                nodes = 7; // centre nodes 1 and 4 are internal
                for (int i = 0; i < 4; i++) {
                    int base = 3 * (i / 2);
                    halves.add(new WindingNetwork.Half(i / 2, i % 2, base + i % 2, base + i % 2 + 1, ohm[i],
                            henry[i], emf[i], open[i]));
                }
                terminals = new int[] {0, 2, 3, 5};
            }
        }
        int frame = nodes - 1;
        network = new WindingNetwork(nodes, frame, halves, s.coupling());
        double[] insulation = {s.insulationOhm() * 2, s.insulationOhm() * 2, s.insulationOhm() * 2,
                s.insulationOhm() * 2};
        List<String> labels = new ArrayList<>(s.leadLabels());
        for (Scenario.Fault f : s.faults()) {
            switch (f.kind()) {
                case "leakage" -> network.addResistor(halves.get(0).end(), halves.get(2).end(), f.ohm());
                case "low-insulation" -> insulation[windingIndex(f)] = f.ohm();
                case "swapped-leads" -> {
                    if (f.labels().size() != 2) {
                        throw new IllegalArgumentException("swapped-leads needs labels = [i, j]");
                    }
                    Collections.swap(labels, f.labels().get(0) - 1, f.labels().get(1) - 1);
                }
                default -> {
                    // winding faults handled above
                }
            }
        }
        for (int i = 0; i < 4; i++) {
            network.addResistor(halves.get(i).start(), frame, insulation[i]);
        }
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < s.leads(); i++) {
            order.add(i);
        }
        if (s.shuffleLeads()) {
            Collections.shuffle(order, new Random(s.seed() * 31 + 7));
        }
        nodeOfPosition = new int[s.leads()];
        List<String> posLabels = new ArrayList<>();
        for (int k = 0; k < s.leads(); k++) {
            nodeOfPosition[k] = terminals[order.get(k)];
            posLabels.add(labels.get(order.get(k)));
        }
        labelOfPosition = List.copyOf(posLabels);
    }

    private static int windingIndex(Scenario.Fault f) {
        String w = f.winding() == null ? "" : f.winding();
        return switch (w) {
            case "A1" -> 0;
            case "A2" -> 1;
            case "B1" -> 2;
            case "B2" -> 3;
            default -> {
                if (List.of("open", "shorted-turns", "low-insulation").contains(f.kind())) {
                    throw new IllegalArgumentException("fault " + f.kind() + " needs winding A1, A2, B1 or B2, got '"
                            + w + "'");
                }
                yield 0;
            }
        };
    }

    Scenario scenario() {
        return scenario;
    }

    int leadCount() {
        return nodeOfPosition.length;
    }

    /** The label (lead colour) clipped to each relay position, 1-based position = index + 1. */
    List<String> labels() {
        return labelOfPosition;
    }

    private int node(int position) {
        return nodeOfPosition[position - 1];
    }

    /** True four-wire resistance between two relay positions (1-based), ohm. */
    double trueResistanceOhm(int a, int b) {
        return network.resistanceOhm(node(a), node(b));
    }

    /** A four-wire meter reading, ohm, or +infinity when over range. */
    double readResistanceOhm(int a, int b) {
        double r = trueResistanceOhm(a, b);
        if (r > METER_RANGE_OHM) {
            return Double.POSITIVE_INFINITY;
        }
        return Math.max(0, r * (1 + METER_NOISE_FRACTION * random.nextGaussian())
                + METER_CONTACT_OHM * (random.nextDouble() - 0.5));
    }

    /** An insulation reading from a relay position to the frame, ohm, or +infinity above the tester's range. */
    double readInsulationOhm(int position) {
        double r = network.resistanceOhm(node(position), network.frameNode());
        if (r > INSULATION_RANGE_OHM) {
            return Double.POSITIVE_INFINITY;
        }
        return r * (1 + 0.03 * random.nextGaussian());
    }

    /** Loop inductance between two positions through windings, henry; 0 when no winding joins them. */
    double inductanceH(int a, int b) {
        return network.inductanceH(network.windingPath(node(a), node(b)));
    }

    /**
     * A current step: {@code volts} applied at 10 % of the record through the drive's series resistance.
     *
     * @return channels current (A) and voltage (V), {@code frames} samples each
     */
    double[][] stepResponse(int a, int b, double volts, double sampleRateHz, int frames, double currentLsbA) {
        double r = trueResistanceOhm(a, b) + DRIVE_SERIES_OHM;
        double l = inductanceH(a, b);
        double tau = l / r;
        int onset = frames / 10;
        double[][] out = new double[2][frames];
        for (int i = 0; i < frames; i++) {
            double t = (i - onset) / sampleRateHz;
            double current = t < 0 ? 0 : tau > 0 ? volts / r * (1 - Math.exp(-t / tau)) : volts / r;
            out[0][i] = current + currentLsbA * 2 * random.nextGaussian();
            out[1][i] = (t < 0 ? 0 : volts) + 0.002 * random.nextGaussian();
        }
        return out;
    }

    /** Peak steady current a step of {@code volts} would drive between two positions, A. */
    double stepCurrentA(int a, int b, double volts) {
        return volts / (trueResistanceOhm(a, b) + DRIVE_SERIES_OHM);
    }

    /**
     * Open-circuit voltages V(p) − V(q) for each pair while a hand turns the shaft: a smooth ramp up over the first
     * 20 % of the record, steady at the scenario's hand speed, a ramp down over the last 20 %.
     */
    double[][] handTurnEmf(List<int[]> pairs, double seconds, double sampleRateHz, int frames) {
        double peak = scenario.handTurnRpm() * 2 * Math.PI / 60;
        double theta = random.nextDouble() * 2 * Math.PI / scenario.rotorTeeth();
        double theta0 = theta;
        int nr = scenario.rotorTeeth();
        List<List<WindingNetwork.Step>> paths = new ArrayList<>();
        for (int[] p : pairs) {
            // V(p) - V(q) = sum of half EMFs walked from q to p
            paths.add(network.windingPath(node(p[1]), node(p[0])));
        }
        double[][] out = new double[pairs.size()][frames];
        double dt = 1.0 / sampleRateHz;
        int sub = 8;
        for (int i = 0; i < frames; i++) {
            double t = i * dt;
            double omega = handSpeed(t, seconds, peak);
            double ea = -scenario.keVsPerRad() / 2 * omega * Math.sin(nr * theta);
            double eb = scenario.keVsPerRad() / 2 * omega * Math.cos(nr * theta);
            for (int c = 0; c < pairs.size(); c++) {
                double v = 0;
                for (WindingNetwork.Step st : paths.get(c)) {
                    v += st.sign() * st.half().emfScale() * (st.half().phase() == 0 ? ea : eb);
                }
                out[c][i] = v + 0.002 * random.nextGaussian();
            }
            for (int s = 0; s < sub; s++) {
                // midpoint rule on the smooth hand speed
                theta += handSpeed(t + (s + 0.5) * dt / sub, seconds, peak) * dt / sub;
            }
        }
        lastHandTurnRevolutions = (theta - theta0) / (2 * Math.PI);
        return out;
    }

    /** Mechanical revolutions the hand turned during the last {@link #handTurnEmf} record (NaN before any). */
    double handTurnRevolutions() {
        return lastHandTurnRevolutions;
    }

    static double handSpeed(double t, double seconds, double peakRadPerS) {
        double ramp = 0.2 * seconds;
        if (t < ramp) {
            return peakRadPerS * 0.5 * (1 - Math.cos(Math.PI * t / ramp));
        }
        if (t > seconds - ramp) {
            return peakRadPerS * 0.5 * (1 - Math.cos(Math.PI * Math.max(0, seconds - t) / ramp));
        }
        return peakRadPerS;
    }

    /**
     * The phase circuits of this motor connected bipolar series (both halves of a phase in series: R = 2r plus the
     * drive's sense resistance, L = 2·L_half·(1 + k)) on a drive of the given mode. The motor constant K is the one
     * that gives the scenario's holding torque with rated current in both phases (T_h = √2·K·I), so the rotor rings
     * at the scenario's natural frequency; a constant-voltage supply is rated current × R unless stated, a chopper's
     * supply 24 V unless stated (common practice for small drives).
     */
    DriveSettings driveSettings(DriveMode mode, double supplyV) {
        double r = 2 * scenario.halfWindingOhm() + DRIVE_SERIES_OHM;
        double l = 2 * scenario.halfWindingH() * (1 + scenario.coupling());
        double k = scenario.holdingTorqueNm() / (Math.sqrt(2) * scenario.ratedCurrentA());
        if (mode == DriveMode.CONSTANT_VOLTAGE) {
            return DriveSettings.constantVoltage(r, l, k, supplyV > 0 ? supplyV : scenario.ratedCurrentA() * r);
        }
        return DriveSettings.chopper(r, l, k, supplyV > 0 ? supplyV : CHOPPER_SUPPLY_V, scenario.ratedCurrentA());
    }

    /**
     * A step-rate sweep through a drive whose phase currents obey the winding circuits with back-EMF
     * ({@link DrivenMotor}), linear in rate as {@link #sweep}.
     *
     * @return channels accel (g, as {@link #sweep}), current_a and current_b (phase currents, A, with 1 % of rated
     *         current as noise) and step (V, the full-step marker)
     */
    double[][] sweepDriven(double fromStepsPerS, double toStepsPerS, double seconds, int microsteps,
                           double sampleRateHz, DriveSettings drive) {
        RotorSettings rs = new RotorSettings(scenario.totalInertiaKgM2(), scenario.dampingNmsPerRad(),
                scenario.detentTorqueNm(), scenario.rotorTeeth());
        RotorDynamics ideal = new RotorDynamics(scenario.totalInertiaKgM2(), scenario.dampingNmsPerRad(),
                scenario.holdingTorqueNm(), scenario.detentTorqueNm(), scenario.rotorTeeth(), microsteps);
        DrivenMotor m = new DrivenMotor(drive, rs, ideal.electricalAngleRad(0) / scenario.rotorTeeth());
        double slope = (toStepsPerS - fromStepsPerS) / seconds;
        int frames = (int) Math.round(seconds * sampleRateHz);
        double samplePeriodS = 1 / sampleRateHz;
        double maxRate = Math.max(fromStepsPerS, toStepsPerS);
        double target = Math.min(Math.min(m.maxStepS(), 1 / ideal.naturalFrequencyHz() / 200),
                1 / (maxRate * microsteps * 20));
        int sub = Math.max(2, (int) Math.ceil(samplePeriodS / target));
        double dt = samplePeriodS / sub;
        double[] u0 = DrivenMotor.phaseCommand(ideal.electricalAngleRad(0), microsteps);
        m.holdCurrents(u0[0], u0[1]);
        double[][] out = new double[4][frames];
        double noise = 0.01 * scenario.ratedCurrentA();
        for (int i = 0; i < frames; i++) {
            double t = i * samplePeriodS;
            double full = fromStepsPerS * t + 0.5 * slope * t * t;
            out[0][i] = scenario.accelRadiusM() * m.accelRadPerS2() / G0_M_PER_S2
                    + scenario.accelNoiseG() * random.nextGaussian();
            out[1][i] = m.currentA(0) + noise * random.nextGaussian();
            out[2][i] = m.currentA(1) + noise * random.nextGaussian();
            out[3][i] = full - Math.floor(full) < 0.5 ? STEP_HIGH_V : 0.0;
            for (int s = 0; s < sub; s++) {
                double ts = t + s * dt;
                double steps = fromStepsPerS * ts + 0.5 * slope * ts * ts;
                double[] u = DrivenMotor.phaseCommand(
                        ideal.electricalAngleRad((long) Math.floor(steps * microsteps + 1e-9)), microsteps);
                m.step(dt, u[0], u[1], 0);
            }
        }
        return out;
    }

    /**
     * A step-rate sweep, linear in rate from {@code fromStepsPerS} to {@code toStepsPerS} full steps per second.
     *
     * @return channels accel (g, tangential at the scenario's radius, with noise), current (phase A, A) and step
     *         (V, a full-step marker: high for the first half of each full step, whatever the microstep setting)
     */
    double[][] sweep(double fromStepsPerS, double toStepsPerS, double seconds, int microsteps, double sampleRateHz) {
        RotorDynamics d = new RotorDynamics(scenario.totalInertiaKgM2(), scenario.dampingNmsPerRad(),
                scenario.holdingTorqueNm(), scenario.detentTorqueNm(), scenario.rotorTeeth(), microsteps);
        double slope = (toStepsPerS - fromStepsPerS) / seconds;
        RotorDynamics.Trace tr = d.run(t -> fromStepsPerS * t + 0.5 * slope * t * t, seconds, sampleRateHz,
                Math.max(fromStepsPerS, toStepsPerS));
        int n = tr.accelRadPerS2().length;
        double[][] out = new double[3][n];
        double amp = scenario.ratedCurrentA() * (microsteps == 1 ? Math.sqrt(2) : 1);
        for (int i = 0; i < n; i++) {
            out[0][i] = scenario.accelRadiusM() * tr.accelRadPerS2()[i] / G0_M_PER_S2
                    + scenario.accelNoiseG() * random.nextGaussian();
            out[1][i] = amp * Math.cos(tr.thetaERad()[i]) + 0.01 * scenario.ratedCurrentA() * random.nextGaussian();
            double full = tr.stepPhase()[i] / microsteps;
            double frac = full - Math.floor(full);
            out[2][i] = frac < 0.5 ? STEP_HIGH_V : 0.0;
        }
        return out;
    }
}
