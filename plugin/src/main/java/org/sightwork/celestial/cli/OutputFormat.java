package org.sightwork.celestial.cli;

/** Output formats of the celestial commands. */
public enum OutputFormat {
    /** Aligned text for a person, angles in d°m.m′. */
    TEXT,
    /** Comma-separated values with a header, decimal degrees. */
    CSV,
    /** JSON, decimal degrees, camelCase keys. */
    JSON
}
