package org.assay.geo;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKBWriter;
import org.locationtech.jts.io.WKTReader;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Tests for {@link Wkb}: its own encoder writes the same bytes as JTS's
 * {@code WKBWriter(2)} (the reference library), and everything reads back.
 */
class WkbTests {

	@Test
	void linesAndPolygonsAreWrittenByteForByteAsJtsWritesThem() {
		check("LINESTRING (13.4 52.5, 13.4002 52.5001, -13.4005 -52.4999)");
		check("MULTILINESTRING ((0 0, 1 1), (2 2, 3 3, 4 2))");
		check("POLYGON ((0 0, 1 0, 1 1, 0 1, 0 0))");
		check("POLYGON ((0 0, 3 0, 3 3, 0 3, 0 0), (1 1, 1 2, 2 2, 2 1, 1 1), (0.1 0.1, 0.1 0.2, 0.2 0.2, 0.1 0.1))");
		check("MULTIPOLYGON (((0 0, 1 0, 1 1, 0 0)), ((5 5, 9 5, 9 9, 5 9, 5 5), (6 6, 6 7, 7 7, 6 6)))");
		check("LINESTRING Z (1 2 3, 4 5 6)");
	}

	@Test
	void otherGeometriesAreWrittenByJts() {
		check("POINT (1 2)");
		check("LINESTRING EMPTY");
		check("POLYGON EMPTY");
		check("GEOMETRYCOLLECTION (POINT (1 2), LINESTRING (0 0, 1 1))");
		check("MULTILINESTRING ((0 0, 1 1), EMPTY)");
	}

	@Test
	void randomRoadsAreWrittenAsJtsWritesThemAndReadBack() {
		SplittableRandom random = new SplittableRandom(7);
		for (int i = 0; i < 1_000; i++) {
			Coordinate[] points = new Coordinate[2 + random.nextInt(30)];
			for (int p = 0; p < points.length; p++) {
				points[p] = new Coordinate(random.nextDouble(-180, 180), random.nextDouble(-90, 90));
			}
			Geometry road = Wkb.WGS84.createLineString(points);
			byte[] bytes = Wkb.write(road);
			assertThat(bytes).isEqualTo(new WKBWriter(2).write(road));
			assertThat(Wkb.read(bytes).equalsExact(road)).isTrue();
		}
	}

	private static void check(String wkt) {
		Geometry geometry = geometry(wkt);
		assertThat(Wkb.write(geometry)).as(wkt).isEqualTo(new WKBWriter(2).write(geometry));
		assertThat(Wkb.read(Wkb.write(geometry)).equalsExact(geometry)).as(wkt).isTrue();
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
