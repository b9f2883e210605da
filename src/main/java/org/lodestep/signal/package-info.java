/**
 * Signal processing with explicit scaling conventions: windows, spectra, Welch PSD, spectrograms.
 * Depends on nothing else in the project.
 */
package org.lodestep.signal;
