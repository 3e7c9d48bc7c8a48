package org.assay.checks;

import java.util.SplittableRandom;

import net.sf.geographiclib.Geodesic;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Tests for {@link MetricFrame} against exact geodesics on WGS84 (GeographicLib, Karney
 * 2013), and for {@link Geodesics} against published values.
 */
class MetricFrameTests {

	@Test
	void keepsDistancesWithinTheStatedBoundOfTheGeodesicAtEveryLatitude() {
		SplittableRandom random = new SplittableRandom(7);
		for (double lat0 = -85; lat0 <= 85; lat0 += 5) {
			for (double radius : new double[] { 20, 500, 2_500 }) {
				MetricFrame frame = new MetricFrame(13.4, lat0);
				double dLat = MetricFrame.degreesLat(radius);
				double bound = frame.relativeErrorBound(lat0 - dLat, lat0 + dLat);
				for (int i = 0; i < 200; i++) {
					double[] p = point(frame, radius, random);
					double[] q = point(frame, radius, random);
					double d = Math.hypot(frame.x(q[0]) - frame.x(p[0]), frame.y(q[1]) - frame.y(p[1]));
					double s = Geodesic.WGS84.Inverse(p[1], p[0], q[1], q[0]).s12;
					assertThat(Math.abs(d - s)).as("lat %s radius %s", lat0, radius)
						.isLessThanOrEqualTo(bound * s * 1.001 + 1e-9);
				}
			}
		}
	}

	@Test
	void statesTheBoundOfItsComment() {
		// first order: |tan φ0| · Δφ with Δφ = 1 km / 6371 km = 1.57e-4 rad
		checkBound(45, 1.6e-4);
		checkBound(60, 2.7e-4);
		checkBound(80, 8.9e-4);
	}

	@Test
	void measuresATenMetreGapWithinThreeMillimetresAtSixtyDegrees() {
		MetricFrame frame = new MetricFrame(25, 60);
		double dLat = MetricFrame.degreesLat(1000);
		// 10 m east, 900 m north of the centre, near the edge of the 1 km band
		double lat = 60 + MetricFrame.degreesLat(900) * 0.999;
		double lon = 25 + 10 / (Geodesic.WGS84.Inverse(lat, 25, lat, 26).s12);
		double d = frame.x(lon) - frame.x(25);
		double s = Geodesic.WGS84.Inverse(lat, 25, lat, lon).s12;
		assertThat(Math.abs(d - s)).isLessThan(0.003).isLessThan(frame.relativeErrorBound(60 - dLat, 60 + dLat) * s);
	}

	@Test
	void measuresAcrossTheAntimeridian() {
		// one degree of the equator is a·π/180 = 111,319.49 m: 0.001 degrees is 111.319 m
		MetricFrame frame = new MetricFrame(179.9995, 0);
		assertThat(frame.x(-179.9995) - frame.x(179.9995)).isCloseTo(6378137 * Math.PI / 180 * 0.001, within(1e-6));
		assertThat(frame.lon(frame.x(-179.9995))).isCloseTo(-179.9995, within(1e-12));
	}

	@Test
	void turnsFramePointsBackIntoTheSamePositions() {
		MetricFrame frame = new MetricFrame(-31.7, 40.9);
		assertThat(frame.lon(frame.x(-31.6912345))).isCloseTo(-31.6912345, within(1e-12));
		assertThat(frame.lat(frame.y(40.9087654))).isCloseTo(40.9087654, within(1e-12));
	}

	@Test
	void reportsGeodesicLengthsAsGeographicLibsTestSuite() {
		// GeographicLib test suite, inverse problems (see reference/SOURCES.md)
		assertThat(Geodesics.distance(-139.44815, 35.60777, -69.95921, -11.17491)).isCloseTo(8935244.5604818305,
				within(1e-6));
		assertThat(Geodesics.distance(106.05087, 55.52454, 197.18234, 77.03196)).isCloseTo(4105086.1713924406,
				within(1e-6));
		assertThat(Geodesics.distance(142.59065, -21.97856, 98.56635, 41.84138)).isCloseTo(8394328.894657671,
				within(1e-6));
	}

	@Test
	void reportsOneDegreeOfTheEquatorAsOneDegreeOfTheMajorCircle() {
		// derivation: the equator is a geodesic and a circle of radius a = 6378137 m
		assertThat(Geodesics.distance(0, 0, 1, 0)).isCloseTo(6378137 * Math.PI / 180, within(1e-6));
	}

	private static void checkBound(double lat0, double expected) {
		MetricFrame frame = new MetricFrame(0, lat0);
		double dLat = Math.toDegrees(1000 / 6_371_000.0);
		assertThat(frame.relativeErrorBound(lat0 - dLat, lat0 + dLat)).isCloseTo(expected, within(expected * 0.05));
	}

	/**
	 * A random position within a square of half-side {@code radius} metres around the
	 * centre.
	 */
	private static double[] point(MetricFrame frame, double radius, SplittableRandom random) {
		double x = random.nextDouble(-radius, radius) * 0.999;
		double y = random.nextDouble(-radius, radius) * 0.999;
		return new double[] { frame.lon(x), frame.lat(y) };
	}

}
