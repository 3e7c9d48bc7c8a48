package org.assay.cells;

import net.sf.geographiclib.Geodesic;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Tests for {@link LocalMetres} against exact geodesics on WGS84.
 */
class LocalMetresTests {

	@Test
	void measuresShortSidesWithinSixPerMilleOfTheGeodesicAtEveryLatitude() {
		for (double latitude = -89.5; latitude <= 89.5; latitude += 0.5) {
			double east = 50 / LocalMetres.metresPerDegreeLongitude(latitude);
			double north = 50 / LocalMetres.METRES_PER_DEGREE;
			double eastWest = Geodesic.WGS84.Inverse(latitude, 10, latitude, 10 + east).s12;
			double northSouth = Geodesic.WGS84.Inverse(latitude - north / 2, 10, latitude + north / 2, 10).s12;
			assertThat(eastWest).as("east-west at %s", latitude).isCloseTo(50, within(50 * 0.006));
			assertThat(northSouth).as("north-south at %s", latitude).isCloseTo(50, within(50 * 0.006));
		}
	}

	@Test
	void takesTheShorterSideOfABoxAtItsCentreLatitude() {
		double side = LocalMetres.shorterSide(10, 59.5, 11, 60.5);
		assertThat(side).isCloseTo(LocalMetres.METRES_PER_DEGREE * Math.cos(Math.toRadians(60)), within(1e-6));
		assertThat(LocalMetres.shorterSide(10, 0, 20, 1)).isCloseTo(LocalMetres.METRES_PER_DEGREE, within(1e-6));
	}

}
