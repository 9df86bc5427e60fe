package org.sightwork.celestial.sight;

/** The horizon a sight was taken against, which decides the dip. */
public enum HorizonKind {
    /** The sea horizon: dip 1.76′ √h. */
    SEA,
    /** A shore nearer than the sea horizon: dip short of the horizon. */
    SHORE,
    /** An artificial (reflecting) horizon: no dip, the reading is twice the altitude. */
    ARTIFICIAL
}
