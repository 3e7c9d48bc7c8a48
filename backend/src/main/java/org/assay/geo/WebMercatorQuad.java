package org.assay.geo;

import org.locationtech.jts.geom.Envelope;

/**
 * The WebMercatorQuad tile matrix set of OGC 17-083r2 (Two Dimensional Tile Matrix Set):
 * spherical Mercator (EPSG:3857) on a sphere of radius {@code a = 6378137} m, tiles of
 * 256 x 256 cells, the top-left corner at {@code (-πa, πa)}, and {@code 2^z} by
 * {@code 2^z} tiles at zoom {@code z}, counted from the west (x) and from the north (y),
 * as XYZ tile templates count them.
 *
 * <p>
 * Formulas: {@code X = a·λ}, {@code Y = a·ln tan(π/4 + φ/2)};
 * {@code cellSize(z) = 2πa / 256 / 2^z} metres of the projection (not of the ground: on
 * the ground a cell is {@code cellSize·cos φ}); {@code scaleDenominator(z) =
 * cellSize(z) / 0.00028}, the standardized rendering pixel of 0.28 mm.
 *
 * <p>
 * Limits: latitudes are clamped to ±85.0511287798° ({@code atan(sinh π)}), where the
 * square grid ends; longitudes are taken modulo nothing, so a point on the east edge
 * ({@code λ = 180°}) falls in the last column. Plain Java, no Spring types.
 */
public final class WebMercatorQuad {

	/** The side of a tile in cells (pixels). */
	public static final int TILE_SIZE = 256;

	/** The sphere radius of EPSG:3857, the WGS84 semi-major axis, metres. */
	public static final double RADIUS = 6378137.0;

	/**
	 * Half the width of the projected world: the top-left origin is (-ORIGIN, ORIGIN).
	 */
	public static final double ORIGIN = Math.PI * RADIUS;

	/** The latitude where the square grid ends, degrees: {@code atan(sinh π)}. */
	public static final double MAX_LATITUDE = Math.toDegrees(Math.atan(Math.sinh(Math.PI)));

	/** The standardized rendering pixel size, metres (OGC 17-083r2). */
	static final double RENDERING_PIXEL = 0.00028;

	private WebMercatorQuad() {
	}

	/**
	 * The size of one cell at a zoom.
	 * @param z the zoom, 0 or more
	 * @return metres of the projection per cell
	 */
	public static double cellSize(int z) {
		return 2 * ORIGIN / TILE_SIZE / (1L << z);
	}

	/**
	 * The scale denominator of a zoom, for the 0.28 mm rendering pixel.
	 * @param z the zoom
	 * @return the scale denominator
	 */
	public static double scaleDenominator(int z) {
		return cellSize(z) / RENDERING_PIXEL;
	}

	/**
	 * The number of tiles along each axis at a zoom.
	 * @param z the zoom
	 * @return {@code 2^z}
	 */
	public static long matrixSize(int z) {
		return 1L << z;
	}

	/**
	 * Whether a tile exists in the matrix.
	 * @param z the zoom
	 * @param x the column
	 * @param y the row
	 * @return whether {@code 0 <= x, y < 2^z}
	 */
	public static boolean contains(int z, long x, long y) {
		return z >= 0 && z < 31 && x >= 0 && y >= 0 && x < matrixSize(z) && y < matrixSize(z);
	}

	/**
	 * Projects a longitude.
	 * @param lon degrees
	 * @return EPSG:3857 easting, metres
	 */
	public static double easting(double lon) {
		return RADIUS * Math.toRadians(lon);
	}

	/**
	 * Projects a latitude, clamped to {@link #MAX_LATITUDE}.
	 * @param lat degrees
	 * @return EPSG:3857 northing, metres
	 */
	public static double northing(double lat) {
		double phi = Math.toRadians(Math.max(-MAX_LATITUDE, Math.min(MAX_LATITUDE, lat)));
		return RADIUS * Math.log(Math.tan(Math.PI / 4 + phi / 2));
	}

	/**
	 * The longitude of an easting.
	 * @param easting metres
	 * @return degrees
	 */
	public static double longitude(double easting) {
		return Math.toDegrees(easting / RADIUS);
	}

	/**
	 * The latitude of a northing.
	 * @param northing metres
	 * @return degrees
	 */
	public static double latitude(double northing) {
		return Math.toDegrees(2 * Math.atan(Math.exp(northing / RADIUS)) - Math.PI / 2);
	}

	/**
	 * The tile that holds a point; points on the east or south edge of the world, or
	 * beyond the latitude limit, fall in the last column or row.
	 * @param lon degrees, -180 to 180
	 * @param lat degrees
	 * @param z the zoom
	 * @return the tile
	 */
	public static Tile tileAt(double lon, double lat, int z) {
		double cells = TILE_SIZE * cellSize(z);
		long last = matrixSize(z) - 1;
		long x = (long) Math.floor((easting(lon) + ORIGIN) / cells);
		long y = (long) Math.floor((ORIGIN - northing(lat)) / cells);
		return new Tile(z, (int) Math.max(0, Math.min(last, x)), (int) Math.max(0, Math.min(last, y)));
	}

	/**
	 * A tile of the matrix.
	 *
	 * @param z the zoom
	 * @param x the column, from the west
	 * @param y the row, from the north
	 */
	public record Tile(int z, int x, int y) {

		/**
		 * The tile's extent in the projection.
		 * @return EPSG:3857 metres
		 */
		public Envelope bounds3857() {
			double side = TILE_SIZE * cellSize(this.z);
			double minX = -ORIGIN + this.x * side;
			double maxY = ORIGIN - this.y * side;
			return new Envelope(minX, minX + side, maxY - side, maxY);
		}

		/**
		 * The tile's extent in longitude and latitude.
		 * @return EPSG:4326 degrees, x longitude and y latitude
		 */
		public Envelope bounds4326() {
			Envelope m = bounds3857();
			return new Envelope(longitude(m.getMinX()), longitude(m.getMaxX()), latitude(m.getMinY()),
					latitude(m.getMaxY()));
		}

	}

}
