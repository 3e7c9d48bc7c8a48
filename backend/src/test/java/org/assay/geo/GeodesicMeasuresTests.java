package org.assay.geo;

import java.util.SplittableRandom;

import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicMask;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKTReader;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatIllegalArgumentException;
import static org.assertj.core.api.Assertions.within;

/**
 * Tests for {@link GeodesicMeasures} against published geodesics and against areas that
 * follow from the shape of the WGS84 ellipsoid alone. Geometries are WKT, longitude
 * first.
 */
class GeodesicMeasuresTests {

	// WGS84: a = 6378137 m, f = 1/298.257223563 (Karney 2013; NIMA TR8350.2)
	private static final double A = 6378137;

	private static final double F = 1 / 298.257223563;

	// ---- lengths --------------------------------------------------------------------

	@Test
	void lengthMatchesTheFirstInverseCaseOfGeographicLib() {
		// GeographicLib test suite: (35.60777, -139.44815) -> (-11.17491, -69.95921)
		checkLength("LINESTRING (-139.44815 35.60777, -69.95921 -11.17491)", 8935244.5604818305);
	}

	@Test
	void lengthMatchesTheSecondInverseCaseOfGeographicLib() {
		// GeographicLib test suite: (55.52454, 106.05087) -> (77.03196, 197.18234)
		checkLength("LINESTRING (106.05087 55.52454, 197.18234 77.03196)", 4105086.1713924406);
	}

	@Test
	void lengthMatchesTheThirdInverseCaseOfGeographicLib() {
		// GeographicLib test suite: (-21.97856, 142.59065) -> (41.84138, 98.56635)
		checkLength("LINESTRING (142.59065 -21.97856, 98.56635 41.84138)", 8394328.894657671);
	}

	@Test
	void oneDegreeOfTheEquatorIsOneDegreeOfACircleOfTheMajorRadius() {
		// derivation: the equator is a geodesic and a circle of radius a
		checkLength("LINESTRING (0 0, 1 0)", A * Math.PI / 180);
	}

	@Test
	void lengthOfAMultiLineIsTheSumOfItsParts() {
		// derivation: two degrees of the equator, one in each part
		checkLength("MULTILINESTRING ((0 0, 1 0), (5 0, 5.5 0, 6 0))", 2 * A * Math.PI / 180);
	}

	@Test
	void lengthOfAPolygonIsItsPerimeter() {
		// from memory: the WGS84 quarter meridian is 10001965.7293 m (equator to pole);
		// plus one degree of the equator (derivation as above)
		double perimeter = GeodesicMeasures.lengthMetres(geometry("POLYGON ((0 0, 1 0, 1 90, 0 0))"));
		assertThat(perimeter).isCloseTo(2 * 10001965.7293 + A * Math.PI / 180, within(1e-3));
	}

	@Test
	void shortSegmentsAreWithinAMicrometreOfTheGeodesic() {
		// reference library: GeographicLib's full solution, segment by segment; random
		// segments up to the largest short span in both directions, at all latitudes
		SplittableRandom random = new SplittableRandom(20_130_043);
		double span = GeodesicMeasures.SHORT_DEGREES;
		for (int i = 0; i < 200_000; i++) {
			double lat1 = random.nextDouble(-90 + span, 90 - span);
			double lon1 = random.nextDouble(-180, 180);
			double lat2 = lat1 + random.nextDouble(-span, span);
			double lon2 = lon1 + ((i % 4 == 0) ? span : random.nextDouble(-span, span));
			double geodesic = Geodesic.WGS84.Inverse(lat1, lon1, lat2, lon2, GeodesicMask.DISTANCE).s12;
			assertThat(GeodesicMeasures.segment(lat1, lon1, lat2, lon2)).as("%s %s %s %s", lat1, lon1, lat2, lon2)
				.isCloseTo(geodesic, within(1e-6));
		}
	}

	@Test
	void segmentsJustLongerThanShortTakeTheFullSolution() {
		// reference library: GeographicLib, which the long path calls; 0.0051 degrees of
		// latitude is past the short span
		double geodesic = Geodesic.WGS84.Inverse(60, 10, 60.0051, 10.003, GeodesicMask.DISTANCE).s12;
		assertThat(GeodesicMeasures.segment(60, 10, 60.0051, 10.003)).isEqualTo(geodesic);
	}

