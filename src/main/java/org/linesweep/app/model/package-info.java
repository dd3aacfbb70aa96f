/**
 * The explorer's observable model: JavaFX properties and collections only, no scene graph, so it is
 * tested with plain JUnit. Views bind to it and call its methods; they hold no state of their own.
 */
package org.linesweep.app.model;
