/**
 * The drill mode on the chart: open a drill pack (made by {@code sightwork drill new}) with the
 * GPS withheld, load the students' answers, and, on the instructor's deliberate reveal, draw the
 * true track, the key's fixes and each student's fix joined to the truth, with the grade of
 * {@link org.sightwork.celestial.drill.DrillGrader} listed fix by fix.
 *
 * <p>The student's sight log and DR log go into the plot through the plugin's own passage file: a
 * passage is written for the drill in {@code ~/.sightwork/celestial/drill/} and opened as any
 * passage is, so that the sights are worked, edited and saved as usual. Nothing here grades; the
 * grader's numbers are shown as they are.
 *
 * <p>Conventions: positions in degrees (north and east positive), distances in nautical miles,
 * times UTC. <b>Thread:</b> {@link org.sightwork.celestial.ui.drill.DrillFiles} and
 * {@link org.sightwork.celestial.ui.drill.DrillPassage} are stateless and run on a worker thread;
 * everything else runs on the JavaFX application thread unless its Javadoc says otherwise.
 */
package org.sightwork.celestial.ui.drill;
