package org.assay.demo;

import java.util.ArrayList;
import java.util.List;

import org.assay.demo.DemoWorld.Road;
import org.assay.demo.DemoWorld.RoadClass;
import org.assay.demo.DemoWorld.Woods;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Polygon;

/**
 * Tree cover: blobs of 130 to 330 m radius away from the villages. The first few are
 * grown over a main road or a track, so that stretches of those roads are hidden from
 * above; the rest stand anywhere in the open country.
 */
final class WoodsPlanner {

	private static final int WOODS = 15;

	private static final int OVER_ROADS = 7;

	private static final double VILLAGE_CLEARANCE = 480;

	private WoodsPlanner() {
	}

	static List<Woods> plan(Polygon coast, List<Coordinate> villages, List<Road> roads, DemoRandom random) {
		List<Road> country = roads.stream().filter((r) -> r.roadClass() != RoadClass.STREET).toList();
		Envelope box = coast.getEnvelopeInternal();
		Geometry inland = coast.buffer(-80);
		List<Woods> woods = new ArrayList<>();
		for (int attempt = 0; attempt < 2000 && woods.size() < WOODS; attempt++) {
			double radius = random.uniform(130, 330);
			Coordinate centre;
			if (woods.size() < OVER_ROADS) {
				Road road = random.pick(country);
				centre = MetricLines.pointAt(road.geometry(), random.uniform(0, road.geometry().getLength()));
			}
			else {
				centre = new Coordinate(random.uniform(box.getMinX(), box.getMaxX()),
						random.uniform(box.getMinY(), box.getMaxY()));
			}
			if (fits(centre, radius, inland, villages, woods)) {
				Polygon blob = Shapes.blob(centre, radius, radius * random.uniform(0.6, 1.0), 0.25, 32, random);
				woods.add(new Woods(String.format("woods-%02d", woods.size() + 1), blob));
			}
		}
		return woods;
	}

	private static boolean fits(Coordinate centre, double radius, Geometry inland, List<Coordinate> villages,
			List<Woods> woods) {
		Geometry disc = LocalFrame.METRES.createPoint(centre).buffer(radius * 1.3, 8);
		if (!inland.contains(disc)) {
			return false;
		}
		for (Coordinate village : villages) {
			if (village.distance(centre) < radius * 1.3 + VILLAGE_CLEARANCE) {
				return false;
			}
		}
		for (Woods other : woods) {
			if (other.geometry().isWithinDistance(disc, 40)) {
				return false;
			}
		}
		return true;
	}

}
