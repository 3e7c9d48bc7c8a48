package org.assay.checks;

import java.util.ArrayList;
import java.util.List;

import org.assay.geo.FeatureKind;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryCollection;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

/**
 * A feature held for checking: its lines (for polygons, their rings) as one packed array
 * of longitudes and latitudes, and its box. A road keeps no JTS geometry, so a million
 * drafts cost their coordinates and little more; a building keeps its polygons for the
 * overlap tests.
 *
 * <p>
 * Positions are held as {@code float} offsets from the box's south-west corner, 8 bytes a
 * position instead of 16. A float keeps 24 bits, so a position is off by at most
 * {@code 2^-25} of the box's side: 0.03 mm for a 1 km road, 0.3 mm for a 10 km one; equal
 * positions of one feature stay equal. All checks allow far more (a centimetre is the
 * files' own precision).
 */
final class PackedFeature {

	/** The feature's position in its batch or layer. */
	final int number;

	final String id;

	final FeatureKind kind;

	final double confidence;

	/**
	 * Offsets of longitude, latitude, longitude, latitude... of all parts, from the box's
	 * corner.
	 */
	private final float[] offsets;

	/** The vertex index just past the end of each part. */
	final int[] partEnds;

	/** The polygons of a building (WGS84), or {@code null} for a road. */
	final Geometry polygonal;

	final double minLon;

	final double minLat;

	final double maxLon;

	final double maxLat;

	private PackedFeature(int number, String id, FeatureKind kind, double confidence, double[] coords, int[] partEnds,
			Geometry polygonal) {
		this.number = number;
		this.id = id;
		this.kind = kind;
		this.confidence = confidence;
		this.partEnds = partEnds;
		this.polygonal = polygonal;
		double x0 = Double.POSITIVE_INFINITY, y0 = Double.POSITIVE_INFINITY;
		double x1 = Double.NEGATIVE_INFINITY, y1 = Double.NEGATIVE_INFINITY;
		for (int i = 0; i < coords.length; i += 2) {
			x0 = Math.min(x0, coords[i]);
			x1 = Math.max(x1, coords[i]);
			y0 = Math.min(y0, coords[i + 1]);
			y1 = Math.max(y1, coords[i + 1]);
		}
		this.minLon = x0;
		this.minLat = y0;
		this.maxLon = x1;
		this.maxLat = y1;
		this.offsets = new float[coords.length];
		for (int i = 0; i < coords.length; i += 2) {
			this.offsets[i] = (float) (coords[i] - x0);
			this.offsets[i + 1] = (float) (coords[i + 1] - y0);
		}
	}

	/**
	 * Packs a geometry: the lines of a (Multi)LineString, the rings of a (Multi)Polygon.
	 * @throws IllegalArgumentException when the geometry is empty
	 */
	static PackedFeature of(int number, String id, FeatureKind kind, double confidence, Geometry geometry) {
		List<CoordinateSequence> parts = new ArrayList<>();
		collect(geometry, parts);
		int positions = 0;
		for (CoordinateSequence part : parts) {
			positions += part.size();
		}
		if (positions == 0) {
			throw new IllegalArgumentException("Feature " + id + " has an empty geometry");
		}
		double[] coords = new double[2 * positions];
		int[] ends = new int[parts.size()];
		int at = 0;
		for (int p = 0; p < parts.size(); p++) {
			CoordinateSequence part = parts.get(p);
			for (int i = 0; i < part.size(); i++) {
				coords[2 * at] = part.getX(i);
				coords[2 * at + 1] = part.getY(i);
				at++;
			}
			ends[p] = at;
		}
		Geometry polygons = (geometry.getDimension() == 2) ? geometry : null;
		return new PackedFeature(number, id, kind, confidence, coords, ends, polygons);
	}

	private static void collect(Geometry geometry, List<CoordinateSequence> parts) {
		if (geometry instanceof GeometryCollection collection) {
			for (int i = 0; i < collection.getNumGeometries(); i++) {
				collect(collection.getGeometryN(i), parts);
			}
		}
		else if (geometry instanceof LineString line && !line.isEmpty()) {
			parts.add(line.getCoordinateSequence());
		}
		else if (geometry instanceof Polygon polygon && !polygon.isEmpty()) {
			parts.add(polygon.getExteriorRing().getCoordinateSequence());
			for (int h = 0; h < polygon.getNumInteriorRing(); h++) {
				parts.add(polygon.getInteriorRingN(h).getCoordinateSequence());
			}
		}
	}

	int partStart(int part) {
		return (part == 0) ? 0 : this.partEnds[part - 1];
	}

	int vertexCount() {
		return this.offsets.length / 2;
	}

	double lon(int vertex) {
		return this.minLon + this.offsets[2 * vertex];
	}

	double lat(int vertex) {
		return this.minLat + this.offsets[2 * vertex + 1];
	}

	boolean isRoad() {
		return this.kind == FeatureKind.ROAD;
	}

	/** A frame centred on this feature's box. */
	MetricFrame frame() {
		return MetricFrame.around(this.minLon, this.minLat, this.maxLon, this.maxLat);
	}

}
