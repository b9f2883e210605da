/**
 * The cautions of bench work on stepper motors, worded once: every report, page and command that can hurt someone
 * takes its sentences from here, so a caution reads the same on the terminal, in JSON, in an HTML report and on the
 * bench station. Words only: depends on no other package.
 */
package org.lodestep.safety;
