package org.sightwork.celestial.reduction;

import java.util.Locale;
import org.sightwork.celestial.sight.SightException;

/**
 * Latitude from an altitude of Polaris, using the almanac's exact GHA and Dec of the star rather
 * than the printed Polaris tables.
 *
 * <p><b>Method.</b> sin Ho = sin φ sin δ + cos φ cos δ cos LHA = R sin(φ + α) with
 * R = √(sin²δ + cos²δ cos²LHA) and α = atan2(cos δ cos LHA, sin δ); hence
 * φ = asin(sin Ho / R) - α (the cosine formula of the navigational triangle solved for the
 * latitude). Of the two roots the one in the observer's hemisphere nearest the DR is taken.
 *
 * <p><b>Accuracy.</b> Exact given GHA, Dec and longitude; a longitude error ΔL moves the latitude
 * by about ΔL·sin(p)·sin(LHA) with p ≈ 0.7° the polar distance: 1° of longitude gives under 0.8′.
 *
 * <p><b>Limits.</b> Northern hemisphere, Ho in (0°, 90°). Thread safety: stateless.
 */
public final class PolarisLatitude {

    private PolarisLatitude() {
    }

    /**
     * @param hoDeg observed altitude of Polaris (degrees)
     * @param ghaDeg its GHA (degrees)
     * @param decDeg its declination (degrees, about +89.4°)
     * @param lonDeg the observer's longitude (degrees, east positive), from the DR
     * @param drLatDeg the DR latitude (degrees), to choose the root
     * @return latitude (degrees)
     */
    public static double latitudeDeg(double hoDeg, double ghaDeg, double decDeg, double lonDeg, double drLatDeg) {
        if (!(hoDeg > 0.0 && hoDeg < 90.0)) {
            throw new SightException(String.format(Locale.ROOT, "Polaris altitude %.2f° must be between 0° and 90°", hoDeg));
        }
        double lha = Math.toRadians(ghaDeg + lonDeg);
        double d = Math.toRadians(decDeg);
        double a = Math.sin(d);
        double b = Math.cos(d) * Math.cos(lha);
        double r = Math.hypot(a, b);
        double s = Math.sin(Math.toRadians(hoDeg)) / r;
        if (s > 1.0) {
            throw new SightException("this Polaris altitude is impossible at that longitude and time");
        }
        double alpha = Math.atan2(b, a);
        double root1 = Math.asin(s) - alpha;
        double root2 = Math.PI - Math.asin(s) - alpha;
        double best = Double.NaN;
        for (double root : new double[] {root1, root2}) {
            double lat = Math.toDegrees(Math.atan2(Math.sin(root), Math.cos(root)));
            if (lat >= -90.0 && lat <= 90.0 && (Double.isNaN(best) || Math.abs(lat - drLatDeg) < Math.abs(best - drLatDeg))) {
                best = lat;
            }
        }
        if (Double.isNaN(best)) {
            throw new SightException("no latitude fits this Polaris altitude");
        }
        return best;
    }
}
