package org.assay.geo;

import java.util.ArrayList;
import java.util.List;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;

/**
 * Builds a JTS geometry from buffered coordinates once the GeoJSON type is known,
 * checking that the nesting fits the type and the counting rules of RFC 7946 section 3.1:
 * a line has two or more positions (Assay asks for two distinct ones, since a line of one
 * repeated point has no length), a linear ring has four or more and is closed. Winding
 * order is not checked: section 3.1.6 says parsers should not reject rings of either
 * winding.
 */
final class GeometryBuilder {

	private final GeometryFactory factory = Wkb.WGS84;

	private final int[] path = new int[3];

	private GeometryType type;

	private CoordinateBuffer buffer;

	private int shapeAt;

	private int positionAt;

	Geometry build(GeometryType type, CoordinateBuffer buffer) {
		this.type = type;
		this.buffer = buffer;
		this.shapeAt = 0;
		this.positionAt = 0;
		return switch (type) {
			case LINE_STRING -> line(0);
			case MULTI_LINE_STRING ->
				this.factory.createMultiLineString(parts(0, "lines", this::line).toArray(LineString[]::new));
			case POLYGON -> polygon(0);
			case MULTI_POLYGON ->
				this.factory.createMultiPolygon(parts(0, "polygons", this::polygon).toArray(Polygon[]::new));
			default -> throw new IllegalArgumentException("Not a line or polygon type: " + type);
		};
	}

	private LineString line(int level) {
		Coordinate[] points = positions(level);
		for (int i = 1; i < points.length; i++) {
			if (!points[i].equals2D(points[0])) {
				return this.factory.createLineString(points);
			}
		}
		throw fault(FeatureFault.TOO_FEW_POINTS, level, "a line needs at least 2 distinct positions but has "
				+ ((points.length == 0) ? "none" : (points.length == 1) ? "1 position" : "only 1 distinct position"));
	}

	private Polygon polygon(int level) {
		List<LinearRing> rings = parts(level, "rings", this::ring);
		LinearRing[] holes = rings.subList(1, rings.size()).toArray(LinearRing[]::new);
		return this.factory.createPolygon(rings.get(0), holes);
	}

	private LinearRing ring(int level) {
		Coordinate[] points = positions(level);
		if (points.length < 4) {
			throw fault(FeatureFault.TOO_FEW_POINTS, level,
					"a ring needs at least 4 positions, the last repeating the first, but has " + points.length);
		}
		Coordinate first = points[0];
		Coordinate last = points[points.length - 1];
		if (!first.equals2D(last)) {
			throw fault(FeatureFault.UNCLOSED_RING, level,
					"the ring is not closed: it starts at " + text(first) + " but ends at " + text(last));
		}
		return this.factory.createLinearRing(points);
	}

	/** Reads an array of parts at {@code level}, each read by {@code part}. */
	private <T> List<T> parts(int level, String what, PartReader<T> part) {
		open(level, what);
		List<T> parts = new ArrayList<>();
		while (this.buffer.shape(this.shapeAt) != CoordinateBuffer.CLOSE) {
			this.path[level] = parts.size();
			parts.add(part.read(level + 1));
		}
		this.shapeAt++;
		if (parts.isEmpty()) {
			throw fault(FeatureFault.TOO_FEW_POINTS, level, "the " + this.type.jsonName() + " has no " + what);
		}
		return parts;
	}

	private Coordinate[] positions(int level) {
		open(level, "positions");
		// counted first, so the array is made once at its size
		int count = 0;
		while (this.buffer.shape(this.shapeAt + count) == CoordinateBuffer.POSITION) {
			count++;
		}
		if (this.buffer.shape(this.shapeAt + count) != CoordinateBuffer.CLOSE) {
			this.path[level] = count;
			throw fault(FeatureFault.BAD_POSITION, level + 1,
					"found an array of arrays where a position was expected; the coordinates nest too deeply for a "
							+ this.type.jsonName());
		}
		Coordinate[] points = new Coordinate[count];
		for (int i = 0; i < count; i++) {
			points[i] = new Coordinate(this.buffer.x(this.positionAt), this.buffer.y(this.positionAt));
			this.positionAt++;
		}
		this.shapeAt += count + 1;
		return points;
	}

	private void open(int level, String what) {
		if (this.buffer.shape(this.shapeAt) != CoordinateBuffer.OPEN) {
			throw fault(FeatureFault.BAD_POSITION, level, "found a single position where an array of " + what
					+ " was expected; the coordinates nest too shallowly for a " + this.type.jsonName());
		}
		this.shapeAt++;
	}

	private GeometryFault fault(FeatureFault fault, int level, String detail) {
		String where = this.type.describe(this.path, level);
		return new GeometryFault(fault, where.isEmpty() ? detail : where + ": " + detail);
	}

	static String text(Coordinate point) {
		return "(" + point.x + ", " + point.y + ")";
	}

	@FunctionalInterface
	private interface PartReader<T> {

		T read(int level);

	}

}
