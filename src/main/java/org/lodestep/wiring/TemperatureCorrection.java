package org.lodestep.wiring;

/**
 * The temperature correction applied to winding resistances.
 *
 * @param measuredC  winding temperature at measurement, °C
 * @param referenceC temperature the values were corrected to, °C
 * @param constantC  the copper constant k, °C
 * @param standard   the standard that gives k
 */
public record TemperatureCorrection(double measuredC, double referenceC, double constantC, String standard) {
}
