package org.sightwork.celestial.sight;

/** Which part of a body's disc was brought to the horizon. */
public enum Limb {
    /** The lower edge: the semi-diameter is added. Default for the Sun and the Moon. */
    LOWER,
    /** The upper edge: the semi-diameter is subtracted. */
    UPPER,
    /** The centre (stars, planets, or a disc centred by eye): no semi-diameter. */
    CENTRE
}
