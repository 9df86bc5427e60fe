package org.sightwork.celestial.almanac;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Names, numbers and lists of the almanac's bodies. */
class BodyLookupTest {

    private static final Almanac A = Almanac.standard();

    @Test
    void namesAreCaseInsensitive() {
        assertEquals(Body.SUN, A.body("sun"));
        assertEquals(Body.ARIES, A.body("ARIES"));
        assertEquals(0, A.body("polaris").navNumber());
        // Sirius: HR 2491 in the Bright Star Catalogue, navigational star 18 (the trade's list).
        assertEquals(2491, A.body("Sirius").hrNumber());
        assertEquals(A.body("Sirius"), A.body("HR 2491"));
        assertEquals(A.body("Sirius"), A.body("hr2491"));
        assertEquals("Rigil Kentaurus", A.body("rigil kentaurus").name());
    }

    @Test
    void unknownNameListsNearestNames() {
        UnknownBodyException e = assertThrows(UnknownBodyException.class, () -> A.body("Siruis"));
        assertTrue(e.nearest().contains("Sirius"), e.getMessage());
        assertTrue(e.getMessage().contains("Sirius"), e.getMessage());
        assertThrows(UnknownBodyException.class, () -> A.body("HR 1"));
    }

    @Test
    void listsHaveTheDocumentedOrder() {
        List<Body> nav = A.navigationalStars();
        assertEquals(58, nav.size());
        for (int i = 0; i < 58; i++) {
            assertEquals(i, nav.get(i).navNumber(), "number at " + i);
        }
        assertEquals("Polaris", nav.get(0).name());
        assertEquals("Alpheratz", nav.get(1).name());
        assertEquals("Markab", nav.get(57).name());
        List<Body> all = A.navigationalBodies();
        assertEquals(64, all.size());
        assertEquals(List.of(Body.SUN, Body.MOON, Body.VENUS, Body.MARS, Body.JUPITER, Body.SATURN), all.subList(0, 6));
        // The Bright Star Catalogue has 285 stars with positions and V < 3.5 (counted from bsc5.dat).
        assertEquals(285, A.catalogueStars(3.5).size());
        assertTrue(A.catalogueStars(3.5).containsAll(nav));
        assertEquals(-1.46, A.starMagnitude(A.body("Sirius")), 1e-9, "Sirius V in BSC5");
    }
}
