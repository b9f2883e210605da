/**
 * Turns files (CSV, WAV, rig capture files) into domain types: resistance readings and sampled signals.
 * Reads and writes; analyses nothing. Depends on {@code sample} and the domain types it reads into.
 *
 * <p>Time series: {@link org.lodestep.capture.Captures#open} opens a time-series CSV
 * ({@link org.lodestep.capture.TimeSeriesCsvReader}), a WAV ({@link org.lodestep.capture.WavReader}) or a rig capture
 * ({@link org.lodestep.capture.CaptureReader}) as a {@link org.lodestep.sample.SampleStream};
 * {@link org.lodestep.sample.ArraySampleStream} serves arrays already in memory. Rig captures are written by
 * {@link org.lodestep.capture.CaptureWriter}: a canonical CSV and a JSON {@link org.lodestep.capture.CaptureSidecar},
 * whole or not at all. Our own JSON inputs are read by {@link org.lodestep.capture.MotorCardReader} (a motor card) and
 * {@link org.lodestep.capture.AvoidListReader} (an avoid-list), with one-line errors naming file and line.
 */
package org.lodestep.capture;
