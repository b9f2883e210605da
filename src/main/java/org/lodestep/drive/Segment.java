package org.lodestep.drive;

/** A stretch of constant jerk: rate, acceleration and position at its start, its jerk and duration. */
record Segment(double startS, double durationS, double rate, double accel, double jerk, double position) {
    double endS() {
        return startS + durationS;
    }

    double rateAt(double t) {
        double u = t - startS;
        return rate + accel * u + jerk * u * u / 2;
    }

    double accelAt(double t) {
        return accel + jerk * (t - startS);
    }

    double positionAt(double t) {
        double u = t - startS;
        return position + rate * u + accel * u * u / 2 + jerk * u * u * u / 6;
    }
}
