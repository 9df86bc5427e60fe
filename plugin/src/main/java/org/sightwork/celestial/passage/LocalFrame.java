package org.sightwork.celestial.passage;

import org.sightwork.geo.earth.Earth;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Sailings;

/**
 * A local plane for a passage: north is the distance along the meridian from the origin's latitude
 * (exact, WGS84 meridian arc), east is the longitude difference times the length of a degree of
 * the origin's parallel. A true eastward distance at latitude φ is {@code eastScale(φ)} times the
 * frame's east difference.
 *
 * <p><b>Method.</b> Meridian arc: Snyder, <i>Map Projections: A Working Manual</i> (1987), eq. 3-21;
 * radius of a parallel N cos φ with N = a / sqrt(1 − e² sin² φ) (ibid., eq. 4-20). Between two
 * points a few tens of miles apart, the plane distance with the east scale at their mid-latitude
 * differs from the geodesic by well under 0.01 nm (checked in the tests against GeographicLib).
 *
 * <p><b>Limits.</b> For passages up to a few hundred miles and away from the poles (|φ| &lt; 80°);
 * longitudes are taken the short way from the origin.
 */
public final class LocalFrame {

    private static final double E2 = (2 - 1 / Earth.WGS84_INVERSE_FLATTENING) / Earth.WGS84_INVERSE_FLATTENING;

    private final GeoPosition origin;
    private final double originArcNm;
    private final double nmPerDegLonAtOrigin;

    /**
     * @param origin the origin of the frame
     */
    public LocalFrame(GeoPosition origin) {
        this.origin = origin;
        this.originArcNm = Sailings.meridianArcNm(origin.latDeg());
        this.nmPerDegLonAtOrigin = parallelNmPerDeg(origin.latDeg());
    }

    /** @return the origin */
    public GeoPosition origin() {
        return origin;
    }

    /**
     * @param p a position
     * @return {east, north} of the position in the frame (nm)
     */
    public double[] toLocal(GeoPosition p) {
        double dLon = p.lonDeg() - origin.lonDeg();
        if (dLon > 180) {
            dLon -= 360;
        } else if (dLon < -180) {
            dLon += 360;
        }
        return new double[] {dLon * nmPerDegLonAtOrigin, Sailings.meridianArcNm(p.latDeg()) - originArcNm};
    }

    /**
     * @param eastNm east in the frame (nm)
     * @param northNm north in the frame (nm)
     * @return the position
     */
    public GeoPosition toGeo(double eastNm, double northNm) {
        double lat = Sailings.latitudeOfMeridianArcNm(originArcNm + northNm);
        return GeoPosition.of(lat, origin.lonDeg() + eastNm / nmPerDegLonAtOrigin);
    }

    /**
     * @param northNm north in the frame (nm)
     * @return latitude at that north (degrees)
     */
    public double latitudeAt(double northNm) {
        return Sailings.latitudeOfMeridianArcNm(originArcNm + northNm);
    }

    /**
     * True east distance per unit of frame east at a latitude.
     *
     * @param latDeg latitude (degrees)
     * @return the scale (dimensionless, 1 at the origin's latitude)
     */
    public double eastScale(double latDeg) {
        return parallelNmPerDeg(latDeg) / nmPerDegLonAtOrigin;
    }

    private static double parallelNmPerDeg(double latDeg) {
        double phi = Math.toRadians(latDeg);
        double n = Earth.WGS84_SEMI_MAJOR_AXIS_M / Math.sqrt(1 - E2 * Math.sin(phi) * Math.sin(phi));
        return n * Math.cos(phi) * Math.PI / 180 / Earth.NAUTICAL_MILE_M;
    }
}
