package org.assay.export.training;

import org.assay.geo.WebMercatorQuad;
import org.assay.geo.WebMercatorQuad.Tile;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;

/**
 * The pixel frame of one WebMercatorQuad tile (OGC 17-083r2): longitude and latitude are
 * projected to EPSG:3857 and counted in cells from the tile's top-left corner, so that
 * pixel {@code (col, row)} covers {@code [col, col + 1) x [row, row + 1)} and its centre
 * is {@code (col + 0.5, row + 0.5)}.
 *
 * <p>
 * Ground metres become pixels with the scale at the tile's central latitude {@code φc}:
 * {@code pixels = metres / (cellSize(z) · cos φc)}. Within a tile the scale varies by the
 * factor {@code cos φ / cos φc}, whose relative departure is at most about
 * {@code tan φ · Δφ / 2} for a tile spanning {@code Δφ} radians: 0.1% at zoom 12 and
 * latitude 45°, under 0.001% at zoom 18.
 */
final class TilePixels {

	private final Tile tile;

	private final double minX;

	private final double maxY;

	private final double cellSize;

	private final double metresPerPixel;

	TilePixels(Tile tile) {
		this.tile = tile;
		Envelope bounds = tile.bounds3857();
		this.minX = bounds.getMinX();
		this.maxY = bounds.getMaxY();
		this.cellSize = WebMercatorQuad.cellSize(tile.z());
		double centreLat = WebMercatorQuad.latitude((bounds.getMinY() + bounds.getMaxY()) / 2);
		this.metresPerPixel = this.cellSize * Math.cos(Math.toRadians(centreLat));
	}

	Tile tile() {
		return this.tile;
	}

	/** Ground metres per pixel at the tile's central latitude. */
	double metresPerPixel() {
		return this.metresPerPixel;
	}

	double col(double lon) {
		return (WebMercatorQuad.easting(lon) - this.minX) / this.cellSize;
	}

	double row(double lat) {
		return (this.maxY - WebMercatorQuad.northing(lat)) / this.cellSize;
	}

	/**
	 * A copy of a longitude/latitude geometry in this tile's pixel coordinates.
	 */
	Geometry toPixels(Geometry lonLat) {
		Geometry copy = lonLat.copy();
		copy.apply(new CoordinateSequenceFilter() {

			@Override
			public void filter(CoordinateSequence seq, int i) {
				Coordinate c = seq.getCoordinate(i);
				seq.setOrdinate(i, 0, col(c.x));
				seq.setOrdinate(i, 1, row(c.y));
			}

			@Override
			public boolean isDone() {
				return false;
			}

			@Override
			public boolean isGeometryChanged() {
				return true;
			}

		});
		return copy;
	}

}
