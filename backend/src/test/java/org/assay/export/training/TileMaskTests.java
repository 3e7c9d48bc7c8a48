package org.assay.export.training;

import java.awt.image.BufferedImage;
import java.awt.image.Raster;
import java.io.ByteArrayInputStream;
import java.io.IOException;

import javax.imageio.ImageIO;

import org.assay.geo.WebMercatorQuad;
import org.assay.geo.WebMercatorQuad.Tile;
import org.assay.geo.Wkb;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LinearRing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatIllegalArgumentException;

/**
 * Masks of hand-made geometries whose pixel counts are computed by hand here: a pixel is
 * marked when its centre lies inside the buffered road or the area (the pixel-centre
 * rule, common practice).
 */
class TileMaskTests {

	/** OGC 17-083r2, WebMercatorQuad, TileMatrix 18: cell size in metres. */
	private static final double CELL_18 = 0.5971642834779395;

	@Test
	void aSixMetreRoadAcrossATileAtTheEquatorMarksElevenFullRows() {
		// The tile just north of the equator: its centre is at 0.0007 degrees, cos = 1 -
		// 1e-10.
		Tile tile = new Tile(18, 140000, (1 << 17) - 1);
		// half width 3 m / 0.5971642834779395 m = 5.0237 px about the centre line of row
		// 100 (y = 100.5): rows whose centres are within 5.0237 px are 95..105, 11 rows
		TileMask mask = new TileMask(tile);
		mask.addRoad(horizontalLine(tile, 100.5), 6.0);
		assertThat(3.0 / CELL_18).isBetween(5.02, 5.03);
		assertThat(mask.count()).isEqualTo(11 * 256);
		assertThat(mask.isMarked(0, 95)).isTrue();
		assertThat(mask.isMarked(255, 105)).isTrue();
		assertThat(mask.isMarked(128, 94)).isFalse();
		assertThat(mask.isMarked(128, 106)).isFalse();
	}

	@Test
	void aFourMetreRoadAtSixtyDegreesNorthIsWiderInPixelsByTheSecantOfTheLatitude() {
		Tile tile = WebMercatorQuad.tileAt(10.0, 60.0, 18);
		// cos 60 deg = 0.5 (within 2e-5 over the tile): half width 2 m / (0.59716 * 0.5)
		// = 6.698 px, so rows 94..106 (|r - 100| <= 6) are marked: 13 rows
		double centre = Math.toRadians(tile.bounds4326().centre().y);
		assertThat(2.0 / (CELL_18 * Math.cos(centre))).isBetween(6.69, 6.71);
		TileMask mask = new TileMask(tile);
		mask.addRoad(horizontalLine(tile, 100.5), 4.0);
		assertThat(mask.count()).isEqualTo(13 * 256);
	}

	@Test
	void aRoadThatEndsInsideTheTileMarksItsRoundCap() {
		Tile tile = new Tile(18, 140000, (1 << 17) - 1);
		TileMask mask = new TileMask(tile);
		// from beyond the west edge to the centre of column 128: the band covers columns
		// 0..127 fully (11 rows, 1408 pixels); the cap is a half disc of radius r =
		// 5.0237 px about (128.5, 100.5). Pixel centres (dx, dy) from it with dx >= 0 and
		// dx^2 + dy^2 <= r^2: dx 0: 11, dx 1: 9, dx 2: 9, dx 3: 9, dx 4: 7, dx 5: 1,
		// together 46
		mask.addRoad(line(tile, -10, 100.5, 128.5, 100.5), 6.0);
		assertThat(mask.count()).isEqualTo(1408 + 46);
	}

