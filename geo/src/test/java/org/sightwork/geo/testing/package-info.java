/** Test helpers published in geo's test jar: headless JavaFX start-up, the test charts, a test plugin. */
package org.sightwork.geo.testing;
