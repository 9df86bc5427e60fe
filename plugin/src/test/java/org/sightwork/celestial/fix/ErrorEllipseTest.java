package org.sightwork.celestial.fix;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The ellipse drawn from a covariance: every point of its outline must lie at the 95 % chi-square
 * distance (5.991, 2 degrees of freedom: -2 ln 0.05, the 2-D normal's radial law) of the
 * covariance, whatever its orientation. The coverage tests in FixSolverTest use the covariance;
 * this ties what is drawn to it.
 */
class ErrorEllipseTest {

    @Test
    void outlineLiesAtTheNinetyFivePercentDistance() {
        Random random = new Random(11L);
        for (int i = 0; i < 2000; i++) {
            double a = 0.01 + random.nextDouble() * 10;
            double b = 0.01 + random.nextDouble() * 10;
            double h = (random.nextDouble() * 2 - 1) * Math.sqrt(a * b) * 0.999;
            PositionCovariance c = new PositionCovariance(a, b, h);
            ErrorEllipse e = ErrorEllipse.of95(c);
            double az = Math.toRadians(e.orientationDeg());
            for (double t = 0; t < 2 * Math.PI; t += Math.PI / 7) {
                // A point on the outline: major along the bearing az, minor perpendicular.
                double u = e.majorNm() * Math.cos(t);
                double v = e.minorNm() * Math.sin(t);
                double east = u * Math.sin(az) + v * Math.cos(az);
                double north = u * Math.cos(az) - v * Math.sin(az);
                assertEquals(ErrorEllipse.CHI_SQUARE_2D_95, c.mahalanobis2(east, north), 1e-6 * ErrorEllipse.CHI_SQUARE_2D_95,
                        "outline point, case " + i);
            }
        }
        // chi-square 2 dof 95 % point, from memory of the standard tables: 5.991
        assertEquals(5.991, ErrorEllipse.CHI_SQUARE_2D_95, 0.0005, "the quantile");
    }

    @Test
    void northSouthElongationPointsNorth() {
        ErrorEllipse e = ErrorEllipse.of95(new PositionCovariance(1.0, 4.0, 0.0));
        assertEquals(0.0, e.orientationDeg(), 1e-12, "major axis along 000°");
        assertEquals(Math.sqrt(ErrorEllipse.CHI_SQUARE_2D_95 * 4.0), e.majorNm(), 1e-12, "major axis");
    }
}