	@Test
	void aRoadOfShortSegmentsMeasuresAsTheSumOfItsGeodesics() {
		// reference library: GeographicLib, segment by segment
		Geometry road = geometry("LINESTRING (13.4 52.5, 13.4002 52.5001, 13.4005 52.4999, 13.4051 52.5)");
		double expected = 0;
		Coordinate[] points = road.getCoordinates();
		for (int i = 1; i < points.length; i++) {
			expected += Geodesic.WGS84.Inverse(points[i - 1].y, points[i - 1].x, points[i].y, points[i].x,
					GeodesicMask.DISTANCE).s12;
		}
		assertThat(GeodesicMeasures.lengthMetres(road)).isCloseTo(expected, within(3e-6));
	}

	@Test
	void pointsHaveNoLength() {
		assertThat(GeodesicMeasures.lengthMetres(geometry("POINT (10 50)"))).isZero();
	}

	// ---- areas ------------------------------------------------------------------------

	@Test
	void octantIsAnEighthOfTheEllipsoid() {
		// derivation: equator and two meridians 90 degrees apart cut the ellipsoid in 8
		// equal parts, and all three edges are geodesics
		double area = GeodesicMeasures.areaSquareMetres(geometry("POLYGON ((0 0, 90 0, 0 90, 0 0))"));
		assertThat(area).isCloseTo(ellipsoidArea() / 8, within(0.1));
	}

	@Test
	void oneDegreeSectorFromEquatorToPoleIsA720thOfTheEllipsoid() {
		// derivation: 360 such sectors fill a hemisphere; all edges are geodesics
		double area = GeodesicMeasures.areaSquareMetres(geometry("POLYGON ((0 0, 1 0, 1 90, 0 0))"));
		assertThat(area).isCloseTo(ellipsoidArea() / 720, within(0.01));
	}

	@Test
	void oneDegreeCellAtTheEquatorIsTheBandBetweenParallelsPlusASliver() {
		// derivation: the area between the equator and latitude phi over one degree is
		// (pi/180) b^2/2 [sin(phi)/(1 - e^2 sin^2(phi)) + atanh(e sin(phi))/e]
		// (authalic-latitude formula). The cell's top edge is a geodesic, which bows
		// poleward of the parallel by about 4 m at mid-span; the sliver it adds is about
		// (2/3) * 4 m * 111 km, some 2.5e-5 of the cell.
		double band = bandArea(1);
		double area = GeodesicMeasures.areaSquareMetres(geometry("POLYGON ((0 0, 1 0, 1 1, 0 1, 0 0))"));
		assertThat(area).isGreaterThan(band).isCloseTo(band, within(band * 3e-5));
		// from memory: a one-degree cell at the equator is about 12,309 square kilometres
		assertThat(area / 1e6).isCloseTo(12309, within(1.0));
	}

	@Test
	void windingDoesNotChangeTheArea() {
		// RFC 7946 section 3.1.6: either winding must be accepted, so both must measure
		double counterclockwise = GeodesicMeasures.areaSquareMetres(geometry("POLYGON ((0 0, 1 0, 1 1, 0 1, 0 0))"));
		double clockwise = GeodesicMeasures.areaSquareMetres(geometry("POLYGON ((0 0, 0 1, 1 1, 1 0, 0 0))"));
		assertThat(clockwise).isCloseTo(counterclockwise, within(1e-3));
	}

	@Test
	void holesAreSubtracted() {
		double shell = GeodesicMeasures.areaSquareMetres(geometry("POLYGON ((0 0, 2 0, 2 2, 0 2, 0 0))"));
		double hole = GeodesicMeasures.areaSquareMetres(geometry("POLYGON ((0.5 0.5, 1 0.5, 1 1, 0.5 1, 0.5 0.5))"));
		double both = GeodesicMeasures
			.areaSquareMetres(geometry("POLYGON ((0 0, 2 0, 2 2, 0 2, 0 0), (0.5 0.5, 0.5 1, 1 1, 1 0.5, 0.5 0.5))"));
		assertThat(both).isCloseTo(shell - hole, within(1e-3));
	}

	@Test
	void areaOfAMultiPolygonIsTheSumOfItsParts() {
		// derivation: the sector and the octant checked above, side by side
		double area = GeodesicMeasures
			.areaSquareMetres(geometry("MULTIPOLYGON (((0 0, 90 0, 0 90, 0 0)), ((-1 0, -1 90, -2 0, -1 0)))"));
		assertThat(area).isCloseTo(ellipsoidArea() / 8 + ellipsoidArea() / 720, within(0.1));
	}

