/**
 * Sampled signals as every part of Lodestep exchanges them: {@link org.lodestep.sample.SampleStream} (read block by
 * block, any length), {@link org.lodestep.sample.SampledSignal} (a short capture held whole), their
 * {@link org.lodestep.sample.Channel}s, and {@link org.lodestep.sample.InputFormatException}, the one-line error of
 * input that is not what it claims to be, with the bounds every reader holds input to ({@link
 * org.lodestep.sample.InputLimits}, {@link org.lodestep.sample.Utf8Text}). {@code capture} and {@code rig} produce these types; {@code signal},
 * {@code resonance} and {@code motor} consume them. Depends on nothing else in the project.
 */
package org.lodestep.sample;
