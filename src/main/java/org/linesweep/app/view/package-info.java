/** Views of the explorer: they bind to the model and draw; they hold no state of their own. */
package org.linesweep.app.view;
