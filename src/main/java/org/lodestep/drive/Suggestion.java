package org.lodestep.drive;

/**
 * One change that would reach the target speed with the margin.
 *
 * @param change what to change: {@code supply}, {@code parallel}, {@code current}
 * @param value  the new value (V for supply, A for current, the parallel current in A for parallel)
 * @param text   one sentence for the user, with the usual caution
 */
public record Suggestion(String change, double value, String text) {
}
