/**
 * The application: the command-line entry point and the JavaFX chart window that hosts plugins.
 */
package org.sightwork.geo.app;
