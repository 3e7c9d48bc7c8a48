package org.assay.demo;

import java.util.ArrayList;
import java.util.List;

import org.assay.geo.Wkb;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import tools.jackson.databind.JsonNode;

/**
 * Reads the GeoJSON geometries of the demo files back into JTS, for the tests only: the
 * four types the demo writes, nothing else.
 */
final class GeoJsonTestGeometries {

	private GeoJsonTestGeometries() {
	}

	static Geometry read(JsonNode geometry) {
		JsonNode coordinates = geometry.get("coordinates");
		return switch (geometry.get("type").stringValue()) {
			case "LineString" -> line(coordinates);
			case "MultiLineString" -> Wkb.WGS84.createMultiLineString(
					parts(coordinates).stream().map(GeoJsonTestGeometries::line).toArray(LineString[]::new));
			case "Polygon" -> polygon(coordinates);
			case "MultiPolygon" -> Wkb.WGS84.createMultiPolygon(
					parts(coordinates).stream().map(GeoJsonTestGeometries::polygon).toArray(Polygon[]::new));
			default -> throw new IllegalArgumentException(geometry.get("type").stringValue());
		};
	}

	private static List<JsonNode> parts(JsonNode array) {
		return new ArrayList<>(array.values());
	}

	private static LineString line(JsonNode points) {
		return Wkb.WGS84.createLineString(points(points));
	}

	private static Polygon polygon(JsonNode rings) {
		List<JsonNode> all = parts(rings);
		LinearRing shell = Wkb.WGS84.createLinearRing(points(all.get(0)));
		LinearRing[] holes = all.stream()
			.skip(1)
			.map((r) -> Wkb.WGS84.createLinearRing(points(r)))
			.toArray(LinearRing[]::new);
		return Wkb.WGS84.createPolygon(shell, holes);
	}

	private static Coordinate[] points(JsonNode points) {
		return parts(points).stream()
			.map((p) -> new Coordinate(p.get(0).doubleValue(), p.get(1).doubleValue()))
			.toArray(Coordinate[]::new);
	}

}
