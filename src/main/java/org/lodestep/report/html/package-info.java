/**
 * Self-contained HTML reports: a document builder, charts (JFreeChart rendered to inline SVG and to PNG), the wiring
 * diagram and safety notes. Renders only; every number shown is computed by the domain packages.
 *
 * <p>Depends on JFreeChart and JFreeSVG, nothing else of ours; it holds the one whole-or-nothing file writer
 * ({@link org.lodestep.report.html.OutputFile}) so that its reports and charts can write themselves. Every user
 * string passes through one escaping function; raw markup enters a document only as an {@link org.lodestep.report.html.SvgFragment}, which only this
 * package can make.
 */
package org.lodestep.report.html;
