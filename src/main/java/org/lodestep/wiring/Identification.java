package org.lodestep.wiring;

import java.util.List;

/**
 * What the resistances say about a motor's leads.
 *
 * @param leads                  lead labels in the user's order
 * @param topology               how the leads are brought out
 * @param windings               windings (8-lead and 5-lead: half-windings), in lead order
 * @param windingsAtReferenceOhm end-to-end resistance of each winding corrected to the reference temperature, in the
 *                               order of {@code windings}; empty when the measurement temperature is unknown
 * @param temperature            the correction applied, or null
 * @param findings               faults and measurement problems, most severe first
 * @param connections            driver connections the topology allows
 * @param missingPairs           pairs still to measure before the answer is certain; empty when determined
 * @param determined             whether the topology and windings follow from the readings without doubt
 * @param readings               every reading used and how it was read
 * @param measuredPairs          number of distinct pairs measured
 * @param totalPairs             N(N−1)/2
 * @param openCoils              coils that read open on a motor whose layout is still known (drawn broken)
 */
public record Identification(List<String> leads, Topology topology, List<Winding> windings,
                             List<Double> windingsAtReferenceOhm, TemperatureCorrection temperature,
                             List<Finding> findings, List<DriverWiring> connections, List<LeadPair> missingPairs,
                             boolean determined, List<ReadingUse> readings, int measuredPairs, int totalPairs,
                             List<OpenCoil> openCoils) {
    public Identification {
        leads = List.copyOf(leads);
        windings = List.copyOf(windings);
        windingsAtReferenceOhm = List.copyOf(windingsAtReferenceOhm);
        findings = List.copyOf(findings);
        connections = List.copyOf(connections);
        missingPairs = List.copyOf(missingPairs);
        readings = List.copyOf(readings);
        openCoils = List.copyOf(openCoils);
    }

    /** Whether any finding has error severity (the CLI exits with code 3). */
    public boolean hasError() {
        return findings.stream().anyMatch(f -> f.severity() == Severity.ERROR);
    }
}
