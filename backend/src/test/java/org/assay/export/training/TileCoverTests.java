package org.assay.export.training;

import java.util.List;

import org.assay.geo.WebMercatorQuad.Tile;
import org.assay.geo.Wkb;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The tiles under a geometry, against tile indexes computed by hand with the usual XYZ
 * formulas (common practice): {@code x = floor((lon + 180) / 360 · 2^z)},
 * {@code y = floor((1 − ln(tan φ + sec φ) / π) / 2 · 2^z)}.
 */
class TileCoverTests {

	@Test
	void aPointFarFromTileEdgesIsInTheTileTheFormulasGive() {
		// lon 10.0, lat 50.0, z 18: x = floor(190 / 360 * 262144) = floor(138353.78) =
		// 138353; y: tan 50 + sec 50 = 1.191754 + 1.555724 = 2.747478, ln = 1.010683,
		// (1 - 1.010683 / pi) / 2 * 262144 = 0.339146 * 262144 = 88904.3, so 88904
		double phi = Math.toRadians(50.0);
		double y = (1 - Math.log(Math.tan(phi) + 1 / Math.cos(phi)) / Math.PI) / 2 * (1 << 18);
		assertThat((long) Math.floor(y)).isEqualTo(88904);
		List<Tile> tiles = TileCover.of(Wkb.WGS84.createPoint(new Coordinate(10.0, 50.0)), 1.0, 18);
		assertThat(tiles).containsExactly(new Tile(18, 138353, 88904));
	}

	@Test
	void aLineAcrossTwoColumnsCoversBothAndItsMarginReachesNoFurther() {
		// lon 0 is the edge between columns 131071 and 131072 at z 18; lat 0.0003 is in
		// row
		// 131071 (its north edge is at 0.0013733 degrees: 256 cells of 0.597 m)
		var line = Wkb.WGS84
			.createLineString(new Coordinate[] { new Coordinate(-0.0003, 0.0003), new Coordinate(0.0003, 0.0003) });
		assertThat(TileCover.of(line, 2.0, 18)).containsExactly(new Tile(18, 131071, 131071),
				new Tile(18, 131072, 131071));
	}

	@Test
	void theMarginReachesIntoTheNextRow() {
		// lat 0.00001 is 1.1 m north of the equator, the edge between rows 131071 and
		// 131072:
		// a 3 m margin reaches across it
		var point = Wkb.WGS84.createPoint(new Coordinate(0.0003, 0.00001));
		assertThat(TileCover.of(point, 3.0, 18)).containsExactly(new Tile(18, 131072, 131071),
				new Tile(18, 131072, 131072));
	}

}
