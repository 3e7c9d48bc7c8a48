package org.assay.geo;

import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.PrecisionModel;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKBReader;
import org.locationtech.jts.io.WKBWriter;

/**
 * Well-known binary coding of geometries, as stored in {@code bytea} columns. Two
 * dimensions, big-endian, SRID 4326 on read. Lines and polygons are written by
 * {@link WkbEncoder}, everything else by JTS; the bytes are the same.
 */
public final class Wkb {

	/** The factory for all WGS84 longitude/latitude geometries of Assay. */
	public static final GeometryFactory WGS84 = new GeometryFactory(new PrecisionModel(), 4326);

	private static final ThreadLocal<WKBWriter> WRITER = ThreadLocal.withInitial(() -> new WKBWriter(2));

	private static final ThreadLocal<WKBReader> READER = ThreadLocal.withInitial(() -> new WKBReader(WGS84));

	private Wkb() {
	}

	/**
	 * Encodes a geometry.
	 * @param geometry the geometry
	 * @return its WKB bytes
	 */
	public static byte[] write(Geometry geometry) {
		byte[] bytes = WkbEncoder.encode(geometry);
		return (bytes != null) ? bytes : WRITER.get().write(geometry);
	}

	/**
	 * Decodes a geometry.
	 * @param bytes WKB bytes written by {@link #write(Geometry)}
	 * @return the geometry
	 * @throws IllegalArgumentException when the bytes are not WKB
	 */
	public static Geometry read(byte[] bytes) {
		try {
			return READER.get().read(bytes);
		}
		catch (ParseException ex) {
			throw new IllegalArgumentException("Stored geometry is not WKB", ex);
		}
	}

}
