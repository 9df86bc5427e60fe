package org.sightwork.geo.chart;

import java.util.Optional;
import org.apache.sis.referencing.CRS;
import org.apache.sis.referencing.CommonCRS;
import org.apache.sis.referencing.crs.AbstractCRS;
import org.apache.sis.referencing.cs.AxesConvention;
import org.apache.sis.util.Utilities;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Geometry;
import org.opengis.referencing.crs.CoordinateReferenceSystem;
import org.opengis.referencing.operation.MathTransform;
import org.opengis.referencing.operation.TransformException;
import org.opengis.util.FactoryException;

/**
 * Brings geometries from a source's coordinate reference system to WGS84 longitude/latitude,
 * through Apache SIS ({@link CRS#findOperation}).
 *
 * <p>Sources store x before y (east, north), whatever axis order their CRS declares (GeoPackage
 * 1.3, §2.1.3.1.1; RFC 7946 §3.1.1 for GeoJSON), so both CRSs are taken in their right-handed,
 * longitude-first form.
 *
 * <p><b>Thread safety:</b> immutable once made.
 */
public final class Reprojection {

    /**
     * WGS84 longitude/latitude, in a holder so that the identity below does not start SIS: asking
     * SIS for EPSG:4326 cost 0.4 s of CPU on a cold start (measured on the build machine), a quarter
     * of opening the bundled chart, whose files are all in EPSG:4326.
     */
    private static final class Target {
        static final CoordinateReferenceSystem WGS84 = CommonCRS.WGS84.normalizedGeographic();
    }

    private static final Reprojection WGS84_LON_LAT = new Reprojection(null, "WGS 84");

    private final MathTransform transform;
    private final String crsName;

    private Reprojection(MathTransform transform, String crsName) {
        this.transform = transform;
        this.crsName = crsName;
    }

    /**
     * No reprojection: the source is WGS84 longitude/latitude in degrees, x before y (EPSG:4326 as
     * GeoPackage 1.3 §2.1.3.1.1 and RFC 7946 store it). Does not start SIS.
     *
     * @return the identity
     */
    public static Reprojection wgs84LonLat() {
        return WGS84_LON_LAT;
    }

    /**
     * The reprojection from a CRS named by an authority code, such as {@code EPSG:3857}.
     *
     * @param code the code
     * @return the reprojection
     * @throws FactoryException if SIS does not know the code or cannot reach WGS84 from it
     */
    public static Reprojection fromCode(String code) throws FactoryException {
        return from(CRS.forCode(code));
    }

    /**
     * The reprojection from a CRS given in Well-Known Text.
     *
     * @param wkt the WKT (1 or 2)
     * @return the reprojection
     * @throws FactoryException if SIS cannot read it or reach WGS84 from it
     */
    public static Reprojection fromWkt(String wkt) throws FactoryException {
        return from(CRS.fromWKT(wkt));
    }

    /**
     * The reprojection from a CRS.
     *
     * @param source the source CRS
     * @return the reprojection
     * @throws FactoryException if SIS finds no operation to WGS84
     */
    public static Reprojection from(CoordinateReferenceSystem source) throws FactoryException {
        CoordinateReferenceSystem src = AbstractCRS.castOrCopy(source).forConvention(AxesConvention.RIGHT_HANDED);
        String name = source.getName().getCode();
        if (Utilities.equalsIgnoreMetadata(src, Target.WGS84)) {
            return new Reprojection(null, name);
        }
        return new Reprojection(CRS.findOperation(src, Target.WGS84, null).getMathTransform(), name);
    }

    /**
     * The name of the source CRS.
     *
     * @return e.g. "WGS 84 / Pseudo-Mercator"
     */
    public String crsName() {
        return crsName;
    }

    /**
     * Whether the source is WGS84 longitude/latitude already.
     *
     * @return true when nothing needs doing
     */
    public boolean isIdentity() {
        return transform == null;
    }

    /**
     * Reprojects a geometry in place.
     *
     * @param g the geometry, in the source CRS; in WGS84 afterwards
     * @return the same geometry, or empty if a coordinate could not be transformed
     */
    public Optional<Geometry> apply(Geometry g) {
        if (transform == null) {
            return Optional.of(g);
        }
        double[] buf = new double[2];
        boolean[] failed = {false};
        g.apply(new CoordinateSequenceFilter() {
            @Override
            public void filter(CoordinateSequence seq, int i) {
                buf[0] = seq.getX(i);
                buf[1] = seq.getY(i);
                try {
                    transform.transform(buf, 0, buf, 0, 1);
                } catch (TransformException e) {
                    failed[0] = true;
                    return;
                }
                seq.setOrdinate(i, 0, buf[0]);
                seq.setOrdinate(i, 1, buf[1]);
            }

            @Override
            public boolean isDone() {
                return failed[0];
            }

            @Override
            public boolean isGeometryChanged() {
                return true;
            }
        });
        return failed[0] ? Optional.empty() : Optional.of(g);
    }
}
