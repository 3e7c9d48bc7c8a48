package org.assay.demo;

import org.assay.geo.Wkb;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.MultiPolygon;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.PrecisionModel;

/**
 * A local metric frame around the island: metres east ({@code x}) and north ({@code y})
 * of an origin, by the equirectangular projection tangent at the origin with the WGS84
 * radii of curvature there: the meridional radius {@code M = a(1-e²)/(1-e²sin²φ0)^1.5}
 * north-south and the parallel radius {@code N cos φ0} east-west, where
 * {@code N = a/√(1-e²sin²φ0)} (for example Snyder, <em>Map Projections: A Working
 * Manual</em>, USGS 1987, p. 25 and 90).
 *
 * <p>
 * Error bound: the east-west scale drifts as {@code cos φ / cos φ0}, that is by about
 * {@code tan φ0 · Δφ}; at latitude 40.9° and within ±5 km of the origin that is under
 * 0.07%, so a 10 m distance is off by less than 1 cm and a 12 km one by less than 9 m.
 * The north-south scale error is smaller still. Good for the island, not for far away.
 *
 * <p>
 * Conversion to WGS84 rounds every coordinate to 7 decimals (about 1 cm), as the demo
 * files are written, and winds polygon shells counter-clockwise as RFC 7946 asks.
 */
final class LocalFrame {

	/** The factory of metric geometries: plain metres, no SRID. */
	static final GeometryFactory METRES = new GeometryFactory(new PrecisionModel(), 0);

	private static final double SEMI_MAJOR_AXIS = 6378137.0;

	private static final double FLATTENING = 1 / 298.257223563;

	private static final double E2 = FLATTENING * (2 - FLATTENING);

	private static final double DECIMALS_7 = 1e7;

	private final double lon0;

	private final double lat0;

	private final double metresPerDegreeLon;

	private final double metresPerDegreeLat;

	LocalFrame(double lon0, double lat0) {
		this.lon0 = lon0;
		this.lat0 = lat0;
		double sin = StrictMath.sin(Math.toRadians(lat0));
		double w = 1 - E2 * sin * sin;
		double meridional = SEMI_MAJOR_AXIS * (1 - E2) / (w * Math.sqrt(w));
		double primeVertical = SEMI_MAJOR_AXIS / Math.sqrt(w);
		this.metresPerDegreeLat = meridional * Math.PI / 180;
		this.metresPerDegreeLon = primeVertical * StrictMath.cos(Math.toRadians(lat0)) * Math.PI / 180;
	}

	double lon(double x) {
		return this.lon0 + x / this.metresPerDegreeLon;
	}

	double lat(double y) {
		return this.lat0 + y / this.metresPerDegreeLat;
	}

	double x(double lon) {
		return (lon - this.lon0) * this.metresPerDegreeLon;
	}

	double y(double lat) {
		return (lat - this.lat0) * this.metresPerDegreeLat;
	}

	/**
	 * Converts a metric geometry to WGS84 longitude/latitude, rounded to 7 decimals.
	 * @param metric a geometry in this frame
	 * @return a new geometry of {@link Wkb#WGS84}
	 */
	Geometry toWgs84(Geometry metric) {
		Geometry copy = Wkb.WGS84.createGeometry(metric);
		copy.apply(new Mapping(true));
		return counterClockwise(copy);
	}

	/**
	 * Converts a WGS84 geometry into this frame.
	 * @param wgs84 a longitude/latitude geometry
	 * @return a new metric geometry
	 */
	Geometry toMetres(Geometry wgs84) {
		Geometry copy = METRES.createGeometry(wgs84);
		copy.apply(new Mapping(false));
		return copy;
	}

	static double round7(double value) {
		return Math.round(value * DECIMALS_7) / DECIMALS_7;
	}

	private static Geometry counterClockwise(Geometry geometry) {
		if (geometry instanceof Polygon polygon) {
			return counterClockwise(polygon);
		}
		if (geometry instanceof MultiPolygon multi) {
			Polygon[] parts = new Polygon[multi.getNumGeometries()];
			for (int i = 0; i < parts.length; i++) {
				parts[i] = counterClockwise((Polygon) multi.getGeometryN(i));
			}
			return multi.getFactory().createMultiPolygon(parts);
		}
		return geometry;
	}

	private static Polygon counterClockwise(Polygon polygon) {
		LinearRing shell = wind(polygon.getExteriorRing(), true);
		LinearRing[] holes = new LinearRing[polygon.getNumInteriorRing()];
		for (int i = 0; i < holes.length; i++) {
			holes[i] = wind(polygon.getInteriorRingN(i), false);
		}
		return polygon.getFactory().createPolygon(shell, holes);
	}

	private static LinearRing wind(LinearRing ring, boolean ccw) {
		boolean isCcw = Orientation.isCCW(ring.getCoordinateSequence());
		return (isCcw == ccw) ? ring : ring.reverse();
	}

	private final class Mapping implements CoordinateSequenceFilter {

		private final boolean toWgs84;

		Mapping(boolean toWgs84) {
			this.toWgs84 = toWgs84;
		}

		@Override
		public void filter(CoordinateSequence seq, int i) {
			double a = seq.getX(i);
			double b = seq.getY(i);
			if (this.toWgs84) {
				seq.setOrdinate(i, 0, round7(lon(a)));
				seq.setOrdinate(i, 1, round7(lat(b)));
			}
			else {
				seq.setOrdinate(i, 0, x(a));
				seq.setOrdinate(i, 1, y(b));
			}
		}

		@Override
		public boolean isDone() {
			return false;
		}

		@Override
		public boolean isGeometryChanged() {
			return true;
		}

	}

}