	@Test
	void aSquareOnPixelEdgesMarksExactlyItsPixelsAndItsHoleStaysClear() {
		Tile tile = WebMercatorQuad.tileAt(-3.0, 40.0, 18);
		TileMask mask = new TileMask(tile);
		// 10 x 10 pixels from (20, 20) to (30, 30), hole 4 x 4 from (23, 23) to (27, 27)
		Geometry square = Wkb.WGS84.createPolygon(ring(tile, 20, 20, 30, 30),
				new LinearRing[] { ring(tile, 23, 23, 27, 27) });
		mask.addArea(square);
		assertThat(mask.count()).isEqualTo(100 - 16);
		assertThat(mask.isMarked(20, 20)).isTrue();
		assertThat(mask.isMarked(29, 29)).isTrue();
		assertThat(mask.isMarked(30, 30)).isFalse();
		assertThat(mask.isMarked(24, 24)).isFalse();
	}

	@Test
	void marksFromSeveralGeometriesAreCountedOnce() {
		Tile tile = new Tile(18, 140000, (1 << 17) - 1);
		TileMask mask = new TileMask(tile);
		mask.addRoad(horizontalLine(tile, 100.5), 6.0);
		mask.addRoad(horizontalLine(tile, 102.5), 6.0);
		// rows 95..105 and 97..107: 95..107, 13 rows
		assertThat(mask.count()).isEqualTo(13 * 256);
	}

	@Test
	void aRoadOutsideTheTileMarksNothing() {
		Tile tile = new Tile(18, 140000, (1 << 17) - 1);
		TileMask mask = new TileMask(tile);
		mask.addRoad(horizontalLine(tile, 400.5), 6.0);
		assertThat(mask.count()).isZero();
	}

	@Test
	void theMaskIsASingleBandEightBitPngOfTheTileSize() throws IOException {
		Tile tile = new Tile(18, 140000, (1 << 17) - 1);
		TileMask mask = new TileMask(tile);
		mask.addRoad(horizontalLine(tile, 100.5), 6.0);
		BufferedImage image = ImageIO.read(new ByteArrayInputStream(mask.png()));
		Raster raster = image.getRaster();
		assertThat(image.getWidth()).isEqualTo(256);
		assertThat(image.getHeight()).isEqualTo(256);
		assertThat(raster.getNumBands()).isEqualTo(1);
		assertThat(image.getColorModel().getPixelSize()).isEqualTo(8);
		int marked = 0;
		for (int row = 0; row < 256; row++) {
			for (int col = 0; col < 256; col++) {
				int value = raster.getSample(col, row, 0);
				assertThat(value).isIn(0, 255);
				marked += (value == 255) ? 1 : 0;
			}
		}
		assertThat(marked).isEqualTo(mask.count());
	}

	@Test
	void refusesAnAreaAsARoadAndANonPositiveWidth() {
		Tile tile = new Tile(18, 140000, (1 << 17) - 1);
		TileMask mask = new TileMask(tile);
		assertThatIllegalArgumentException()
			.isThrownBy(() -> mask.addRoad(Wkb.WGS84.createPolygon(ring(tile, 1, 1, 5, 5)), 4.0));
		assertThatIllegalArgumentException().isThrownBy(() -> mask.addRoad(horizontalLine(tile, 10.5), 0));
	}

	private static Geometry horizontalLine(Tile tile, double row) {
		return line(tile, -10, row, 266, row);
	}

	static Geometry line(Tile tile, double col1, double row1, double col2, double row2) {
		return Wkb.WGS84.createLineString(new Coordinate[] { lonLat(tile, col1, row1), lonLat(tile, col2, row2) });
	}

	static LinearRing ring(Tile tile, double col1, double row1, double col2, double row2) {
		return Wkb.WGS84.createLinearRing(new Coordinate[] { lonLat(tile, col1, row1), lonLat(tile, col2, row1),
				lonLat(tile, col2, row2), lonLat(tile, col1, row2), lonLat(tile, col1, row1) });
	}

	/** The longitude and latitude of a pixel position of a tile. */
	private static Coordinate lonLat(Tile tile, double col, double row) {
		Envelope m = tile.bounds3857();
		double cell = WebMercatorQuad.cellSize(tile.z());
		return new Coordinate(WebMercatorQuad.longitude(m.getMinX() + col * cell),
				WebMercatorQuad.latitude(m.getMaxY() - row * cell));
	}

}
