package org.assay.demo;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;

import org.assay.demo.DemoWorld.Road;
import org.assay.demo.DemoWorld.RoadClass;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

/**
 * The main roads: a ring joining neighbouring villages of the ring, and every other ring
 * village joined to the middle one. Each road is a gently curving line, a bow of a few
 * per cent of its length plus a slow wobble, with vertices every 30 to 80 m.
 */
final class MainRoadPlanner {

	private static final double INLAND = 250;

	private MainRoadPlanner() {
	}

	static List<Road> plan(List<Coordinate> centres, Polygon coast, DemoRandom random, IdSequence ids) {
		Geometry inland = coast.buffer(-INLAND);
		List<Road> roads = new ArrayList<>();
		int ring = centres.size() - 1;
		for (int i = 1; i <= ring; i++) {
			Coordinate next = centres.get(1 + i % ring);
			roads.add(road(centres.get(i), next, inland, random, ids));
		}
		for (int i = 1; i <= ring; i += 2) {
			roads.add(road(centres.get(0), centres.get(i), inland, random, ids));
		}
		return roads;
	}

	private static Road road(Coordinate from, Coordinate to, Geometry inland, DemoRandom random, IdSequence ids) {
		double length = from.distance(to);
		double bend = random.sign() * length * random.uniform(0.03, 0.1);
		double wobble = random.uniform(15, 45);
		int waves = random.between(2, 4);
		double phase = random.angle();
		LineString line = null;
		for (int attempt = 0; attempt < 6; attempt++) {
			line = MetricLines.sample(curve(from, to, bend, wobble, waves, phase), 30, 80, random);
			if (inland.contains(line)) {
				break;
			}
			bend /= 2;
			wobble /= 2;
		}
		double width = 0.5 * Math.round(2 * random.uniform(6, 7.5));
		return new Road(ids.next(), RoadClass.MAIN, width, line);
	}

	/**
	 * {@code p(t) = from + t(to - from) + n (4 bend t(1-t) + wobble sin(πt) sin(kπt + φ))}
	 * where {@code n} is the unit normal of the chord.
	 */
	private static DoubleFunction<Coordinate> curve(Coordinate from, Coordinate to, double bend, double wobble,
			int waves, double phase) {
		double dx = to.x - from.x;
		double dy = to.y - from.y;
		double length = Math.hypot(dx, dy);
		double nx = -dy / length;
		double ny = dx / length;
		return (t) -> {
			double side = 4 * bend * t * (1 - t)
					+ wobble * StrictMath.sin(Math.PI * t) * StrictMath.sin(waves * Math.PI * t + phase);
			return new Coordinate(from.x + t * dx + side * nx, from.y + t * dy + side * ny);
		};
	}

}
