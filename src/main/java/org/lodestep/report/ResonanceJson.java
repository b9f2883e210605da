package org.lodestep.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.lodestep.resonance.AvoidList;
import org.lodestep.resonance.BackbonePoint;
import org.lodestep.resonance.BandClass;
import org.lodestep.resonance.Prediction;
import org.lodestep.resonance.RateUnits;
import org.lodestep.resonance.ResonanceBand;
import org.lodestep.resonance.ResponsePoint;
import org.lodestep.resonance.RingDownResult;
import org.lodestep.resonance.Stall;
import org.lodestep.resonance.SweepResult;
import org.lodestep.resonance.WatchPoint;
import org.lodestep.safety.Cautions;
import org.lodestep.signal.LoneSamples.LoneSample;
import org.lodestep.workflow.ResonanceRingdown;

/**
 * The JSON documents of the resonance commands, shaped for their readers (the README documents every key); computes
 * nothing but unit conversions already defined in {@link RateUnits}.
 */
public final class ResonanceJson {
    private ResonanceJson() {
    }

    public static String sweep(ResonanceText.SweepHeader h, SweepResult r, RateUnits u, AvoidList avoid,
                               boolean withResponse) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("stall", stall(r.stall(), u));
        m.put("source", h.source());
        m.put("channel", h.channel());
        m.put("unit", h.unit());
        m.put("response_channel", r.responseChannel().name().toLowerCase(Locale.ROOT));
        m.put("evidence_note", r.evidenceNote().isEmpty() ? null : r.evidenceNote());
        m.put("sample_rate_hz", h.sampleRateHz());
        m.put("duration_s", r.durationS());
        m.put("rate_source", r.rateSource());
        m.put("rate_law", h.rateLaw());
        m.put("natural_frequency_hz", r.naturalFrequencyHz());
        m.put("natural_frequency_source", r.naturalFrequencySource());
        m.put("microsteps", u.microsteps());
        m.put("rotor_teeth", u.rotorTeeth());
        m.put("full_steps_per_rev", u.fullStepsPerRev());
        m.put("travel_mm_per_rev", u.travelMmPerRev());
        m.put("segments", r.segments());
        m.put("psd_peak_hz", r.psdPeakHz());
        List<Map<String, Object>> bands = new ArrayList<>();
        for (ResonanceBand b : r.bands()) {
            Map<String, Object> j = new LinkedHashMap<>();
            j.put("start_full_steps_per_s", b.startFullStepsPerS());
            j.put("end_full_steps_per_s", b.endFullStepsPerS());
            j.put("peak_full_steps_per_s", b.peakFullStepsPerS());
            j.put("peak_level", b.peakLevel());
            j.put("peak_level_db", b.peakLevelDb());
            j.put("excess_db", b.excessDb());
            j.put("class", classWord(b.bandClass()));
            j.put("subharmonic", b.subharmonic());
            j.put("mechanical_frequency_hz", b.mechanicalFrequencyHz());
            j.put("start_pulses_per_s", u.pulsesPerS(b.startFullStepsPerS()));
            j.put("end_pulses_per_s", u.pulsesPerS(b.endFullStepsPerS()));
            j.put("peak_pulses_per_s", u.pulsesPerS(b.peakFullStepsPerS()));
            j.put("start_rpm", u.rpm(b.startFullStepsPerS()));
            j.put("end_rpm", u.rpm(b.endFullStepsPerS()));
            j.put("peak_rpm", u.rpm(b.peakFullStepsPerS()));
            j.put("start_mm_per_s", u.mmPerS(b.startFullStepsPerS()));
            j.put("end_mm_per_s", u.mmPerS(b.endFullStepsPerS()));
            j.put("peak_mm_per_s", u.mmPerS(b.peakFullStepsPerS()));
            bands.add(j);
        }
        m.put("bands", bands);
        List<Map<String, Object>> watch = new ArrayList<>();
        for (WatchPoint w : r.watch()) {
            Map<String, Object> j = new LinkedHashMap<>();
            j.put("subharmonic", w.subharmonic());
            j.put("rate_full_steps_per_s", w.rateFullStepsPerS());
            j.put("rate_pulses_per_s", u.pulsesPerS(w.rateFullStepsPerS()));
            j.put("rate_rpm", u.rpm(w.rateFullStepsPerS()));
            j.put("excess_db", w.excessDb());
            j.put("level_db", w.levelDb());
            watch.add(j);
        }
        m.put("watch", watch);
        m.put("avoid_list", avoidMap(avoid));
        if (withResponse) {
            List<Map<String, Object>> pts = new ArrayList<>();
            for (ResponsePoint p : r.response()) {
                Map<String, Object> j = new LinkedHashMap<>();
                j.put("rate_full_steps_per_s", p.rateFullStepsPerS());
                j.put("rms", p.rms());
                j.put("level_db", p.levelDb());
                j.put("electrical_amplitude", p.electricalAmplitude());
                j.put("order1_amplitude", p.order1Amplitude());
                j.put("order2_amplitude", p.order2Amplitude());
                j.put("order4_amplitude", p.order4Amplitude());
                j.put("segments", p.segments());
                j.put("baseline_rms", p.baselineRms());
                j.put("threshold_rms", p.thresholdRms());
                pts.add(j);
            }
            m.put("response", pts);
        }
        m.put("safety", Cautions.sentences(Cautions.motion()));
        return Json.write(m);
    }

    /** The avoid-list document written by {@code --avoid-list}. */
    public static String avoidList(AvoidList a) {
        return Json.write(avoidMap(a));
    }

    private static Map<String, Object> avoidMap(AvoidList a) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("format", a.format());
        m.put("version", a.version());
        m.put("microsteps", a.microsteps());
        m.put("rotor_teeth", a.rotorTeeth());
        m.put("full_steps_per_rev", a.fullStepsPerRev());
        m.put("travel_mm_per_rev", a.travelMmPerRev());
        m.put("natural_frequency_hz", a.naturalFrequencyHz());
        m.put("damping_ratio", a.dampingRatio());
        m.put("crossing_periods", a.crossingPeriods());
        m.put("margin", a.margin());
        List<Map<String, Object>> ranges = new ArrayList<>();
        for (var r : a.ranges()) {
            Map<String, Object> j = new LinkedHashMap<>();
            j.put("from_full_steps_per_s", r.fromFullStepsPerS());
            j.put("to_full_steps_per_s", r.toFullStepsPerS());
            j.put("from_pulses_per_s", r.fromPulsesPerS());
            j.put("to_pulses_per_s", r.toPulsesPerS());
            j.put("from_rpm", r.fromRpm());
            j.put("to_rpm", r.toRpm());
            j.put("from_mm_per_s", r.fromMmPerS());
            j.put("to_mm_per_s", r.toMmPerS());
            j.put("class", classWord(r.bandClass()));
            j.put("subharmonic", r.subharmonic());
            j.put("oscillation_hz", r.oscillationHz());
            j.put("min_acceleration_full_steps_per_s2", r.minAccelerationFullStepsPerS2());
            j.put("min_acceleration_pulses_per_s2", r.minAccelerationPulsesPerS2());
            j.put("min_acceleration_mm_per_s2", r.minAccelerationMmPerS2());
            j.put("microstepping_helps", r.microsteppingHelps());
            j.put("damping_helps", r.dampingHelps());
            j.put("advice", r.advice());
            ranges.add(j);
        }
        m.put("ranges", ranges);
        m.put("notes", a.notes());
        return m;
    }

    private static Map<String, Object> stall(Stall s, RateUnits u) {
        Map<String, Object> j = new LinkedHashMap<>();
        j.put("lost_synchronism", s.lostSynchronism());
        j.put("first_slip_full_steps_per_s", s.firstSlipFullStepsPerS());
        j.put("relock_full_steps_per_s", s.relockFullStepsPerS());
        j.put("first_slip_pulses_per_s", u.pulsesPerS(s.firstSlipFullStepsPerS()));
        j.put("first_slip_rpm", u.rpm(s.firstSlipFullStepsPerS()));
        j.put("relock_pulses_per_s", u.pulsesPerS(s.relockFullStepsPerS()));
        j.put("relock_rpm", u.rpm(s.relockFullStepsPerS()));
        j.put("steps_lost", s.stepsLost());
        j.put("lowest_synchronous_share", s.lowestSynchronousShare());
        j.put("evidence", s.evidence());
        j.put("advice", s.advice().isEmpty() ? null : s.advice());
        return j;
    }

    public static String ringDown(ResonanceRingdown.Result w) {
        RingDownResult r = w.fit();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("source", w.source());
        m.put("channel", w.channel());
        m.put("natural_frequency_hz", r.naturalFrequencyHz());
        m.put("damped_frequency_hz", r.dampedFrequencyHz());
        m.put("damping_ratio", r.dampingRatio());
        m.put("decay_rate_per_s", r.decayRatePerS());
        m.put("quality_factor", r.qualityFactor());
        m.put("amplitude", r.amplitude());
        m.put("offset", r.offset());
        m.put("r_squared", r.rSquared());
        m.put("rms_residual", r.rmsResidual());
        m.put("start_time_s", r.startTimeS());
        m.put("fitted_duration_s", r.fittedDurationS());
        m.put("periods_fitted", r.periodsFitted());
        m.put("phase_rad", r.phaseRad());
        m.put("natural_frequency_error_hz", r.naturalFrequencyErrorHz());
        m.put("damping_ratio_error", r.dampingRatioError());
        m.put("large_swing_frequency_hz", r.largeSwingFrequencyHz());
        m.put("whole_ring_frequency_hz", r.wholeRingFrequencyHz());
        m.put("whole_ring_r_squared", r.wholeRingRSquared());
        m.put("log_decrement", r.logDecrement());
        m.put("ring_start_time_s", r.ringStartTimeS());
        m.put("noise_rms", r.noiseRms());
        m.put("decay_end_time_s", r.decayEndTimeS());
        List<Map<String, Object>> bridged = new ArrayList<>();
        double[] t = w.timeS();
        for (LoneSample g : w.bridged()) {
            Map<String, Object> j = new LinkedHashMap<>();
            j.put("time_s", t[g.index()]);
            j.put("read", g.readValue());
            j.put("bridged", g.bridgedValue());
            bridged.add(j);
        }
        m.put("bridged_samples", bridged);
        List<Map<String, Object>> bb = new ArrayList<>();
        for (BackbonePoint c : r.backbone()) {
            Map<String, Object> j = new LinkedHashMap<>();
            j.put("amplitude", c.amplitude());
            j.put("frequency_hz", c.frequencyHz());
            j.put("log_decrement", c.logDecrement());
            j.put("start_time_s", c.startTimeS());
            bb.add(j);
        }
        m.put("backbone", bb);
        return Json.write(m);
    }

    public static String prediction(Prediction p) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("mode", p.inferred() ? "inverse" : "predict");
        m.put("holding_torque_nm", p.holdingTorqueNm());
        m.put("rotor_teeth", p.rotorTeeth());
        m.put("stiffness_nm_per_rad", p.stiffnessNmPerRad());
        m.put("rotor_inertia_kgm2", p.rotorInertiaKgm2());
        m.put("load_inertia_kgm2", p.loadInertiaKgm2());
        m.put("total_inertia_kgm2", p.totalInertiaKgm2());
        m.put("natural_frequency_hz", p.naturalFrequencyHz());
        m.put("risky_rates", p.riskyRates());
        m.put("mid_band_centre_full_steps_per_s", p.midBandCentreFullStepsPerS());
        return Json.write(m);
    }

    static String classWord(BandClass c) {
        return c.name().toLowerCase(Locale.ROOT);
    }
}
