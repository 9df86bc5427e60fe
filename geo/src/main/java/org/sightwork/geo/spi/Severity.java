package org.sightwork.geo.spi;

/** How serious a notification is. */
public enum Severity {
    /** For information; fades after a few seconds. */
    INFO,
    /** Something was left out or may be wrong; fades after a longer while. */
    WARNING,
    /** Something failed; stays until dismissed. */
    ERROR
}
