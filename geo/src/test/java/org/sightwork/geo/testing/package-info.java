/**
 * Test helpers published in geo's test jar: headless JavaFX start-up, the test charts, a test plugin,
 * overlays for test plugin contexts.
 */
package org.sightwork.geo.testing;
