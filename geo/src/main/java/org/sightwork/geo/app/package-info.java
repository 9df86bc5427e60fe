/**
 * The application: the command-line entry point, the JavaFX chart window that hosts plugins, and
 * the headless renderer behind {@code sightwork chart}.
 *
 * <p><b>Thread contract.</b> Nothing slow runs on the JavaFX application thread. Reading and
 * preparing chart files, and every plugin task, run on the two worker threads of
 * {@link org.sightwork.geo.app.TaskRunner}, with their progress shown in the status bar; their
 * results come back to the FX thread through {@code Platform.runLater}. The FX thread only handles
 * input, changes the viewport and draws a frame from data prepared beforehand; repaint requests
 * (from any thread) are coalesced into one frame per pulse. Notifications may be posted from any
 * thread. Classes say which thread each method is for.
 */
package org.sightwork.geo.app;
