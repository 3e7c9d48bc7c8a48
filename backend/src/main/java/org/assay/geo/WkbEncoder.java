package org.assay.geo;

import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteOrder;

import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.MultiLineString;
import org.locationtech.jts.geom.MultiPolygon;
import org.locationtech.jts.geom.Polygon;

/**
 * Encodes the geometries of drafts (lines, polygons and their multi forms, not empty) as
 * two-dimensional big-endian WKB (OGC Simple Features Access 1.2.1, section 8.2), byte
 * for byte as JTS's {@code WKBWriter(2)} does, into one array of the exact size. The
 * upload encodes every draft, and JTS's writer passes each ordinate through a stream and
 * copies the result; this does neither. Other geometries are left to JTS.
 */
final class WkbEncoder {

	private static final VarHandle INT = MethodHandles.byteArrayViewVarHandle(int[].class, ByteOrder.BIG_ENDIAN);

	private static final VarHandle LONG = MethodHandles.byteArrayViewVarHandle(long[].class, ByteOrder.BIG_ENDIAN);

	// byte order marker 0 (big-endian, "XDR") and the geometry type codes of section
	// 8.2.3
	private static final byte BIG_ENDIAN = 0;

	private static final int LINE_STRING = 2;

	private static final int POLYGON = 3;

	private static final int MULTI_LINE_STRING = 5;

	private static final int MULTI_POLYGON = 6;

	private byte[] bytes;

	private int at;

	private WkbEncoder() {
	}

	/**
	 * Encodes a geometry, if it is of a kind this encoder knows.
	 * @param geometry the geometry
	 * @return the WKB, or {@code null} for points, collections and empty geometries
	 */
	static byte[] encode(Geometry geometry) {
		int size = size(geometry);
		if (size < 0) {
			return null;
		}
		WkbEncoder encoder = new WkbEncoder();
		encoder.bytes = new byte[size];
		encoder.write(geometry);
		return encoder.bytes;
	}

	/** The encoded size, or -1 when not known here. */
	private static int size(Geometry geometry) {
		if (geometry.isEmpty()) {
			return -1;
		}
		if (geometry instanceof LineString line) {
			return 9 + 16 * line.getNumPoints();
		}
		if (geometry instanceof Polygon polygon) {
			int size = 9 + 4 + 16 * polygon.getExteriorRing().getNumPoints();
			for (int i = 0; i < polygon.getNumInteriorRing(); i++) {
				size += 4 + 16 * polygon.getInteriorRingN(i).getNumPoints();
			}
			return size;
		}
		if (geometry instanceof MultiLineString || geometry instanceof MultiPolygon) {
			int size = 9;
			for (int i = 0; i < geometry.getNumGeometries(); i++) {
				int part = size(geometry.getGeometryN(i));
				if (part < 0) {
					return -1;
				}
				size += part;
			}
			return size;
		}
		return -1;
	}

	private void write(Geometry geometry) {
		if (geometry instanceof LineString line) {
			header(LINE_STRING);
			sequence(line.getCoordinateSequence());
		}
		else if (geometry instanceof Polygon polygon) {
			header(POLYGON);
			integer(1 + polygon.getNumInteriorRing());
			sequence(polygon.getExteriorRing().getCoordinateSequence());
			for (int i = 0; i < polygon.getNumInteriorRing(); i++) {
				sequence(polygon.getInteriorRingN(i).getCoordinateSequence());
			}
		}
		else {
			header((geometry instanceof MultiLineString) ? MULTI_LINE_STRING : MULTI_POLYGON);
			integer(geometry.getNumGeometries());
			for (int i = 0; i < geometry.getNumGeometries(); i++) {
				write(geometry.getGeometryN(i));
			}
		}
	}

	private void header(int type) {
		this.bytes[this.at++] = BIG_ENDIAN;
		integer(type);
	}

	private void sequence(CoordinateSequence points) {
		int n = points.size();
		integer(n);
		for (int i = 0; i < n; i++) {
			// doubleToLongBits, as JTS: every NaN written the same way
			LONG.set(this.bytes, this.at, Double.doubleToLongBits(points.getX(i)));
			LONG.set(this.bytes, this.at + 8, Double.doubleToLongBits(points.getY(i)));
			this.at += 16;
		}
	}

	private void integer(int value) {
		INT.set(this.bytes, this.at, value);
		this.at += 4;
	}

}
