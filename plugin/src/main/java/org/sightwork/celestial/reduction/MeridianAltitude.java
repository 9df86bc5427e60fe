package org.sightwork.celestial.reduction;

import java.util.Locale;
import org.sightwork.celestial.sight.SightException;

/**
 * Latitude from an altitude taken on the meridian (upper or lower transit).
 *
 * <p><b>Method.</b> Upper transit: zenith distance z = 90° - Ho; with the body bearing south,
 * φ = δ + z; bearing north, φ = δ - z (this covers the body on the equator, of the same or
 * contrary name, and between the observer and the elevated pole). Lower transit (below the
 * elevated pole, circumpolar body): φ = ±(Ho + 90° - |δ|), the sign of δ (Bowditch, <i>The
 * American Practical Navigator</i>, 2002 ed., ch. 20, latitude by meridian altitude).
 *
 * <p><b>Accuracy.</b> Exact for an altitude on the meridian; an altitude taken off the meridian
 * gives a latitude that is too far from the body (use {@link SightReduction} instead).
 *
 * <p><b>Limits.</b> Near the zenith (Ho above 88°) north and south are hard to tell: the caller
 * must say which way the body bore. Thread safety: stateless.
 */
public final class MeridianAltitude {

    /** Which way the body bore at transit, as the navigator saw it. */
    public enum Bearing { NORTH, SOUTH }

    /** Upper (over the observer's meridian) or lower (below the pole) transit. */
    public enum Transit { UPPER, LOWER }

    private MeridianAltitude() {
    }

    /**
     * @param hoDeg observed altitude at transit (degrees, [0°, 90°])
     * @param decDeg declination (degrees)
     * @param transit upper or lower
     * @param bearing which way the body bore (for lower transit: the direction of the pole)
     * @return latitude (degrees, north positive)
     */
    public static double latitudeDeg(double hoDeg, double decDeg, Transit transit, Bearing bearing) {
        if (!(hoDeg >= 0.0 && hoDeg <= 90.0)) {
            throw new SightException(String.format(Locale.ROOT,
                    "meridian altitude %.2f° must be between 0° and 90°", hoDeg));
        }
        if (transit == Transit.LOWER) {
            Bearing poleSide = decDeg >= 0 ? Bearing.NORTH : Bearing.SOUTH;
            if (bearing != poleSide) {
                throw new SightException("at lower transit the body bears toward the pole of its declination ("
                        + poleSide.name().toLowerCase(Locale.ROOT) + ")");
            }
            double lat = hoDeg + 90.0 - Math.abs(decDeg);
            if (lat > 90.0) {
                throw new SightException("this body cannot be seen at lower transit at that altitude");
            }
            return decDeg >= 0 ? lat : -lat;
        }
        double z = 90.0 - hoDeg;
        double lat = bearing == Bearing.SOUTH ? decDeg + z : decDeg - z;
        if (Math.abs(lat) > 90.0) {
            throw new SightException(String.format(Locale.ROOT,
                    "altitude %.2f° with declination %.2f° bearing %s gives no latitude: check the bearing",
                    hoDeg, decDeg, bearing.name().toLowerCase(Locale.ROOT)));
        }
        return lat;
    }

    /**
     * The bearing of a body at upper transit as seen from a DR latitude.
     *
     * @param drLatDeg DR latitude (degrees)
     * @param decDeg declination (degrees)
     * @return SOUTH when the DR is north of the body, else NORTH
     */
    public static Bearing bearingFromDr(double drLatDeg, double decDeg) {
        return drLatDeg >= decDeg ? Bearing.SOUTH : Bearing.NORTH;
    }
}
