package org.assay.geo;

import org.assay.geo.WebMercatorQuad.Tile;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Envelope;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The tile matrix set against the values published in OGC 17-083r2 (Two Dimensional Tile
 * Matrix Set), Annex D, WebMercatorQuad.
 */
class WebMercatorQuadTests {

	@Test
	void cellSizeAndScaleMatchThePublishedValuesAtZoomZero() {
		// OGC 17-083r2, WebMercatorQuad, TileMatrix 0
		checkZoom(0, 559082264.0287178, 156543.0339280410);
	}

	@Test
	void cellSizeAndScaleMatchThePublishedValuesAtZoomTwelve() {
		// OGC 17-083r2, WebMercatorQuad, TileMatrix 12
		checkZoom(12, 136494.6933663862, 38.21851414258813);
	}

	@Test
	void cellSizeAndScaleMatchThePublishedValuesAtZoomEighteen() {
		// OGC 17-083r2, WebMercatorQuad, TileMatrix 18
		checkZoom(18, 2132.729583849784, 0.5971642834779395);
	}

	@Test
	void theTopLeftOriginAndTheLatitudeLimitAreThePublishedOnes() {
		// OGC 17-083r2, WebMercatorQuad: top-left corner (-20037508.3427892,
		// 20037508.3427892)
		Envelope world = new Tile(0, 0, 0).bounds3857();
		assertThat(world.getMinX()).isCloseTo(-20037508.3427892, within(1e-6));
		assertThat(world.getMaxY()).isCloseTo(20037508.3427892, within(1e-6));
		assertThat(world.getMaxX()).isCloseTo(20037508.3427892, within(1e-6));
		assertThat(world.getMinY()).isCloseTo(-20037508.3427892, within(1e-6));
		// OGC 17-083r2, WebMercatorQuad: the grid ends at latitude +-85.0511287798
		assertThat(WebMercatorQuad.MAX_LATITUDE).isCloseTo(85.0511287798, within(1e-10));
		Envelope degrees = new Tile(0, 0, 0).bounds4326();
		assertThat(degrees.getMaxY()).isCloseTo(85.0511287798, within(1e-10));
		assertThat(degrees.getMinY()).isCloseTo(-85.0511287798, within(1e-10));
		assertThat(degrees.getMinX()).isCloseTo(-180, within(1e-12));
		assertThat(degrees.getMaxX()).isCloseTo(180, within(1e-12));
	}

	@Test
	void tilesAreCountedFromTheNorthWest() {
		assertThat(WebMercatorQuad.tileAt(-0.5, 0.5, 1)).isEqualTo(new Tile(1, 0, 0));
		assertThat(WebMercatorQuad.tileAt(0.5, 0.5, 1)).isEqualTo(new Tile(1, 1, 0));
		assertThat(WebMercatorQuad.tileAt(-0.5, -0.5, 1)).isEqualTo(new Tile(1, 0, 1));
		assertThat(WebMercatorQuad.tileAt(0.5, -0.5, 1)).isEqualTo(new Tile(1, 1, 1));
	}

	@Test
	void pointsOnTheEdgeOrBeyondTheLimitFallInTheLastTile() {
		assertThat(WebMercatorQuad.tileAt(180, -90, 3)).isEqualTo(new Tile(3, 7, 7));
		assertThat(WebMercatorQuad.tileAt(-180, 90, 3)).isEqualTo(new Tile(3, 0, 0));
	}

	@Test
	void aPointLiesInsideTheBoundsOfItsTileInBothSystems() {
		double lon = -31.7;
		double lat = 40.9;
		for (int z = 0; z <= 19; z++) {
			Tile tile = WebMercatorQuad.tileAt(lon, lat, z);
			assertThat(tile.bounds4326().contains(lon, lat)).as("zoom %d", z).isTrue();
			assertThat(tile.bounds3857().contains(WebMercatorQuad.easting(lon), WebMercatorQuad.northing(lat)))
				.isTrue();
			assertThat(tile.bounds3857().getWidth()).isCloseTo(256 * WebMercatorQuad.cellSize(z), within(1e-6));
		}
	}

	@Test
	void projectionRoundTripsAndTheMatrixHasTwoToTheZoomTilesASide() {
		assertThat(WebMercatorQuad.latitude(WebMercatorQuad.northing(40.9))).isCloseTo(40.9, within(1e-12));
		assertThat(WebMercatorQuad.longitude(WebMercatorQuad.easting(-31.7))).isCloseTo(-31.7, within(1e-12));
		assertThat(WebMercatorQuad.contains(12, 4095, 4095)).isTrue();
		assertThat(WebMercatorQuad.contains(12, 4096, 0)).isFalse();
		assertThat(WebMercatorQuad.contains(12, 0, -1)).isFalse();
	}

	@Test
	void knownPointsProjectAsGdalDoesAndFallInTheHandComputedTiles() {
		// EPSG:3857 metres printed by GDAL 3.6.2's gdaltransform (PROJ) for
		// "-s_srs EPSG:4326 -t_srs EPSG:3857"; tile indexes computed by hand from them:
		// x = floor((E + 20037508.3427892) / span), y = floor((20037508.3427892 - N) /
		// span),
		// span = 256 * cellSize(z) (OGC 17-083r2, WebMercatorQuad)
		checkPoint(-31.7, 40.9, -3528827.85814677, 4997602.85716766, 1687, 1537, 107988, 98381);
		checkPoint(13.405, 52.52, 1492237.77408383, 6894699.80128242, 2200, 1343, 140833, 85971);
		checkPoint(-122.4194, 37.7749, -13627665.2712181, 4547675.35434056, 655, 1583, 41928, 101324);
		checkPoint(151.2093, -33.8688, 16832542.2792073, -4011198.64730757, 3768, 2457, 241179, 157310);
	}

	private static void checkPoint(double lon, double lat, double easting, double northing, int x12, int y12, int x18,
			int y18) {
		assertThat(WebMercatorQuad.easting(lon)).isCloseTo(easting, within(1e-3));
		assertThat(WebMercatorQuad.northing(lat)).isCloseTo(northing, within(1e-3));
		assertThat(WebMercatorQuad.tileAt(lon, lat, 12)).isEqualTo(new Tile(12, x12, y12));
		assertThat(WebMercatorQuad.tileAt(lon, lat, 18)).isEqualTo(new Tile(18, x18, y18));
	}

	private static void checkZoom(int z, double scaleDenominator, double cellSize) {
		assertThat(WebMercatorQuad.cellSize(z)).isCloseTo(cellSize, within(cellSize * 1e-12));
		assertThat(WebMercatorQuad.scaleDenominator(z)).isCloseTo(scaleDenominator, within(scaleDenominator * 1e-12));
	}

}
