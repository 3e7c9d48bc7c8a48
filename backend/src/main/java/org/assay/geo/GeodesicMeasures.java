package org.assay.geo;

import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicMask;
import net.sf.geographiclib.PolygonArea;
import org.locationtech.jts.algorithm.InteriorPoint;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryCollection;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.Polygonal;

/**
 * Lengths and areas on the WGS84 ellipsoid, and representative points.
 *
 * <p>
 * Lengths and areas follow Karney, C.F.F. (2013), Algorithms for geodesics, Journal of
 * Geodesy 87:43-55, as implemented by GeographicLib: each segment is the geodesic (the
 * shortest path on the ellipsoid) between its end positions, accurate to about 15
 * nanometres; areas are those of the polygons bounded by such geodesics. Coordinates are
 * longitude (x) and latitude (y) in degrees; altitude is ignored.
 */
public final class GeodesicMeasures {

	private static final Geodesic WGS84 = Geodesic.WGS84;

	private GeodesicMeasures() {
	}

	/**
	 * The geodesic length of the lines of a geometry (for polygons, of their rings, holes
	 * included, so the perimeter). Points have no length.
	 * @param geometry a lon/lat geometry
	 * @return metres
	 */
	public static double lengthMetres(Geometry geometry) {
		double total = 0;
		for (int i = 0; i < geometry.getNumGeometries(); i++) {
			Geometry part = geometry.getGeometryN(i);
			if (part instanceof GeometryCollection nested) {
				total += lengthMetres(nested);
			}
			else if (part instanceof LineString line) {
				total += length(line.getCoordinateSequence());
			}
			else if (part instanceof Polygon polygon) {
				total += length(polygon.getExteriorRing().getCoordinateSequence());
				for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
					total += length(polygon.getInteriorRingN(h).getCoordinateSequence());
				}
			}
		}
		return total;
	}

	private static double length(CoordinateSequence points) {
		double total = 0;
		for (int i = 1; i < points.size(); i++) {
			total += WGS84.Inverse(points.getY(i - 1), points.getX(i - 1), points.getY(i), points.getX(i),
					GeodesicMask.DISTANCE).s12;
		}
		return total;
	}

	/**
	 * The geodesic area of the polygons of a geometry, holes subtracted (0 for lines and
	 * points). Rings of either winding give the same, positive, area.
	 * @param geometry a lon/lat geometry
	 * @return square metres
	 */
	public static double areaSquareMetres(Geometry geometry) {
		double total = 0;
		for (int i = 0; i < geometry.getNumGeometries(); i++) {
			Geometry part = geometry.getGeometryN(i);
			if (part instanceof GeometryCollection nested) {
				total += areaSquareMetres(nested);
			}
			else if (part instanceof Polygon polygon) {
				total += ringArea(polygon.getExteriorRing().getCoordinateSequence());
				for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
					total -= ringArea(polygon.getInteriorRingN(h).getCoordinateSequence());
				}
			}
		}
		return total;
	}

	/**
	 * The area inside one ring. The signed result is used and its sign dropped: the
	 * unsigned one of GeographicLib would read a clockwise ring as enclosing the rest of
	 * the earth.
	 */
	private static double ringArea(CoordinateSequence ring) {
		if (ring.size() < 4) {
			return 0;
		}
		PolygonArea area = new PolygonArea(WGS84, false);
		// PolygonArea closes the ring itself, so the repeated last position is left out
		for (int i = 0; i < ring.size() - 1; i++) {
			area.AddPoint(ring.getY(i), ring.getX(i));
		}
		return Math.abs(area.Compute(false, true).area);
	}

	/**
	 * The point that stands for a geometry when it must be put in exactly one place.
	 * <ul>
	 * <li>Lines: the middle vertex of the longest part, where the longest part is the one
	 * with the most vertices (the first of equals) and the middle vertex is the one at
	 * index {@code n / 2} of its {@code n} vertices. A vertex, not an interpolated point,
	 * so that it lies on the drawn line exactly and needs no geodesic arithmetic.</li>
	 * <li>Polygons: an interior point (JTS {@link InteriorPoint}), which lies inside the
	 * polygon even when the centroid does not, as for a U-shaped building.</li>
	 * <li>Points: the first point.</li>
	 * </ul>
	 * @param geometry a lon/lat geometry
	 * @return the point
	 * @throws IllegalArgumentException when the geometry is empty
	 */
	public static Coordinate representativePoint(Geometry geometry) {
		if (geometry.isEmpty()) {
			throw new IllegalArgumentException("An empty geometry has no representative point");
		}
		if (geometry instanceof Polygonal) {
			return InteriorPoint.getInteriorPoint(geometry);
		}
		if (geometry.getDimension() == 0) {
			return geometry.getCoordinate().copy();
		}
		LineString longest = null;
		for (int i = 0; i < geometry.getNumGeometries(); i++) {
			if (geometry.getGeometryN(i) instanceof LineString line
					&& (longest == null || line.getNumPoints() > longest.getNumPoints())) {
				longest = line;
			}
		}
		if (longest == null) {
			// a mixed collection: its interior point is the best single place
			return InteriorPoint.getInteriorPoint(geometry);
		}
		return longest.getCoordinateN(longest.getNumPoints() / 2).copy();
	}

}
