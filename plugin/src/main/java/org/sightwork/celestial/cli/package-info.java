/**
 * The command line of the celestial plugin: thin layers over the computing packages that print
 * text tables for a person and CSV or JSON (decimal degrees, camelCase keys) for programs.
 */
package org.sightwork.celestial.cli;
