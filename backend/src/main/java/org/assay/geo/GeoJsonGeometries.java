package org.assay.geo;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;
import tools.jackson.core.JsonGenerator;

/**
 * Writes JTS geometries as RFC 7946 GeoJSON geometry objects: to a streaming generator
 * for exports, or to plain maps for small API responses. Two dimensions; coordinates as
 * stored (no rounding), since exports must give back what validators approved.
 */
public final class GeoJsonGeometries {

	private GeoJsonGeometries() {
	}

	/**
	 * Writes a geometry object.
	 * @param out the generator, positioned where a value may be written
	 * @param geometry a Point, LineString, Polygon or their Multi forms
	 */
	public static void write(JsonGenerator out, Geometry geometry) {
		out.writeStartObject();
		out.writeStringProperty("type", geometry.getGeometryType());
		out.writeName("coordinates");
		writeCoordinates(out, geometry);
		out.writeEndObject();
	}

	private static void writeCoordinates(JsonGenerator out, Geometry geometry) {
		if (geometry instanceof Point point) {
			writePosition(out, point.getCoordinate());
		}
		else if (geometry instanceof LineString line) {
			writePositions(out, line.getCoordinates());
		}
		else if (geometry instanceof Polygon polygon) {
			out.writeStartArray();
			writePositions(out, polygon.getExteriorRing().getCoordinates());
			for (int i = 0; i < polygon.getNumInteriorRing(); i++) {
				writePositions(out, polygon.getInteriorRingN(i).getCoordinates());
			}
			out.writeEndArray();
		}
		else {
			out.writeStartArray();
			for (int i = 0; i < geometry.getNumGeometries(); i++) {
				writeCoordinates(out, geometry.getGeometryN(i));
			}
			out.writeEndArray();
		}
	}

	private static void writePositions(JsonGenerator out, Coordinate[] coordinates) {
		out.writeStartArray();
		for (Coordinate coordinate : coordinates) {
			writePosition(out, coordinate);
		}
		out.writeEndArray();
	}

	private static void writePosition(JsonGenerator out, Coordinate coordinate) {
		out.writeStartArray();
		out.writeNumber(coordinate.x);
		out.writeNumber(coordinate.y);
		out.writeEndArray();
	}

	/**
	 * A geometry as nested maps and lists, for JSON serialisation of small responses.
	 * @param geometry the geometry
	 * @return the GeoJSON geometry object
	 */
	public static Map<String, Object> toMap(Geometry geometry) {
		Map<String, Object> map = new LinkedHashMap<>();
		map.put("type", geometry.getGeometryType());
		map.put("coordinates", coordinates(geometry));
		return map;
	}

	private static Object coordinates(Geometry geometry) {
		if (geometry instanceof Point point) {
			return position(point.getCoordinate());
		}
		if (geometry instanceof LineString line) {
			return positions(line.getCoordinates());
		}
		List<Object> parts = new ArrayList<>();
		if (geometry instanceof Polygon polygon) {
			parts.add(positions(polygon.getExteriorRing().getCoordinates()));
			for (int i = 0; i < polygon.getNumInteriorRing(); i++) {
				parts.add(positions(polygon.getInteriorRingN(i).getCoordinates()));
			}
			return parts;
		}
		for (int i = 0; i < geometry.getNumGeometries(); i++) {
			parts.add(coordinates(geometry.getGeometryN(i)));
		}
		return parts;
	}

	private static List<double[]> positions(Coordinate[] coordinates) {
		List<double[]> list = new ArrayList<>(coordinates.length);
		for (Coordinate coordinate : coordinates) {
			list.add(position(coordinate));
		}
		return list;
	}

	private static double[] position(Coordinate coordinate) {
		return new double[] { coordinate.x, coordinate.y };
	}

}
