/**
 * The celestial plugin's JavaFX views. Every class here states on which thread each method must
 * run (the JavaFX Application Thread unless said otherwise); the computing is done before, in the
 * computing packages, and only drawn here.
 */
package org.sightwork.celestial.ui;
