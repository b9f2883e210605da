package org.lodestep.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.lodestep.drive.BandCrossing;
import org.lodestep.drive.DriveMode;
import org.lodestep.drive.Profile;
import org.lodestep.drive.SpeedAnswer;
import org.lodestep.drive.StepRateTable;
import org.lodestep.drive.TorqueCurve;
import org.lodestep.drive.TorquePoint;
import org.lodestep.resonance.RateUnits;
import org.lodestep.safety.Cautions;
import org.lodestep.workflow.DriveCurve;
import org.lodestep.workflow.DrivePlan;

/** JSON of {@code drive curve}, {@code drive plan} and the step-rate table ({@link Json}'s conventions). */
public final class DriveJson {
    private DriveJson() {
    }

    public static String curve(DriveCurve.Result r) {
        return Json.write(curveMap(r));
    }

    public static String plan(DrivePlan.Result r) {
        Map<String, Object> m = curveMap(r.curve());
        m.put("avoid_list", r.avoidSource());
        Profile p = r.profile();
        Map<String, Object> pm = new LinkedHashMap<>();
        pm.put("shape", r.table().shapeWord());
        pm.put("target_full_steps_per_s", p.settings().targetFullStepsPerS());
        pm.put("margin", p.settings().margin());
        pm.put("base_acceleration_full_steps_per_s2", p.baseAccelerationFullStepsPerS2());
        pm.put("peak_acceleration_full_steps_per_s2", p.peakAccelerationFullStepsPerS2());
        pm.put("jerk_full_steps_per_s3", p.jerkFullStepsPerS3());
        pm.put("acceleration_s", p.accelerationS());
        pm.put("cruise_s", p.settings().cruiseS());
        pm.put("duration_s", p.durationS());
        pm.put("distance_full_steps", p.distanceFullSteps());
        List<Map<String, Object>> cs = new ArrayList<>();
        for (BandCrossing c : p.crossings()) {
            Map<String, Object> j = new LinkedHashMap<>();
            j.put("from_full_steps_per_s", c.band().fromFullStepsPerS());
            j.put("to_full_steps_per_s", c.band().toFullStepsPerS());
            j.put("min_acceleration_full_steps_per_s2", c.band().minAccelerationFullStepsPerS2());
            j.put("acceleration_full_steps_per_s2", c.accelerationFullStepsPerS2());
            j.put("allowed_full_steps_per_s2", c.allowedFullStepsPerS2());
            j.put("time_in_band_s", c.timeInBandS());
            j.put("raised", c.raised());
            cs.add(j);
        }
        pm.put("crossings", cs);
        pm.put("table_rows", r.table().rows().size());
        pm.put("table_step_s", p.settings().tableStepS());
        m.put("profile", pm);
        if (r.simulation() != null) {
            Map<String, Object> sm = new LinkedHashMap<>();
            sm.put("planned_lost_full_steps", r.simulation().planned().lostFullSteps());
            sm.put("planned_max_lag_full_steps", r.simulation().planned().maxLagFullSteps());
            sm.put("naive_acceleration_full_steps_per_s2", r.simulation().naiveAccelerationFullStepsPerS2());
            sm.put("naive_lost_full_steps", r.simulation().naive() == null ? null
                    : r.simulation().naive().lostFullSteps());
            sm.put("damping_nms_per_rad", r.simulation().dampingNmsPerRad());
            m.put("simulation", sm);
        } else {
            m.put("simulation", null);
        }
        m.put("notes", r.notes());
        return Json.write(m);
    }

