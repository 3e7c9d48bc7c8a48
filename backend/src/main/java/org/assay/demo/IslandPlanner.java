package org.assay.demo;

import java.util.ArrayList;
import java.util.List;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Polygon;

/**
 * The island's outline and where its villages stand, in the metric frame. The island is
 * an ellipse of about 11 by 8 km with a wobbling coast, inside a 12 by 9 km box around
 * the origin; one village stands near the middle and the others on a ring around it.
 */
final class IslandPlanner {

	static final double HALF_WIDTH = 6000;

	static final double HALF_HEIGHT = 4500;

	private static final double COAST_WOBBLE = 0.07;

	private IslandPlanner() {
	}

	static Polygon coastline(DemoRandom random) {
		double rx = HALF_WIDTH / (1 + COAST_WOBBLE) - 100;
		double ry = HALF_HEIGHT / (1 + COAST_WOBBLE) - 100;
		return Shapes.blob(new Coordinate(0, 0), rx, ry, COAST_WOBBLE, 180, random);
	}

	/**
	 * Village centres: the first near the middle, the others on an ellipse of 3.4 by 2.4
	 * km radius at roughly even angles, so that they are at least about 2 km apart.
	 */
	static List<Coordinate> villageCentres(int count, DemoRandom random) {
		List<Coordinate> centres = new ArrayList<>();
		centres.add(new Coordinate(random.uniform(-400, 400), random.uniform(-300, 300)));
		int ring = count - 1;
		double start = random.angle();
		for (int i = 0; i < ring; i++) {
			double angle = start + 2 * Math.PI * i / ring + random.uniform(-0.2, 0.2);
			double scale = random.uniform(0.92, 1.05);
			centres.add(new Coordinate(3400 * scale * StrictMath.cos(angle), 2400 * scale * StrictMath.sin(angle)));
		}
		return centres;
	}

}
