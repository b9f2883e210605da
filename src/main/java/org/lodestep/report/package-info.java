/**
 * Renders results as text, JSON and self-contained HTML; computes nothing: every number, series and histogram bin
 * comes from the domain packages (for QA, {@code qa.LotStatistics}). Uses {@code report.html} for documents and
 * charts; {@code report.html} never uses this package.
 */
package org.lodestep.report;