	@Test
	void linesHaveNoArea() {
		assertThat(GeodesicMeasures.areaSquareMetres(geometry("LINESTRING (0 0, 1 0, 1 1, 0 0)"))).isZero();
	}

	// ---- representative points
	// ---------------------------------------------------------

	@Test
	void lineIsRepresentedByItsMiddleVertex() {
		checkPoint("LINESTRING (0 0, 1 0, 2 1, 3 1, 4 0)", 2, 1);
	}

	@Test
	void lineWithAnEvenNumberOfVerticesIsRepresentedByTheVertexAfterTheMiddle() {
		// index n / 2 of 4 vertices is 2, the third
		checkPoint("LINESTRING (0 0, 1 0, 2 1, 3 1)", 2, 1);
	}

	@Test
	void multiLineIsRepresentedByThePartWithTheMostVertices() {
		checkPoint("MULTILINESTRING ((0 0, 100 0), (5 5, 6 5, 7 6))", 6, 5);
	}

	@Test
	void partsWithEqualVertexCountsGoToTheFirst() {
		checkPoint("MULTILINESTRING ((0 0, 1 0, 2 0), (5 5, 6 5, 7 6))", 1, 0);
	}

	@Test
	void uShapedBuildingIsRepresentedByAPointInsideIt() {
		Geometry building = geometry("POLYGON ((0 0, 3 0, 3 3, 2 3, 2 1, 1 1, 1 3, 0 3, 0 0))");
		Point point = Wkb.WGS84.createPoint(GeodesicMeasures.representativePoint(building));
		// the centroid (1.5, 1.36) falls in the notch; the representative point may not
		assertThat(building.contains(building.getCentroid())).isFalse();
		assertThat(building.contains(point)).isTrue();
	}

	@Test
	void multiPolygonIsRepresentedByAPointInsideOneOfItsParts() {
		Geometry buildings = geometry("MULTIPOLYGON (((0 0, 1 0, 1 1, 0 1, 0 0)), ((5 5, 9 5, 9 9, 5 9, 5 5)))");
		Point point = Wkb.WGS84.createPoint(GeodesicMeasures.representativePoint(buildings));
		assertThat(buildings.contains(point)).isTrue();
	}

	@Test
	void emptyGeometryHasNoRepresentativePoint() {
		assertThatIllegalArgumentException()
			.isThrownBy(() -> GeodesicMeasures.representativePoint(geometry("LINESTRING EMPTY")));
	}

	// ---- helpers
	// -----------------------------------------------------------------------

	private static void checkLength(String wkt, double metres) {
		assertThat(GeodesicMeasures.lengthMetres(geometry(wkt))).isCloseTo(metres, within(1e-6));
	}

	private static void checkPoint(String wkt, double x, double y) {
		assertThat(GeodesicMeasures.representativePoint(geometry(wkt))).isEqualTo(new Coordinate(x, y));
	}

	/**
	 * Surface of an oblate ellipsoid, 2 pi a^2 + pi (b^2 / e) ln((1 + e) / (1 - e)) (a
	 * textbook result; from memory, about 510,065,621.7 square kilometres for WGS84).
	 */
	private static double ellipsoidArea() {
		double b = A * (1 - F);
		double e = Math.sqrt(F * (2 - F));
		return 2 * Math.PI * A * A + Math.PI * b * b / e * Math.log((1 + e) / (1 - e));
	}

	/** Area between the equator and a parallel over one degree of longitude. */
	private static double bandArea(double latitudeDegrees) {
		double b = A * (1 - F);
		double e2 = F * (2 - F);
		double e = Math.sqrt(e2);
		double s = Math.sin(Math.toRadians(latitudeDegrees));
		double q = s / (1 - e2 * s * s) + Math.log((1 + e * s) / (1 - e * s)) / (2 * e);
		return Math.toRadians(1) * b * b / 2 * q;
	}

	private static Geometry geometry(String wkt) {
		try {
			return new WKTReader(Wkb.WGS84).read(wkt);
		}
		catch (ParseException ex) {
			throw new IllegalArgumentException(ex);
		}
	}

}
