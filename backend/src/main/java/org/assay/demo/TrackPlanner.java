package org.assay.demo;

import java.util.ArrayList;
import java.util.List;

import org.assay.demo.DemoWorld.Road;
import org.assay.demo.DemoWorld.RoadClass;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;

/**
 * Field tracks: unpaved, narrow, wandering lines that branch off main roads, village ring
 * streets and earlier tracks, out into the fields. A track stops before it leaves the
 * island, enters a village or comes within 20 m of another road, so it ends at a
 * T-junction or in the open.
 */
final class TrackPlanner {

	private static final int TRACKS = 72;

	private static final double VILLAGE_RADIUS = 330;

	private static final double ROAD_CLEARANCE = 20;

	private final PreparedGeometry inland;

	private final List<Coordinate> villages;

	private final DemoRandom random;

	private final ClearanceIndex taken = new ClearanceIndex();

	private TrackPlanner(Polygon coast, List<Coordinate> villages, DemoRandom random) {
		this.inland = PreparedGeometryFactory.prepare(coast.buffer(-120));
		this.villages = villages;
		this.random = random;
	}

	static List<Road> plan(List<Road> roads, Polygon coast, List<Coordinate> villages, DemoRandom random,
			IdSequence ids) {
		return new TrackPlanner(coast, villages, random).plan(roads, ids);
	}

	private List<Road> plan(List<Road> roads, IdSequence ids) {
		List<Road> bases = new ArrayList<>();
		for (Road road : roads) {
			this.taken.addSegments(road.geometry(), ROAD_CLEARANCE, road.id());
			if (road.roadClass() == RoadClass.MAIN || road.geometry().isClosed()) {
				bases.add(road);
			}
		}
		List<Road> tracks = new ArrayList<>();
		for (int attempt = 0; attempt < 800 && tracks.size() < TRACKS; attempt++) {
			Road base = (tracks.size() > 10 && this.random.chance(0.3)) ? this.random.pick(tracks)
					: this.random.pick(bases);
			LineString line = branch(base);
			if (line != null) {
				double width = 0.5 * Math.round(2 * this.random.uniform(2.5, 3.5));
				Road track = new Road(ids.next(), RoadClass.TRACK, width, line);
				tracks.add(track);
				this.taken.addSegments(line, ROAD_CLEARANCE, track.id());
			}
		}
		return tracks;
	}

	private LineString branch(Road base) {
		LineString line = base.geometry();
		double at = this.random.uniform(0.1, 0.9) * line.getLength();
		Coordinate start = MetricLines.pointAt(line, at);
		Coordinate village = nearestVillage(start);
		boolean fromRing = start.distance(village) < VILLAGE_RADIUS;
		if (!fromRing && start.distance(village) < VILLAGE_RADIUS + 150) {
			return null;
		}
		double heading = fromRing ? StrictMath.atan2(start.y - village.y, start.x - village.x)
				: MetricLines.directionAt(line, at) + this.random.sign() * Math.PI / 2;
		heading += this.random.uniform(-0.5, 0.5);
		double length = this.random.uniform(300, 1300);
		List<Coordinate> walked = MetricLines.walk(start, heading, length, 5, 0.05,
				(p) -> keepsGoing(start, p, base.id()), this.random);
		if (walked.size() * 5 < 200) {
			return null;
		}
		LineString dense = LocalFrame.METRES.createLineString(walked.toArray(Coordinate[]::new));
		return MetricLines.resample(dense, 30, 80, 0, this.random);
	}

	private boolean keepsGoing(Coordinate start, Coordinate p, String baseId) {
		if (!this.inland.contains(LocalFrame.METRES.createPoint(p))) {
			return false;
		}
		double away = start.distance(p);
		if (away > 120 && p.distance(nearestVillage(p)) < VILLAGE_RADIUS) {
			return false;
		}
		return away < 60 || this.taken.isClear(LocalFrame.METRES.createPoint(p), (away < 200) ? baseId : null);
	}

	private Coordinate nearestVillage(Coordinate p) {
		Coordinate nearest = this.villages.get(0);
		for (Coordinate village : this.villages) {
			if (village.distance(p) < nearest.distance(p)) {
				nearest = village;
			}
		}
		return nearest;
	}

}
