/**
 * Renders results as text, JSON and self-contained HTML; computes nothing.
 */
package org.lodestep.report;
