package org.assay.checks;

import org.assay.geo.Wkb;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;

/**
 * JTS geometries moved into and out of a {@link MetricFrame}, for the few checks that
 * need overlays (buildings). Copies; the originals are left as they are.
 */
final class FrameGeometry {

	/** Metric geometries: plain metres, no SRID. */
	static final GeometryFactory METRES = new GeometryFactory();

	private FrameGeometry() {
	}

	static Geometry toFrame(MetricFrame frame, Geometry lonLat) {
		Geometry copy = METRES.createGeometry(lonLat);
		copy.apply(new Mapping(frame, true));
		return copy;
	}

	static Geometry toLonLat(MetricFrame frame, Geometry metric) {
		Geometry copy = Wkb.WGS84.createGeometry(metric);
		copy.apply(new Mapping(frame, false));
		return copy;
	}

	/** The lines of a packed feature (a road) in a frame. */
	static Geometry lines(MetricFrame frame, PackedFeature feature) {
		LineString[] parts = new LineString[feature.partEnds.length];
		for (int p = 0; p < parts.length; p++) {
			int start = feature.partStart(p);
			Coordinate[] points = new Coordinate[feature.partEnds[p] - start];
			for (int i = 0; i < points.length; i++) {
				points[i] = new Coordinate(frame.x(feature.lon(start + i)), frame.y(feature.lat(start + i)));
			}
			parts[p] = METRES.createLineString(points);
		}
		return (parts.length == 1) ? parts[0] : METRES.createMultiLineString(parts);
	}

	private record Mapping(MetricFrame frame, boolean toFrame) implements CoordinateSequenceFilter {

		@Override
		public void filter(CoordinateSequence seq, int i) {
			double a = seq.getX(i), b = seq.getY(i);
			seq.setOrdinate(i, 0, this.toFrame ? this.frame.x(a) : this.frame.lon(a));
			seq.setOrdinate(i, 1, this.toFrame ? this.frame.y(b) : this.frame.lat(b));
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
