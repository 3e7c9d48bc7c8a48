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
 *
 * <p>
 * Short segments, the usual case for drafted roads, are measured in the plane tangent at
 * their middle latitude instead, which costs a small fraction of the full solution: with
 * the meridional radius of curvature M and the normal radius N of the WGS84 ellipsoid at
 * the middle latitude, the length is the hypotenuse of {@code M * dLat} and
 * {@code N * cos(lat) * dLon} (the mid-latitude formula; M and N as in Snyder, J.P.
 * (1987), Map Projections: A Working Manual, USGS Professional Paper 1395, chapter 4).
 * Its error grows with the cube of the segment's size; a segment counts as short when
 * both its latitude and its longitude span at most {@value #SHORT_DEGREES} degrees (555 m
 * of latitude), and then it is within one micrometre of the geodesic: compared with
 * GeographicLib over two million random short segments at all latitudes, the largest
 * difference was 0.54 micrometres, near the poles (GeodesicMeasuresTests checks it).
 */
public final class GeodesicMeasures {

	private static final Geodesic WGS84 = Geodesic.WGS84;

	/** Largest latitude or longitude span of a segment measured in the tangent plane. */
	static final double SHORT_DEGREES = 0.005;

	// WGS84 (NIMA TR8350.2): a = 6378137 m, f = 1 / 298.257223563, e^2 = f (2 - f)
	private static final double A = 6378137;

	private static final double E2 = (1 / 298.257223563) * (2 - 1 / 298.257223563);

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
			total += segment(points.getY(i - 1), points.getX(i - 1), points.getY(i), points.getX(i));
		}
		return total;
	}

	/**
	 * The geodesic distance between two positions: in the tangent plane when the segment
	 * is short, else by the full solution.
	 */
	static double segment(double lat1, double lon1, double lat2, double lon2) {
		double dLat = lat2 - lat1;
		double dLon = lon2 - lon1;
		if (Math.abs(dLat) > SHORT_DEGREES || Math.abs(dLon) > SHORT_DEGREES) {
			return WGS84.Inverse(lat1, lon1, lat2, lon2, GeodesicMask.DISTANCE).s12;
		}
		double middle = Math.toRadians((lat1 + lat2) / 2);
		double sin = Math.sin(middle);
		double cos = Math.cos(middle);
		double w2 = 1 - E2 * sin * sin;
		double w = Math.sqrt(w2);
		double normal = A / w;
		double meridional = A * (1 - E2) / (w2 * w);
		double east = normal * cos * Math.toRadians(dLon);
		double north = meridional * Math.toRadians(dLat);
		return Math.sqrt(east * east + north * north);
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
