/**
 * The headless command line: {@code sweep}, {@code limits} and {@code materials}. Exit status 0 on
 * success, 2 for invalid input, 3 when no solution exists, 4 when output cannot be written, 1 for an
 * internal error.
 */
package org.linesweep.cli;
