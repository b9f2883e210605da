package org.lodestep.wiring;

import java.util.Objects;

/**
 * Two distinct lead labels, in a canonical order so that {@code red-blue} and {@code blue-red} are the same pair.
 *
 * @param a the label that sorts first
 * @param b the label that sorts second
 */
public record LeadPair(String a, String b) implements Comparable<LeadPair> {

    public LeadPair {
        Objects.requireNonNull(a, "a");
        Objects.requireNonNull(b, "b");
        if (a.isBlank() || b.isBlank()) {
            throw new IllegalArgumentException("lead labels must not be blank");
        }
        if (a.equals(b)) {
            throw new IllegalArgumentException("a lead cannot be paired with itself: " + a);
        }
        if (a.compareTo(b) > 0) {
            String t = a;
            a = b;
            b = t;
        }
    }

    /** The pair of two labels in either order. */
    public static LeadPair of(String x, String y) {
        return new LeadPair(x, y);
    }

    /** Whether {@code label} is one of the two leads. */
    public boolean contains(String label) {
        return a.equals(label) || b.equals(label);
    }

    /** The lead of this pair that is not {@code label}. */
    String other(String label) {
        if (a.equals(label)) {
            return b;
        }
        if (b.equals(label)) {
            return a;
        }
        throw new IllegalArgumentException(label + " is not in " + this);
    }

    /*
     * equals and hashCode written out, with the values the record's own would give (hash 31 * a + b, so maps keep
     * their order): the record's are made through method handles on their first call, several milliseconds of a
     * small command's start, and every identification keys its readings by pair.
     */
    @Override
    public boolean equals(Object o) {
        return o instanceof LeadPair p && a.equals(p.a) && b.equals(p.b);
    }

    @Override
    public int hashCode() {
        return 31 * a.hashCode() + b.hashCode();
    }

    @Override
    public int compareTo(LeadPair o) {
        int c = a.compareTo(o.a);
        return c != 0 ? c : b.compareTo(o.b);
    }

    @Override
    public String toString() {
        return a + "-" + b;
    }
}
