/**
 * The command-line front end: the only package that knows picocli and exit codes.
 */
package org.lodestep.cli;
