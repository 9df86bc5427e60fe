package org.sightwork.geo.chart;

import java.util.List;

/**
 * What came out of reading one or more chart files: the layers that could be read and the
 * problems met. Good layers are kept even when others fail.
 *
 * @param layers the layers read
 * @param problems the problems, in the order met
 */
public record ChartData(List<ChartLayer> layers, List<ChartProblem> problems) {

    /** Copies the lists. */
    public ChartData {
        layers = List.copyOf(layers);
        problems = List.copyOf(problems);
    }
}
