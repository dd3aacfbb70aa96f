/**
 * The design as validated immutable values (geometry, materials, length, sweep settings), the unit
 * parser and the input rules with their messages. Every entry point (design files, command line,
 * explorer) checks input here, so they all accept the same values and say the same words.
 */
package org.linesweep.design;
