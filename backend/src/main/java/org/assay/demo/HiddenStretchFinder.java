package org.assay.demo;

import java.util.ArrayList;
import java.util.List;

import org.assay.demo.DemoWorld.HiddenStretch;
import org.assay.demo.DemoWorld.Road;
import org.assay.demo.DemoWorld.Woods;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;
import org.locationtech.jts.linearref.LengthIndexedLine;

/**
 * Finds the stretches of road under tree cover by walking each road in steps of
 * {@value #STEP} m and testing each point against the woods: the ends of a stretch are
 * right to within one step. Stretches shorter than two steps are ignored.
 */
final class HiddenStretchFinder {

	static final double STEP = 2;

	private HiddenStretchFinder() {
	}

	static List<HiddenStretch> find(List<Road> roads, List<Woods> woods) {
		List<PreparedGeometry> cover = woods.stream()
			.map((w) -> PreparedGeometryFactory.prepare(w.geometry()))
			.toList();
		List<HiddenStretch> stretches = new ArrayList<>();
		for (Road road : roads) {
			LineString line = road.geometry();
			if (cover.stream()
				.noneMatch((c) -> c.getGeometry().getEnvelopeInternal().intersects(line.getEnvelopeInternal()))) {
				continue;
			}
			find(road, cover, stretches);
		}
		return stretches;
	}

	private static void find(Road road, List<PreparedGeometry> cover, List<HiddenStretch> stretches) {
		LineString line = road.geometry();
		LengthIndexedLine indexed = new LengthIndexedLine(line);
		double length = line.getLength();
		double from = -1;
		for (double at = 0; at <= length; at += STEP) {
			boolean hidden = covered(indexed.extractPoint(at), cover);
			if (hidden && from < 0) {
				from = at;
			}
			else if (!hidden && from >= 0) {
				add(road, from, at, stretches);
				from = -1;
			}
		}
		if (from >= 0) {
			add(road, from, length, stretches);
		}
	}

	private static void add(Road road, double from, double to, List<HiddenStretch> stretches) {
		if (to - from >= 2 * STEP) {
			stretches.add(new HiddenStretch(road.id(), from, to, MetricLines.extract(road.geometry(), from, to)));
		}
	}

	private static boolean covered(Coordinate point, List<PreparedGeometry> cover) {
		for (PreparedGeometry woods : cover) {
			Envelope box = woods.getGeometry().getEnvelopeInternal();
			if (box.contains(point) && woods.contains(LocalFrame.METRES.createPoint(point))) {
				return true;
			}
		}
		return false;
	}

}
