/**
 * Turns files (CSV, WAV, rig capture files) into domain types: resistance readings and sampled signals.
 * Reads and writes; analyses nothing. Depends on nothing else in the project.
 */
package org.lodestep.capture;
