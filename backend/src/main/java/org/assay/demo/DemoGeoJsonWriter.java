package org.assay.demo;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.Locale;
import java.util.function.BiConsumer;
import java.util.function.Function;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.MultiLineString;
import org.locationtech.jts.geom.MultiPolygon;
import org.locationtech.jts.geom.Polygon;

/**
 * Writes demo features as a GeoJSON FeatureCollection (RFC 7946), one feature per line,
 * feature by feature, with plain string building: coordinates with exactly 7 decimals,
 * numbers without exponents, so the output is the same bytes on every machine.
 */
final class DemoGeoJsonWriter {

	private DemoGeoJsonWriter() {
	}

	/**
	 * Writes a collection. The stream is flushed, not closed.
	 * @param features the features
	 * @param id the id of a feature
	 * @param geometry the geometry of a feature
	 * @param out where to write, UTF-8
	 * @param properties appends the members of a feature's {@code properties} object
	 * @param <T> the feature type
	 * @throws IOException when writing fails
	 */
	static <T> void write(Iterable<T> features, Function<T, String> id, Function<T, Geometry> geometry,
			BiConsumer<T, Properties> properties, OutputStream out) throws IOException {
		Writer writer = new BufferedWriter(new OutputStreamWriter(out, StandardCharsets.UTF_8), 1 << 16);
		writer.write("{\"type\":\"FeatureCollection\",\"features\":[\n");
		StringBuilder line = new StringBuilder(4096);
		boolean first = true;
		for (T feature : features) {
			line.setLength(0);
			if (!first) {
				line.append(",\n");
			}
			first = false;
			line.append("{\"type\":\"Feature\",\"id\":");
			string(line, id.apply(feature));
			line.append(",\"geometry\":");
			geometry(line, geometry.apply(feature));
			line.append(",\"properties\":{");
			properties.accept(feature, new Properties(line));
			line.append("}}");
			writer.append(line);
		}
		writer.write("\n]}\n");
		writer.flush();
	}

	static void geometry(StringBuilder out, Geometry geometry) {
		out.append("{\"type\":\"").append(geometry.getGeometryType()).append("\",\"coordinates\":");
		if (geometry instanceof LineString line) {
			points(out, line.getCoordinates());
		}
		else if (geometry instanceof Polygon polygon) {
			rings(out, polygon);
		}
		else if (geometry instanceof MultiLineString || geometry instanceof MultiPolygon) {
			out.append('[');
			for (int i = 0; i < geometry.getNumGeometries(); i++) {
				out.append((i > 0) ? "," : "");
				Geometry part = geometry.getGeometryN(i);
				if (part instanceof Polygon polygon) {
					rings(out, polygon);
				}
				else {
					points(out, part.getCoordinates());
				}
			}
			out.append(']');
		}
		else {
			throw new IllegalArgumentException("Not a demo geometry: " + geometry.getGeometryType());
		}
		out.append('}');
	}

	private static void rings(StringBuilder out, Polygon polygon) {
		out.append('[');
		points(out, polygon.getExteriorRing().getCoordinates());
		for (int i = 0; i < polygon.getNumInteriorRing(); i++) {
			out.append(',');
			points(out, polygon.getInteriorRingN(i).getCoordinates());
		}
		out.append(']');
	}

	private static void points(StringBuilder out, Coordinate[] points) {
		out.append('[');
		for (int i = 0; i < points.length; i++) {
			out.append((i > 0) ? ",[" : "[");
			fixed(out, points[i].x, 7);
			out.append(',');
			fixed(out, points[i].y, 7);
			out.append(']');
		}
		out.append(']');
	}

	/** Appends a number with exactly {@code decimals} decimals, rounded half up. */
	static void fixed(StringBuilder out, double value, int decimals) {
		long scale = 1;
		for (int i = 0; i < decimals; i++) {
			scale *= 10;
		}
		long scaled = Math.round(value * scale);
		if (scaled < 0) {
			out.append('-');
			scaled = -scaled;
		}
		out.append(scaled / scale).append('.');
		String fraction = Long.toString(scaled % scale);
		out.append("0".repeat(decimals - fraction.length())).append(fraction);
	}

	static void string(StringBuilder out, String value) {
		out.append('"');
		for (int i = 0; i < value.length(); i++) {
			char c = value.charAt(i);
			if (c == '"' || c == '\\') {
				out.append('\\').append(c);
			}
			else if (c < 0x20) {
				out.append(String.format(Locale.ROOT, "\\u%04x", (int) c));
			}
			else {
				out.append(c);
			}
		}
		out.append('"');
	}

	/**
	 * The members of one {@code properties} object, written in the order they are added.
	 */
	static final class Properties {

		private final StringBuilder out;

		private boolean first = true;

		Properties(StringBuilder out) {
			this.out = out;
		}

		Properties string(String name, String value) {
			if (value != null) {
				name(name);
				DemoGeoJsonWriter.string(this.out, value);
			}
			return this;
		}

		Properties number(String name, double value, int decimals) {
			name(name);
			fixed(this.out, value, decimals);
			return this;
		}

		private void name(String name) {
			this.out.append(this.first ? "" : ",");
			this.first = false;
			DemoGeoJsonWriter.string(this.out, name);
			this.out.append(':');
		}

	}

}
