package org.assay.geo;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;

/**
 * Lengths and areas on the WGS84 ellipsoid, and representative points.
 *
 * <p>
 * STUB: to be implemented with GeographicLib.
 */
public final class GeodesicMeasures {

	private GeodesicMeasures() {
	}

	/**
	 * The geodesic length of the lines of a geometry (for polygons, of their rings).
	 * @param geometry a lon/lat geometry
	 * @return metres
	 */
	public static double lengthMetres(Geometry geometry) {
		throw new UnsupportedOperationException("not yet");
	}

	/**
	 * The geodesic area of the polygons of a geometry (0 for lines).
	 * @param geometry a lon/lat geometry
	 * @return square metres
	 */
	public static double areaSquareMetres(Geometry geometry) {
		throw new UnsupportedOperationException("not yet");
	}

	/**
	 * The point that stands for a geometry when it must be put in exactly one place: for
	 * lines the middle vertex of the longest part, for polygons an interior point.
	 * @param geometry a lon/lat geometry
	 * @return the point
	 */
	public static Coordinate representativePoint(Geometry geometry) {
		throw new UnsupportedOperationException("not yet");
	}

}
