package org.sightwork.celestial.reduction;

import java.util.List;
import org.sightwork.celestial.almanac.BodyPosition;
import org.sightwork.celestial.sight.Worksheet;

/**
 * A sight worked through: the almanac's place of the body, the corrections to Ho, and the line of
 * position from the AP.
 *
 * @param worksheet the corrections from Hs to Ho (holds the sight)
 * @param position the body's apparent geocentric place at the sight's UTC
 * @param computed LHA, Hc and Zn from the AP
 * @param lop the line of position
 * @param warnings the worksheet's warnings and those of the reduction (large intercept...)
 */
public record ReducedSight(Worksheet worksheet, BodyPosition position, ComputedAltitude computed,
        LineOfPosition lop, List<String> warnings) {

    /** Copies the warnings. */
    public ReducedSight {
        warnings = List.copyOf(warnings);
    }
}
