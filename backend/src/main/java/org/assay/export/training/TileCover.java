package org.assay.export.training;

import java.util.ArrayList;
import java.util.List;

import org.assay.geo.WebMercatorQuad;
import org.assay.geo.WebMercatorQuad.Tile;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;

/**
 * The tiles of one zoom that a geometry, widened by a margin, may touch: those that meet
 * its bounding box. A mask of such a tile may still come out empty (a diagonal road
 * passes a box's corner tiles by); the caller drops those.
 */
final class TileCover {

	/**
	 * Metres of latitude per degree, on the low side, so that margins never fall short.
	 */
	private static final double METRES_PER_DEGREE = 110_000;

	private TileCover() {
	}

	/**
	 * The tiles under a geometry's box.
	 * @param lonLat the geometry, WGS84 longitude/latitude
	 * @param marginMetres how far beyond the geometry to reach (half a road's width)
	 * @param z the zoom
	 * @return the tiles, row by row from the north-west
	 */
	static List<Tile> of(Geometry lonLat, double marginMetres, int z) {
		Envelope box = lonLat.getEnvelopeInternal();
		double dLat = marginMetres / METRES_PER_DEGREE;
		double cos = Math.cos(Math.toRadians(Math.min(WebMercatorQuad.MAX_LATITUDE,
				Math.max(Math.abs(box.getMinY()), Math.abs(box.getMaxY())) + dLat)));
		double dLon = dLat / Math.max(cos, 1e-6);
		Tile northWest = WebMercatorQuad.tileAt(Math.max(-180, box.getMinX() - dLon), box.getMaxY() + dLat, z);
		Tile southEast = WebMercatorQuad.tileAt(Math.min(180, box.getMaxX() + dLon), box.getMinY() - dLat, z);
		List<Tile> tiles = new ArrayList<>();
		for (int y = northWest.y(); y <= southEast.y(); y++) {
			for (int x = northWest.x(); x <= southEast.x(); x++) {
				tiles.add(new Tile(z, x, y));
			}
		}
		return tiles;
	}

}