    /** The step-rate table as a JSON document of its own. */
    public static String table(StepRateTable t) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("format", StepRateTable.FORMAT);
        m.put("version", StepRateTable.VERSION);
        m.put("shape", t.shapeWord());
        m.put("microsteps", t.units().microsteps());
        m.put("full_steps_per_rev", t.units().fullStepsPerRev());
        m.put("travel_mm_per_rev", t.units().travelMmPerRev());
        m.put("columns", List.of("time_s", "rate_full_steps_per_s", "rate_pulses_per_s", "position_full_steps"));
        List<double[]> rows = new ArrayList<>(t.rows().size());
        for (StepRateTable.Row r : t.rows()) {
            rows.add(new double[] {round(r.timeS(), 1e6), round(r.rateFullStepsPerS(), 1e3),
                round(r.ratePulsesPerS(), 1e3), round(r.positionFullSteps(), 1e4)});
        }
        m.put("rows", rows);
        return Json.write(m);
    }

    private static double round(double v, double scale) {
        return Math.rint(v * scale) / scale;
    }

    private static Map<String, Object> curveMap(DriveCurve.Result r) {
        TorqueCurve c = r.curve();
        RateUnits u = r.units();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("motor_source", r.motorSource());
        m.put("motor", r.motor());
        Map<String, Object> d = new LinkedHashMap<>();
        d.put("mode", c.drive().mode() == DriveMode.CHOPPER ? "chopper" : "constant-voltage");
        d.put("supply_v", c.drive().supplyV());
        d.put("phase_current_a", c.drive().phaseCurrentA());
        d.put("microsteps", c.drive().microsteps());
        m.put("drive", d);
        m.put("model", DriveText.MODEL);
        m.put("holding_torque_nm", c.holdingTorqueNm());
        m.put("low_speed_torque_nm", c.lowSpeedTorqueNm());
        m.put("full_current_rate", u.of(c.fullCurrentRateFullStepsPerS()));
        m.put("zero_torque_rate", u.of(c.zeroTorqueRateFullStepsPerS()));
        m.put("end_rate", u.of(c.endRateFullStepsPerS()));
        m.put("max_power_w", c.maxPowerW());
        m.put("max_power_rate", u.of(c.maxPowerRateFullStepsPerS()));
        m.put("mid_band_centre_full_steps_per_s", r.midBandCentreFullStepsPerS());
        List<Map<String, Object>> pts = new ArrayList<>();
        for (TorquePoint p : c.points()) {
            Map<String, Object> j = new LinkedHashMap<>();
            j.put("rate_full_steps_per_s", p.rateFullStepsPerS());
            j.put("rate_pulses_per_s", u.pulsesPerS(p.rateFullStepsPerS()));
            j.put("rpm", p.speedRpm());
            j.put("mm_per_s", u.mmPerS(p.rateFullStepsPerS()));
            j.put("pull_out_torque_nm", p.pullOutTorqueNm());
            j.put("power_w", p.powerW());
            j.put("current_limited", p.currentLimited());
            pts.add(j);
        }
        m.put("curve", pts);
        m.put("load", r.load());
        if (r.dynamometer() != null) {
            List<Map<String, Object>> dy = new ArrayList<>();
            for (var p : r.dynamometer()) {
                Map<String, Object> j = new LinkedHashMap<>();
                j.put("rate_full_steps_per_s", p.rateFullStepsPerS());
                j.put("predicted_nm", p.predictedNm());
                j.put("simulated_nm", p.lostWithoutLoad() ? null : p.simulatedNm());
                j.put("lost_without_load", p.lostWithoutLoad());
                dy.add(j);
            }
            m.put("dynamometer", dy);
        } else {
            m.put("dynamometer", null);
        }
        SpeedAnswer a = r.answer();
        if (a != null) {
            Map<String, Object> j = new LinkedHashMap<>();
            j.put("target", a.target());
            j.put("verdict", a.verdict().name().toLowerCase(java.util.Locale.ROOT));
            j.put("pull_out_at_target_nm", a.pullOutAtTargetNm());
            j.put("required_at_target_nm", a.requiredAtTargetNm());
            j.put("margin_at_target", a.marginAtTarget());
            j.put("required_margin", a.requiredMargin());
            j.put("margin_rule", "common practice: keep 30 to 50 % of the pull-out torque in reserve");
            // null with "unbounded" when no rate bounds it (a load with no torque at constant speed)
            j.put("max_rate_with_margin", Double.isFinite(a.maxRateWithMarginFullStepsPerS()) ? a.maxRateWithMargin()
                    : null);
            j.put("max_rate_with_margin_unbounded", Double.isInfinite(a.maxRateWithMarginFullStepsPerS()));
            j.put("acceleration_at_target_full_steps_per_s2", a.accelerationAtTargetFullStepsPerS2());
            j.put("total_inertia_kg_m2", a.totalInertiaKgM2());
            j.put("suggestions", a.suggestions());
            m.put("answer", j);
        } else {
            m.put("answer", null);
        }
        m.put("notes", r.notes());
        m.put("safety", Cautions.sentences(Cautions.motion()));
        return m;
    }
}
