/**
 * The bench station: the second front end beside {@code cli}, a browser interface served by an embedded server
 * (Javalin on Jetty). Like {@code cli} it parses its input (form fields, a barcode scanner, uploads) into workflow
 * settings, calls {@code workflow}, renders through {@code report} and maps errors to messages; it computes nothing.
 * May use {@code workflow}, {@code report} and the record types those return; never {@code cli}.
 */
package org.lodestep.station;
