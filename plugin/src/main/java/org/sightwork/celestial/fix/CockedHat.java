package org.sightwork.celestial.fix;

import java.util.List;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The triangle the three lines of a three-body fix make where they cross.
 *
 * @param vertices the three crossings (lines 1-2, 2-3, 3-1)
 * @param largestSideNm the longest side (nautical miles): the size of the hat
 */
public record CockedHat(List<GeoPosition> vertices, double largestSideNm) {

    /** Copies the list; three vertices. */
    public CockedHat {
        vertices = List.copyOf(vertices);
        if (vertices.size() != 3) {
            throw new IllegalArgumentException("a cocked hat has three vertices, not " + vertices.size());
        }
    }
}
