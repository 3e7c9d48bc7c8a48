package org.assay.imagery;

import java.awt.geom.Path2D;

import org.assay.geo.WebMercatorQuad;
import org.assay.geo.WebMercatorQuad.Tile;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

/**
 * The pixel frame of one tile: longitude and latitude to pixels (x east, y south, the
 * top-left corner of the tile at 0,0), and JTS geometries to java.awt paths.
 */
final class TileFrame {

	final Tile tile;

	/** Metres of the projection per pixel. */
	final double cellSize;

	/**
	 * Metres on the ground per pixel at the tile's centre: cellSize times cos(latitude).
	 */
	final double groundResolution;

	private final double minX;

	private final double maxY;

	TileFrame(Tile tile) {
		this.tile = tile;
		Envelope bounds = tile.bounds3857();
		this.minX = bounds.getMinX();
		this.maxY = bounds.getMaxY();
		this.cellSize = WebMercatorQuad.cellSize(tile.z());
		double centreLat = WebMercatorQuad.latitude(bounds.centre().y);
		this.groundResolution = this.cellSize * Math.cos(Math.toRadians(centreLat));
	}

	double px(double lon) {
		return (WebMercatorQuad.easting(lon) - this.minX) / this.cellSize;
	}

	double py(double lat) {
		return (this.maxY - WebMercatorQuad.northing(lat)) / this.cellSize;
	}

	/** The projected easting of the centre of a pixel column. */
	double eastingOf(int column) {
		return this.minX + (column + 0.5) * this.cellSize;
	}

	/** The projected northing of the centre of a pixel row. */
	double northingOf(int row) {
		return this.maxY - (row + 0.5) * this.cellSize;
	}

	/** A length on the ground in pixels. */
	double pixels(double metres) {
		return metres / this.groundResolution;
	}

	/** The tile's extent in degrees, grown by a margin in metres on the ground. */
	Envelope searchEnvelope(double marginMetres) {
		Envelope degrees = this.tile.bounds4326();
		double lat = Math.toRadians(degrees.centre().y);
		double dLat = marginMetres / 111_000.0;
		degrees.expandBy(dLat / Math.max(0.01, Math.cos(lat)), dLat);
		return degrees;
	}

	/**
	 * A line as an open path, or every ring of a polygon as closed sub-paths (even-odd).
	 */
	Path2D path(Geometry geometry) {
		Path2D.Double path = new Path2D.Double(Path2D.WIND_EVEN_ODD);
		for (int i = 0; i < geometry.getNumGeometries(); i++) {
			Geometry part = geometry.getGeometryN(i);
			if (part instanceof Polygon polygon) {
				append(path, polygon.getExteriorRing().getCoordinates(), true);
				for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
					append(path, polygon.getInteriorRingN(h).getCoordinates(), true);
				}
			}
			else if (part instanceof LineString line) {
				append(path, line.getCoordinates(), false);
			}
		}
		return path;
	}

	private void append(Path2D.Double path, Coordinate[] coordinates, boolean close) {
		for (int i = 0; i < coordinates.length; i++) {
			double x = px(coordinates[i].x);
			double y = py(coordinates[i].y);
			if (i == 0) {
				path.moveTo(x, y);
			}
			else {
				path.lineTo(x, y);
			}
		}
		if (close) {
			path.closePath();
		}
	}

}
