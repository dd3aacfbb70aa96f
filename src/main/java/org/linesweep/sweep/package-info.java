/**
 * Frequency grids and the sweep engine: a whole sweep of a line model computed into primitive arrays
 * (structure of arrays), with buffers that can be reused from one sweep to the next.
 */
package org.linesweep.sweep;
