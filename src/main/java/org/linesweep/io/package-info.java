/**
 * Files at the edge: design files (JSON with a format version), sweep exports (CSV and JSON) and atomic
 * writes. No JavaFX here.
 */
package org.linesweep.io;
