package org.lodestep.motor;

import java.util.Objects;

/** One back-EMF channel: the lead pair it measures ({@code +} on the first lead) and its samples in V. */
public final class EmfChannel {
    private final OrientedLeads pair;
    private final double[] voltageV;

    public EmfChannel(OrientedLeads pair, double[] voltageV) {
        this.pair = Objects.requireNonNull(pair, "pair");
        this.voltageV = voltageV.clone();
        for (int i = 0; i < this.voltageV.length; i++) {
            if (!Double.isFinite(this.voltageV[i])) {
                throw new IllegalArgumentException("back-EMF sample " + i + " of " + pair + " is " + voltageV[i]
                        + " V; expected a finite voltage");
            }
        }
    }

    public OrientedLeads pair() {
        return pair;
    }

    /** A copy of the samples, V. */
    public double[] voltageV() {
        return voltageV.clone();
    }

    int length() {
        return voltageV.length;
    }

    double sample(int i) {
        return voltageV[i];
    }
}
