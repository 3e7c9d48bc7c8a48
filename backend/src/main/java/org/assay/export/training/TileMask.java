package org.assay.export.training;

import java.util.Arrays;

import org.assay.geo.WebMercatorQuad;
import org.assay.geo.WebMercatorQuad.Tile;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Lineal;
import org.locationtech.jts.geom.Polygonal;

/**
 * A label mask of one WebMercatorQuad tile: 256 x 256 pixels, each 0 (nothing) or 255
 * (the labelled geometry), written as a single-band 8-bit greyscale PNG
 * ({@link GreyPng}).
 *
 * <p>
 * A road is widened to its width in ground metres (half the width on each side, round
 * caps and joins: the pixel centres within half the width of its centre line) and an area
 * is taken as it is; a pixel is marked when its centre lies inside, for areas by the
 * even-odd rule, so holes stay unmarked. This is the usual "pixel centre" rule of polygon
 * rasterisers (common practice): a band of width {@code w} pixels across the tile marks
 * {@code round(w)} rows, give or take one where its edges meet pixel centres.
 *
 * <pre>
 * TileMask mask = new TileMask(WebMercatorQuad.tileAt(lon, lat, 18));
 * mask.addRoad(line, 6.0);
 * byte[] png = mask.png();
 * </pre>
 */
final class TileMask {

	static final int SIZE = WebMercatorQuad.TILE_SIZE;

	private final TilePixels frame;

	private final byte[] pixels = new byte[SIZE * SIZE];

	private int marked;

	TileMask(Tile tile) {
		this.frame = new TilePixels(tile);
	}

	Tile tile() {
		return this.frame.tile();
	}

	/**
	 * Marks a road: a lineal geometry in longitude/latitude, widened to a width. The road
	 * covers the pixels whose centres lie within half the width of its centre line, which
	 * is its buffer with round caps and joins, drawn exactly: each segment marks the
	 * pixel centres within that distance of it.
	 * @param lonLat LineString or MultiLineString
	 * @param widthMetres the road's width on the ground, more than 0
	 * @return whether the road covers a pixel of this tile, marked before or not
	 */
	boolean addRoad(Geometry lonLat, double widthMetres) {
		if (!(lonLat instanceof Lineal)) {
			throw new IllegalArgumentException("a road is a LineString or MultiLineString");
		}
		if (!(widthMetres > 0)) {
			throw new IllegalArgumentException("the road width must be more than 0 m");
		}
		double r = widthMetres / 2 / this.frame.metresPerPixel();
		Envelope box = lonLat.getEnvelopeInternal();
		double west = this.frame.col(box.getMinX());
		double east = this.frame.col(box.getMaxX());
		double north = this.frame.row(box.getMaxY());
		double south = this.frame.row(box.getMinY());
		if (east < -r || west > SIZE + r || south < -r || north > SIZE + r) {
			return false;
		}
		boolean covered = false;
		for (int i = 0; i < lonLat.getNumGeometries(); i++) {
			Coordinate[] line = lonLat.getGeometryN(i).getCoordinates();
			if (line.length == 0) {
				continue;
			}
			double ax = this.frame.col(line[0].x);
			double ay = this.frame.row(line[0].y);
			if (line.length == 1) {
				covered |= markCapsule(ax, ay, ax, ay, r);
			}
			for (int k = 1; k < line.length; k++) {
				double bx = this.frame.col(line[k].x);
				double by = this.frame.row(line[k].y);
				covered |= markCapsule(ax, ay, bx, by, r);
				ax = bx;
				ay = by;
			}
		}
		return covered;
	}

	/**
	 * Marks an area: a polygonal geometry in longitude/latitude.
	 * @param lonLat Polygon or MultiPolygon
	 * @return whether the area covers a pixel of this tile, marked before or not
	 */
	boolean addArea(Geometry lonLat) {
		if (!(lonLat instanceof Polygonal)) {
			throw new IllegalArgumentException("an area is a Polygon or MultiPolygon");
		}
		return fill(this.frame.toPixels(lonLat)) > 0;
	}

