package org.sightwork.celestial.almanac;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The stars of the almanac: the Yale Bright Star Catalogue, 5th revised edition (Hoffleit and Warren
 * 1991, CDS V/50), every star brighter than V = 3.5 plus the navigational stars, with the trade's
 * names and numbers of the 58.
 *
 * <p><b>Method:</b> the fixed columns of V/50 (see the header of {@code bsc5-bright.dat}); the
 * catalogue place (FK5, J2000, epoch 2000) is kept as the SOFA "space motion" inputs: direction,
 * proper motion (the catalogue gives mu_alpha cos delta, checked on Polaris against Hipparcos:
 * +0.038"/yr, where mu_alpha alone would be near 3"/yr), parallax and radial velocity.
 *
 * <p><b>Accuracy:</b> the catalogue's RA to 0.1 s and Dec to 1" (at most 0.03').
 *
 * <p><b>Thread safety:</b> immutable after construction.
 */
final class StarCatalogue {

    /** One catalogue star, ready for the place of date. */
    record Star(Body body, double raRad, double decRad, double pmRaRadPerYear, double pmDecRadPerYear,
            double parallaxArcsec, double rvKmPerS, double vMag, double[] p0, double[] pmPerYear) {
    }

    private static final double ARCSEC = Math.PI / (180.0 * 3600.0);
    /** km/s to au per Julian year (SOFA's VF in iauPmpx: 86400 * 365.25 / 149597870.7). */
    private static final double KMS_TO_AU_PER_YEAR = 86400.0 * 365.25 / 149597870.7;

    private final List<Star> stars;
    private final Map<Integer, Star> byHr = new HashMap<>();
    private final List<Body> navigational;
    /** The same stars indexed by HR number: the per-star lookup without boxing or hashing. */
    private final Star[] hrIndex;

    StarCatalogue() {
        Map<Integer, String[]> nav = new HashMap<>();
        for (String[] f : tabRows("navigational-stars.tsv")) {
            nav.put(Integer.parseInt(f[3].trim()), f);
        }
        List<Star> list = new ArrayList<>();
        int n = 0;
        for (String line : SeriesFiles.lines("bsc5-bright.dat")) {
            n++;
            if (line.length() < 170) {
                line = String.format("%-170s", line);
            }
            int hr = Integer.parseInt(line.substring(0, 4).trim());
            String[] navRow = nav.get(hr);
            String name;
            int navNumber = -1;
            if (navRow != null) {
                name = navRow[1].trim();
                navNumber = Integer.parseInt(navRow[0].trim());
            } else {
                name = designation(line.substring(4, 14), hr);
            }
            double raH = Integer.parseInt(line.substring(75, 77).trim());
            double raM = Integer.parseInt(line.substring(77, 79).trim());
            double raS = Double.parseDouble(line.substring(79, 83).trim());
            int sign = line.charAt(83) == '-' ? -1 : 1;
            double decD = Integer.parseInt(line.substring(84, 86).trim());
            double decM = Integer.parseInt(line.substring(86, 88).trim());
            double decS = Integer.parseInt(line.substring(88, 90).trim());
            double v = Double.parseDouble(line.substring(102, 107).trim());
            double pmRa = parseOr(line.substring(148, 154), 0.0);
            double pmDec = parseOr(line.substring(154, 160), 0.0);
            double px = parseOr(line.substring(161, 166), 0.0);
            double rv = parseOr(line.substring(166, 170), 0.0);
            double ra = Math.toRadians((raH + raM / 60.0 + raS / 3600.0) * 15.0);
            double dec = sign * Math.toRadians(decD + decM / 60.0 + decS / 3600.0);
            if (!(px > 0)) {
                px = 0.0;
            }
            Body body = new Body(name, Body.Kind.STAR, navNumber, hr);
            double cosDec = Math.cos(dec);
            double pr = pmRa * ARCSEC / cosDec; // dRA/dt (rad/yr), as iauPmpx wants
            double pd = pmDec * ARCSEC;
            // iauPmpx: the space-motion vector (rad/yr) of a unit direction.
            double pxr = px * ARCSEC;
            double w = KMS_TO_AU_PER_YEAR * rv * pxr;
            double sr = Math.sin(ra);
            double cr = Math.cos(ra);
            double sd = Math.sin(dec);
            double[] p0 = {cr * cosDec, sr * cosDec, sd};
            double pdz = pd * p0[2];
            double[] pm = {-pr * p0[1] - pdz * cr + w * p0[0], pr * p0[0] - pdz * sr + w * p0[1], pd * cosDec + w * p0[2]};
            Star s = new Star(body, ra, dec, pr, pd, px, rv, v, p0, pm);
            list.add(s);
            if (byHr.put(hr, s) != null) {
                throw new IllegalStateException("bsc5-bright.dat line " + n + ": HR " + hr + " twice");
            }
        }
        stars = Collections.unmodifiableList(list);
        int maxHr = 0;
        for (Star st : list) {
            maxHr = Math.max(maxHr, st.body().hrNumber());
        }
        hrIndex = new Star[maxHr + 1];
        for (Star st : list) {
            hrIndex[st.body().hrNumber()] = st;
        }
        List<Body> navList = new ArrayList<>();
        for (int k = 0; k <= 57; k++) {
            for (Map.Entry<Integer, String[]> e : nav.entrySet()) {
                if (Integer.parseInt(e.getValue()[0].trim()) == k) {
                    Star s = byHr.get(e.getKey());
                    if (s == null) {
                        throw new IllegalStateException("navigational star " + k + " (HR " + e.getKey()
                                + ") is missing from bsc5-bright.dat");
                    }
                    navList.add(s.body());
                }
            }
        }
        if (navList.size() != 58) {
            throw new IllegalStateException("expected 58 navigational stars, found " + navList.size());
        }
        navigational = Collections.unmodifiableList(navList);
    }

    List<Star> stars() {
        return stars;
    }

    Star byHr(int hr) {
        return hr >= 0 && hr < hrIndex.length ? hrIndex[hr] : null;
    }

    List<Body> navigational() {
        return navigational;
    }

    /** "Alp1 Cen" from the name field (columns 5-14: Flamsteed, Bayer, superscript, constellation). */
    private static String designation(String field, int hr) {
        String flamsteed = field.substring(0, 3).trim();
        String bayer = field.substring(3, 6).trim();
        String sup = field.substring(6, 7).trim();
        String con = field.substring(7, 10).trim();
        if (!bayer.isEmpty() && !con.isEmpty()) {
            return bayer + sup + " " + con;
        }
        if (!flamsteed.isEmpty() && !con.isEmpty()) {
            return flamsteed + " " + con;
        }
        return "HR " + hr;
    }

    private static double parseOr(String text, double fallback) {
        String t = text.trim();
        if (t.isEmpty()) {
            return fallback;
        }
        if (t.startsWith("+.") || t.startsWith("-.")) {
            t = t.charAt(0) + "0" + t.substring(1);
        } else if (t.startsWith(".")) {
            t = "0" + t;
        }
        return Double.parseDouble(t);
    }

    private static List<String[]> tabRows(String resource) {
        List<String[]> rows = new ArrayList<>();
        for (String line : SeriesFiles.lines(resource)) {
            rows.add(line.split("\t"));
        }
        return rows;
    }
}
