package org.assay.demo;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.index.quadtree.Quadtree;

/**
 * Things already placed, each with the clearance a new thing must keep from it. Lines are
 * held segment by segment so that their envelopes stay small. Metric geometries.
 */
final class ClearanceIndex {

	private final Quadtree tree = new Quadtree();

	private double largestClearance;

	void add(Geometry geometry, double clearance, String tag) {
		this.tree.insert(geometry.getEnvelopeInternal(), new Entry(geometry, clearance, tag));
		this.largestClearance = Math.max(this.largestClearance, clearance);
	}

	void addSegments(LineString line, double clearance, String tag) {
		for (int i = 1; i < line.getNumPoints(); i++) {
			Coordinate[] segment = { line.getCoordinateN(i - 1), line.getCoordinateN(i) };
			add(LocalFrame.METRES.createLineString(segment), clearance, tag);
		}
	}

	/** Whether a candidate keeps every clearance. */
	boolean isClear(Geometry candidate) {
		return isClear(candidate, null);
	}

	/** Whether a candidate keeps every clearance, ignoring things with the given tag. */
	boolean isClear(Geometry candidate, String ignoredTag) {
		Envelope search = new Envelope(candidate.getEnvelopeInternal());
		search.expandBy(this.largestClearance);
		for (Object item : this.tree.query(search)) {
			Entry entry = (Entry) item;
			if (entry.tag.equals(ignoredTag)) {
				continue;
			}
			if (candidate.isWithinDistance(entry.geometry, entry.clearance)) {
				return false;
			}
		}
		return true;
	}

	private record Entry(Geometry geometry, double clearance, String tag) {
	}

}
