/**
 * The transmission-line physics, one frequency at a time: materials, conductor and dielectric models,
 * the line geometries reduced to per-unit-length R', L', G', C', the wave quantities that follow, and the
 * frequency limits of a design. SI units throughout. No JavaFX and no I/O here.
 */
package org.linesweep.physics;
