/**
 * Time scales a sight needs: UTC as the navigator's clock, TAI and TT for the ephemerides, UT1 for
 * the Earth's rotation (GHA), and Delta T = TT - UT1.
 *
 * <p><b>Units and conventions:</b> instants are {@link java.time.Instant} (UTC, no leap-second
 * label 23:59:60: an instant inside a leap second cannot be written); Julian dates are days, DUT1
 * and Delta T seconds. The span is 1900-01-01 to 2100-12-31 (UTC); outside it the computations
 * throw {@link org.sightwork.celestial.time.OutOfSpanException}.
 */
package org.sightwork.celestial.time;
