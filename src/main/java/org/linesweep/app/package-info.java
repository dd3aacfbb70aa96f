/** The JavaFX explorer window: composition root, observable model and views. */
package org.linesweep.app;