	/** The number of marked pixels. */
	int count() {
		return this.marked;
	}

	/** Whether a pixel is marked. */
	boolean isMarked(int col, int row) {
		return this.pixels[row * SIZE + col] != 0;
	}

	/**
	 * The mask as a PNG: one 8-bit grey band, 0 or 255.
	 * @return the PNG file's bytes
	 */
	byte[] png() {
		return GreyPng.encode(this.pixels, SIZE, SIZE);
	}

	/**
	 * Marks the pixels whose centres lie within {@code r} of the segment from {@code a}
	 * to {@code b} (pixel coordinates).
	 * @return whether the segment covers a pixel
	 */
	private boolean markCapsule(double ax, double ay, double bx, double by, double r) {
		int firstCol = Math.max(0, (int) Math.ceil(Math.min(ax, bx) - r - 0.5));
		int lastCol = Math.min(SIZE - 1, (int) Math.floor(Math.max(ax, bx) + r - 0.5));
		int firstRow = Math.max(0, (int) Math.ceil(Math.min(ay, by) - r - 0.5));
		int lastRow = Math.min(SIZE - 1, (int) Math.floor(Math.max(ay, by) + r - 0.5));
		double dx = bx - ax;
		double dy = by - ay;
		double length2 = dx * dx + dy * dy;
		double r2 = r * r;
		boolean covered = false;
		for (int row = firstRow; row <= lastRow; row++) {
			double py = row + 0.5 - ay;
			for (int col = firstCol; col <= lastCol; col++) {
				double px = col + 0.5 - ax;
				// the nearest point of the segment: a + t (b - a), t clamped to [0, 1]
				double t = (length2 > 0) ? Math.max(0, Math.min(1, (px * dx + py * dy) / length2)) : 0;
				double ex = px - t * dx;
				double ey = py - t * dy;
				if (ex * ex + ey * ey <= r2) {
					covered = true;
					int at = row * SIZE + col;
					if (this.pixels[at] == 0) {
						this.pixels[at] = (byte) 255;
						this.marked++;
					}
				}
			}
		}
		return covered;
	}

	private int fill(Geometry area) {
		Envelope box = area.getEnvelopeInternal();
		if (area.isEmpty() || box.getMaxX() < 0 || box.getMaxY() < 0 || box.getMinX() > SIZE || box.getMinY() > SIZE) {
			return 0;
		}
		int covered = 0;
		EdgeList edges = EdgeList.of(area);
		int firstRow = Math.max(0, (int) Math.floor(box.getMinY() - 0.5));
		int lastRow = Math.min(SIZE - 1, (int) Math.ceil(box.getMaxY()));
		double[] crossings = new double[16];
		for (int row = firstRow; row <= lastRow; row++) {
			double y = row + 0.5;
			int n = edges.crossings(y, crossings);
			if (n > crossings.length) {
				crossings = new double[n];
				edges.crossings(y, crossings);
			}
			Arrays.sort(crossings, 0, n);
			for (int k = 0; k + 1 < n; k += 2) {
				covered += markSpan(row, crossings[k], crossings[k + 1]);
			}
		}
		return covered;
	}

	/**
	 * Marks the pixels of a row whose centres lie in {@code [from, to)}.
	 * @return how many pixels the span covers
	 */
	private int markSpan(int row, double from, double to) {
		int first = Math.max(0, (int) Math.ceil(from - 0.5));
		int last = Math.min(SIZE - 1, (int) Math.ceil(to - 0.5) - 1);
		for (int col = first; col <= last; col++) {
			int at = row * SIZE + col;
			if (this.pixels[at] == 0) {
				this.pixels[at] = (byte) 255;
				this.marked++;
			}
		}
		return Math.max(0, last - first + 1);
	}

}
